import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatUtilisation } from '../../../src/lib/ui/format';

describe('formatUtilisation', () => {
	it('shows whole percentages', () => {
		expect(formatUtilisation(0.873)).toBe('87%');
		expect(formatUtilisation(1)).toBe('100%');
		expect(formatUtilisation(0)).toBe('0%');
		expect(formatUtilisation(1.26)).toBe('126%');
	});

	it('keeps a ratio just above 1 from reading as 100 %', () => {
		expect(formatUtilisation(1.004)).toBe('100.4%');
		expect(formatUtilisation(1 + 1e-12)).toBe('100.1%');
		expect(formatUtilisation(1.003)).toBe('100.3%');
	});

	it('shows a dash for a missing ratio', () => {
		expect(formatUtilisation(Number.NaN)).toBe('—');
	});

	it('never shows 100 % or less for a ratio above 1 (property)', () => {
		fc.assert(
			fc.property(fc.double({ min: 1, max: 10, noNaN: true, minExcluded: true }), (u) => {
				expect(Number.parseFloat(formatUtilisation(u))).toBeGreaterThan(100);
			})
		);
	});
});
