import { readFile } from 'node:fs/promises';
import { checkCase, describeAllowable, type CheckReport } from '../../lib/engine/index';
import type { InputIssue } from '../../lib/engine/model/issue';
import {
	convertTo,
	unitSymbol,
	type SummaryQuantity,
	type SummaryUnits
} from '../../lib/engine/report/summary-units';
import type { CliCommand } from './index';

/** Rounds for reading: 4 significant figures, no exponent for everyday sizes. */
function fmt(v: number | null | undefined, digits = 4): string {
	if (v === null || v === undefined) return '—';
	return Number(v.toPrecision(digits)).toString();
}

const VERDICT_WORDS = {
	pass: 'PASS',
	fail: 'FAIL',
	'outside-scope': 'OUTSIDE SCOPE'
} as const;

/**
 * The readable summary `check` prints without --json: the answer first, then what it rests on,
 * every figure in `units` (the report's words already are).
 */
function formatCheckText(
	r: CheckReport,
	warnings: { path: string; message: string }[],
	units: SummaryUnits
): string {
	/** An SI output value in the chosen units with its symbol, 4 significant figures by default. */
	const q = (v: number, quantity: SummaryQuantity, digits = 4) =>
		`${fmt(convertTo(v, quantity, units), digits)} ${unitSymbol(quantity, units)}`;
	const a = r.answer;
	const lines = [r.title ? `Case: ${r.title}` : 'Case (untitled)', ''];
	lines.push(`Verdict: ${a.verdict === null ? 'NO VERDICT' : VERDICT_WORDS[a.verdict]}`);
	lines.push(`  ${a.message}`);
	if (a.governing) {
		const u = a.utilisation === null ? '' : `, utilisation ${fmt(a.utilisation * 100, 3)} %`;
		lines.push(`  governing: ${a.governing.label}${u}`);
	}
	if (a.multiplier !== null) {
		lines.push(
			`  multiplier on the proposed loads ${fmt(a.multiplier)}; reserve ${fmt(a.reserve! * 100, 3)} %`
		);
	}
	for (const t of a.allowable)
		lines.push(`  largest proposed load: ${describeAllowable(t, units)}`);
	for (const reason of a.reasons) lines.push(`  - ${reason}`);
	lines.push('', `Route: ${r.design.route.route}`, ...r.design.route.reasons.map((t) => `  ${t}`));
	lines.push(
		`  ${r.design.basis}; factor set ${r.design.factorSet}, ${r.design.arrangementsTried} load arrangements tried`
	);
	if (r.design.governingArrangement)
		lines.push(`  governing arrangement: ${r.design.governingArrangement}`);
	r.sections.forEach((s, i) => {
		const g = r.grades[i];
		const cls = s.classWords ?? 'class not known';
		const fy = g ? `, ${g.name}, fy ${q(g.fy, 'stress')}` : '';
		lines.push(`Span ${i + 1}: ${s.designation}${fy}, ${cls}`);
	});
	if (r.checks.length > 0) {
		lines.push('', 'Checks (each a partial result; the verdict takes the worst):');
		for (const c of r.checks) {
			const mark = c.pass ? 'ok' : c.level === 'warning' ? 'over (warning)' : 'FAILS';
			lines.push(`  ${c.label}: ${fmt(c.utilisation * 100, 3)} % ${mark} [${c.clause}]`);
		}
	}
	const c = r.collapse;
	if (c) {
		const role = c.decides
			? 'the bending check of the plastic route'
			: 'for information, it does not decide';
		lines.push('', `Plastic collapse in bending (partial result; ${role}):`);
		if (c.loadFactor === null) lines.push(`  no load factor: ${c.message ?? c.status}`);
		else {
			const proof = c.certified ? ' (certified: bounds meet)' : ' — NOT CERTIFIED';
			lines.push(`  load factor λ = ${fmt(c.loadFactor)}${proof}`);
			if (c.mechanism) lines.push(`  mechanism: ${c.mechanism.name}`);
			for (const h of c.hinges)
				lines.push(`  hinge at x = ${q(h.x, 'length')}, M = ${q(h.moment, 'moment')}`);
			if (c.message) lines.push(`  ${c.message}`);
		}
	}
	if (r.capacityCurve?.min) {
		const m = r.capacityCurve.min;
		const by = m.governing ? `, governed by ${m.governing.label}` : '';
		lines.push(
			'',
			`Single proposed point load anywhere on the beam: least ${q(m.p, 'force')} at x = ${q(m.x, 'length')}${by}`
		);
	}
	const e = r.effects;
	lines.push('', 'Elastic, unfactored loads:');
	for (const [word, v] of [
		['sagging', e.maxMoment?.maxSagging],
		['hogging', e.maxMoment?.maxHogging]
	] as const) {
		if (v) lines.push(`  largest ${word} moment ${q(v.value, 'moment')} at ${q(v.x, 'length')}`);
	}
	if (e.maxDeflection) {
		const { total, temporary } = e.maxDeflection;
		lines.push(`  largest deflection ${q(total.value, 'small', 3)} at ${q(total.x, 'length')}`);
		if (temporary) lines.push(`  from the temporary loads alone ${q(temporary.value, 'small', 3)}`);
	}
	lines.push('', 'Notices:', ...r.notices.map((n) => `  - ${n}`));
	lines.push('', 'Assumptions:', ...r.assumptions.map((n) => `  - ${n}`));
	if (warnings.length > 0) {
		lines.push('', 'Input warnings:', ...warnings.map((w) => `  - ${w.path}: ${w.message}`));
	}
	lines.push('', `Units: ${units === 'us' ? 'US customary' : 'SI'}. Engine ${r.engineVersion}`);
	return lines.join('\n');
}

