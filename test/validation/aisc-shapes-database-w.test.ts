/**
 * US W shapes, ASTM A6/A6M dimensions, against the AISC Shapes Database v15.0 (all 283 rows
 * W4 to W44 transcribed from that database's public CSV export; the property values below are
 * that database's A, Ix, Sx, Zx, Iy and J). US tables give no root radius: r = kdes − tf.
 * Every row: computed weight within 3 % of the nominal lb/ft of its designation (the database
 * rounds d and bf to 3 s.f.; largest deviation 1.5 %). Tolerances (engineering reference D.5,
 * AISC with r = kdes − tf): A, Ix, Sx, Zx 1 %; J 1 % (SCI torsion-constant formula); Iy 1.5 %.
 */
import { describe, expect, it } from 'vitest';
import { listSections } from '../../src/lib/engine/section/index';
import { W_ROWS } from '../../src/lib/engine/section/tables/w-shapes';
import { US } from '../../src/lib/engine/units';
import { expectRelSoft as expectRel } from '../support/expect-rel';

const ws = listSections().filter((s) => s.family === 'W');
const IN = US.inToMm;

describe('W rows (ASTM A6)', () => {
	it('holds the full range W4 to W44 (283 shapes), naming the standard and grade A992', () => {
		expect(ws.length).toBe(W_ROWS.length);
		expect(ws.length).toBe(283);
		expect(ws[0].designation).toBe('W4x13');
		expect(ws.at(-1)!.designation).toBe('W44x335');
		for (const depth of [4, 5, 6, 8, 10, 12, 14, 16, 18, 21, 24, 27, 30, 33, 36, 40, 44]) {
			expect(ws.some((s) => s.designation.startsWith(`W${depth}x`))).toBe(true);
		}
		for (const s of ws) expect(s.standard).toMatch(/ASTM A6/);
		// ASTM A992 is the W-shape grade of the AISC Manual.
		for (const s of ws) expect(s.defaultGrade).toBe('A992');
	});

	it.each(ws.map((s) => [s.designation, s] as const))(
		'%s: weight from the dimensions within 3 % of the nominal lb/ft',
		(designation, s) => {
			const lbPerFt = s.props.mass / US.lbPerFtToKgPerM;
			expectRel(lbPerFt, Number(designation.split('x')[1]), 0.03);
		}
	);
});

// AISC Shapes Database v15.0: A in², Ix in⁴, Sx in³, Zx in³, Iy in⁴, J in⁴.
const DATABASE = [
	['W8x31', 9.13, 110, 27.5, 30.4, 37.1, 0.536],
	['W10x33', 9.71, 171, 35.0, 38.8, 36.6, 0.583],
	['W12x26', 7.65, 204, 33.4, 37.2, 17.3, 0.3],
	['W14x22', 6.49, 199, 29.0, 33.2, 7.0, 0.208],
	['W16x40', 11.8, 518, 64.7, 73.0, 28.9, 0.794],
	['W18x35', 10.3, 510, 57.6, 66.5, 15.3, 0.506],
	['W21x44', 13.0, 843, 81.6, 95.4, 20.7, 0.77],
	['W18x50', 14.7, 800, 88.9, 101, 40.1, 1.24],
	['W24x62', 18.2, 1550, 131, 153, 34.5, 1.71],
	['W6x8.5', 2.52, 14.9, 5.1, 5.73, 1.99, 0.0333],
	['W14x90', 26.5, 999, 143, 157, 362, 4.06],
	['W36x150', 44.3, 9040, 504, 581, 270, 10.1],
	['W40x655', 193, 56500, 2590, 3080, 2870, 589],
	['W44x335', 98.5, 31100, 1410, 1620, 1200, 74.7]
] as const;

describe('W properties against the AISC Shapes Database v15.0', () => {
	it.each(DATABASE)('%s', (designation, A, Ix, Sx, Zx, Iy, J) => {
		const p = ws.find((x) => x.designation === designation)!.props;
		expectRel(p.A / IN ** 2, A, 0.01);
		expectRel(p.Iy / IN ** 4, Ix, 0.01);
		expectRel(p.Wely / IN ** 3, Sx, 0.01);
		expectRel(p.Wply / IN ** 3, Zx, 0.01);
		expectRel(p.Iz / IN ** 4, Iy, 0.015);
		expectRel(p.It / IN ** 4, J, 0.01);
	});
});
