import { defineConfig, devices } from '@playwright/test';
import { existsSync } from 'node:fs';

/** Debian's chromium by default; CHROMIUM_PATH points elsewhere. No browser download is ever made. */
const executablePath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
// A private copy of the build on another port keeps repeat runs apart from other work on the machine.
const port = process.env.E2E_PORT ?? '4173';
const buildDir = process.env.BUILD_DIR ?? 'build';
if (!existsSync(executablePath)) {
	throw new Error(
		`No browser at ${executablePath}. Install Debian's chromium (apt-get install chromium) ` +
			'or set CHROMIUM_PATH to a Chromium or Chrome binary.'
	);
}

export default defineConfig({
	testDir: 'test/e2e',
	testMatch: '**/*.e2e.ts',
	outputDir: 'test-results/e2e',
	fullyParallel: false,
	// Two cores: one browser at a time keeps timings stable.
	workers: 1,
	retries: 0,
	reporter: [['list'], ['json', { outputFile: 'test-results/e2e-results.json' }]],
	timeout: 60_000,
	use: {
		...devices['Pixel 7'],
		baseURL: `http://localhost:${port}`,
		serviceWorkers: 'allow',
		launchOptions: {
			executablePath,
			args: [
				'--no-sandbox',
				'--disable-gpu',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync',
				'--no-first-run'
			]
		}
	},
	webServer: {
		command: 'npx tsx src/cli/serve-build.ts',
		url: `http://localhost:${port}`,
		reuseExistingServer: !process.env.CI,
		env: { PORT: port, HOST: '127.0.0.1', BUILD_DIR: buildDir }
	}
});
