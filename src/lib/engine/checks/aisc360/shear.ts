/**
 * Nominal shear strength Vn for shear parallel to the web (major-axis bending), AISC 360-22
 * Chapter G: G2.1 for I-shapes (without tension field action), G4 for rectangular HSS and G5
 * for round HSS.
 *
 * Status: equations from memory of the Specification (360-16 numbering, G2-1 … G2-11, G4-1,
 * G5-1, G5-2a/b; unchanged in 360-22 as far as recalled); G2.1 checked against Design Example
 * G.1A (W24x62, from memory) and the engineering reference C.3.
 */
import { assertFinite } from '../../model/issue';
import type { ResistanceFactors } from './resistance';

/** G2.1(a): rolled I-shapes with h/tw ≤ 2.24√(E/Fy). */
const ROLLED_STOCKY: ResistanceFactors = { phi: 1.0, omega: 1.5 };
/** G1: every other case. */
const GENERAL: ResistanceFactors = { phi: 0.9, omega: 1.67 };

/** Vn with the values behind it. */
export interface ShearStrength {
	/** Nominal shear strength, N. */
	Vn: number;
	/** Shear area Aw (I: d·tw; rectangular HSS: 2ht), or Ag for round HSS, mm². */
	Aw: number;
	/** Web shear strength coefficient Cv1 (G2.1) or Cv2 (G4); 1 for round HSS. */
	Cv: number;
	/** Web (or wall) slenderness h/tw, h/t or D/t. */
	slenderness: number;
	/** Shear buckling coefficient kv (I, rectangular HSS). */
	kv?: number;
	/** Critical stress Fcr of G5, MPa (round HSS only). */
	Fcr?: number;
	factors: ResistanceFactors;
	/** e.g. `AISC 360-22 G2.1(a) (G2-1, G2-2)`. */
	clause: string;
}

/** Inputs of {@link computeIShapeShear}; mm, MPa. */
export interface IShapeShearInput {
	/** Overall depth d and web thickness tw, mm. */
	d: number;
	tw: number;
	/** Web depth h: rolled, the clear distance between flanges less the fillets (d − 2k); welded, the clear distance between flanges; mm. */
	h: number;
	Fy: number;
	E: number;
	/** Rolled shape (G2.1(a) may apply); false for built-up sections. */
	rolled: boolean;
	/** kv; 5.34 for webs without transverse stiffeners (default, G2.1(b)(2)). */
	kv?: number;
}

/**
 * Vn = 0.6·Fy·Aw·Cv1 (G2-1), Aw = d·tw. Rolled I-shapes with h/tw ≤ 2.24√(E/Fy): Cv1 = 1.0
 * and φv = 1.00 / Ωv = 1.50 (G2.1(a)); otherwise φv = 0.90 / Ωv = 1.67 and
 * Cv1 = 1.0 for h/tw ≤ 1.10√(kv·E/Fy) (G2-3), else 1.10√(kv·E/Fy)/(h/tw) (G2-4).
 * No tension field action (G2.2) is counted.
 * @example
 * // W24x62, A992: Aw = 23.7 × 0.430 in², Vn = 0.6 × 50 × 10.19 ≈ 305.7 kips (Example G.1A)
 * computeIShapeShear({ d: 602, tw: 10.92, h: 546.6, Fy: 344.7, E: 199948, rolled: true }).Vn
 */
export function computeIShapeShear(o: IShapeShearInput): ShearStrength {
	const Aw = o.d * o.tw;
	const slenderness = o.h / o.tw;
	const kv = o.kv ?? 5.34;
	if (o.rolled && slenderness <= 2.24 * Math.sqrt(o.E / o.Fy)) {
		const Vn = assertFinite(0.6 * o.Fy * Aw, 'AISC Vn');
		const clause = 'AISC 360-22 G2.1(a) (G2-1, G2-2)';
		return { Vn, Aw, Cv: 1, slenderness, kv, factors: ROLLED_STOCKY, clause };
	}
	const limit = 1.1 * Math.sqrt((kv * o.E) / o.Fy);
	const Cv = slenderness <= limit ? 1 : limit / slenderness;
	const Vn = assertFinite(0.6 * o.Fy * Aw * Cv, 'AISC Vn');
	const equation = slenderness <= limit ? 'G2-3' : 'G2-4';
	const clause = `AISC 360-22 G2.1(b) (G2-1, ${equation})`;
	return { Vn, Aw, Cv, slenderness, kv, factors: GENERAL, clause };
}

