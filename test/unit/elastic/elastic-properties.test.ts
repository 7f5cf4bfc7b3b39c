/**
 * Invariants of linear elastic beam analysis (any structural analysis textbook): equilibrium of
 * the reactions with the loads, superposition, mirror symmetry and Maxwell–Betti reciprocity
 * (J.C. Maxwell 1864, E. Betti 1872; statement from memory). Random stable beams and loads.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseElastic, firstHingeFactor } from '../../../src/lib/engine/elastic/index';
import type { BeamLine, Load } from '../../../src/lib/engine/model/types';
import { loadsOn, stableBeam, sumLoads } from './arbitraries';

const total = (beam: BeamLine): number => beam.spans.reduce((s, L) => s + L, 0);
const solve = (beam: BeamLine, EI: number[], loads: Load[]) => {
	const r = analyseElastic({ beam, EI, loads });
	if (!r.ok) throw new Error('stable beam reported as mechanism');
	return r.value;
};
const caseArb = stableBeam.chain(({ beam, EI }) =>
	fc
		.record({ loads: loadsOn(total(beam)), other: loadsOn(total(beam)) })
		.map((l) => ({ beam, EI, ...l }))
);
const unitFraction = fc.double({ min: 0, max: 1, noNaN: true });
const closeTo = (a: number, b: number, scale: number, rel = 1e-8): boolean =>
	Math.abs(a - b) <= rel * scale;

describe('elastic analysis invariants', () => {
	it('reactions balance the loads: ΣR = ΣF and moments about the left end vanish', () => {
		fc.assert(
			fc.property(caseArb, ({ beam, EI, loads }) => {
				const r = solve(beam, EI, loads);
				const { force, moment } = sumLoads(loads);
				const scale = sumLoads(loads.map(absLoad)).force + 1;
				const R = r.reactions.reduce((s, n) => s + n.force, 0);
				const MR = r.reactions.reduce((s, n) => s + n.force * n.x + n.moment, 0);
				expect(closeTo(R, force, scale)).toBe(true);
				expect(closeTo(MR, moment, scale * total(beam))).toBe(true);
			})
		);
	});

	it('superposition: the response to two load sets is the sum of the responses', () => {
		fc.assert(
			fc.property(caseArb, fc.double({ min: 0, max: 1, noNaN: true }), (c, t) => {
				const x = t * total(c.beam);
				const a = solve(c.beam, c.EI, c.loads).at(x);
				const b = solve(c.beam, c.EI, c.other).at(x);
				const ab = solve(c.beam, c.EI, [...c.loads, ...c.other]).at(x);
				// Scales from the load magnitudes, so cancelling loads do not shrink the tolerance.
				const F = sumLoads([...c.loads, ...c.other].map(absLoad)).force + 1;
				const Lt = total(c.beam);
				const mScale = F * Lt;
				const wScale = (F * Lt ** 3) / Math.min(...c.EI);
				expect(closeTo(ab.M, a.M + b.M, mScale)).toBe(true);
				expect(closeTo(ab.w, a.w + b.w, wScale)).toBe(true);
			})
		);
	});

	it('mirror symmetry: reversing the beam and loads reverses the results', () => {
		fc.assert(
			fc.property(caseArb, fc.double({ min: 0, max: 1, noNaN: true }), (c, t) => {
				const Lt = total(c.beam);
				const mirrored: BeamLine = {
					spans: [...c.beam.spans].reverse(),
					supports: [...c.beam.supports].reverse(),
					joints: [...c.beam.joints].reverse()
				};
				const r = solve(c.beam, c.EI, c.loads);
				const m = solve(
					mirrored,
					[...c.EI].reverse(),
					c.loads.map((l) => mirrorLoad(l, Lt))
				);
				const x = t * Lt;
				const fScale = sumLoads(c.loads.map(absLoad)).force + 1;
				expect(closeTo(m.at(Lt - x, 'left').M, r.at(x, 'right').M, fScale * Lt)).toBe(true);
				const reversed = [...m.reactions].reverse();
				r.reactions.forEach((n, i) => {
					expect(closeTo(reversed[i].force, n.force, fScale)).toBe(true);
				});
			})
		);
	});

	it('Maxwell–Betti: deflection at j from a unit load at i equals deflection at i from one at j', () => {
		fc.assert(
			fc.property(stableBeam, unitFraction, unitFraction, ({ beam, EI }, s, t) => {
				const xi = Math.round(s * total(beam));
				const xj = Math.round(t * total(beam));
				const unit = (x: number): Load[] => [{ kind: 'point', x, value: 1, action: 'temporary' }];
				const wij = solve(beam, EI, unit(xi)).at(xj).w;
				const wji = solve(beam, EI, unit(xj)).at(xi).w;
				const scale = total(beam) ** 3 / Math.min(...EI); // order of a unit-load deflection
				expect(closeTo(wij, wji, scale)).toBe(true);
			})
		);
	});

	it('first-hinge factor puts the peak |M| exactly at the limit', () => {
		fc.assert(
			fc.property(caseArb, ({ beam, EI, loads, other }) => {
				const limit = beam.spans.map(() => 5e8);
				const res = firstHingeFactor({
					beam,
					EI,
					fixedLoads: other,
					variableLoads: loads,
					plasticResistance: limit
				});
				if (res.status !== 'reached') return;
				const scaled = loads.map((l) => scaleLoad(l, res.factor));
				const r = solve(beam, EI, [...other, ...scaled]);
				const { maxSagging, maxHogging } = r.maxMoment;
				const peak = Math.max(Math.abs(maxSagging?.value ?? 0), Math.abs(maxHogging?.value ?? 0));
				expect(closeTo(peak, 5e8, 5e8, 1e-7)).toBe(true);
			})
		);
	});
});

function absLoad(l: Load): Load {
	if (l.kind === 'point') return { ...l, value: Math.abs(l.value) };
	if (l.kind === 'uniform') return { ...l, value: Math.abs(l.value) };
	return { ...l, start: Math.abs(l.start), end: Math.abs(l.end) };
}

function scaleLoad(l: Load, k: number): Load {
	if (l.kind === 'point') return { ...l, value: l.value * k };
	if (l.kind === 'uniform') return { ...l, value: l.value * k };
	return { ...l, start: l.start * k, end: l.end * k };
}

function mirrorLoad(l: Load, Lt: number): Load {
	if (l.kind === 'point') return { ...l, x: Lt - l.x };
	if (l.kind === 'uniform') return { ...l, from: Lt - l.to, to: Lt - l.from };
	return { ...l, from: Lt - l.to, to: Lt - l.from, start: l.end, end: l.start };
}
