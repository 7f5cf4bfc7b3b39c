/**
 * EN 1990:2002 6.4.3.2 and Annex A1 Table A1.2(B), STR combinations with the recommended values
 * γG,sup = 1.35, γG,inf = 1.00, γQ = 1.5, ξ = 0.85 ("Steel Buildings in Europe" Part 3, Table 3.1
 * and text) and ψ0 = 0.7 for imposed loads of categories A–D (EN 1990 Table A1.1, from memory);
 * the temporary load is a construction load with ψ0 = 1.0 (EN 1991-1-6 Annex A1, from memory).
 * Expressions: (6.10) ΣγG·Gk + γQ·Qk,1 + ΣγQ·ψ0·Qk,i; (6.10a) ΣγG·Gk + γQ·ψ0·Qk,1 + …;
 * (6.10b) Σξ·γG·Gk + γQ·Qk,1 + … (the less favourable of 6.10a/6.10b governs).
 * Worked example: a simply supported 6 m beam, Mp,Rd = 623 cm³ × 275 N/mm² (305x165x40 UB S275),
 * gk = 4 kN/m, variable point load at midspan. Its collapse load is the textbook closed form
 * γT·Qk·L/4 + γG·gk·L²/8 = Mp (B.G. Neal, The Plastic Methods of Structural Analysis, from memory),
 * solved here for Qk: 65.34 kN by 6.10 and by 6.10a/b with ψ0 = 1.0 on the temporary load (6.10a
 * is then 6.10), 66.96 kN by 6.10a/b were it given ψ0 = 0.7.
 */
import { describe, expect, it } from 'vitest';
import { resolveFactors } from '../../src/lib/engine/checks/en1993/factors';
import { listLoadArrangements } from '../../src/lib/engine/checks/load-arrangements';
import { applyArrangement } from '../../src/lib/engine/checks/factor-loads';
import type { Load } from '../../src/lib/engine/model/types';
import { expectRel } from '../support/expect-rel';

const L = 6000;
const Mp = 623e3 * 275;
const loads: Load[] = [
	{ kind: 'uniform', from: 0, to: L, value: 4, action: 'permanent' },
	{ kind: 'point', x: L / 2, value: 1000, action: 'temporary' }
];

/** Largest Qk (N) over the arrangements of a factor set, by the midspan-hinge closed form. */
function largestQk(set: 'en1990-6.10' | 'en1990-6.10ab', extra: Record<string, number> = {}) {
	const f = resolveFactors({ set, ...extra }, { hasImposed: false });
	const arrangements = listLoadArrangements({
		combinations: f.combinations,
		spanCount: 1,
		imposedSpans: []
	});
	let best = Infinity;
	let name = '';
	for (const arrangement of arrangements) {
		const d = applyArrangement({ loads, spans: [L], arrangement });
		const g = d.fixed.reduce((s, l) => s + (l.kind === 'uniform' ? l.value : 0), 0);
		const q = d.variable.reduce((s, l) => s + (l.kind === 'point' ? l.value : 0), 0) / 1000;
		const qk = ((4 * Mp) / L - (g * L) / 2) / q / 1000; // kN
		if (qk < best) {
			best = qk;
			name = arrangement.name;
		}
	}
	return { qk: best, name };
}

