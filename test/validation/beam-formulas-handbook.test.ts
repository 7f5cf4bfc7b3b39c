/**
 * Elastic beam formulas as tabulated in the standard handbooks: W.C. Young & R.G. Budynas,
 * "Roark's Formulas for Stress and Strain" (7th ed.), Table 8.1 (shear, moment and deflection
 * of straight beams), and the AISC Steel Construction Manual, "Beam Diagrams and Formulas"
 * (Table 3-23). Table and case numbers are from memory; every closed form below is also
 * re-derivable by double integration of M/EI and is computed inside the test. The three-moment equation is
 * Clapeyron's (e.g. S. Timoshenko & D.H. Young, "Theory of Structures", from memory).
 * Inputs are invented round numbers.
 */
import { describe, expect, it } from 'vitest';
import { analyseElastic } from '../../src/lib/engine/elastic/index';
import type { BeamLine, Load } from '../../src/lib/engine/model/types';
import { E_STEEL } from '../../src/lib/engine/units';
import { expectRel as expectRelWithin } from '../support/expect-rel';

const EI = E_STEEL * 8.5e7; // N·mm², an I of 8500 cm⁴ (invented)
const L = 6000; // mm
const w = 4; // N/mm = kN/m
const P = 10_000; // N

// Absolute slack for moments and deflections that are exactly zero at supports.
const expectRel = (actual: number, expected: number, rel = 1e-9): void =>
	expectRelWithin(actual, expected, rel, { absolute: 1e-9 });
const udl = (from: number, to: number, value = w): Load => ({
	kind: 'uniform',
	from,
	to,
	value,
	action: 'permanent'
});
const point = (x: number, value = P): Load => ({ kind: 'point', x, value, action: 'permanent' });
const solve = (beam: BeamLine, loads: Load[], stiffness: number[] = beam.spans.map(() => EI)) => {
	const r = analyseElastic({ beam, EI: stiffness, loads });
	if (!r.ok) throw new Error(r.issues[0].message);
	return r.value;
};
const single = (a: 'pin' | 'fixed' | 'free', b: 'pin' | 'fixed' | 'free'): BeamLine => ({
	spans: [L],
	supports: [a, b],
	joints: []
});

describe('simply supported span', () => {
	it('UDL: 5wL⁴/384EI at midspan, wL²/8, reactions wL/2 (Roark Table 8.1 case 2e; AISC 3-23 case 1)', () => {
		const r = solve(single('pin', 'pin'), [udl(0, L)]);
		expectRel(r.maxDeflection.overall.value, (5 * w * L ** 4) / (384 * EI));
		expectRel(r.maxDeflection.overall.x, L / 2, 1e-6);
		expectRel(r.maxMoment.maxSagging!.value, (w * L * L) / 8);
		expectRel(r.reactions[0].force, (w * L) / 2);
		expect(r.maxMoment.maxHogging).toBeNull();
	});

	it('point load at a: M = Pab/L, δmax = Pb(L²−b²)^1.5/(9√3·L·EI) at √((L²−b²)/3) (AISC 3-23 case 8)', () => {
		const a = 4000;
		const b = L - a;
		const r = solve(single('pin', 'pin'), [point(a)]);
		expectRel(r.maxMoment.maxSagging!.value, (P * a * b) / L);
		expectRel(r.reactions[0].force, (P * b) / L);
		const deltaMax = (P * b * (L * L - b * b) ** 1.5) / (9 * Math.sqrt(3) * L * EI);
		expectRel(r.maxDeflection.overall.value, deltaMax);
		expectRel(r.maxDeflection.overall.x, Math.sqrt((L * L - b * b) / 3), 1e-6);
		// Shear jumps by P under the load (statics).
		expectRel(r.at(a, 'left').V - r.at(a, 'right').V, P);
	});

	it('triangular load 0 → q: δ(x) = qx(7L⁴ − 10L²x² + 3x⁴)/(360·EI·L), Mmax = qL²/(9√3) (AISC 3-23 case 2)', () => {
		const q = 6;
		const r = solve(single('pin', 'pin'), [
			{ kind: 'linear', from: 0, to: L, start: 0, end: q, action: 'imposed' }
		]);
		const delta = (x: number) =>
			(q * x * (7 * L ** 4 - 10 * L * L * x * x + 3 * x ** 4)) / (360 * EI * L);
		for (const x of [1000, 2500, 3117, 5500]) expectRel(r.at(x).w, delta(x));
		expectRel(r.maxMoment.maxSagging!.value, (q * L * L) / (9 * Math.sqrt(3)));
		expectRel(r.maxMoment.maxSagging!.x, L / Math.sqrt(3), 1e-9);
		expectRel(r.reactions[0].force, (q * L) / 6);
		expectRel(r.reactions[1].force, (q * L) / 3);
	});
});

describe('cantilever (fixed at x = 0)', () => {
	it('tip load: PL³/3EI, root moment −PL (Roark Table 8.1 case 1a)', () => {
		const r = solve(single('fixed', 'free'), [point(L)]);
		expectRel(r.maxDeflection.overall.value, (P * L ** 3) / (3 * EI));
		expectRel(r.reactions[0].beamMoment, -P * L);
		expectRel(r.reactions[0].force, P);
	});

	it('UDL: wL⁴/8EI, root moment −wL²/2 (Roark Table 8.1 case 2a)', () => {
		const r = solve(single('fixed', 'free'), [udl(0, L)]);
		expectRel(r.maxDeflection.overall.value, (w * L ** 4) / (8 * EI));
		expectRel(r.maxMoment.maxHogging!.value, (-w * L * L) / 2);
	});
});

