import type { CheckOutcome as EngineOutcome } from '$lib/engine';
import type { CaseFile } from './case-file';
import type { CheckOutcome, ReportView } from './check-outcome';

/**
 * The screen's view of the engine's answer. The assignment to ReportView is where the compiler
 * checks that the engine's report still has every field the screens read.
 */
export function toCheckOutcome(result: EngineOutcome): CheckOutcome {
	if (!result.ok) return { state: 'issues', issues: result.issues };
	const report: ReportView = result.report;
	return { state: 'report', report, warnings: result.warnings };
}

/**
 * Runs the engine once on a plain (snapshot) case, with the capacity curve (unless told not to) and the share texts in
 * `units`. A thrown error is a broken invariant in the engine: it is shown plainly, never as a verdict.
 */
export function runCheck(
	checkCase: (json: unknown, options?: { curve?: boolean; units?: 'si' | 'us' }) => EngineOutcome,
	c: CaseFile,
	units?: 'si' | 'us',
	curve = true
): CheckOutcome {
	try {
		return toCheckOutcome(checkCase(c, { curve, units }));
	} catch (error) {
		return { state: 'error', message: error instanceof Error ? error.message : String(error) };
	}
}
