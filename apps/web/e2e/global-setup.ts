import { spawn, type ChildProcess } from 'node:child_process';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

/**
 * Starts the API (with a fresh seeded database and the built client) through the api package's
 * stack script, and hands its URL to the tests.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  if (!process.env.PL_TEST_ADMIN_URL) {
    throw new Error('PL_TEST_ADMIN_URL is not set: run the tests with `npm test` (it starts a throwaway PostgreSQL)');
  }
  const server: ChildProcess = spawn(
    'pnpm',
    ['--silent', '--filter', '@photon-ledger/api', 'exec', 'tsx', 'scripts/stack.ts', 'e2e-server'],
    { env: { ...process.env, PL_PORT: '0', PL_WORKERS_IN_PROCESS: '1' }, stdio: ['ignore', 'pipe', 'pipe'] },
  );
  let output = '';
  const baseUrl = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`the API did not start within 90 s:\n${output}`)), 90_000);
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      const m = /listening on (http:\/\/[\d.]+:\d+)/.exec(output);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]!);
      }
    };
    server.stdout!.on('data', onData);
    server.stderr!.on('data', onData);
    server.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`the API exited with ${code} before listening:\n${output}`));
    });
  });
  project.provide('baseUrl', baseUrl);
  return async () => {
    server.kill('SIGTERM');
    await new Promise((resolve) => (server.exitCode !== null ? resolve(null) : server.once('exit', resolve)));
  };
}
