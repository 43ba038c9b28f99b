/**
 * Checks the PKCS#7 (adbe.pkcs7.detached) signature of a record, as pdfSign.ts writes it:
 *   1. the /ByteRange covers the whole file except the signature's own /Contents hex string;
 *   2. the messageDigest attribute equals the digest of the covered bytes;
 *   3. the signature over the signed attributes verifies against the certificate embedded in
 *      the PKCS#7 (RSA or EC, by node:crypto), and the signer's subject is reported.
 * It proves the covered bytes are those the key holder signed; it does not prove who holds the
 * key (no chain to a trusted authority is checked: the certificate is usually self-issued).
 * The ASN.1 is read with node-forge (RFC 5652, SignedData / SignerInfo).
 */
import { createHash, createPublicKey, verify as cryptoVerify } from 'node:crypto';
import forge from 'node-forge';
import { latin1, PdfName, type PdfFile, type PdfDict } from './pdfRead';

export interface SignatureDict {
  readonly num: number;
  readonly dict: PdfDict;
  readonly byteRange: readonly number[] | null;
  readonly contents: Uint8Array | null;
  /** /M as written (D:YYYYMMDDHHmmSSZ), parsed; null if absent or malformed. */
  readonly signingTime: Date | null;
}

export interface SignatureCheck {
  readonly ok: boolean;
  /** Each failed check, in words. */
  readonly problems: readonly string[];
  readonly subject: string | null;
  /** The covered range ends before the end of the file: bytes were appended after signing. */
  readonly appended: boolean;
}

/** The signature dictionaries (/Type /Sig) of the file, in object order. */
export function signatureDicts(pdf: PdfFile): SignatureDict[] {
  const out: SignatureDict[] = [];
  for (const num of [...pdf.offsets.keys()].sort((a, b) => a - b)) {
    const obj = pdf.object(num);
    const v = obj?.value;
    if (!(v instanceof Map)) continue;
    const type = v.get('Type');
    if (!(type instanceof PdfName) || type.name !== 'Sig') continue;
    const br = pdf.resolve(v.get('ByteRange') ?? null);
    const contents = pdf.resolve(v.get('Contents') ?? null);
    const m = pdf.resolve(v.get('M') ?? null);
    out.push({
      num,
      dict: v,
      byteRange: Array.isArray(br) && br.length === 4 && br.every((x) => typeof x === 'number' && Number.isInteger(x) && x >= 0) ? (br as number[]) : null,
      contents: contents instanceof Uint8Array ? contents : null,
      signingTime: m instanceof Uint8Array ? pdfDate(latin1(m)) : null,
    });
  }
  return out;
}

/** A PDF date "D:YYYYMMDDHHmmSSZ" (the form pdfkit writes) as a Date; null otherwise. */
export function pdfDate(text: string): Date | null {
  const m = /^D:(\d{4})(\d{2})(\d{2})(\d{2})(\d{2})(\d{2})Z$/.exec(text);
  if (!m) return null;
  const d = new Date(Date.UTC(+m[1]!, +m[2]! - 1, +m[3]!, +m[4]!, +m[5]!, +m[6]!));
  return Number.isNaN(d.getTime()) ? null : d;
}

const HASHES: Readonly<Record<string, string>> = {
  [forge.pki.oids.sha256!]: 'sha256',
  [forge.pki.oids.sha384!]: 'sha384',
  [forge.pki.oids.sha512!]: 'sha512',
};

