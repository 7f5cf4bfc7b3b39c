import { checkCase } from '$lib/engine';
import type { ComputedVerdict } from '$lib/storage';

const VERDICTS: readonly string[] = ['pass', 'fail', 'outside-scope'];

/**
 * The app's own verdict for a stored or imported case: the engine validates it afresh and
 * computes it. Never throws: input problems and engine failures are 'needs-attention'.
 * @example
 * recomputeVerdict({ format: 'nonsense' }) // 'needs-attention'
 */
export function recomputeVerdict(input: unknown): ComputedVerdict {
	try {
		const outcome = checkCase(input);
		if (!outcome.ok) return 'needs-attention';
		const verdict = readVerdict(outcome.report);
		if (verdict === null) return 'no-load';
		return VERDICTS.includes(String(verdict)) ? (verdict as ComputedVerdict) : 'needs-attention';
	} catch {
		return 'needs-attention';
	}
}

/** Where the report keeps its verdict (one line to change if the report moves it again). */
export function readVerdict(report: unknown): unknown {
	const r = report as { answer?: { verdict?: unknown }; verdict?: unknown };
	return r.answer !== undefined ? r.answer.verdict : r.verdict;
}
