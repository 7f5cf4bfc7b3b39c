/**
 * AISC 360-22 J10, webs under concentrated forces without stiffeners: J10.2 (J10-2, J10-3),
 * J10.3 (J10-4, J10-5a, J10-5b), J10.4 (J10-6, J10-7, Cr = 960 000 / 480 000 ksi), J10.5 (J10-8)
 * with their φ and Ω — equations and factors from memory of the Specification (engineering
 * reference C.7, tagged "verify"). No published worked example was recalled well enough to
 * quote, so every expected value here is computed by hand from the equations, in kips and
 * inches, for a W18x50 in A992 (AISC Shapes Database v15.0, engineering reference D.3).
 */
import { describe, expect, it } from 'vitest';
import {
	computeWebCompressionBuckling,
	computeWebCrippling,
	computeWebLocalYielding,
	computeWebSideswayBuckling
} from '../../src/lib/engine/checks/aisc360/concentrated';
import { W_PROPS } from '../support/aisc-w-shapes';
import { E_KSI, inch, ksi, toKip } from '../support/us-customary';
import { expectRel } from '../support/expect-rel';

const s = W_PROPS.W18x50;
const FY = 50;
const h = s.d - 2 * s.kdes; // rolled: clear distance between flanges less the fillets
const rn = (r: ReturnType<typeof computeWebCrippling>) => {
	if (!r.applies) throw new Error('expected the limit state to apply');
	return toKip(r.Rn);
};

describe('J10.2 web local yielding (φ 1.00, Ω 1.50)', () => {
	const wly = (lb: number, distanceFromEnd: number) =>
		computeWebLocalYielding({
			Fyw: ksi(FY),
			tw: inch(s.tw),
			k: inch(s.kdes),
			lb: inch(lb),
			d: inch(s.d),
			distanceFromEnd: inch(distanceFromEnd)
		});
	it('interior (more than d from the end): Rn = Fyw·tw·(5k + lb) (J10-2)', () => {
		const r = wly(4, 60);
		expectRel(rn(r), FY * s.tw * (5 * s.kdes + 4), 1e-9);
		expect(r.applies && r.factors).toEqual({ phi: 1.0, omega: 1.5 });
		expect(r.clause).toBe('AISC 360-22 J10.2 (J10-2)');
	});
	it('at d from the end or nearer: Rn = Fyw·tw·(2.5k + lb) (J10-3)', () => {
		expectRel(rn(wly(4, 0)), FY * s.tw * (2.5 * s.kdes + 4), 1e-9);
		expectRel(rn(wly(4, s.d)), FY * s.tw * (2.5 * s.kdes + 4), 1e-9);
		expect(wly(4, s.d).clause).toBe('AISC 360-22 J10.2 (J10-3)');
	});
});

describe('J10.3 web crippling (φ 0.75, Ω 2.00), Qf = 1', () => {
	const S = Math.sqrt((E_KSI * FY * s.tf) / s.tw);
	const r = (s.tw / s.tf) ** 1.5;
	const wc = (lb: number, distanceFromEnd: number) =>
		computeWebCrippling({
			tw: inch(s.tw),
			tf: inch(s.tf),
			d: inch(s.d),
			lb: inch(lb),
			E: ksi(E_KSI),
			Fyw: ksi(FY),
			distanceFromEnd: inch(distanceFromEnd)
		});
	it('at d/2 or more from the end: J10-4', () => {
		expectRel(rn(wc(4, 9)), 0.8 * s.tw ** 2 * (1 + 3 * (4 / s.d) * r) * S, 1e-9);
		expect(wc(4, 9).clause).toBe('AISC 360-22 J10.3 (J10-4)');
	});
	it('nearer the end, lb/d ≤ 0.2: J10-5a, half of J10-4', () => {
		const lb = 3; // lb/d = 0.167
		expectRel(rn(wc(lb, 0)), 0.4 * s.tw ** 2 * (1 + 3 * (lb / s.d) * r) * S, 1e-9);
		expectRel(rn(wc(lb, 0)), rn(wc(lb, 20)) / 2, 1e-9);
	});
	it('nearer the end, lb/d > 0.2: J10-5b; the two end equations meet at lb/d = 0.2', () => {
		const lb = 6; // lb/d = 0.333
		expectRel(rn(wc(lb, 0)), 0.4 * s.tw ** 2 * (1 + (4 * (lb / s.d) - 0.2) * r) * S, 1e-9);
		expect(wc(lb, 0).clause).toBe('AISC 360-22 J10.3 (J10-5b)');
		const at = 0.2 * s.d;
		expectRel(rn(wc(at * (1 + 1e-9), 0)), rn(wc(at, 0)), 1e-7);
	});
});

