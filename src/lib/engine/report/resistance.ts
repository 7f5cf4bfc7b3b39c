/**
 * Bending resistance per span: Mp,Rd = Wpl,y·fy/γM0 (EN 1993-1-1 6.2.5, eq. 6.13) or a given
 * Mp/γM0, and the elastic Wel,y·fy/γM0 used for first yield (eq. 6.14).
 */
import type { CaseModel } from '../case/types';
import type { CapacitySegment } from '../model/types';
import { assertFinite } from '../model/issue';

/** Resistances per span, N·mm. */
export interface SpanResistances {
	mpRd: number[];
	/** Wel,y·fy/γM0 per span; null where the section is a known Mp. */
	melRd: (number | null)[];
	/** The beam line's capacity for the collapse solver (one segment per span). */
	capacity: CapacitySegment[];
}

/**
 * Resistances of each span from its section and grade.
 * @example
 * // 305x165x40 UB (Wpl 623e3 mm³), S275: Mp,Rd = 623e3 × 275 / 1.0 = 171.3 kNm
 */
export function computeSpanResistances(model: CaseModel): SpanResistances {
	const { gammaM0 } = model.factors;
	const mpRd: number[] = [];
	const melRd: (number | null)[] = [];
	model.sections.forEach((s, e) => {
		const fy = model.grades[e]?.fy;
		if (s.props && fy !== undefined) {
			mpRd.push(assertFinite((s.props.Wply * fy) / gammaM0, 'Mp,Rd'));
			melRd.push(assertFinite((s.props.Wely * fy) / gammaM0, 'Mel,Rd'));
		} else if (s.mpKnown !== undefined) {
			mpRd.push(assertFinite(s.mpKnown / gammaM0, 'Mp,Rd'));
			melRd.push(null);
		} else {
			throw new Error(`invariant: span ${e} has neither properties with a grade nor a known Mp`);
		}
	});
	let x = 0;
	const capacity = model.beam.spans.map((L, e) => {
		const seg = { from: x, to: x + L, sagging: mpRd[e], hogging: mpRd[e] };
		x += L;
		return seg;
	});
	return { mpRd, melRd, capacity };
}
