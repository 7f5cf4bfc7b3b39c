/**
 * Support arrangements offered on the form, and load kinds: what the form writes into the case
 * file (format `hingepoint.case`: one support per node, one joint per internal node).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	applyLayout,
	BEAM_LAYOUTS,
	detectLayout,
	totalLength
} from '../../../src/lib/ui/state/beam-layout';
import { convertLoad, readLoadChoice, LOAD_CHOICES } from '../../../src/routes/check/load-kinds';

describe('beam layouts', () => {
	it('reads back the arrangement it writes, with consistent list lengths (property)', () => {
		fc.assert(
			fc.property(
				fc.constantFrom(...BEAM_LAYOUTS.map((l) => l.id)),
				fc.integer({ min: 2, max: 5 }),
				fc.array(fc.double({ min: 0.5, max: 20, noNaN: true }), { minLength: 1, maxLength: 5 }),
				(layout, count, spans) => {
					const line = applyLayout({ spans, supports: ['pin', 'pin'], joints: [] }, layout, count);
					return (
						detectLayout(line) === layout &&
						line.supports.length === line.spans.length + 1 &&
						line.joints.length === line.spans.length - 1 &&
						line.spans[0] === spans[0]
					);
				}
			)
		);
		expect(BEAM_LAYOUTS).toHaveLength(6);
	});

	it('gives a continuous beam 2 to 5 spans and an overhang a free end', () => {
		expect(
			applyLayout({ spans: [6], supports: ['pin', 'pin'] }, 'continuous', 9).spans
		).toHaveLength(5);
		expect(applyLayout({ spans: [6], supports: ['pin', 'pin'] }, 'overhang').supports).toEqual([
			'pin',
			'pin',
			'free'
		]);
		expect(totalLength({ spans: [4, 1.5] })).toBe(5.5);
	});
});

describe('load kinds', () => {
	it('keeps the action and covers the beam as each kind should', () => {
		const hoist = { kind: 'point' as const, x: 2, value: 12.5, action: 'temporary' as const };
		for (const { id } of LOAD_CHOICES) {
			const converted = convertLoad(hoist, id, 6);
			expect(converted.action).toBe('temporary');
			expect(readLoadChoice(converted, 6)).toBe(id);
		}
		expect(convertLoad(hoist, 'whole', 6)).toEqual({
			kind: 'uniform',
			from: 0,
			to: 6,
			value: 12.5,
			action: 'temporary'
		});
	});
});
