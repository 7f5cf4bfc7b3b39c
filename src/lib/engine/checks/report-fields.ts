/**
 * The design-check part of the report in output units: check rows (kN, kNm, m; section sizes
 * and deflections in mm), the verdict, the governing check, the reserve and the shared text.
 * This is an edge of the engine, so unit conversion happens here.
 */
import type { CaseModel } from '../case/types';
import { assertFinite } from '../model/issue';
import { mmToM, nmmToKNm, nToKN } from '../units';
import type { DesignCheckOutcome } from './inputs';
import { writeLongSummary, writeShortSummary, type SummaryInput } from './summary';
import type { AnalysisRoute, CheckId, CheckResult, VerdictKind } from './types';

/** Factor-set names as people read them. */
const FACTOR_SET_WORDS: Record<string, string> = {
	'en1990-6.10': 'EN 1990 expression 6.10',
	'en1990-6.10ab': 'EN 1990 expressions 6.10a and 6.10b (the worse)',
	custom: 'own factors'
};

/** How each key number converts from internal units. */
const KEY_UNITS: Record<string, (v: number) => number> = {
	vEd: nToKN,
	vRd: nToKN,
	fEd: nToKN,
	fRd: nToKN,
	mEd: nmmToKNm,
	mcr: nmmToKNm,
	mbRd: nmmToKNm,
	myVRd: nmmToKNm,
	from: mmToM,
	to: mmToM,
	span: mmToM
};

/** One check row as reported. */
export interface CheckRowReport {
	id: CheckId;
	label: string;
	clause: string;
	level: 'governing' | 'warning';
	utilisation: number;
	pass: boolean;
	/** Utilisation under the existing loads alone. */
	utilisationExisting: number | null;
	/** Multiplier on the temporary loads at which this check reaches 1; null when unaffected. */
	multiplier: number | null;
	/** Position, m. */
	x: number | null;
	arrangement: string | null;
	note: string | null;
	/** Key numbers: forces kN, moments kNm, positions m, lengths of bearing and deflections mm. */
	[key: string]: unknown;
}

/** The design-check fields of the report. */
export interface DesignCheckReport {
	checks: CheckRowReport[];
	verdict: VerdictKind;
	route: { route: AnalysisRoute; reasons: string[] };
	governing: { id: string; label: string; utilisation: number } | null;
	/** Factor on the temporary loads the route rests on (collapse or first hinge/yield). */
	loadFactor: number | null;
	/** Smallest multiplier on the temporary loads over all governing checks. */
	allowableMultiplier: number | null;
	/** (allowableMultiplier − 1) × 100, %. */
	reserve: number | null;
	factorSet: string;
	factors: Record<string, number>;
	arrangementsTried: number;
	governingArrangement: string | null;
	sectionClass: number | null;
	warnings: string[];
}

/** Converts a check row to output units. */
export function reportCheckRow(c: CheckResult): CheckRowReport {
	const keys: Record<string, number> = {};
	for (const [k, v] of Object.entries(c.values)) {
		const convert = KEY_UNITS[k] ?? ((n: number) => n);
		keys[k] = assertFinite(convert(v), `check ${c.id}.${k}`);
	}
	return {
		id: c.id,
		label: c.label,
		clause: c.clause,
		level: c.level,
		utilisation: assertFinite(c.utilisation, `check ${c.id} utilisation`),
		pass: c.pass,
		utilisationExisting: c.utilisationExisting ?? null,
		multiplier: c.multiplierAtCapacity,
		x: c.x === undefined ? null : mmToM(c.x),
		arrangement: c.arrangement ?? null,
		note: c.note ?? null,
		...keys
	};
}

