/**
 * The certificate: a lower bound from a moment field checked on its exact extremes, an upper
 * bound from the virtual work of the mechanism, and the equilibrium residual of the field.
 */
import { computeLoadResultant } from './load-effects';
import { findStationaryPoints } from './extremes';
import { evaluateMoment, type FieldModel } from './statics';
import type { Interval, Station } from './stations';
import { buildDisplacement, computeExternalWork, type Displacement, type Kink } from './virtual-work';

/** Largest |M|/Mp of field z over the stations and the exact interior extremes. */
export function measureMomentRatio(model: FieldModel, z: number[], stations: Station[], intervals: Interval[]): number {
	let worst = 0;
	const ratio = (M: number, sag: number, hog: number) => (M >= 0 ? M / sag : -M / hog);
	for (const s of stations) worst = Math.max(worst, ratio(evaluateMoment(model, z, s.x, s.side), s.sag, s.hog));
	for (const iv of intervals) {
		for (const x of findStationaryPoints(model, z, iv)) {
			worst = Math.max(worst, ratio(evaluateMoment(model, z, x, -1), iv.sag, iv.hog));
		}
	}
	return worst;
}

/**
 * Static-theorem bound. Field 1 (λ₁) may exceed Mp by the relative amount ε; field 0 (λ = 0)
 * stays below Mp with relative slack s. Their blend t·field₁ + (1 − t)·field₀ is in equilibrium
 * with t·λ₁ and admissible when t·ε ≤ (1 − t)·s, so t = s / (s + ε).
 */
export function combineLowerBound(lambda1: number, excess: number, slack: number): number {
	if (excess <= 0) return lambda1;
	if (slack <= 0) return 0;
	return (slack / (slack + excess)) * lambda1;
}

/** Kinematic-theorem bound: λ = (Σ Mp·|θ| − W_fixed) / W_variable, from the hinges alone. */
export function computeUpperBound(options: {
	model: FieldModel;
	hinges: (Kink & { capacity: number })[];
}): { upperBound: number; displacement: Displacement } {
	const { model, hinges } = options;
	const displacement = buildDisplacement(model.beam, hinges);
	const internal = hinges.reduce((s, h) => s + h.capacity * Math.abs(h.rotation), 0);
	const fixedWork = computeExternalWork(displacement, model.fixedLoads);
	const variableWork = computeExternalWork(displacement, model.variableLoads);
	const upperBound = variableWork > 0 ? (internal - fixedWork) / variableWork : Number.POSITIVE_INFINITY;
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
