/**
 * Text for sharing a result: a short message (under about 600 characters) and a long form with
 * every input and check. Plain text only (see plain-text.ts). The date comes in as text: the
 * engine has no clock. Numbers arrive in output units (m, kN, kN/m, kNm, mm) and are written in
 * the units asked for (see summary-units.ts).
 */
import { toPlainText } from './plain-text';
import { convertTo, formatIn, formatNumber, UNITS_WORDS, type SummaryUnits } from './summary-units';
import type { VerdictKind } from '../checks/types';

export { formatNumber } from './summary-units';

/** Longest short message, characters. */
export const SHORT_SUMMARY_LIMIT = 600;

/** A load line as shown: value in kN or kN/m, positions in m. */
export interface SummaryLoad {
	action: 'permanent' | 'imposed' | 'temporary';
	kind: 'point' | 'uniform' | 'linear';
	/** kN (point) or kN/m (peak for linear). */
	value: number;
	/** m: the point, or the loaded stretch. */
	at?: number;
	from?: number;
	to?: number;
	label?: string | null;
}

/** A check line. */
export interface SummaryCheck {
	label: string;
	clause: string;
	utilisation: number;
	pass: boolean;
	level: 'governing' | 'warning';
	/** Key numbers already formatted in the summary's units, e.g. `VEd 65.2 kN`. */
	details: string[];
}

/** What the summary shows. */
export interface SummaryInput {
	title: string;
	place?: string;
	/** As the user should read it, e.g. `1 Dec 2026`. */
	date?: string;
	/** Spans in m and the support kinds left to right. */
	spans: number[];
	supports: string[];
	section: string;
	grade: string;
	loads: SummaryLoad[];
	/** Units the numbers are written in (default SI); every number here arrives in SI. */
	units?: SummaryUnits;
	/** The design basis in words, e.g. `EN 1990 / EN 1993-1-1 (recommended values)`. */
	basis?: string;
	/** Name of the factor set and its values. */
	factorSet: string;
	factors: Record<string, number>;
	/** null when no non-zero proposed load was entered. */
	verdict: VerdictKind | null;
	/** The answer's one sentence (used when there is no verdict). */
	message?: string;
	routeReasons: string[];
	governing: { label: string; utilisation: number } | null;
	/** %: (multiplier − 1) × 100 of the governing answer. */
	reserve: number | null;
	/** Largest proposed loads, already in words and units: e.g. `19.3 kN (load 3, hoist)`. */
	allowable: string[];
	/** Lateral restraint and load height, in words and units. */
	restraint?: string;
	checks: SummaryCheck[];
	governingArrangement?: string;
	notice: string;
	notices: string[];
	assumptions: string[];
}

const VERDICT_WORDS: Record<VerdictKind, string> = {
	pass: 'PASS (within capacity for the inputs entered; screening only)',
	fail: 'FAIL',
	'outside-scope': 'OUTSIDE SCOPE (no capacity given)'
};

function describeLoad(l: SummaryLoad, units: SummaryUnits = 'si'): string {
	const who = l.label ? `${l.label} ` : '';
	if (l.kind === 'point') {
		const [v, at] = [formatIn(l.value, 'force', units), formatIn(l.at ?? 0, 'length', units)];
		return `${who}${l.action} ${v} at ${at}`;
	}
	const from = formatNumber(convertTo(l.from ?? 0, 'length', units));
	const to = formatIn(l.to ?? 0, 'length', units);
	return `${who}${l.action} ${formatIn(l.value, 'lineLoad', units)} from ${from} to ${to}`;
}

function describeBeam(s: SummaryInput): string {
	const spans = s.spans.map((L) => formatIn(L, 'length', s.units ?? 'si')).join(' + ');
	return `${spans} (${s.supports.join('-')}), ${s.section}, ${s.grade}`;
}

/** The basis and factor set as one sentence. */
function describeFactors(s: SummaryInput): string {
	const basis = s.basis ? `Checked to ${s.basis}` : 'Checked';
	return `${basis}, with the factor set ${s.factorSet}.`;
}

