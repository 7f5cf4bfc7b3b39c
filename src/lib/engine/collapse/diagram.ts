/**
 * Collapse moment and shear diagrams, and exact readings from them: on each interval between
 * diagram points M is a cubic at most, so Hermite interpolation from M and V = dM/dx at the two
 * ends reproduces it exactly.
 */
import { findStationaryPoints } from './extremes';
import { evaluateMoment, evaluateShear, type FieldModel } from './statics';
import type { Interval, Station } from './stations';
import type { CollapseDiagram } from './types';

/** Points per loaded interval for drawing (the exact peaks are added on top). */
const DRAW_POINTS = 8;

/** Samples the field z: stations on both sides, drawing points and exact peaks inside intervals. */
export function sampleDiagram(options: {
	model: FieldModel;
	z: number[];
	stations: Station[];
	intervals: Interval[];
}): CollapseDiagram {
	const { model, z, stations, intervals } = options;
	const out: CollapseDiagram = { x: [], M: [], V: [] };
	const push = (x: number, side: 1 | -1) => {
		out.x.push(x);
		out.M.push(evaluateMoment(model, z, x, side));
		out.V.push(evaluateShear(model, z, x, side));
	};
	const xs = [...new Set(stations.map((s) => s.x))];
	const L = model.nodeX[model.nodeX.length - 1];
	xs.forEach((x, i) => {
		if (x > 0) push(x, -1);
		if (x < L) push(x, 1);
		const iv = intervals[i];
		if (!iv || !iv.loaded) return;
		const inner = Array.from(
			{ length: DRAW_POINTS },
			(_, k) => iv.from + ((k + 1) * (iv.to - iv.from)) / (DRAW_POINTS + 1)
		);
		inner.push(...findStationaryPoints(model, z, iv));
		inner.sort((a, b) => a - b).forEach((x) => push(x, -1));
	});
	return out;
}

/** Scales a normalised diagram back to mm, N·mm and N. */
export function scaleDiagram(
	d: CollapseDiagram,
	s: { length: number; moment: number; force: number }
): CollapseDiagram {
	return {
		x: d.x.map((v) => v * s.length),
		M: d.M.map((v) => v * s.moment),
		V: d.V.map((v) => v * s.force)
	};
}

function locate(d: CollapseDiagram, x: number, side: 'left' | 'right'): number {
	const n = d.x.length;
	if (n < 2) throw new Error('invariant: diagram has fewer than two points');
	// Segment i spans [x_i, x_{i+1}] with x_i < x_{i+1}; a jump sits between equal positions.
	let found = -1;
	for (let i = 0; i + 1 < n; i++) {
		if (d.x[i] === d.x[i + 1]) continue;
		if (x >= d.x[i] && x <= d.x[i + 1]) {
			found = i;
			if (side === 'left' || x < d.x[i + 1]) break;
		}
	}
	if (found >= 0) return found;
	// A position given in other units may miss an end by rounding: read the end segment there.
	const tol = 1e-9 * (d.x[n - 1] - d.x[0]);
	if (x < d.x[0] && x >= d.x[0] - tol) return locate(d, d.x[0], side);
	if (x > d.x[n - 1] && x <= d.x[n - 1] + tol) return locate(d, d.x[n - 1], side);
	throw new RangeError(`x = ${x} lies outside the beam`);
}

function hermite(d: CollapseDiagram, i: number, x: number): { M: number; V: number } {
	const [x0, x1] = [d.x[i], d.x[i + 1]];
	const h = x1 - x0;
	const t = Math.min(1, Math.max(0, (x - x0) / h));
	const [m0, m1, v0, v1] = [d.M[i], d.M[i + 1], d.V[i] * h, d.V[i + 1] * h];
	const M =
		(2 * t ** 3 - 3 * t ** 2 + 1) * m0 +
		(t ** 3 - 2 * t ** 2 + t) * v0 +
		(-2 * t ** 3 + 3 * t ** 2) * m1 +
		(t ** 3 - t ** 2) * v1;
	const dM =
		(6 * t ** 2 - 6 * t) * m0 +
		(3 * t ** 2 - 4 * t + 1) * v0 +
		(-6 * t ** 2 + 6 * t) * m1 +
		(3 * t ** 2 - 2 * t) * v1;
	return { M, V: dM / h };
}

/** A collapse diagram, or a solved result that carries one. */
export type DiagramSource = CollapseDiagram | { diagram: CollapseDiagram };

const toDiagram = (s: DiagramSource): CollapseDiagram => ('diagram' in s ? s.diagram : s);

/**
 * Bending moment at x (mm), N·mm, sagging positive, from a collapse result or its diagram. Exact
 * between diagram points; at a jump `side` picks the value just left or right of x (default left).
 * @example momentAt(result, 3000) // ≈ 100e6 for case A1 at collapse
 */
export function momentAt(
	source: DiagramSource,
	x: number,
	side: 'left' | 'right' = 'left'
): number {
	const d = toDiagram(source);
	return hermite(d, locate(d, x, side), x).M;
}

/** Shear force at x (mm), N (V = dM/dx), from a result or its diagram; `side` as in `momentAt`. */
export function shearAt(source: DiagramSource, x: number, side: 'left' | 'right' = 'left'): number {
	const d = toDiagram(source);
	return hermite(d, locate(d, x, side), x).V;
}
