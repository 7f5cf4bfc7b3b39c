/**
 * EN 1993-1-5:2006 section 6, resistance of webs to transverse forces, for unstiffened webs
 * (stiffener spacing a → ∞), and the interaction with bending of 7.2(1). Equation numbers are
 * recalled from memory of the 2006 text: FRd = fyw·Leff·tw/γM1 (6.1), Leff = χF·ly (6.2),
 * χF = 0.5/λ̄F ≤ 1 (6.3), λ̄F = √(ly·tw·fyw/Fcr) (6.4), Fcr = 0.9·kF·E·tw³/hw (6.5), kF of
 * Figure 6.1 (6.4(1)) = 6 + 2(hw/a)² (a), 3.5 + 2(hw/a)² (b), 2 + 6(ss + c)/hw ≤ 6 (c),
 * m1 = fyf·bf/(fyw·tw) (6.8), m2 = 0.02(hw/tf)² if λ̄F > 0.5 else 0 (6.9),
 * ly = ss + 2tf(1 + √(m1 + m2)) (6.10), for (c) the least of (6.10), (6.11) and (6.12) with
 * le of (6.13); ss ≤ hw (6.3); η2 = FEd/FRd (6.14); η2 + 0.8·η1 ≤ 1.4 (7.2). The closed forms are
 * evaluated here. Sections: 305x165x40 UB, 254x254x73 UC and 457x191x67 UB, BS 4-1:2005
 * dimensions (from memory, as in the section tables).
 */
import { describe, expect, it } from 'vitest';
import { computeWebResistance } from '../../src/lib/engine/checks/en1993/web';
import type { DesignCheckInput } from '../../src/lib/engine/checks/inputs';
import { runDesignChecks } from '../../src/lib/engine/checks/run-checks';
import type { CheckResult } from '../../src/lib/engine/checks/types';
import { resolveGrade } from '../../src/lib/engine/material/index';
import type { BeamLine, Load } from '../../src/lib/engine/model/types';
import { resolveSection } from '../../src/lib/engine/section/index';
import { expectRel } from '../support/expect-rel';

const E = 210_000;
const ub = { hw: 303.4 - 2 * 10.2, tw: 6, bf: 165, tf: 10.2, fyw: 275, fyf: 275, E, gammaM1: 1 };
const uc = {
	hw: 254.1 - 2 * 14.2,
	tw: 8.6,
	bf: 254.6,
	tf: 14.2,
	fyw: 275,
	fyf: 275,
	E,
	gammaM1: 1
};

/** Independent evaluation of 6.1–6.10 for types (a) and (b). */
function byHand(s: typeof ub, kF: number, ss: number) {
	const fCr = (0.9 * kF * E * s.tw ** 3) / s.hw;
	const m1 = (s.fyf * s.bf) / (s.fyw * s.tw);
	const ly = (m2: number) => ss + 2 * s.tf * (1 + Math.sqrt(m1 + m2));
	const lam = (l: number) => Math.sqrt((l * s.tw * s.fyw) / fCr);
	let l = ly(0.02 * (s.hw / s.tf) ** 2);
	if (lam(l) <= 0.5) l = ly(0);
	const chi = Math.min(1, 0.5 / lam(l));
	return { fCr, ly: l, lambdaF: lam(l), fRd: s.fyw * chi * l * s.tw };
}

describe('type (a): point load through one flange, resisted by web shear', () => {
	it('305x165x40 UB, ss = 50 mm: λ̄F > 0.5 so m2 counts; FRd ≈ 270 kN', () => {
		const r = computeWebResistance({ ...ub, type: 'a', ss: 50 });
		const hand = byHand(ub, 6, 50);
		expect(r.kF).toBe(6);
		expectRel(r.fCr, hand.fCr, 1e-12);
		expectRel(r.ly, hand.ly, 1e-12);
		expect(r.lambdaF).toBeGreaterThan(0.5);
		expectRel(r.m2, 0.02 * (ub.hw / ub.tf) ** 2, 1e-12);
		expectRel(r.fRd, hand.fRd, 1e-12);
		expectRel(r.fRd, 270e3, 5e-3);
	});

	it('254x254x73 UC, ss = 100 mm: λ̄F ≤ 0.5, so m2 = 0 and χF = 1 (no reduction)', () => {
		const r = computeWebResistance({ ...uc, type: 'a', ss: 100 });
		const hand = byHand(uc, 6, 100);
		expect(r.m2).toBe(0);
		expect(r.chiF).toBe(1);
		expectRel(r.fRd, hand.fRd, 1e-12);
		expectRel(r.fRd, uc.fyw * r.ly * uc.tw, 1e-12);
	});

	it('takes ss no longer than hw', () => {
		const capped = computeWebResistance({ ...ub, type: 'a', ss: 10 * ub.hw });
		const atHw = computeWebResistance({ ...ub, type: 'a', ss: ub.hw });
		expect(capped.fRd).toBe(atHw.fRd);
	});
});

