/**
 * The certificate: a lower bound from a moment field checked on its exact extremes, an upper
 * bound from the virtual work of the mechanism, and the equilibrium residual of the field.
 */
import { computeLoadResultant } from './load-effects';
import { findStationaryPoints } from './extremes';
import { evaluateMoment, type FieldModel } from './statics';
import type { Interval, Station } from './stations';
import type { HingeCandidate } from './hinge-set';
import { buildDisplacement, computeExternalWork, type Displacement } from './virtual-work';

/** Largest |M|/Mp of field z over the stations and the exact interior extremes. */
export function measureMomentRatio(
	model: FieldModel,
	z: number[],
	stations: Station[],
	intervals: Interval[]
): number {
	let worst = 0;
	const ratio = (M: number, sag: number, hog: number) => (M >= 0 ? M / sag : -M / hog);
	for (const s of stations)
		worst = Math.max(worst, ratio(evaluateMoment(model, z, s.x, s.side), s.sag, s.hog));
	for (const iv of intervals) {
		for (const x of findStationaryPoints(model, z, iv)) {
			worst = Math.max(worst, ratio(evaluateMoment(model, z, x, -1), iv.sag, iv.hog));
		}
	}
	return worst;
}

/** Largest M/Ms and −M/Mh of a field on each interval (ends and exact interior peaks). */
export function measureIntervalRatios(
	model: FieldModel,
	z: number[],
	intervals: Interval[]
): { sag: number; hog: number }[] {
	return intervals.map((iv) => {
		const xs: [number, 1 | -1][] = [
			[iv.from, 1],
			[iv.to, -1]
		];
		for (const x of findStationaryPoints(model, z, iv)) xs.push([x, -1]);
		let sag = -Infinity;
		let hog = -Infinity;
		for (const [x, side] of xs) {
			const M = evaluateMoment(model, z, x, side);
			sag = Math.max(sag, M / iv.sag);
			hog = Math.max(hog, -M / iv.hog);
		}
		return { sag, hog };
	});
}

/**
 * Static-theorem bound. Field 1 (λ₁) may exceed Mp slightly somewhere; field 0 (λ = 0) is
 * admissible. Their blend t·field₁ + (1 − t)·field₀ is in equilibrium with t·λ₁, and on each
 * interval its peak is at most t·a₁ + (1 − t)·a₀ (a = largest M/Mp of each field there), so the
 * largest t with t·a₁ + (1 − t)·a₀ ≤ 1 on every interval and in both senses gives an admissible
 * field: λ_lower = t·λ₁. A station's resistance can be the weaker side's, so stations are
 * checked too, as intervals of zero length.
 */
export function combineLowerBound(options: {
	lambda1: number;
	field1: { sag: number; hog: number }[];
	field0: { sag: number; hog: number }[];
}): number {
	const { lambda1, field1, field0 } = options;
	let t = 1;
	const limit = (a1: number, a0: number) => {
		if (a1 <= 1) return;
		t = a0 < 1 ? Math.min(t, (1 - a0) / (a1 - a0)) : 0;
	};
	field1.forEach((r, i) => {
		limit(r.sag, field0[i].sag);
		limit(r.hog, field0[i].hog);
	});
	return Math.max(0, t) * lambda1;
}

/** Station ratios as zero-length intervals, for `combineLowerBound`. */
export function measureStationRatios(
	model: FieldModel,
	z: number[],
	stations: Station[]
): { sag: number; hog: number }[] {
	return stations.map((s) => {
		const M = evaluateMoment(model, z, s.x, s.side);
		return { sag: M / s.sag, hog: -M / s.hog };
	});
}

/** Kinematic-theorem bound: λ = (Σ Mp·|θ| − W_fixed) / W_variable, from the hinges alone. */
export function computeUpperBound(options: { model: FieldModel; hinges: HingeCandidate[] }): {
	upperBound: number;
	displacement: Displacement;
} {
	const { model, hinges } = options;
	const displacement = buildDisplacement(model.beam, hinges);
	const internal = hinges.reduce(
		(s, h) => s + (h.rotation > 0 ? h.sag : h.hog) * Math.abs(h.rotation),
		0
	);
	const fixedWork = computeExternalWork(displacement, model.fixedLoads);
	const variableWork = computeExternalWork(displacement, model.variableLoads);
	const upperBound =
		variableWork > 0 ? (internal - fixedWork) / variableWork : Number.POSITIVE_INFINITY;
	return { upperBound, displacement };
}

/** Largest equilibrium error of field z (global balance, zero moments where required). */
export function computeEquilibriumResidual(model: FieldModel, z: number[]): number {
	const n = model.beam.spans.length;
	const L = model.nodeX[n];
	const lambda = z[model.lambdaIndex];
	const G = computeLoadResultant(model.fixedLoads);
	const Q = computeLoadResultant(model.variableLoads);
	let reactionSum = 0;
	let reactionMoment = 0;
	let endMoment = 0;
	model.unknowns.forEach((u, i) => {
		if (u.kind === 'reaction') {
			reactionSum += z[i];
			reactionMoment += z[i] * (L - model.nodeX[u.node]);
		} else if (u.kind !== 'lambda') endMoment += z[i];
	});
	const load = G.force + lambda * Q.force;
	const scale = Math.max(1, Math.abs(G.force) + Math.abs(lambda * Q.force));
	// Moment of the loads about the right end, from the resultants (independent of the field code).
	const loadMomentAtL = load * L - (G.momentAboutOrigin + lambda * Q.momentAboutOrigin);
	const ML = endMoment + reactionMoment - loadMomentAtL;
	let residual = Math.abs(reactionSum - load) / scale;
	if (model.beam.supports[n] !== 'fixed') residual = Math.max(residual, Math.abs(ML) / scale);
	for (let k = 1; k < n; k++) {
		if (model.beam.joints[k - 1] === 'simple') {
			residual = Math.max(residual, Math.abs(evaluateMoment(model, z, model.nodeX[k], -1)) / scale);
		}
	}
	return residual;
}

/** λ of an admissible field built from the optimum z1 (λ₁) and the fixed-load field z0. */
export function computeLowerBound(options: {
	model: FieldModel;
	grid: { stations: Station[]; intervals: Interval[] };
	z1: number[];
	lambda1: number;
	z0: number[];
}): number {
	const { model, grid, z1, lambda1, z0 } = options;
	const field1 = [
		...measureIntervalRatios(model, z1, grid.intervals),
		...measureStationRatios(model, z1, grid.stations)
	];
	const field0 = [
		...measureIntervalRatios(model, z0, grid.intervals),
		...measureStationRatios(model, z0, grid.stations)
	];
	return combineLowerBound({ lambda1, field1, field0 });
}
