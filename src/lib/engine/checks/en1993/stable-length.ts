/**
 * Stable length between lateral restraints next to a plastic hinge, EN 1993-1-1 6.3.5.3 (from
 * memory; its wording and limits should be verified against the standard): for uniform rolled
 * I sections with h/tf ≤ 40ε under linear moment and no significant axial force,
 * Lstable = 35·ε·iz for 0.625 ≤ ψ ≤ 1 and (60 − 40ψ)·ε·iz for −1 ≤ ψ ≤ 0.625.
 */
export { computeEndMomentRatio } from '../end-moment-ratio';
import { computeEpsilon } from '../../material/epsilon';

/** Inputs of {@link computeStableLength}; mm and N/mm². */
export interface StableLengthInput {
	fy: number;
	/** Minor-axis radius of gyration, mm. */
	iz: number;
	h: number;
	tf: number;
	/** Ratio of end moments, smaller/larger, negative in double curvature (−1 ≤ ψ ≤ 1). */
	psi: number;
}

/**
 * Stable length Lstable, mm, or null when the rule does not apply (h/tf > 40ε).
 * @example
 * computeStableLength({ fy: 275, iz: 38.6, h: 303.4, tf: 10.2, psi: 0 }) // ≈ 2141 mm
 */
export function computeStableLength(o: StableLengthInput): number | null {
	const epsilon = computeEpsilon(o.fy);
	if (o.h / o.tf > 40 * epsilon) return null;
	const psi = Math.max(-1, Math.min(1, o.psi));
	const factor = psi >= 0.625 ? 35 : 60 - 40 * psi;
	return factor * epsilon * o.iz;
}
