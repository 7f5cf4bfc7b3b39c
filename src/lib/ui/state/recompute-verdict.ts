import { checkCase } from '$lib/engine';
import type { ComputedVerdict } from '$lib/storage';
import { verdictOfReport } from './verdict-stamp';

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
		return verdictOfReport(outcome.report);
	} catch {
		return 'needs-attention';
	}
}
