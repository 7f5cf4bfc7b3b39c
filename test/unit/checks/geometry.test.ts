/**
 * Restraint segments, load heights, released (determinate) beams, capacity reductions and the
 * split of loads at nodes. Behaviour follows the rules stated in each module; load heights
 * follow the NCCI SN003 convention (zg = ±h/2 for flange loading, from memory).
 */
import { describe, expect, it } from 'vitest';
import { computeLoadHeight, listRestraintSegments } from '../../../src/lib/engine/checks/restraint';
import { releaseRedundants } from '../../../src/lib/engine/checks/determinate';
import { reduceCapacity } from '../../../src/lib/engine/checks/capacity';
import { splitLoadAtNodes } from '../../../src/lib/engine/checks/factor-loads';

describe('listRestraintSegments', () => {
	const beam = {
		spans: [6000, 4000],
		supports: ['pin', 'pin', 'pin'] as ('pin' | 'free' | 'fixed')[]
	};
	it('has no segments when restrained throughout', () => {
		expect(listRestraintSegments({ ...beam, restraint: { kind: 'continuous' } })).toEqual([]);
	});

	it('cuts at supports only for ends-only', () => {
		expect(listRestraintSegments({ ...beam, restraint: { kind: 'ends-only' } })).toEqual([
			{ from: 0, to: 6000, freeEnd: false },
			{ from: 6000, to: 10000, freeEnd: false }
		]);
	});

	it('adds given positions and ignores positions off the beam', () => {
		const segs = listRestraintSegments({
			...beam,
			restraint: { kind: 'points', at: [3000, 12000] }
		});
		expect(segs.map((s) => [s.from, s.to])).toEqual([
			[0, 3000],
			[3000, 6000],
			[6000, 10000]
		]);
	});

	it('marks a cantilever with an unrestrained tip, unless a restraint is placed at the tip', () => {
		const over = {
			spans: [6000, 2000],
			supports: ['pin', 'pin', 'free'] as ('pin' | 'free' | 'fixed')[]
		};
		expect(listRestraintSegments({ ...over, restraint: { kind: 'ends-only' } })[1].freeEnd).toBe(
			true
		);
		expect(
			listRestraintSegments({ ...over, restraint: { kind: 'points', at: [8000] } })[1].freeEnd
		).toBe(false);
	});
});

describe('computeLoadHeight', () => {
	it('is +h/2, 0 and −h/2', () => {
		expect(computeLoadHeight('top-flange', 300)).toBe(150);
		expect(computeLoadHeight('shear-centre', 300)).toBe(0);
		expect(computeLoadHeight('bottom-flange', 300)).toBe(-150);
	});
});

describe('releaseRedundants', () => {
	it('turns a two-span continuous beam into two simple spans', () => {
		expect(
			releaseRedundants({ spans: [6, 6], supports: ['pin', 'pin', 'pin'], joints: ['continuous'] })
				.joints
		).toEqual(['simple']);
	});

	it('turns fixed ends into pins but keeps a cantilever root and the joint next to an overhang', () => {
		expect(
			releaseRedundants({ spans: [6], supports: ['fixed', 'fixed'], joints: [] }).supports
		).toEqual(['pin', 'pin']);
		expect(
			releaseRedundants({ spans: [6], supports: ['fixed', 'free'], joints: [] }).supports
		).toEqual(['fixed', 'free']);
		expect(
			releaseRedundants({ spans: [6, 2], supports: ['pin', 'pin', 'free'], joints: ['continuous'] })
				.joints
		).toEqual(['continuous']);
	});
});

describe('reduceCapacity', () => {
	it('splits a segment and lowers only the cut', () => {
		const out = reduceCapacity([{ from: 0, to: 6000, sagging: 100, hogging: 100 }], {
			from: 2900,
			to: 3100,
			value: 90
		});
		expect(out).toEqual([
			{ from: 0, to: 2900, sagging: 100, hogging: 100 },
			{ from: 2900, to: 3100, sagging: 90, hogging: 90 },
			{ from: 3100, to: 6000, sagging: 100, hogging: 100 }
		]);
	});

	it('never raises a capacity', () => {
		const out = reduceCapacity([{ from: 0, to: 10, sagging: 50, hogging: 60 }], {
			from: 0,
			to: 10,
			value: 55
		});
		expect(out).toEqual([{ from: 0, to: 10, sagging: 50, hogging: 55 }]);
	});
});

describe('splitLoadAtNodes', () => {
	it('splits a linear load keeping the intensity continuous', () => {
		const pieces = splitLoadAtNodes(
			{ kind: 'linear', from: 0, to: 8000, start: 0, end: 8, action: 'imposed' },
			[0, 4000, 8000]
		);
		expect(pieces).toEqual([
			{ kind: 'linear', from: 0, to: 4000, start: 0, end: 4, action: 'imposed' },
			{ kind: 'linear', from: 4000, to: 8000, start: 4, end: 8, action: 'imposed' }
		]);
	});
});
