/**
 * Assembles the CheckReport of a case from its one design run: converts units and writes words.
 * Nothing here analyses or checks anything (a test enforces that this folder imports no solver),
 * so every figure a surface shows is the one the checks decided.
 */
import type { CaseModel } from '../case/types';
import type { DesignOutcome } from '../checks/run-design';
import type { LateralRestraint, LoadHeight } from '../checks/restraint';
import { mmToM, nPerMmToKNPerM } from '../units';
import { describeAllowable, reportAnswer } from './answer-report';
import { FACTOR_SET_WORDS, reportCheckRow, reportDesignChecks } from './check-rows';
import { reportCollapse } from './collapse-report';
import { reportCapacityCurve } from './curve-report';
import { reportDesignMoments, reportEffects } from './effects-report';
import { assertAllFinite } from './finite';
import { reportGrade, reportSection } from './section-report';
import { writeLongSummary, writeShortSummary } from './summary';
import {
	convertTo,
	formatIn,
	unitSymbol,
	type SummaryQuantity,
	type SummaryUnits
} from './summary-units';
import { restateReportWords } from './report-words';
import { writeAssumptions, writeNotices } from './texts';
import { REPORT_FORMAT, REPORT_VERSION, type CheckReport } from './types';
import { ENGINE_VERSION } from './version';

/** Options of the report. */
export interface ReportOptions {
	/** Also compute the governing capacity curve. */
	curve?: boolean;
	/** Date shown in the shared summary, as the user reads it (the engine has no clock). */
	date?: string;
	/**
	 * Units of the report's words: summaries, notices, assumptions, reasons, notes and names
	 * (default SI). The report's numbers stay in SI whatever this says.
	 */
	units?: SummaryUnits;
}

/** The report of a validated case and its design run; every number in it is finite. */
export function buildCheckReport(
	model: CaseModel,
	design: DesignOutcome,
	options: ReportOptions = {}
): CheckReport {
	const { checked } = design;
	const outside = checked.verdict.verdict === 'outside-scope';
	const units = options.units ?? 'si';
	const answer = reportAnswer(design.answer, model.loadLabels, units);
	const route = checked.verdict.route;
	const hasTemporary = model.loads.some((l) => l.action === 'temporary');
	const collapse =
		outside || !checked.collapse
			? null
			: reportCollapse(checked.collapse, {
					decides: route === 'plastic',
					appliesTo: hasTemporary ? 'temporary' : 'all',
					capacity: checked.collapse.capacity
				});
	const designPart = reportDesignChecks(checked);
	// Outside scope no figure from the checks may appear, warnings included.
	if (outside) designPart.warnings = [];
	const notices = [
		...new Set([
			...writeNotices(model, collapse, checked.wording),
			...checked.notices,
			...designPart.warnings,
			...(checked.effects?.notAvailable ?? [])
		])
	];
	const assumptions = [
		...new Set([...writeAssumptions(model, units, checked.wording), ...checked.assumptions])
	];
	const restraint = describeRestraint(design.input.restraint, design.input.loadHeight, units);
	const report: CheckReport = {
		format: REPORT_FORMAT,
		version: REPORT_VERSION,
		title: model.title,
		engineVersion: ENGINE_VERSION,
		textUnits: units,
		units: {
			length: 'm',
			force: 'kN',
			lineLoad: 'kN/m',
			moment: 'kNm',
			deflection: 'mm',
			section: 'mm',
			stress: 'MPa'
		},
		answer,
		checks: outside ? [] : checked.checks.map(reportCheckRow),
		design: designPart,
		collapse,
		designMoments: outside ? null : reportDesignMoments(checked.designMoments),
		capacityCurve: design.curve && !outside ? reportCapacityCurve(design.curve) : null,
		effects: reportEffects(checked.effects),
		factors: { ...model.factors },
		sections: model.sections.map((s, e) =>
			reportSection(s, model.grades[e], design.sectionClasses[e], checked.wording?.sectionRank)
		),
		grades: model.grades.map(reportGrade),
		selfWeight: model.beam.spans.map((_, e) => selfWeightOf(model, e)),
		summary: { short: '', long: '' },
		notices,
		assumptions: [`Restraint: ${restraint}.`, ...assumptions],
		case: structuredClone(model.file)
	};
	restateReportWords(report, units);
	report.summary = summarise(model, report, restraint, options, checked.wording?.notation ?? {});
	return assertAllFinite(report, 'report');
}

