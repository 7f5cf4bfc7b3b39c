/**
 * BS 4-1:2005 / BS EN 10365:2017, UK universal columns, and the SCI P363 ("Blue Book") property
 * tables (tabulated values from memory). Every row is checked against the nominal mass in its
 * designation (kg/m, within 3 %). Tolerances: 3 % on mass (the rule); 1 % on tabulated
 * 3-s.f. properties.
 */
import { describe, expect, it } from 'vitest';
import { listSections } from '../../src/lib/engine/section/index';
import { UC_ROWS } from '../../src/lib/engine/section/tables/uc';
import { expectRelSoft as expectRel } from '../support/expect-rel';

const ucs = listSections().filter((s) => s.family === 'UC');

describe('UC rows (BS 4-1:2005 / EN 10365:2017)', () => {
	it('holds every row of the data file, with the standard named', () => {
		expect(ucs).toHaveLength(UC_ROWS.length);
		for (const s of ucs) expect(s.standard).toMatch(/BS 4-1/);
	});

	it.each(ucs.map((s) => [s.designation, s] as const))(
		'%s: mass from the dimensions within 3 % of the nominal kg/m',
		(designation, s) => {
			expectRel(s.props.mass, Number(designation.split('x')[2]), 0.03);
		}
	);
});

// SCI P363 tabulated values, from memory: kg/m, A cm², Iy cm⁴, Wel,y cm³, Wpl,y cm³, Iz cm⁴,
// It cm⁴, Iw dm⁶, d mm.
const TABULATED = [
	['UC 203x203x46', 46.1, 58.7, 4570, 450, 497, 1550, 22.2, 0.143, 160.8],
	['UC 254x254x73', 73.1, 93.1, 11400, 898, 992, 3910, 57.6, 0.562, 200.3],
	['UC 152x152x23', 23.0, 29.2, 1250, 164, 182, 400, 4.63, 0.021, 123.6]
] as const;

describe('UC properties against SCI P363 tables (from memory)', () => {
	it.each(TABULATED)('%s', (designation, mass, A, Iy, Wely, Wply, Iz, It, Iw, d) => {
		const p = ucs.find((x) => x.designation === designation)!.props;
		expectRel(p.mass, mass, 0.01);
		expectRel(p.A / 1e2, A, 0.01);
		expectRel(p.Iy / 1e4, Iy, 0.01);
		expectRel(p.Wely / 1e3, Wely, 0.01);
		expectRel(p.Wply / 1e3, Wply, 0.01);
		expectRel(p.Iz / 1e4, Iz, 0.01);
		expectRel(p.It / 1e4, It, 0.01);
		// 152x152x23: P363 prints 0.0210 against 0.0212 from Iz(h − tf)²/4, so 1.1 % here.
		expectRel(p.Iw / 1e12, Iw, 0.011);
		expectRel(p.d, d, 0.001);
	});
});
