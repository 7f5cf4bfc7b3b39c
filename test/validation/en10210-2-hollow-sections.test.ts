/**
 * EN 10210-2:2006 hot-finished structural hollow sections: basis for calculation ro = 1.5t,
 * ri = 1.0t and the standard's It formula for RHS; tabulated values from EN 10210-2 / SCI P363
 * (from memory). CHS closed forms (textbook thick-tube formulas) are computed inside the test.
 * Tolerances: 0.6 % on 3-s.f. tabulated values; 1e-12 on closed forms.
 */
import { describe, expect, it } from 'vitest';
import { findSection, listSections } from '../../src/lib/engine/section/index';
import type { ChsDims, RhsDims } from '../../src/lib/engine/section/types';
import { expectRelSoft as expectRel } from '../support/expect-rel';

const hollow = listSections().filter((s) => ['SHS', 'RHS', 'CHS'].includes(s.family));

describe('hollow-section rows (EN 10210-2)', () => {
	it('holds the common range: ≥ 60 RHS, ≥ 50 SHS, ≥ 40 CHS, naming EN 10210-2 and S355', () => {
		const count = (family: string) => hollow.filter((s) => s.family === family).length;
		expect(count('RHS')).toBeGreaterThanOrEqual(60);
		expect(count('SHS')).toBeGreaterThanOrEqual(50);
		expect(count('CHS')).toBeGreaterThanOrEqual(40);
		for (const s of hollow) expect(s.standard).toMatch(/EN 10210-2/);
		// S355J2H is the usual grade of hot-finished hollow sections (common practice).
		for (const s of hollow) expect(s.defaultGrade).toBe('S355');
	});

	it("mass of every row is the standard's: area of the nominal outline × 7850 kg/m³", () => {
		// EN 10210-2 prints masses computed from these nominal dimensions with ρ = 7.85 kg/dm³,
		// so the check is the library's exact outline against the standard's closed forms.
		for (const s of hollow) {
			let A: number;
			if (s.shape === 'CHS') {
				const { d, t } = s.dims as ChsDims;
				A = Math.PI * (d - t) * t;
			} else {
				// Basis for calculation: ro = 1.5t, ri = t.
				const { h, b, t } = s.dims as RhsDims;
				A = 2 * t * (b + h - 2 * t) - (4 - Math.PI) * ((1.5 * t) ** 2 - t ** 2);
			}
			expectRel(s.props.mass, A * 7.85e-3, 1e-9);
		}
	});

	it('uses the EN 10210-2 corner radii ro = 1.5t, ri = t on every SHS and RHS', () => {
		for (const s of hollow.filter((x) => x.shape === 'RHS')) {
			const { t, ro, ri } = s.dims as RhsDims;
			expect(ro).toBeCloseTo(1.5 * t, 12);
			expect(ri).toBeCloseTo(t, 12);
		}
	});

	it('area of every SHS/RHS equals 2t(b + h − 2t) − (4 − π)(ro² − ri²) (EN 10210-2 basis)', () => {
		for (const s of hollow.filter((x) => x.shape === 'RHS')) {
			const { h, b, t, ro, ri } = s.dims as RhsDims;
			expectRel(s.props.A, 2 * t * (b + h - 2 * t) - (4 - Math.PI) * (ro * ro - ri * ri), 1e-12);
		}
	});
});

// EN 10210-2 / SCI P363 tabulated (from memory): kg/m, A cm², Iy, Iz cm⁴, Wel,y, Wel,z, Wpl,y, Wpl,z cm³, It cm⁴.
const TABULATED = [
	['SHS 100x100x5.0', 14.7, 18.7, 279, 279, 55.9, 55.9, 66.4, 66.4, 439],
	['RHS 200x100x6.3', 28.1, 35.8, 1830, 613, 183, 123, 228, 140, 1480],
	['CHS 114.3x5.0', 13.5, 17.2, 257, 257, 45.0, 45.0, 59.8, 59.8, 514],
	['CHS 168.3x6.3', 25.2, 32.1, 1050, 1050, 125, 125, 165, 165, 2110]
] as const;

describe('hollow-section properties against EN 10210-2 tables (from memory)', () => {
	it.each(TABULATED)('%s', (designation, mass, A, Iy, Iz, Wely, Welz, Wply, Wplz, It) => {
		const p = findSection(designation)!.props;
		expectRel(p.mass, mass, 0.006);
		expectRel(p.A / 1e2, A, 0.006);
		expectRel(p.Iy / 1e4, Iy, 0.006);
		expectRel(p.Iz / 1e4, Iz, 0.006);
		expectRel(p.Wely / 1e3, Wely, 0.006);
		expectRel(p.Welz / 1e3, Welz, 0.006);
		expectRel(p.Wply / 1e3, Wply, 0.006);
		expectRel(p.Wplz / 1e3, Wplz, 0.006);
		expectRel(p.It / 1e4, It, 0.006);
	});

	it('CHS 168.3x6.3 equals the thick-tube closed forms (textbook)', () => {
		const [D, t] = [168.3, 6.3];
		const p = findSection('CHS 168.3x6.3')!.props;
		const I = (Math.PI * (D ** 4 - (D - 2 * t) ** 4)) / 64;
		expectRel(p.A, Math.PI * (D - t) * t, 1e-12);
		expectRel(p.Iy, I, 1e-12);
		expectRel(p.Wely, (2 * I) / D, 1e-12);
		expectRel(p.Wply, (D ** 3 - (D - 2 * t) ** 3) / 6, 1e-12);
		expectRel(p.It, 2 * I, 1e-12);
		expectRel(p.Avz, (2 * p.A) / Math.PI, 1e-12); // EN 1993-1-1 6.2.6(3)(g)
	});
});
