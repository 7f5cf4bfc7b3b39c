/**
 * Evaluates one check over every load arrangement: the worst utilisation at the design loads,
 * the worst under the fixed loads alone, and the smallest temporary-load multiplier at capacity.
 */
import type { LoadArrangement } from './load-arrangements';
import { findMultiplierAtCapacity } from './root-find';

/** A check's utilisation at multiplier t for one arrangement, with what to report. */
export type ArrangementEvaluator<T> = (
	arrangement: LoadArrangement,
	t: number
) => { utilisation: number; detail: T };

/** The worst arrangement for a check. */
export interface WorstArrangement<T> {
	/** The arrangement with the highest utilisation at the design loads. */
	arrangement: LoadArrangement;
	utilisation: number;
	utilisationExisting: number;
	/** Smallest multiplier at capacity over all arrangements. */
	multiplier: number | null;
	/** Detail of the governing arrangement at multiplier 1. */
	detail: T;
}

/** Relative tolerance of the multiplier search; four figures are plenty for a load. */
const TOLERANCE = 1e-6;

/**
 * Worst case over arrangements (throws on an empty list: there is always one arrangement).
 * @example
 * findWorstArrangement(arrangements, (a, t) => ({ utilisation: 0.3 + 0.5 * t, detail: null })).multiplier
 * // 1.4
 */
export function findWorstArrangement<T>(
	arrangements: LoadArrangement[],
	evaluate: ArrangementEvaluator<T>
): WorstArrangement<T> {
	let worst: WorstArrangement<T> | null = null;
	let multiplier: number | null = null;
	let existing = 0;
	for (const arrangement of arrangements) {
		const atOne = evaluate(arrangement, 1);
		existing = Math.max(existing, evaluate(arrangement, 0).utilisation);
		const m = findMultiplierAtCapacity({
			utilisation: (t) => evaluate(arrangement, t).utilisation,
			tolerance: TOLERANCE
		});
		if (m !== null && (multiplier === null || m < multiplier)) multiplier = m;
		if (worst === null || atOne.utilisation > worst.utilisation) {
			worst = { arrangement, utilisation: atOne.utilisation, utilisationExisting: 0, multiplier: null, detail: atOne.detail };
		}
	}
	if (worst === null) throw new Error('invariant: at least one load arrangement');
	return { ...worst, utilisationExisting: existing, multiplier };
}
