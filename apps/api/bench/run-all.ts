/**
 * `pnpm bench` in apps/api: runs every `*.bench.ts` beside this file, one after another, each in a
 * process of its own (a bench's servers, workers and database never overlap the next one's). Each
 * prints its own figures; nothing is asserted. `node --import tsx bench/run-all.ts latency` runs
 * only the files whose name contains `latency`.
 */
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const dir = path.dirname(fileURLToPath(import.meta.url));
const only = process.argv[2];
let failed = 0;
for (const file of readdirSync(dir).filter((f) => f.endsWith('.bench.ts')).sort()) {
  if (only && !file.includes(only)) continue;
  console.log(`\n# ${file}`);
  const result = spawnSync(process.execPath, ['--import', 'tsx', path.join(dir, file)], { stdio: 'inherit' });
  if (result.status !== 0) {
    failed += 1;
    console.log(`${file} exited with ${result.status ?? result.signal}`);
  }
}
process.exitCode = failed > 0 ? 1 : 0;
