/**
 * Three-point Gauss–Legendre quadrature: exact for polynomials up to degree 5, which covers every
 * integral of a linear line load against the cubic beam influence functions used here.
 */

const NODES = [-Math.sqrt(3 / 5), 0, Math.sqrt(3 / 5)];
const WEIGHTS = [5 / 9, 8 / 9, 5 / 9];

/**
 * ∫ f(t) dt over [a, b] by three-point Gauss–Legendre (exact for degree ≤ 5).
 * @example
 * integrateGauss3((t) => t ** 4, 0, 1) // 0.2
 */
export function integrateGauss3(f: (t: number) => number, a: number, b: number): number {
	if (b <= a) return 0;
	const half = (b - a) / 2;
	const mid = (a + b) / 2;
	let sum = 0;
	for (let i = 0; i < 3; i++) sum += WEIGHTS[i] * f(mid + half * NODES[i]);
	return sum * half;
}
