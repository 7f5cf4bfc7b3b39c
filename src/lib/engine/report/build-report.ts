/**
 * Assembles the CheckReport of a validated case: resistances, design loads, the exact plastic
 * collapse, the temporary-load capacity, the optional capacity curve and the elastic results.
 */
import type { CaseModel } from '../case/types';
import {
	computeCapacityCurve,
	solveCollapse,
	validateCollapseProblem,
	type CollapseProblem
} from '../collapse/index';
import type { InputIssue } from '../model/issue';
import { nPerMmToKNPerM } from '../units';
import { reportCapacityCurve, reportTemporaryCapacity } from './capacity-report';
import { reportCollapse } from './collapse-report';
import { buildDesignLoads } from './design-loads';
import { reportElastic } from './elastic-report';
import { assertAllFinite } from './finite';
import { computeSpanResistances } from './resistance';
import { reportGrade, reportSection } from './section-report';
import { writeAssumptions, writeNotices } from './texts';
import type { CheckReport } from './types';
import { ENGINE_VERSION } from './version';

/** Options of `buildCheckReport`. */
export interface ReportOptions {
	/** Also compute the capacity curve (largest single temporary point load along the beam). */
	curve?: boolean;
}

/**
 * The report of a validated case. Returns issues only when the collapse solver refuses the
 * problem (its own validation); every number in a report is finite.
 */
export function buildCheckReport(
	model: CaseModel,
	options: ReportOptions = {}
): { ok: true; report: CheckReport } | { ok: false; issues: InputIssue[] } {
	const res = computeSpanResistances(model);
	const design = buildDesignLoads(model);
	const problem: CollapseProblem = {
		beam: model.beam,
		capacity: res.capacity,
		fixedLoads: design.fixed,
		variableLoads: design.variable
	};
	const refused = validateCollapseProblem(problem).filter((i) => i.severity === 'error');
	if (refused.length > 0) return { ok: false, issues: refused };
	const collapse = reportCollapse(solveCollapse(problem), design.appliesTo);
	const usable = collapse.certified && collapse.loadFactor !== null && design.appliesTo === 'temporary';
	const curveFixed = design.appliesTo === 'temporary' ? design.fixed : design.variable;
	const capacityCurve = options.curve
		? reportCapacityCurve(
				computeCapacityCurve({ beam: model.beam, capacity: res.capacity, fixedLoads: curveFixed }),
				model.factors.temporary
			)
		: null;
	const elastic = reportElastic(model, design, res);
	const sections = model.sections.map((s, e) => reportSection(s, model.grades[e]));
	const grades = model.grades.map(reportGrade);
	const selfWeight = model.beam.spans.map((_, e) => {
		const load = model.selfWeightLoads.find((l) => l.kind === 'uniform' && l.from === spanStart(model, e));
		return load && load.kind === 'uniform' ? nPerMmToKNPerM(load.value) : 0;
	});
	const report: CheckReport = {
		title: model.title,
		engineVersion: ENGINE_VERSION,
		units: { length: 'm', force: 'kN', lineLoad: 'kN/m', moment: 'kNm', deflection: 'mm', section: 'mm', stress: 'MPa' },
		mpRd: res.mpRd.map((m) => m / 1e6),
		factors: { ...model.factors },
		collapse,
		temporaryCapacity: usable ? reportTemporaryCapacity(model, collapse.loadFactor!) : null,
		capacityCurve,
		elastic,
		section: sections[0],
		sections,
		grade: grades[0],
		grades,
		selfWeight,
		notices: writeNotices(model, collapse, elastic),
		assumptions: writeAssumptions(model),
		case: structuredClone(model.file)
	};
	return { ok: true, report: assertAllFinite(report, 'report') };
}

function spanStart(model: CaseModel, e: number): number {
	return model.beam.spans.slice(0, e).reduce((s, L) => s + L, 0);
}