/** Self-weight line load of span e, kN/m (0 where not included). */
function selfWeightOf(model: CaseModel, e: number): number {
	const from = model.beam.spans.slice(0, e).reduce((s, L) => s + L, 0);
	const load = model.selfWeightLoads.find((l) => l.kind === 'uniform' && l.from === from);
	return load && load.kind === 'uniform' ? nPerMmToKNPerM(load.value) : 0;
}

/** Restraint and load height in words, restraint positions in the units asked for. */
export function describeRestraint(
	r: LateralRestraint | null,
	height: LoadHeight,
	units: SummaryUnits = 'si'
): string {
	const at: Record<LoadHeight, string> = {
		'top-flange': 'load applied at the top flange',
		'shear-centre': 'load applied at the shear centre',
		'bottom-flange': 'load hung from the bottom flange'
	};
	const held =
		r === null || r.kind === 'continuous'
			? 'compression flange restrained laterally throughout'
			: r.kind === 'ends-only'
				? 'compression flange held laterally only at the supports'
				: `compression flange held laterally at the supports and at ${r.at
						.map(
							(x) =>
								`${Number(convertTo(mmToM(x), 'length', units).toPrecision(4))} ${unitSymbol('length', units)}`
						)
						.join(', ')}`;
	return `${held}; ${at[height]}`;
}

/**
 * Short and long plain-text summaries, written from the report itself (its words already in the
 * units asked for, see report-words.ts).
 */
function summarise(
	model: CaseModel,
	r: CheckReport,
	restraint: string,
	options: ReportOptions,
	notation: Record<string, string>
): { short: string; long: string } {
	const a = r.answer;
	const units = options.units ?? 'si';
	const input = {
		title: model.title,
		place: model.place,
		date: options.date,
		units,
		basis: r.design.basis,
		spans: model.beam.spans.map(mmToM),
		supports: model.beam.supports,
		section: [...new Set(r.sections.map((s) => s.designation))].join(' / '),
		grade: [...new Set(r.grades.map((g) => g?.name ?? 'given Mp'))].join(' / '),
		loads: model.fileSI.loads.map((l) => ({
			action: l.action,
			kind: l.kind,
			value:
				l.kind === 'linear' ? (Math.abs(l.end) > Math.abs(l.start) ? l.end : l.start) : l.value,
			...(l.kind === 'point' ? { at: l.x } : { from: l.from, to: l.to }),
			label: l.label ?? null
		})),
		factorSet: FACTOR_SET_WORDS[r.design.factorSet] ?? r.design.factorSet,
		factors: r.design.factors,
		verdict: a.verdict,
		message: a.message,
		routeReasons: r.design.route.reasons,
		governing:
			a.governing && a.utilisation !== null
				? { label: a.governing.label, utilisation: a.utilisation }
				: null,
		reserve: a.reserve === null ? null : a.reserve * 100,
		allowable: a.allowable.map((t) => describeAllowable(t, units)),
		restraint,
		checks: r.checks.map((c) => ({
			label: c.label,
			clause: c.clause,
			utilisation: c.utilisation,
			pass: c.pass,
			level: c.level,
			details: describeKeys(c, units, notation)
		})),
		governingArrangement: r.design.governingArrangement ?? undefined,
		notice: r.notices[0] ?? '',
		notices: r.notices.slice(1),
		// The first assumption is the restraint, already a line of its own in the summary's units.
		assumptions: r.assumptions.slice(1)
	};
	return { short: writeShortSummary(input), long: writeLongSummary(input) };
}

/**
 * Key numbers of a check row: the name shown and the kind of quantity (null: no unit). The name
 * is the basis's own where it gives one (`notation`: φbMn, Vu …); these are the Eurocode names.
 */
const KEY_LABELS: Record<string, [string, SummaryQuantity | null]> = {
	vEd: ['VEd', 'force'],
	vRd: ['Vpl,Rd', 'force'],
	mEd: ['MEd', 'moment'],
	mcr: ['Mcr', 'moment'],
	chiLT: ['χLT', null],
	mbRd: ['Mb,Rd', 'moment'],
	myVRd: ['My,V,Rd', 'moment'],
	fEd: ['FEd', 'force'],
	fRd: ['FRd', 'force'],
	deflection: ['deflection', 'small'],
	allowed: ['allowed', 'small']
};

function describeKeys(
	c: Record<string, unknown>,
	units: SummaryUnits,
	notation: Record<string, string>
): string[] {
	return Object.entries(KEY_LABELS).flatMap(([k, [name, q]]) => {
		const v = c[k];
		if (typeof v !== 'number') return [];
		const shown = notation[k] ?? name;
		return [`${shown} ${q ? formatIn(v, q, units) : Number(v.toPrecision(3))}`];
	});
}
