/**
 * Deflection limits on the AISC basis: span/360 (live) and span/240 (total) — common practice
 * (IBC Table 1604.3, from memory); AISC 360-22 sets none.
 */
import { describe, expect, it } from 'vitest';
import { computeDeflectionLimits } from '../../../../src/lib/engine/checks/aisc360/deflection';

describe('computeDeflectionLimits', () => {
	it('20 ft (6 096 mm): 16.93 mm live, 25.4 mm total', () => {
		const [live, total] = computeDeflectionLimits(6096);
		expect(live).toMatchObject({ load: 'live', ratio: 360 });
		expect(live.limit).toBeCloseTo(6096 / 360, 9);
		expect(total).toMatchObject({ load: 'total', ratio: 240 });
		expect(total.limit).toBeCloseTo(25.4, 9);
		expect(live.source).toMatch(/common practice/);
	});
});
