/**
 * The words and numbers of the calc sheet, in the user's units: the answer first, then the
 * record, the inputs and the checks. No drawing here, so it can be read and tested alone.
 */
import { FACTOR_SET_WORDS } from '$lib/engine/report/check-rows';
import { formatQuantity, type UnitSystem } from '$lib/ui/format';
import { PHOTOS_PER_PAGE, type SheetContext } from './sheet-context';
import type { SheetReport } from './sheet-report';

const VERDICT_WORDS = {
	pass: 'PASS',
	fail: 'FAIL',
	'outside-scope': 'OUTSIDE SCOPE'
} as const;

/** The verdict in capitals; NO VERDICT when no proposed load was entered. */
export function sheetVerdict(r: SheetReport): string {
	return r.answer.verdict === null ? 'NO VERDICT' : VERDICT_WORDS[r.answer.verdict];
}

/** `19.3 kN (load 3, hoist)`: what one proposed load may grow to, in the user's units. */
export function describeAllowed(
	a: SheetReport['answer']['allowable'][number],
	units: UnitSystem
): string {
	const who = `load ${a.load + 1}${a.label ? `, ${a.label}` : ''}`;
	if (a.value === null) {
		return `${a.effect === 'relieves' ? 'relieves the beam' : 'not limited by any check made'} (${who})`;
	}
	const size = formatQuantity(a.value, a.unit === 'kN' ? 'force' : 'lineLoad', units);
	return `${size}${a.direction === 'up' ? ' upward' : ''} (${who})`;
}

/**
 * The answer block: the verdict, the largest proposed loads and the governing check. Outside
 * scope it carries the reasons and no capacity figure.
 */
export function answerLines(r: SheetReport, units: UnitSystem): { head: string; lines: string[] } {
	const a = r.answer;
	if (a.verdict === 'outside-scope') {
		return { head: 'OUTSIDE SCOPE - no capacity is given', lines: [a.message, ...a.reasons] };
	}
	if (a.verdict === null) return { head: 'NO VERDICT', lines: [a.message] };
	const limited = a.allowable.filter((t) => t.value !== null || t.effect === 'relieves');
	const many = a.allowable.length > 1 ? 's, together' : '';
	const lines = [
		limited.length || a.allowable.length
			? `Largest proposed load${many}: ${a.allowable.map((t) => describeAllowed(t, units)).join('; ')}`
			: '',
		a.governing && a.utilisation !== null
			? `Governing check: ${a.governing.label}, utilisation ${Math.round(a.utilisation * 100)} % at the loads entered`
			: '',
		// The message repeats the largest loads, already the line above.
		a.message.replace(/ ?Largest proposed loads?(, together)?: .*?\)\.(?= |$)/, '')
	];
	return { head: sheetVerdict(r), lines: lines.filter(Boolean) };
}

/** Record details: place, date, who, which saved check, versions, units and paper. */
export function recordLines(r: SheetReport, c: SheetContext): [string, string][] {
	const photos = c.photoCount ?? 0;
	const pages = Math.ceil(photos / PHOTOS_PER_PAGE);
	const photoLine: [string, string][] = photos
		? [['Photos', `${photos} on page${pages > 1 ? `s 2-${pages + 1}` : ' 2'}`]]
		: [];
	return [
		['Place', c.place || '-'],
		['Date', c.date],
		['Prepared by', c.preparedBy || '-'],
		['Check', c.record ? `${c.record.id}, revision ${c.record.revision}` : 'not saved'],
		['Versions', `app ${c.appVersion}, engine ${r.engineVersion}`],
		[
			'Units',
			c.units === 'US' ? 'US customary (ft, kip, kip/ft, kip-ft, in)' : 'SI (m, kN, kN/m, kNm, mm)'
		],
		...photoLine
	];
}

const SUPPORT_WORDS: Record<string, string> = { pin: 'pinned', fixed: 'fixed', free: 'free end' };
const HEIGHT_WORDS: Record<string, string> = {
	'top-flange': 'load applied at the top flange',
	'shear-centre': 'load applied at the shear centre',
	'bottom-flange': 'load hung from the bottom flange'
};

