/**
 * PKCS#7 (adbe.pkcs7.detached) signature of a record with a PKCS#12 identity, via @signpdf.
 * The record must have been rendered with a signature placeholder (RecordOptions.signature).
 */
import { SignPdf } from '@signpdf/signpdf';
import { P12Signer } from '@signpdf/signer-p12';

export class SigningError extends Error {}

export async function signRecordPdf(pdf: Buffer, p12: Uint8Array, passphrase: string, signingTime?: Date): Promise<Buffer> {
  let signer: P12Signer;
  try {
    signer = new P12Signer(Buffer.from(p12), { passphrase });
  } catch (e) {
    throw new SigningError(`the signing identity cannot be read: ${(e as Error).message}`);
  }
  try {
    return await new SignPdf().sign(pdf, signer, signingTime);
  } catch (e) {
    const msg = (e as Error).message ?? String(e);
    if (/MAC could not be verified|Invalid password/i.test(msg)) {
      throw new SigningError('the passphrase does not open the PKCS#12 file (set FLANKFILM_P12_PASSPHRASE)');
    }
    throw new SigningError(`signing failed: ${msg}`);
  }
}