describe('recommended factors (EN 1990 Table A1.2(B))', () => {
	it('6.10: γG,sup 1.35, γG,inf 1.0, temporary factor defaults to γQ = 1.5', () => {
		const f = resolveFactors({ set: 'en1990-6.10' }, { hasImposed: false });
		expect(f.combinations).toHaveLength(1);
		expect(f.combinations[0]).toMatchObject({ gammaGsup: 1.35, gammaGinf: 1, gammaTemporary: 1.5 });
		expect(f.gammaM0).toBe(1);
		expect(f.gammaM1).toBe(1);
	});

	it('6.10a/6.10b: ψ0·γQ on the variable action in 6.10a, ξ·γG,sup in 6.10b', () => {
		const f = resolveFactors({ set: 'en1990-6.10ab', psi0T: 0.7 }, { hasImposed: false });
		const [a, b] = f.combinations;
		expect(a.name).toBe('6.10a');
		expectRel(a.gammaTemporary, 1.5 * 0.7, 1e-12);
		const construction = resolveFactors({ set: 'en1990-6.10ab' }, { hasImposed: false });
		expectRel(construction.combinations[0].gammaTemporary, 1.5 * 1.0, 1e-12);
		expectRel(b.gammaGsup, 0.85 * 1.35, 1e-12);
		expect(b.gammaTemporary).toBe(1.5);
	});

	it('each variable action leads in turn when existing imposed load is present (6.4.3.2(3))', () => {
		const f = resolveFactors({ set: 'en1990-6.10' }, { hasImposed: true });
		expect(f.combinations.map((c) => [c.gammaImposed, c.gammaTemporary])).toEqual([
			[1.5 * 0.7, 1.5],
			[1.5, 1.5 * 1.0]
		]);
	});

	it('a separate temporary factor and edited γM values are kept', () => {
		const f = resolveFactors(
			{ set: 'en1990-6.10', gammaT: 1.6, gammaM0: 1.05 },
			{ hasImposed: false }
		);
		expect(f.combinations[0].gammaTemporary).toBe(1.6);
		expect(f.gammaM0).toBe(1.05);
	});
});

describe('worked example: 305x165x40 UB S275, 6 m, gk 4 kN/m, Qk at midspan', () => {
	it('6.10 allows Qk = 65.34 kN, governed by the upper permanent factor', () => {
		const r = largestQk('en1990-6.10');
		expectRel(r.qk, 65.34, 1e-3);
		expect(r.name).toContain('upper');
	});

	it('6.10a/b with ψ0 = 1.0 on the construction load: 6.10a is 6.10 and governs, 65.34 kN', () => {
		const r = largestQk('en1990-6.10ab');
		expectRel(r.qk, 65.34, 1e-3);
		expect(r.name.startsWith('6.10a')).toBe(true);
	});

	it('6.10a/b with ψ0 = 0.7 allows 66.96 kN (6.10b governs; 6.10a alone would give 93.35 kN)', () => {
		const r = largestQk('en1990-6.10ab', { psi0T: 0.7 });
		expectRel(r.qk, 66.96, 1e-3);
		expect(r.name.startsWith('6.10b')).toBe(true);
	});

	it('with ξ = 0.925 (a National Annex value, from memory) and ψ0 = 0.7, 6.10b gives 66.15 kN', () => {
		expectRel(largestQk('en1990-6.10ab', { xi: 0.925, psi0T: 0.7 }).qk, 66.15, 1e-3);
	});
});

describe('load patterns (EN 1990 A1.3.1, single-source permanent load)', () => {
	it('lists 2 permanent factors × 2^k imposed patterns per combination', () => {
		const f = resolveFactors({ set: 'en1990-6.10' }, { hasImposed: true });
		const all = listLoadArrangements({
			combinations: f.combinations,
			spanCount: 3,
			imposedSpans: [0, 1, 2]
		});
		expect(all).toHaveLength(2 * 2 * 8);
		expect(new Set(all.map((a) => a.name)).size).toBe(all.length);
	});

	it('puts imposed load only on the spans of the pattern and permanent load everywhere', () => {
		const f = resolveFactors(
			{ set: 'custom', gammaGsup: 1.2, gammaGinf: 0.9, gammaQ: 1.6 },
			{ hasImposed: true }
		);
		const arrangement = listLoadArrangements({
			combinations: f.combinations,
			spanCount: 2,
			imposedSpans: [0, 1]
		}).find((a) => a.imposedBySpan[0] === 0 && a.imposedBySpan[1] > 0 && a.permanent === 'inf')!;
		const d = applyArrangement({
			loads: [
				{ kind: 'uniform', from: 0, to: 8000, value: 2, action: 'imposed' },
				{ kind: 'uniform', from: 0, to: 8000, value: 1, action: 'permanent' }
			],
			spans: [4000, 4000],
			arrangement
		});
		expect(d.fixed).toEqual([
			{ kind: 'uniform', from: 4000, to: 8000, value: 2 * 1.6, action: 'imposed' },
			{ kind: 'uniform', from: 0, to: 8000, value: 0.9, action: 'permanent' }
		]);
	});
});
