/**
 * Lateral-torsional buckling modification factor Cb, AISC 360-22 F1 (eq. F1-1)
 * [from memory of the equation; the formula is also quoted in Gaylord, Gaylord & Stallmeyer,
 * Design of Steel Structures].
 */

/** Absolute moments of one unbraced segment, N·mm (signs are dropped). */
export interface SegmentMoments {
	/** Largest |M| anywhere in the unbraced segment. */
	Mmax: number;
	/** |M| at the quarter point, the centre and the three-quarter point of the segment. */
	MA: number;
	MB: number;
	MC: number;
}

/**
 * Cb = 12.5·Mmax / (2.5·Mmax + 3·MA + 4·MB + 3·MC) (F1-1), for doubly symmetric members;
 * 1.0 for a segment without moment (nothing to buckle). For a cantilever whose free end is
 * unbraced the Specification's user note takes Cb = 1.0: the caller passes that case as 1.0.
 * @example computeCb({ Mmax: 1, MA: 0.75, MB: 1, MC: 0.75 }) // 12.5/9.5 ≈ 1.136 (simple span, UDL)
 */
export function computeCb(m: SegmentMoments): number {
	const Mmax = Math.abs(m.Mmax);
	if (Mmax === 0) return 1;
	const denominator = 2.5 * Mmax + 3 * Math.abs(m.MA) + 4 * Math.abs(m.MB) + 3 * Math.abs(m.MC);
	return (12.5 * Mmax) / denominator;
}
