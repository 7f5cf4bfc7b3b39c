/**
 * The static theorem as a semi-infinite linear program: maximise an objective (λ, or the margin
 * under the fixed loads alone) over moment fields in equilibrium with |M| ≤ Mp at every x. It is
 * solved on a finite set of points; the exact extremes of the resulting field on every interval
 * are added wherever they reach the resistance, and the program is solved again, until the field
 * is admissible everywhere. A point added at a peak makes the next field's peak move by the
 * square of the distance, so the loop converges in a few rounds.
 */
import type { Side } from './load-effects';
import { computeLoadMoment } from './load-effects';
import { findStationaryPoints } from './extremes';
import type { SolutionSpace } from './nullspace';
import { addRow, createProgram, solveProgram } from './simplex';
import { evaluateMoment, evaluateMomentBasis, type FieldModel } from './statics';
import type { Interval, Station } from './stations';

/** A point where |M| ≤ Mp is imposed. */
export interface CheckPoint extends Station {
	/** Row coefficients (over y) and right-hand sides of the sagging and hogging rows. */
	rowSag: number[];
	rowHog: number[];
	hSag: number;
	hHog: number;
}

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

function makePoint(model: FieldModel, space: SolutionSpace, s: Station): CheckPoint {
	const B = evaluateMomentBasis(model, s.x, s.side);
	const M0 = -computeLoadMoment(model.fixedLoads, s.x) + dot(B, space.particular);
	const k = space.basis.length;
	const rowSag = new Array<number>(k);
	const rowHog = new Array<number>(k);
	for (let i = 0; i < k; i++) {
		const v = dot(B, space.basis[i]);
		rowSag[i] = v / s.sag;
		rowHog[i] = -v / s.hog;
	}
	return {
		x: s.x,
		side: s.side,
		sag: s.sag,
		hog: s.hog,
		rowSag,
		rowHog,
		hSag: (s.sag - M0) / s.sag,
		hHog: (s.hog + M0) / s.hog
	};
}

function dot(a: number[], b: number[]): number {
	let s = 0;
	for (let i = 0; i < a.length; i++) s += a[i] * b[i];
	return s;
}

/** Seeds: the stations, plus third points of loaded intervals so the program starts bounded. */
function seedStations(stations: Station[], intervals: Interval[]): Station[] {
	const seeds = [...stations];
	for (const iv of intervals) {
		if (!iv.loaded) continue;
		for (const t of [1 / 3, 2 / 3]) {
			seeds.push({ x: iv.from + t * (iv.to - iv.from), side: -1, sag: iv.sag, hog: iv.hog });
		}
	}
	return seeds;
}

/** Solves the static program exactly (to rounding) by adding the field's peaks as points. */
export function solveStaticProgram(options: {
	model: FieldModel;
	space: SolutionSpace;
	stations: Station[];
	intervals: Interval[];
	objective: StaticObjective;
}): StaticSolution {
	const { model, space, stations, intervals, objective } = options;
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
		// A later round can only fail by rounding (it adds rows to a solved program): keep the last answer.
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
		if ((still >= 2 && violation <= 1e-12) || still >= 40) return lastGood;
		addNewPoints(points, peaks.near, limit, (s) => makePoint(model, space, s));
		if (points.length === count) return lastGood;
		for (let i = count; i < points.length; i++) addPoint(points[i]);
	}
	return lastGood ?? { status: 'infeasible' };
}

/** Refinement rounds before the last answer is returned as it stands. */
const MAX_ROUNDS = 60;

/** Interior peaks of the field that come within 1e-9 of the limit, and the worst excess. */
function findPeaks(model: FieldModel, z: number[], intervals: Interval[], limit: number) {
	const near: (Station & { ratio: number })[] = [];
	let worst = -Infinity;
	for (const iv of intervals) {
		for (const x of findStationaryPoints(model, z, iv)) {
			const M = evaluateMoment(model, z, x, -1);
			const ratio = M >= 0 ? M / iv.sag : -M / iv.hog;
			worst = Math.max(worst, ratio - limit);
			if (ratio > limit - 1e-9) near.push({ x, side: -1, sag: iv.sag, hog: iv.hog, ratio });
		}
	}
	return { near, worst };
}

/** Largest M/Mp − limit at the stations. */
export function measureStations(
	model: FieldModel,
	z: number[],
	stations: Station[],
	limit: number
): number {
	let worst = -Infinity;
	for (const s of stations) {
		const M = evaluateMoment(model, z, s.x, s.side);
		worst = Math.max(worst, (M >= 0 ? M / s.sag : -M / s.hog) - limit);
	}
	return worst;
}

/**
 * Adds peaks as new points: a violating peak unless it repeats a point (1e-13), a peak that only
 * touches the limit when it is at least 1e-9 from every point. Touching peaks sharpen hinge
 * positions (λ is stationary there, so 1e-9 in x is far below rounding in λ); spacing them out
 * keeps the basis of the program well conditioned.
 */
function addNewPoints(
	points: CheckPoint[],
	candidates: (Station & { ratio: number })[],
	limit: number,
	make: (s: Station) => CheckPoint
): void {
	for (const s of candidates) {
		const spacing = s.ratio > limit + 1e-15 ? 1e-13 : 1e-9;
		if (points.some((p) => Math.abs(p.x - s.x) <= spacing)) continue;
		points.push(make({ x: s.x, side: s.side, sag: s.sag, hog: s.hog }));
	}
}

export type { Side };
