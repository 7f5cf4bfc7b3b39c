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
 * An arrangement is skipped only below 1 at the best multiplier so far times this: its root then
 * lies so far above that its search, which may stop up to the tolerance below the root, could
 * not return less. The answer is the least search result over all arrangements, whatever the
 * order they are met in (a pruned and an exhaustive search agree to the last bit).
 */
const SKIP_ABOVE = 1 + 2 * TOLERANCE;

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
		const above = multiplier === null ? null : multiplier * SKIP_ABOVE;
		if (above !== null && evaluate(f.arrangement, above).utilisation < 1) continue;
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

/**
 * An upper bound on a check's utilisation at multiplier t for one arrangement, cheaper than the
 * evaluation (Infinity when none is known). It may tighten as evaluations are made.
 */
export type ArrangementBound = (arrangement: LoadArrangement, t: number) => number;

/**
 * The same answer as {@link findWorstArrangement}, evaluating only the arrangements whose bound
 * leaves them a chance: the worst utilisation at the design loads and under the fixed loads
 * alone are the largest evaluated ones once every other bound is below them (earliest in list
 * order on a tie, as there), and an arrangement whose bound just above the best multiplier so
 * far is below 1 is skipped exactly as one whose utilisation there is below 1.
 */
export function findWorstArrangementBounded<T>(
	arrangements: LoadArrangement[],
	evaluate: ArrangementEvaluator<T>,
	bound: ArrangementBound
): WorstArrangement<T> {
	if (arrangements.length === 0) throw new Error('invariant: at least one load arrangement');
	const ones = new Map<number, { utilisation: number; detail: T }>();
	const zeros = new Map<number, number>();
	const one = (i: number) => {
		let e = ones.get(i);
		if (!e) ones.set(i, (e = evaluate(arrangements[i], 1)));
		return e;
	};
	const zero = (i: number) => {
		let u = zeros.get(i);
		if (u === undefined) zeros.set(i, (u = evaluate(arrangements[i], 0).utilisation));
		return u;
	};
	const index = arrangements.map((_, i) => i);
	/**
	 * The arrangement with the largest utilisation at t, the earliest on a tie: best first by
	 * bound, each bound made when the arrangement comes up and made again only when evaluations
	 * since may have tightened it.
	 */
	const largest = (t: number, read: (i: number) => number) => {
		const queue = new BoundQueue(index.map(() => Infinity));
		const madeAt = index.map(() => -1);
		let evaluations = 0;
		let best = -1;
		let top = -Infinity;
		for (let i = queue.pop(); i >= 0; i = queue.pop()) {
			if (queue.keyOf(i) < top) break;
			let b = queue.keyOf(i);
			if (best >= 0 && madeAt[i] < evaluations) {
				b = Math.min(b, bound(arrangements[i], t));
				madeAt[i] = evaluations;
			}
			if (b < top) continue;
			// Put back behind a higher bound: that one may be the worse.
			if (b < queue.peekKey()) {
				queue.push(i, b);
				continue;
			}
			const u = read(i);
			evaluations++;
			if (best < 0 || u > top || (u === top && i < best)) [best, top] = [i, u];
		}
		return { best, top, keys: index.map((i) => queue.keyOf(i)) };
	};
	const worst = largest(1, (i) => one(i).utilisation);
	const existing = largest(0, zero);
	const estimate = (i: number) => {
		const u0 = zero(i);
		const u1 = one(i).utilisation;
		return u0 >= 1 ? 0 : u1 > u0 ? (1 - u0) / (u1 - u0) : Number.MAX_VALUE;
	};
	// Fully evaluated ones first, in the order of findWorstArrangement; then by their bound.
	const known = index.filter((i) => ones.has(i) && zeros.has(i));
	const estimates = new Map(known.map((i) => [i, estimate(i)]));
	const rest = index.filter((i) => !estimates.has(i));
	known.sort((a, b) => estimates.get(a)! - estimates.get(b)!);
	rest.sort((a, b) => byBound(worst.keys, a, b));
	// Where the fixed loads alone fail an arrangement, its search returns 0 (the least there is),
	// whatever the temporary load does after: no other arrangement needs a search.
	const failsUnderFixed = existing.top >= 1;
	let multiplier: number | null = failsUnderFixed ? 0 : null;
	for (const i of failsUnderFixed ? [] : [...known, ...rest]) {
		const arrangement = arrangements[i];
		if (multiplier !== null) {
			const above = multiplier * SKIP_ABOVE;
			if (bound(arrangement, above) < 1) continue;
			if (evaluate(arrangement, above).utilisation < 1) continue;
		}
		const e = estimate(i);
		const m = findMultiplierAtCapacity({
			utilisation: (t) => evaluate(arrangement, t).utilisation,
			tolerance: TOLERANCE,
			start: e > 0 && e < 1e6 ? e * (1 + 1e-9) : 1
		});
		if (m !== null && (multiplier === null || m < multiplier)) multiplier = m;
	}
	return {
		arrangement: arrangements[worst.best],
		utilisation: worst.top,
		utilisationExisting: existing.top,
		multiplier,
		detail: one(worst.best).detail
	};
}

/** Falling bound, then list order (bounds may be Infinity). */
function byBound(bounds: number[], a: number, b: number): number {
	return bounds[a] > bounds[b] ? -1 : bounds[a] < bounds[b] ? 1 : a - b;
}

/** Max-queue of arrangement indices by bound (ties: list order). */
class BoundQueue {
	private heap: number[] = [];
	private keys: number[];
	constructor(bounds: number[]) {
		this.keys = [...bounds];
		bounds.forEach((_, i) => this.push(i, bounds[i]));
	}
	keyOf(i: number): number {
		return this.keys[i];
	}
	peekKey(): number {
		return this.heap.length > 0 ? this.keys[this.heap[0]] : -Infinity;
	}
	push(i: number, key: number): void {
		this.keys[i] = key;
		const h = this.heap;
		h.push(i);
		for (let c = h.length - 1; c > 0;) {
			const p = (c - 1) >> 1;
			if (!this.above(h[c], h[p])) break;
			[h[c], h[p]] = [h[p], h[c]];
			c = p;
		}
	}
	/** The top index, or −1 when empty. */
	pop(): number {
		const h = this.heap;
		if (h.length === 0) return -1;
		const top = h[0];
		const last = h.pop()!;
		if (h.length > 0) {
			h[0] = last;
			for (let p = 0; ;) {
				const l = 2 * p + 1;
				const r = l + 1;
				let m = p;
				if (l < h.length && this.above(h[l], h[m])) m = l;
				if (r < h.length && this.above(h[r], h[m])) m = r;
				if (m === p) break;
				[h[m], h[p]] = [h[p], h[m]];
				p = m;
			}
		}
		return top;
	}
	private above(a: number, b: number): boolean {
		return byBound(this.keys, a, b) < 0;
	}
}