describe('type (b): load passed straight through the web', () => {
	it('uses kF = 3.5 and the same ly as (a)', () => {
		const r = computeWebResistance({ ...ub, type: 'b', ss: 50 });
		const hand = byHand(ub, 3.5, 50);
		expect(r.kF).toBe(3.5);
		expectRel(r.fRd, hand.fRd, 1e-12);
		expect(r.fRd).toBeLessThan(computeWebResistance({ ...ub, type: 'a', ss: 50 }).fRd);
	});
});

describe('type (c): load next to an unstiffened end', () => {
	it('kF = 2 + 6(ss + c)/hw, capped at 6; ly the least of 6.10, 6.11 and 6.12', () => {
		const ss = 100;
		const r = computeWebResistance({ ...ub, type: 'c', ss, c: 0 });
		const kF = 2 + (6 * ss) / ub.hw;
		expectRel(r.kF, kF, 1e-12);
		const fCr = (0.9 * kF * E * ub.tw ** 3) / ub.hw;
		const m1 = (ub.fyf * ub.bf) / (ub.fyw * ub.tw);
		const m2 = r.lambdaF > 0.5 ? 0.02 * (ub.hw / ub.tf) ** 2 : 0;
		const le = Math.min((kF * E * ub.tw ** 2) / (2 * ub.fyw * ub.hw), ss);
		const ly = Math.min(
			ss + 2 * ub.tf * (1 + Math.sqrt(m1 + m2)),
			le + ub.tf * Math.sqrt(m1 / 2 + (le / ub.tf) ** 2 + m2),
			le + ub.tf * Math.sqrt(m1 + m2)
		);
		expectRel(r.fCr, fCr, 1e-12);
		expectRel(r.ly, ly, 1e-12);
		expect(computeWebResistance({ ...ub, type: 'c', ss: 200, c: 400 }).kF).toBe(6);
	});

	it('an end bearing is weaker than the same bearing away from the end', () => {
		const end = computeWebResistance({ ...ub, type: 'c', ss: 100, c: 0 }).fRd;
		const inner = computeWebResistance({ ...ub, type: 'a', ss: 100 }).fRd;
		expect(end).toBeLessThan(inner);
	});
});

describe('γM1', () => {
	it('divides the resistance', () => {
		const a = computeWebResistance({ ...ub, type: 'a', ss: 50 }).fRd;
		const b = computeWebResistance({ ...ub, type: 'a', ss: 50, gammaM1: 1.1 }).fRd;
		expectRel(b, a / 1.1, 1e-12);
	});
});

/*
 * Load type by where the force stands, on an invented 457x191x67 UB in S275 (h 453.4, b 189.9,
 * tw 8.5, tf 12.7 mm; fy = 275 N/mm² for tf ≤ 16 mm, EN 10025-2), stiff bearing ss = 40 mm
 * centred on each point load, γM1 = 1.0, E = 210 000 N/mm². Every number below is worked from
 * the equations in the header, with the arithmetic written out.
 */
const hw = 453.4 - 2 * 12.7; // = 428.0 mm
const tw = 8.5;
const tf = 12.7;
const fy = 275;
const ss = 40;
// m1 = fyf·bf/(fyw·tw) = 189.9/8.5 = 22.341 (6.8); m2 = 0.02·(428/12.7)² = 22.715 (6.9).
const m1 = (fy * 189.9) / (fy * tw);
const m2 = 0.02 * (hw / tf) ** 2;
// ly (6.10) = 40 + 2·12.7·(1 + √(22.341 + 22.715)) = 40 + 25.4·7.7124 = 235.89 mm (m2 counts
// for every type here: each λ̄F below is above 0.5).
const ly10 = ss + 2 * tf * (1 + Math.sqrt(m1 + m2));
/** Fcr (6.5), λ̄F (6.4), χF (6.3) and FRd = fyw·χF·ly·tw/γM1 (6.1, 6.2) for kF and ly. */
function resist(kF: number, ly: number) {
	const fCr = (0.9 * kF * E * tw ** 3) / hw;
	const lambdaF = Math.sqrt((ly * tw * fy) / fCr);
	const chiF = Math.min(1, 0.5 / lambdaF);
	return { fCr, lambdaF, chiF, fRd: fy * chiF * ly * tw };
}

