/**
 * The engine is pure TypeScript: it runs the same in the browser, in Node for the command line and
 * in tests. Nothing under src/lib/engine may import Svelte, SvelteKit, idb or other app modules, or
 * touch the DOM, storage, timers or the clock. Inside the engine, two layers are kept apart: the
 * report writes up a finished run and loads no analysis code, and basis-neutral design code names
 * no design standard. eslint.config.js carries the same rules for the editor.
 */
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import ts from 'typescript';

const ENGINE = 'src/lib/engine';
const CHECKS = `${ENGINE}/checks`;

function sourceFiles(dir: string): string[] {
	return readdirSync(dir).flatMap((name) => {
		const path = join(dir, name);
		if (statSync(path).isDirectory()) return sourceFiles(path);
		return /\.(ts|js)$/.test(name) ? [path] : [];
	});
}

interface ImportUse {
	specifier: string;
	/**
	 * True when nothing is loaded at run time: `import type`, `export type`, `import('…').Type`.
	 * `import { type A } from` is not: with verbatimModuleSyntax it still loads the module.
	 */
	typeOnly: boolean;
}

/** Every module a source file names: imports, re-exports, dynamic imports and import types. */
function listImports(file: string, code: string): ImportUse[] {
	const source = ts.createSourceFile(file, code, ts.ScriptTarget.Latest, true);
	const found: ImportUse[] = [];
	const visit = (node: ts.Node): void => {
		if (ts.isImportDeclaration(node) && ts.isStringLiteral(node.moduleSpecifier)) {
			const typeOnly = node.importClause?.isTypeOnly ?? false;
			found.push({ specifier: node.moduleSpecifier.text, typeOnly });
		} else if (
			ts.isExportDeclaration(node) &&
			node.moduleSpecifier &&
			ts.isStringLiteral(node.moduleSpecifier)
		) {
			found.push({ specifier: node.moduleSpecifier.text, typeOnly: node.isTypeOnly });
		} else if (ts.isCallExpression(node) && node.expression.kind === ts.SyntaxKind.ImportKeyword) {
			const [target] = node.arguments;
			if (target && ts.isStringLiteralLike(target)) {
				found.push({ specifier: target.text, typeOnly: false });
			}
		} else if (
			ts.isImportTypeNode(node) &&
			ts.isLiteralTypeNode(node.argument) &&
			ts.isStringLiteral(node.argument.literal)
		) {
			found.push({ specifier: node.argument.literal.text, typeOnly: true });
		}
		ts.forEachChild(node, visit);
	};
	visit(source);
	return found;
}

/** The repository path a relative specifier points at, or null for a package or alias. */
function resolveSpecifier(file: string, specifier: string): string | null {
	return specifier.startsWith('.') ? join(dirname(file), specifier) : null;
}

function isUnder(path: string | null, dir: string): boolean {
	return path !== null && (path === dir || path.startsWith(`${dir}/`));
}

/** Why an engine file may not import `specifier`, or null when it may. */
function engineImportProblem(file: string, specifier: string): string | null {
	const target = resolveSpecifier(file, specifier);
	if (target === null) return 'a package or app alias';
	if (!isUnder(target, ENGINE)) return 'outside the engine';
	return null;
}

const ANALYSIS = ['checks', 'collapse', 'elastic'].map((folder) => `${ENGINE}/${folder}`);

/** True when a report file would load analysis code at run time through this import. */
function loadsAnalysis(file: string, use: ImportUse): boolean {
	const target = resolveSpecifier(file, use.specifier);
	return !use.typeOnly && ANALYSIS.some((dir) => isUnder(target, dir));
}

/** True when a basis-neutral checks file reaches into the EN 1993 folder (types included). */
function namesEn1993(file: string, use: ImportUse): boolean {
	return isUnder(resolveSpecifier(file, use.specifier), `${CHECKS}/en1993`);
}

/** The one basis-neutral file allowed to name a basis folder: the registry of bases. */
const BASIS_REGISTRY = `${CHECKS}/bases.ts`;

/**
 * Imports (`file: specifier`) by which a basis-neutral checks file still names EN 1993 while its
 * types move behind bases.ts. Remove an entry when its import goes; the list is meant to stay empty.
 * A new entry is not the fix for a failing test: import through bases.ts or a neutral type instead.
 */
