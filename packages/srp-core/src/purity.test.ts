import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const srcDir = path.dirname(fileURLToPath(import.meta.url));

function libraryFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return libraryFiles(p);
    return e.name.endsWith('.ts') && !e.name.endsWith('.test.ts') && !e.name.includes('test-helpers') ? [p] : [];
  });
}

describe('srp-core library code', () => {
  it('imports only its own files, astronomy-engine and mathjs: no workspace package, no Node module', () => {
    const offenders: string[] = [];
    for (const file of libraryFiles(srcDir)) {
      for (const m of readFileSync(file, 'utf8').matchAll(/\bfrom\s+'([^']+)'|\bimport\(\s*'([^']+)'\s*\)/g)) {
        const spec = m[1] ?? m[2]!;
        if (!spec.startsWith('.') && spec !== 'astronomy-engine' && spec !== 'mathjs') {
          offenders.push(`${path.relative(srcDir, file)}: ${spec}`);
        }
      }
    }
    expect(offenders).toEqual([]);
  });
});
