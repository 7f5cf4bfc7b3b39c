/**
 * AISC Design Examples (companion to the Steel Construction Manual, v15.0), Chapter F:
 * F.1-1A, F.1-2A/B, F.1-3A/B (W18x50, A992, 35 ft simple span, dead 0.45 and live 0.75 kip/ft,
 * braced continuously, at third points, at midspan) and F.3A (W21x48 with noncompact flanges,
 * continuously braced). The printed answers are recalled from memory and marked so; every check
 * first recomputes the answer by hand from AISC 360-22 F1-1, F2-1 … F2-6, F3-1 (from memory of
 * the text) with the AISC Shapes Database v15.0 properties (engineering reference D.3).
 * Tolerances: 1e-9 against the hand value; 0.5 % against printed values (the examples round Lp,
 * Lr and Lb to 3 figures, engineering reference C.6).
 */
import { describe, expect, it } from 'vitest';
import {
	computeIShapeFlexure,
	computeElasticLtbMoment
} from '../../src/lib/engine/checks/aisc360/flexure';
import { computeCb } from '../../src/lib/engine/checks/aisc360/moment-gradient';
import { W_PROPS, rtsAndHo, toEngineIShape } from '../support/aisc-w-shapes';
import { E_KSI, ft, in3, in4, inch, ksi, toKipFt, toKipIn } from '../support/us-customary';
import { expectRel } from '../support/expect-rel';

const FY = 50;
const w18 = W_PROPS.W18x50;
const input = { ...toEngineIShape(w18), Fy: ksi(FY), E: ksi(E_KSI) };

/** |M| of a simple span under UDL at x (fraction of the span), per unit wL². */
const udl = (x: number): number => (x * (1 - x)) / 2;

/** F1-1 by hand for the part [a, b] of a UDL simple span (a, b fractions of the span). */
function cbByHand(a: number, b: number): number {
	const at = (f: number) => udl(a + f * (b - a));
	const Mmax = a < 0.5 && b > 0.5 ? udl(0.5) : Math.max(udl(a), udl(b));
	return (12.5 * Mmax) / (2.5 * Mmax + 3 * at(0.25) + 4 * at(0.5) + 3 * at(0.75));
}

/** F2 by hand in kip·in for W18x50 with Lb in inches. */
function mnByHand(Lb: number, Cb: number): number {
	const { rts, ho } = rtsAndHo(w18);
	const root = Math.sqrt(E_KSI / FY);
	const Mp = FY * w18.Zx;
	const Lp = 1.76 * w18.ry * root;
	const jTerm = w18.J / (w18.Sx * ho);
	const a = (0.7 * FY) / E_KSI;
	const Lr =
		1.95 * rts * (E_KSI / (0.7 * FY)) * Math.sqrt(jTerm + Math.sqrt(jTerm ** 2 + 6.76 * a ** 2));
	if (Lb <= Lp) return Mp;
	if (Lb <= Lr) return Math.min(Mp, Cb * (Mp - (Mp - 0.7 * FY * w18.Sx) * ((Lb - Lp) / (Lr - Lp))));
	const s = Lb / rts;
	const Fcr = ((Cb * Math.PI ** 2 * E_KSI) / s ** 2) * Math.sqrt(1 + 0.078 * jTerm * s ** 2);
	return Math.min(Mp, Fcr * w18.Sx);
}

describe('F1-1: Cb of the W18x50 segments (Design Examples F.1-2, F.1-3)', () => {
	it('middle third 1.01, end thirds 1.46, half span 1.30 (printed values from memory)', () => {
		const segment = (a: number, b: number) =>
			computeCb({
				Mmax: a < 0.5 && b > 0.5 ? udl(0.5) : Math.max(udl(a), udl(b)),
				MA: udl(a + 0.25 * (b - a)),
				MB: udl(a + 0.5 * (b - a)),
				MC: udl(a + 0.75 * (b - a))
			});
		expectRel(segment(1 / 3, 2 / 3), cbByHand(1 / 3, 2 / 3), 1e-12);
		expectRel(segment(0, 1 / 3), cbByHand(0, 1 / 3), 1e-12);
		expectRel(segment(0, 0.5), cbByHand(0, 0.5), 1e-12);
		expectRel(segment(1 / 3, 2 / 3), 1.01, 0.005);
		expectRel(segment(0, 1 / 3), 1.46, 0.005);
		expectRel(segment(0, 0.5), 1.3, 0.005);
		// Closed forms (engineering reference C.2, D): whole span 1.136, uniform moment 1.0
		expectRel(segment(0, 1), 12.5 / 11, 1e-12);
		expect(computeCb({ Mmax: 5, MA: 5, MB: 5, MC: 5 })).toBe(1);
	});
});

