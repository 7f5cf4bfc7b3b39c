/**
 * BS 4-1:2005 / BS EN 10365:2017, UK universal beams, and the UK steel design-data handbook
 * (SCI P363, "Blue Book") property tables. Dimensions in the library are from memory of BS 4-1;
 * the tabulated properties below are SCI P363 values from memory. Every row is checked against the
 * nominal mass in its designation (kg/m, within 3 %: catches typing errors in h, b, tw, tf).
 * Tolerances: 3 % on mass (the rule); 1 % on tabulated 3-s.f. properties
 * (engineering practice for fillet geometry, cf. the computed lines agreeing within 0.5 %).
 */
import { describe, expect, it } from 'vitest';
import { listSections } from '../../src/lib/engine/section/index';
import { UB_ROWS } from '../../src/lib/engine/section/tables/ub';
import type { IDims } from '../../src/lib/engine/section/types';
import { expectRelSoft as expectRel } from '../support/expect-rel';

const ubs = listSections().filter((s) => s.family === 'UB');

describe('UB rows (BS 4-1:2005 / EN 10365:2017)', () => {
	it('holds every row of the data file, with the standard named', () => {
		expect(ubs).toHaveLength(UB_ROWS.length);
		for (const s of ubs) expect(s.standard).toMatch(/BS 4-1/);
	});

	it.each(ubs.map((s) => [s.designation, s] as const))(
		'%s: mass from the dimensions (ρ = 7850 kg/m³) within 3 % of the nominal kg/m',
		(designation, s) => {
			const nominal = Number(designation.split('x')[2]);
			expectRel(s.props.mass, nominal, 0.03);
		}
	);

	it('depth between fillets is h − 2tf − 2r for every row (SCI P363 definition of d)', () => {
		for (const s of ubs) {
			const { h, tf, r } = s.dims as IDims;
			expect(s.props.d).toBeCloseTo(h - 2 * tf - 2 * r, 9);
		}
	});
});

// SCI P363 tabulated values, from memory: kg/m, A cm², Iy cm⁴, Wel,y cm³, Wpl,y cm³, Iz cm⁴,
// It cm⁴, Iw dm⁶, d mm, iy cm, iz cm.
type Row = readonly [string, ...number[]];
const TABULATED: readonly Row[] = [
	['UB 203x133x25', 25.1, 32.0, 2340, 230, 258, 308, 5.96, 0.0294, 172.4, 8.56, 3.1],
	['UB 254x146x31', 31.1, 39.7, 4410, 351, 393, 448, 8.55, 0.066, 219.0, 10.5, 3.36],
	['UB 305x165x40', 40.3, 51.3, 8500, 560, 623, 764, 14.7, 0.164, 265.2, 12.9, 3.86],
	['UB 356x171x51', 51.0, 64.9, 14100, 796, 896, 968, 23.8, 0.286, 311.6, 14.8, 3.86],
	['UB 457x191x67', 67.1, 85.5, 29400, 1300, 1470, 1450, 37.1, 0.705, 407.6, 18.5, 4.12]
];

describe('UB properties against SCI P363 tables (from memory)', () => {
	const cases = TABULATED.map((row) => [row[0], row.slice(1) as number[]] as const);
	it.each(cases)('%s', (designation, values) => {
		const [mass, A, Iy, Wely, Wply, Iz, It, Iw, d, iy, iz] = values;
		const s = ubs.find((x) => x.designation === designation)!;
		const p = s.props;
		expectRel(p.mass, mass, 0.01);
		expectRel(p.A / 1e2, A, 0.01);
		expectRel(p.Iy / 1e4, Iy, 0.01);
		expectRel(p.Wely / 1e3, Wely, 0.01);
		expectRel(p.Wply / 1e3, Wply, 0.01);
		expectRel(p.Iz / 1e4, Iz, 0.01);
		expectRel(p.It / 1e4, It, 0.01); // SCI torsion-constant formula reproduces P363 It
		expectRel(p.Iw / 1e12, Iw, 0.01); // P363 uses Iw = Iz(h − tf)²/4
		expectRel(p.d, d, 0.001);
		expectRel(p.iy / 10, iy, 0.01);
		expectRel(p.iz / 10, iz, 0.01);
	});

	it('305x165x40 UB: shape factor Wpl/Wel about 1.11 (rolled I beams 1.10–1.15, textbook fact)', () => {
		const p = ubs.find((x) => x.designation === 'UB 305x165x40')!.props;
		expect(p.Wply / p.Wely).toBeGreaterThan(1.1);
		expect(p.Wply / p.Wely).toBeLessThan(1.15);
	});
});
