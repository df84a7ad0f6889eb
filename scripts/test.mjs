// `npm test`: lint (ESLint, zero warnings, layer boundaries), then unit + API + component tests
// (Vitest), then a production build and the
// end-to-end specs (Playwright in Debian's Chromium). Prints one closing summary line.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';

const root = new URL('..', import.meta.url).pathname;
const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (!existsSync(chromium)) {
  console.error(
    `\nChromium was not found at ${chromium}.\n` +
      'The end-to-end tests use Debian\'s Chromium. Install it with:\n' +
      '  apt-get update && apt-get install -y chromium\n' +
      'or point CHROMIUM_PATH at a Chromium binary. The tests use that system browser only.\n',
  );
  process.exit(1);
}

const outDir = join(root, '.tmp', 'test-reports');
rmSync(outDir, { recursive: true, force: true });
mkdirSync(outDir, { recursive: true });
const run = (cmd, args, env = {}) =>
  spawnSync(cmd, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } }).status ?? 1;

let passed = 0;
let failed = 0;
const read = (file) => (existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : null);

const lintStatus = run('npx', ['eslint', '.', '--max-warnings', '0']);
if (lintStatus !== 0) {
  console.error('Lint failed (see above); the tests still run so every failure shows at once.');
  failed += 1;
}

const unitStatus = run('npx', [
  'vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${join(outDir, 'vitest.json')}`,
]);
const unit = read(join(outDir, 'vitest.json'));
if (unit) {
  passed += unit.numPassedTests;
  failed += unit.numFailedTests;
}

let e2eStatus = 1;
const buildStatus = run('npx', ['vite', 'build', '--logLevel', 'warn']);
if (buildStatus === 0) {
  e2eStatus = run('npx', ['playwright', 'test', '-c', 'e2e/playwright.config.ts'], {
    PLAYWRIGHT_JSON_OUTPUT_NAME: join(outDir, 'playwright.json'),
  });
  const e2e = read(join(outDir, 'playwright.json'));
  if (e2e?.stats) {
    passed += e2e.stats.expected;
    failed += e2e.stats.unexpected;
  }
} else {
  console.error('The production build failed; end-to-end tests were not run.');
  failed += 1;
}

const ok = lintStatus === 0 && unitStatus === 0 && buildStatus === 0 && e2eStatus === 0;
console.log(`\n${passed} passed, ${failed} failed`);
process.exit(ok ? 0 : 1);