// (a): kF = 6; Fcr = 0.9·6·210000·8.5³/428 = 1 627 144 N; λ̄F = √(235.89·8.5·275/1 627 144)
// = 0.5821; χF = 0.8589; FRd = 275·0.8589·235.89·8.5 = 473.6 kN.
const typeA = resist(6, ly10);
// (b): kF = 3.5; Fcr = 949 167 N; λ̄F = 0.7622; χF = 0.6560; FRd = 361.7 kN.
const typeB = resist(3.5, ly10);
// (c), load 100 mm from the end: c = 100 − 40/2 = 80 mm; kF = 2 + 6·(40 + 80)/428 = 3.6822;
// le = 3.6822·210000·8.5²/(2·275·428) = 237.34 mm, capped at ss + c = 120 mm (6.13);
// ly (6.11) = 120 + 12.7·√(22.341/2 + (120/12.7)² + 22.715) = 260.94 mm;
// ly (6.12) = 120 + 12.7·√(22.341 + 22.715) = 205.25 mm, the least of the three;
// Fcr = 0.9·3.6822·210000·8.5³/428 = 998 590 N; λ̄F = √(205.25·8.5·275/998 590) = 0.6931;
// χF = 0.7214; FRd = 275·0.7214·205.25·8.5 = 346.1 kN.
const kFc = 2 + (6 * (ss + 80)) / hw;
const le = Math.min((kFc * E * tw ** 2) / (2 * fy * hw), ss + 80);
const lyC = Math.min(
	ly10,
	le + tf * Math.sqrt(m1 / 2 + (le / tf) ** 2 + m2),
	le + tf * Math.sqrt(m1 + m2)
);
const typeC = resist(kFc, lyC);

function member() {
	const s = resolveSection({ designation: 'UB 457x191x67' }, { loss: 0 });
	if (!s.ok) throw new Error('section');
	const g = resolveGrade('S275', s.value.governingThickness);
	if (!g.ok) throw new Error('grade');
	return { section: s.value, grade: g.value };
}

function run(beam: BeamLine, loads: Load[], supportBearing: number) {
	const m = member();
	const input: DesignCheckInput = {
		beam,
		sections: beam.spans.map(() => m.section),
		grades: beam.spans.map(() => m.grade),
		loads,
		factors: { set: 'en1990-6.10' },
		restraint: null,
		loadHeight: 'shear-centre',
		bearing: { supports: beam.supports.map(() => supportBearing), loads: ss }
	};
	return runDesignChecks(input);
}

const webRow = (checks: CheckResult[], name: string) =>
	checks.find((c) => c.id === 'web' && c.label.includes(`${name} (`))!;

/** A cantilever 600 mm long beyond a 4 m back span, one temporary load 100 mm from its tip. */
const cantilever = (q: number) =>
	run(
		{ spans: [4000, 600], supports: ['pin', 'pin', 'free'], joints: ['continuous'] },
		[{ kind: 'point', x: 4500, value: q, action: 'temporary' }],
		150
	);

