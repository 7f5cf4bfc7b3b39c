/**
 * Brent's minimiser (R.P. Brent, "Algorithms for Minimization without Derivatives", 1973 — from
 * memory) on a smooth and on a kinked function with known minima.
 */
import { describe, expect, it } from 'vitest';
import { minimiseOnInterval } from '../../../src/lib/engine/collapse/minimise';

describe('minimiseOnInterval', () => {
	it('finds the vertex of a parabola and the corner of |x − c|', () => {
		const smooth = minimiseOnInterval((x) => (x - Math.SQRT2) ** 2 + 1, 0, 5, 1e-12);
		expect(Math.abs(smooth.x - Math.SQRT2)).toBeLessThan(1e-7);
		expect(smooth.f).toBeCloseTo(1, 12);
		const kink = minimiseOnInterval((x) => Math.abs(x - 1.3), 0, 2, 1e-12);
		expect(Math.abs(kink.x - 1.3)).toBeLessThan(1e-9);
	});
});
