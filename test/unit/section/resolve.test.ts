/**
 * resolveSection: every case-file form, issues with field paths, section loss and known Mp.
 * Closed forms (rectangles and thin plates) are computed inside the tests (any strength-of-
 * materials textbook, e.g. Gere & Timoshenko, Mechanics of Materials, from memory).
 */
import { describe, expect, it } from 'vitest';
import { resolveSection } from '../../../src/lib/engine/section/index';
import type { IDims, RhsDims, SectionSpec } from '../../../src/lib/engine/section/index';
import { expectRel } from '../../support/expect-rel';

function resolveOk(spec: SectionSpec, loss = 0) {
	const r = resolveSection(spec, { loss });
	if (!r.ok) throw new Error(JSON.stringify(r.issues));
	return r.value;
}
function issueCodes(spec: SectionSpec, loss = 0): string[] {
	const r = resolveSection(spec, { loss });
	return r.ok ? [] : r.issues.map((i) => `${i.path}:${i.code}`);
}

describe('resolveSection forms', () => {
	it('a designation resolves to the canonical library section, flange thickness governing', () => {
		const s = resolveOk({ designation: 'ub 305x165x40' });
		expect(s.designation).toBe('UB 305x165x40');
		expect(s.family).toBe('UB');
		expect(s.standard).toMatch(/BS 4-1/);
		expect(s.governingThickness).toBe(10.2);
		expect(s.loss).toBe(0);
	});

	it('an unknown designation names the nearest ones at path "designation"', () => {
		const r = resolveSection({ designation: 'UB 305x165x41' });
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(r.issues[0]).toMatchObject({
			path: 'designation',
			code: 'section-unknown',
			severity: 'error'
		});
		expect(r.issues[0].message).toMatch(/UB 305x165x40/);
	});

	it('a welded I has no fillets: A = 2b·tf + (h − 2tf)·tw and Wpl = b·tf(h − tf) + tw·hw²/4', () => {
		const s = resolveOk({ shape: 'welded-I', h: 400, b: 200, tw: 8, tf: 12 });
		const hw = 400 - 24;
		expectRel(s.props!.A, 2 * 200 * 12 + hw * 8, 1e-12);
		expectRel(s.props!.Wply, 200 * 12 * 388 + (8 * hw * hw) / 4, 1e-12);
		expectRel(s.props!.Iy, (200 * 400 ** 3 - (200 - 8) * hw ** 3) / 12, 1e-12);
		expect(s.designation).toMatch(/measured/);
		expect(s.governingThickness).toBe(12);
	});

	it('a flat bar: A = bh, I = bh³/12, Wel = bh²/6, Wpl = bh²/4', () => {
		const s = resolveOk({ shape: 'flat', h: 200, b: 20 });
		expect(s.props!.A).toBe(4000);
		expectRel(s.props!.Iy, (20 * 200 ** 3) / 12, 1e-12);
		expectRel(s.props!.Wely, (20 * 200 ** 2) / 6, 1e-12);
		expectRel(s.props!.Wply, (20 * 200 ** 2) / 4, 1e-12);
		expect(s.governingThickness).toBe(20);
	});

	it('a cold-formed RHS takes EN 10219-2 corner radii (from memory: ro = 2t for t ≤ 6 mm)', () => {
		const cold = resolveOk({ shape: 'RHS', h: 100, b: 100, t: 5, process: 'cold' });
		const hot = resolveOk({ shape: 'RHS', h: 100, b: 100, t: 5 });
		expect((cold.dims as RhsDims).ro).toBe(10);
		expect((cold.dims as RhsDims).ri).toBe(5);
		expect((hot.dims as RhsDims).ro).toBe(7.5);
		expect(cold.props!.A).toBeLessThan(hot.props!.A); // larger corners remove more steel
	});

	it('a known Mp in kN·m becomes N·mm with no props and a warning that the class is unknown', () => {
		const r = resolveSection({ mp: 171.3, mass: 40.3 });
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.value.mpKnown).toBeCloseTo(171.3e6, 6);
		expect(r.value.massKnown).toBe(40.3);
		expect(r.value.props).toBeNull();
		expect(r.value.governingThickness).toBe(0);
		expect(r.warnings[0].code).toBe('class-unknown');
	});
});

describe('resolveSection input issues', () => {
	it.each([
		[{ shape: 'I', h: 300, b: 150, tw: 7, tf: 160, r: 10 }, 'tf:flange-too-thick'],
		[{ shape: 'I', h: 300, b: 150, tw: -1, tf: 10, r: 10 }, 'tw:dimension-not-positive'],
		[{ shape: 'I', h: 300, b: 150, tw: 7, tf: 10, r: Number.NaN }, 'r:dimension-not-positive'],
		[{ shape: 'CHS', d: 100, t: 50 }, 't:wall-too-thick'],
		[{ shape: 'RHS', h: 100, b: 50, t: 30 }, 't:wall-too-thick'],
		[{ mp: 0 }, 'mp:mp-not-positive']
	] as [SectionSpec, string][])('%j → %s', (spec, code) => {
		expect(issueCodes(spec)).toContain(code);
	});

	it('refuses a negative loss and a loss on a known Mp', () => {
		expect(issueCodes({ designation: 'IPE 300' }, -1)).toEqual(['loss:loss-not-valid']);
		expect(issueCodes({ mp: 100 }, 1)).toEqual(['loss:loss-on-known-mp']);
	});
});

describe('section loss', () => {
	it('I: a loss c per face takes 2c off tf, tw, h and b and adds c to the root radius', () => {
		const s = resolveOk({ designation: 'UB 305x165x40' }, 1);
		expect(s.dims).toEqual({ h: 301.4, b: 163, tw: 4, tf: 8.2, r: 9.9 });
		expect(s.loss).toBe(1);
		expect(s.governingThickness).toBeCloseTo(8.2, 12);
		expect(s.designation).toBe('UB 305x165x40');
	});

	it('hollow: outside face only, t − c, outer size − 2c, inner size unchanged', () => {
		const s = resolveOk({ designation: 'SHS 100x100x5.0' }, 1);
		const d = s.dims as RhsDims;
		expect(d).toEqual({ h: 98, b: 98, t: 4, ro: 6.5, ri: 5 });
		expect(d.h - 2 * d.t).toBe(100 - 2 * 5);
	});

	it('a loss that consumes the web is refused with a plain issue at path "loss"', () => {
		const r = resolveSection({ designation: 'UB 305x165x40' }, { loss: 3 });
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(r.issues[0]).toMatchObject({ path: 'loss', code: 'loss-consumes-element' });
		expect(r.issues[0].message).toMatch(/web/);
	});

	it('a loss consuming a CHS wall is refused', () => {
		expect(issueCodes({ shape: 'CHS', d: 100, t: 3 }, 3)).toEqual(['loss:loss-consumes-element']);
	});

	it('a thin-plate check: 1 mm off each face of a flat 100x10 leaves 98x8', () => {
		const s = resolveOk({ shape: 'flat', h: 100, b: 10 }, 1);
		expect(s.dims).toEqual({ h: 98, b: 8 });
		expect(s.props!.A).toBe(98 * 8);
		const r = resolveOk({ shape: 'I', h: 300, b: 150, tw: 7, tf: 10, r: 10 }, 0.5);
		expect((r.dims as IDims).tw).toBe(6);
	});
});
