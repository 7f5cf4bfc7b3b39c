/**
 * Searches that try many hinge capacities (the shear reduction at hinges on the plastic route)
 * read only λ of each trial (`solveCollapseLoadFactor`) and certify the answer they settle on.
 * λ alone must be the certified solver's λ: by the static theorem (B.G. Neal, "The Plastic
 * Methods of Structural Analysis", from memory) the collapse factor is the optimum of the static
 * program, which both read; 0 where the fixed loads alone fail, null where the variable loads can
 * never cause collapse. Random beams are invented demo data (fast-check, seeded).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	solveCollapse,
	solveCollapseLoadFactor,
	type CollapseResult
} from '../../src/lib/engine/collapse';
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
});
