// The size a photo is kept at: longest side at most 1600 px, shape kept, never enlarged.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fitWithin, PHOTO_LONG_SIDE } from '../../../src/lib/photos/target-size';

describe('fitWithin', () => {
	it('shrinks a 4:3 phone photo to 1600 × 1200, upright or on its side', () => {
		expect(fitWithin({ width: 4032, height: 3024 })).toEqual({ width: 1600, height: 1200 });
		expect(fitWithin({ width: 3024, height: 4032 })).toEqual({ width: 1200, height: 1600 });
		expect(PHOTO_LONG_SIDE).toBe(1600);
	});

	it('rounds the short side to the nearest pixel', () => {
		// 1600 × 1000 / 3000 = 533.33… → 533; 1600 × 2000 / 3000 = 1066.67… → 1067.
		expect(fitWithin({ width: 3000, height: 1000 })).toEqual({ width: 1600, height: 533 });
		expect(fitWithin({ width: 3000, height: 2000 })).toEqual({ width: 1600, height: 1067 });
	});

	it('leaves a small picture as it is, and keeps a sliver at least one pixel wide', () => {
		expect(fitWithin({ width: 800, height: 600 })).toEqual({ width: 800, height: 600 });
		expect(fitWithin({ width: 1600, height: 1600 })).toEqual({ width: 1600, height: 1600 });
		expect(fitWithin({ width: 20_000, height: 3 })).toEqual({ width: 1600, height: 1 });
		expect(fitWithin({ width: 640, height: 480 }, 100)).toEqual({ width: 100, height: 75 });
	});

	it('refuses sizes that are not a picture', () => {
		for (const size of [
			{ width: 0, height: 10 },
			{ width: -5, height: 10 },
			{ width: Number.NaN, height: 10 },
			{ width: 10, height: Number.POSITIVE_INFINITY }
		]) {
			expect(fitWithin(size)).toBeNull();
		}
		expect(fitWithin({ width: 10, height: 10 }, 0)).toBeNull();
	});

	it('never exceeds the long side, never enlarges, and keeps the shape to within a pixel', () => {
		const side = fc.integer({ min: 1, max: 20_000 });
		fc.assert(
			fc.property(side, side, fc.integer({ min: 1, max: 4000 }), (width, height, longSide) => {
				const fit = fitWithin({ width, height }, longSide)!;
				expect(Math.max(fit.width, fit.height)).toBeLessThanOrEqual(longSide);
				expect(fit.width).toBeLessThanOrEqual(width);
				expect(fit.height).toBeLessThanOrEqual(height);
				expect(Math.min(fit.width, fit.height)).toBeGreaterThanOrEqual(1);
				// Rounding moves a side at most half a pixel from the exact scaled size; a sliver
				// under half a pixel is raised to one pixel instead.
				const scale = Math.min(1, longSide / Math.max(width, height));
				for (const [kept, exact] of [
					[fit.width, width * scale],
					[fit.height, height * scale]
				]) {
					expect(Math.abs(kept - Math.max(exact, 0.5))).toBeLessThanOrEqual(0.5 + 1e-9);
				}
			})
		);
	});
});
