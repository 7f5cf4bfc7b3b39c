/**
 * validateCollapseProblem: the resistance covers the beam with positive values and every load is
 * finite and on the beam (input rules of the collapse solver; common practice: a beam with no
 * bending resistance somewhere has no plastic collapse load to compute).
 */
import { describe, expect, it } from 'vitest';
import { validateCollapseProblem } from '../../../src/lib/engine/collapse';
import { makeProblem } from './builders';

const base = () =>
	makeProblem({ spans: [6], supports: ['pin', 'pin'], Mp: 100, variable: [{ P: 1, at: 3 }] });

describe('validateCollapseProblem', () => {
	it('accepts a valid problem, and a load that misses the end only by unit rounding', () => {
		expect(validateCollapseProblem(base())).toEqual([]);
		const p = base();
		p.variableLoads = [{ kind: 'point', x: 6000 * (1 + 1e-12), value: 1000, action: 'temporary' }];
		expect(validateCollapseProblem(p)).toEqual([]);
	});
	it('names gaps and non-positive values in the resistance', () => {
		const p = base();
		p.capacity = [
			{ from: 0, to: 2000, sagging: 100e6, hogging: 100e6 },
			{ from: 2500, to: 6000, sagging: 0, hogging: 100e6 }
		];
		const codes = validateCollapseProblem(p).map((i) => [i.path, i.code]);
		expect(codes).toContainEqual(['capacity[1]', 'capacity-not-positive']);
		expect(codes).toContainEqual(['capacity[1]', 'capacity-gap']);
	});
	it('names loads off the beam, reversed ranges and non-finite values', () => {
		const p = base();
		p.fixedLoads = [
			{ kind: 'point', x: 7000, value: 1, action: 'permanent' },
			{ kind: 'uniform', from: 4000, to: 1000, value: 1, action: 'permanent' }
		];
		p.variableLoads = [
			{ kind: 'linear', from: 0, to: 6000, start: NaN, end: 1, action: 'temporary' }
		];
		expect(validateCollapseProblem(p).map((i) => [i.path, i.code])).toEqual([
			['fixedLoads[0].x', 'load-off-beam'],
			['fixedLoads[1].from', 'load-range'],
			['variableLoads[0].value', 'load-not-finite']
		]);
	});
});
