/**
 * Invariants of the general Mcr method (Rayleigh–Ritz on the energy of lateral-torsional
 * buckling, Timoshenko & Gere, Theory of Elastic Stability, ch. 6):
 * - uniform moment reproduces the closed form Mcr = (π/L)√(EIz·GIt)·√(1 + π²EIw/(L²GIt)) for
 *   any length and stiffnesses;
 * - Mcr does not depend on the size of the loads (linear eigenproblem) nor on mirroring the
 *   segment end for end;
 * - a non-uniform moment diagram never buckles at a lower peak moment than uniform moment
 *   (C1 ≥ 1, e.g. ENV 1993-1-1 Annex F, from memory);
 * - loads above the shear centre lower Mcr, loads below raise it.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeCriticalMoment } from '../../src/lib/engine/checks/mcr';
import type { LtbSegment } from '../../src/lib/engine/checks/segment-moment';

const E = 210_000;
const G = 81_000;
const props = fc.record({
	L: fc.double({ min: 1500, max: 12000, noNaN: true }),
	Iz: fc.double({ min: 1e6, max: 5e7, noNaN: true }),
	It: fc.double({ min: 5e4, max: 2e6, noNaN: true }),
	Iw: fc.double({ min: 1e10, max: 2e12, noNaN: true })
});
const stiff = (p: { Iz: number; It: number; Iw: number }) => ({
	EIz: E * p.Iz,
	GIt: G * p.It,
	EIw: E * p.Iw
});
const closed = (p: { L: number; Iz: number; It: number; Iw: number }) =>
	(Math.PI / p.L) *
	Math.sqrt(E * p.Iz * G * p.It) *
	Math.sqrt(1 + (Math.PI ** 2 * E * p.Iw) / (p.L * p.L * G * p.It));

describe('Mcr invariants', () => {
	it('uniform moment equals the closed form', () => {
		fc.assert(
			fc.property(props, fc.double({ min: 1e5, max: 1e9, noNaN: true }), (p, m) => {
				const seg: LtbSegment = { length: p.L, momentStart: m, momentEnd: m, loads: [] };
				const r = computeCriticalMoment({ segment: seg, ...stiff(p), zg: 0 })!;
				expect(Math.abs(r.mcr / closed(p) - 1)).toBeLessThan(1e-8);
			}),
			{ numRuns: 30 }
		);
	});

	it('is independent of load size and of mirroring, and C1 ≥ 1', () => {
		fc.assert(
			fc.property(
				props,
				fc.double({ min: 0.05, max: 0.95, noNaN: true }),
				fc.double({ min: -1, max: 1, noNaN: true }),
				fc.double({ min: 0.1, max: 10, noNaN: true }),
				(p, a, psi, k) => {
					const seg: LtbSegment = {
						length: p.L,
						momentStart: -20e6,
						momentEnd: psi * 20e6,
						loads: [
							{ kind: 'point', x: a * p.L, value: 30e3 },
							{ kind: 'line', from: 0, to: p.L, start: 2, end: 5 }
						]
					};
					const scaled: LtbSegment = {
						...seg,
						momentStart: k * seg.momentStart,
						momentEnd: k * seg.momentEnd,
						loads: [
							{ kind: 'point', x: a * p.L, value: k * 30e3 },
							{ kind: 'line', from: 0, to: p.L, start: 2 * k, end: 5 * k }
						]
					};
					const mirrored: LtbSegment = {
						length: p.L,
						momentStart: seg.momentEnd,
						momentEnd: seg.momentStart,
						loads: [
							{ kind: 'point', x: (1 - a) * p.L, value: 30e3 },
							{ kind: 'line', from: 0, to: p.L, start: 5, end: 2 }
						]
					};
					const base = computeCriticalMoment({ segment: seg, ...stiff(p), zg: 0 })!.mcr;
					expect(
						Math.abs(computeCriticalMoment({ segment: scaled, ...stiff(p), zg: 0 })!.mcr / base - 1)
					).toBeLessThan(1e-8);
					expect(
						Math.abs(
							computeCriticalMoment({ segment: mirrored, ...stiff(p), zg: 0 })!.mcr / base - 1
						)
					).toBeLessThan(1e-6);
					expect(base / closed(p)).toBeGreaterThan(1 - 1e-9);
				}
			),
			{ numRuns: 20 }
		);
	});

	it('top-flange load < shear centre < bottom-flange load', () => {
		fc.assert(
			fc.property(
				props,
				fc.double({ min: 100, max: 600, noNaN: true }),
				fc.double({ min: 0.1, max: 0.9, noNaN: true }),
				(p, h, a) => {
					const seg: LtbSegment = {
						length: p.L,
						momentStart: 0,
						momentEnd: 0,
						loads: [
							{ kind: 'point', x: a * p.L, value: 10e3 },
							{ kind: 'line', from: 0, to: p.L, start: 3, end: 3 }
						]
					};
					const at = (zg: number) => computeCriticalMoment({ segment: seg, ...stiff(p), zg })!.mcr;
					expect(at(h / 2)).toBeLessThan(at(0));
					expect(at(-h / 2)).toBeGreaterThan(at(0));
				}
			),
			{ numRuns: 20 }
		);
	});
});