const NEUTRAL_CHECKS_ALLOWED: string[] = [];

const FORBIDDEN_GLOBALS =
	/\b(window|document|localStorage|sessionStorage|indexedDB|navigator|setTimeout|setInterval|requestAnimationFrame|fetch)\b|\bDate\.now\(|\bnew Date\(\)|\$state|\$derived|\$effect/;

function stripComments(code: string): string {
	return code.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:])\/\/.*$/gm, '$1');
}

function importsOf(file: string): ImportUse[] {
	return listImports(file, readFileSync(file, 'utf8'));
}

describe('engine purity', () => {
	const files = sourceFiles(ENGINE);

	it('has engine sources to check', () => {
		expect(files.length).toBeGreaterThan(3);
	});

	it('imports only engine modules', () => {
		const offenders = files.flatMap((file) =>
			importsOf(file).flatMap(({ specifier }) => {
				const problem = engineImportProblem(file, specifier);
				return problem ? [`${file}: ${specifier} (${problem})`] : [];
			})
		);
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
		const file = `${ENGINE}/checks/shear-check.ts`;
		expect(engineImportProblem(file, 'svelte/store')).not.toBeNull();
		expect(engineImportProblem(file, 'idb')).not.toBeNull();
		expect(engineImportProblem(file, '$lib/storage/db')).not.toBeNull();
		expect(engineImportProblem(file, '../../ui/format/units')).not.toBeNull();
		expect(engineImportProblem(file, '../units')).toBeNull();
		expect(engineImportProblem(file, './en1993/shear')).toBeNull();
		expect(FORBIDDEN_GLOBALS.test('const el = document.body')).toBe(true);
		expect(FORBIDDEN_GLOBALS.test('const x = mToMm(span)')).toBe(false);
	});
});

describe('engine layering', () => {
	it('the report loads no analysis code at run time (type imports are fine)', () => {
		const offenders = sourceFiles(`${ENGINE}/report`).flatMap((file) =>
			importsOf(file)
				.filter((use) => loadsAnalysis(file, use))
				.map((use) => `${file}: ${use.specifier}`)
		);
		expect(offenders).toEqual([]);
	});

	const neutralFiles = readdirSync(CHECKS)
		.filter((name) => name.endsWith('.ts'))
		.map((name) => `${CHECKS}/${name}`)
		.filter((file) => file !== BASIS_REGISTRY);
	const neutralOffenders = neutralFiles.flatMap((file) =>
		importsOf(file)
			.filter((use) => namesEn1993(file, use))
			.map((use) => `${file}: ${use.specifier}`)
	);

	it('basis-neutral checks code imports nothing from en1993 except through bases.ts', () => {
		expect(neutralFiles.length).toBeGreaterThan(3);
		const unexpected = neutralOffenders.filter((o) => !NEUTRAL_CHECKS_ALLOWED.includes(o));
		expect(unexpected).toEqual([]);
	});

	it('the list of files still naming en1993 holds only current offenders', () => {
		const gone = NEUTRAL_CHECKS_ALLOWED.filter((entry) => !neutralOffenders.includes(entry));
		// An import has moved behind bases.ts: delete its entry from NEUTRAL_CHECKS_ALLOWED.
		expect(gone).toEqual([]);
	});

	it('the layering rules tell a value import from a type import', () => {
		const report = `${ENGINE}/report/build-report.ts`;
		const code = [
			"import type { DesignOutcome } from '../checks/run-design';",
			"import { type Answer } from '../checks/answer';",
			"import { solveCollapse } from '../collapse/solve';",
			"export { momentAt } from '../elastic/index';",
			"type Lazy = import('../elastic/index').LocatedValue;",
			"import { nToKN } from '../units';"
		].join('\n');
		const loaded = listImports(report, code)
			.filter((use) => loadsAnalysis(report, use))
			.map((use) => use.specifier);
		expect(loaded).toEqual(['../checks/answer', '../collapse/solve', '../elastic/index']);

		const neutral = `${CHECKS}/run-design.ts`;
		const named = listImports(
			neutral,
			"import type { Combination } from './en1993/factors';\nimport { spanOf } from './plastic-bending';"
		).filter((use) => namesEn1993(neutral, use));
		expect(named.map((use) => use.specifier)).toEqual(['./en1993/factors']);
	});
});