function describeResult(s: SummaryInput): string {
	if (s.verdict === null) return `NO VERDICT: ${s.message ?? 'no proposed load'}`;
	const parts = [VERDICT_WORDS[s.verdict]];
	if (s.governing) {
		const u = Math.round(s.governing.utilisation * 100);
		parts.push(`governed by ${s.governing.label} at ${u} %`);
	}
	if (s.reserve !== null) parts.push(`reserve ${Math.round(s.reserve)} %`);
	if (s.verdict === 'outside-scope' && s.routeReasons[0]) parts.push(s.routeReasons[0]);
	return parts.join(', ');
}

/**
 * The short message, under {@link SHORT_SUMMARY_LIMIT} characters. The answer (verdict, largest
 * proposed loads) and the engineer-of-record notice always stay; to fit, it drops the load list,
 * then the place, then the factor sentence, then the beam and restraint lines, and last shortens
 * the result line.
 * @example
 * writeShortSummary(input).length < 600 // true
 */
export function writeShortSummary(s: SummaryInput): string {
	const head = [s.title || 'Beam check', [s.place, s.date].filter(Boolean).join(', ')];
	const loads = `Loads: ${s.loads.map((l) => describeLoad(l, s.units)).join('; ')}`;
	const many = s.allowable.length > 1 ? 's, together' : '';
	const allow = s.allowable.length ? `Largest proposed load${many}: ${s.allowable.join('; ')}` : '';
	const result = `Result: ${describeResult(s)}`;
	const build = (drop: number, resultLine = result) =>
		toPlainText(
			[
				drop < 2 ? head.join(', ').replace(/, $/, '') : head[0],
				drop < 4 ? `Beam: ${describeBeam(s)}` : '',
				drop < 4 && s.restraint ? `Restraint: ${s.restraint}` : '',
				drop < 1 ? loads : '',
				drop < 3 ? describeFactors(s) : '',
				resultLine,
				allow,
				s.notice
			]
				.filter(Boolean)
				.join('\n')
		);
	for (let drop = 0; drop <= 4; drop++) {
		const text = build(drop);
		if (text.length < SHORT_SUMMARY_LIMIT) return text;
	}
	// Still too long (very long names or many loads): the notice whole, then the result, the
	// answer and the title, each cut to the room left.
	let room = SHORT_SUMMARY_LIMIT - 1 - s.notice.length;
	const fit = (line: string) => {
		const kept = line.length + 1 <= room ? line : room > 2 ? `${line.slice(0, room - 2)}…` : '';
		room -= kept ? kept.length + 1 : 0;
		return kept;
	};
	const [r, a, t] = [fit(toPlainText(result)), fit(toPlainText(allow)), fit(toPlainText(head[0]))];
	return [t, r, a, toPlainText(s.notice)].filter(Boolean).join('\n');
}

function describeCheck(c: SummaryCheck): string {
	const state = c.pass ? 'ok' : c.level === 'warning' ? 'over the limit (warning only)' : 'NOT OK';
	const details = c.details.length ? `; ${c.details.join(', ')}` : '';
	return `  • ${c.label} (${c.clause}): ${Math.round(c.utilisation * 100)} % ${state}${details}`;
}

/** The long form: every input, factor, check, notice and assumption. */
export function writeLongSummary(s: SummaryInput): string {
	const lines = [
		s.title || 'Beam check',
		[s.place, s.date].filter(Boolean).join(', '),
		'',
		`Units: ${UNITS_WORDS[s.units ?? 'si']}.`,
		`Beam: ${describeBeam(s)}`,
		s.restraint ? `Restraint: ${s.restraint}` : '',
		'Loads (characteristic):',
		...s.loads.map((l) => `  • ${describeLoad(l, s.units)}`),
		describeFactors(s),
		`Factors: ${Object.entries(s.factors)
			.map(([k, v]) => `${k} ${v}`)
			.join(', ')}`,
		s.governingArrangement ? `Governing load arrangement: ${s.governingArrangement}` : '',
		'',
		`Result: ${describeResult(s)}`,
		...s.routeReasons.map((r) => `Route: ${r}`),
		...s.allowable.map((a) => `Largest proposed load: ${a}`),
		'',
		'Checks:',
		...s.checks.map(describeCheck),
		'',
		'Notices:',
		...[s.notice, ...s.notices.filter((n) => n !== s.notice)].map((n) => `  • ${n}`),
		'Assumptions:',
		...s.assumptions.map((a) => `  • ${a}`)
	];
	return toPlainText(lines.filter((l, i) => l !== '' || lines[i - 1] !== '').join('\n'));
}