/** Check one signature of `bytes` (the whole file). */
export function checkSignature(bytes: Uint8Array, sig: SignatureDict): SignatureCheck {
  const problems: string[] = [];
  const br = sig.byteRange;
  if (!br) return { ok: false, problems: ['the signature has no valid /ByteRange'], subject: null, appended: false };
  const [a, b, c, d] = br as [number, number, number, number];
  const appended = c + d < bytes.length;
  if (a !== 0 || b <= 0 || c <= b || c + d > bytes.length) problems.push('the /ByteRange does not describe this file');
  else {
    if (appended) problems.push(`${bytes.length - (c + d)} bytes were appended after the signed range`);
    // The gap must be exactly the hex string of this signature's /Contents, nothing else.
    const gap = latin1(bytes.subarray(b, c));
    if (!/^<[0-9A-Fa-f]*>$/.test(gap)) problems.push('the /ByteRange leaves out more than the signature');
    else if (!sig.contents || Buffer.compare(Buffer.from(gap.slice(1, -1), 'hex'), Buffer.from(sig.contents)) !== 0) {
      problems.push('the /ByteRange leaves out something other than this signature’s /Contents');
    }
  }
  if (problems.length > 0 && !appended) return { ok: false, problems, subject: null, appended };
  if (!sig.contents || sig.contents.every((x) => x === 0)) return { ok: false, problems: [...problems, 'the signature is empty (the record was never signed)'], subject: null, appended };

  let subject: string | null = null;
  try {
    const p7 = forge.pkcs7.messageFromAsn1(forge.asn1.fromDer(forge.util.createBuffer(latin1(sig.contents)), { parseAllBytes: false } as unknown as boolean)) as forge.pkcs7.PkcsSignedData & {
      rawCapture?: { signerInfos?: forge.asn1.Asn1[] };
    };
    const signerInfo = p7.rawCapture?.signerInfos?.[0];
    const cert = p7.certificates[0];
    if (!signerInfo || !cert) throw new Error('it holds no signer or no certificate');
    subject = cert.subject.attributes.map((x) => `${x.shortName ?? x.name ?? x.type}=${String(x.value)}`).join(', ');
    const parts = signerInfo.value as forge.asn1.Asn1[];
    const digestOid = forge.asn1.derToOid(((parts[2]!.value as forge.asn1.Asn1[])[0]!.value as string) ?? '');
    const attrs = parts.find((p) => p.tagClass === forge.asn1.Class.CONTEXT_SPECIFIC && p.type === 0);
    const signature = parts.find((p, i) => i > 2 && p.tagClass === forge.asn1.Class.UNIVERSAL && p.type === forge.asn1.Type.OCTETSTRING);
    const hash = HASHES[digestOid];
    if (!hash) throw new Error(`its digest algorithm (${digestOid}) is not supported`);
    if (!attrs || !signature) throw new Error('it has no signed attributes');
    let messageDigest: string | null = null;
    for (const attr of attrs.value as forge.asn1.Asn1[]) {
      const [oid, set] = attr.value as forge.asn1.Asn1[];
      if (oid && forge.asn1.derToOid(oid.value as string) === forge.pki.oids.messageDigest) {
        messageDigest = ((set!.value as forge.asn1.Asn1[])[0]!.value as string) ?? null;
      }
    }
    if (messageDigest === null) throw new Error('it has no messageDigest attribute');
    if (a === 0 && c > b && c + d <= bytes.length) {
      const h = createHash(hash).update(bytes.subarray(a, b)).update(bytes.subarray(c, c + d)).digest();
      if (Buffer.compare(h, Buffer.from(messageDigest, 'latin1')) !== 0) problems.push('the message digest does not match the signed bytes (the file was changed after signing)');
    }
    // The signature covers the DER of the signed attributes as a SET (RFC 5652 §5.4).
    const set = forge.asn1.create(forge.asn1.Class.UNIVERSAL, forge.asn1.Type.SET, true, attrs.value as forge.asn1.Asn1[]);
    const signed = Buffer.from(forge.asn1.toDer(set).getBytes(), 'latin1');
    const key = createPublicKey(forge.pki.certificateToPem(cert));
    if (!cryptoVerify(hash, signed, key, Buffer.from(signature.value as string, 'latin1'))) {
      problems.push('the signature does not verify against the embedded certificate');
    }
  } catch (e) {
    problems.push(`the signature cannot be read: ${(e as Error).message}`);
  }
  return { ok: problems.length === 0, problems, subject, appended };
}
