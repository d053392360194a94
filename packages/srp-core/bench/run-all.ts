/**
 * `pnpm bench` in srp-core: runs every `*.bench.ts` beside this file, one after another, on one
 * core (Node runs JavaScript on one thread). Each prints its own figures; nothing is asserted.
 */
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const dir = path.dirname(fileURLToPath(import.meta.url));
const only = process.argv[2];
for (const file of readdirSync(dir).filter((f) => f.endsWith('.bench.ts')).sort()) {
  if (only && !file.includes(only)) continue;
  console.log(`\n# ${file}`);
  await import(pathToFileURL(path.join(dir, file)).href);
}
