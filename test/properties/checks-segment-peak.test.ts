/**
 * The buckling check's largest |M| in a segment comes from exact cubic pieces of each load
 * group's moment. By statics (a segment's moment is the straight line between its end moments
 * plus the simply supported moment of its own loads), it must equal the largest |M| found by
 * reading the moment densely along the segment: never below any reading, and above the densest
 * reading by no more than the shear times half the reading spacing.
 * Exact cases: a uniform load q on a simply supported length L peaks at qL²/8 and a central point
 * load P at PL/4 (standard beam formulas; any structural handbook, e.g. the beam tables of the
 * Steel Designers' Manual, from memory).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { prepareSegmentPeak } from '../../src/lib/engine/checks/segment-peak';
import { computeSegmentMoment, type LtbSegment } from '../../src/lib/engine/checks/segment-moment';
import { arbitrarySegmentParts } from '../support/segment-loads';

const segmentCase = fc.record({
	parts: arbitrarySegmentParts({ minLength: 500, maxParts: 5, maxLoads: 4, reach: 0 }),
	weights: fc.array(fc.constantFrom(0, 0.9, 1, 1.35, 1.5, -0.7, 3.3), {
		minLength: 5,
		maxLength: 5
	})
});

/** Largest shear any weighting can give: end-moment slope plus every load, N. */
function shearBound(parts: LtbSegment[], weights: number[]): number {
	return parts.reduce((sum, p, i) => {
		const loads = p.loads.reduce(
			(s, l) =>
				s +
				(l.kind === 'point'
					? Math.abs(l.value)
					: ((Math.abs(l.start) + Math.abs(l.end)) / 2) * (l.to - l.from)),
			0
		);
		return sum + Math.abs(weights[i]) * (Math.abs(p.momentEnd - p.momentStart) / p.length + loads);
	}, 0);
}

describe('largest |M| of a segment from exact cubic pieces', () => {
	it('matches dense readings of the moment on random segments and weights', () => {
		fc.assert(
			fc.property(segmentCase, (c) => {
				const parts = c.parts;
				const L = parts[0].length;
				const weights = parts.map((_, i) => c.weights[i]);
				const peak = prepareSegmentPeak(parts)(weights);
				const steps = 20000;
				let dense = 0;
				const xs = Array.from({ length: steps + 1 }, (_, k) => (L * k) / steps);
				for (const p of parts) for (const l of p.loads) xs.push(l.kind === 'point' ? l.x : l.from);
				for (const x of xs) {
					let m = 0;
					parts.forEach((p, i) => (m += weights[i] * computeSegmentMoment(p, x)));
					dense = Math.max(dense, Math.abs(m));
				}
				const scale = 1 + dense;
				expect(peak).toBeGreaterThanOrEqual(dense - 1e-9 * scale);
				const gap = (shearBound(parts, weights) * L) / steps / 2;
				expect(peak).toBeLessThanOrEqual(dense + gap + 1e-9 * scale);
			}),
			{ numRuns: 300 }
		);
	});

	it('gives qL²/8 for a uniform load and PL/4 for a central point load', () => {
		const L = 7300;
		const udl: LtbSegment = {
			length: L,
			momentStart: 0,
			momentEnd: 0,
			loads: [{ kind: 'line', from: 0, to: L, start: 4.2, end: 4.2 }]
		};
		const central: LtbSegment = {
			length: L,
			momentStart: 0,
			momentEnd: 0,
			loads: [{ kind: 'point', x: L / 2, value: 18e3 }]
		};
		const peak = prepareSegmentPeak([udl, central]);
		expect(peak([1, 0]) / ((4.2 * L * L) / 8)).toBeCloseTo(1, 12);
		expect(peak([0, 1]) / ((18e3 * L) / 4)).toBeCloseTo(1, 12);
		// A weighted sum peaks at midspan too: 1.35 × qL²/8 + 1.5 × PL/4.
		const both = 1.35 * ((4.2 * L * L) / 8) + 1.5 * ((18e3 * L) / 4);
		expect(peak([1.35, 1.5]) / both).toBeCloseTo(1, 12);
	});
});
