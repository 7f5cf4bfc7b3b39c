/**
 * Converts the collapse solver's result (mm, N, N·mm) into the report's collapse part (m, kN, kNm).
 */
import type { CollapseResult } from '../collapse/index';
import { mmToM, nToKN, nmmToKNm } from '../units';
import type { CollapseReport, LambdaScope } from './types';

/**
 * The report's view of a collapse result. Only a certified mechanism carries a usable λ; a
 * not-certified one keeps its numbers for inspection but is flagged.
 */
export function reportCollapse(result: CollapseResult, appliesTo: LambdaScope): CollapseReport {
	if (result.status === 'fails-under-fixed' || result.status === 'unbounded') {
		return {
			status: result.status,
			loadFactor: null,
			appliesTo,
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
						`capacity of the beam. ${result.message}`
					: result.message
		};
	}
	const certified = result.status === 'mechanism' && result.certified;
	return {
		status: result.status,
		loadFactor: result.loadFactor,
		appliesTo,
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
