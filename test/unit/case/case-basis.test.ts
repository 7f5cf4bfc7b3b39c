/**
 * The design basis of a case file (top-level `basis`) and its factor sets. Combination factors on
 * the AISC bases: ASCE 7-22 §2.3.1 strength design 1.4D and 1.2D + 1.6L, §2.4.1 allowable stress
 * design D and D + L (from memory); the proposed temporary load is taken as live load unless the
 * case says otherwise (common practice until a published construction-load factor is confirmed).
 */
import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CASE_FORMAT, CASE_VERSION, parseCase } from '../../../src/lib/engine/case/index';
import { checkCase } from '../../../src/lib/engine/index';

/** A valid invented case (demo numbers); `patch` edits a deep copy. */
function makeCase(patch: (c: Record<string, any>) => void = () => {}): Record<string, any> {
	const c: Record<string, any> = {
		format: CASE_FORMAT,
		version: CASE_VERSION,
		beam: {
			spans: [6.0],
			supports: ['pin', 'pin'],
			section: { designation: 'UB 305x165x40' },
			grade: 'S275',
			restraint: { lateral: 'continuous' }
		},
		loads: [
			{ kind: 'point', x: 3, value: 10, action: 'temporary' },
			{ kind: 'uniform', from: 0, to: 6, value: 2, action: 'imposed' }
		]
	};
	patch(c);
	return c;
}

const issuesOf = (json: unknown) => {
	const r = parseCase(json);
	return r.ok ? [] : r.issues.map((i) => `${i.path}:${i.code}`);
};

describe('basis', () => {
	it('is eurocode when the file names none (files written before it keep their meaning)', () => {
		const r = parseCase(makeCase());
		expect(r.ok && r.value.basis).toBe('eurocode');
		expect(r.ok && r.value.units).toBe('si');
	});

	it.each(['eurocode', 'aisc-lrfd', 'aisc-asd'])('reads "%s"', (basis) => {
		const r = parseCase(makeCase((c) => (c.basis = basis)));
		expect(r.ok && r.value.basis).toBe(basis);
	});

	it.each(['aisc', 'EUROCODE', 'en1993', 7, null])('refuses %j naming the field basis', (basis) => {
		expect(issuesOf(makeCase((c) => (c.basis = basis)))).toEqual(['basis:not-one-of']);
	});

	it('refuses an unknown units value naming the field units', () => {
		expect(issuesOf(makeCase((c) => (c.units = 'imperial')))).toEqual(['units:not-one-of']);
	});

	it('keeps basis and units in the echoed file, so a saved or shared case reads back the same', () => {
		const json = makeCase((c) => {
			c.basis = 'aisc-asd';
			c.units = 'si';
		});
		const r = parseCase(json);
		if (!r.ok) throw new Error(JSON.stringify(r.issues));
		expect(r.value.file).toMatchObject({ basis: 'aisc-asd', units: 'si' });
		const again = parseCase(JSON.parse(JSON.stringify(r.value.file)));
		expect(again.ok && again.value.basis).toBe('aisc-asd');
		expect(again.ok && again.value.file).toEqual(r.value.file);
	});
});

