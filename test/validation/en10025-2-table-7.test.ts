/**
 * Steel strengths by nominal thickness: EN 10025-2:2004 Table 7 (ReH) and the Rm ranges of the
 * same standard (confirmed against a reproduction of BS EN 10025-2:2004); ASTM A36 (36/58 ksi,
 * AISC Manual Table 2-4 summary), A992 (50/65 ksi, AISC Steelwise 2009), A572 Gr 50 (50/65 ksi,
 * from memory); unknown older steel 210/380 N/mm² (CISC guidance on historical steels);
 * ductility rule fu/fy ≥ 1.10 of EN 1993-1-1 3.2.2 (from memory).
 */
import { describe, expect, it } from 'vitest';
import { resolveGrade } from '../../src/lib/engine/material/index';
import { US } from '../../src/lib/engine/units';

function fyOf(grade: string, t: number): number {
	const r = resolveGrade(grade, t);
	if (!r.ok) throw new Error(JSON.stringify(r.issues));
	return r.value.fy;
}

describe('EN 10025-2:2004 Table 7, ReH by nominal thickness', () => {
	const TABLE = {
		S235: [235, 225, 215, 215, 215, 195, 185, 175],
		S275: [275, 265, 255, 245, 235, 225, 215, 205],
		S355: [355, 345, 335, 325, 315, 295, 285, 275]
	};
	const BAND_TOPS = [16, 40, 63, 80, 100, 150, 200, 250];

	it.each(Object.entries(TABLE))(
		'%s steps at 16, 40, 63, 80, 100, 150, 200 mm',
		(grade, values) => {
			BAND_TOPS.forEach((top, i) => {
				expect(fyOf(grade, top)).toBe(values[i]); // t at the top of the band (t ≤ top)
				expect(fyOf(grade, top - 0.5)).toBe(values[i]);
			});
		}
	);

	it('fu is the lower end of Rm for 3 ≤ t ≤ 100: 360, 410, 470 N/mm²', () => {
		const fu = (g: string) => (resolveGrade(g, 10) as { ok: true; value: { fu: number } }).value.fu;
		expect([fu('S235'), fu('S275'), fu('S355')]).toEqual([360, 410, 470]);
	});

	it('accepts the grade as people write it (S355JR, s 275 j2)', () => {
		expect(fyOf('S355JR', 10)).toBe(355);
		expect(fyOf('s 275 j2', 20)).toBe(265);
	});

	it('refuses a thickness beyond the table', () => {
		const r = resolveGrade('S275', 260);
		expect(r.ok).toBe(false);
		if (!r.ok) expect(r.issues[0].code).toBe('thickness-beyond-grade');
	});
});

describe('S460 (EN 10025-4, from memory)', () => {
	it('steps 460 / 440 / 430 / 410 / 400 and carries a note that it is not in EN 10025-2:2004', () => {
		expect([10, 20, 50, 70, 90].map((t) => fyOf('S460', t))).toEqual([460, 440, 430, 410, 400]);
		const r = resolveGrade('S460', 10);
		expect(r.ok && r.value.note).toMatch(/EN 10025-2/);
	});
});

describe('ASTM grades (converted with 1 ksi = 6.894757 N/mm²)', () => {
	it.each([
		['A36', 36, 58],
		['A992', 50, 65],
		['A572 Gr 50', 50, 65]
	])('%s: Fy %i ksi, Fu %i ksi', (grade, Fy, Fu) => {
		const r = resolveGrade(grade, 30);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.value.fy).toBeCloseTo(Fy * US.ksiToMPa, 0);
		expect(r.value.fu).toBeCloseTo(Fu * US.ksiToMPa, 0);
		expect(r.value.source).not.toBe('');
	});
});

describe('older steel and iron', () => {
	it('unknown older steel: 210 N/mm² lower bound that the user must confirm (CISC; app default)', () => {
		const r = resolveGrade('unknown-old', 12);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.value.fy).toBe(210);
		expect(r.value.needsConfirmation).toBe(true);
		expect(r.warnings.map((w) => w.code)).toContain('grade-needs-confirmation');
	});

	it.each(['cast-iron', 'wrought-iron', 'Cast iron'])(
		'%s is refused for plastic analysis with the reason',
		(id) => {
			const r = resolveGrade(id, 10);
			expect(r.ok).toBe(false);
			if (r.ok) return;
			expect(r.issues[0].code).toBe('material-not-ductile');
			expect(r.issues[0].message).toMatch(/plastic/);
		}
	);

	it('a user fy with fu/fy below 1.10 is flagged as not ductile (EN 1993-1-1 3.2.2)', () => {
		const r = resolveGrade({ fy: 400, fu: 420 }, 10);
		expect(r.ok && r.value.ductile).toBe(false);
		const fine = resolveGrade({ fy: 300, fu: 430 }, 10);
		expect(fine.ok && fine.value.ductile).toBe(true);
	});
});
