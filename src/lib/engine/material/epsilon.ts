/**
 * The material factor ε = √(235 / fy) of EN 1993-1-1 (Table 5.2 and the clauses that borrow it:
 * 6.2.6(6) web shear slenderness, 6.3.5.3 stable length).
 * @param fy yield strength, N/mm²
 * @example computeEpsilon(275) // ≈ 0.9244
 */
export function computeEpsilon(fy: number): number {
	return Math.sqrt(235 / fy);
}
