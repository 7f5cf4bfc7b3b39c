/**
 * The checks that are linear in the load groups (elastic shear, web forces with the moment
 * beside them) evaluate only the arrangements the signs of each group's effect pick out
 * (`linear-arrangements.ts`), and lateral-torsional buckling skips the arrangements whose bound
 * on the buckling eigenvalue (Weyl's inequality, `ltb-bound.ts`) keeps them below the worst one
 * found. The whole design check must come out the same as evaluating every arrangement: on
 * random beams (invented: one to four spans, pinned, built-in or free ends, imposed load on
 * some spans, EN 1990 6.10 and 6.10a/b, every restraint kind, most often the compression flange
 * held at the supports only) each row's utilisations and multiplier agree to 1e-9 and so do the
 * verdict and the governing multiplier. The arrangements themselves are those of EN 1990
 * 6.4.3.2 and A1.3.1 (`load-arrangements.ts`).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/lib/engine/case/parse-case';
import { buildDesignCheckInput } from '../../src/lib/engine/checks/from-case';
import { arrangementSelection } from '../../src/lib/engine/checks/linear-arrangements';
import { runDesignChecks } from '../../src/lib/engine/checks/run-checks';
import { expectRel } from '../support/expect-rel';

const beamArb = fc
	.record({
		spans: fc.array(fc.integer({ min: 15, max: 70 }), { minLength: 1, maxLength: 4 }),
		left: fc.constantFrom('pin', 'fixed', 'free'),
		right: fc.constantFrom('pin', 'fixed', 'free'),
		designation: fc.constantFrom('UB 305x165x40', 'UC 203x203x46', 'IPE 300', 'UB 457x152x52'),
		restraint: fc.constantFrom('continuous', 'ends-only', 'ends-only', undefined),
		set: fc.constantFrom('en1990-6.10', 'en1990-6.10ab'),
		g: fc.integer({ min: 0, max: 8 }),
		imposed: fc.array(fc.tuple(fc.nat(), fc.integer({ min: 1, max: 12 })), { maxLength: 4 }),
		imposedPoint: fc.option(
			fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.integer({ min: 1, max: 30 })),
			{
				nil: undefined
			}
		),
		points: fc.array(
			fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.integer({ min: -10, max: 60 })),
			{
				minLength: 1,
				maxLength: 3
			}
		),
		onSupport: fc.boolean(),
		bearing: fc.option(fc.integer({ min: 0, max: 150 }), { nil: undefined })
	})
	.filter((o) => !(o.left === 'free' && o.right === 'free'))
	.filter(
		(o) =>
			!(
				o.spans.length === 1 &&
				(o.left === 'free' || o.right === 'free') &&
				o.left !== 'fixed' &&
				o.right !== 'fixed'
			)
	);

type Beam = typeof beamArb extends fc.Arbitrary<infer T> ? T : never;

function build(o: Beam) {
	const spans = o.spans.map((s) => s / 10);
	const nodes = [0];
	for (const L of spans) nodes.push(nodes[nodes.length - 1] + L);
	const total = nodes[spans.length];
	const loads: unknown[] = [];
	if (o.g) loads.push({ kind: 'uniform', from: 0, to: total, value: o.g, action: 'permanent' });
	for (const [i, q] of o.imposed) {
		const k = i % spans.length;
		loads.push({ kind: 'uniform', from: nodes[k], to: nodes[k + 1], value: q, action: 'imposed' });
	}
	if (o.imposedPoint) {
		loads.push({
			kind: 'point',
			x: o.imposedPoint[0] * total,
			value: o.imposedPoint[1],
			action: 'imposed'
		});
	}
	for (const [t, kN] of o.points) {
		if (kN !== 0) loads.push({ kind: 'point', x: t * total, value: kN, action: 'temporary' });
	}
	// A load straight over an interior support or an end: the web rows that share it.
	if (o.onSupport)
		loads.push({
			kind: 'point',
			x: nodes[Math.floor(spans.length / 2)],
			value: 15,
			action: 'temporary'
		});
	return {
		format: 'hingepoint.case',
		version: 1,
		beam: {
			spans,
			supports: [o.left, ...spans.slice(1).map(() => 'pin'), o.right],
			section: { designation: o.designation },
			grade: 'S275',
			...(o.restraint ? { restraint: { lateral: o.restraint, loadHeight: 'top-flange' } } : {}),
			...(o.bearing !== undefined
				? { bearing: nodes.map(() => o.bearing), bearingLoads: o.bearing }
				: {})
		},
		loads,
		factors: { set: o.set }
	};
}

function run(json: unknown, exhaustive: boolean) {
	const parsed = parseCase(json);
	if (!parsed.ok) return null;
	arrangementSelection.exhaustive = exhaustive;
	try {
		return runDesignChecks(buildDesignCheckInput(parsed.value));
	} finally {
		arrangementSelection.exhaustive = false;
	}
}

const near = (a: number | null | undefined, b: number | null | undefined) => {
	if (b === null || b === undefined) return expect(a ?? null).toBeNull();
	if (!Number.isFinite(b)) return expect(a).toBe(b);
	expectRel(a, b, 1e-9, { absolute: 1e-12 });
};

describe('arrangements picked by sign', () => {
	it('give the same design check as every arrangement on 200 random beams', () => {
		let compared = 0;
		fc.assert(
			fc.property(beamArb, (o) => {
				const json = build(o);
				const fast = run(json, false);
				const all = run(json, true);
				if (!fast || !all) return;
				compared++;
				expect(fast.verdict.verdict).toBe(all.verdict.verdict);
				near(fast.verdict.allowableMultiplier, all.verdict.allowableMultiplier);
				expect(fast.checks.map((c) => c.label)).toEqual(all.checks.map((c) => c.label));
				fast.checks.forEach((c, i) => {
					const a = all.checks[i];
					near(c.utilisation, a.utilisation);
					near(c.utilisationExisting, a.utilisationExisting);
					near(c.multiplierAtCapacity, a.multiplierAtCapacity);
					expect(c.pass).toBe(a.pass);
				});
			}),
			{ numRuns: 200 }
		);
		// Most random cases must be valid, or the comparison says little.
		expect(compared).toBeGreaterThan(150);
	}, 600_000);
});
