/**
 * Speed of a full design check (runDesignChecks) with the app's default restraint — compression
 * flange held only at the supports, load on the top flange — and imposed load patterned span by
 * span, and of the governing capacity curve (checkCase with `curve: true`: one design run per
 * position). Medians printed beside each target, never asserted. Demo data (invented).
 *
 * The ratio column compares with the engine as it was before the speed work: the bench
 * extracts that commit's `src/lib/engine` with `git archive` into node_modules/.cache (once)
 * and runs the same cases through it in the same process. BENCH_BASE=<commit> picks another
 * base; BENCH_BASE=none skips the comparison (the old path takes about a minute).
 */
import { execSync } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { parseCase } from '../../src/lib/engine/case/parse-case';
import { buildDesignCheckInput } from '../../src/lib/engine/checks/from-case';
import { runDesignChecks } from '../../src/lib/engine/checks/run-checks';
import { checkCase } from '../../src/lib/engine/index';
import { medianMs } from './median';

/** The last commit before the speed work. */
const DEFAULT_BASE = '77cf218';

type Engine = {
	parse: (json: unknown) => unknown;
	run: (input: unknown) => unknown;
	/** The whole case with its governing capacity curve. */
	curve: (json: unknown) => unknown;
};

const restraint = { lateral: 'ends-only', loadHeight: 'top-flange' };

function beamCase(n: number, set: string, loads: unknown[]) {
	return {
		format: 'hingepoint.case',
		version: 1,
		beam: {
			spans: Array.from({ length: n }, () => 6),
			supports: Array.from({ length: n + 1 }, () => 'pin'),
			section: { designation: 'UB 305x165x40' },
			grade: 'S275',
			restraint
		},
		loads: [
			{ kind: 'uniform', from: 0, to: 6 * n, value: 3, action: 'permanent' },
			{ kind: 'uniform', from: 0, to: 6 * n, value: 4, action: 'imposed' },
			...loads
		],
		factors: { set }
	};
}

const point = (x: number, value: number, action = 'temporary') => ({
	kind: 'point',
	x,
	value,
	action
});

/** 20 extra loads over 6 spans: alternately existing and temporary point loads. */
const twenty = Array.from({ length: 20 }, (_, i) =>
	point(0.2 + (i * 36) / 21, 2 + (i % 3), i % 2 ? 'temporary' : 'permanent')
);
/** 198 small temporary point loads on one span (the case format allows 200 loads in all). */
const twoHundred = Array.from({ length: 198 }, (_, i) => point(0.01 + (i * 5.98) / 197, 0.1));

const CASES: { name: string; target: number; json: unknown; curve?: boolean }[] = [
	{ name: '1 span', target: 10, json: beamCase(1, 'en1990-6.10', [point(3, 20)]) },
	{ name: '3 spans, patterned', target: 50, json: beamCase(3, 'en1990-6.10', [point(3, 20)]) },
	{ name: '6 spans, 20 loads, 6.10a/b', target: 150, json: beamCase(6, 'en1990-6.10ab', twenty) },
	{
		name: '200 loads on one span (198 + 2)',
		target: 100,
		json: beamCase(1, 'en1990-6.10', twoHundred)
	},
	{
		name: 'governing curve, 3 spans',
		target: 300,
		json: beamCase(3, 'en1990-6.10', [point(3, 20)]),
		curve: true
	}
];

async function loadBase(commit: string): Promise<Engine | null> {
	const dir = join('node_modules', '.cache', 'hingepoint-bench', commit);
	if (!existsSync(join(dir, 'src'))) {
		mkdirSync(dir, { recursive: true });
		execSync(`git archive ${commit} src/lib/engine | tar -x -C ${dir}`);
	}
	const url = (p: string) => pathToFileURL(join(process.cwd(), dir, p)).href;
	const parse = await import(url('src/lib/engine/case/parse-case.ts'));
	const from = await import(url('src/lib/engine/checks/from-case.ts'));
	const run = await import(url('src/lib/engine/checks/run-checks.ts'));
	const index = await import(url('src/lib/engine/index.ts'));
	return {
		curve: (json) => index.checkCase(json, { curve: true }),
		parse: (json) => {
			const p = parse.parseCase(json);
			if (!p.ok) throw new Error('bench case invalid (base)');
			return from.buildDesignCheckInput(p.value);
		},
		run: (input) => run.runDesignChecks(input)
	};
}

const current: Engine = {
	curve: (json) => checkCase(json, { curve: true }),
	parse: (json) => {
		const p = parseCase(json);
		if (!p.ok) throw new Error(`bench case invalid: ${JSON.stringify(p.issues)}`);
		return buildDesignCheckInput(p.value);
	},
	run: (input) => runDesignChecks(input as Parameters<typeof runDesignChecks>[0])
};

function time(engine: Engine, c: (typeof CASES)[number], runs: number, warmup: number): number {
	if (c.curve) return medianMs(() => engine.curve(c.json), runs, warmup);
	const input = engine.parse(c.json);
	return medianMs(() => engine.run(input), runs, warmup);
}

/** The first run of a case in a fresh process, before the JIT has seen it (a cold start). */
function timeFirst(c: (typeof CASES)[number]): number {
	const start = performance.now();
	if (c.curve) current.curve(c.json);
	else current.run(current.parse(c.json));
	return performance.now() - start;
}

export async function runDesignBench(): Promise<void> {
	const commit = process.env.BENCH_BASE ?? DEFAULT_BASE;
	const base = commit === 'none' ? null : await loadBase(commit);
	// The first case run in this process, cold (JIT not warm): what the first check after opening
	// the app meets. The table below is of warm medians (the app runs the engine again at every edit).
	console.log(`cold first run, ${CASES[0].name}: ${timeFirst(CASES[0]).toFixed(1)} ms`);
	console.log(`case | target ms | median ms | base ${commit} ms | speed-up`);
	for (const c of CASES) {
		// Warm-up runs let the JIT settle; the curve is long enough to settle within one.
		const now = c.curve ? time(current, c, 5, 1) : time(current, c, 9, 3);
		const old = base ? time(base, c, 1, 0) : NaN;
		const ratio = base ? `${(old / now).toFixed(1)}×` : '—';
		console.log(
			`${c.name} | ${c.target} | ${now.toFixed(1)} | ${base ? old.toFixed(0) : '—'} | ${ratio}`
		);
	}
}
