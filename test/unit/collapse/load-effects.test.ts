/**
 * Moments and shears of loads on the left-hand free body against statics closed forms
 * (moment of a resultant about a point; any strength-of-materials text, e.g. Timoshenko & Gere,
 * "Mechanics of Materials" — common practice).
 */
import { describe, expect, it } from 'vitest';
import {
	computeLoadMoment,
	computeLoadResultant,
	computeLoadShear
} from '../../../src/lib/engine/collapse/load-effects';
import type { Load } from '../../../src/lib/engine/model/types';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('load effects', () => {
	it('uniform load: w·a·(x − a/2) for the loaded length a left of x', () => {
		const w = 12;
		const load: Load = { kind: 'uniform', from: 1000, to: 4000, value: w, action: 'permanent' };
		for (const x of [2500, 4000, 5300]) {
			const a = Math.min(x, 4000) - 1000;
			expect(rel(computeLoadMoment([load], x), w * a * (x - 1000 - a / 2))).toBeLessThan(1e-12);
			expect(rel(computeLoadShear([load], x, -1), w * a)).toBeLessThan(1e-12);
		}
	});
	it('triangular load 0 → w₀ over L: moment w₀x³/(6L) inside, resultant w₀L/2 at 2L/3', () => {
		const [w0, L] = [9, 6000];
		const load: Load = { kind: 'linear', from: 0, to: L, start: 0, end: w0, action: 'permanent' };
		expect(rel(computeLoadMoment([load], 2500), (w0 * 2500 ** 3) / (6 * L))).toBeLessThan(1e-12);
		const { force, momentAboutOrigin } = computeLoadResultant([load]);
		expect(rel(force, (w0 * L) / 2)).toBeLessThan(1e-12);
		expect(rel(momentAboutOrigin / force, (2 * L) / 3)).toBeLessThan(1e-12);
	});
	it('a point load counts in the shear only on its right-hand side', () => {
		const load: Load = { kind: 'point', x: 2000, value: 5000, action: 'temporary' };
		expect(computeLoadShear([load], 2000, -1)).toBe(0);
		expect(computeLoadShear([load], 2000, 1)).toBe(5000);
		expect(computeLoadMoment([load], 3500)).toBe(5000 * 1500);
	});
});