/** One entry of the `errors` list printed for bad input. */
interface CliError {
	path: string;
	message: string;
	code?: string;
}

/** Writes the `{"errors": […]}` object of an input problem and returns exit code 2. */
function failInput(errors: CliError[], json: boolean): number {
	process.stdout.write(JSON.stringify({ errors }) + '\n');
	if (!json) {
		const text = errors.map((e) => `${e.path || '(file)'}: ${e.message}`).join('\n');
		process.stderr.write(text + '\n');
	}
	return 2;
}

/** Largest case file read, characters: 200 loads and 50 spans fit in well under 100 000. */
const MAX_CASE_CHARS = 1_000_000;

const toError = (i: InputIssue) => ({ path: i.path, message: i.message, code: i.code });

/** Reads `--units si|us` (or `--units=us`); null when not given, a message when not valid. */
function readUnitsOption(args: string[]): { units: SummaryUnits | null; rest: string[] } | string {
	const rest: string[] = [];
	let units: string | null = null;
	for (let i = 0; i < args.length; i++) {
		if (args[i] === '--units') units = args[++i] ?? '';
		else if (args[i].startsWith('--units=')) units = args[i].slice('--units='.length);
		else rest.push(args[i]);
	}
	if (units === null) return { units: null, rest };
	if (units !== 'si' && units !== 'us') return `--units takes si or us, not "${units}"`;
	return { units, rest };
}

/** The units a case file asks to be read in (`"units": "us"` at its top level), else SI. */
function unitsOfCase(data: unknown): SummaryUnits {
	const units =
		typeof data === 'object' && data !== null ? (data as { units?: unknown }).units : null;
	return units === 'us' ? 'us' : 'si';
}

/**
 * `check <case.json> [--json] [--curve] [--units si|us]`: runs a case file. Exit 0 with a result
 * whatever the verdict, 2 for unreadable or invalid input (`{"errors": [{path, message}]}` on
 * stdout), 1 for an internal failure. `--units` sets the units of the words and the printed
 * figures (default: the case's own `units`, else SI); the JSON's numbers are always SI.
 */
export const checkCommand: CliCommand = {
	summary: 'check a case file: check <case.json> [--json] [--curve] [--units si|us]',
	async run(all) {
		const json = all.includes('--json');
		const option = readUnitsOption(all);
		if (typeof option === 'string') return failInput([{ path: '', message: option }], json);
		const args = option.rest;
		const curve = args.includes('--curve');
		const unknown = args.filter((a) => a.startsWith('--') && a !== '--json' && a !== '--curve');
		const files = args.filter((a) => !a.startsWith('--'));
		if (unknown.length > 0) {
			return failInput([{ path: '', message: `unknown option ${unknown[0]}` }], json);
		}
		if (files.length !== 1) {
			const message = 'give exactly one case file: check <case.json>';
			return failInput([{ path: '', message }], json);
		}
		let text: string;
		try {
			text = await readFile(files[0], 'utf8');
		} catch (error) {
			const reason = error instanceof Error ? error.message : String(error);
			return failInput([{ path: '', message: `cannot read ${files[0]}: ${reason}` }], json);
		}
		// A valid case is a few kB; refuse a huge file before parsing it.
		if (text.length > MAX_CASE_CHARS) {
			const message = `the case file is larger than ${MAX_CASE_CHARS} characters`;
			return failInput([{ path: '', message }], json);
		}
		let data: unknown;
		try {
			data = JSON.parse(text);
		} catch (error) {
			const reason = error instanceof Error ? error.message : String(error);
			return failInput([{ path: '', message: `not valid JSON: ${reason}` }], json);
		}
		const units = option.units ?? unitsOfCase(data);
		let outcome: ReturnType<typeof checkCase>;
		try {
			outcome = checkCase(data, { curve, units });
		} catch (error) {
			const reason = error instanceof Error ? error.message : String(error);
			process.stdout.write(JSON.stringify({ internalError: reason }) + '\n');
			process.stderr.write(`internal error: ${error instanceof Error ? error.stack : reason}\n`);
			return 1;
		}
		if (!outcome.ok) return failInput(outcome.issues.map(toError), json);
		const warnings = outcome.warnings.map(toError);
		if (json) process.stdout.write(JSON.stringify({ ...outcome.report, warnings }) + '\n');
		else process.stdout.write(formatCheckText(outcome.report, warnings, units) + '\n');
		return 0;
	}
};
