/**
 * Measured mode: an I section, a rectangular or square tube and a round tube, each searched in
 * the tables by the sizes a tape, callipers or a wall gauge give. Sizes: HSS8x6x1/2 is 8 in ×
 * 6 in × 1/2 in nominal (AISC Shapes Database v15.0; 1 in = 25.4 mm exactly, NIST SP 811);
 * SHS 100x100x5.0 and CHS 168.3x6.3 are EN 10210-2 sizes (from memory); UB 305x165x40 is
 * 303.4 × 165.0 × 6.0 × 10.2 mm (BS 4-1, from memory).
 */
import { describe, expect, it } from 'vitest';
import { identifySection, listSections } from '../../../src/lib/engine/section/index';
import {
	MEASURED_FIELDS,
	MEASURED_SHAPES,
	blankMeasured,
	measurementsOf,
	readMeasuredShape
} from '../../../src/lib/ui/state/measured-section';
import { describeField } from '../../../src/lib/ui/state/field-kinds';
import { createDemoCase } from '../../../src/lib/ui/state/demo-case';

const IN = 25.4;
const nearest = (section: Parameters<typeof measurementsOf>[0]) =>
	identifySection(measurementsOf(section)!, { limit: 3 });

describe('measured sections on the form', () => {
	it('offers I, rectangular/square and round tubes, each starting blank', () => {
		expect(MEASURED_SHAPES.map((s) => s.id)).toEqual(['I', 'RHS', 'CHS']);
		expect(blankMeasured('RHS')).toEqual({
			shape: 'RHS',
			h: null,
			b: null,
			t: null,
			process: 'hot'
		});
		expect(blankMeasured('CHS')).toEqual({ shape: 'CHS', d: null, t: null });
		expect(MEASURED_FIELDS.CHS.map((f) => f.key)).toEqual(['d', 't']);
		expect(MEASURED_FIELDS.RHS.map((f) => f.key)).toEqual(['h', 'b', 't']);
		for (const shape of ['RHS', 'CHS'] as const) {
			expect(readMeasuredShape(blankMeasured(shape))).toBe(shape);
			// Tube sizes are lengths shown in mm or in, like the I sizes.
			for (const f of MEASURED_FIELDS[shape]) {
				expect(describeField(`beam.section.${f.key}`, createDemoCase())).toEqual({
					kind: 'dimension',
					rule: 'positive'
				});
			}
		}
		expect(readMeasuredShape({ designation: 'W12x26' })).toBeNull();
	});

	it('searches only once every size of the shape is entered', () => {
		expect(measurementsOf(blankMeasured('RHS'))).toBeNull();
		expect(
			measurementsOf({ shape: 'RHS', h: 100, b: 100, t: null as unknown as number })
		).toBeNull();
		expect(measurementsOf({ shape: 'CHS', d: 168.3, t: 6.3 })).toEqual({ d: 168.3, t: 6.3 });
		expect(measurementsOf({ mp: 100 })).toBeNull();
	});

	it('a square tube read on site finds SHS 100x100x5.0 first', () => {
		const [first] = nearest({ shape: 'RHS', h: 101, b: 100, t: 5.1, process: 'hot' });
		expect(first.section.designation).toBe('SHS 100x100x5.0');
		expect(first.withinTolerance).toBe(true);
	});

	it('a US tube read either way up finds HSS8x6x1/2 by its nominal wall', () => {
		const [first] = nearest({ shape: 'RHS', h: 6 * IN, b: 8 * IN, t: 0.5 * IN });
		expect(first.section.designation).toBe('HSS8x6x1/2');
		expect(first.offsets.t).toBeCloseTo(0, 9);
	});

	it('a round tube finds CHS 168.3x6.3 first, then the US tube of nearly the same size', () => {
		const found = nearest({ shape: 'CHS', d: 168, t: 6.3 });
		expect(found[0].section.designation).toBe('CHS 168.3x6.3');
		// HSS6.625x0.250: d = 6.625 in = 168.3 mm, nominal wall 0.25 in = 6.35 mm.
		expect(found[1].section.designation).toBe('HSS6.625x0.250');
		expect(found[1].offsets.t).toBeCloseTo(6.3 - 0.25 * IN, 9);
		expect(found.every((c) => c.section.shape === 'CHS' && c.withinTolerance)).toBe(true);
	});

	it('an I section is searched as before, by h, b, tf and tw', () => {
		const [first] = nearest({ shape: 'I', h: 303, b: 165, tw: 6, tf: 10.2 });
		expect(first.section.designation).toBe('UB 305x165x40');
		expect(listSections().some((s) => s.designation === 'UB 305x165x40')).toBe(true);
	});
});
