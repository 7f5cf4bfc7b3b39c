/**
 * EN 1993-1-1:2005 6.2.8, bending and shear: no reduction while VEd ≤ 0.5·Vpl,Rd; above it
 * ρ = (2VEd/Vpl,Rd − 1)² (the rule and ρ as quoted in "Steel Buildings in Europe", single-storey
 * design guide Part 10, 6.3.6) and, for I sections with equal flanges about the major axis,
 * My,V,Rd = (Wpl,y − ρ·Aw²/(4tw))·fy/γM0 ≤ My,c,Rd (eq. 6.30, from memory).
 * Section: 305x165x40 UB S275 (BS 4-1 dimensions; Wpl,y 623 cm³, SCI P363, from memory).
 */
import { describe, expect, it } from 'vitest';
import {
	computeReducedMomentResistance,
	computeShearReduction
} from '../../src/lib/engine/checks/en1993/interaction';
import { expectRel } from '../support/expect-rel';

const vplRd = (2006.76 * 275) / Math.sqrt(3); // eq. 6.18 with Av of 6.2.6(3)(a)
const Aw = (303.4 - 2 * 10.2) * 6; // hw·tw = 1698 mm²
const section = { Wpl: 623e3, Aw, tw: 6, fy: 275, gammaM0: 1 };

describe('ρ (EN 1993-1-1 6.2.8(3))', () => {
	it('is 0 up to and at VEd = 0.5·Vpl,Rd', () => {
		expect(computeShearReduction({ vEd: 0, vplRd })).toBe(0);
		expect(computeShearReduction({ vEd: 0.5 * vplRd, vplRd })).toBe(0);
	});

	it('is (2VEd/Vpl,Rd − 1)² above, reaching 1 at VEd = Vpl,Rd', () => {
		const vEd = 200e3;
		expectRel(computeShearReduction({ vEd, vplRd }), ((2 * vEd) / vplRd - 1) ** 2, 1e-12);
		expectRel(computeShearReduction({ vEd, vplRd }), 0.06524, 1e-3);
		expectRel(computeShearReduction({ vEd: vplRd, vplRd }), 1, 1e-12);
	});

	it('ignores the sign of the shear', () => {
		expect(computeShearReduction({ vEd: -250e3, vplRd })).toBe(
			computeShearReduction({ vEd: 250e3, vplRd })
		);
	});
});

describe('My,V,Rd (EN 1993-1-1 eq. 6.30)', () => {
	it('VEd = 200 kN: 169.17 kNm against Mpl,Rd 171.33 kNm (eq. 6.30 computed)', () => {
		const rho = computeShearReduction({ vEd: 200e3, vplRd });
		const expected = ((623e3 - (rho * Aw * Aw) / (4 * 6)) * 275) / 1;
		expectRel(computeReducedMomentResistance({ ...section, rho }), expected, 1e-12);
		expectRel(computeReducedMomentResistance({ ...section, rho }), 169.17e6, 2e-4);
	});

	it('VEd = 280 kN: 152.36 kNm (eq. 6.30 computed)', () => {
		const rho = computeShearReduction({ vEd: 280e3, vplRd });
		expectRel(computeReducedMomentResistance({ ...section, rho }), 152.36e6, 2e-4);
	});

	it('equals Mpl,Rd when ρ = 0 and never exceeds it', () => {
		expectRel(computeReducedMomentResistance({ ...section, rho: 0 }), 623e3 * 275, 1e-12);
		expect(computeReducedMomentResistance({ ...section, rho: -0.5 })).toBeLessThanOrEqual(
			623e3 * 275
		);
	});
});
