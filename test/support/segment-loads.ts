/**
 * Random loads inside a buckling segment of length L (invented demo data for property tests):
 * point loads of −50…80 kN and linearly varying line loads of −5…20 N/mm.
 * @param reach share of L from each end a point load may come (0 lets it sit on an end)
 */
import fc from 'fast-check';
import type { LtbSegment, SegmentLoad } from '../../src/lib/engine/checks/segment-moment';

export function arbitrarySegmentLoad(L: number, reach = 0.01): fc.Arbitrary<SegmentLoad> {
	return fc.oneof(
		fc
			.tuple(
				fc.double({ min: reach, max: 1 - reach, noNaN: true }),
				fc.integer({ min: -50, max: 80 })
			)
			.map(([t, kN]): SegmentLoad => ({ kind: 'point', x: t * L, value: kN * 1e3 })),
		fc
			.tuple(
				fc.double({ min: 0, max: 0.5, noNaN: true }),
				fc.double({ min: 0.5, max: 1, noNaN: true }),
				fc.integer({ min: -5, max: 20 }),
				fc.integer({ min: -5, max: 20 })
			)
			.map(([a, b, s, e]): SegmentLoad => ({
				kind: 'line',
				from: a * L,
				to: b * L,
				start: s,
				end: e
			}))
	);
}

/**
 * Random load groups of one segment (the parts the buckling check weights): each with end
 * moments of −200…200 kN·m and a few loads inside; one length L for all.
 */
export function arbitrarySegmentParts(o: {
	minLength: number;
	maxParts: number;
	maxLoads: number;
	reach?: number;
}): fc.Arbitrary<LtbSegment[]> {
	return fc.integer({ min: o.minLength, max: 12000 }).chain((L) =>
		fc.array(
			fc
				.record({
					m0: fc.integer({ min: -200, max: 200 }),
					m1: fc.integer({ min: -200, max: 200 }),
					loads: fc.array(arbitrarySegmentLoad(L, o.reach), { maxLength: o.maxLoads })
				})
				.map((p): LtbSegment => ({
					length: L,
					momentStart: p.m0 * 1e6,
					momentEnd: p.m1 * 1e6,
					loads: p.loads
				})),
			{ minLength: 1, maxLength: o.maxParts }
		)
	);
}