/** Restraint and load height from the case, positions in the user's units. */
export function restraintWords(r: SheetReport, units: UnitSystem): string {
	const given = r.case.beam.restraint;
	const lateral = given?.lateral ?? 'ends-only';
	const held =
		lateral === 'continuous'
			? 'compression flange restrained laterally throughout'
			: lateral === 'ends-only'
				? 'compression flange held laterally only at the supports'
				: `compression flange held laterally at the supports and at ${lateral.map((x) => formatQuantity(x, 'length', units)).join(', ')}`;
	const assumed = given ? '' : ' (not given: the cautious default)';
	return `${held}; ${HEIGHT_WORDS[given?.loadHeight ?? 'top-flange']}${assumed}`;
}

/** The inputs as label and text pairs. */
export function inputLines(r: SheetReport, units: UnitSystem): [string, string][] {
	const beam = r.case.beam;
	const spans = beam.spans.map((L) => formatQuantity(L, 'length', units)).join(' + ');
	const supports = beam.supports.map((s) => SUPPORT_WORDS[s] ?? s).join(', ');
	const joints = beam.joints?.some((j) => j === 'simple')
		? `; joints ${beam.joints.join(', ')}`
		: '';
	const loss = beam.sectionLoss
		? `; loss ${formatQuantity(beam.sectionLoss, 'dimension', units)} per face`
		: '';
	const grades = [...new Set(r.grades.map((g) => g?.name ?? 'given Mp'))].join(' / ');
	const factors = Object.entries(r.design.factors)
		.map(([k, v]) => `${k} ${v}`)
		.join(', ');
	return [
		['Spans', `${spans} (supports: ${supports}${joints})`],
		['Section', `${[...new Set(r.sections.map((s) => s.designation))].join(' / ')}${loss}`],
		['Steel', grades],
		['Restraint', restraintWords(r, units)],
		...r.case.loads.map((l, i): [string, string] => [`Load ${i + 1}`, describeLoad(l, units)]),
		['Basis', r.design.basis],
		['Factor set', `${FACTOR_SET_WORDS[r.design.factorSet] ?? r.design.factorSet}: ${factors}`]
	];
}

function describeLoad(l: SheetReport['case']['loads'][number], units: UnitSystem): string {
	const who = l.label ? ` (${l.label})` : '';
	const length = (x: number) => formatQuantity(x, 'length', units);
	if (l.kind === 'point') {
		return `${l.action} point ${formatQuantity(l.value, 'force', units)} at ${length(l.x)}${who}`;
	}
	const size =
		l.kind === 'uniform'
			? formatQuantity(l.value, 'lineLoad', units)
			: `${formatQuantity(l.start, 'lineLoad', units)} to ${formatQuantity(l.end, 'lineLoad', units)}`;
	const kind = l.kind === 'uniform' ? 'uniform' : 'varying';
	return `${l.action} ${kind} ${size} from ${length(l.from)} to ${length(l.to)}${who}`;
}

/** One row per check: label, clause, utilisation and state, the governing one marked. */
export function checkRows(r: SheetReport): [string, string, string, string][] {
	return r.checks.map((c) => [
		`${c.label}${r.answer.governing?.id === c.id && r.answer.governing.label === c.label ? ' (governs)' : ''}`,
		c.clause,
		`${Math.round(c.utilisation * 100)} %`,
		c.pass ? 'ok' : c.level === 'warning' ? 'over (warning only)' : 'NOT OK'
	]);
}

/** Which analysis the verdict rests on, in one sentence. */
export function routeSentence(r: SheetReport): string {
	if (r.answer.verdict === 'outside-scope') return 'Outside scope: no analysis result is given.';
	const why = r.design.route.reasons[0] ? ` ${r.design.route.reasons[0]}` : '';
	if (r.collapse?.decides) return `Plastic collapse analysis governs bending.${why}`;
	const resistance =
		r.design.route.route === 'elastic-first-yield'
			? 'first yield'
			: 'the plastic section resistance';
	return `Elastic analysis with ${resistance} governs; the plastic collapse does not decide.${why}`;
}
