/**
 * The dense simplex against a textbook linear program with a known optimum and shadow prices:
 * the "Wyndor Glass" product-mix example of Hillier & Lieberman, "Introduction to Operations
 * Research" (maximise 3x + 5y s.t. x ≤ 4, 2y ≤ 12, 3x + 2y ≤ 18, x, y ≥ 0: optimum 36 at (2, 6),
 * shadow prices 0, 3/2, 1 — from memory, and verified below by substitution and duality).
 */
import { describe, expect, it } from 'vitest';
import {
	addRow,
	createProgram,
	solveLinearProgram,
	solveProgram
} from '../../../src/lib/engine/collapse/simplex';

const G = [
	[1, 0],
	[0, 2],
	[3, 2],
	[-1, 0],
	[0, -1]
];
const h = [4, 12, 18, 0, 0];

describe('solveLinearProgram', () => {
	it('solves the Wyndor Glass example: 36 at (2, 6), duals (0, 1.5, 1)', () => {
		const r = solveLinearProgram(G, h, [3, 5]);
		expect(r.status).toBe('optimal');
		if (r.status !== 'optimal') return;
		expect(r.objective).toBeCloseTo(36, 12);
		expect(r.y[0]).toBeCloseTo(2, 12);
		expect(r.y[1]).toBeCloseTo(6, 12);
		expect(r.w.map((v) => Number(v.toFixed(12)))).toEqual([0, 1.5, 1, 0, 0]);
		// Strong duality: hᵀw equals the objective.
		expect(h.reduce((s, v, i) => s + v * r.w[i], 0)).toBeCloseTo(36, 12);
	});
	it('reports unbounded and infeasible programs', () => {
		expect(solveLinearProgram([[-1]], [0], [1]).status).toBe('unbounded');
		expect(solveLinearProgram([[1], [-1]], [-1, -1], [1]).status).toBe('infeasible');
	});
	it('gives the same optimum when rows are added after a solve (warm start)', () => {
		const lp = createProgram([3, 5]);
		for (let j = 0; j < 2; j++) addRow(lp, G[j], h[j]);
		addRow(lp, G[3], h[3]);
		addRow(lp, G[4], h[4]);
		const first = solveProgram(lp);
		expect(first.status === 'optimal' && first.objective).toBeCloseTo(42, 12); // x = 4, y = 6 without the third row
		addRow(lp, G[2], h[2]);
		const second = solveProgram(lp);
		expect(second.status === 'optimal' && second.objective).toBeCloseTo(36, 12);
	});
});
