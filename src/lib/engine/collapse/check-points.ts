/**
 * The points of the static program: where |M| ≤ Mp is imposed, each turned into two rows over
 * the free coordinates y of the moment field, and the search for new points at the exact peaks.
 */
import type { Side } from './load-effects';
import { computeLoadMoment } from './load-effects';
import { findStationaryPoints } from './extremes';
import type { SolutionSpace } from './nullspace';
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

/** The two rows (sagging, hogging) of a point, divided by its resistance. */
export function makePoint(model: FieldModel, space: SolutionSpace, s: Station): CheckPoint {
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
export function seedStations(stations: Station[], intervals: Interval[]): Station[] {
	const seeds = [...stations];
	for (const iv of intervals) {
		if (!iv.loaded) continue;
		for (const t of [1 / 3, 2 / 3]) {
			seeds.push({ x: iv.from + t * (iv.to - iv.from), side: -1, sag: iv.sag, hog: iv.hog });
		}
	}
	return seeds;
}

/** Interior peaks of the field that come within 1e-9 of the limit, and the worst excess. */
export function findPeaks(model: FieldModel, z: number[], intervals: Interval[], limit: number) {
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
export function addNewPoints(
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

/** Side of a position (re-exported for the program). */
export type { Side };
