/**
 * Searches that try many hinge capacities (the shear reduction at hinges on the plastic route)
 * read only λ of each trial (`solveCollapseLoadFactor`) and certify the answer they settle on.
 * λ alone must be the certified solver's λ: by the static theorem (B.G. Neal, "The Plastic
 * Methods of Structural Analysis", from memory) the collapse factor is the optimum of the static
 * program, which both read; 0 where the fixed loads alone fail, null where the variable loads can
 * never cause collapse. Random beams are invented demo data (fast-check, seeded).
 *
 * The search may skip the margin program of a trial: a field that carries the fixed loads alone
 * within (1 − δ)·Mp of the full capacity is statically admissible for any capacity that keeps at
 * least (1 − δ) of it everywhere, so the fixed loads cannot fail there (static theorem again).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	solveCollapse,
	solveCollapseLoadFactor,
	type CollapseResult
} from '../../src/lib/engine/collapse';
import { keepsFixedLoadField, reduceCapacity } from '../../src/lib/engine/checks/capacity';
import { measureFixedLoadMargin } from '../../src/lib/engine/collapse';
import { arbitraryBeamSpec } from '../unit/collapse/arbitraries';
import { makeProblem, relativeError } from '../unit/collapse/builders';

function factorOf(r: CollapseResult): number | null {
	if (r.status === 'fails-under-fixed') return 0;
	if (r.status === 'unbounded') return null;
	return r.loadFactor;
}

describe('the collapse load factor alone', () => {
	it('equals the certified solve’s λ, its 0 under failing fixed loads and its “unbounded”', () => {
		const seen = { mechanism: 0, fails: 0 };
		fc.assert(
			fc.property(arbitraryBeamSpec({ interiorFixed: true }), (spec) => {
				const problem = makeProblem(spec);
				const full = solveCollapse(problem);
				if (full.status === 'not-certified') return;
				const alone = solveCollapseLoadFactor(problem);
				const expected = factorOf(full);
				if (expected === null || expected === 0) {
					expect(alone).toBe(expected);
					if (expected === 0) seen.fails++;
					return;
				}
				seen.mechanism++;
				expect(alone).not.toBeNull();
				expect(relativeError(alone!, expected)).toBeLessThanOrEqual(1e-9);
			}),
			{ numRuns: 200, seed: 1202 }
		);
		expect(seen.mechanism).toBeGreaterThan(100);
	});

	it('skips the margin program only where a fixed-load field is known to fit, with the same λ', () => {
		let skipped = 0;
		const cut = fc.record({
			at: fc.double({ min: 0, max: 1, noNaN: true }),
			// Near a hinge as on the plastic route, or along the whole beam.
			width: fc.oneof(fc.integer({ min: 100, max: 900 }), fc.constant(Infinity)),
			// Share of the fixed loads' margin the reduction takes (1 and more: none is left).
			take: fc.double({ min: 0, max: 1.3, noNaN: true })
		});
		fc.assert(
			fc.property(arbitraryBeamSpec({ interiorFixed: true }), cut, (spec, c) => {
				const problem = makeProblem(spec);
				const margin = measureFixedLoadMargin(problem);
				if (!(margin > 0)) return;
				const total = problem.beam.spans.reduce((a, b) => a + b, 0);
				const x = c.at * total;
				const peak = Math.max(...problem.capacity.map((s) => Math.max(s.sagging, s.hogging)));
				const capacity = reduceCapacity(problem.capacity, {
					from: x - c.width / 2,
					to: x + c.width / 2,
					value: (1 - c.take * margin) * peak
				});
				if (!keepsFixedLoadField(problem.capacity, capacity, margin)) return;
				skipped++;
				const reduced = { ...problem, capacity };
				expect(measureFixedLoadMargin(reduced)).toBeGreaterThanOrEqual(-1e-12);
				const fast = solveCollapseLoadFactor(reduced, { fixedLoadsFit: true });
				const full = solveCollapseLoadFactor(reduced);
				if (full === null || full === 0) expect(fast).toBe(full);
				else expect(relativeError(fast!, full)).toBeLessThanOrEqual(1e-12);
			}),
			{ numRuns: 200, seed: 1203 }
		);
		expect(skipped).toBeGreaterThan(50);
	});
});
