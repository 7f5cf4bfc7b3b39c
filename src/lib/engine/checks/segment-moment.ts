/**
 * Bending moment inside one laterally unrestrained segment: the straight line between its end
 * moments plus the free (simply supported) moment of the loads inside it. Exact by statics.
 */

/** A point load inside a segment; x from the segment's left end, mm; value N, downward +. */
export interface SegmentPointLoad {
	kind: 'point';
	x: number;
	value: number;
}
/** A linearly varying line load inside a segment, mm and N/mm, downward +. */
export interface SegmentLineLoad {
	kind: 'line';
	from: number;
	to: number;
	start: number;
	end: number;
}
export type SegmentLoad = SegmentPointLoad | SegmentLineLoad;

/** A segment between lateral restraints, in its own coordinate (0 at its left end). */
export interface LtbSegment {
	/** Length between restraints, mm. */
	length: number;
	/** Moment at the left and right ends, N·mm, sagging positive. */
	momentStart: number;
	momentEnd: number;
	/** Loads inside the segment (they also act at the load height for Mcr). */
	loads: SegmentLoad[];
}

const GAUSS3 = [
	[-Math.sqrt(0.6), 5 / 9],
	[0, 8 / 9],
	[Math.sqrt(0.6), 5 / 9]
] as const;

/** Intensity of a line load at s, N/mm. */
export function lineLoadAt(load: SegmentLineLoad, s: number): number {
	const span = load.to - load.from;
	return span > 0 ? load.start + ((load.end - load.start) * (s - load.from)) / span : load.start;
}

/**
 * Moment at x in a segment, N·mm (sagging positive).
 * @example
 * computeSegmentMoment({ length: 6000, momentStart: 0, momentEnd: 0, loads: [
 *   { kind: 'point', x: 3000, value: 10e3 }] }, 3000) // 15e6
 */
export function computeSegmentMoment(seg: LtbSegment, x: number): number {
	const L = seg.length;
	let m = seg.momentStart * (1 - x / L) + (seg.momentEnd * x) / L;
	for (const load of seg.loads) {
		if (load.kind === 'point') {
			m += x <= load.x ? (load.value * (L - load.x) * x) / L : (load.value * load.x * (L - x)) / L;
			continue;
		}
		// Free moment = R_A·x − ∫ q(s)(x − s) ds over the loaded part left of x; the integrands
		// are at most quadratic, so 3-point Gauss is exact.
		let rA = 0;
		let left = 0;
		const hi = Math.min(x, load.to);
		for (const [t, w] of GAUSS3) {
			const s = load.from + ((t + 1) * (load.to - load.from)) / 2;
			rA += (w * lineLoadAt(load, s) * (L - s) * (load.to - load.from)) / (2 * L);
			if (hi > load.from) {
				const u = load.from + ((t + 1) * (hi - load.from)) / 2;
				left += (w * lineLoadAt(load, u) * (x - u) * (hi - load.from)) / 2;
			}
		}
		m += rA * x - left;
	}
	return m;
}
