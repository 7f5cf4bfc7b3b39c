/**
 * Designation search: the forms people type (issue 3 list) map to one canonical designation;
 * unknown names return null and suggest the nearest sections.
 */
import { describe, expect, it } from 'vitest';
import { findSection, listSections, suggestSections } from '../../../src/lib/engine/section/index';

describe('findSection', () => {
	it.each([
		['305x165x40', 'UB 305x165x40'],
		['305 x 165 x 40 UB', 'UB 305x165x40'],
		['UB305x165x40', 'UB 305x165x40'],
		['ub 305×165×40', 'UB 305x165x40'],
		['203X203X46', 'UC 203x203x46'],
		['W12x26', 'W12x26'],
		['w 12 x 26', 'W12x26'],
		['IPE300', 'IPE 300'],
		['ipe 300', 'IPE 300'],
		['HE 300 B', 'HEB 300'],
		['HEB300', 'HEB 300'],
		['HE200A', 'HEA 200'],
		['SHS 100x100x5', 'SHS 100x100x5.0'],
		['100x100x6,3', 'SHS 100x100x6.3'],
		['RHS 200 × 100 × 6.3', 'RHS 200x100x6.3'],
		['CHS 114.3x5', 'CHS 114.3x5.0'],
		['chs 273x10', 'CHS 273.0x10.0']
	])('reads "%s" as %s', (typed, canonical) => {
		expect(findSection(typed)?.designation).toBe(canonical);
	});

	it('finds every library section by its own canonical designation', () => {
		for (const s of listSections())
			expect(findSection(s.designation)?.designation).toBe(s.designation);
	});

	it.each(['UB 305x165x41', 'UC 305x165x40', 'XYZ 305x165x40', '', 'IPE', 'HEB 310'])(
		'returns null for "%s"',
		(typed) => {
			expect(findSection(typed)).toBeNull();
		}
	);

	it('keeps canonical designations unique', () => {
		const names = listSections().map((s) => s.designation);
		expect(new Set(names).size).toBe(names.length);
	});
});

describe('suggestSections', () => {
	it('puts the nearest section of the named family first', () => {
		expect(suggestSections('UB 305x165x41', 3)[0]).toBe('UB 305x165x40');
		expect(suggestSections('HEB 310', 2)).toContain('HEB 300');
		expect(suggestSections('W12x27', 1)).toEqual(['W12x26']);
	});

	it('returns exactly n designations, all from the library', () => {
		const names = new Set(listSections().map((s) => s.designation));
		const got = suggestSections('something odd', 4);
		expect(got).toHaveLength(4);
		for (const g of got) expect(names.has(g)).toBe(true);
	});
});

// Designations as US, UK and European tables print them (AISC Manual labels, EN 10365 and
// EN 10210/10219 forms); the canonical forms are documented in src/lib/engine/section/README.md.
describe('findSection: US shapes, HE M and cold-formed hollow sections', () => {
	it.each([
		['W44x335', 'W44x335'],
		['W44X335', 'W44x335'],
		['HP14x117', 'HP14x117'],
		['S24x121', 'S24x121'],
		['S18x54.7', 'S18x54.7'],
		['HSS8x6x1/2', 'HSS8x6x1/2'],
		['HSS8X6X.500', 'HSS8x6x1/2'],
		['hss 5-1/2 x 5-1/2 x 3/8', 'HSS5-1/2x5-1/2x3/8'],
		['HSS6.625x0.280', 'HSS6.625x0.280'],
		['HSS6.625X.280', 'HSS6.625x0.280'],
		['Pipe 4 Std', 'Pipe 4 Std'],
		['Pipe4STD', 'Pipe 4 Std'],
		['Pipe 4 XS', 'Pipe 4 XS'],
		['Pipe 3-1/2 XS', 'Pipe 3-1/2 XS'],
		['pipe 4', 'Pipe 4 Std'],
		['HE 1000 M', 'HEM 1000'],
		['HEM1000', 'HEM 1000'],
		['HE 1000 A', 'HEA 1000'],
		['RHS 200x100x10', 'RHS 200x100x10.0'],
		['CF RHS 200x100x10', 'CF RHS 200x100x10.0'],
		['cf chs 168.3x6', 'CF CHS 168.3x6.0']
	])('%s → %s', (typed, canonical) => {
		expect(findSection(typed)?.designation).toBe(canonical);
	});

	it('tells Std from XS pipe and hot-finished from cold-formed tubes', () => {
		expect(findSection('Pipe 4 Std')).not.toBe(findSection('Pipe 4 XS'));
		// Nominal wall 0.337 in (AISC Shapes Database v15.0), kept to a micrometre in mm.
		expect(findSection('Pipe 4 XS')!.nominalWall).toBeCloseTo(0.337 * 25.4, 3);
		expect(findSection('RHS 200x100x10')!.family).toBe('RHS');
		expect(findSection('CF RHS 200x100x10')!.family).toBe('CFRHS');
		expect(findSection('Pipe 4 XXL')).toBeNull();
		expect(findSection('CF RHS 200x100x6.3')).toBeNull();
	});
});
