/**
 * EN 1993-1-1:2005 6.2.6, plastic shear resistance: Av for rolled I/H sections
 * (6.2.6(3)(a): A − 2b·tf + (tw + 2r)·tf ≥ η·hw·tw), Vpl,Rd = Av(fy/√3)/γM0 (eq. 6.18), and the
 * shear-buckling limit hw/tw ≤ 72ε/η (6.2.6(6)). The Av expression and eq. 6.18 as quoted in the
 * explanatory notes of the SCI "Blue Book" P363; clause numbers and the 6.2.6(6) limit from memory.
 * Section data: BS 4-1:2005 dimensions, tabulated area from SCI P363 (from memory).
 */
import { describe, expect, it } from 'vitest';
import {
	checkWebSlenderness,
	computePlasticShearResistance,
	computeShearArea
} from '../../src/lib/engine/checks/en1993/shear';
import { expectRel } from '../support/expect-rel';

// 305x165x40 UB: h 303.4, b 165.0, tw 6.0, tf 10.2, r 8.9 (BS 4-1), A 51.3 cm² (SCI P363, from memory).
const ub305 = { shape: 'I' as const, A: 5130, h: 303.4, b: 165, tw: 6, tf: 10.2, r: 8.9 };
// 457x191x67 UB: h 453.4, b 189.9, tw 8.5, tf 12.7, r 10.2, A 85.5 cm² (same sources).
const ub457 = { shape: 'I' as const, A: 8550, h: 453.4, b: 189.9, tw: 8.5, tf: 12.7, r: 10.2 };

describe('shear area of rolled I sections (EN 1993-1-1 6.2.6(3)(a))', () => {
	it('305x165x40 UB: Av = A − 2b·tf + (tw + 2r)·tf, above η·hw·tw for η = 1.0 and 1.2', () => {
		const formula = 5130 - 2 * 165 * 10.2 + (6 + 2 * 8.9) * 10.2;
		expectRel(computeShearArea({ ...ub305, eta: 1 })!, formula, 1e-12);
		expectRel(computeShearArea({ ...ub305, eta: 1 })!, 2006.8, 1e-4); // 6.2.6(3)(a), computed
		// η·hw·tw = 1.2 × 283 × 6 = 2037.6 mm² exceeds the formula value: the floor governs.
		expectRel(computeShearArea({ ...ub305, eta: 1.2 })!, 1.2 * (303.4 - 20.4) * 6, 1e-12);
	});

	it('welded I uses η·hw·tw, CHS 2A/π and RHS A·h/(b + h) (EN 1993-1-1 6.2.6(3), from memory)', () => {
		const welded = { ...ub305, shape: 'welded-I' as const, r: 0, eta: 1.2 };
		expectRel(computeShearArea(welded)!, 1.2 * 283 * 6, 1e-12);
		const chs = { shape: 'CHS' as const, A: 1717, h: 114.3, b: 114.3, tw: 5, tf: 5, r: 0, eta: 1 };
		expectRel(computeShearArea(chs)!, (2 * 1717) / Math.PI, 1e-12);
		const rhs = { shape: 'RHS' as const, A: 3579, h: 200, b: 100, tw: 6.3, tf: 6.3, r: 0, eta: 1 };
		expectRel(computeShearArea(rhs)!, (3579 * 200) / 300, 1e-12);
	});

	it('has no shear area when only Mp is known', () => {
		expect(computeShearArea({ ...ub305, shape: 'known-mp', eta: 1 })).toBeNull();
	});
});

describe('Vpl,Rd = Av(fy/√3)/γM0 (EN 1993-1-1 eq. 6.18)', () => {
	it('305x165x40 UB S275: 318.6 kN; S355: 411.3 kN (eq. 6.18 computed)', () => {
		const Av = computeShearArea({ ...ub305, eta: 1 })!;
		expectRel(
			computePlasticShearResistance({ Av, fy: 275, gammaM0: 1 }),
			(Av * 275) / Math.sqrt(3),
			1e-12
		);
		expectRel(computePlasticShearResistance({ Av, fy: 275, gammaM0: 1 }), 318.6e3, 2e-4);
		expectRel(computePlasticShearResistance({ Av, fy: 355, gammaM0: 1 }), 411.3e3, 2e-4);
	});

	it('divides by γM0', () => {
		const v1 = computePlasticShearResistance({ Av: 2000, fy: 275, gammaM0: 1 });
		expectRel(computePlasticShearResistance({ Av: 2000, fy: 275, gammaM0: 1.1 }), v1 / 1.1, 1e-12);
	});
});

describe('shear buckling limit hw/tw ≤ 72ε/η (EN 1993-1-1 6.2.6(6), from memory)', () => {
	it('305x165x40 UB S275 passes with η = 1.0 (47.2 against 66.6)', () => {
		const r = checkWebSlenderness({ hw: 283, tw: 6, fy: 275, eta: 1 });
		expectRel(r.limit, 72 * Math.sqrt(235 / 275), 1e-12);
		expect(r.needsShearBucklingCheck).toBe(false);
	});

	it('457x191x67 UB S355 with η = 1.2 needs the EN 1993-1-5 check (50.4 > 48.8)', () => {
		const hw = ub457.h - 2 * ub457.tf;
		const r = checkWebSlenderness({ hw, tw: ub457.tw, fy: 355, eta: 1.2 });
		expectRel(r.ratio, 50.4, 2e-3);
		expectRel(r.limit, (72 * Math.sqrt(235 / 355)) / 1.2, 1e-12);
		expect(r.needsShearBucklingCheck).toBe(true);
		expect(checkWebSlenderness({ hw, tw: ub457.tw, fy: 355, eta: 1 }).needsShearBucklingCheck).toBe(
			false
		);
	});

	it('is exactly at the limit when hw/tw = 72ε/η (boundary not exceeded)', () => {
		const limit = 72 * Math.sqrt(235 / 235);
		expect(
			checkWebSlenderness({ hw: limit * 5, tw: 5, fy: 235, eta: 1 }).needsShearBucklingCheck
		).toBe(false);
		expect(
			checkWebSlenderness({ hw: limit * 5 + 0.01, tw: 5, fy: 235, eta: 1 }).needsShearBucklingCheck
		).toBe(true);
	});
});
