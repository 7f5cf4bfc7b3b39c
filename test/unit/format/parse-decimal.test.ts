import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fromDisplay, parseDecimal } from '../../../src/lib/ui/format';

describe('parseDecimal', () => {
	it('accepts a decimal comma and a decimal point alike', () => {
		expect(parseDecimal('2,5')).toEqual({ ok: true, value: 2.5 });
		expect(parseDecimal('2.5')).toEqual({ ok: true, value: 2.5 });
		expect(parseDecimal(' -0,75 ')).toEqual({ ok: true, value: -0.75 });
		expect(parseDecimal('.5')).toEqual({ ok: true, value: 0.5 });
		expect(parseDecimal('1e3')).toEqual({ ok: true, value: 1000 });
	});

	it('rejects junk, empty text and thousands separators with a message', () => {
		const junk = ['', '  ', 'abc', '2.5.1', '1,000.5', '2,5,0', '12kN', '--1', 'NaN'];
		junk.push('Infinity', '0x10');
		for (const text of junk) {
			const parsed = parseDecimal(text);
			expect(parsed.ok, text).toBe(false);
			if (!parsed.ok) expect(parsed.message.length).toBeGreaterThan(0);
		}
	});

	it('rejects a number too large to be finite', () => {
		expect(parseDecimal('1e400').ok).toBe(false);
		expect(fromDisplay('1e308', 'force', 'US').ok).toBe(false);
	});

	it('reads the same value with a comma as with a point (property)', () => {
		fc.assert(
			fc.property(fc.integer({ min: -1e6, max: 1e6 }), fc.integer({ min: 0, max: 999 }), (a, b) => {
				const dot = parseDecimal(`${a}.${b}`);
				const comma = parseDecimal(`${a},${b}`);
				expect(comma).toEqual(dot);
			})
		);
	});

	it('never returns a non-finite value (property)', () => {
		fc.assert(
			fc.property(fc.string(), (text) => {
				const parsed = parseDecimal(text);
				if (parsed.ok) expect(Number.isFinite(parsed.value)).toBe(true);
				else expect(parsed.message).not.toBe('');
			})
		);
	});
});
