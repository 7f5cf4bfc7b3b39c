/**
 * AISC Design Examples v15.0, Chapter G, Example G.1A (W24x62, A992, strong-axis shear:
 * Aw = d·tw, Cv1 = 1.0, φv = 1.00, Vn = 306 kips, φvVn = 306 kips, Vn/Ωv = 204 kips — printed
 * values from memory), and AISC 360-22 G2.1 User Note (W-shapes that miss h/tw ≤ 2.24√(E/Fy) at
 * Fy = 50 ksi, among them W24x55 and W16x26, from memory; engineering reference C.3) with the
 * Manual Table 3-2 φvVnx of those two (252 and 106 kips, from memory). G4 and G5 (HSS) are
 * checked against the equations by hand (AISC 360-22 G4-1, G2-9 … G2-11, G5-1, G5-2a/b, from
 * memory of the text). Properties: AISC Shapes Database v15.0 (engineering reference D.3).
 */
import { describe, expect, it } from 'vitest';
import {
	computeCv2,
	computeIShapeShear,
	computeRectHssShear,
	computeRoundHssShear
} from '../../src/lib/engine/checks/aisc360/shear';
import { W_PROPS, toEngineIShape } from '../support/aisc-w-shapes';
import { E_KSI, in2, inch, ksi, toKip } from '../support/us-customary';
import { expectRel } from '../support/expect-rel';

const FY = 50;
const shear = (name: string) => {
	const s = toEngineIShape(W_PROPS[name]);
	return computeIShapeShear({ d: s.d, tw: s.tw, h: s.h, Fy: ksi(FY), E: ksi(E_KSI), rolled: true });
};

describe('G2.1, rolled W-shapes, A992', () => {
	it('G.1A W24x62: Vn = 0.6·50·(23.7·0.430) = 305.7 kips; φvVn 306, Vn/Ωv 204 (from memory)', () => {
		const r = shear('W24x62');
		expect(r.factors).toEqual({ phi: 1.0, omega: 1.5 });
		expect(r.Cv).toBe(1);
		expect(r.clause).toBe('AISC 360-22 G2.1(a) (G2-1, G2-2)');
		expectRel(toKip(r.Vn), 0.6 * FY * 23.7 * 0.43, 1e-9);
		expectRel(toKip(r.factors.phi * r.Vn), 306, 0.005);
		expectRel(toKip(r.Vn / r.factors.omega), 204, 0.005);
	});

	it.each([
		// [shape, φvVn kips: engineering reference C.6, computed there from 0.6·Fy·d·tw]
		['W12x26', 84.2],
		['W14x22', 94.5],
		['W16x40', 146.4],
		['W18x35', 159.3],
		['W21x44', 217.3]
	] as const)('%s: h/tw ≤ 2.24√(E/Fy) = 53.9, φv = 1.00, φvVn = %d kips', (name, phiVn) => {
		const s = W_PROPS[name];
		const r = shear(name);
		expect((s.d - 2 * s.kdes) / s.tw).toBeLessThanOrEqual(2.24 * Math.sqrt(E_KSI / FY));
		expect(r.factors.phi).toBe(1);
		expectRel(toKip(r.Vn), 0.6 * FY * s.d * s.tw, 1e-9);
		expectRel(toKip(r.Vn), phiVn, 0.002);
	});

	it.each([
		['W24x55', 252],
		['W16x26', 106]
	] as const)(
		'%s misses 2.24√(E/Fy) (User Note): φv = 0.90, Cv1 = 1 (G2-3), φvVn %d kips (from memory)',
		(name, phiVn) => {
			const s = W_PROPS[name];
			const r = shear(name);
			const hw = (s.d - 2 * s.kdes) / s.tw;
			expect(hw).toBeGreaterThan(2.24 * Math.sqrt(E_KSI / FY));
			expect(hw).toBeLessThanOrEqual(1.1 * Math.sqrt((5.34 * E_KSI) / FY));
			expect(r.factors).toEqual({ phi: 0.9, omega: 1.67 });
			expect(r.clause).toBe('AISC 360-22 G2.1(b) (G2-1, G2-3)');
			expectRel(toKip(0.9 * r.Vn), 0.9 * 0.6 * FY * s.d * s.tw, 1e-9);
			expectRel(toKip(0.9 * r.Vn), phiVn, 0.005);
		}
	);

	it('slender built-up web: Cv1 = 1.10√(kv·E/Fy)/(h/tw) (G2-4), kv = 5.34', () => {
		const d = 40,
			tw = 0.3125,
			h = 38.5; // welded plate girder web, inches (our example)
		const r = computeIShapeShear({
			d: inch(d),
			tw: inch(tw),
			h: inch(h),
			Fy: ksi(FY),
			E: ksi(E_KSI),
			rolled: false
		});
		const Cv1 = (1.1 * Math.sqrt((5.34 * E_KSI) / FY)) / (h / tw);
		expect(Cv1).toBeLessThan(1);
		expectRel(r.Cv, Cv1, 1e-12);
		expectRel(toKip(r.Vn), 0.6 * FY * d * tw * Cv1, 1e-9);
		expect(r.clause).toBe('AISC 360-22 G2.1(b) (G2-1, G2-4)');
	});
});

