/**
 * EN 1993-1-5:2006 section 6, resistance of webs to transverse forces, for unstiffened webs
 * (stiffener spacing a → ∞). Clause and equation numbers from memory: FRd = fyw·Leff·tw/γM1
 * (6.1), Leff = χF·ly (6.2), χF = 0.5/λ̄F ≤ 1 (6.3), λ̄F = √(ly·tw·fyw/Fcr) (6.4),
 * Fcr = 0.9·kF·E·tw³/hw (6.5), kF of Figure 6.1 = 6 + 2(hw/a)² (a), 3.5 + 2(hw/a)² (b),
 * 2 + 6(ss + c)/hw ≤ 6 (c) (6.6), m1 = fyf·bf/(fyw·tw) (6.8), m2 = 0.02(hw/tf)² if λ̄F > 0.5
 * else 0 (6.9), ly = ss + 2tf(1 + √(m1 + m2)) for (a) and (b) (6.10), for (c) the smaller of
 * (6.11) and (6.12) with le of (6.13); ss ≤ hw (6.3(2)). The closed forms are evaluated here.
 * Sections: 305x165x40 UB and 254x254x73 UC, BS 4-1:2005 dimensions.
 */
import { describe, expect, it } from 'vitest';
import { computeWebResistance } from '../../src/lib/engine/checks/en1993/web';
import { expectRel } from '../support/expect-rel';

const E = 210_000;
const ub = { hw: 303.4 - 2 * 10.2, tw: 6, bf: 165, tf: 10.2, fyw: 275, fyf: 275, E, gammaM1: 1 };
const uc = { hw: 254.1 - 2 * 14.2, tw: 8.6, bf: 254.6, tf: 14.2, fyw: 275, fyf: 275, E, gammaM1: 1 };

/** Independent evaluation of 6.1–6.10 for types (a) and (b). */
function byHand(s: typeof ub, kF: number, ss: number) {
	const fCr = (0.9 * kF * E * s.tw ** 3) / s.hw;
	const m1 = (s.fyf * s.bf) / (s.fyw * s.tw);
	const ly = (m2: number) => ss + 2 * s.tf * (1 + Math.sqrt(m1 + m2));
	const lam = (l: number) => Math.sqrt((l * s.tw * s.fyw) / fCr);
	let l = ly(0.02 * (s.hw / s.tf) ** 2);
	if (lam(l) <= 0.5) l = ly(0);
	const chi = Math.min(1, 0.5 / lam(l));
	return { fCr, ly: l, lambdaF: lam(l), fRd: s.fyw * chi * l * s.tw };
}

describe('type (a): point load through one flange, resisted by web shear', () => {
	it('305x165x40 UB, ss = 50 mm: λ̄F > 0.5 so m2 counts; FRd ≈ 270 kN', () => {
		const r = computeWebResistance({ ...ub, type: 'a', ss: 50 });
		const hand = byHand(ub, 6, 50);
		expect(r.kF).toBe(6);
		expectRel(r.fCr, hand.fCr, 1e-12);
		expectRel(r.ly, hand.ly, 1e-12);
		expect(r.lambdaF).toBeGreaterThan(0.5);
		expectRel(r.m2, 0.02 * (ub.hw / ub.tf) ** 2, 1e-12);
		expectRel(r.fRd, hand.fRd, 1e-12);
		expectRel(r.fRd, 270e3, 5e-3);
	});

	it('254x254x73 UC, ss = 100 mm: λ̄F ≤ 0.5, so m2 = 0 and χF = 1 (no reduction)', () => {
		const r = computeWebResistance({ ...uc, type: 'a', ss: 100 });
		const hand = byHand(uc, 6, 100);
		expect(r.m2).toBe(0);
		expect(r.chiF).toBe(1);
		expectRel(r.fRd, hand.fRd, 1e-12);
		expectRel(r.fRd, uc.fyw * r.ly * uc.tw, 1e-12);
	});

	it('takes ss no longer than hw', () => {
		const capped = computeWebResistance({ ...ub, type: 'a', ss: 10 * ub.hw });
		const atHw = computeWebResistance({ ...ub, type: 'a', ss: ub.hw });
		expect(capped.fRd).toBe(atHw.fRd);
	});
});

describe('type (b): load passed straight through the web', () => {
	it('uses kF = 3.5 and the same ly as (a)', () => {
		const r = computeWebResistance({ ...ub, type: 'b', ss: 50 });
		const hand = byHand(ub, 3.5, 50);
		expect(r.kF).toBe(3.5);
		expectRel(r.fRd, hand.fRd, 1e-12);
		expect(r.fRd).toBeLessThan(computeWebResistance({ ...ub, type: 'a', ss: 50 }).fRd);
	});
});

describe('type (c): load next to an unstiffened end', () => {
	it('kF = 2 + 6(ss + c)/hw, capped at 6; ly the smaller of 6.11 and 6.12', () => {
		const ss = 100;
		const r = computeWebResistance({ ...ub, type: 'c', ss, c: 0 });
		const kF = 2 + (6 * ss) / ub.hw;
		expectRel(r.kF, kF, 1e-12);
		const fCr = (0.9 * kF * E * ub.tw ** 3) / ub.hw;
		const m1 = (ub.fyf * ub.bf) / (ub.fyw * ub.tw);
		const m2 = r.lambdaF > 0.5 ? 0.02 * (ub.hw / ub.tf) ** 2 : 0;
		const le = Math.min((kF * E * ub.tw ** 2) / (2 * ub.fyw * ub.hw), ss);
		const ly = Math.min(
			le + ub.tf * Math.sqrt(m1 / 2 + (le / ub.tf) ** 2 + m2),
			le + ub.tf * Math.sqrt(m1 + m2)
		);
		expectRel(r.fCr, fCr, 1e-12);
		expectRel(r.ly, ly, 1e-12);
		expect(computeWebResistance({ ...ub, type: 'c', ss: 200, c: 400 }).kF).toBe(6);
	});

	it('an end bearing is weaker than the same bearing away from the end', () => {
		const end = computeWebResistance({ ...ub, type: 'c', ss: 100, c: 0 }).fRd;
		const inner = computeWebResistance({ ...ub, type: 'a', ss: 100 }).fRd;
		expect(end).toBeLessThan(inner);
	});
});

describe('γM1', () => {
	it('divides the resistance', () => {
		const a = computeWebResistance({ ...ub, type: 'a', ss: 50 }).fRd;
		const b = computeWebResistance({ ...ub, type: 'a', ss: 50, gammaM1: 1.1 }).fRd;
		expectRel(b, a / 1.1, 1e-12);
	});
});
