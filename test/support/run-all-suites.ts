/**
 * `npm test`: type check, lint, unit/validation/property/storage tests (vitest), production build,
 * browser tests (Playwright on the build). Ends with one line `N passed, N failed` over all suites
 * and exits non-zero when anything failed or when no test ran.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';

interface Tally {
	passed: number;
	failed: number;
}

const results = 'test-results';
mkdirSync(results, { recursive: true });
const total: Tally = { passed: 0, failed: 0 };

function run(title: string, command: string, args: string[]): boolean {
	console.log(`\n=== ${title} ===`);
	const outcome = spawnSync(command, args, { stdio: 'inherit', env: process.env });
	return outcome.status === 0;
}

function readJson(path: string): unknown {
	try {
		return JSON.parse(readFileSync(path, 'utf8'));
	} catch {
		return null;
	}
}

// 1. Type check counts as one check: a type error is a failure like any other.
const typed =
	run('type check', 'npx', ['svelte-kit', 'sync']) &&
	run('svelte-check', 'npx', [
		'svelte-check',
		'--tsconfig',
		'./tsconfig.json',
		'--threshold',
		'error'
	]);
total[typed ? 'passed' : 'failed'] += 1;

// 2. Lint (ESLint, with the engine's layering rules) counts as one check too. Formatting is not
// checked here: `npm run format:check` reports it on its own.
total[run('lint', 'npm', ['run', '--silent', 'lint']) ? 'passed' : 'failed'] += 1;

// 3. Engine, storage, validation and property tests.
const unitFile = `${results}/unit-results.json`;
rmSync(unitFile, { force: true });
const unitOk = run('unit, validation, property and storage tests', 'npx', [
	'vitest',
	'run',
	'--reporter=default',
	'--reporter=json',
	`--outputFile=${unitFile}`
]);
const unit = readJson(unitFile) as { numPassedTests?: number; numFailedTests?: number } | null;
total.passed += unit?.numPassedTests ?? 0;
total.failed += unit?.numFailedTests ?? 0;
if (!unitOk && !unit?.numFailedTests) total.failed += 1; // the runner itself failed

// 4. Browser tests run against the production build: prerendering and the worker exist only there.
const browser = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (!existsSync(browser)) {
	console.error(
		`\nNo browser found at ${browser}. Browser tests need Chromium:\n` +
			'  Debian/Ubuntu:  sudo apt-get install chromium\n' +
			'  elsewhere:      set CHROMIUM_PATH to a Chromium or Chrome binary\n'
	);
	total.failed += 1;
} else if (!run('production build', 'npx', ['vite', 'build'])) {
	total.failed += 1;
} else {
	const e2eFile = `${results}/e2e-results.json`;
	rmSync(e2eFile, { force: true });
	const e2eOk = run('browser tests', 'npx', ['playwright', 'test']);
	const e2e = readJson(e2eFile) as {
		stats?: { expected: number; unexpected: number; flaky: number };
	} | null;
	total.passed += (e2e?.stats?.expected ?? 0) + (e2e?.stats?.flaky ?? 0);
	total.failed += e2e?.stats?.unexpected ?? 0;
	if (!e2eOk && !e2e?.stats?.unexpected) total.failed += 1;
}

console.log(`\n${total.passed} passed, ${total.failed} failed`);
// The type check and lint alone are not a test run.
process.exitCode = total.failed > 0 || total.passed <= 2 ? 1 : 0;
