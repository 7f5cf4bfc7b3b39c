/**
 * The temporary-load multiplier at which a check reaches its capacity. Utilisation is not
 * linear in the multiplier when fixed loads exist (LTB, web and shear interaction), so the root
 * of u(t) = 1 is bracketed and then found by bisection. u must not decrease as t grows.
 */

/** Options of {@link findMultiplierAtCapacity}. */
export interface MultiplierSearch {
	/** Utilisation as a function of the multiplier t ≥ 0 on the temporary loads. */
	utilisation: (t: number) => number;
	/** Largest multiplier worth searching; beyond it the check is taken as unaffected. */
	upperLimit?: number;
	/** Relative tolerance on t. */
	tolerance?: number;
}

/**
 * Smallest t ≥ 0 with u(t) ≥ 1: 0 when the fixed loads alone fail the check, null when u stays
 * below 1 up to the upper limit (default 1e6).
 * @example
 * findMultiplierAtCapacity({ utilisation: (t) => 0.2 + 0.4 * t }) // ≈ 2
 */
export function findMultiplierAtCapacity(o: MultiplierSearch): number | null {
	const upper = o.upperLimit ?? 1e6;
	const tol = o.tolerance ?? 1e-7;
	const u = (t: number) => {
		const v = o.utilisation(t);
		if (Number.isNaN(v)) throw new Error('invariant: utilisation must be a number');
		return v;
	};
	if (u(0) >= 1) return 0;
	let lo = 0;
	let hi = 1;
	while (u(hi) < 1) {
		lo = hi;
		hi *= 2;
		if (hi > upper) return null;
	}
	while (hi - lo > tol * hi) {
		const mid = (lo + hi) / 2;
		if (u(mid) >= 1) hi = mid;
		else lo = mid;
	}
	return (lo + hi) / 2;
}
