/**
 * Bench CLI: lets a tester check files before upload.
 *   npx tsx scripts/analyze.ts spectrum [--bands NAME=LO-HI,...] [--unit UNIT] FILE...
 *   npx tsx scripts/analyze.ts grid [--footprint WxH] FILE
 *   npx tsx scripts/analyze.ts run [--footprint WxH] [--bands NAME=LO-HI,...] FILE...
 *   npx tsx scripts/analyze.ts plan --dose J_CM2 --target WxH [--cover F] [--dose-cap MULTIPLE] [--strategy S] FILE
 * Prints one JSON document to stdout; exit 1 when any file is not usable.
 */
import { runSpectrumCommand } from './analyze/spectrum-command.ts';
import { runGridCommand } from './analyze/grid-command.ts';
import { runRunCommand } from './analyze/run-command.ts';
import { runPlanCommand } from './analyze/plan-command.ts';

const [command, ...rest] = process.argv.slice(2);
const usage =
  'usage: analyze.ts spectrum [--bands NAME=LO-HI,...] [--unit UNIT] FILE...\n' +
  '       analyze.ts grid [--footprint WxH] FILE\n' +
  '       analyze.ts run [--footprint WxH] [--bands NAME=LO-HI,...] FILE...\n' +
  '       analyze.ts plan --dose J_CM2 --target WxH [--cover F] [--dose-cap MULTIPLE] [--strategy single|placements|units] FILE\n' +
  '       analyze.ts plan --help   (all plan options, body zones instead of a rectangle)\n';

async function main(): Promise<number> {
  if (command === 'spectrum') return runSpectrumCommand(rest);
  if (command === 'grid') return runGridCommand(rest);
  if (command === 'run') return runRunCommand(rest);
  if (command === 'plan') return runPlanCommand(rest);
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
