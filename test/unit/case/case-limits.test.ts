/**
 * Inputs that once crashed the command line (exit 1) or passed nonsense, each now a named input
 * problem or a sound report; and the limits of the case file (src/lib/engine/case/limits.ts).
 * The ranges are our plausibility bounds from facts of the trade, documented in the engine README.
 */
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../../src/lib/engine/case/index';
import { checkCase } from '../../../src/lib/engine/index';

/** A small valid case (invented numbers). */
function base(): any {
	return {
		format: 'hingepoint.case',
		version: 1,
		title: 'DEMO — limits',
		beam: {
			spans: [6],
			supports: ['pin', 'pin'],
			section: { designation: 'UB 305x165x40' },
			grade: 'S275'
		},
		loads: [{ kind: 'point', x: 3, value: 10, action: 'temporary' }]
	};
}

/** The errors of a case, as [path, code] pairs; every one must carry a message. */
function errorsOf(c: unknown): [string, string][] {
	const r = parseCase(c);
	if (r.ok) return [];
	for (const i of r.issues) expect(i.message.length).toBeGreaterThan(0);
	return r.issues.map((i) => [i.path, i.code]);
}

describe('inputs that crashed or passed nonsense', () => {
	it('spans [2, 4], supports free/fixed/pin, joint simple: a mechanism, refused', () => {
		// The simple joint passes no moment, so the fixed support acts as a pin and the free
		// cantilever turns about it (basic statics, common practice).
		const c = base();
		c.beam = { ...c.beam, spans: [2, 4], supports: ['free', 'fixed', 'pin'], joints: ['simple'] };
		c.loads = [];
		expect(errorsOf(c)).toEqual([['beam.supports', 'beam-is-mechanism']]);
		const out = checkCase(c);
		expect(out.ok).toBe(false);
	});

	it('the same layout with a continuous joint is a sound beam (overhang, fixed support)', () => {
		const c = base();
		const supports = ['free', 'fixed', 'pin'];
		c.beam = { ...c.beam, spans: [2, 4], supports, joints: ['continuous'] };
		expect(errorsOf(c)).toEqual([]);
	});

	it.each([
		['mp 1e-307', { mp: 1e-307 }, 'beam.section.mp'],
		['mp 1e308', { mp: 1e308 }, 'beam.section.mp'],
		['mass 1e308', { mp: 100, mass: 1e308 }, 'beam.section.mass'],
		['dimension 1e308 mm', { shape: 'flat', h: 1e308, b: 20 }, 'beam.section.h'],
		['dimension 1e-100 mm', { shape: 'flat', h: 100, b: 1e-100 }, 'beam.section.b']
	])('section %s: out of range, naming the field and the range', (_name, section, path) => {
		const c = base();
		c.beam.section = section;
		if ('mp' in section) delete c.beam.grade;
		const r = parseCase(c);
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(r.issues.map((i) => [i.path, i.code])).toEqual([[path, 'out-of-range']]);
		expect(r.issues[0].message).toMatch(/between [\d.]+ and [\d.]+/);
	});

	it('fy 1e-320: refused, with the range 100 to 700 MPa', () => {
		const c = base();
		c.beam.grade = { fy: 1e-320 };
		const r = parseCase(c);
		expect(r.ok ? [] : r.issues.map((i) => [i.path, i.code])).toEqual([
			['beam.grade.fy', 'out-of-range']
		]);
		expect(!r.ok && r.issues[0].message).toContain('between 100 and 700');
	});

	it('deflectionLimit 1e-320: refused, with the range', () => {
		const c = { ...base(), deflectionLimit: 1e-320 };
		expect(errorsOf(c)).toEqual([['deflectionLimit', 'out-of-range']]);
	});

	it('a load label of 1e999 (Infinity after JSON.parse): refused as not text', () => {
		const text = JSON.stringify(base()).replace('"temporary"}', '"temporary","label":1e999}');
		const c = JSON.parse(text);
		expect(c.loads[0].label).toBe(Infinity);
		expect(errorsOf(c)).toEqual([['loads[0].label', 'not-a-string']]);
	});

	it.each([
		['factors', (c: any) => (c.factors = { extra: Infinity })],
		['beam', (c: any) => (c.beam.extra = Infinity)],
		['section', (c: any) => (c.beam.section.extra = Infinity)],
		['a load', (c: any) => (c.loads[0].extra = Infinity)],
		['the top level', (c: any) => (c.extra = Infinity)]
	])('an unknown key under %s holding Infinity: warned, ignored, not in the report', (_w, edit) => {
		const c = base();
		edit(c);
		const out = checkCase(c);
		expect(out.ok).toBe(true);
		if (!out.ok) return;
		expect(out.warnings.some((w) => w.code === 'unknown-key')).toBe(true);
		expect(JSON.stringify(out.report.case)).not.toContain('extra');
	});

	it('an unknown key nested 10 000 deep: refused as too deep, without walking it', () => {
		let deep: unknown = 1;
		for (let i = 0; i < 10_000; i++) deep = { a: deep };
		const c = base();
		c.beam.section.extra = deep;
		const [[path, code]] = errorsOf(c);
		expect(code).toBe('too-deep');
		expect(path.startsWith('beam.section.extra')).toBe(true);
	});

	it('"grade": "constructor": an unknown grade with a message, not a prototype lookup', () => {
		const c = base();
		c.beam.grade = 'constructor';
		const r = parseCase(c);
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(r.issues.map((i) => i.code)).toEqual(['grade-unknown']);
		expect(r.issues[0].message).toContain('constructor');
	});

	it('a designation of "constructor" or "__proto__": unknown section, with a message', () => {
		for (const designation of ['constructor', '__proto__', 'toString 300']) {
			const c = base();
			c.beam.section = { designation };
			expect(errorsOf(c)).toEqual([['beam.section.designation', 'section-unknown']]);
		}
	});
});

