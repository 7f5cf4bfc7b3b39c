/**
 * AISC 360-22 Table B4.1b (width-to-thickness limits for flexure: cases 10, 11, 15, 17, 19, 20)
 * and Appendix 1, 1.3.2b (λpd) and 1.3.2c (Lpd, A-1-5 … A-1-7) — limits from memory of the
 * Specification (engineering reference C.2 and C.5, the latter tagged "verify"). Ratios of the
 * W-shapes from the AISC Shapes Database v15.0 (engineering reference D.3: bf/2tf, h/tw);
 * W21x48 and the HSS ratio 43.0 (Design Examples F.3A, F.8A) from memory. Lpd of W16x40 as
 * computed in engineering reference C.5 (40.1 in, 178.5 in, arithmetic there).
 */
import { describe, expect, it } from 'vitest';
import {
	checkHingeCompactness,
	classifyIShapeFlexure,
	classifyRectHssFlexure,
	classifyRoundHssFlexure,
	computeKc
} from '../../src/lib/engine/checks/aisc360/compactness';
import {
	computeEffectiveMomentRatio,
	computeLpd
} from '../../src/lib/engine/checks/aisc360/hinge-bracing';
import { W_PROPS } from '../support/aisc-w-shapes';
import { E_KSI, inch, ksi } from '../support/us-customary';
import { expectRel } from '../support/expect-rel';

const E = ksi(E_KSI);
const iShape = (name: string, Fy = 50) => {
	const s = W_PROPS[name];
	return classifyIShapeFlexure({
		bf: inch(s.bf),
		tf: inch(s.tf),
		h: inch(s.d - 2 * s.kdes),
		tw: inch(s.tw),
		Fy: ksi(Fy),
		E
	});
};

describe('Table B4.1b, rolled I-shapes (cases 10 and 15)', () => {
	it('limits at Fy = 50 ksi: 0.38, 1.0, 3.76, 5.70 × √(E/Fy) = 9.15, 24.1, 90.6, 137', () => {
		const c = iShape('W16x40');
		const root = Math.sqrt(E_KSI / 50);
		expectRel(c.elements[0].lambdaP, 0.38 * root, 1e-12);
		expectRel(c.elements[0].lambdaR, 1.0 * root, 1e-12);
		expectRel(c.elements[1].lambdaP, 3.76 * root, 1e-12);
		expectRel(c.elements[1].lambdaR, 5.7 * root, 1e-12);
		expectRel(c.elements[0].lambdaP, 9.15, 0.001); // engineering reference C.2: 9.152
	});

	it.each([
		['W10x33', 9.15, 'compact'],
		['W12x26', 8.54, 'compact'],
		['W16x40', 6.93, 'compact'],
		['W24x62', 5.97, 'compact'],
		['W8x31', 9.19, 'noncompact'],
		['W21x48', 9.47, 'noncompact']
	] as const)('%s: bf/2tf = %d (tabulated) → %s', (name, ratio, status) => {
		const c = iShape(name);
		expectRel(c.elements[0].lambda, ratio, 0.005); // the database rounds to 3 figures
		expect(c.overall).toBe(status);
		expect(c.elements[1].status).toBe('compact');
	});

	it('W8x31 is compact in A36 (λp = 0.38√(29000/36) = 10.79)', () => {
		expect(iShape('W8x31', 36).overall).toBe('compact');
	});

	it('built-up flange (case 11): λr = 0.95√(kc·E/FL), FL = 0.7Fy, kc = 4/√(h/tw) in 0.35 … 0.76', () => {
		expectRel(computeKc({ h: 50, tw: 1 }), 4 / Math.sqrt(50), 1e-12);
		expect(computeKc({ h: 10, tw: 1 })).toBe(0.76);
		expect(computeKc({ h: 200, tw: 1 })).toBe(0.35);
		const c = classifyIShapeFlexure({
			bf: 400,
			tf: 12,
			h: 800,
			tw: 8,
			Fy: ksi(50),
			E,
			builtUp: true
		});
		const kc = 4 / Math.sqrt(100);
		expectRel(c.elements[0].lambdaR, 0.95 * Math.sqrt((kc * E_KSI) / (0.7 * 50)), 1e-12);
		expect(c.elements[0].clause).toBe('AISC 360-22 Table B4.1b case 11');
	});
});

