/**
 * The AISC 360-22 strengths of one span's member, read from its dimensions and properties
 * (SpanMember, internal units): compactness rank, flexure (F2/F3 for I-shapes, F7 for
 * rectangular HSS, F8 for round HSS) and shear (G2.1, G4, G5). The equations are in the files
 * beside this one; this file only maps the member onto their inputs.
 */
import type { SectionClass } from '../basis-types';
import type { SpanMember } from '../member';
import {
	checkHingeCompactness,
	classifyIShapeFlexure,
	classifyRectHssFlexure,
	classifyRoundHssFlexure,
	type SectionCompactness
} from './compactness';
import { computeIShapeFlexure, computeRts, type LtbDemand } from './flexure';
import { computeRectHssFlexure, computeRoundHssFlexure } from './flexure-hss';
import { computeIShapeShear, computeRectHssShear, computeRoundHssShear } from './shear';
import type { ResistanceFactors } from './resistance';

/** Fy limit for members with plastic hinges, Appendix 1, 1.3.2a: 65 ksi in N/mm². */
export const HINGE_FY_LIMIT = 65 * 6.894757293168361;

const isI = (m: SpanMember) => m.shape === 'I' || m.shape === 'welded-I';

/** Web depth h of Table B4.1b: clear distance between flanges less the fillets, mm. */
export const webDepth = (m: SpanMember): number => m.hw - 2 * m.r;

/** Table B4.1b classification of a member, or null for shapes it does not cover. */
export function classifyMember(m: SpanMember, E: number): SectionCompactness | null {
	const Fy = m.fy;
	if (isI(m)) {
		const builtUp = m.shape === 'welded-I';
		return classifyIShapeFlexure({ bf: m.b, tf: m.tf, h: webDepth(m), tw: m.tw, Fy, E, builtUp });
	}
	if (m.shape === 'RHS') return classifyRectHssFlexure({ B: m.b, H: m.h, t: m.tf, Fy, E });
	if (m.shape === 'CHS') return classifyRoundHssFlexure({ D: m.h, t: m.tf, Fy, E });
	return null;
}

/**
 * Neutral rank of a member: 1 compact to λpd with Fy ≤ 65 ksi (hinges allowed), 2 compact,
 * 3 noncompact, 4 slender or a case not covered (noncompact I web: F4/F5). Solid bars take 3:
 * the yield moment Fy·Sx, a cautious reading of F11.
 */
export function rankMember(m: SpanMember, E: number): { rank: SectionClass; note: string } {
	const c = classifyMember(m, E);
	if (!c) return { rank: 3, note: 'Solid bar: yield moment Fy·Sx (cautious reading of F11).' };
	const words = c.elements
		.map(
			(e) =>
				`${e.element} ${e.lambda.toFixed(2)} (λp ${e.lambdaP.toFixed(2)}, λr ${e.lambdaR.toFixed(2)}) ${e.status}`
		)
		.join('; ');
	const note = `AISC 360-22 Table B4.1b: ${words}.`;
	const webNotCompact = isI(m) && c.elements[1].status !== 'compact';
	if (c.overall === 'slender' || webNotCompact) return { rank: 4, note };
	if (c.overall === 'noncompact') return { rank: 3, note };
	const shape = isI(m) ? 'I' : m.shape === 'RHS' ? 'rect-HSS' : 'round-HSS';
	const hinge = checkHingeCompactness({ shape, compactness: c, Fy: m.fy, E });
	const ok = hinge.every((e) => e.ok) && m.fy <= HINGE_FY_LIMIT;
	return { rank: ok ? 1 : 2, note };
}

/** Nominal flexural strength with its clause and the values the row shows. */
export interface MemberFlexure {
	/** Mn, N·mm (0 where the shape is not covered: the scope gate keeps such beams out). */
	Mn: number;
	clause: string;
	factors: ResistanceFactors;
	values: Record<string, number>;
	/** Cb used, and how (F1-1 or the segment's Mcr). */
	Cb?: number;
}

const FLEXURE: ResistanceFactors = { phi: 0.9, omega: 1.67 };

