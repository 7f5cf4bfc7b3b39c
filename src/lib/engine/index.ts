/**
 * The engine's public API: `checkCase` runs a case file (parsed JSON) from validation to report.
 * Pure TypeScript; the same call serves the phone app and the command line.
 */
import { parseCase } from './case/parse-case';
import { explainMissingBasis } from './checks/bases';
import { runDesign } from './checks/run-design';
import type { InputIssue } from './model/issue';
import { buildCheckReport, type ReportOptions } from './report/build-report';
import { restateUnits } from './report/restate-units';
import type { CheckReport } from './report/types';

export { ENGINE_VERSION } from './report/version';
export { parseCase } from './case/parse-case';
export { CASE_FORMAT, CASE_VERSION } from './case/types';
export { REPORT_FORMAT, REPORT_VERSION } from './report/types';
export { describeAllowable } from './report/answer-report';
export type * from './case/types';
export type * from './report/types';
export type { ReportOptions } from './report/build-report';
export type { Checked, InputIssue } from './model/issue';
export type { ActionCategory, BeamLine, JointKind, Load, SupportKind } from './model/types';

/** Outcome of `checkCase`: input problems, or a report with any warnings about the input. */
export type CheckOutcome =
	{ ok: false; issues: InputIssue[] } | { ok: true; report: CheckReport; warnings: InputIssue[] };

/**
 * Validates a case file and, when it is valid, computes its report. Never throws for bad input
 * (that comes back as issues); a throw means a broken invariant inside the engine.
 * @param json the parsed case file (`format: 'hingepoint.case'`)
 * @param options `curve: true` adds the governing capacity curve
 * @example
 * const out = checkCase({ format: 'hingepoint.case', version: 1,
 *   beam: { spans: [6], supports: ['pin', 'pin'], section: 'UB 305x165x40', grade: 'S275' },
 *   loads: [{ kind: 'point', x: 3, value: 10, action: 'temporary' }] });
 * out.ok && out.report.answer.multiplier // the factor every deciding check allows
 */
export function checkCase(json: unknown, options: ReportOptions = {}): CheckOutcome {
	const parsed = parseCase(json);
	// Messages quote figures in the units the report is read in, like the report's own words.
	const say = (i: InputIssue): InputIssue => ({
		...i,
		message: restateUnits(i.message, options.units ?? 'si')
	});
	if (!parsed.ok) return { ok: false, issues: parsed.issues.map(say) };
	const missing = explainMissingBasis(parsed.value.basis);
	if (missing) return { ok: false, issues: [say(missing)] };
	const design = runDesign(parsed.value, { curve: options.curve });
	const report = buildCheckReport(parsed.value, design, options);
	return { ok: true, report, warnings: parsed.warnings.map(say) };
}
