/**
 * validateBeamLine: list lengths, positive spans, `free` only at the ends, and beams that are
 * mechanisms with no load (a rigid body or hinged chain that can move: basic statics — a beam
 * needs at least as many independent reactions as equilibrium conditions, common practice).
 */
import { describe, expect, it } from 'vitest';
import { validateBeamLine } from '../../../src/lib/engine/model/validate-beam';
import type { BeamLine } from '../../../src/lib/engine/model/types';

const codes = (beam: BeamLine) => validateBeamLine(beam).map((i) => i.code);

describe('validateBeamLine', () => {
	it('accepts stable beams: simple span, cantilever, overhangs, continuous, simple joints', () => {
		expect(codes({ spans: [6000], supports: ['pin', 'pin'], joints: [] })).toEqual([]);
		expect(codes({ spans: [6000], supports: ['fixed', 'free'], joints: [] })).toEqual([]);
		expect(
			codes({
				spans: [1500, 6000, 2000],
				supports: ['free', 'pin', 'pin', 'free'],
				joints: ['continuous', 'continuous']
			})
		).toEqual([]);
		expect(
			codes({ spans: [6000, 4000], supports: ['pin', 'pin', 'pin'], joints: ['simple'] })
		).toEqual([]);
	});
	it('names the field of a non-positive span and of wrong list lengths', () => {
		const issues = validateBeamLine({ spans: [6000, 0], supports: ['pin', 'pin'], joints: [] });
		expect(issues.map((i) => [i.path, i.code])).toEqual([
			['beam.spans[1]', 'span-not-positive'],
			['beam.supports', 'supports-count'],
			['beam.joints', 'joints-count']
		]);
	});
	it('refuses free at an interior node', () => {
		expect(
			codes({ spans: [3000, 3000], supports: ['fixed', 'free', 'pin'], joints: ['continuous'] })
		).toEqual(['free-inside']);
	});
	it('detects beams that are mechanisms with no load', () => {
		// Free at both ends; a pinned cantilever; an overhang hung on a simple joint; two simple joints over a lone pin.
		expect(codes({ spans: [6000], supports: ['free', 'free'], joints: [] })).toEqual([
			'beam-is-mechanism'
		]);
		expect(codes({ spans: [6000], supports: ['pin', 'free'], joints: [] })).toEqual([
			'beam-is-mechanism'
		]);
		expect(
			codes({ spans: [6000, 2000], supports: ['pin', 'pin', 'free'], joints: ['simple'] })
		).toEqual(['beam-is-mechanism']);
		expect(
			codes({ spans: [2000, 6000], supports: ['free', 'fixed', 'pin'], joints: ['simple'] })
		).toContain('beam-is-mechanism');
	});
	it('warns that a fixed support at a simple joint acts as a pin', () => {
		const issues = validateBeamLine({
			spans: [6000, 6000],
			supports: ['pin', 'fixed', 'pin'],
			joints: ['simple']
		});
		expect(issues).toEqual([
			expect.objectContaining({
				code: 'fixity-ignored-at-simple-joint',
				severity: 'warning',
				path: 'beam.supports[1]'
			})
		]);
	});
});
