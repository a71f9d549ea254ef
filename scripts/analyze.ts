/**
 * Bench CLI: lets a tester check files before upload.
 *   npx tsx scripts/analyze.ts spectrum [--bands NAME=LO-HI,...] [--unit UNIT] FILE...
 *   npx tsx scripts/analyze.ts grid [--footprint WxH] FILE
 *   npx tsx scripts/analyze.ts run [--footprint WxH] [--bands NAME=LO-HI,...] FILE...
 * Prints one JSON document to stdout; exit 1 when any file is not usable.
 */
import { runSpectrumCommand } from './analyze/spectrum-command.ts';
import { runGridCommand } from './analyze/grid-command.ts';
import { runRunCommand } from './analyze/run-command.ts';

const [command, ...rest] = process.argv.slice(2);
const usage =
  'usage: analyze.ts spectrum [--bands NAME=LO-HI,...] [--unit UNIT] FILE...\n' +
  '       analyze.ts grid [--footprint WxH] FILE\n' +
  '       analyze.ts run [--footprint WxH] [--bands NAME=LO-HI,...] FILE...\n';

async function main(): Promise<number> {
  if (command === 'spectrum') return runSpectrumCommand(rest);
  if (command === 'grid') return runGridCommand(rest);
  if (command === 'run') return runRunCommand(rest);
  process.stderr.write(usage);
  return 2;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    process.stderr.write(`analyze: ${err instanceof Error ? err.message : String(err)}\n`);
    process.exitCode = 1;
  },
);
