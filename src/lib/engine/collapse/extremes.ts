/**
 * Exact extremes of a moment field inside one interval: on an interval the line load is linear,
 * so the shear is a quadratic in x and its roots (where the moment peaks) come in closed form.
 */
import { computeLoadIntensity } from './load-effects';
import { evaluateShear, type FieldModel } from './statics';
import type { Interval } from './stations';

/** Line-load intensity of the field's loads at x (fixed plus λ times variable), per side. */
function totalIntensity(model: FieldModel, z: number[], x: number, side: 1 | -1): number {
	const lambda = z[model.lambdaIndex];
	return (
		computeLoadIntensity(model.fixedLoads, x, side) +
		lambda * computeLoadIntensity(model.variableLoads, x, side)
	);
}

/** Positions strictly inside the interval where the shear of field z is zero. */
export function findStationaryPoints(model: FieldModel, z: number[], interval: Interval): number[] {
	if (!interval.loaded) return [];
	const { from, to } = interval;
	const h = to - from;
	const Va = evaluateShear(model, z, from, 1);
	const wa = totalIntensity(model, z, from, 1);
	const wb = totalIntensity(model, z, to, -1);
	// V(t) = Va − wa·t − (wb − wa)·t²/(2h), t = x − from
	const a = -(wb - wa) / (2 * h);
	const b = -wa;
	const c = Va;
	const roots = solveQuadratic(a, b, c);
	return roots.filter((t) => t > 0 && t < h).map((t) => from + t);
}

/** Real roots of a·t² + b·t + c = 0, computed without cancellation. */
export function solveQuadratic(a: number, b: number, c: number): number[] {
	const scale = Math.max(Math.abs(a), Math.abs(b), Math.abs(c));
	if (scale === 0) return [];
	if (a === 0) return b === 0 ? [] : [-c / b];
	const disc = b * b - 4 * a * c;
	if (disc < 0) return [];
	const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(disc));
	const roots = [q / a];
	if (q !== 0) roots.push(c / q);
	return roots;
}
