/**
 * A cleaner lower-bound field. Where the optimum leaves part of the beam free (spans that do not
 * move in the mechanism), the program's field sits on the resistance there at the points it
 * knows and may poke a rounding-level amount above it in between. Holding λ at its optimum (less
 * 10⁻¹²) and pushing the field in those spans away from the resistance by a uniform margin δ
 * leaves a field that is admissible outright, so the lower bound meets λ.
 */
import { addNewPoints, findPeaks, makePoint, type CheckPoint } from './check-points';
import type { SolutionSpace } from './nullspace';
import { addRow, createProgram, solveProgram } from './simplex';
import type { FieldModel } from './statics';
import type { Interval, Station } from './stations';

const ROUNDS = 20;

/** A field with λ ≥ (1 − 10⁻¹²)·λ* and the largest margin in the still spans; null if none. */
export function cleanField(options: {
	model: FieldModel;
	space: SolutionSpace;
	grid: { stations: Station[]; intervals: Interval[] };
	points: CheckPoint[];
	lambda: number;
	movingSpans: number[];
}): number[] | null {
	const { model, space, grid, lambda, movingSpans } = options;
	const X = model.nodeX;
	const still = (x: number) =>
		X.slice(0, -1).every((a, s) => !(x >= a && x <= X[s + 1]) || !movingSpans.includes(s));
	const points = options.points.slice();
	if (!points.some((p) => still(p.x))) return null;
	const d = space.basis.length;
	const lp = createProgram([...new Array<number>(d).fill(0), 1]);
	const add = (p: CheckPoint) => {
		const m = still(p.x) ? 1 : 0;
		addRow(lp, [...p.rowSag, m], p.hSag);
		addRow(lp, [...p.rowHog, m], p.hHog);
	};
	points.forEach(add);
	const lambdaRow = space.basis.map((v) => -v[model.lambdaIndex]);
	addRow(lp, [...lambdaRow, 0], space.particular[model.lambdaIndex] - lambda * (1 - 1e-12));
	addRow(lp, [...new Array<number>(d).fill(0), 1], 0.5);
	const freeIntervals = grid.intervals.filter((iv) => still((iv.from + iv.to) / 2));
	const boundIntervals = grid.intervals.filter((iv) => !still((iv.from + iv.to) / 2));
	let z: number[] | null = null;
	for (let round = 0; round < ROUNDS; round++) {
		const result = solveProgram(lp);
		if (result.status !== 'optimal' || result.y[d] <= 0) return z;
		const y = result.y;
		z = space.particular.slice();
		for (let k = 0; k < d; k++) for (let i = 0; i < z.length; i++) z[i] += y[k] * space.basis[k][i];
		const count = points.length;
		const make = (s: Station) => makePoint(model, space, s);
		addNewPoints(points, findPeaks(model, z, freeIntervals, 1 - y[d]).near, 1 - y[d], make);
		addNewPoints(points, findPeaks(model, z, boundIntervals, 1).near, 1, make);
		if (points.length === count) return z;
		for (let i = count; i < points.length; i++) {
			// Rows go in after the λ and δ rows; the order of rows does not matter to the program.
			add(points[i]);
		}
	}
	return z;
}
