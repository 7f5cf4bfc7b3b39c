/**
 * Design loads of a case: characteristic loads times their partial factor, split into the loads
 * held fixed and the loads λ multiplies.
 */
import type { CaseModel, ResolvedFactors } from '../case/types';
import type { ActionCategory, Load } from '../model/types';
import type { LambdaScope } from './types';

/** Fixed and variable design loads (N, N/mm) and what λ applies to. */
export interface DesignLoadSet {
	fixed: Load[];
	variable: Load[];
	appliesTo: LambdaScope;
}

/** Partial factor of an action category. */
export function findActionFactor(factors: ResolvedFactors, action: ActionCategory): number {
	if (action === 'permanent') return factors.permanent;
	return action === 'imposed' ? factors.imposed : factors.temporary;
}

/** A load multiplied by k. */
export function scaleLoad(load: Load, k: number): Load {
	if (load.kind === 'linear') return { ...load, start: load.start * k, end: load.end * k };
	return { ...load, value: load.value * k };
}

/** All characteristic loads of a case: the entered ones plus self-weight. */
export function listCharacteristicLoads(model: CaseModel): Load[] {
	return [...model.loads, ...model.selfWeightLoads];
}

/**
 * Design loads: each load × its factor (EN 1990 6.10 with the case's factors). Temporary loads
 * are the variable set; with none, λ multiplies every load (`appliesTo: 'all'`).
 * @example
 * buildDesignLoads(model).variable // temporary loads × γ temporary
 */
export function buildDesignLoads(model: CaseModel): DesignLoadSet {
	const factored = listCharacteristicLoads(model).map((l) =>
		scaleLoad(l, findActionFactor(model.factors, l.action))
	);
	const variable = factored.filter((l) => l.action === 'temporary');
	if (variable.length === 0) return { fixed: [], variable: factored, appliesTo: 'all' };
	const fixed = factored.filter((l) => l.action !== 'temporary');
	return { fixed, variable, appliesTo: 'temporary' };
}

/** Total downward force of a load list, N. */
export function sumLoadForce(loads: Load[]): number {
	return loads.reduce((s, l) => {
		if (l.kind === 'point') return s + l.value;
		const len = l.to - l.from;
		return s + (l.kind === 'uniform' ? l.value * len : ((l.start + l.end) / 2) * len);
	}, 0);
}
