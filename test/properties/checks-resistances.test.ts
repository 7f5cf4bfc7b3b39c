/**
 * Invariants of the resistance formulas: χLT of EN 1993-1-1 6.3.2.2/6.3.2.3 lies in (0, 1] and
 * never rises with slenderness (eqs. 6.56, 6.57, from memory); ρ of 6.2.8 rises with the shear
 * and My,V,Rd falls; the web resistance of EN 1993-1-5 6 grows with the stiff bearing length;
 * load arrangements number 2 × 2^k per combination (EN 1990 A1.3.1 patterns, as specified).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	computeChiGeneral,
	computeChiRolled,
	IMPERFECTION_FACTORS
} from '../../src/lib/engine/checks/en1993/ltb-curves';
import {
	computeReducedMomentResistance,
	computeShearReduction
} from '../../src/lib/engine/checks/en1993/interaction';
import { computeWebResistance } from '../../src/lib/engine/checks/en1993/web';
import { resolveFactors } from '../../src/lib/engine/checks/en1993/factors';
import { listLoadArrangements } from '../../src/lib/engine/checks/load-arrangements';
import { findMultiplierAtCapacity } from '../../src/lib/engine/checks/root-find';

const alpha = fc.constantFrom(...Object.values(IMPERFECTION_FACTORS));
const slender = fc.double({ min: 0, max: 4, noNaN: true });

describe('χLT', () => {
	it('is in (0, 1] and non-increasing in λ̄LT for both methods', () => {
		fc.assert(
			fc.property(alpha, slender, slender, (a, l1, l2) => {
				const [lo, hi] = l1 <= l2 ? [l1, l2] : [l2, l1];
				for (const f of [computeChiGeneral, computeChiRolled]) {
					const c1 = f({ lambdaBar: lo, alpha: a });
					const c2 = f({ lambdaBar: hi, alpha: a });
					expect(c1).toBeGreaterThan(0);
					expect(c1).toBeLessThanOrEqual(1);
					expect(c2).toBeLessThanOrEqual(c1 + 1e-15);
				}
			})
		);
	});
});

describe('bending and shear', () => {
	it('more shear never raises My,V,Rd', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				(a, b) => {
					const vplRd = 300e3;
					const [v1, v2] = a <= b ? [a * vplRd, b * vplRd] : [b * vplRd, a * vplRd];
					const m = (v: number) =>
						computeReducedMomentResistance({
							Wpl: 623e3,
							Aw: 1698,
							tw: 6,
							fy: 275,
							gammaM0: 1,
							rho: computeShearReduction({ vEd: v, vplRd })
						});
					expect(m(v2)).toBeLessThanOrEqual(m(v1));
				}
			)
		);
	});
});

describe('web resistance', () => {
	it('grows with the stiff bearing length for every load type', () => {
		fc.assert(
			fc.property(
				fc.constantFrom('a', 'b', 'c') as fc.Arbitrary<'a' | 'b' | 'c'>,
				fc.double({ min: 0, max: 300, noNaN: true }),
				fc.double({ min: 0, max: 300, noNaN: true }),
				(type, s1, s2) => {
					const base = {
						type,
						hw: 283,
						tw: 6,
						bf: 165,
						tf: 10.2,
						fyw: 275,
						fyf: 275,
						E: 210e3,
						gammaM1: 1
					};
					const [lo, hi] = s1 <= s2 ? [s1, s2] : [s2, s1];
					expect(computeWebResistance({ ...base, ss: hi }).fRd).toBeGreaterThanOrEqual(
						computeWebResistance({ ...base, ss: lo }).fRd * (1 - 1e-12)
					);
				}
			)
		);
	});
});

describe('load arrangements', () => {
	it('number 2 × 2^k per combination and are all distinct', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 1, max: 6 }),
				fc.constantFrom('en1990-6.10', 'en1990-6.10ab', 'custom') as fc.Arbitrary<
					'en1990-6.10' | 'en1990-6.10ab' | 'custom'
				>,
				(n, set) => {
					const k = Math.min(n, 4);
					const f = resolveFactors({ set }, { hasImposed: true });
					const list = listLoadArrangements({
						combinations: f.combinations,
						spanCount: n,
						imposedSpans: [...Array(k).keys()]
					});
					expect(list).toHaveLength(f.combinations.length * 2 * 2 ** k);
					expect(new Set(list.map((a) => a.name)).size).toBe(list.length);
				}
			)
		);
	});
});

describe('multiplier search', () => {
	it('finds the root of any increasing affine utilisation', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 0, max: 0.99, noNaN: true }),
				fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
				(a, b) => {
					const t = findMultiplierAtCapacity({ utilisation: (x) => a + b * x })!;
					expect(Math.abs(t - (1 - a) / b)).toBeLessThanOrEqual(1e-6 * ((1 - a) / b) + 1e-12);
				}
			)
		);
	});
});
