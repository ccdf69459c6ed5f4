// Helpers for the root scripts (start, test, dev). Plain Node so they run before any install.
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..');
const NPM = process.platform === 'win32' ? 'npm.cmd' : 'npm';

/** Runs a command with the terminal attached; resolves with its exit code. */
export function run(command, args, options = {}) {
  return new Promise((resolve) => {
    const child = spawn(command, args, { cwd: ROOT, stdio: 'inherit', ...options });
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
    child.on('error', (error) => {
      console.error(`Could not start ${command}: ${error.message}`);
      resolve(1);
    });
  });
}

export const npm = (args, options) => run(NPM, args, options);

/** Exits with the command's code when it fails. */
export async function must(label, promise) {
  const code = await promise;
  if (code !== 0) {
    console.error(`\n${label} failed (exit ${code}).`);
    process.exit(code);
  }
}

/**
 * Installs the workspaces when node_modules is missing or package-lock.json changed since the
 * last install (a stamp inside node_modules remembers the lock file's hash); otherwise does nothing.
 */
export async function ensureInstalled() {
  const lock = join(ROOT, 'package-lock.json');
  const stamp = join(ROOT, 'node_modules', '.tiermode-install-stamp');
  const hash = existsSync(lock)
    ? createHash('sha256').update(readFileSync(lock)).update(process.version).digest('hex')
    : 'no-lock-file';
  if (existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === hash) return;
  console.log(
    'Installing the workspaces (the first time, sqlite3 compiles from source: about a minute)…',
  );
  await must(
    'npm install',
    npm(existsSync(lock) ? ['ci', '--no-audit', '--no-fund'] : ['install']),
  );
  writeFileSync(stamp, `${hash}\n`);
}
