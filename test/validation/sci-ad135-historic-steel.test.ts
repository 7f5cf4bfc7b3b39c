/**
 * SCI Advisory Desk AD 135 "Assessing the capacity of existing steelwork", Table 1: approximate
 * yield strengths (N/mm²) of hot-rolled open sections by date and flange thickness (≤ 16, 16–19,
 * 20–40 mm). ASTM A7-39 onward: yield ≥ 33 ksi, tensile 60–72 ksi (quoted requirements).
 * Every such grade is a default the user must confirm.
 */
import { describe, expect, it } from 'vitest';
import { resolveGrade } from '../../src/lib/engine/material/index';
import { US } from '../../src/lib/engine/units';

const TABLE_1 = [
	['uk-1910-1947', 235, 235, 225],
	['uk-1948-1958', 235, 235, 225],
	['uk-1959-1968', 250, 245, 230],
	['uk-1969-1985', 255, 245, 245],
	['uk-1986-on', 275, 265, 265],
	['continental-ecsc', 235, 225, 225],
	['continental-other', 220, 210, 210],
	['us-to-1968', 230, 230, 230],
	['us-from-1969', 250, 250, 250]
] as const;

describe('AD 135 Table 1', () => {
	it.each(TABLE_1)('%s: %i / %i / %i N/mm² for tf 12, 18 and 30 mm', (id, a, b, c) => {
		const fy = [12, 18, 30].map((t) => {
			const r = resolveGrade(id, t);
			if (!r.ok) throw new Error(JSON.stringify(r.issues));
			expect(r.value.needsConfirmation).toBe(true);
			expect(r.value.source).toMatch(/AD 135/);
			return r.value.fy;
		});
		expect(fy).toEqual([a, b, c]);
	});

	it('does not extrapolate beyond the 40 mm flanges the table covers', () => {
		const r = resolveGrade('uk-1969-1985', 45);
		expect(r.ok).toBe(false);
	});
});

describe('ASTM A7', () => {
	it('33 ksi yield, 60 ksi tensile (lower end), flagged for confirmation', () => {
		const r = resolveGrade('A7', 15);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(Math.abs(r.value.fy / (33 * US.ksiToMPa) - 1)).toBeLessThan(1e-3);
		expect(Math.abs(r.value.fu! / (60 * US.ksiToMPa) - 1)).toBeLessThan(1e-3);
		expect(r.value.needsConfirmation).toBe(true);
	});
});
