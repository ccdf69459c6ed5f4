// `npm test`: install what is needed, then lint, typecheck, backend unit, backend e2e, frontend
// unit, the build, backend process tests (crash, two servers, load smoke) and browser journeys. Every suite runs even when an earlier one fails; the summary lists
// each, and the exit code is non-zero on any failure.
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ensureInstalled, npm } from './lib.mjs';

const CHROMIUM = '/usr/bin/chromium';
// The browser journeys need Debian's chromium, and pdftoppm (poppler-utils) to render the first
// page of a calc package to an image.
const TOOLS = [
  { path: CHROMIUM, pkg: 'chromium' },
  { path: '/usr/bin/pdftoppm', pkg: 'poppler-utils' },
];
const reports = mkdtempSync(join(tmpdir(), 'tiermode-test-'));

async function ensureBrowserTools() {
  const missing = TOOLS.filter((t) => !existsSync(t.path));
  if (missing.length === 0) return true;
  const packages = missing.map((t) => t.pkg);
  if (process.getuid?.() !== 0) {
    console.error(
      `Missing ${missing.map((t) => t.path).join(', ')}: apt-get install ${packages.join(' ')}`,
    );
    return false;
  }
  console.log(`Installing Debian's ${packages.join(' and ')} for the browser journeys…`);
  try {
    const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
    execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
    execFileSync('apt-get', ['install', '-y', '-qq', ...packages], { stdio: 'inherit', env });
    return TOOLS.every((t) => existsSync(t.path));
  } catch (error) {
    console.error(`apt-get could not install ${packages.join(' ')}: ${error.message}`);
    return false;
  }
}

/** Reads a Jest-style JSON report (Jest and Vitest both write one). */
function counts(file) {
  try {
    const report = JSON.parse(readFileSync(file, 'utf8'));
    return {
      passed: report.numPassedTests ?? 0,
      failed: report.numFailedTests ?? 0,
      skipped: (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0),
    };
  } catch {
    return null;
  }
}

const results = [];

async function step(name, args, reportFile) {
  console.log(`\n=== ${name} ===`);
  const code = await npm(args);
  const tally = reportFile ? counts(reportFile) : null;
  // A runner that exits 0 but skipped tests, or wrote no report, has not passed.
  const ok =
    code === 0 && (!reportFile || (tally !== null && tally.skipped === 0 && tally.passed > 0));
  results.push({ name, ok, code, tally });
  return ok;
}

const jestReport = (name) => ['--json', `--outputFile=${join(reports, `${name}.json`)}`];
const vitestReport = (name) => [
  '--reporter=default',
  '--reporter=json',
  `--outputFile.json=${join(reports, `${name}.json`)}`,
];

await ensureInstalled();
const haveBrowserTools = await ensureBrowserTools();

await step('Build shared-types', ['run', 'build', '-w', 'shared-types']);
await step('Lint', ['run', 'lint']);
await step('Typecheck', ['run', 'typecheck']);
await step(
  'Backend unit',
  ['run', 'test', '-w', 'backend', '--', ...jestReport('backend-unit')],
  join(reports, 'backend-unit.json'),
);
await step(
  'Backend e2e',
  ['run', 'test:e2e', '-w', 'backend', '--', ...jestReport('backend-e2e')],
  join(reports, 'backend-e2e.json'),
);
await step(
  'Frontend unit',
  ['run', 'test', '-w', 'frontend', '--', ...vitestReport('frontend-unit')],
  join(reports, 'frontend-unit.json'),
);
const built = await step('Build backend and frontend', ['run', 'build']);
if (built) {
  // The built server as child processes: crash (SIGKILL) and two-server tests, the load smoke run.
  await step(
    'Backend processes',
    ['run', 'test:processes', '-w', 'backend', '--', ...jestReport('backend-processes')],
    join(reports, 'backend-processes.json'),
  );
} else {
  results.push({ name: 'Backend processes', ok: false, code: null, tally: null });
}
if (built && haveBrowserTools) {
  await step(
    'Browser journeys',
    ['run', 'test:e2e', '-w', 'frontend', '--', ...vitestReport('journeys')],
    join(reports, 'journeys.json'),
  );
} else {
  results.push({ name: 'Browser journeys', ok: false, code: null, tally: null });
  console.error(
    `\nBrowser journeys not run: ${built ? 'chromium or pdftoppm is missing' : 'the build failed'}.`,
  );
}

let passed = 0;
let failed = 0;
console.log('\n=== Summary ===');
for (const r of results) {
  const detail = r.tally
    ? `${r.tally.passed} passed, ${r.tally.failed} failed${r.tally.skipped ? `, ${r.tally.skipped} skipped` : ''}`
    : r.code === null
      ? 'not run'
      : `exit ${r.code}`;
  console.log(`${r.ok ? 'ok  ' : 'FAIL'}  ${r.name.padEnd(28)} ${detail}`);
  if (r.tally) {
    passed += r.tally.passed;
    failed += r.tally.failed;
  }
  if (!r.ok && (!r.tally || r.tally.failed === 0)) failed += 1;
}
console.log(`\ntests: ${passed} passed, ${failed} failed`);
process.exit(results.every((r) => r.ok) ? 0 : 1);