describe('load type chosen by where the force stands (EN 1993-1-5 6.4, Figure 6.1)', () => {
	it('the hand values of the three types', () => {
		expectRel(hw, 428.0, 1e-12);
		expectRel(m1, 22.341, 1e-4);
		expectRel(m2, 22.715, 1e-4);
		expectRel(ly10, 235.89, 1e-4);
		expectRel(typeA.fCr, 1_627_144, 1e-6);
		expectRel(typeA.fRd, 473.6e3, 1e-3);
		expectRel(typeB.fRd, 361.7e3, 1e-3);
		expectRel(kFc, 3.6822, 1e-4);
		expectRel(le, 120, 1e-12);
		expectRel(lyC, 205.25, 1e-4);
		expectRel(typeC.fRd, 346.1e3, 1e-3);
		for (const r of [typeA, typeB, typeC]) expect(r.lambdaF).toBeGreaterThan(0.5);
	});

	it('(i) a load 100 mm from a free cantilever tip: type (c), c = 80 mm, FRd = 346.1 kN', () => {
		const row = webRow(cantilever(100e3).checks, 'point load 1');
		expect(row.label).toBe('Web under point load 1 (type c, near the free end)');
		expect(row.values.c).toBe(80);
		expectRel(row.values.kF, kFc, 1e-12);
		expectRel(row.values.ly, lyC, 1e-12);
		expectRel(row.values.fRd, typeC.fRd, 1e-12);
	});

	it('(ii) a load 100 mm from a supported end is type (c), c = 80 mm: FRd = 346.1 kN', () => {
		const out = run(
			{ spans: [6000], supports: ['pin', 'pin'], joints: [] },
			[{ kind: 'point', x: 100, value: 100e3, action: 'temporary' }],
			40
		);
		const row = webRow(out.checks, 'point load 1');
		expect(row.label).toBe('Web under point load 1 (type c, near the supported end)');
		expectRel(row.values.fRd, typeC.fRd, 1e-12);
	});

	it('(iii) a load over an interior support is type (b), kF = 3.5: FRd = 361.7 kN', () => {
		const out = run(
			{ spans: [3000, 3000], supports: ['pin', 'pin', 'pin'], joints: ['continuous'] },
			[{ kind: 'point', x: 3000, value: 100e3, action: 'temporary' }],
			40
		);
		const row = webRow(out.checks, 'support 2');
		expect(row.label).toBe('Web at support 2 (type b, load over the support)');
		expect(row.values.kF).toBe(3.5);
		expectRel(row.values.fRd, typeB.fRd, 1e-12);
		// The load and the reaction are one row: the load is not checked again as type (a).
		expect(out.checks.some((c) => c.label.includes('point load'))).toBe(false);
	});

	it('(iv) a load at mid-span is type (a), kF = 6: FRd = 473.6 kN', () => {
		const out = run(
			{ spans: [6000], supports: ['pin', 'pin'], joints: [] },
			[{ kind: 'point', x: 3000, value: 100e3, action: 'temporary' }],
			40
		);
		const row = webRow(out.checks, 'point load 1');
		expect(row.label).toBe('Web under point load 1 (type a)');
		expectRel(row.values.fRd, typeA.fRd, 1e-12);
	});

	it('(a) would be 36.8 % higher near the tip, √(6/3.5) − 1 = 30.9 % over a support', () => {
		// With χF < 1, FRd = 0.5·√(fyw·tw·ly·Fcr) (6.1–6.4), so at equal ly the (a)/(b) ratio is
		// √(kF,a/kF,b) = √(6/3.5) = 1.3093; near the tip ly and kF both drop: 473.6/346.1 = 1.368.
		expectRel(typeA.fRd / typeB.fRd, Math.sqrt(6 / 3.5), 1e-12);
		expectRel(typeA.fRd / typeC.fRd, 473.6 / 346.1, 1e-3);
		expect(1 - typeC.fRd / typeA.fRd).toBeGreaterThan(0.25);
		expect(1 - typeB.fRd / typeA.fRd).toBeGreaterThan(0.23);
	});
});

