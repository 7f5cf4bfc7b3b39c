import type { ComputedVerdict, VerdictStamp } from '$lib/storage';
import { ENGINE_VERSION } from './engine-version';

const VERDICTS: readonly string[] = ['pass', 'fail', 'outside-scope'];

/** Where the report keeps its verdict (one line to change if the report moves it again). */
export function readVerdict(report: unknown): unknown {
	const r = report as { answer?: { verdict?: unknown }; verdict?: unknown };
	return r.answer !== undefined ? r.answer.verdict : r.verdict;
}

/** The saved list's verdict for a report the app computed. */
export function verdictOfReport(report: unknown): ComputedVerdict {
	const verdict = readVerdict(report);
	if (verdict === null) return 'no-load';
	return VERDICTS.includes(String(verdict)) ? (verdict as ComputedVerdict) : 'needs-attention';
}

/**
 * The stamp a check is saved with, so the saved list has its verdict at once and never rewrites
 * the record afterwards. Imports no engine code (the engine runs in its worker).
 */
export function stampReport(report: unknown): VerdictStamp {
	return { verdict: verdictOfReport(report), computedBy: ENGINE_VERSION };
}
