/**
 * The AISC 360-22 flexure equations meet where their ranges meet. The Specification draws them
 * so (F2-2 and F2-3 both give 0.7Fy·Sx·Cb at Lb = Lr; F3-1, F7-2, F7-6 run from Mp at λp to
 * about Fy·S or 0.7Fy·S at λr; F8-2 and F8-3 nearly agree at λr), so these checks test that the
 * coefficients recalled from memory hang together, and that the code switches branch at the
 * right limit. Section properties: AISC Shapes Database v15.0 (engineering reference D.3).
 */
import { describe, expect, it } from 'vitest';
import { computeIShapeFlexure } from '../../../../src/lib/engine/checks/aisc360/flexure';
import {
	computeHssEffectiveWidth,
	computeRectHssFlexure
} from '../../../../src/lib/engine/checks/aisc360/flexure-hss';
import { W_PROPS, toEngineIShape } from '../../../support/aisc-w-shapes';
import { E_KSI, ksi } from '../../../support/us-customary';
import { expectRel } from '../../../support/expect-rel';

const E = ksi(E_KSI);
const Fy = ksi(50);

describe('F2: Mn is continuous in Lb and never rises with it', () => {
	it.each(['W12x26', 'W16x40', 'W18x50', 'W24x62'])('%s', (name) => {
		const input = { ...toEngineIShape(W_PROPS[name]), Fy, E };
		const at = (Lb: number, Cb = 1.2) => {
			const r = computeIShapeFlexure({ ...input, Lb, ltb: { method: 'cb', Cb } });
			if (!r.supported) throw new Error('in scope');
			return r;
		};
		const { Lr } = at(0);
		// At Lr F2-2 gives 0.7Fy·Sx exactly; F2-3 gives it to the rounding of F2-6's 1.95 and
		// 6.76 (exact inversion of F2-4: π²/√2·√0.078 = 1.949, 4/(π⁴·0.078²) = 6.75), ≈ 0.1 %
		expectRel(at(Lr * (1 - 1e-9), 1).Mn, 0.7 * Fy * input.Sx, 1e-6);
		expectRel(at(Lr * (1 + 1e-9), 1).Mn, 0.7 * Fy * input.Sx, 0.003);
		let previous = Infinity;
		for (let Lb = 0; Lb <= 3 * Lr; Lb += Lr / 50) {
			const { Mn } = at(Lb);
			expect(Mn).toBeLessThanOrEqual(previous * (1 + 1e-12));
			previous = Mn;
		}
	});
});

describe('F7: the HSS local buckling equations meet at λp and λr', () => {
	const root = Math.sqrt(E_KSI / 50);
	it('F7-2 runs from Mp at b/t = 1.12√(E/Fy) to about Fy·S at 1.40√(E/Fy)', () => {
		expect(Math.abs(3.57 * 1.12 - 4.0)).toBeLessThan(0.002);
		expect(Math.abs(3.57 * 1.4 - 4.0 - 1)).toBeLessThan(0.0025);
	});
	it('F7-6 runs from Mp at h/t = 2.42√(E/Fy) to about Fy·S at 5.70√(E/Fy)', () => {
		expect(Math.abs(0.305 * 2.42 - 0.738)).toBeLessThan(0.001);
		expect(Math.abs(0.305 * 5.7 - 0.738 - 1)).toBeLessThan(0.001);
	});
	it('F7-4 gives be ≈ b at b/t = 1.40√(E/Fy), so F7-3 starts at about Fy·S', () => {
		const t = 5;
		const b = 1.4 * root * t;
		expectRel(computeHssEffectiveWidth({ B: b + 3 * t, t, E, Fy }), b, 0.002);
	});
	it('the code switches from F7-2 to F7-3 with Mn nearly continuous (square HSS, thin-wall properties)', () => {
		const t = 5;
		const mn = (bOverT: number) => {
			const B = bOverT * t + 3 * t;
			const a = B - t; // centre-line width
			const A = 4 * a * t;
			const I = (2 * t * a ** 3) / 12 + 2 * a * t * (a / 2) ** 2;
			const r = computeRectHssFlexure({
				B,
				H: B,
				t,
				Fy,
				E,
				A,
				Ix: I,
				Sx: I / (B / 2),
				Zx: 1.5 * a * a * t,
				ry: Math.sqrt(I / A),
				J: 2 * I,
				Lb: 0,
				Cb: 1
			});
			if (!r.supported) throw new Error('in scope');
			return { r, S: I / (B / 2) };
		};
		const below = mn(1.4 * root * (1 - 1e-6));
		const above = mn(1.4 * root * (1 + 1e-6));
		expect(below.r.limitStates['flange local buckling'].equation).toBe('F7-2');
		expect(above.r.limitStates['flange local buckling'].equation).toBe('F7-3');
		expectRel(above.r.Mn, below.r.Mn, 0.003);
		expectRel(below.r.Mn, Fy * below.S, 0.003);
	});
});

describe('F8: noncompact and slender round HSS nearly agree at D/t = 0.31E/Fy', () => {
	it('(0.021/0.31 + 1)·Fy·S vs 0.33/0.31·Fy·S: within 0.4 %', () => {
		expectRel(0.021 / 0.31 + 1, 0.33 / 0.31, 0.004);
	});
});