describe('fixed–fixed span', () => {
	it('UDL: end moments −wL²/12, midspan wL²/24, δ = wL⁴/384EI (AISC 3-23 case 15)', () => {
		const r = solve(single('fixed', 'fixed'), [udl(0, L)]);
		expectRel(r.reactions[0].beamMoment, (-w * L * L) / 12);
		expectRel(r.reactions[1].beamMoment, (-w * L * L) / 12);
		expectRel(r.maxMoment.maxSagging!.value, (w * L * L) / 24);
		expectRel(r.maxDeflection.overall.value, (w * L ** 4) / (384 * EI));
	});
});

describe('propped cantilever (fixed at x = 0, pin at L)', () => {
	it('UDL: δmax = 0.005416wL⁴/EI at 0.4215L from the pin, fixed-end moment wL²/8 (AISC 3-23 case 12)', () => {
		const r = solve(single('fixed', 'pin'), [udl(0, L)]);
		// Exact: slope zero at ξ = (1 + √33)/16 from the pin; δ = wL⁴(39 + 55√33)/(65536·EI).
		const xi = (1 + Math.sqrt(33)) / 16;
		const exact = (w * L ** 4 * (39 + 55 * Math.sqrt(33))) / (65536 * EI);
		expectRel(r.maxDeflection.overall.value, exact);
		// The handbook's rounded coefficient, within its rounding.
		expectRel(r.maxDeflection.overall.value, (0.005416 * w * L ** 4) / EI, 1e-4);
		expectRel(L - r.maxDeflection.overall.x, xi * L, 1e-6);
		expectRel(r.reactions[0].beamMoment, (-w * L * L) / 8);
		expectRel(r.reactions[1].force, (3 * w * L) / 8);
	});

	it('central W: 3WL/16 at the fixed end, 5WL/32 under the load, WL³/(48√5·EI) at L/√5 from the pin (AISC 3-23 case 13)', () => {
		const r = solve(single('fixed', 'pin'), [point(L / 2)]);
		expectRel(r.reactions[0].beamMoment, (-3 * P * L) / 16);
		expectRel(r.at(L / 2).M, (5 * P * L) / 32);
		expectRel(r.maxDeflection.overall.value, (P * L ** 3) / (48 * Math.sqrt(5) * EI));
		expectRel(L - r.maxDeflection.overall.x, L / Math.sqrt(5), 1e-6);
	});
});

describe('continuous beams', () => {
	it('two equal spans, UDL: support moment −wL²/8, reactions 3/8, 10/8, 3/8 wL (AISC 3-23 case 29)', () => {
		const beam: BeamLine = {
			spans: [L, L],
			supports: ['pin', 'pin', 'pin'],
			joints: ['continuous']
		};
		const r = solve(beam, [udl(0, 2 * L)]);
		expectRel(r.reactions[1].beamMoment, (-w * L * L) / 8);
		expectRel(r.reactions[0].force, (3 * w * L) / 8);
		expectRel(r.reactions[1].force, (10 * w * L) / 8);
		expectRel(r.reactions[2].force, (3 * w * L) / 8);
	});

	it('unequal spans and stiffnesses: three-moment equation 2M_B(L1/I1 + L2/I2) = −w(L1³/I1 + L2³/I2)/4', () => {
		const [L1, L2] = [5000, 8000];
		const [EI1, EI2] = [EI, 2.5 * EI];
		const beam: BeamLine = {
			spans: [L1, L2],
			supports: ['pin', 'pin', 'pin'],
			joints: ['continuous']
		};
		const r = solve(beam, [udl(0, L1 + L2)], [EI1, EI2]);
		const MB = -(w * (L1 ** 3 / EI1 + L2 ** 3 / EI2)) / (8 * (L1 / EI1 + L2 / EI2));
		expectRel(r.reactions[1].beamMoment, MB);
		// End reaction of span 1 by statics of that span with M_B known.
		expectRel(r.reactions[0].force, (w * L1) / 2 + MB / L1);
	});

	it('a simple internal joint acts as a hinge (Gerber beam): cantilever carries the hinge shear', () => {
		// Fixed at 0, hinge at a without support, pin at a + b; load W at the middle of span 2.
		const [a, b] = [2000, 5000];
		const beam: BeamLine = {
			spans: [a, b],
			supports: ['fixed', 'free', 'pin'],
			joints: ['simple']
		};
		const r = solve(beam, [point(a + b / 2)]);
		// Statics: span 2 is simply supported on the hinge and the pin, so the hinge shear is W/2;
		// the cantilever root moment is −(W/2)·a and the hinge deflects (W/2)a³/3EI (Roark 1a).
		expectRel(r.reactions[0].beamMoment, (-P / 2) * a);
		expect(Math.abs(r.at(a).M)).toBeLessThan(1e-9 * P * a);
		expectRel(r.at(a).w, ((P / 2) * a ** 3) / (3 * EI));
		expectRel(r.reactions[2].force, P / 2);
	});
});
