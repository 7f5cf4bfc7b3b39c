/**
 * One number, one meaning, on random valid beams (invented: one to three spans, pinned, built-in
 * or free ends, every restraint, point and line loads of every action, S275/S355 and an
 * unconfirmed old steel that puts the beam outside scope):
 * - the answer's multiplier is the smallest multiplier over the checks that decide the verdict
 *   (a deciding check the proposed load does not affect allows none when it already fails);
 * - no other capacity in the report exceeds it: each allowable load is multiplier × entered, the
 *   plastic collapse (a partial result) is never below it, and the bending row equals the
 *   collapse where the plastic route decides;
 * - pass exactly when the multiplier is at least 1;
 * - outside scope the report carries no capacity number anywhere, and no check row says "pass";
 * - the governing capacity curve at a single proposed point load's own position equals the
 *   answer for that load, and its least value is not above it (deflection deciding or not).
 * These follow from the definitions in the engine's theory note ("The answer"), not from
 * published tables.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkCase, type CheckReport } from '../../src/lib/engine/index';

const loadArb = fc.record({
	kind: fc.constantFrom('point', 'uniform'),
	a: fc.double({ min: 0, max: 1, noNaN: true }),
	b: fc.double({ min: 0, max: 1, noNaN: true }),
	v: fc.double({ min: 0.5, max: 40, noNaN: true }),
	action: fc.constantFrom('permanent', 'imposed', 'temporary')
});

const beamArb = fc
	.record({
		spans: fc.array(fc.double({ min: 1.5, max: 7, noNaN: true }), { minLength: 1, maxLength: 3 }),
		left: fc.constantFrom('pin', 'fixed', 'free'),
		right: fc.constantFrom('pin', 'fixed'),
		designation: fc.constantFrom('UB 305x165x40', 'UC 203x203x46', 'IPE 300', 'UB 457x152x52'),
		grade: fc.constantFrom('S275', 'S355', 'unknown-old'),
		restraint: fc.constantFrom('continuous', 'ends-only', undefined),
		loads: fc.array(loadArb, { minLength: 1, maxLength: 3 }),
		hoist: fc.option(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { nil: undefined }),
		// Deflection decides only when the settings say so (the curve must then count it too).
		deflectionGoverns: fc.boolean()
	})
	.filter((o) => !(o.spans.length === 1 && o.left === 'free' && o.right !== 'fixed'));

type Beam = typeof beamArb extends fc.Arbitrary<infer T> ? T : never;

function build(o: Beam) {
	const total = o.spans.reduce((s, L) => s + L, 0);
	const loads = o.loads.map((l) => {
		const [p, q] = [Math.min(l.a, l.b) * total, Math.max(l.a, l.b) * total];
		if (l.kind === 'point') return { kind: 'point', x: p, value: l.v, action: l.action };
		const to = Math.max(q, Math.min(total, p + 0.2));
		return { kind: 'uniform', from: Math.min(p, to - 0.1), to, value: l.v / 4, action: l.action };
	});
	if (o.hoist !== undefined) {
		loads.push({ kind: 'point', x: o.hoist * total, value: 10, action: 'temporary' });
	}
	return {
		format: 'hingepoint.case',
		version: 1,
		beam: {
			spans: o.spans,
			supports: [o.left, ...o.spans.slice(1).map(() => 'pin'), o.right],
			section: { designation: o.designation },
			grade: o.grade,
			...(o.restraint ? { restraint: { lateral: o.restraint } } : {})
		},
		loads,
		...(o.deflectionGoverns ? { deflectionGoverns: true } : {})
	};
}

/** The multiplier a deciding row allows, by the answer's stated rule. */
function rowAllows(c: CheckReport['checks'][number]): number {
	if (c.multiplier !== null) return Math.max(0, c.multiplier);
	return c.pass ? Infinity : 0;
}

/** Every key that names a capacity, anywhere in a plain data tree, with a number in it. */
function findCapacityNumbers(value: unknown, path = 'report'): string[] {
	const names =
		/^(multiplier|reserve|loadFactor|allowable|mpRd|vRd|mbRd|fRd|myVRd|lowerBound|upperBound|p)$/;
	if (Array.isArray(value)) return value.flatMap((v, i) => findCapacityNumbers(v, `${path}[${i}]`));
	if (value && typeof value === 'object') {
		return Object.entries(value).flatMap(([k, v]) => {
			const here = names.test(k) && (typeof v === 'number' || (Array.isArray(v) && v.length > 0));
			return [...(here ? [`${path}.${k}`] : []), ...findCapacityNumbers(v, `${path}.${k}`)];
		});
	}
	return [];
}

describe('one answer', () => {
	it('the multiplier is the least over the deciding checks, and no other capacity exceeds it', () => {
		let decided = 0;
		let outside = 0;
		fc.assert(
			fc.property(beamArb, (o) => {
				const out = checkCase(build(o));
				if (!out.ok) return;
				const r = out.report;
				const a = r.answer;
				if (a.verdict === 'outside-scope') {
					outside++;
					expect(findCapacityNumbers({ ...r, case: null })).toEqual([]);
					expect(r.checks.some((c) => c.pass)).toBe(false);
					expect(a.reasons.length).toBeGreaterThan(0);
					expect(r.summary.long).not.toMatch(/Largest proposed load|reserve/);
					return;
				}
				if (a.verdict === null) return;
				decided++;
				const deciding = r.checks.filter((c) => c.level === 'governing');
				const least = Math.min(...deciding.map(rowAllows));
				if (a.multiplier === null) expect(least).toBe(Infinity);
				else {
					expect(a.multiplier).toBe(least);
					expect(a.verdict === 'pass').toBe(a.multiplier >= 1);
					for (const l of a.allowable) {
						if (l.value !== null)
							expect(l.value).toBeCloseTo(a.multiplier * Math.abs(l.entered), 9);
					}
				}
				const bending = r.checks.find((c) => c.id === 'bending');
				if (r.collapse?.decides && bending) expect(bending.multiplier).toBe(r.collapse.loadFactor);
				if (r.collapse?.loadFactor != null && a.multiplier !== null) {
					expect(a.multiplier).toBeLessThanOrEqual(r.collapse.loadFactor * (1 + 1e-9));
				}
			}),
			{ numRuns: 40 }
		);
		expect(decided).toBeGreaterThan(5);
		expect(outside).toBeGreaterThan(0);
	});

	it('the curve at a single proposed point load equals the answer for it; its least value is not above it', () => {
		const single = beamArb.map((o) => ({
			...o,
			spans: o.spans.slice(0, 2),
			loads: o.loads.filter((l) => l.action !== 'temporary'),
			hoist: o.hoist ?? 0.4,
			grade: o.grade === 'unknown-old' ? 'S275' : o.grade
		}));
		fc.assert(
			fc.property(single, (o) => {
				const out = checkCase(build(o), { curve: true });
				if (!out.ok) return;
				const r = out.report;
				const a = r.answer;
				if (a.verdict !== 'pass' && a.verdict !== 'fail') return;
				const value = a.allowable[0].value;
				const curve = r.capacityCurve!;
				const x = o.hoist * o.spans.reduce((s, L) => s + L, 0);
				const here = curve.points.find((p) => Math.abs(p.x - x) < 1e-9);
				expect(here).toBeDefined();
				if (value === null) return expect(here!.p).toBeNull();
				// The same design run at the same size: equal, not merely close.
				expect(here!.p).toBe(value);
				expect(curve.min!.p).toBeLessThanOrEqual(value);
			}),
			{ numRuns: 8 }
		);
	});
});
