/**
 * Exact shear, moment, slope and deflection inside one element, by statics from its left-end
 * forces plus the loads on it, and by integrating the curvature M/EI twice from its left-end
 * displacements (no meshing: exact for point, uniform and linear loads).
 */
import type { ElementLoad } from './element-loads';
import { sumLoadIntegral } from './element-loads';
import { readByTable } from './field-table';
import type { Side } from './types';

/** What is needed to read one element. */
export interface ElementData {
	L: number;
	EI: number;
	loads: ElementLoad[];
	/** [v1, θ1, v2, θ2] (v up, θ anticlockwise). */
	displacements: number[];
	/** [F1, M1, F2, M2] applied to the element. */
	forces: number[];
}

/**
 * From this many loads on an element a reading starts from a table of states at the load
 * positions instead of summing every load again: the same fields, each reading in constant time.
 */
const MANY_LOADS = 16;

/** Local state: V (N), M (N·mm, sagging +), w (mm, down +), slope of w (rad). */
export interface LocalState {
	V: number;
	M: number;
	w: number;
	slope: number;
}

/**
 * State at local position s (0 ≤ s ≤ L). `side` chooses the limit at a point load: 'right'
 * counts a load at s as already passed.
 * @example
 * // pin–pin 6 m span, 1 kN at midspan: M(3000) = PL/4 = 1.5e6 N·mm
 */
export function readElement(el: ElementData, s: number, side: Side): LocalState {
	return el.loads.length >= MANY_LOADS ? readByTable(el, s, side) : readBySums(el, s, side);
}

/** {@link readElement} summing every load (kept for few loads, and to check the table). */
export function readBySums(el: ElementData, s: number, side: Side): LocalState {
	const [v1, t1] = el.displacements;
	const [F1, M1] = el.forces;
	const at = side === 'right';
	const V = F1 - sumLoadIntegral(el.loads, s, at, () => 1);
	const M = -M1 + F1 * s - sumLoadIntegral(el.loads, s, at, (t) => s - t);
	const loadSlope = sumLoadIntegral(el.loads, s, at, (t) => (s - t) ** 2 / 2);
	const dTheta = (-M1 * s + (F1 * s * s) / 2 - loadSlope) / el.EI;
	const dV =
		((-M1 * s * s) / 2 +
			(F1 * s ** 3) / 6 -
			sumLoadIntegral(el.loads, s, at, (t) => (s - t) ** 3 / 6)) /
		el.EI;
	return { V, M, w: -(v1 + t1 * s + dV), slope: -(t1 + dTheta) };
}

/** Local positions inside an element where the diagram can jump or kink (load ends, points). */
export function listBreakpoints(el: ElementData): number[] {
	const xs = new Set<number>([0, el.L]);
	for (const load of el.loads) {
		if (load.kind === 'point') xs.add(load.a);
		else {
			xs.add(load.a);
			xs.add(load.b);
		}
	}
	return [...xs].filter((s) => s >= 0 && s <= el.L).sort((a, b) => a - b);
}
