/**
 * `dropline` command-line entry (bin/dropline.mjs runs it through tsx). Everything but the process
 * lives in run.ts so it can be tested without spawning.
 */
import { nodeIo, runCli } from './run.ts';

// A reader that stops early (`dropline check x.json | head`) is not an error of ours.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw e;
});

process.exitCode = runCli(process.argv.slice(2), nodeIo);
