import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext } from 'playwright-core';

/** Screenshots go here (git-ignored). */
export const artifactsDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../test-artifacts/e2e');

/** Debian's Chromium; the direct binary avoids the wrapper script's shell warning. */
function chromiumPath(): string {
  for (const p of ['/usr/lib/chromium/chromium', '/usr/bin/chromium']) if (existsSync(p)) return p;
  throw new Error('Chromium is not installed: run the tests with `npm test` (it installs Debian\'s chromium)');
}

/** A headless Chromium with a fresh profile; WebGL renders in software (SwiftShader). */
export async function openBrowser(): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  mkdirSync(artifactsDir, { recursive: true });
  const profile = mkdtempSync(path.join(os.tmpdir(), 'photon-ledger-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath(),
    headless: true,
    viewport: { width: 1360, height: 860 },
    args: [
      '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
      '--disable-background-networking', '--disable-component-update', '--disable-sync',
      '--use-angle=swiftshader', '--enable-unsafe-swiftshader',
    ],
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
