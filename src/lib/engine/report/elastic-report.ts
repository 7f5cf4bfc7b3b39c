/**
 * Elastic part of the report: moments and deflections under the unfactored loads (serviceability),
 * and the load factors at first yield and first plastic hinge under the design loads.
 */
import type { CaseModel } from '../case/types';
import {
	analyseElastic,
	firstHingeFactor,
	firstYieldFactor,
	type ElasticLimitResult,
	type LocatedValue
} from '../elastic/index';
import type { Load } from '../model/types';
import { E_STEEL, mmToM, nmmToKNm } from '../units';
import { listCharacteristicLoads, type DesignLoadSet } from './design-loads';
import type { SpanResistances } from './resistance';
import type { ElasticFactorReport, ElasticReport } from './types';

const NO_STIFFNESS =
	'Elastic results need the stiffness of each span: a span is given by its Mp only and the ' +
	'spans differ.';
const NO_SECTION =
	'Deflection and first yield need the section’s Iy and Wel: the section is given by its Mp only.';

/** A located moment in m and kNm. */
function toOutput(v: LocatedValue | null): { x: number; value: number } | null {
	return v ? { x: mmToM(v.x), value: nmmToKNm(v.value) } : null;
}

/** Any positive value: with one section throughout, moments do not depend on EI. */
const UNIT_EI = 1e12;

/** Stiffness per span, and whether it is the true E·Iy or only a common placeholder. */
function chooseStiffness(model: CaseModel): { EI: number[]; real: boolean } | null {
	if (model.sections.every((s) => s.props)) {
		return { EI: model.sections.map((s) => E_STEEL * s.props!.Iy), real: true };
	}
	const first = model.sections[0];
	if (!model.sections.every((s) => s === first)) return null;
	return { EI: model.sections.map(() => UNIT_EI), real: false };
}

/**
 * Elastic results of a case; parts that need Iy or Wel of a section known only by its Mp are null
 * with the reason in `notAvailable`.
 */
export function reportElastic(
	model: CaseModel,
	design: DesignLoadSet,
	res: SpanResistances
): ElasticReport {
	const stiffness = chooseStiffness(model);
	const notAvailable: string[] = [];
	if (!stiffness) {
		notAvailable.push(NO_STIFFNESS);
		const none = { maxMoment: null, maxDeflection: null, firstYield: null, firstHinge: null };
		return { ...none, notAvailable };
	}
	const { beam } = model;
	const { EI } = stiffness;
	const all = analyseElastic({ beam, EI, loads: listCharacteristicLoads(model) });
	if (!all.ok) throw new Error('invariant: a validated beam line is a mechanism');
	const mm = all.value.maxMoment;
	const maxMoment = {
		maxSagging: toOutput(mm.maxSagging),
		maxHogging: toOutput(mm.maxHogging)
	};
	const limits = { beam, EI, fixedLoads: design.fixed, variableLoads: design.variable };
	const firstHinge = reportFactor(firstHingeFactor({ ...limits, plasticResistance: res.mpRd }));
	if (!stiffness.real) {
		notAvailable.push(NO_SECTION);
		return { maxMoment, maxDeflection: null, firstYield: null, firstHinge, notAvailable };
	}
	const temporary = model.loads.filter((l) => l.action === 'temporary');
	const melRd = res.melRd.map((m) => m ?? 0);
	return {
		maxMoment,
		maxDeflection: {
			total: findOverall(all.value.maxDeflection.spans),
			temporary: temporary.length > 0 ? deflectionOf(model, EI, temporary) : null,
			spans: all.value.maxDeflection.spans.map((s) => ({ x: mmToM(s.x), value: s.value }))
		},
		firstYield: reportFactor(firstYieldFactor({ ...limits, elasticResistance: melRd })),
		firstHinge,
		notAvailable
	};
}

function deflectionOf(model: CaseModel, EI: number[], loads: Load[]) {
	const r = analyseElastic({ beam: model.beam, EI, loads });
	if (!r.ok) throw new Error('invariant: a validated beam line is a mechanism');
	return findOverall(r.value.maxDeflection.spans);
}

/** Largest |deflection| over the spans, with its span index; x in m. */
function findOverall(spans: LocatedValue[]): { x: number; value: number; span: number } {
	let span = 0;
	spans.forEach((s, i) => {
		if (Math.abs(s.value) > Math.abs(spans[span].value)) span = i;
	});
	return { x: mmToM(spans[span].x), value: spans[span].value, span };
}

function reportFactor(r: ElasticLimitResult): ElasticFactorReport {
	if (r.status === 'reached') return { status: 'reached', factor: r.factor, x: mmToM(r.x) };
	if (r.status === 'fails-under-fixed') {
		return { status: 'fails-under-fixed', factor: null, x: mmToM(r.x) };
	}
	if (r.status === 'never') return { status: 'never', factor: null, x: null };
	throw new Error('invariant: a validated beam line is a mechanism');
}