describe('factors on the AISC bases (ASCE 7-22, from memory)', () => {
	it('LRFD: 1.2D + 1.6L and 1.4D; the temporary load takes the live-load factor', () => {
		const r = parseCase(makeCase((c) => (c.basis = 'aisc-lrfd')));
		if (!r.ok) throw new Error(JSON.stringify(r.issues));
		expect(r.value.factors).toEqual({
			set: 'asce7-lrfd',
			permanent: 1.2,
			permanentAlone: 1.4,
			imposed: 1.6,
			temporary: 1.6
		});
	});

	it('ASD: D + L and D, every factor 1.0', () => {
		const r = parseCase(makeCase((c) => (c.basis = 'aisc-asd')));
		if (!r.ok) throw new Error(JSON.stringify(r.issues));
		expect(r.value.factors).toEqual({
			set: 'asce7-asd',
			permanent: 1,
			permanentAlone: 1,
			imposed: 1,
			temporary: 1
		});
	});

	it('every factor is editable; the temporary factor follows an edited live-load factor', () => {
		const r = parseCase(
			makeCase((c) => {
				c.basis = 'aisc-lrfd';
				c.factors = { set: 'custom', permanent: 1.3, permanentAlone: 1.5, imposed: 1.7 };
			})
		);
		if (!r.ok) throw new Error(JSON.stringify(r.issues));
		expect(r.value.factors).toEqual({
			set: 'custom',
			permanent: 1.3,
			permanentAlone: 1.5,
			imposed: 1.7,
			temporary: 1.7
		});
	});

	it('the temporary load keeps its own factor when the case gives one', () => {
		const r = parseCase(
			makeCase((c) => {
				c.basis = 'aisc-lrfd';
				c.factors = { temporary: 1.4 };
			})
		);
		expect(r.ok && r.value.factors.temporary).toBe(1.4);
		expect(r.ok && r.value.factors.imposed).toBe(1.6);
	});

	it.each([
		['aisc-lrfd', 'en1990-6.10'],
		['aisc-lrfd', 'asce7-asd'],
		['aisc-asd', 'asce7-lrfd'],
		['eurocode', 'asce7-lrfd']
	])('on %s the set %s is refused naming factors.set', (basis, set) => {
		const json = makeCase((c) => {
			c.basis = basis;
			c.factors = { set };
		});
		expect(issuesOf(json)).toEqual(['factors.set:not-one-of']);
	});

	it('Eurocode-only factors on an AISC basis are warned about and not used', () => {
		const r = parseCase(
			makeCase((c) => {
				c.basis = 'aisc-lrfd';
				c.factors = { gammaM0: 1.1, psi0: 0.7 };
			})
		);
		if (!r.ok) throw new Error(JSON.stringify(r.issues));
		const warned = r.warnings.filter((w) => w.code === 'not-on-basis').map((w) => w.path);
		expect(warned).toEqual(['factors.gammaM0', 'factors.psi0']);
		expect(r.value.factors.gammaM0).toBeUndefined();
	});

	it('the Eurocode basis keeps the EN 1990 6.10 recommended values (1.35 / 1.5)', () => {
		const r = parseCase(makeCase());
		expect(r.ok && r.value.factors).toEqual({
			permanent: 1.35,
			imposed: 1.5,
			temporary: 1.5,
			gammaM0: 1,
			gammaM1: 1
		});
	});
});

describe('an AISC case is never answered on the Eurocode basis', () => {
	it.each(['aisc-lrfd', 'aisc-asd'])(
		'%s: an AISC answer, or no answer with the reason',
		(basis) => {
			const out = checkCase(makeCase((c) => (c.basis = basis)));
			if (out.ok) {
				expect(out.report.design.basis).toMatch(/AISC/);
				expect(out.report.design.basis).not.toMatch(/EN 199/);
			} else {
				expect(out.issues.map((i) => `${i.path}:${i.code}`)).toEqual(['basis:basis-not-available']);
				expect(out.issues[0].message).toMatch(/not available/);
			}
		}
	);
});

describe('case files written before the basis existed', () => {
	const dir = 'test/fixtures/cases';
	const files = readdirSync(dir).filter(
		(f) => f.startsWith('demo-') || f.startsWith('regression-')
	);

	it.each(files)('%s still parses, on the Eurocode basis in SI', (name) => {
		const r = parseCase(JSON.parse(readFileSync(`${dir}/${name}`, 'utf8')));
		if (!r.ok) throw new Error(JSON.stringify(r.issues));
		expect(r.value.basis).toBe('eurocode');
		expect(r.value.units).toBe('si');
		expect(r.value.fileSI).toEqual(r.value.file);
	});
});