describe('W18x50, A992, 35 ft span (Design Examples F.1)', () => {
	it('F.1-1A continuously braced: φbMn = φbMp = 379 kip·ft, Mn/Ωb = 252 kip·ft (from memory)', () => {
		const r = computeIShapeFlexure({ ...input, Lb: 0, ltb: { method: 'cb', Cb: 1 } });
		if (!r.supported) throw new Error('W18x50 must be in scope');
		expectRel(toKipIn(r.Mn), FY * w18.Zx, 1e-9); // F2-1
		expectRel(toKipFt(r.factors.phi * r.Mn), 379, 0.005);
		expectRel(toKipFt(r.Mn / r.factors.omega), 252, 0.005);
		expect(r.clause).toBe('AISC 360-22 F2.1 (F2-1)');
	});

	it('F.1-2A braced at third points, Lb = 11.67 ft, Cb = 1.01: φbMn = 305 kip·ft, ASD 203 (from memory)', () => {
		const Cb = cbByHand(1 / 3, 2 / 3);
		const r = computeIShapeFlexure({ ...input, Lb: ft(35 / 3), ltb: { method: 'cb', Cb } });
		if (!r.supported) throw new Error('W18x50 must be in scope');
		expect(r.ltb.range).toBe('inelastic');
		expect(r.clause).toBe('AISC 360-22 F2.2 (F2-2)');
		expectRel(toKipIn(r.Mn), mnByHand((35 / 3) * 12, Cb), 1e-9);
		expectRel(toKipFt(0.9 * r.Mn), 305, 0.005);
		expectRel(toKipFt(r.Mn / 1.67), 203, 0.005);
	});

	it('F.1-3A braced at midspan, Lb = 17.5 ft > Lr, Cb = 1.30: φbMn = 288 kip·ft, ASD 192 (from memory)', () => {
		const Cb = cbByHand(0, 0.5);
		const r = computeIShapeFlexure({ ...input, Lb: ft(17.5), ltb: { method: 'cb', Cb } });
		if (!r.supported) throw new Error('W18x50 must be in scope');
		expect(r.ltb.range).toBe('elastic');
		expect(r.clause).toBe('AISC 360-22 F2.2 (F2-3)');
		expectRel(toKipIn(r.Mn), mnByHand(17.5 * 12, Cb), 1e-9);
		expectRel(toKipFt(0.9 * r.Mn), 288, 0.005);
		expectRel(toKipFt(r.Mn / 1.67), 192, 0.005);
	});

	it('Mcr route: an Mcr equal to F2-4 with the same Cb reproduces the Cb route on every branch', () => {
		for (const LbFt of [3, 8, 11.67, 14, 17.5, 30]) {
			const Cb = 1.3;
			const Lb = ft(LbFt);
			const viaCb = computeIShapeFlexure({ ...input, Lb, ltb: { method: 'cb', Cb } });
			const Mcr = computeElasticLtbMoment({ ...input, Lb, Cb });
			const viaMcr = computeIShapeFlexure({ ...input, Lb, ltb: { method: 'mcr', Mcr } });
			if (!viaCb.supported || !viaMcr.supported) throw new Error('in scope');
			expectRel(viaMcr.Mn, viaCb.Mn, 1e-9);
			expectRel(viaMcr.ltb.Cb, Cb, 1e-9);
			expectRel(toKipIn(viaCb.Mn), mnByHand(LbFt * 12, Cb), 1e-9);
		}
	});

	it('Mcr route: a lower Mcr (load on the top flange) lowers Mn in the elastic range to Mcr itself', () => {
		const Lb = ft(30);
		const me = computeElasticLtbMoment({ ...input, Lb, Cb: 1 });
		const r = computeIShapeFlexure({ ...input, Lb, ltb: { method: 'mcr', Mcr: 0.8 * me } });
		if (!r.supported) throw new Error('in scope');
		expectRel(r.Mn, 0.8 * me, 1e-9); // F2-3 with Fcr·Sx replaced by Mcr
	});
});

describe('F.3A: W21x48, A992, continuously braced, noncompact flange', () => {
	it('bf/2tf = 9.47 > 9.15: F3-1 gives φbMn = 398 kip·ft (from memory; properties from memory)', () => {
		const s = W_PROPS.W21x48;
		const r = computeIShapeFlexure({
			...toEngineIShape(s),
			Fy: ksi(FY),
			E: ksi(E_KSI),
			Lb: 0,
			ltb: { method: 'cb', Cb: 1 }
		});
		if (!r.supported) throw new Error('in scope');
		expect(r.governing).toBe('flange local buckling');
		expect(r.clause).toBe('AISC 360-22 F3.2 (F3-1)');
		const root = Math.sqrt(E_KSI / FY);
		const lambda = s.bf / (2 * s.tf);
		const Mp = FY * s.Zx;
		const byHand = Mp - (Mp - 0.7 * FY * s.Sx) * ((lambda - 0.38 * root) / (root - 0.38 * root));
		expectRel(toKipIn(r.Mn), byHand, 1e-9);
		expectRel(toKipFt(0.9 * r.Mn), 398, 0.005);
	});
});

describe('F3-2: slender flange of a built-up section (formula check, AISC 360-22 F3.2(b))', () => {
	it('Mn = 0.9·E·kc·Sx/λ² with kc = 4/√(h/tw) in 0.35 … 0.76', () => {
		// Welded I 24 x 16 in flange 0.375 in, web 0.5 in (an example of our own, in inches)
		const bf = 16,
			tf = 0.375,
			h = 23.25,
			tw = 0.5,
			Sx = 150,
			Zx = 165;
		const kc = Math.min(0.76, Math.max(0.35, 4 / Math.sqrt(h / tw)));
		const lambda = bf / (2 * tf);
		const lambdaR = 0.95 * Math.sqrt((kc * E_KSI) / (0.7 * FY)); // Table B4.1b case 11
		expect(lambda).toBeGreaterThan(lambdaR);
		const r = computeIShapeFlexure({
			Fy: ksi(FY),
			E: ksi(E_KSI),
			Zx: in3(Zx),
			Sx: in3(Sx),
			ry: inch(3.5),
			rts: inch(4.2),
			J: in4(0.5),
			ho: inch(23.6),
			bf: inch(bf),
			tf: inch(tf),
			h: inch(h),
			tw: inch(tw),
			builtUp: true,
			Lb: 0,
			ltb: { method: 'cb', Cb: 1 }
		});
		if (!r.supported) throw new Error('in scope');
		expect(r.flange.equation).toBe('F3-2');
		expectRel(toKipIn(r.Mn), (0.9 * E_KSI * kc * Sx) / lambda ** 2, 1e-9);
	});
});