describe('J10.4 web sidesway buckling (φ 0.85, Ω 1.76)', () => {
	const run = (LbIn: number, restrained: boolean, belowYield = true) =>
		computeWebSideswayBuckling({
			tw: inch(s.tw),
			tf: inch(s.tf),
			h: inch(h),
			bf: inch(s.bf),
			Lb: inch(LbIn),
			compressionFlangeRestrained: restrained,
			momentBelowYield: belowYield
		});
	const rho = (Lb: number) => h / s.tw / (Lb / s.bf);
	it('flange restrained against rotation, ρ ≤ 2.3: J10-6 with Cr = 960 000 ksi', () => {
		const Lb = 120; // ρ = (h/tw)/(Lb/bf) = 45.2/16 = 2.83 > 2.3: does not apply
		expect(rho(Lb)).toBeGreaterThan(2.3);
		expect(run(Lb, true).applies).toBe(false);
		const Lb2 = 200; // ρ = 1.70
		const expected = ((960_000 * s.tw ** 3 * s.tf) / h ** 2) * (1 + 0.4 * rho(Lb2) ** 3);
		expectRel(rn(run(Lb2, true)), expected, 1e-9);
		expect(run(Lb2, true).clause).toBe('AISC 360-22 J10.4 (J10-6)');
	});
	it('flange free to rotate, ρ ≤ 1.7: J10-7; Cr = 480 000 ksi once the moment reaches My', () => {
		const Lb = 240; // ρ = 1.41
		const expected = ((480_000 * s.tw ** 3 * s.tf) / h ** 2) * 0.4 * rho(Lb) ** 3;
		expectRel(rn(run(Lb, false, false)), expected, 1e-9);
		expect(run(150, false).applies).toBe(false); // ρ = 2.26 > 1.7
	});
});

describe('J10.4 with the rotational restraint of the loaded flange unknown (our cautious reading)', () => {
	const run = (LbIn: number, restrained: boolean | 'unknown') =>
		computeWebSideswayBuckling({
			tw: inch(s.tw),
			tf: inch(s.tf),
			h: inch(h),
			bf: inch(s.bf),
			Lb: inch(LbIn),
			compressionFlangeRestrained: restrained,
			momentBelowYield: false
		});
	it('ρ ≤ 1.7: the lower J10-7 governs; 1.7 < ρ ≤ 2.3: J10-6 still applies; ρ > 2.3: none', () => {
		expect(run(240, 'unknown').clause).toBe('AISC 360-22 J10.4 (J10-7)'); // ρ = 1.41
		const mid = run(180, 'unknown'); // ρ = 45.2/24 = 1.88
		expect(mid.applies).toBe(true);
		expect(mid.clause).toBe('AISC 360-22 J10.4 (J10-6)');
		expect(run(180, false).applies).toBe(false);
		expect(run(120, 'unknown').applies).toBe(false); // ρ = 2.83
	});
});

describe('J10.5 web compression buckling (φ 0.90, Ω 1.67)', () => {
	const run = (distanceFromEnd: number) =>
		computeWebCompressionBuckling({
			tw: inch(s.tw),
			h: inch(h),
			d: inch(s.d),
			E: ksi(E_KSI),
			Fyw: ksi(FY),
			distanceFromEnd: inch(distanceFromEnd)
		});
	it('Rn = 24·tw³·√(E·Fyw)/h (J10-8), halved within d/2 of the end', () => {
		const full = (24 * s.tw ** 3 * Math.sqrt(E_KSI * FY)) / h;
		expectRel(rn(run(20)), full, 1e-9);
		expectRel(rn(run(5)), full / 2, 1e-9);
		const r = run(20);
		expect(r.applies && r.factors).toEqual({ phi: 0.9, omega: 1.67 });
	});
});
