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
 * const u = (a: LoadArrangement, t: number) => ({ utilisation: 0.3 + 0.5 * t, detail: null });
 * findWorstArrangement(arrangements, u).multiplier // 1.4
 */
export function findWorstArrangement<T>(
	arrangements: LoadArrangement[],
	evaluate: ArrangementEvaluator<T>
): WorstArrangement<T> {
	if (arrangements.length === 0) throw new Error('invariant: at least one load arrangement');
	const first = arrangements.map((arrangement) => {
		const one = evaluate(arrangement, 1);
		const u0 = evaluate(arrangement, 0).utilisation;
		const u1 = one.utilisation;
		// Straight-line estimate of the root, only to decide the search order.
		const estimate = u0 >= 1 ? 0 : u1 > u0 ? (1 - u0) / (u1 - u0) : Number.MAX_VALUE;
		return { arrangement, one, u0, estimate };
	});
	let worst = first[0];
	for (const f of first) if (f.one.utilisation > worst.one.utilisation) worst = f;
	let multiplier: number | null = null;
	for (const f of [...first].sort((a, b) => a.estimate - b.estimate)) {
		// u does not fall once past 1, so u(best) < 1 means this root lies beyond the best one.
		if (multiplier !== null && evaluate(f.arrangement, multiplier).utilisation < 1) continue;
		const m = findMultiplierAtCapacity({
			utilisation: (t) => evaluate(f.arrangement, t).utilisation,
			tolerance: TOLERANCE,
			// The straight-line estimate is exact for linear checks and close for the others.
			start: f.estimate > 0 && f.estimate < 1e6 ? f.estimate * (1 + 1e-9) : 1
		});
		if (m !== null && (multiplier === null || m < multiplier)) multiplier = m;
	}
	return {
		arrangement: worst.arrangement,
		utilisation: worst.one.utilisation,
		utilisationExisting: Math.max(...first.map((f) => f.u0)),
		multiplier,
		detail: worst.one.detail
	};
}
