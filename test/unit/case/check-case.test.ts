/**
 * checkCase end to end against closed forms of simple plastic theory (B.G. Neal, "The Plastic
 * Methods of Structural Analysis", 3rd ed., 1977, beam mechanisms by virtual work — from memory),
 * EN 1993-1-1 6.2.5 (Mpl,Rd = Wpl·fy/γM0) and handbook elastic formulas (Roark's Formulas for
 * Stress and Strain, Table 8.1 — from memory). Case numbers are invented.
 */
import { describe, expect, it } from 'vitest';
import { checkCase, ENGINE_VERSION, type CheckReport } from '../../../src/lib/engine/index';
import { ENGINEER_NOTICE_SHORT } from '../../../src/lib/engine/notice';
import { E_STEEL, GRAVITY } from '../../../src/lib/engine/units';
import { expectRel } from '../../support/expect-rel';

/** Simply supported beam of given Mp (kNm) and span (m) with the given loads (file units). */
interface SimpleCase {
	mp?: number;
	L?: number;
	loads: unknown[];
	factors?: object;
	section?: object;
	grade?: string;
}

function simpleCase(o: SimpleCase) {
	return {
		format: 'hingepoint.case',
		version: 1,
		title: 'DEMO — invented',
		beam: {
			spans: [o.L ?? 6],
			supports: ['pin', 'pin'],
			section: o.section ?? { mp: o.mp ?? 100 },
			// Stated, not left to the default (which holds the flange only at the supports).
			restraint: { lateral: 'continuous' },
			...(o.grade ? { grade: o.grade, selfWeight: false } : {})
		},
		loads: o.loads,
		factors: o.factors ?? { permanent: 1, imposed: 1, temporary: 1 }
	};
}