describe('Table B4.1b, HSS (cases 17, 19, 20)', () => {
	it('F.8A HSS8x8x3/16, Fy 46, t = 0.174: b/t = 43.0 > 1.40√(E/Fy) = 35.2, slender flange', () => {
		const c = classifyRectHssFlexure({ B: inch(8), H: inch(8), t: inch(0.174), Fy: ksi(46), E });
		expectRel(c.elements[0].lambda, 43.0, 0.005);
		expectRel(c.elements[0].lambdaR, 1.4 * Math.sqrt(E_KSI / 46), 1e-12);
		expect(c.elements[0].status).toBe('slender');
		expect(c.elements[1].status).toBe('compact'); // h/t 43.0 ≤ 2.42√(E/Fy) = 60.8
		expect(c.overall).toBe('slender');
		expect(c.governing).toBe('flange');
	});

	it('round HSS: D/t against 0.07E/Fy and 0.31E/Fy', () => {
		const at = (Dt: number) => classifyRoundHssFlexure({ D: Dt * 5, t: 5, Fy: ksi(50), E }).overall;
		expect(at(0.07 * 580 - 0.01)).toBe('compact');
		expect(at(0.07 * 580 + 0.01)).toBe('noncompact');
		expect(at(0.31 * 580 + 0.01)).toBe('slender');
	});
});

describe('Appendix 1, 1.3.2b: λpd for hinges (beams, Pu = 0)', () => {
	it('W16x40 meets λpd; W8x31 (noncompact flange) does not', () => {
		const ok = checkHingeCompactness({ shape: 'I', compactness: iShape('W16x40'), Fy: ksi(50), E });
		expect(ok.every((e) => e.ok)).toBe(true);
		expectRel(ok[1].lambdaPd, 3.76 * Math.sqrt(E_KSI / 50), 1e-12); // A-1-1 at Pu = 0
		const bad = checkHingeCompactness({ shape: 'I', compactness: iShape('W8x31'), Fy: ksi(50), E });
		expect(bad[0].ok).toBe(false);
	});
	it('rectangular HSS flange 0.94√(E/Fy) (A-1-3); round HSS 0.045E/Fy (A-1-4)', () => {
		const rect = classifyRectHssFlexure({ B: 200, H: 200, t: 8, Fy: ksi(50), E }); // b/t = 22
		const r = checkHingeCompactness({ shape: 'rect-HSS', compactness: rect, Fy: ksi(50), E });
		expectRel(r[0].lambdaPd, 0.94 * Math.sqrt(E_KSI / 50), 1e-12);
		expect(r[0].ok).toBe(true); // 22 ≤ 22.6
		const round = classifyRoundHssFlexure({ D: 27 * 6, t: 6, Fy: ksi(50), E });
		const c = checkHingeCompactness({ shape: 'round-HSS', compactness: round, Fy: ksi(50), E });
		expectRel(c[0].lambdaPd, (0.045 * E_KSI) / 50, 1e-12);
		expect(c[0].ok).toBe(false); // 27 > 26.1
	});
});

describe('Appendix 1, 1.3.2c: Lpd next to a hinge, W16x40, Fy 50 (ry = 1.57 in)', () => {
	const lpd = (moments: { Mstart: number; Mend: number; Mmid: number; MmaxAbs: number }) =>
		computeLpd({ shape: 'I', ry: inch(1.57), E, Fy: ksi(50), moments }).Lpd ?? 0;
	it('uniform moment: 0.044(E/Fy)ry = 40.1 in; full reverse curvature: 0.196(E/Fy)ry = 178.5 in', () => {
		expectRel(
			lpd({ Mstart: 100, Mend: 100, Mmid: 100, MmaxAbs: 100 }),
			inch(0.044 * 580 * 1.57),
			1e-9
		);
		expectRel(
			lpd({ Mstart: 100, Mend: -100, Mmid: 0, MmaxAbs: 100 }),
			inch(0.196 * 580 * 1.57),
			1e-9
		);
		expectRel(lpd({ Mstart: -100, Mend: -100, Mmid: -100, MmaxAbs: 100 }), inch(40.1), 0.002);
	});
	it('M1′ = 2Mmid − M2 when Mmid is above the straight line (A-1-6c); +1 when the span peak exceeds M2 (A-1-6a)', () => {
		// hogging hinge M2 = −100 at one end, 0 at the other, Mmid = −70 (above the line −50)
		expectRel(
			computeEffectiveMomentRatio({ Mstart: -100, Mend: 0, Mmid: -70, MmaxAbs: 100 }),
			(2 * 70 - 100) / 100,
			1e-12
		);
		expect(computeEffectiveMomentRatio({ Mstart: -100, Mend: 0, Mmid: -30, MmaxAbs: 100 })).toBe(0);
		expect(computeEffectiveMomentRatio({ Mstart: 80, Mend: 0, Mmid: 95, MmaxAbs: 100 })).toBe(1);
	});
	it('no limit for round and square HSS', () => {
		const m = { Mstart: 1, Mend: 1, Mmid: 1, MmaxAbs: 1 };
		expect(computeLpd({ shape: 'round-HSS', ry: 50, E, Fy: ksi(50), moments: m }).Lpd).toBeNull();
	});
});