/**
 * Cv2 of G2.2 (G2-9 … G2-11), used by G4:
 * h/t ≤ 1.10√(kv·E/Fy): 1.0; ≤ 1.37√(kv·E/Fy): 1.10√(kv·E/Fy)/(h/t); beyond: 1.51·kv·E/((h/t)²·Fy).
 * @example computeCv2({ slenderness: 40, kv: 5, E: 29000, Fy: 50 }) // 1.0
 */
export function computeCv2(o: { slenderness: number; kv: number; E: number; Fy: number }): number {
	const root = Math.sqrt((o.kv * o.E) / o.Fy);
	if (o.slenderness <= 1.1 * root) return 1;
	if (o.slenderness <= 1.37 * root) return (1.1 * root) / o.slenderness;
	return (1.51 * o.kv * o.E) / (o.slenderness ** 2 * o.Fy);
}

/**
 * Rectangular HSS, shear parallel to the walls of depth H (G4): Vn = 0.6·Fy·Aw·Cv2 (G4-1),
 * Aw = 2·h·t, h = H − 3t when the corner radius is not known, kv = 5; φv = 0.90 / Ωv = 1.67.
 * @param o.H outside depth (parallel to the shear), mm; o.t design wall thickness, mm
 * @param o.h flat web depth, mm (default H − 3t)
 * @example computeRectHssShear({ H: 203.2, t: 4.42, Fy: 317.2, E: 199948 }).Cv // 1.0
 */
export function computeRectHssShear(o: {
	H: number;
	t: number;
	h?: number;
	Fy: number;
	E: number;
}): ShearStrength {
	const h = o.h ?? o.H - 3 * o.t;
	const Aw = 2 * h * o.t;
	const kv = 5;
	const slenderness = h / o.t;
	const Cv = computeCv2({ slenderness, kv, E: o.E, Fy: o.Fy });
	const Vn = assertFinite(0.6 * o.Fy * Aw * Cv, 'AISC Vn');
	return { Vn, Aw, Cv, slenderness, kv, factors: GENERAL, clause: 'AISC 360-22 G4 (G4-1)' };
}

/**
 * Round HSS (G5): Vn = Fcr·Ag/2 (G5-1) with Fcr the larger of 1.60E/(√(Lv/D)·(D/t)^(5/4))
 * (G5-2a) and 0.78E/(D/t)^(3/2) (G5-2b), not more than 0.6·Fy; φv = 0.90 / Ωv = 1.67.
 * @param o.D outside diameter, o.t design wall thickness, o.Ag gross area (mm²),
 *   o.Lv distance from zero to maximum shear, mm
 * @example // Pipe 6 Std-like tube: stocky, Fcr = 0.6·Fy
 * computeRoundHssShear({ D: 168.3, t: 6.6, Ag: 3354, Lv: 1500, Fy: 241.3, E: 199948 }).Fcr
 */
export function computeRoundHssShear(o: {
	D: number;
	t: number;
	Ag: number;
	Lv: number;
	Fy: number;
	E: number;
}): ShearStrength {
	const slenderness = o.D / o.t;
	const short = (1.6 * o.E) / (Math.sqrt(o.Lv / o.D) * slenderness ** 1.25);
	const long = (0.78 * o.E) / slenderness ** 1.5;
	const Fcr = Math.min(0.6 * o.Fy, Math.max(short, long));
	const Vn = assertFinite((Fcr * o.Ag) / 2, 'AISC Vn');
	const clause = 'AISC 360-22 G5 (G5-1, G5-2)';
	return { Vn, Aw: o.Ag, Cv: 1, slenderness, Fcr, factors: GENERAL, clause };
}