/** The design-check part of the report. */
export function reportDesignChecks(o: DesignCheckOutcome): DesignCheckReport {
	const v = o.verdict;
	const governingArrangement =
		o.collapse?.arrangement ?? o.checks.find((c) => c.id === v.governing?.id)?.arrangement ?? null;
	return {
		checks: o.checks.map(reportCheckRow),
		verdict: v.verdict,
		route: { route: v.route, reasons: v.routeReasons },
		governing: v.governing,
		loadFactor: v.loadFactor,
		allowableMultiplier: v.allowableMultiplier,
		reserve: v.reserve,
		factorSet: o.factors.set,
		factors: o.factors.table,
		arrangementsTried: o.arrangementCount,
		governingArrangement,
		sectionClass: o.sectionClass,
		warnings: v.warnings
	};
}

/** Plain-text summaries of a case and its checks; the date is passed in (no clock here). */
export function summariseCase(o: {
	model: CaseModel;
	report: DesignCheckReport;
	notices: string[];
	assumptions: string[];
	date?: string;
}): { short: string; long: string } {
	const { model, report } = o;
	const temporary = model.loads
		.map((l, i) => ({ l, i }))
		.filter(({ l }) => l.action === 'temporary');
	const m = report.allowableMultiplier;
	const input: SummaryInput = {
		title: model.title,
		place: model.place,
		date: o.date,
		spans: model.beam.spans.map(mmToM),
		supports: model.beam.supports,
		section: [...new Set(model.sections.map((s) => s.designation))].join(' / '),
		grade: [...new Set(model.grades.map((g) => g?.name ?? 'given Mp'))].join(' / '),
		loads: model.file.loads.map((l) => ({
			action: l.action,
			kind: l.kind,
			value: readEntered(l),
			...(l.kind === 'point' ? { at: l.x } : { from: l.from, to: l.to }),
			label: l.label ?? null
		})),
		factorSet: FACTOR_SET_WORDS[report.factorSet] ?? report.factorSet,
		factors: report.factors,
		verdict: report.verdict,
		routeReasons: report.route.reasons,
		governing: report.governing,
		loadFactor: report.loadFactor,
		reserve: report.reserve,
		allowable:
			m === null
				? []
				: temporary.map(({ l, i }) => {
						const name = model.loadLabels[i] ?? `load ${i + 1}`;
						const unit = l.kind === 'point' ? 'kN' : 'kN/m';
						return { name, value: m * readEntered(model.file.loads[i]), unit };
					}),
		checks: report.checks.map((c) => ({
			label: c.label,
			clause: c.clause,
			utilisation: c.utilisation,
			pass: c.pass,
			level: c.level,
			details: describeKeys(c)
		})),
		governingArrangement: report.governingArrangement ?? undefined,
		notice: o.notices[0] ?? '',
		notices: o.notices.slice(1),
		assumptions: o.assumptions
	};
	return { short: writeShortSummary(input), long: writeLongSummary(input) };
}

const KEY_LABELS: Record<string, [string, string]> = {
	vEd: ['VEd', 'kN'],
	vRd: ['Vpl,Rd', 'kN'],
	mEd: ['MEd', 'kNm'],
	mcr: ['Mcr', 'kNm'],
	chiLT: ['χLT', ''],
	mbRd: ['Mb,Rd', 'kNm'],
	myVRd: ['My,V,Rd', 'kNm'],
	fEd: ['FEd', 'kN'],
	fRd: ['FRd', 'kN'],
	deflection: ['deflection', 'mm'],
	allowed: ['allowed', 'mm'],
	loadFactor: ['load factor', '']
};

function describeKeys(c: CheckRowReport): string[] {
	return Object.entries(KEY_LABELS).flatMap(([k, [name, unit]]) => {
		const v = c[k];
		if (typeof v !== 'number') return [];
		return [`${name} ${Number(v.toPrecision(3))}${unit ? ` ${unit}` : ''}`];
	});
}

/** A load's value as entered: kN, kN/m, or the larger end of a linear load. */
function readEntered(l: CaseModel['file']['loads'][number]): number {
	if (l.kind !== 'linear') return l.value;
	return Math.abs(l.end) > Math.abs(l.start) ? l.end : l.start;
}
