// ESLint flat config: recommended JavaScript, TypeScript and Svelte rules, tuned to stay quiet on
// sound code, and the engine's layering rules (see test/unit/engine-purity.test.ts for the same
// rules as a test). Formatting is Prettier's job, not ESLint's.
import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import { defineConfig } from 'eslint/config';
import globals from 'globals';
import ts from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

const ENGINE = 'src/lib/engine';

/** Anything not relative: packages, `$lib`, `$app`, `node:` built-ins. */
const NO_PACKAGES = {
	regex: '^[^.]',
	message: 'The engine is pure TypeScript: it imports only its own modules, by relative path.'
};

/** A relative path that climbs out of the engine from a file `depth` folders below it. */
function noEscape(depth) {
	return {
		regex: `^(\\.\\./){${depth + 1}}`,
		message: 'The engine imports nothing from outside src/lib/engine.'
	};
}

/** The report writes up a finished run: it may name analysis types but never run analysis code. */
const REPORT_RUNS_NOTHING = {
	regex: '^\\.\\./(checks|collapse|elastic)(/|$)',
	allowTypeImports: true,
	message: 'The report imports types only from checks, collapse and elastic: it analyses nothing.'
};

/** One block per folder depth below the engine, each with the escape pattern for that depth. */
function engineLayering() {
	const folders = ['', '*/', '*/*/', '*/*/*/'];
	const blocks = folders.map((folder, depth) => ({
		name: `hingepoint/engine-layering-depth-${depth}`,
		files: [`${ENGINE}/${folder}*.ts`],
		rules: {
			'no-restricted-imports': ['error', { patterns: [NO_PACKAGES, noEscape(depth)] }]
		}
	}));
	// A later block replaces the rule's options, so the report block repeats the engine patterns.
	blocks.push({
		name: 'hingepoint/report-layering',
		files: [`${ENGINE}/report/*.ts`],
		rules: {
			'no-restricted-imports': [
				'error',
				{ patterns: [NO_PACKAGES, noEscape(1), REPORT_RUNS_NOTHING] }
			]
		}
	});
	return blocks;
}

export default defineConfig(
	{
		ignores: [
			'build/',
			'.svelte-kit/',
			'node_modules/',
			'test-results/',
			'playwright-report/',
			'test/.output/',
			'static/'
		]
	},
	js.configs.recommended,
	ts.configs.recommended,
	svelte.configs.recommended,
	{
		languageOptions: {
			globals: { ...globals.browser, ...globals.node }
		}
	},
	{
		files: ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'],
		languageOptions: {
			parserOptions: {
				extraFileExtensions: ['.svelte'],
				parser: ts.parser,
				svelteConfig
			}
		}
	},
	{
		rules: {
			// The app is always served from the site root (no paths.base) and its links carry query
			// strings (/check?id=…): wrapping every href in resolve() would add noise, not safety.
			'svelte/no-navigation-without-resolve': 'off',
			// With verbatimModuleSyntax, `import { type A } from 'x'` still loads 'x' at run time; write
			// `import type { A }` so a type-only import stays type-only (the layering test relies on it).
			'@typescript-eslint/no-import-type-side-effects': 'error',
			// `_`-prefixed names mark an argument or binding kept on purpose (a callback's shape).
			'@typescript-eslint/no-unused-vars': [
				'error',
				{
					argsIgnorePattern: '^_',
					varsIgnorePattern: '^_',
					caughtErrorsIgnorePattern: '^_',
					destructuredArrayIgnorePattern: '^_'
				}
			]
		}
	},
	{
		// Tests build malformed, untyped input on purpose (a case file with a text span, a missing
		// field): `any` says exactly that there.
		files: ['test/**/*.ts'],
		rules: { '@typescript-eslint/no-explicit-any': 'off' }
	},
	{
		name: 'hingepoint/engine-purity',
		files: [`${ENGINE}/**/*.ts`],
		rules: {
			'no-restricted-globals': [
				'error',
				...[
					'window',
					'document',
					'localStorage',
					'sessionStorage',
					'indexedDB',
					'navigator',
					'setTimeout',
					'setInterval',
					'requestAnimationFrame',
					'fetch'
				].map((name) => ({ name, message: 'The engine touches no DOM, storage or timers.' }))
			],
			'no-restricted-properties': [
				'error',
				{ object: 'Date', property: 'now', message: 'The engine does not read the clock.' }
			]
		}
	},
	engineLayering(),
	{
		// Basis-neutral design code names no design standard; the basis registry (bases.ts) is the one
		// place that may.
		name: 'hingepoint/checks-basis-neutral',
		files: [`${ENGINE}/checks/*.ts`],
		ignores: [`${ENGINE}/checks/bases.ts`],
		rules: {
			'@typescript-eslint/no-restricted-imports': [
				'error',
				{
					patterns: [
						{
							regex: '^\\./en1993(/|$)',
							message: 'Basis-neutral checks code imports no EN 1993 module (only bases.ts may).'
						}
					]
				}
			]
		}
	}
);
