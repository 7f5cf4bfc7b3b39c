/**
 * The end-moment ratio ψ of a segment, as every design basis uses it for member stability.
 */

/**
 * ψ of a segment from its end moments: smaller over larger magnitude, negative when the ends
 * bend in opposite senses; 1 when both are zero.
 * @example
 * computeEndMomentRatio(-100, 50) // -0.5
 */
export function computeEndMomentRatio(mA: number, mB: number): number {
	const big = Math.max(Math.abs(mA), Math.abs(mB));
	if (big === 0) return 1;
	const small = Math.abs(mA) >= Math.abs(mB) ? mB : mA;
	const large = Math.abs(mA) >= Math.abs(mB) ? mA : mB;
	return small / large;
}
