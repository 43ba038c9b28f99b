/** `npx tsx tests/harness/cli.ts [STATIC_DIR]`: serve the built renderer and the contract on loopback until Ctrl+C. */
import { startHarness } from './server';

const harness = await startHarness(process.argv[2] ? { staticDir: process.argv[2] } : {});
process.stdout.write(`flankfilm harness: ${harness.url} (work folder ${harness.workDir})\n`);
process.on('SIGINT', () => {
  void harness.close().then(() => process.exit(0));
});