describe('through the whole design check: the type decides the verdict', () => {
	it('cantilever tip load: type (a) would pass, type (c) fails, multiplier = FRd,c/FEd', () => {
		// Q = 270 kN temporary, γQ = 1.5 (EN 1990 6.10): FEd = 405 kN. Type (a): 405/473.6 = 0.855,
		// a pass; type (c): 405/346.1 = 1.170, a fail. No fixed load: the multiplier at which the
		// row reaches 1 is FRd/FEd = 346.1/405 = 0.8545. Bending stays well inside: 1.5·270·0.5 =
		// 202.5 kNm at the support against Mpl,Rd = 1471·275 = 404.5 kNm.
		const fEd = 1.5 * 270e3;
		expect(fEd / typeA.fRd).toBeLessThan(1);
		const out = cantilever(270e3);
		const row = webRow(out.checks, 'point load 1');
		expectRel(row.values.fEd, fEd, 1e-9);
		expectRel(row.utilisation, fEd / typeC.fRd, 1e-9);
		expect(row.pass).toBe(false);
		expectRel(row.multiplierAtCapacity, typeC.fRd / fEd, 1e-5);
		expect(out.verdict.verdict).toBe('fail');
		expect(out.verdict.governing?.label).toBe(row.label);
		expectRel(out.verdict.allowableMultiplier, typeC.fRd / fEd, 1e-5);
	});

	it('load over an interior support: type (a) would pass, type (b) fails', () => {
		// Two 3 m spans, Q = 270 kN over the middle support: it goes straight into the support,
		// R = FEd = 1.5·270 = 405 kN (statics; no moment anywhere). Type (a): 405/473.6 = 0.855;
		// type (b): 405/361.7 = 1.120; multiplier 361.7/405 = 0.8931.
		const fEd = 1.5 * 270e3;
		expect(fEd / typeA.fRd).toBeLessThan(1);
		const out = run(
			{ spans: [3000, 3000], supports: ['pin', 'pin', 'pin'], joints: ['continuous'] },
			[{ kind: 'point', x: 3000, value: 270e3, action: 'temporary' }],
			40
		);
		const row = webRow(out.checks, 'support 2');
		expectRel(row.values.fEd, fEd, 1e-9);
		expectRel(row.utilisation, fEd / typeB.fRd, 1e-9);
		expectRel(row.multiplierAtCapacity, typeB.fRd / fEd, 1e-5);
		expect(out.verdict.verdict).toBe('fail');
	});
});

describe('interaction with bending, η2 + 0.8·η1 ≤ 1.4 (EN 1993-1-5 7.2(1))', () => {
	it('central load, 3 m simple span: the interaction limits the load before bending', () => {
		// Q = 100 kN temporary at mid-span, compression (top) flange loaded. FEd = 150 kN,
		// MEd = 150·3/4 = 112.5 kNm (statics). η2 = 150/473.6 = 0.3167 (6.14);
		// η1 = 112.5/(1471·275/1.0) = 0.2781 with Mpl,Rd of the plastic route (our reading of η1
		// for a Class 1 section, see checks/README). Row: (0.3167 + 0.8·0.2781)/1.4 = 0.3851 > η2.
		// Linear in the load, so the multiplier is 1/0.3851 = 2.597, below bending's
		// 1/0.2781 = 3.596.
		const out = run(
			{ spans: [3000], supports: ['pin', 'pin'], joints: [] },
			[{ kind: 'point', x: 1500, value: 100e3, action: 'temporary' }],
			40
		);
		const mRd = member().section.props!.Wply * fy;
		const eta2 = 150e3 / typeA.fRd;
		const eta1 = 112.5e6 / mRd;
		const row = webRow(out.checks, 'point load 1');
		expectRel(row.values.eta2, eta2, 1e-9);
		expectRel(row.values.eta1, eta1, 1e-6);
		expectRel(row.utilisation, (eta2 + 0.8 * eta1) / 1.4, 1e-6);
		expectRel(row.multiplierAtCapacity, 1.4 / (eta2 + 0.8 * eta1), 1e-5);
		expect(row.clause).toContain('7.2(1)');
		const bending = out.checks.find((c) => c.id === 'bending')!;
		expect(row.multiplierAtCapacity!).toBeLessThan(bending.multiplierAtCapacity!);
	});

	it('a load on the tension flange (top flange over a hogging cantilever) takes η2 alone', () => {
		// Loads of 100 kN at 400 and 100 mm from the tip: at the inner one MEd = −1.5·100·0.3 =
		// −45 kNm (cantilever statics), hogging, so its top flange is in tension and 7.2(1) does
		// not apply there: η1 = 0 and the row is η2 = FEd/FRd alone.
		const out = run(
			{ spans: [4000, 600], supports: ['pin', 'pin', 'free'], joints: ['continuous'] },
			[
				{ kind: 'point', x: 4200, value: 100e3, action: 'temporary' },
				{ kind: 'point', x: 4500, value: 100e3, action: 'temporary' }
			],
			150
		);
		const row = webRow(out.checks, 'point load 1');
		expectRel(row.values.mEd, -45e6, 1e-9);
		expect(row.values.eta1).toBe(0);
		expectRel(row.utilisation, 150e3 / row.values.fRd, 1e-12);
	});
});
