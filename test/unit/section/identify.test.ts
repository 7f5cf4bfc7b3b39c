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
});
