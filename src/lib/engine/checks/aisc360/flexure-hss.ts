/**
 * Nominal flexural strength Mn of hollow structural sections, AISC 360-22 F7 (rectangular and
 * square HSS about the axis parallel to the flanges of width B) and F8 (round HSS), with
 * φb = 0.90 / Ωb = 1.67 (F1).
 *
 * Status: equations from memory of the Specification (360-16 numbering: F7-1 … F7-4, F7-6,
 * F7-10 … F7-13, F8-1 … F8-4; unchanged in 360-22 as far as recalled). Slender webs (F7-7, F7-8)
 * and D/t > 0.45E/Fy come back as `supported: false`.
 */
import { assertFinite } from '../../model/issue';
import {
	classifyRectHssFlexure,
	classifyRoundHssFlexure,
	type SectionCompactness
} from './compactness';
import { FLEXURE_FACTORS, type ResistanceFactors } from './resistance';

/** One limit state's Mn (N·mm) and its equation; Mn null where the limit state does not apply. */
export interface HssLimitState {
	Mn: number | null;
	equation: string;
}

/** Mn of an HSS with its limit states. */
export type HssFlexure =
	| {
			supported: true;
			/** Least of the limit states, N·mm. */
			Mn: number;
			/** Mp = Fy·Z, N·mm. */
			Mp: number;
			governing: string;
			clause: string;
			factors: ResistanceFactors;
			limitStates: Record<string, HssLimitState>;
			compactness: SectionCompactness;
			/** Effective width be of a slender compression flange (F7-4), mm. */
			be?: number;
			/** Effective section modulus Se (F7-3), mm³. */
			Se?: number;
			/** LTB limiting lengths of rectangular HSS (F7-12, F7-13), mm. */
			Lp?: number;
			Lr?: number;
	  }
	| { supported: false; clause: string; reason: string; compactness: SectionCompactness };

/** Inputs of {@link computeRectHssFlexure}; N, mm, MPa. */
export interface RectHssFlexureInput {
	/** Outside width B (flanges, in compression on one side) and depth H (webs), mm. */
	B: number;
	H: number;
	/** Design wall thickness, mm (0.93 × nominal for ASTM A500, B4.2). */
	t: number;
	Fy: number;
	E: number;
	/** Gross area, second moment, elastic and plastic moduli about the bending axis. */
	A: number;
	Ix: number;
	Sx: number;
	Zx: number;
	/** Minor-axis radius of gyration and torsional constant, for F7.4. */
	ry: number;
	J: number;
	/** Unbraced length, mm, and Cb (F1-1). */
	Lb: number;
	Cb: number;
}

/**
 * Effective width of a slender HSS compression flange,
 * be = 1.92·t·√(E/Fy)·[1 − 0.38/(b/t)·√(E/Fy)] ≤ b (F7-4), b = B − 3t.
 * @example computeHssEffectiveWidth({ B: 8, t: 0.174, E: 29000, Fy: 46 }) // ≈ 6.53 in
 */
export function computeHssEffectiveWidth(o: {
	B: number;
	t: number;
	E: number;
	Fy: number;
}): number {
	const b = o.B - 3 * o.t;
	const root = Math.sqrt(o.E / o.Fy);
	return Math.min(b, 1.92 * o.t * root * (1 - (0.38 / (b / o.t)) * root));
}

/**
 * Effective section modulus Se for F7-3: the flat part of the compression flange beyond be is
 * taken out (a strip (b − be)·t at the flange's mid-thickness), the neutral axis moves toward
 * the tension flange, and Se = Ieff / (distance to the compression face). The strip's own
 * second moment about its axis, (b − be)·t³/12, is taken out too.
 */
export function computeHssEffectiveModulus(o: {
	B: number;
	H: number;
	t: number;
	A: number;
	Ix: number;
	be: number;
}): number {
	const removed = (o.B - 3 * o.t - o.be) * o.t;
	const y = (o.H - o.t) / 2;
	const shift = (removed * y) / (o.A - removed);
	const Ieff =
		o.Ix -
		removed * y * y -
		((o.B - 3 * o.t - o.be) * o.t ** 3) / 12 -
		(o.A - removed) * shift ** 2;
	return Ieff / (o.H / 2 + shift);
}

/** F7.4: lateral-torsional buckling, rectangular HSS bent about the major axis (H > B). */
function rectHssLtb(o: RectHssFlexureInput, Mp: number) {
	if (o.H <= o.B) return { state: { Mn: null, equation: 'none (square or minor axis)' } };
	const root = Math.sqrt(o.J * o.A);
	const Lp = (0.13 * o.E * o.ry * root) / Mp;
	const Lr = (2 * o.E * o.ry * root) / (0.7 * o.Fy * o.Sx);
	if (o.Lb <= Lp) return { Lp, Lr, state: { Mn: null, equation: 'none (Lb ≤ Lp)' } };
	if (o.Lb <= Lr) {
		const Mr = 0.7 * o.Fy * o.Sx;
		const Mn = Math.min(Mp, o.Cb * (Mp - ((Mp - Mr) * (o.Lb - Lp)) / (Lr - Lp)));
		return { Lp, Lr, state: { Mn, equation: 'F7-10' } };
	}
	const Mn = Math.min(Mp, (2 * o.E * o.Cb * root) / (o.Lb / o.ry));
	return { Lp, Lr, state: { Mn, equation: 'F7-11' } };
}