function run(json: unknown, curve = false): CheckReport {
	const out = checkCase(json, { curve });
	if (!out.ok) throw new Error(out.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
	return out.report;
}

const point = (x: number, value: number, action = 'temporary') => ({
	kind: 'point',
	x,
	value,
	action
});
const udl = (value: number, action: string, from = 0, to = 6) => ({
	kind: 'uniform',
	from,
	to,
	value,
	action
});

describe('checkCase: plastic collapse', () => {
	it('central point load on a simply supported span: λ = 4Mp/(LW) (Neal, virtual work)', () => {
		const [Mp, L, W] = [100, 6, 10];
		const r = run(simpleCase({ mp: Mp, L, loads: [point(3, W)] }));
		expectRel(r.collapse!.loadFactor!, (4 * Mp) / L / W);
		expect(r.collapse!.certified).toBe(true);
		expect(r.collapse!.decides).toBe(true);
		expect(r.collapse!.appliesTo).toBe('temporary');
		expectRel(r.collapse!.hinges[0].x, L / 2);
		// Bending is the only check a known Mp allows, so it is the answer.
		expectRel(r.answer.multiplier!, (4 * Mp) / L / W);
		expectRel(r.answer.allowable[0].value!, (4 * Mp) / L);
		expect(r.answer.allowable[0].unit).toBe('kN');
		expect(r.answer.governing?.id).toBe('bending');
	});

	it('γM0 divides a given Mp like any other resistance (EN 1993-1-1 6.2.5)', () => {
		const factors = { temporary: 1, gammaM0: 1.1 };
		const r = run(simpleCase({ mp: 100, loads: [point(3, 10)], factors }));
		expectRel(r.collapse!.resistance[0].sagging, 100 / 1.1);
		expectRel(r.collapse!.loadFactor!, (4 * 100) / 1.1 / 6 / 10);
	});

	it('fixed UDL held, variable central load: Q = (4Mp/L − gL/2)/γT (Neal; fixed loads not scaled)', () => {
		const [Mp, L, g, gT] = [100, 6, 5, 1.5];
		const factors = { permanent: 1, temporary: gT };
		const r = run(simpleCase({ mp: Mp, loads: [udl(g, 'permanent'), point(3, 1)], factors }));
		expectRel(r.answer.allowable[0].value!, ((4 * Mp) / L - (g * L) / 2) / gT);
	});

	it('with no temporary load there is no verdict; bending utilisation is wL²/8 over Mp (Neal)', () => {
		const [Mp, L, w, gG] = [100, 6, 4, 1.35];
		const r = run(simpleCase({ mp: Mp, loads: [udl(w, 'permanent')], factors: { permanent: gG } }));
		expect(r.answer.verdict).toBeNull();
		expect(r.answer.message).toMatch(/No proposed temporary load/);
		expect(r.answer.allowable).toEqual([]);
		const bending = r.checks.find((c) => c.id === 'bending')!;
		expectRel(bending.utilisation, (w * gG * L * L) / 8 / Mp);
	});

	it('says plainly when the fixed loads alone fail: FAIL, nothing can be added', () => {
		const r = run(simpleCase({ mp: 50, loads: [udl(20, 'permanent'), point(2, 5)] }));
		expect(r.collapse!.status).toBe('fails-under-fixed');
		expect(r.collapse!.loadFactor).toBeNull();
		expect(r.answer.verdict).toBe('fail');
		expect(r.answer.multiplier).toBe(0);
		expect(r.answer.allowable[0].value).toBe(0);
		expect(r.answer.message).toMatch(/No temporary load can be added/);
		expect(r.notices.join(' ')).toMatch(/existing loads alone/);
	});
});

describe('checkCase: section, grade and elastic results', () => {
	const section = { designation: 'UB 305x165x40' };
	const ub = simpleCase({ section, grade: 'S275', loads: [udl(4, 'permanent'), point(3, 10)] });

	it('Mp,Rd = Wpl,y·fy/γM0 with fy for the flange thickness (EN 1993-1-1 6.2.5; EN 10025-2 Table 7)', () => {
		const r = run(ub);
		// tf = 10.2 mm ≤ 16 mm → fy = 275 MPa (EN 10025-2:2004 Table 7).
		expect(r.grades[0]!.fy).toBe(275);
		// Low shear at the hinge (W/2 = 5 kN): no reduction, the full Mp,Rd.
		expectRel(r.collapse!.resistance[0].sagging, (r.sections[0].props!.Wply * 275) / 1e6);
		expect(r.sections[0].class).toBe(1);
	});

	it('deflection under unfactored loads: 5wL⁴/384EI + WL³/48EI (Roark Table 8.1)', () => {
		const r = run(ub);
		const EI = E_STEEL * r.sections[0].props!.Iy;
		const [w, W, L] = [4, 10_000, 6000];
		const total = (5 * w * L ** 4) / (384 * EI) + (W * L ** 3) / (48 * EI);
		expectRel(r.effects.maxDeflection!.total.value, total, 1e-9);
		expectRel(r.effects.maxDeflection!.temporary!.value, (W * L ** 3) / (48 * EI), 1e-9);
	});

	it('the answer never exceeds the bending check: it is the smallest multiplier over every check', () => {
		const r = run(simpleCase({ section, grade: 'S275', loads: [point(3, 10)] }));
		const rows = r.checks.filter((c) => c.level === 'governing' && c.multiplier !== null);
		expect(rows.length).toBeGreaterThan(1);
		expect(r.answer.multiplier).toBe(Math.min(...rows.map((c) => c.multiplier as number)));
		expect(r.answer.multiplier!).toBeLessThanOrEqual(r.collapse!.loadFactor! * (1 + 1e-12));
	});

	it('self-weight = mass × g, as a permanent load (EN 1991-1-1 Table A.4 density; standard g)', () => {
		const withSw = { ...ub, beam: { ...ub.beam, selfWeight: true } };
		const r = run(withSw);
		expectRel(r.selfWeight[0], (r.sections[0].props!.mass * GRAVITY) / 1000);
	});

	it('a known-Mp section has no deflection, with a reason', () => {
		const r = run(simpleCase({ mp: 100, loads: [point(3, 10)] }));
		expect(r.effects.maxDeflection).toBeNull();
		expect(r.notices.join(' ')).toMatch(/Deflections need the section/);
		expect(r.sections[0].class).toBeNull();
	});
});

describe('checkCase: the answer for zero, upward and mixed proposed loads', () => {
	it('only zero proposed loads: no verdict, a message, and no allowable loads', () => {
		const r = run(simpleCase({ mp: 100, loads: [point(3, 0), udl(0, 'temporary')] }));
		expect(r.answer.verdict).toBeNull();
		expect(r.answer.multiplier).toBeNull();
		expect(r.answer.allowable).toEqual([]);
		expect(r.answer.message).toMatch(/every one is zero/);
		expect(r.summary.short).toMatch(/NO VERDICT/);
	});

	it('an upward proposed load on a simply supported span relieves it: said so, no negative size', () => {
		// Self weight 5 kN/m down, a 10 kN upward prop force: M = wL²/8 − PL/4 = 22.5 − 15 > 0,
		// and more upward force only lowers the sagging moment until it reverses (statics). Bending
		// of a known Mp is the only check, so the multiplier is where −Mp is reached:
		// 22.5 − 15·t = −100 → t = 8.17.
		const r = run(simpleCase({ mp: 100, loads: [udl(5, 'permanent'), point(3, -10)] }));
		const a = r.answer;
		expect(a.verdict).toBe('pass');
		expect(a.allowable[0].direction).toBe('up');
		expect(a.allowable[0].value).toBeGreaterThan(0);
		expectRel(a.multiplier!, (22.5 + 100) / 15, 1e-6);
		expect(a.message).not.toMatch(/−|-\d/);
		expect(a.message).toMatch(/upward/);
	});

	it('with no deciding check limiting an upward load, it is said to relieve the beam', () => {
		// A point load at a support goes straight into it: no bending check is affected.
		const r = run(simpleCase({ mp: 100, loads: [udl(5, 'permanent'), point(0, -10)] }));
		expect(r.answer.allowable[0]).toMatchObject({
			value: null,
			effect: 'relieves',
			direction: 'up'
		});
		expect(r.answer.message).toMatch(/relieves the beam/);
	});

	it('two proposed loads: each may grow by the same multiplier, each in its own unit', () => {
		const r = run(simpleCase({ mp: 100, loads: [point(3, 10), udl(2, 'temporary')] }));
		// Central W and UDL w together: (W·L/4 + wL²/8)·t = Mp → t = 100/(15 + 9) (Neal).
		const t = 100 / ((10 * 6) / 4 + (2 * 6 * 6) / 8);
		expectRel(r.answer.multiplier!, t);
		expect(r.answer.allowable.map((l) => l.unit)).toEqual(['kN', 'kN/m']);
		expectRel(r.answer.allowable[0].value!, 10 * t);
		expectRel(r.answer.allowable[1].value!, 2 * t);
		expect(r.answer.message).toMatch(
			/Largest proposed loads, together: .* kN \(load 1\); .* kN\/m \(load 2\)/
		);
	});
});

describe('checkCase: the report as data', () => {
	it('starts its notices with the engineer-of-record notice and records the engine version', () => {
		const r = run(simpleCase({ loads: [point(3, 10)] }));
		expect(r.notices[0]).toBe(ENGINEER_NOTICE_SHORT);
		expect(r.engineVersion).toBe(ENGINE_VERSION);
		expect(r.assumptions.length).toBeGreaterThan(3);
	});

	it('is plain data: survives structuredClone and a JSON round trip unchanged', () => {
		const r = run(simpleCase({ loads: [point(2, 10), udl(3, 'imposed')] }));
		expect(structuredClone(r)).toEqual(r);
		expect(JSON.parse(JSON.stringify(r))).toEqual(r);
	});

	it('returns issues, not a report, for an invalid case', () => {
		const out = checkCase({ ...simpleCase({ loads: [point(8, 10)] }) });
		expect(out.ok).toBe(false);
		expect(!out.ok && out.issues.map((i) => i.path)).toContain('loads[0].x');
	});
});
