/**
 * Moment, shear and intensity of a set of loads, seen from the left-hand free body [0, x].
 * Downward loads positive; the returned moment is the moment of the loads about x (positive for
 * downward loads to the left), which the beam subtracts from its reaction moments.
 */
import type { Load } from '../model/types';

/** Side of a position: −1 just left of x, +1 just right (matters only for shear at point loads). */
export type Side = -1 | 1;

/** Moment about x of the loads acting on [0, x], N·mm. Continuous in x. */
export function computeLoadMoment(loads: Load[], x: number): number {
	let m = 0;
	for (const load of loads) {
		if (load.kind === 'point') {
			if (load.x < x) m += load.value * (x - load.x);
		} else if (x > load.from) {
			const d = x - load.from;
			const T = Math.min(x, load.to) - load.from;
			const s0 = load.kind === 'uniform' ? load.value : load.start;
			const k = load.kind === 'uniform' ? 0 : (load.end - load.start) / (load.to - load.from);
			// ∫₀ᵀ (s0 + k t)(d − t) dt
			m += s0 * (d * T - (T * T) / 2) + k * ((d * T * T) / 2 - (T * T * T) / 3);
		}
	}
	return m;
}

/** Resultant of the loads on [0, x], N; a point load exactly at x counts when side is +1. */
export function computeLoadShear(loads: Load[], x: number, side: Side): number {
	let v = 0;
	for (const load of loads) {
		if (load.kind === 'point') {
			if (load.x < x || (load.x === x && side > 0)) v += load.value;
		} else if (x > load.from) {
			const T = Math.min(x, load.to) - load.from;
			const s0 = load.kind === 'uniform' ? load.value : load.start;
			const k = load.kind === 'uniform' ? 0 : (load.end - load.start) / (load.to - load.from);
			v += s0 * T + (k * T * T) / 2;
		}
	}
	return v;
}

/**
 * Line-load intensity at x, N/mm, taken from the given side so that an interval's end values can
 * be read at its ends.
 */
export function computeLoadIntensity(loads: Load[], x: number, side: Side): number {
	let w = 0;
	for (const load of loads) {
		if (load.kind === 'point') continue;
		const inside = side > 0 ? x >= load.from && x < load.to : x > load.from && x <= load.to;
		if (!inside) continue;
		if (load.kind === 'uniform') w += load.value;
		else w += load.start + ((load.end - load.start) * (x - load.from)) / (load.to - load.from);
	}
	return w;
}

/** Total downward resultant of the loads, N, and its moment about x = 0, N·mm. */
export function computeLoadResultant(loads: Load[]): { force: number; momentAboutOrigin: number } {
	let force = 0;
	let moment = 0;
	for (const load of loads) {
		if (load.kind === 'point') {
			force += load.value;
			moment += load.value * load.x;
		} else {
			const h = load.to - load.from;
			const a = load.kind === 'uniform' ? load.value : load.start;
			const b = load.kind === 'uniform' ? load.value : load.end;
			force += ((a + b) / 2) * h;
			// centroid of a trapezoid measured from `from`: h(a + 2b) / (3(a + b)); moment = ∫ w s ds
			moment += ((a + b) / 2) * h * load.from + (h * h * (a + 2 * b)) / 6;
		}
	}
	return { force, momentAboutOrigin: moment };
}
