/**
 * EN 10219-2:2006 cold-formed welded structural hollow sections: sizes of the common range from
 * memory of the standard; calculation radii ro = 2t (t ≤ 6 mm), 2.5t (6 < t ≤ 10 mm), 3t
 * (t > 10 mm), ri = ro − t (from memory of the standard's basis for calculation). The standard
 * prints masses computed from the nominal outline (ρ = 7850 kg/m³): every row is checked against
 * A = 2t(b + h − 2t) − (4 − π)(ro² − ri²) or π(d − t)t computed here. Tabulated values of
 * CF SHS 100x100x5.0 from UK design-data tables for cold-formed sections (from memory), 0.6 %
 * (3-s.f. tables).
 */
import { describe, expect, it } from 'vitest';
import { findSection, listSections } from '../../src/lib/engine/section/index';
import type { ChsDims, RhsDims } from '../../src/lib/engine/section/types';
import { expectRelSoft as expectRel } from '../support/expect-rel';

const cold = listSections().filter((s) => ['CFSHS', 'CFRHS', 'CFCHS'].includes(s.family));

describe('cold-formed hollow rows (EN 10219-2)', () => {
	it('holds the common range: ≥ 60 RHS, ≥ 50 SHS, ≥ 40 CHS, naming EN 10219-2 and S355', () => {
		const count = (family: string) => cold.filter((s) => s.family === family).length;
		expect(count('CFRHS')).toBeGreaterThanOrEqual(60);
		expect(count('CFSHS')).toBeGreaterThanOrEqual(50);
		expect(count('CFCHS')).toBeGreaterThanOrEqual(40);
		for (const s of cold) {
			expect(s.standard).toMatch(/EN 10219-2/);
			expect(s.designation).toMatch(/^CF (SHS|RHS|CHS) /);
			expect(s.defaultGrade).toBe('S355');
		}
	});

	it('uses the cold-formed calculation radii on every SHS and RHS', () => {
		for (const s of cold.filter((x) => x.shape === 'RHS')) {
			const { t, ro, ri } = s.dims as RhsDims;
			const factor = t <= 6 ? 2 : t <= 10 ? 2.5 : 3;
			expect(ro).toBeCloseTo(factor * t, 12);
			expect(ri).toBeCloseTo(ro - t, 12);
		}
	});

	it('mass of every row is the area of the nominal outline × 7850 kg/m³', () => {
		for (const s of cold) {
			let A: number;
			if (s.shape === 'CHS') {
				const { d, t } = s.dims as ChsDims;
				A = Math.PI * (d - t) * t;
			} else {
				const { h, b, t, ro, ri } = s.dims as RhsDims;
				A = 2 * t * (b + h - 2 * t) - (4 - Math.PI) * (ro * ro - ri * ri);
			}
			expectRel(s.props.mass, A * 7.85e-3, 1e-9);
		}
	});

	it('is never taken for the hot-finished section of the same size', () => {
		expect(findSection('CF SHS 100x100x5')!.designation).toBe('CF SHS 100x100x5.0');
		expect(findSection('SHS 100x100x5')!.designation).toBe('SHS 100x100x5.0');
		expect(findSection('100x100x5')!.family).toBe('SHS');
		expect(findSection('RHS 200x100x10 CF')!.family).toBe('CFRHS');
		const hot = findSection('SHS 100x100x5')!.props;
		const cf = findSection('CF SHS 100x100x5')!.props;
		// Larger corner radii: less area and stiffness than the hot-finished twin.
		expect(cf.A).toBeLessThan(hot.A);
		expect(cf.Iy).toBeLessThan(hot.Iy);
	});

	it('CF SHS 100x100x5.0 against tabulated values (from memory)', () => {
		const p = findSection('CF SHS 100x100x5.0')!.props;
		expectRel(p.mass, 14.4, 0.006);
		expectRel(p.A / 1e2, 18.4, 0.006);
		expectRel(p.Iy / 1e4, 271, 0.006);
		expectRel(p.Wely / 1e3, 54.2, 0.006);
		expectRel(p.Wply / 1e3, 64.6, 0.006);
		expectRel(p.It / 1e4, 441, 0.006);
	});
});
