// Runs every benchmark under test/bench/ in one process each, side by side with its peers.
import { readdirSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

const files = readdirSync('test/bench')
  .filter((f) => f.endsWith('.bench.ts'))
  .sort();
let failed = 0;
for (const f of files) {
  console.log(`\n=== ${f} ===`);
  const r = spawnSync(process.execPath, ['--import', 'tsx', `test/bench/${f}`, ...process.argv.slice(2)], {
    stdio: 'inherit',
  });
  if (r.status !== 0) failed++;
}
process.exitCode = failed ? 1 : 0;