/**
 * Mn of a member over an unbraced length Lb (0: braced throughout, no lateral-torsional
 * buckling), with the LTB demand for I-shapes and Cb for rectangular HSS.
 */
export function computeMemberFlexure(
	m: SpanMember,
	o: { E: number; Lb: number; ltb: LtbDemand; Cb: number }
): MemberFlexure {
	const Fy = m.fy;
	if (isI(m)) {
		const r = computeIShapeFlexure({
			Fy,
			E: o.E,
			Zx: m.Wpl,
			Sx: m.Wel,
			ry: m.iz,
			rts: computeRts({ Iy: m.Iz, Cw: m.Iw, Sx: m.Wel }),
			J: m.It,
			ho: m.h - m.tf,
			bf: m.b,
			tf: m.tf,
			h: webDepth(m),
			tw: m.tw,
			builtUp: m.shape === 'welded-I',
			Lb: o.Lb,
			ltb: o.ltb
		});
		if (!r.supported) return { Mn: 0, clause: r.clause, factors: FLEXURE, values: {} };
		const values: Record<string, number> = { mn: r.Mn, lb: o.Lb, lp: r.Lp, lr: r.Lr };
		if (o.Lb > 0) values.cb = r.ltb.Cb;
		return { Mn: r.Mn, clause: r.clause, factors: r.factors, values, Cb: r.ltb.Cb };
	}
	if (m.shape === 'RHS') {
		const r = computeRectHssFlexure({
			B: m.b,
			H: m.h,
			t: m.tf,
			Fy,
			E: o.E,
			A: m.A,
			Ix: m.Iy,
			Sx: m.Wel,
			Zx: m.Wpl,
			ry: m.iz,
			J: m.It,
			Lb: o.Lb,
			Cb: o.Cb
		});
		if (!r.supported) return { Mn: 0, clause: r.clause, factors: FLEXURE, values: {} };
		return { Mn: r.Mn, clause: r.clause, factors: r.factors, values: { mn: r.Mn, lb: o.Lb } };
	}
	if (m.shape === 'CHS') {
		const r = computeRoundHssFlexure({ D: m.h, t: m.tf, Fy, E: o.E, S: m.Wel, Z: m.Wpl });
		if (!r.supported) return { Mn: 0, clause: r.clause, factors: FLEXURE, values: {} };
		return { Mn: r.Mn, clause: r.clause, factors: r.factors, values: { mn: r.Mn } };
	}
	const Mn = Fy * m.Wel;
	return { Mn, clause: 'AISC 360-22 F11 (Fy·Sx, cautious)', factors: FLEXURE, values: { mn: Mn } };
}

/** Shear area of Chapter G: d·tw (I), 2ht with h = H − 3t (rectangular HSS), Ag (round, bar). */
export function computeAiscShearArea(m: {
	shape: string;
	A: number;
	h: number;
	tw: number;
	tf: number;
}): number | null {
	if (m.shape === 'I' || m.shape === 'welded-I') return m.h * m.tw;
	if (m.shape === 'RHS') return 2 * (m.h - 3 * m.tf) * m.tf;
	if (m.shape === 'CHS' || m.shape === 'flat') return m.A;
	return null;
}

/** Nominal shear strength Vn, N, with its factors and clause. */
export function computeMemberShear(
	m: SpanMember,
	E: number
): { Vn: number; factors: ResistanceFactors; clause: string } {
	const Fy = m.fy;
	if (isI(m)) {
		const rolled = m.shape === 'I';
		return computeIShapeShear({ d: m.h, tw: m.tw, h: webDepth(m), Fy, E, rolled });
	}
	if (m.shape === 'RHS') return computeRectHssShear({ H: m.h, t: m.tf, Fy, E });
	if (m.shape === 'CHS') {
		// Lv unknown: a very long shear span leaves the G5-2b value, the lower (cautious) one.
		return computeRoundHssShear({ D: m.h, t: m.tf, Ag: m.A, Lv: 1e12, Fy, E });
	}
	return { Vn: 0.6 * Fy * m.A, factors: { phi: 0.9, omega: 1.67 }, clause: 'AISC 360-22 G1' };
}
