/**
 * What the proposed temporary loads may grow to (λ × each, in the units entered), and the
 * largest single temporary point load along the beam (the capacity curve).
 */
import type { CaseModel } from '../case/types';
import type { CapacityCurve } from '../collapse/index';
import { mmToM, nToKN } from '../units';
import { sumLoadForce } from './design-loads';
import type { CapacityCurveReport, TemporaryCapacityReport } from './types';

/**
 * λ × each temporary load as entered. Because λ multiplies the factored temporary loads,
 * γ·(λ·Qk) = λ·(γ·Qk): the characteristic capacity is λ·Qk (reference H1 form, EN 1990 6.10).
 */
export function reportTemporaryCapacity(
	model: CaseModel,
	lambda: number
): TemporaryCapacityReport | null {
	const temp = model.loads
		.map((l, index) => ({ l, index }))
		.filter(({ l }) => l.action === 'temporary');
	if (temp.length === 0) return null;
	const file = model.file.loads;
	const loads = temp.map(({ l, index }) => {
		const raw = file[index];
		const entered = raw.kind === 'linear' ? peakOf(raw.start, raw.end) : raw.value;
		return {
			index,
			label: model.loadLabels[index],
			kind: l.kind,
			entered,
			capacity: lambda * entered,
			unit: l.kind === 'point' ? ('kN' as const) : ('kN/m' as const)
		};
	});
	const enteredTotal = nToKN(sumLoadForce(temp.map(({ l }) => l)));
	return { loads, total: lambda * enteredTotal, enteredTotal };
}

/** The larger in size of the two ends of a linear load (its peak intensity). */
function peakOf(start: number, end: number): number {
	return Math.abs(end) > Math.abs(start) ? end : start;
}

/**
 * Capacity curve in output units. The solver's P_max is a design value; dividing by the
 * temporary-load factor gives the characteristic point load that may be placed there.
 */
export function reportCapacityCurve(
	curve: CapacityCurve,
	gammaTemporary: number
): CapacityCurveReport | null {
	if (curve.status !== 'ok') return null;
	const toP = (p: number): number => nToKN(p) / gammaTemporary;
	return {
		points: curve.points.flatMap((pt) =>
			pt.Pmax === null ? [] : [{ x: mmToM(pt.x), p: toP(pt.Pmax) }]
		),
		min: {
			x: mmToM(curve.minimum.x),
			p: toP(curve.minimum.Pmax),
			mechanism: curve.minimum.mechanism
		},
		certified: curve.certified
	};
}
