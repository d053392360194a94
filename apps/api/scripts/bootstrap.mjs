// The two commands (`npm start`, `npm test`) begin here. Plain JavaScript on purpose: it runs
// before any dependency (TypeScript runner included) is installed. It brings pnpm at the pinned
// version and the locked dependencies, then hands over to stack.ts.
import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
const pinned = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8')).packageManager.replace(/^pnpm@/, '');

function pnpmVersion(bin) {
  const r = spawnSync(bin, ['--version'], { encoding: 'utf8' });
  return r.status === 0 ? r.stdout.trim() : null;
}

let pnpm = 'pnpm';
if (pnpmVersion(pnpm) !== pinned) {
  const globalBin = path.join(execFileSync('npm', ['prefix', '-g'], { encoding: 'utf8' }).trim(), 'bin', 'pnpm');
  if (pnpmVersion(globalBin) !== pinned) {
    console.log(`installing pnpm ${pinned}...`);
    const r = spawnSync('npm', ['install', '-g', `pnpm@${pinned}`], { stdio: 'inherit' });
    if (r.status !== 0) process.exit(r.status ?? 1);
  }
  pnpm = globalBin;
}

const install = spawnSync(pnpm, ['install', '--frozen-lockfile', '--reporter=append-only'], {
  cwd: root,
  stdio: 'inherit',
  env: { ...process.env, npm_config_update_notifier: 'false' },
});
if (install.status !== 0) process.exit(install.status ?? 1);

// `node --import tsx` rather than the tsx CLI: the CLI's signal relay kills a child that is busy
// (stopping PostgreSQL, say) when a second Ctrl-C arrives.
const stack = path.join(root, 'apps', 'api', 'scripts', 'stack.ts');
const child = spawn(process.execPath, ['--import', 'tsx', stack, ...process.argv.slice(2)], {
  cwd: root,
  // No terminal on stdin: nothing reads it, and a terminal there can trip Node's exit-time reset.
  stdio: ['ignore', 'inherit', 'inherit'],
  env: { ...process.env, PL_PNPM: pnpm },
});
// Ctrl-C reaches the whole process group; a signal sent to this process alone is passed on.
// The stack script shuts down once however many copies of a signal it gets.
let received = null;
for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) {
  process.on(signal, () => {
    received ??= signal;
    child.kill(signal);
  });
}
child.on('exit', (code, signal) => {
  const dieBy = signal ?? received;
  if (dieBy) {
    // Die by the signal, as a shell expects (and skipping Node's exit-time terminal reset,
    // which asserts when the terminal has gone away).
    process.removeAllListeners(dieBy);
    process.kill(process.pid, dieBy);
  } else {
    process.exit(code ?? 0);
  }
});
