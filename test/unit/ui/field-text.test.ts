/**
 * Field texts: comma or dot decimals in display units, SI out. US factors are the exact
 * definitions ft = 0.3048 m, kip = 4.4482216152605 kN (NIST SP 811, Appendix B).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	formatFieldValue,
	parseFieldText,
	parsePositionList
} from '../../../src/lib/ui/state/field-text';

const LENGTH = { kind: 'length', rule: 'positive' } as const;

describe('parseFieldText', () => {
	it('reads a decimal comma and a decimal point alike', () => {
		expect(parseFieldText('4,8', LENGTH, 'SI')).toEqual({ ok: true, value: 4.8 });
		expect(parseFieldText('4.8', LENGTH, 'SI')).toEqual({ ok: true, value: 4.8 });
	});

	it('converts feet to metres by the exact definition', () => {
		const parsed = parseFieldText('16', LENGTH, 'US');
		expect(parsed.ok && parsed.value).toBeCloseTo(16 * 0.3048, 12);
	});

	it('names the broken rule of the field', () => {
		expect(parseFieldText('0', LENGTH, 'SI')).toEqual({
			ok: false,
			message: 'Must be more than zero.'
		});
		expect(parseFieldText('-1', { kind: 'length', rule: 'non-negative' }, 'SI')).toEqual({
			ok: false,
			message: 'Must not be negative.'
		});
		expect(parseFieldText('4.8m', LENGTH, 'SI').ok).toBe(false);
	});
});

describe('formatFieldValue', () => {
	it('shows an SI value in the display unit with at most four decimals', () => {
		expect(formatFieldValue(4.8, LENGTH, 'US')).toBe(
			String(Math.round((4.8 / 0.3048) * 1e4) / 1e4)
		);
		expect(formatFieldValue(12.625, { kind: 'force', rule: 'any' }, 'SI')).toBe('12.625');
		expect(formatFieldValue(undefined, LENGTH, 'SI')).toBe('');
	});

	it('reads back what it shows to within its rounding (property)', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 0.01, max: 1000, noNaN: true }),
				fc.constantFrom('SI', 'US' as const),
				(v, units) => {
					const parsed = parseFieldText(formatFieldValue(v, LENGTH, units), LENGTH, units);
					// Half a unit in the fourth decimal of the display unit (ft ≥ m/3.3), in metres.
					return (
						parsed.ok &&
						Math.abs(parsed.value - v) <= 0.5e-4 * (units === 'US' ? 0.3048 : 1) + 1e-12
					);
				}
			)
		);
		expect(true).toBe(true);
	});
});

describe('parsePositionList', () => {
	it('splits on spaces and semicolons, never on a decimal comma', () => {
		expect(parsePositionList('1,5; 3  4.25', 'SI')).toEqual({ ok: true, values: [1.5, 3, 4.25] });
		expect(parsePositionList('', 'SI').ok).toBe(false);
	});
});
