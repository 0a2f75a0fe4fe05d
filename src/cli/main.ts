import { CAUTIONS } from '../model/cautions.ts';

// Placeholder until the check command lands: prints the cautions and usage.
const [command] = process.argv.slice(2);
if (command !== 'check') {
  console.log('usage: dropline check FILE [--json] [--working ID]');
  for (const c of CAUTIONS) console.log(`! ${c}`);
  process.exit(command ? 2 : 0);
}
