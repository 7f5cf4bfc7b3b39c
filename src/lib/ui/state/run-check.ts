import type { CaseFile } from './case-file';
import type { CheckOutcome, ReportView } from './check-outcome';
import type { EngineTools } from './engine-tools';

/**
 * Runs the engine once on a plain (snapshot) case, with the capacity curve. A thrown error is a
 * broken invariant in the engine: it is shown plainly and never as a verdict.
 */
export function runCheck(checkCase: EngineTools['checkCase'], c: CaseFile): CheckOutcome {
	try {
		const result = checkCase(c, { curve: true });
		if (!result.ok) return { state: 'issues', issues: result.issues };
		const report: ReportView = result.report;
		return { state: 'report', report, warnings: result.warnings };
	} catch (error) {
		return { state: 'error', message: error instanceof Error ? error.message : String(error) };
	}
}
