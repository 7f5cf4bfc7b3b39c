/**
 * Fuzzing the door of the engine: arbitrary JSON and mutated valid cases through parseCase and
 * checkCase. Whatever arrives, the outcome is input problems that each carry a message, or a sound
 * report: no throw, no NaN or Infinity anywhere in it, no `pass` without a capacity number, and an
 * answer within a generous time (common practice for software that must never hang on input).
 * Small beams and few runs keep the suite fast; CI runs a fixed seed (test/support).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/lib/engine/case/index';
import { checkCase } from '../../src/lib/engine/index';

/** Generous bound on one case, ms: a stall, not a speed test. */
const TIME_BOUND = 5000;

/** A valid small case built from random choices (invented numbers). */
const validCase = fc
	.record({
		spans: fc.array(
			fc.integer({ min: 2, max: 80 }).map((d) => d / 10),
			{
				minLength: 1,
				maxLength: 3
			}
		),
		left: fc.constantFrom('pin', 'fixed', 'free'),
		right: fc.constantFrom('pin', 'fixed', 'free'),
		inner: fc.constantFrom('pin', 'fixed'),
		joint: fc.constantFrom('continuous', 'simple'),
		section: fc.constantFrom<object>(
			{ designation: 'UB 305x165x40' },
			{ designation: 'SHS 100x100x8.0' },
			{ mp: 80, mass: 30 },
			{ shape: 'I', h: 300, b: 150, tw: 7, tf: 10, r: 12 }
		),
		value: fc.double({ min: 0.5, max: 60, noNaN: true }),
		at: fc.double({ min: 0, max: 1, noNaN: true }),
		action: fc.constantFrom('permanent', 'imposed', 'temporary'),
		restraint: fc.constantFrom<object | undefined>(undefined, { lateral: 'continuous' })
	})
	.map((r) => {
		const n = r.spans.length;
		const total = r.spans.reduce((s, L) => s + L, 0);
		const supports = [r.left, ...new Array(n - 1).fill(r.inner), r.right];
		if (supports.every((s) => s === 'free')) supports[0] = 'pin';
		return {
			format: 'hingepoint.case',
			version: 1,
			title: 'DEMO — fuzz',
			beam: {
				spans: r.spans,
				supports,
				joints: new Array(n - 1).fill(r.joint),
				section: r.section,
				grade: 'S275',
				...(r.restraint ? { restraint: r.restraint } : {})
			},
			loads: [
				{
					kind: 'point',
					x: Math.round(r.at * total * 100) / 100,
					value: r.value,
					action: 'temporary'
				},
				{ kind: 'uniform', from: 0, to: total, value: r.value / 10, action: r.action }
			]
		} as Record<string, unknown>;
	});

/** Values JSON.parse can hand over, including the extremes that once broke the engine. */
const wildValue = fc.oneof(
	fc.jsonValue({ maxDepth: 3 }),
	fc.constantFrom(
		Infinity,
		-Infinity,
		1e308,
		-1e308,
		1e-320,
		-0,
		0,
		Number.MAX_SAFE_INTEGER,
		'constructor',
		'__proto__',
		'',
		[],
		{},
		null
	)
);

/** Every path to a value inside a JSON tree, as key lists. */
function listPaths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
	const out: (string | number)[][] = prefix.length > 0 ? [prefix] : [];
	if (value && typeof value === 'object') {
		for (const [k, v] of Object.entries(value)) {
			out.push(...listPaths(v, [...prefix, Array.isArray(value) ? Number(k) : k]));
		}
	}
	return out;
}

/** A mutation of a valid case: set, delete, or add an unknown key, at a path chosen by index. */
const mutation = fc.record({
	kind: fc.constantFrom('set', 'delete', 'add'),
	pick: fc.nat(),
	key: fc.constantFrom('extra', 'constructor', 'toString', 'x', 'mp', 'label'),
	value: wildValue
});

/** A drawn mutation. */
type Mutation = { kind: string; pick: number; key: string; value: unknown };

function mutate(original: Record<string, unknown>, m: Mutation): unknown {
	// A copy: fast-check must be able to show and shrink the values it drew.
	const c = structuredClone(original);
	const paths = listPaths(c);
	const path = paths[m.pick % paths.length];
	let node: any = c;
	for (const k of path.slice(0, -1)) node = node[k];
	const last = path[path.length - 1];
	if (m.kind === 'delete') {
		if (Array.isArray(node)) node.splice(Number(last), 1);
		else delete node[last];
	} else if (m.kind === 'add' && node[last] && typeof node[last] === 'object') {
		node[last][m.key] = m.value;
	} else {
		node[last] = m.value;
	}
	return c;
}

/** Paths of numbers in a value that are not finite. */
function findNonFinite(value: unknown, path = 'report'): string[] {
	if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
	if (!value || typeof value !== 'object') return [];
	return Object.entries(value).flatMap(([k, v]) => findNonFinite(v, `${path}.${k}`));
}

/** Runs one input and checks everything the door promises. */
function expectSoundOutcome(json: unknown): void {
	const t0 = performance.now();
	const out = checkCase(json);
	expect(performance.now() - t0).toBeLessThan(TIME_BOUND);
	if (!out.ok) {
		expect(out.issues.length).toBeGreaterThan(0);
		for (const issue of out.issues) {
			expect(typeof issue.path).toBe('string');
			expect(issue.message.length).toBeGreaterThan(0);
			expect(issue.severity).toBe('error');
		}
		return;
	}
	expect(findNonFinite(out.report)).toEqual([]);
	const answer = (out.report as any).answer ?? out.report;
	if (answer.verdict === 'pass') {
		const capacity = [answer.multiplier, answer.utilisation].filter((v) => typeof v === 'number');
		expect(capacity.length).toBeGreaterThan(0);
	}
}

describe('fuzzing the case file', () => {
	it('arbitrary JSON: issues with messages, never a throw', () => {
		fc.assert(
			fc.property(fc.jsonValue({ maxDepth: 6 }), (json) => {
				expectSoundOutcome(json);
				expect(parseCase(json).ok).toBe(false);
			}),
			{ numRuns: 200 }
		);
	});

	it('valid small cases are sound', () => {
		fc.assert(fc.property(validCase, expectSoundOutcome), { numRuns: 40 });
	});

	it('a valid case with one field set, deleted or given an unknown key: sound', () => {
		fc.assert(
			fc.property(validCase, mutation, (c, m) => expectSoundOutcome(mutate(c, m))),
			{ numRuns: 120 }
		);
	});
});
