/**
 * The grade picker and user-entered strengths: every listed grade resolves (or is refused with a
 * reason), user values are validated, and results are plain finite data.
 */
import { describe, expect, it } from 'vitest';
import { listGrades, resolveGrade } from '../../../src/lib/engine/material/index';

describe('listGrades', () => {
	it('lists every grade once; each resolves at 10 mm or, for iron, is refused with a reason', () => {
		const grades = listGrades();
		expect(new Set(grades.map((g) => g.id)).size).toBe(grades.length);
		for (const g of grades) {
			const r = resolveGrade(g.id, 10);
			expect(r.ok).toBe(!g.refused);
			if (r.ok) {
				expect(Number.isFinite(r.value.fy) && r.value.fy > 0).toBe(true);
				expect(r.value.source.length).toBeGreaterThan(0);
			} else {
				expect(r.issues[0].message.length).toBeGreaterThan(40);
			}
		}
	});

	it('offers the current EN and ASTM grades, older steel and the refused irons', () => {
		const ids = listGrades().map((g) => g.id);
		for (const id of ['S235', 'S275', 'S355', 'S460', 'A36', 'A992', 'A572-50', 'unknown-old']) {
			expect(ids).toContain(id);
		}
		expect(ids.slice(-2)).toEqual(['cast-iron', 'wrought-iron']);
	});
});

describe('user-entered strengths', () => {
	it('accepts fy alone and notes that ductility could not be checked', () => {
		const r = resolveGrade({ fy: 240 }, 10);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.value).toMatchObject({ id: 'user', fy: 240, fu: null, needsConfirmation: false });
		expect(r.value.note).toMatch(/fu/);
	});

	it.each([
		[{ fy: 0 }, 'fy:fy-not-valid'],
		[{ fy: Number.NaN }, 'fy:fy-not-valid'],
		[{ fy: 300, fu: 250 }, 'fu:fu-not-valid']
	])('refuses %j', (spec, code) => {
		const r = resolveGrade(spec, 10);
		expect(r.ok ? [] : r.issues.map((i) => `${i.path}:${i.code}`)).toContain(code);
	});

	it('names the known grades when the id is unknown', () => {
		const r = resolveGrade('S999', 10);
		expect(r.ok).toBe(false);
		if (!r.ok) expect(r.issues[0].message).toMatch(/S275/);
	});

	it('results survive structured cloning unchanged (plain data)', () => {
		const r = resolveGrade('S355', 20);
		expect(structuredClone(r)).toEqual(r);
	});
});
