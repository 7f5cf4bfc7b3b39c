/**
 * Kinematic stability of beam lines: a beam (or a piece between hinges) that can move as a
 * rigid body is a mechanism and carries no load elastically (statics of rigid bodies; stability
 * and determinacy as in R.C. Hibbeler, "Structural Analysis", ch. 2 — from memory).
 */
import { describe, expect, it } from 'vitest';
import { analyseElastic, findMechanismIssues } from '../../../src/lib/engine/elastic/index';
import type { BeamLine } from '../../../src/lib/engine/model/types';

const beam = (
	spans: number[],
	supports: BeamLine['supports'],
	joints: BeamLine['joints'] = []
): BeamLine => ({ spans, supports, joints });

describe('findMechanismIssues', () => {
	it.each([
		['simply supported span', beam([6000], ['pin', 'pin'])],
		['cantilever', beam([6000], ['fixed', 'free'])],
		['span with an overhang', beam([6000, 2000], ['pin', 'pin', 'free'], ['continuous'])],
		['two simple spans on three pins', beam([6000, 6000], ['pin', 'pin', 'pin'], ['simple'])],
		[
			'Gerber beam: cantilever carrying a suspended span',
			beam([2000, 5000], ['fixed', 'free', 'pin'], ['simple'])
		]
	])('%s is stable', (_name, b) => {
		expect(findMechanismIssues(b)).toEqual([]);
	});

	it.each([
		['span on one pin and a free end', beam([6000], ['pin', 'free'])],
		['overhang hung on a simple joint', beam([6000, 2000], ['pin', 'pin', 'free'], ['simple'])],
		[
			'simple joint between two pins with no support under it (three hinges in a line)',
			beam([3000, 3000], ['pin', 'free', 'pin'], ['simple'])
		],
		['no support at all', beam([6000], ['free', 'free'])]
	])('%s is a mechanism', (_name, b) => {
		const issues = findMechanismIssues(b);
		expect(issues.map((i) => [i.path, i.code, i.severity])).toEqual([
			['beam.supports', 'beam-is-mechanism', 'error']
		]);
	});

	it('analyseElastic returns the issue instead of solving a singular system', () => {
		const r = analyseElastic({
			beam: beam([6000], ['pin', 'free']),
			EI: [1e13],
			loads: [{ kind: 'point', x: 3000, value: 1000, action: 'temporary' }]
		});
		expect(r.ok).toBe(false);
		expect(!r.ok && r.issues[0].code).toBe('beam-is-mechanism');
	});
});
