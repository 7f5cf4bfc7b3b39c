import { readFile } from 'node:fs/promises';
import { checkCase, type CheckReport } from '../../lib/engine/index';
import type { InputIssue } from '../../lib/engine/model/issue';
import type { CliCommand } from './index';

/** Rounds for reading: 4 significant figures, no exponent for everyday sizes. */
function fmt(v: number | null | undefined, digits = 4): string {
	if (v === null || v === undefined) return '—';
	return Number(v.toPrecision(digits)).toString();
}

/** The readable summary `check` prints without --json. */
function formatCheckText(r: CheckReport, warnings: { path: string; message: string }[]): string {
	const c = r.collapse;
	const lines = [r.title ? `Case: ${r.title}` : 'Case (untitled)', ''];
	r.sections.forEach((s, i) => {
		const g = r.grades[i];
		const cls = s.class === null ? 'class not known' : `Class ${s.class}`;
		const fy = g ? `, ${g.name}, fy ${g.fy} MPa` : '';
		lines.push(`Span ${i + 1}: ${s.designation}${fy}, ${cls}; Mp,Rd ${fmt(r.mpRd[i])} kNm`);
	});
	const scope = c.appliesTo === 'temporary' ? 'on the temporary loads' : 'on all loads';
	lines.push('', `Plastic collapse (factor ${scope}):`);
	if (c.loadFactor === null) lines.push(`  no load factor: ${c.message ?? c.status}`);
	else {
		const proof = c.certified ? ' (certified: bounds meet)' : ' — NOT CERTIFIED';
		lines.push(`  load factor λ = ${fmt(c.loadFactor)}${proof}`);
		if (c.mechanism) lines.push(`  mechanism: ${c.mechanism.name}`);
		for (const h of c.hinges) lines.push(`  hinge at x = ${fmt(h.x)} m, M = ${fmt(h.moment)} kNm`);
		if (c.message) lines.push(`  ${c.message}`);
	}
	if (r.temporaryCapacity) {
		lines.push('', 'Largest temporary loads (characteristic, the other loads present):');
		for (const t of r.temporaryCapacity.loads) {
			const name = t.label ?? `load ${t.index + 1} (${t.kind})`;
			const entered = `${fmt(t.entered)} ${t.unit}`;
			lines.push(`  ${name}: entered ${entered}, capacity ${fmt(t.capacity)} ${t.unit}`);
		}
		const { total, enteredTotal } = r.temporaryCapacity;
		lines.push(`  total: ${fmt(total)} kN (entered ${fmt(enteredTotal)} kN)`);
	}
	if (r.capacityCurve) {
		const m = r.capacityCurve.min;
		const where = `x = ${fmt(m.x)} m (${m.mechanism})`;
		lines.push('', `Single temporary point load: least ${fmt(m.p)} kN at ${where}`);
	}
	const e = r.elastic;
	lines.push('', 'Elastic, unfactored loads:');
	for (const [word, v] of [
		['sagging', e.maxMoment?.maxSagging],
		['hogging', e.maxMoment?.maxHogging]
	] as const) {
		if (v) lines.push(`  largest ${word} moment ${fmt(v.value)} kNm at ${fmt(v.x)} m`);
	}
	if (e.maxDeflection) {
		const { total, temporary } = e.maxDeflection;
		lines.push(`  largest deflection ${fmt(total.value, 3)} mm at ${fmt(total.x)} m`);
		if (temporary) lines.push(`  from the temporary loads alone ${fmt(temporary.value, 3)} mm`);
	}
	if (e.firstYield) lines.push(`  first yield at factor ${fmt(e.firstYield.factor)}`);
	if (e.firstHinge) lines.push(`  first plastic hinge at factor ${fmt(e.firstHinge.factor)}`);
	lines.push('', ...formatVerdictText(r));
	lines.push('', 'Notices:', ...r.notices.map((n) => `  - ${n}`));
	if (warnings.length > 0) {
		lines.push('', 'Input warnings:', ...warnings.map((w) => `  - ${w.path}: ${w.message}`));
	}
	lines.push('', `Engine ${r.engineVersion}`);
	return lines.join('\n');
}

/** Verdict, governing check, reserve, allowable loads and every check row. */
function formatVerdictText(r: CheckReport): string[] {
	const d = r.design;
	const lines = [
		`Verdict: ${r.verdict.toUpperCase()} (${d.route.route})`,
		...d.route.reasons.map((t) => `  ${t}`)
	];
	if (r.governing) {
		const u = fmt(r.governing.utilisation, 3);
		lines.push(`  governing: ${r.governing.label}, utilisation ${u}`);
	}
	if (d.loadFactor !== null) {
		lines.push(`  load factor on the temporary loads ${fmt(d.loadFactor)}`);
	}
	if (r.reserve !== null) lines.push(`  reserve ${fmt(r.reserve, 3)} %`);
	lines.push(`  factor set ${d.factorSet}, ${d.arrangementsTried} load arrangements tried`);
	if (d.governingArrangement) lines.push(`  governing arrangement: ${d.governingArrangement}`);
	for (const t of r.allowable?.loads ?? []) {
		const name = t.label ?? `load ${t.index + 1}`;
		lines.push(`  largest ${name}: ${fmt(t.capacity)} ${t.unit} (entered ${fmt(t.entered)})`);
	}
	lines.push('', 'Checks:');
	for (const c of r.checks) {
		const mark = c.pass ? 'ok' : c.level === 'warning' ? 'over (warning)' : 'FAILS';
		lines.push(`  ${c.label}: ${fmt(c.utilisation * 100, 3)} % ${mark} [${c.clause}]`);
	}
	return lines;
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

const toError = (i: InputIssue) => ({ path: i.path, message: i.message, code: i.code });

/**
 * `check <case.json> [--json] [--curve]`: runs a case file. Exit 0 with a result whatever the
 * verdict, 2 for unreadable or invalid input (`{"errors": [{path, message}]}` on stdout),
 * 1 for an internal failure.
 */
export const checkCommand: CliCommand = {
	summary: 'check a case file: check <case.json> [--json] [--curve]',
	async run(args) {
		const json = args.includes('--json');
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
		let data: unknown;
		try {
			data = JSON.parse(text);
		} catch (error) {
			const reason = error instanceof Error ? error.message : String(error);
			return failInput([{ path: '', message: `not valid JSON: ${reason}` }], json);
		}
		let outcome: ReturnType<typeof checkCase>;
		try {
			outcome = checkCase(data, { curve });
		} catch (error) {
			const reason = error instanceof Error ? error.message : String(error);
			process.stdout.write(JSON.stringify({ internalError: reason }) + '\n');
			process.stderr.write(`internal error: ${error instanceof Error ? error.stack : reason}\n`);
			return 1;
		}
		if (!outcome.ok) return failInput(outcome.issues.map(toError), json);
		const warnings = outcome.warnings.map(toError);
		if (json) process.stdout.write(JSON.stringify({ ...outcome.report, warnings }) + '\n');
		else process.stdout.write(formatCheckText(outcome.report, warnings) + '\n');
		return 0;
	}
};
