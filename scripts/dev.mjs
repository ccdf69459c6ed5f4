// `npm run dev`: the API under watch (nest start --watch) and the Vite dev server, which proxies
// /api to it. Open http://localhost:5173. Ctrl+C stops both.
import { spawn } from 'node:child_process';
import { ensureInstalled, must, npm, ROOT } from './lib.mjs';

await ensureInstalled();
await must('Build shared-types', npm(['run', 'build', '-w', 'shared-types']));
const children = [
  spawn('npm', ['run', 'start:dev', '-w', 'backend'], { cwd: ROOT, stdio: 'inherit' }),
  spawn('npm', ['run', 'dev', '-w', 'frontend'], { cwd: ROOT, stdio: 'inherit' }),
];
const stop = () => children.forEach((child) => child.kill('SIGTERM'));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
children.forEach((child) =>
  child.on('exit', (code) => {
    stop();
    process.exitCode = code ?? 0;
  }),
);
