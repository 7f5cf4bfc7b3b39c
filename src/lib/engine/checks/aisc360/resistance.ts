/**
 * Shared pieces of the AISC 360-22 resistance functions: the resistance and safety factors that
 * come with every nominal strength, and the step from nominal to available strength.
 * AISC 360-22 B3.1 (LRFD: Ru ≤ φRn) and B3.2 (ASD: Ra ≤ Rn/Ω) [from memory of the clause numbers].
 */

/** Resistance factor φ (LRFD) and safety factor Ω (ASD) of one limit state. */
export interface ResistanceFactors {
	/** φ, for LRFD. */
	phi: number;
	/** Ω, for ASD. */
	omega: number;
}

/** LRFD or ASD: how a nominal strength becomes an available strength. */
export type AiscMethod = 'lrfd' | 'asd';

/** Flexure, AISC 360-22 F1(a): φb = 0.90, Ωb = 1.67 [from memory; used in the Design Examples]. */
export const FLEXURE_FACTORS: ResistanceFactors = { phi: 0.9, omega: 1.67 };

/**
 * Available strength: φ·Rn (LRFD) or Rn/Ω (ASD).
 * @param Rn nominal strength (N or N·mm); the result has the same unit
 * @example computeAvailableStrength(1000, { phi: 0.9, omega: 1.67 }, 'asd') // ≈ 598.8
 */
export function computeAvailableStrength(
	Rn: number,
	factors: ResistanceFactors,
	method: AiscMethod
): number {
	return method === 'lrfd' ? factors.phi * Rn : Rn / factors.omega;
}
