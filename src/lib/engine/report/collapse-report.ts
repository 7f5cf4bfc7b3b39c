/**
 * Converts the design run's collapse (the governing arrangement, shear-reduced hinge moments)
 * into the report's partial result "plastic collapse in bending" (m, kN, kNm).
 */
import type { CollapseSummary } from '../checks/inputs';
import type { CapacitySegment } from '../model/types';
import { mmToM, nmmToKNm, nToKN } from '../units';
import type { CollapseReport, LambdaScope } from './types';

const LABEL = 'plastic collapse in bending';

/**
 * The report's view of the collapse. Only a certified mechanism carries a usable λ; a
 * not-certified one keeps its numbers for inspection but is flagged.
 */
export function reportCollapse(
	c: CollapseSummary,
	o: { decides: boolean; appliesTo: LambdaScope; capacity: CapacitySegment[] }
): CollapseReport {
	const result = c.result;
	const resistance = o.capacity.map((s) => ({
		from: mmToM(s.from),
		to: mmToM(s.to),
		sagging: nmmToKNm(s.sagging),
		hogging: nmmToKNm(s.hogging)
	}));
	const base = {
		label: LABEL,
		decides: o.decides,
		appliesTo: o.appliesTo,
		arrangement: c.arrangement,
		resistance
	} as const;
	if (result.status === 'fails-under-fixed' || result.status === 'unbounded') {
		return {
			...base,
			status: result.status,
			loadFactor: null,
			lowerBound: null,
			upperBound: null,
			certified: false,
			hinges: [],
			mechanism: null,
			reactions: [],
			diagram: null,
			message:
				result.status === 'fails-under-fixed'
					? 'The existing loads alone, without any temporary load, exceed the plastic ' +
						`capacity of the beam in bending. ${result.message}`
					: result.message
		};
	}
	const certified = result.status === 'mechanism' && result.certified;
	return {
		...base,
		status: result.status,
		loadFactor: c.loadFactor,
		lowerBound: result.lowerBound,
		upperBound: result.upperBound,
		certified,
		hinges: result.hinges.map((h) => ({
			x: mmToM(h.x),
			moment: nmmToKNm(h.moment),
			rotation: h.rotation
		})),
		mechanism: { name: result.mechanism.name, spans: [...result.mechanism.spans] },
		reactions: result.reactions.map(nToKN),
		diagram: {
			x: result.diagram.x.map(mmToM),
			M: result.diagram.M.map(nmmToKNm),
			V: result.diagram.V.map(nToKN)
		},
		message: certified
			? null
			: result.status === 'not-certified'
				? `Not certified: ${result.message} Do not rely on this result.`
				: 'Not certified: the static and kinematic bounds do not meet. Do not rely on this result.'
	};
}
