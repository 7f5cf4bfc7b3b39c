/**
 * Assembles the CheckReport of a validated case: resistances, design loads, the exact plastic
 * collapse, the temporary-load capacity, the optional capacity curve and the elastic results.
 */
import type { CaseModel } from '../case/types';
import { applyArrangement } from '../checks/factor-loads';
import { buildDesignCheckInput } from '../checks/from-case';
import { reportDesignChecks, summariseCase } from '../checks/report-fields';
import { runDesignChecks } from '../checks/run-checks';
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
import { buildDesignLoads, listCharacteristicLoads, type DesignLoadSet } from './design-loads';
import { reportElastic } from './elastic-report';
import { assertAllFinite } from './finite';
import { computeSpanResistances } from './resistance';
import { reportGrade, reportSection } from './section-report';
import { writeAssumptions, writeNotices } from './texts';
import type { CheckReport } from './types';
import type { DesignCheckOutcome } from '../checks/inputs';
import { ENGINE_VERSION } from './version';

/** Options of `buildCheckReport`. */
export interface ReportOptions {
	/** Also compute the capacity curve (largest single temporary point load along the beam). */
	curve?: boolean;
	/** Date shown in the shared summary, as the user reads it (the engine has no clock). */
	date?: string;
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
	const checked = runDesignChecks(buildDesignCheckInput(model));
	const design = designLoadsOf(model, checked.bendingArrangement);
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
		case: structuredClone(model.file),
		...reportChecks(model, checked, { collapse, elastic, date: options.date })
	};
	return { ok: true, report: assertAllFinite(report, 'report') };
}

/** Design loads of the arrangement that governs bending (EN 1990 patterns), else the case's own. */
function designLoadsOf(model: CaseModel, arrangement: DesignCheckOutcome['bendingArrangement']): DesignLoadSet {
	const own = buildDesignLoads(model);
	if (!arrangement || own.appliesTo !== 'temporary') return own;
	const d = applyArrangement({ loads: listCharacteristicLoads(model), spans: model.beam.spans, arrangement });
	return { fixed: d.fixed, variable: d.variable, appliesTo: 'temporary' };
}

/** Checks, verdict, allowable loads, notices, assumptions and the shared summary. */
function reportChecks(
	model: CaseModel,
	checked: DesignCheckOutcome,
	o: { collapse: CheckReport['collapse']; elastic: CheckReport['elastic']; date?: string }
): Pick<CheckReport, 'checks' | 'verdict' | 'governing' | 'reserve' | 'design' | 'allowable' | 'notices' | 'assumptions' | 'summary'> {
	const design = reportDesignChecks(checked);
	const own = writeNotices(model, o.collapse, o.elastic);
	const notices = [...new Set([...own, ...checked.notices, ...design.warnings])];
	if (design.verdict === 'outside-scope') notices.push(...design.route.reasons);
	const assumptions = [...new Set([...writeAssumptions(model), ...checked.assumptions])];
	const m = design.allowableMultiplier;
	return {
		checks: design.checks,
		verdict: design.verdict,
		governing: design.governing,
		reserve: design.reserve,
		design,
		allowable: m === null ? null : reportTemporaryCapacity(model, m),
		notices,
		assumptions,
		summary: summariseCase({ model, report: design, notices, assumptions, date: o.date })
	};
}

function spanStart(model: CaseModel, e: number): number {
	return model.beam.spans.slice(0, e).reduce((s, L) => s + L, 0);
}
