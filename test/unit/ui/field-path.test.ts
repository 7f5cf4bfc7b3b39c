/** Field paths, the same strings the engine uses to name a field in its input issues. */
import { describe, expect, it } from 'vitest';
import {
	readPath,
	shiftListKeys,
	splitPath,
	writePath
} from '../../../src/lib/ui/state/field-path';

describe('field paths', () => {
	it('splits keys and indices', () => {
		expect(splitPath('beam.spans[1]')).toEqual(['beam', 'spans', 1]);
		expect(splitPath('loads[2].x')).toEqual(['loads', 2, 'x']);
	});

	it('reads and writes at a path, creating missing objects', () => {
		const c: Record<string, unknown> = { loads: [{ x: 2 }] };
		expect(readPath(c, 'loads[0].x')).toBe(2);
		expect(readPath(c, 'beam.spans[0]')).toBeUndefined();
		writePath(c, 'factors.gammaM0', 1);
		expect(c.factors).toEqual({ gammaM0: 1 });
	});

	it('renumbers list keys after an item is removed and drops the removed item’s keys', () => {
		const texts = {
			'loads[0].x': 'a',
			'loads[1].x': 'b',
			'loads[2].value': 'c',
			'loads[10].x': 'd',
			'beam.spans[0]': 'e'
		};
		expect(shiftListKeys(texts, 'loads', 1)).toEqual({
			'loads[0].x': 'a',
			'loads[1].value': 'c',
			'loads[9].x': 'd',
			'beam.spans[0]': 'e'
		});
	});
});
