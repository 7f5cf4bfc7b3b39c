/**
 * Cross-check of the exact collapse solver against a general-purpose linear-programming solver:
 * HiGHS (npm package `highs`, the WebAssembly build of the HiGHS solver), on an independently
 * written, conservative discretisation of the static (lower-bound) theorem.
 *
 * The discrete program (our own formulation, in test/unit/collapse/grid-program.ts, sharing no code
 * with the engine):
 * unknowns are the moments m_i at grid points, the shear v_i just right of each point, the support
 * reactions and λ ≥ 0; equilibrium holds exactly between neighbouring points (shear jumps by
 * reactions and point loads, drops by the line-load resultant W_i; the moment changes by
 * h_i·v_i − F_i, F_i the moment of the interval's line load about its right end). Between grid
 * points the moment departs from its chord by at most max|w|·h²/8 (interpolation error of a
 * function with |M''| = |w|), so m ± that bulge ≤ Mp at both ends of every interval makes the
 * field admissible everywhere: λ_grid is a true lower bound, λ_grid ≤ λ_exact, approaching it as
 * h² (static theorem: Neal, "The Plastic Methods of Structural Analysis", from memory).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveCollapse } from '../../src/lib/engine/collapse';
import { arbitraryBeamSpec } from '../unit/collapse/arbitraries';
import { makeProblem } from '../unit/collapse/builders';
import { writeGridProgram } from '../unit/collapse/grid-program';

describe('collapse solver against HiGHS on a conservative grid (200 random beams, seeded)', () => {
	it('λ_grid ≤ λ_exact and within 1e-3 of it; fixed-load failures are infeasible on the grid', async () => {
		const highs = await (await import('highs')).default();
		const specs = fc.sample(arbitraryBeamSpec({ interiorFixed: false }), {
			seed: 20261201,
			numRuns: 600
		});
		let compared = 0;
		let failures = 0;
		let worst = 0;
		for (const spec of specs) {
			if (compared >= 200) break;
			const result = solveCollapse(makeProblem(spec));
			if (result.status === 'unbounded' || result.status === 'not-certified') continue;
			const text = writeGridProgram(spec);
			if (result.status === 'fails-under-fixed') {
				// The grid program is more conservative still: with λ held at 0 it has no solution.
				const atZero = highs.solve(text.replace(' lam >= 0', ' lam = 0'), { output_flag: false });
				expect(atZero.Status).toBe('Infeasible');
				failures++;
				continue;
			}
			const grid = highs.solve(text, { output_flag: false });
			expect(grid.Status).toBe('Optimal');
			const lambdaGrid = grid.ObjectiveValue;
			const exact = result.loadFactor;
			expect(lambdaGrid).toBeLessThanOrEqual(exact * (1 + 1e-9) + 1e-9);
			expect(lambdaGrid).toBeGreaterThanOrEqual(exact * (1 - 1e-3));
			worst = Math.max(worst, (exact - lambdaGrid) / exact);
			compared++;
		}
		expect(compared).toBe(200);
		expect(failures).toBeGreaterThan(0);
		expect(worst).toBeLessThan(1e-3);
	}, 600_000);
});
