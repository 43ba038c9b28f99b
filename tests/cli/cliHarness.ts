import { runCli } from '../../app/cli/runCli';

/** Run the CLI in-process and capture what it prints. */
export async function cli(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const code = await runCli(argv, { out: (s) => (out += s), err: (s) => (err += s) });
  return { code, out, err };
}
