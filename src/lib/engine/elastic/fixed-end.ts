/**
 * Exact fixed-end forces of a clamped–clamped element under its loads.
 * Point load P at a (b = L − a): R1 = P·b²(3a + b)/L³, M1 = P·a·b²/L², R2 = P·a²(a + 3b)/L³,
 * M2 = −P·a²·b/L² (standard fixed-end actions, e.g. any structural analysis textbook's table of
 * fixed-end moments). Line loads integrate these with three-point Gauss, exact for linear loads.
 */
import type { ElementLoad } from './element-loads';
import { sumLoadIntegral } from './element-loads';

/**
 * End forces the supports of a clamped element apply to it: [R1 (N, up), M1 (N·mm, anticlockwise),
 * R2, M2], for downward loads.
 * @example
 * computeFixedEndForces(6000, [{ kind: 'point', a: 3000, P: 1000 }])
 * // [500, 750000, 500, -750000]  (PL/8 end moments)
 */
export function computeFixedEndForces(L: number, loads: ElementLoad[]): number[] {
	const L2 = L * L;
	const L3 = L2 * L;
	const all = (g: (a: number) => number): number => sumLoadIntegral(loads, L, true, g);
	return [
		all((a) => ((L - a) ** 2 * (3 * a + (L - a))) / L3),
		all((a) => (a * (L - a) ** 2) / L2),
		all((a) => (a * a * (a + 3 * (L - a))) / L3),
		all((a) => -(a * a * (L - a)) / L2)
	];
}

/**
 * Stiffness matrix of a prismatic Euler–Bernoulli beam element, DOFs [v1, θ1, v2, θ2]
 * (v upward, θ anticlockwise), N/mm and N·mm units.
 */
export function computeElementStiffness(L: number, EI: number): number[][] {
	const k = EI / (L * L * L);
	const L2 = L * L;
	return [
		[12 * k, 6 * L * k, -12 * k, 6 * L * k],
		[6 * L * k, 4 * L2 * k, -6 * L * k, 2 * L2 * k],
		[-12 * k, -6 * L * k, 12 * k, -6 * L * k],
		[6 * L * k, 2 * L2 * k, -6 * L * k, 4 * L2 * k]
	];
}
