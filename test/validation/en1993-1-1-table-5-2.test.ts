/**
 * EN 1993-1-1:2005 Table 5.2 (sheets 1–3), cross-section classification in major-axis bending.
 * ε = √(235/fy); limits computed inside the test: outstand flanges 9ε, 10ε, 14ε; internal parts in
 * bending 72ε, 83ε, 124ε and in compression 33ε, 38ε, 42ε (sheets 1–2, confirmed); CHS d/t 50ε²,
 * 70ε², 90ε² and RHS c = h − 3t (from memory). c for rolled I: (b − tw − 2r)/2 and h − 2tf − 2r
 * (Table 5.2 sketches, from memory). Section dimensions: BS 4-1:2005 / EN 10365:2017.
 */
import { describe, expect, it } from 'vitest';
import { classifySectionEN, resolveSection } from '../../src/lib/engine/section/index';
import type { ResolvedSection, SectionSpec } from '../../src/lib/engine/section/index';

function resolve(spec: SectionSpec): ResolvedSection {
	const r = resolveSection(spec);
	if (!r.ok) throw new Error(JSON.stringify(r.issues));
	return r.value;
}

describe('rolled I sections, pure bending (Table 5.2)', () => {
	// [designation, class at fy 275, class at fy 355, governing element at 355]
	const CASES = [
		['UB 203x133x25', 1, 1],
		['UB 305x165x40', 1, 1],
		['UC 203x203x46', 1, 2],
		['UC 254x254x73', 1, 2],
		['UC 152x152x23', 3, 3],
		['HEA 200', 1, 2],
		['IPE 300', 1, 1]
	] as const;

	it.each(CASES)('%s: class %i at fy 275, class %i at fy 355', (designation, c275, c355) => {
		const s = resolve({ designation });
		expect(classifySectionEN(s, 275).class).toBe(c275);
		expect(classifySectionEN(s, 355).class).toBe(c355);
	});

	it('305x165x40 UB at fy 275: flange c/tf = 6.92 against 9ε, web c/tw = 44.2 against 72ε', () => {
		const result = classifySectionEN(resolve({ designation: 'UB 305x165x40' }), 275);
		const eps = Math.sqrt(235 / 275);
		const [flange, web] = result.elements;
		expect(flange.ratio).toBeCloseTo((165 - 6 - 2 * 8.9) / 2 / 10.2, 10);
		expect(flange.limits.class1).toBeCloseTo(9 * eps, 12);
		expect(flange.limits.class3).toBeCloseTo(14 * eps, 12);
		expect(web.ratio).toBeCloseTo((303.4 - 2 * 10.2 - 2 * 8.9) / 6, 10);
		expect(web.limits.class2).toBeCloseTo(83 * eps, 12);
		expect(result.epsilon).toBeCloseTo(0.9244, 4); // Table 5.2 gives 0.92
	});

	it('152x152x23 UC is Class 3 because of its flange (9.65 > 10ε at fy 275)', () => {
		const result = classifySectionEN(resolve({ designation: 'UC 152x152x23' }), 275);
		expect(result.governing).toBe('flange');
		expect(result.elements[0].ratio).toBeCloseTo((152.2 - 5.8 - 15.2) / 2 / 6.8, 10);
	});

	it('a welded I with a thin web is Class 4 because of the web (c/tw > 124ε)', () => {
		const s = resolve({ shape: 'welded-I', h: 1000, b: 300, tw: 6, tf: 20 });
		const result = classifySectionEN(s, 355);
		expect(result.class).toBe(4);
		expect(result.governing).toBe('web');
		expect(result.elements[1].ratio).toBeCloseTo(960 / 6, 10);
	});
});

describe('hollow sections (Table 5.2)', () => {
	it('CHS: d/t against 50ε², 70ε², 90ε²', () => {
		const fy = 355;
		const e2 = 235 / fy;
		const slender = classifySectionEN(resolve({ shape: 'CHS', d: 323.9, t: 5 }), fy);
		expect(slender.elements[0].ratio).toBeCloseTo(323.9 / 5, 12);
		const { class1, class2, class3 } = slender.elements[0].limits;
		expect(
			[class1 / (50 * e2), class2 / (70 * e2), class3 / (90 * e2)].map((x) => x.toFixed(12))
		).toEqual(['1.000000000000', '1.000000000000', '1.000000000000']);
		expect(slender.class).toBe(4); // 64.8 > 59.6
		expect(classifySectionEN(resolve({ designation: 'CHS 114.3x5.0' }), fy).class).toBe(1); // 22.9
	});

	it('RHS: compression flange c = b − 3t against 33ε/38ε/42ε; web c = h − 3t in bending', () => {
		const s = resolve({ shape: 'RHS', h: 200, b: 200, t: 5 });
		const eps = Math.sqrt(235 / 275);
		const result = classifySectionEN(s, 275);
		expect(result.elements[0].ratio).toBeCloseTo(185 / 5, 12);
		expect(result.elements[0].limits.class3).toBeCloseTo(42 * eps, 12);
		expect(result.class).toBe(3); // 37 lies between 35.13 (38ε) and 38.83 (42ε)
		expect(result.governing).toBe('flange');
	});
});

describe('sections whose class cannot be found', () => {
	it('a known Mp gives class null with a note, never a guess', () => {
		const s = resolve({ mp: 150 });
		const result = classifySectionEN(s, 275);
		expect(result.class).toBeNull();
		expect(result.note).toMatch(/confirm/);
	});
});
