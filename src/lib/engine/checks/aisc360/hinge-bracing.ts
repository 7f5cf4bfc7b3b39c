/**
 * Laterally unbraced length allowed next to a plastic hinge, Lpd, AISC 360-22 Appendix 1,
 * 1.3.2c, for design by inelastic analysis (LRFD only).
 *
 * Status: from memory of the Specification (equations A-1-5 … A-1-7 of 360-16; engineering
 * reference C.5, tagged "verify"). The moment sign follows the Appendix as recalled: M1 and
 * Mmid count positive when they compress the same flange as M2, so uniform moment gives
 * M1′/M2 = +1 (the shortest Lpd, 0.044(E/Fy)ry) and full reverse curvature −1 (0.196(E/Fy)ry).
 */
import { assertFinite } from '../../model/issue';

/** Moments of the unbraced segment next to the hinge, in the engine's sign (sagging +), N·mm. */
export interface HingeSegmentMoments {
	/** End moments of the segment. */
	Mstart: number;
	Mend: number;
	/** Moment at mid-length. */
	Mmid: number;
	/** Largest |M| anywhere in the segment. */
	MmaxAbs: number;
}

/**
 * M1′/M2 of A-1-6: +1 when |M| inside the segment exceeds M2 (A-1-6a); M1/M2 when
 * Mmid ≤ (M1 + M2)/2 (A-1-6b); (2Mmid − M2)/M2 otherwise (A-1-6c). M2 is the larger end
 * moment in magnitude.
 * @example computeEffectiveMomentRatio({ Mstart: 1, Mend: 1, Mmid: 1, MmaxAbs: 1 }) // 1
 */
export function computeEffectiveMomentRatio(m: HingeSegmentMoments): number {
	const [big, small] =
		Math.abs(m.Mstart) >= Math.abs(m.Mend) ? [m.Mstart, m.Mend] : [m.Mend, m.Mstart];
	const M2 = Math.abs(big);
	if (M2 === 0 || m.MmaxAbs > M2 * (1 + 1e-12)) return 1;
	const sense = Math.sign(big);
	const M1 = small === 0 ? 0 : small * sense; // no −0 in the report
	const Mmid = m.Mmid * sense;
	if (Mmid <= (M1 + M2) / 2) return M1 / M2;
	return (2 * Mmid - M2) / M2;
}

/** Lpd with the ratio behind it; Lpd null where the Appendix sets no limit. */
export interface HingeBracingLimit {
	Lpd: number | null;
	ratio: number;
	clause: string;
}

/**
 * Lpd next to a hinge: I-shapes bent about the major axis [0.12 − 0.076(M1′/M2)](E/Fy)·ry
 * (A-1-5); rectangular HSS [0.17 − 0.10(M1′/M2)](E/Fy)·ry ≥ 0.10(E/Fy)·ry (A-1-7); no limit for
 * round and square sections (1.3.2c).
 * @param o.ry minor-axis radius of gyration, mm; o.E, o.Fy MPa
 * @returns Lpd in mm
 * @example // W16x40, Fy 50, uniform moment: 0.044 × 580 × 1.57 in ≈ 40.1 in
 * computeLpd({ shape: 'I', ry: 39.9, E: 199948, Fy: 344.7, moments: { Mstart: 1, Mend: 1, Mmid: 1, MmaxAbs: 1 } })
 */
export function computeLpd(o: {
	shape: 'I' | 'rect-HSS' | 'round-HSS' | 'square-HSS';
	ry: number;
	E: number;
	Fy: number;
	moments: HingeSegmentMoments;
}): HingeBracingLimit {
	const ratio = computeEffectiveMomentRatio(o.moments);
	const scale = (o.E / o.Fy) * o.ry;
	const clause = 'AISC 360-22 Appendix 1, 1.3.2c';
	if (o.shape === 'round-HSS' || o.shape === 'square-HSS') return { Lpd: null, ratio, clause };
	const Lpd =
		o.shape === 'I'
			? (0.12 - 0.076 * ratio) * scale
			: Math.max((0.17 - 0.1 * ratio) * scale, 0.1 * scale);
	return { Lpd: assertFinite(Lpd, 'AISC Lpd'), ratio, clause };
}
