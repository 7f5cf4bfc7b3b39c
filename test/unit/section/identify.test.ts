/**
 * Identifying a section from site measurements (tape for h and b, callipers for tf and tw).
 * Dimensions of the expected sections: BS 4-1:2005 (from memory), as stored in the library.
 */
import { describe, expect, it } from 'vitest';
import { identifySection, listSections } from '../../../src/lib/engine/section/index';
import type { IDims } from '../../../src/lib/engine/section/index';

describe('identifySection', () => {
	it('ranks 305x165x40 UB first for h 304, b 165, tf 10 and reports the offsets', () => {
		const [best] = identifySection({ h: 304, b: 165, tf: 10 }, { limit: 3 });
		expect(best.section.designation).toBe('UB 305x165x40');
		expect(best.offsets.h).toBeCloseTo(304 - 303.4, 9);
		expect(best.offsets.tf).toBeCloseTo(10 - 10.2, 9);
		expect(best.offsets.tw).toBeUndefined();
		expect(best.withinTolerance).toBe(true);
	});

	it('finds every I section from its own exact dimensions with score 0', () => {
		for (const s of listSections().filter((x) => x.shape === 'I')) {
			const { h, b, tf, tw } = s.dims as IDims;
			const [best] = identifySection({ h, b, tf, tw, family: s.family }, { limit: 1 });
			expect(best.score).toBe(0);
			expect(best.section.dims).toEqual(s.dims);
		}
	});

	it('restricts to a family and respects the limit; candidates come sorted by score', () => {
		const got = identifySection({ h: 300, b: 150, family: 'IPE' }, { limit: 4 });
		expect(got).toHaveLength(4);
		expect(got[0].section.designation).toBe('IPE 300');
		for (const c of got) expect(c.section.family).toBe('IPE');
		for (let i = 1; i < got.length; i++)
			expect(got[i].score).toBeGreaterThanOrEqual(got[i - 1].score);
	});

	it('returns nothing when nothing was measured', () => {
		expect(identifySection({})).toEqual([]);
	});

	it('finds a US HSS from a tape and a wall gauge, either way up (AISC Shapes Database v15.0)', () => {
		// HSS8x6x1/2: 8 in x 6 in outside, nominal wall 1/2 in (AISC Manual label); measured on
		// site as 152 x 203 mm with a 12.5 mm wall reading.
		const [best] = identifySection({ h: 152, b: 203, t: 12.5 }, { limit: 3 });
		expect(best.section.designation).toBe('HSS8x6x1/2');
		expect(best.withinTolerance).toBe(true);
		expect(best.offsets.h).toBeCloseTo(203 - 8 * 25.4, 9);
		expect(best.offsets.b).toBeCloseTo(152 - 6 * 25.4, 9);
		// The gauge reads the nominal wall, not the 0.93 × nominal design wall (AISC 360-22 B4.2).
		expect(best.offsets.t).toBeCloseTo(12.5 - 0.5 * 25.4, 9);
	});

	it('finds a CHS from its diameter and wall, naming the near US twin too', () => {
		// EN 10210-2 size 168.3 x 6.3; HSS6.625x0.250 (6.625 in x 1/4 in, AISC Shapes Database
		// v15.0) is 168.275 x 6.35 mm, within any site tolerance: both must be offered.
		const got = identifySection({ d: 168, t: 6.3 }, { limit: 3 });
		expect(got[0].section.designation).toBe('CHS 168.3x6.3');
		expect(got[0].section.shape).toBe('CHS');
		expect(got[0].offsets.d).toBeCloseTo(168 - 168.3, 9);
		const twin = got.find((c) => c.section.designation === 'HSS6.625x0.250');
		expect(twin?.withinTolerance).toBe(true);
		expect(twin!.offsets.t).toBeCloseTo(6.3 - 0.25 * 25.4, 9);
	});

	it('keeps hot-finished and cold-formed tubes apart by family', () => {
		const [hot] = identifySection({ h: 200, b: 100, t: 10, family: 'RHS' }, { limit: 1 });
		const [cold] = identifySection({ h: 200, b: 100, t: 10, family: 'CFRHS' }, { limit: 1 });
		expect(hot.section.designation).toBe('RHS 200x100x10.0');
		expect(cold.section.designation).toBe('CF RHS 200x100x10.0');
		expect(hot.score).toBe(0);
		expect(cold.score).toBe(0);
	});

	it('finds every hollow section from its own exact dimensions with score 0', () => {
		for (const s of listSections().filter((x) => x.shape === 'RHS' || x.shape === 'CHS')) {
			const wall = s.nominalWall ?? (s.dims as { t: number }).t;
			const m =
				s.shape === 'CHS'
					? { d: (s.dims as { d: number }).d, t: wall }
					: { h: (s.dims as IDims).h, b: (s.dims as IDims).b, t: wall };
			const [best] = identifySection({ ...m, family: s.family }, { limit: 1 });
			expect(best.score).toBe(0);
		}
	});
});
