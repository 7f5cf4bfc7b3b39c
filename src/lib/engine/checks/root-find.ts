/**
 * The temporary-load multiplier at which a check reaches its capacity. Utilisation is not
 * linear in the multiplier when fixed loads exist (LTB, web and shear interaction), so the root
 * of u(t) = 1 is bracketed by doubling and then found by the Illinois variant of regula falsi
 * (Dowell & Jarratt, BIT 11, 1971), with a bisection step every fourth step so the bracket
 * always shrinks. u must not decrease once it has started to rise past 1.
 */

/** Options of {@link findMultiplierAtCapacity}. */
export interface MultiplierSearch {
	/** Utilisation as a function of the multiplier t ≥ 0 on the temporary loads. */
	utilisation: (t: number) => number;
	/** Largest multiplier worth searching; beyond it the check is taken as unaffected. */
	upperLimit?: number;
	/** Relative tolerance on t. */
	tolerance?: number;
	/** First trial value of t (default 1); a good guess saves the doubling steps. */
	start?: number;
}

/** Most refinement steps; the Illinois method needs about ten for 1e-7. */
const MAX_STEPS = 100;

/**
 * Largest t ≥ 0 known to keep u(t) < 1, within the tolerance of the smallest t with u(t) ≥ 1:
 * 0 when the fixed loads alone fail the check, null when u stays below 1 up to the upper limit
 * (default 1e6). The safe side of the bracket is returned.
 * @example
 * findMultiplierAtCapacity({ utilisation: (t) => 0.2 + 0.4 * t }) // ≈ 2
 */
export function findMultiplierAtCapacity(o: MultiplierSearch): number | null {
	const upper = o.upperLimit ?? 1e6;
	const tol = o.tolerance ?? 1e-7;
	const f = (t: number) => {
		const v = o.utilisation(t);
		if (Number.isNaN(v)) throw new Error('invariant: utilisation must be a number');
		return v - 1;
	};
	let flo = f(0);
	if (flo >= 0) return 0;
	let lo = 0;
	let hi = Math.min(o.start ?? 1, upper);
	let fhi = f(hi);
	while (fhi < 0) {
		if (hi >= upper) return null;
		[lo, flo] = [hi, fhi];
		hi = Math.min(hi * 2, upper);
		fhi = f(hi);
	}
	let side = 0;
	for (let step = 0; step < MAX_STEPS && hi - lo > tol * hi; step++) {
		let t = step % 4 === 3 ? (lo + hi) / 2 : (lo * fhi - hi * flo) / (fhi - flo);
		if (!(t > lo && t < hi)) t = (lo + hi) / 2;
		const ft = f(t);
		if (ft >= 0) {
			[hi, fhi] = [t, ft];
			if (side === 1) flo /= 2;
			side = 1;
		} else {
			[lo, flo] = [t, ft];
			if (side === -1) fhi /= 2;
			side = -1;
		}
	}
	return lo;
}
