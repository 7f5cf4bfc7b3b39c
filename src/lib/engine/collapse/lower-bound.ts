/**
 * The static theorem as a semi-infinite linear program: maximise an objective (λ, or the margin
 * under the fixed loads alone) over moment fields in equilibrium with |M| ≤ Mp at every x. It is
 * solved on a finite set of points; the exact extremes of the resulting field on every interval
 * are added wherever they reach the resistance, and the program is solved again, until the field
 * is admissible everywhere. A point added at a peak makes the next field's peak move by the
 * square of the distance, so the loop converges in a few rounds.
 */
import {
	addNewPoints,
	findPeaks,
	makePoint,
	measureStations,
	seedStations,
	type CheckPoint
} from './check-points';
import type { SolutionSpace } from './nullspace';
import { addRow, createProgram, solveProgram } from './simplex';
import type { FieldModel } from './statics';
import type { Interval, Station } from './stations';

/** A checked point with its two rows (re-exported for the mechanism reader). */
export type { CheckPoint };

/** Result of the static linear program. */
export type StaticSolution =
	| {
			status: 'optimal';
			/** Field unknowns z (last one is λ). */
			z: number[];
			/** Objective reached (λ, or the margin δ). */
			objective: number;
			points: CheckPoint[];
			/** Dual values per point: [sagging, hogging], for the normalised rows. */
			duals: [number, number][];
			/** Largest exact value of M/Mp − (1 − margin) found on the final field. */
			violation: number;
	  }
	| { status: 'unbounded' | 'infeasible' };

/** What to maximise: λ, or a uniform margin δ with |M| ≤ (1 − δ)·Mp (λ held by the space). */
export type StaticObjective = 'lambda' | 'margin';

/** Solves the static program exactly (to rounding) by adding the field's peaks as points. */
export function solveStaticProgram(options: {
	model: FieldModel;
	space: SolutionSpace;
	stations: Station[];
	intervals: Interval[];
	objective: StaticObjective;
	/**
	 * Largest excess over Mp left in the final field once λ has settled: rounding level (default)
	 * when the field is the certificate, looser when only λ is wanted.
	 */
	fieldTolerance?: number;
}): StaticSolution {
	const { model, space, stations, intervals, objective, fieldTolerance = 1e-12 } = options;
	const margin = objective === 'margin';
	const points = seedStations(stations, intervals).map((s) => makePoint(model, space, s));
	const d = space.basis.length;
	const c = margin
		? [...new Array<number>(d).fill(0), 1]
		: space.basis.map((v) => v[model.lambdaIndex]);
	const lp = createProgram(c);
	const addPoint = (p: CheckPoint) => {
		addRow(lp, margin ? [...p.rowSag, 1] : p.rowSag, p.hSag);
		addRow(lp, margin ? [...p.rowHog, 1] : p.rowHog, p.hHog);
	};
	points.forEach(addPoint);
	let previous = NaN;
	let still = 0;
	let lastGood: StaticSolution | null = null;
	for (let round = 0; round < MAX_ROUNDS; round++) {
		const result = solveProgram(lp);
		// A later round can only fail by rounding (it adds rows to a solved program): keep the last
		// answer.
		if (result.status !== 'optimal') return lastGood ?? { status: result.status };
		if (result.residual > 1e-9 && lastGood) return lastGood;
		const y = result.y;
		const z = space.particular.slice();
		for (let k = 0; k < d; k++) for (let i = 0; i < z.length; i++) z[i] += y[k] * space.basis[k][i];
		const limit = margin ? 1 - y[d] : 1;
		const peaks = findPeaks(model, z, intervals, limit);
		const objective = margin ? y[d] : z[model.lambdaIndex];
		const count = points.length;
		const duals = points.map((_, i) => [result.w[2 * i], result.w[2 * i + 1]] as [number, number]);
		const violation = Math.max(peaks.worst, measureStations(model, z, stations, limit));
		lastGood = { status: 'optimal', z, objective, points: points.slice(), duals, violation };
		// Where the optimum leaves part of the field free, its peaks can wander from round to round
		// with λ unchanged; stop then and let the certificate account for what is left.
		still =
			Math.abs(objective - previous) <= 1e-15 * Math.max(1, Math.abs(objective)) ? still + 1 : 0;
		previous = objective;
		if ((still >= 2 && violation <= fieldTolerance) || still >= 40) return lastGood;
		addNewPoints(points, peaks.near, limit, (s) => makePoint(model, space, s));
		if (points.length === count) return lastGood;
		for (let i = count; i < points.length; i++) addPoint(points[i]);
	}
	return lastGood ?? { status: 'infeasible' };
}

/** Refinement rounds before the last answer is returned as it stands. */
const MAX_ROUNDS = 60;
