/**
 * The engine is pure TypeScript: it runs the same in the browser, in Node for the command line and
 * in tests. Nothing under src/lib/engine may import Svelte, SvelteKit, idb or other app modules, or
 * touch the DOM, storage, timers or the clock.
 */
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

const ENGINE = 'src/lib/engine';

function sourceFiles(dir: string): string[] {
	return readdirSync(dir).flatMap((name) => {
		const path = join(dir, name);
		if (statSync(path).isDirectory()) return sourceFiles(path);
		return /\.(ts|js)$/.test(name) ? [path] : [];
	});
}

const FORBIDDEN_IMPORTS = [/^svelte(\/|$)/, /^\$app\//, /^\$lib\//, /^idb(\/|$)/, /^node:/, /^fake-indexeddb/];
const FORBIDDEN_GLOBALS =
	/\b(window|document|localStorage|sessionStorage|indexedDB|navigator|setTimeout|setInterval|requestAnimationFrame|fetch)\b|\bDate\.now\(|\bnew Date\(\)|\$state|\$derived|\$effect/;

function stripComments(code: string): string {
	return code.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:])\/\/.*$/gm, '$1');
}

describe('engine purity', () => {
	const files = sourceFiles(ENGINE);

	it('has engine sources to check', () => {
		expect(files.length).toBeGreaterThan(3);
	});

	it('imports only engine modules', () => {
		const offenders = files.flatMap((file) => {
			const code = readFileSync(file, 'utf8');
			const pattern = /(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g;
			const specifiers = [...code.matchAll(pattern)].map((m) => m[1] ?? m[2]);
			return specifiers
				.filter((s) => FORBIDDEN_IMPORTS.some((rule) => rule.test(s)))
				.map((s) => `${file}: ${s}`);
		});
		expect(offenders).toEqual([]);
	});

	it('does not touch the DOM, storage, timers or the clock', () => {
		const offenders = files.flatMap((file) => {
			const hit = stripComments(readFileSync(file, 'utf8')).match(FORBIDDEN_GLOBALS)?.[0];
			return hit ? [`${file}: ${hit}`] : [];
		});
		expect(offenders).toEqual([]);
	});

	it('the purity rule itself catches a forbidden import and a DOM global', () => {
		expect(FORBIDDEN_IMPORTS.some((rule) => rule.test('svelte/store'))).toBe(true);
		expect(FORBIDDEN_IMPORTS.some((rule) => rule.test('idb'))).toBe(true);
		expect(FORBIDDEN_GLOBALS.test('const el = document.body')).toBe(true);
		expect(FORBIDDEN_GLOBALS.test('const x = mToMm(span)')).toBe(false);
	});
});