describe('limits of the case file', () => {
	it('at most 50 spans', () => {
		const c = base();
		c.beam.spans = new Array(51).fill(1);
		c.beam.supports = new Array(52).fill('pin');
		c.loads = [];
		expect(errorsOf(c)).toContainEqual(['beam.spans', 'too-many']);
		c.beam.spans = new Array(50).fill(1);
		c.beam.supports = new Array(51).fill('pin');
		expect(errorsOf(c)).toEqual([]);
	});

	it('at most 200 loads and 100 restraint positions', () => {
		const c = base();
		c.loads = new Array(201).fill(c.loads[0]);
		expect(errorsOf(c)).toEqual([['loads', 'too-many']]);
		const d = base();
		d.beam.restraint = { lateral: new Array(101).fill(3) };
		expect(errorsOf(d)).toEqual([['beam.restraint.lateral', 'too-many']]);
	});

	it('title at most 200 characters, load labels at most 80', () => {
		expect(errorsOf({ ...base(), title: 'x'.repeat(201) })).toEqual([['title', 'too-long']]);
		expect(errorsOf({ ...base(), title: 'x'.repeat(200) })).toEqual([]);
		const c = base();
		c.loads[0].label = 'y'.repeat(81);
		expect(errorsOf(c)).toEqual([['loads[0].label', 'too-long']]);
	});

	it('span range 0.1 m to 100 m; the message names the unit and the range', () => {
		for (const [span, ok] of [
			[0.1, true],
			[100, true],
			[0.09, false],
			[100.5, false]
		] as const) {
			const c = base();
			c.beam.spans = [span];
			c.loads = [];
			expect(errorsOf(c).length === 0).toBe(ok);
		}
		const c = base();
		c.beam.spans = [200];
		const r = parseCase(c);
		expect(!r.ok && r.issues[0].message).toBe('The span (m) must be between 0.1 and 100; got 200.');
	});

	it('load sizes: point loads up to 10 000 kN, line loads up to 1 000 kN/m, either sign', () => {
		const c = base();
		c.loads[0].value = -10_000;
		expect(errorsOf(c)).toEqual([]);
		c.loads[0].value = 10_001;
		expect(errorsOf(c)).toEqual([['loads[0].value', 'out-of-range']]);
		c.loads = [{ kind: 'uniform', from: 0, to: 6, value: 1_001, action: 'imposed' }];
		expect(errorsOf(c)).toEqual([['loads[0].value', 'out-of-range']]);
	});

	it('partial factors in their ranges; ψ0 of the temporary load in [0, 1]', () => {
		const c = { ...base(), factors: { permanent: 1e-3 } };
		expect(errorsOf(c)).toEqual([['factors.permanent', 'out-of-range']]);
		expect(errorsOf({ ...base(), factors: { psi0Temporary: 1.2 } })).toEqual([
			['factors.psi0Temporary', 'out-of-range']
		]);
		const r = parseCase({ ...base(), factors: { psi0Temporary: 0 } });
		expect(r.ok && r.value.factors.psi0Temporary).toBe(0);
	});

	it('η in [1, 1.2] (EN 1993-1-5 5.1 NOTE 2, from memory) and bearing up to 2 000 mm', () => {
		expect(errorsOf({ ...base(), eta: 1.5 })).toEqual([['eta', 'out-of-range']]);
		const c = base();
		c.beam.bearing = [100, 2001];
		expect(errorsOf(c)).toEqual([['beam.bearing[1]', 'out-of-range']]);
	});

	it('the report echoes only known fields, each as validated', () => {
		const c = base();
		c.beam.section = { shape: 'CHS', d: 168.3, t: 8, h: 5 };
		const r = parseCase(c);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.value.file.beam.section).toEqual({ shape: 'CHS', d: 168.3, t: 8 });
		expect(r.warnings.map((w) => w.path)).toContain('beam.section.h');
	});
});

describe('cautious defaults', () => {
	it('no restraint: flange held at the supports only, load on the top flange, a notice', () => {
		const r = parseCase(base());
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.value.restraint).toEqual({ lateral: 'ends-only', loadHeight: 'top-flange' });
		const w = r.warnings.find((i) => i.code === 'restraint-assumed');
		expect(w?.path).toBe('beam.restraint');
		expect(w?.message).toContain('only at the supports');
	});

	it('a given restraint is kept and raises no notice', () => {
		const c = base();
		c.beam.restraint = { lateral: 'continuous' };
		const r = parseCase(c);
		expect(r.ok && r.value.restraint).toEqual({ lateral: 'continuous' });
		expect(r.ok && r.warnings.some((i) => i.code === 'restraint-assumed')).toBe(false);
	});
});