describe('G4 rectangular HSS and G5 round HSS (equations by hand)', () => {
	it('HSS 8x4x1/4 (A500 Gr C, Fy 50, design t = 0.233 in): Aw = 2(8 − 3t)t, Cv2 = 1', () => {
		const H = 8,
			t = 0.233;
		const r = computeRectHssShear({ H: inch(H), t: inch(t), Fy: ksi(FY), E: ksi(E_KSI) });
		expectRel(toKip(r.Vn), 0.6 * FY * 2 * (H - 3 * t) * t, 1e-9);
		expect(r.Cv).toBe(1);
		expect(r.factors).toEqual({ phi: 0.9, omega: 1.67 });
	});

	it('Cv2 on its three branches (G2-9, G2-10, G2-11), kv = 5', () => {
		const root = Math.sqrt((5 * E_KSI) / FY);
		expect(computeCv2({ slenderness: 1.0 * root, kv: 5, E: E_KSI, Fy: FY })).toBe(1);
		expectRel(computeCv2({ slenderness: 1.2 * root, kv: 5, E: E_KSI, Fy: FY }), 1.1 / 1.2, 1e-12);
		const s = 1.6 * root;
		expectRel(
			computeCv2({ slenderness: s, kv: 5, E: E_KSI, Fy: FY }),
			(1.51 * 5 * E_KSI) / (s * s * FY),
			1e-12
		);
		// the two outer branches meet: 1.10/1.37 = 1.51/1.37² (to 0.3 %)
		expectRel(1.1 / 1.37, 1.51 / 1.37 ** 2, 0.003);
	});

	it('round HSS: Fcr = max(G5-2a, G5-2b) ≤ 0.6Fy, Vn = Fcr·Ag/2', () => {
		// HSS 20.000 x 0.250 (our example, in inches): thin enough for G5-2a to govern below 0.6Fy
		const D = 20,
			t = 0.233,
			Ag = Math.PI * (D - t) * t,
			Lv = 48;
		const Fcr = Math.min(
			0.6 * FY,
			Math.max(
				(1.6 * E_KSI) / (Math.sqrt(Lv / D) * (D / t) ** 1.25),
				(0.78 * E_KSI) / (D / t) ** 1.5
			)
		);
		const r = computeRoundHssShear({
			D: inch(D),
			t: inch(t),
			Ag: in2(Ag),
			Lv: inch(Lv),
			Fy: ksi(FY),
			E: ksi(E_KSI)
		});
		expectRel(toKip(r.Vn), (Fcr * Ag) / 2, 1e-9);
		const stocky = computeRoundHssShear({
			D: inch(6.625),
			t: inch(0.261),
			Ag: in2(5.2),
			Lv: inch(60),
			Fy: ksi(35),
			E: ksi(E_KSI)
		});
		expectRel(stocky.Fcr ?? 0, ksi(0.6 * 35), 1e-12);
	});
});
