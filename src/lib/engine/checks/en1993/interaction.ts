/**
 * Bending and shear interaction, EN 1993-1-1 6.2.8: above half the plastic shear resistance the
 * shear area works at a reduced yield strength (1 − ρ)·fy.
 */

/** Inputs of {@link computeReducedMomentResistance}; mm, mm³, N/mm². */
export interface ReducedMomentInput {
	/** Plastic modulus about the bending axis, mm³. */
	Wpl: number;
	/** Web area hw·tw (all webs), mm². */
	Aw: number;
	/** Web thickness (sum over webs), mm. */
	tw: number;
	fy: number;
	gammaM0: number;
	rho: number;
}

/**
 * ρ = (2·VEd/Vpl,Rd − 1)² where VEd > 0.5·Vpl,Rd, else 0 (EN 1993-1-1 6.2.8(3)).
 * @param o.vEd design shear, N (sign ignored); o.vplRd N
 * @example
 * computeShearReduction({ vEd: 200e3, vplRd: 318.62e3 }) // ≈ 0.06524
 */
export function computeShearReduction(o: { vEd: number; vplRd: number }): number {
	const ratio = Math.abs(o.vEd) / o.vplRd;
	if (ratio <= 0.5) return 0;
	return (2 * ratio - 1) ** 2;
}

/**
 * My,V,Rd = (Wpl,y − ρ·Aw²/(4tw))·fy/γM0 ≤ Mpl,Rd (EN 1993-1-1 eq. 6.30, I sections with equal
 * flanges, major axis; the same reduction of the webs is used for a hollow section's two webs).
 * @returns N·mm, never below 0
 * @example
 * computeReducedMomentResistance({ Wpl: 623e3, Aw: 1698, tw: 6, fy: 275, gammaM0: 1, rho: 0.06524 })
 * // ≈ 169.17e6 N·mm
 */
export function computeReducedMomentResistance(o: ReducedMomentInput): number {
	const full = (o.Wpl * o.fy) / o.gammaM0;
	const reduced = ((o.Wpl - (o.rho * o.Aw * o.Aw) / (4 * o.tw)) * o.fy) / o.gammaM0;
	return Math.max(0, Math.min(full, reduced));
}