/** The least of the limit states, with its name. */
function pickLeast(Mp: number, states: Record<string, HssLimitState>) {
	let Mn = Mp;
	let governing = 'yielding';
	for (const [name, s] of Object.entries(states)) {
		if (s.Mn !== null && s.Mn < Mn) {
			Mn = s.Mn;
			governing = name;
		}
	}
	return { Mn: assertFinite(Mn, 'AISC HSS Mn'), governing };
}

/**
 * Rectangular or square HSS (F7): the least of yielding Mp = Fy·Z (F7-1), flange local buckling
 * (noncompact: Mp − (Mp − Fy·S)(3.57(b/t)√(Fy/E) − 4.0) ≤ Mp, F7-2; slender: Fy·Se, F7-3 with
 * be of F7-4), web local buckling (noncompact: Mp − (Mp − Fy·S)(0.305(h/t)√(Fy/E) − 0.738)
 * ≤ Mp, F7-6) and, for H > B, lateral-torsional buckling (F7-10, F7-11 with Lp, Lr of F7-12,
 * F7-13).
 * Example: HSS 8x8x1/4 (design t = 0.233 in) at Fy = 50 ksi has b/t = 31.3, a noncompact
 * flange, and F7-2 governs (test/validation/aisc-design-examples-hss-flexure.test.ts).
 */
export function computeRectHssFlexure(o: RectHssFlexureInput): HssFlexure {
	const compactness = classifyRectHssFlexure(o);
	const [flange, web] = compactness.elements;
	if (web.status === 'slender') {
		const reason = 'The HSS web is slender for flexure (F7.3(c)): not covered by this tool.';
		return { supported: false, clause: 'AISC 360-22 F7.3(c)', reason, compactness };
	}
	const Mp = o.Fy * o.Zx;
	const My = o.Fy * o.Sx;
	const rootFyE = Math.sqrt(o.Fy / o.E);
	const limitStates: Record<string, HssLimitState> = {};
	let be: number | undefined;
	let Se: number | undefined;
	if (flange.status === 'noncompact') {
		const Mn = Math.min(Mp, Mp - (Mp - My) * (3.57 * flange.lambda * rootFyE - 4.0));
		limitStates['flange local buckling'] = { Mn, equation: 'F7-2' };
	} else if (flange.status === 'slender') {
		be = computeHssEffectiveWidth(o);
		Se = computeHssEffectiveModulus({ ...o, be });
		limitStates['flange local buckling'] = { Mn: o.Fy * Se, equation: 'F7-3' };
	}
	if (web.status === 'noncompact') {
		const Mn = Math.min(Mp, Mp - (Mp - My) * (0.305 * web.lambda * rootFyE - 0.738));
		limitStates['web local buckling'] = { Mn, equation: 'F7-6' };
	}
	const ltb = rectHssLtb(o, Mp);
	limitStates['lateral-torsional buckling'] = ltb.state;
	const { Mn, governing } = pickLeast(Mp, limitStates);
	const equation = limitStates[governing]?.equation ?? 'F7-1';
	return {
		supported: true,
		Mn,
		Mp,
		governing,
		clause: `AISC 360-22 F7 (${equation})`,
		factors: FLEXURE_FACTORS,
		limitStates,
		compactness,
		be,
		Se,
		Lp: ltb.Lp,
		Lr: ltb.Lr
	};
}

/**
 * Round HSS (F8), valid for D/t < 0.45E/Fy: the least of yielding Mp = Fy·Z (F8-1) and local
 * buckling (noncompact: (0.021E/(D/t) + Fy)·S, F8-2; slender: Fcr·S with Fcr = 0.33E/(D/t),
 * F8-3, F8-4).
 * @param o.D outside diameter, o.t design wall thickness (mm), o.S, o.Z mm³
 * Example: a 20 in round HSS with t = 0.233 in at Fy = 46 ksi has D/t = 85.8, noncompact, and
 * F8-2 governs.
 */
export function computeRoundHssFlexure(o: {
	D: number;
	t: number;
	Fy: number;
	E: number;
	S: number;
	Z: number;
}): HssFlexure {
	const compactness = classifyRoundHssFlexure(o);
	const wall = compactness.elements[0];
	if (wall.lambda >= (0.45 * o.E) / o.Fy) {
		const reason = 'D/t is not below 0.45E/Fy: F8 does not apply (F8 scope).';
		return { supported: false, clause: 'AISC 360-22 F8', reason, compactness };
	}
	const Mp = o.Fy * o.Z;
	const limitStates: Record<string, HssLimitState> = {};
	if (wall.status === 'noncompact') {
		const Mn = ((0.021 * o.E) / wall.lambda + o.Fy) * o.S;
		limitStates['local buckling'] = { Mn, equation: 'F8-2' };
	} else if (wall.status === 'slender') {
		limitStates['local buckling'] = { Mn: ((0.33 * o.E) / wall.lambda) * o.S, equation: 'F8-3' };
	}
	const { Mn, governing } = pickLeast(Mp, limitStates);
	const equation = limitStates[governing]?.equation ?? 'F8-1';
	return {
		supported: true,
		Mn,
		Mp,
		governing,
		clause: `AISC 360-22 F8 (${equation})`,
		factors: FLEXURE_FACTORS,
		limitStates,
		compactness
	};
}
