/**
 * Bending capacity along the beam (piecewise constant), and its local reduction where high
 * shear acts at a hinge (EN 1993-1-1 6.2.8, applied over a short length around the hinge).
 */
import type { CapacitySegment } from '../model/types';

/**
 * One segment per span with the same resistance to sagging and hogging.
 * @param resistance N·mm per span
 */
export function buildCapacity(spans: number[], resistance: number[]): CapacitySegment[] {
	let x = 0;
	return spans.map((L, i) => {
		const seg = { from: x, to: x + L, sagging: resistance[i], hogging: resistance[i] };
		x += L;
		return seg;
	});
}

/**
 * Lowers the capacity to at most `value` on [from, to], splitting segments as needed.
 * @example
 * const whole = [{ from: 0, to: 6000, sagging: 100, hogging: 100 }];
 * reduceCapacity(whole, { from: 2900, to: 3100, value: 90 }) // three segments, the middle at 90
 */
export function reduceCapacity(
	capacity: CapacitySegment[],
	cut: { from: number; to: number; value: number }
): CapacitySegment[] {
	const out: CapacitySegment[] = [];
	for (const s of capacity) {
		const a = Math.max(s.from, cut.from);
		const b = Math.min(s.to, cut.to);
		if (b <= a) {
			out.push(s);
			continue;
		}
		if (a > s.from) out.push({ ...s, to: a });
		out.push({
			from: a,
			to: b,
			sagging: Math.min(s.sagging, cut.value),
			hogging: Math.min(s.hogging, cut.value)
		});
		if (b < s.to) out.push({ ...s, from: b });
	}
	return out;
}

/** Allowance on the margin for the static program's tolerance on the field. */
const MARGIN_ALLOWANCE = 1e-9;

/**
 * True when a field that carries the fixed loads within (1 − δ) of the full capacity fits the
 * reduced one too: every reduced segment keeps at least (1 − δ) of the full resistance where it
 * lies. Such a field proves the fixed loads alone do not fail (static theorem).
 */
export function keepsFixedLoadField(
	full: CapacitySegment[],
	reduced: CapacitySegment[],
	margin: number
): boolean {
	if (!(margin > MARGIN_ALLOWANCE)) return false;
	const keep = 1 - margin + MARGIN_ALLOWANCE;
	return reduced.every((r) =>
		full.every(
			(f) =>
				f.to <= r.from ||
				f.from >= r.to ||
				(r.sagging >= keep * f.sagging && r.hogging >= keep * f.hogging)
		)
	);
}
