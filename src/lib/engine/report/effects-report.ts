/**
 * Elastic moments and deflections under the unfactored loads, in output units (kNm, m, mm).
 */
import type { DesignMoments } from '../checks/design-moments';
import type { CharacteristicEffects } from '../checks/inputs';
import type { LocatedValue } from '../elastic/index';
import { mmToM, nmmToKNm } from '../units';
import type { DesignMomentsReport, EffectsReport } from './types';

const located = (v: LocatedValue | null) =>
	v ? { x: mmToM(v.x), value: nmmToKNm(v.value) } : null;

/** The effects part of the report; all null when the run stopped before any analysis. */
export function reportEffects(e: CharacteristicEffects | null): EffectsReport {
	if (!e) return { maxMoment: null, maxDeflection: null, notAvailable: [] };
	const d = e.maxDeflection;
	const deflection = (v: LocatedValue & { span: number }) => ({
		x: mmToM(v.x),
		value: v.value,
		span: v.span
	});
	return {
		maxMoment: e.maxMoment && {
			maxSagging: located(e.maxMoment.maxSagging),
			maxHogging: located(e.maxMoment.maxHogging)
		},
		maxDeflection: d && {
			total: deflection(d.total),
			temporary: d.temporary && deflection(d.temporary),
			spans: d.spans.map((s) => ({ x: mmToM(s.x), value: s.value }))
		},
		notAvailable: [...e.notAvailable]
	};
}

/** The elastic design moments in output units (m, kNm). */
export function reportDesignMoments(
	d: DesignMoments | null | undefined
): DesignMomentsReport | null {
	if (!d) return null;
	return {
		label:
			'elastic design moments (design loads as entered) and the resistance they are checked against',
		arrangement: d.arrangement,
		x: d.x.map(mmToM),
		M: d.M.map(nmmToKNm),
		limits: d.limits.map((l) => ({
			from: mmToM(l.from),
			to: mmToM(l.to),
			value: nmmToKNm(l.value),
			label: l.label
		}))
	};
}
