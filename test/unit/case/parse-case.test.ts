/**
 * The case file: conversion to internal units, defaults, field paths of every input problem,
 * and the optional parts passed through for the member checks.
 */
import { describe, expect, it } from 'vitest';
import { CASE_FORMAT, CASE_VERSION, parseCase } from '../../../src/lib/engine/case/index';
import { GRAVITY } from '../../../src/lib/engine/units';

/** A valid invented case (demo numbers); `patch` edits a deep copy. */
function makeCase(patch: (c: Record<string, any>) => void = () => {}): Record<string, any> {
	const c: Record<string, any> = {
		format: CASE_FORMAT,
		version: CASE_VERSION,
		title: 'DEMO — invented',
		beam: {
			spans: [6.0],
			supports: ['pin', 'pin'],
			section: { designation: 'UB 305x165x40' },
			grade: 'S275'
		},
		loads: [
			{ kind: 'point', x: 2.0, value: 12.5, action: 'temporary' },
			{ kind: 'uniform', from: 0, to: 6, value: 4.0, action: 'permanent' },
			{ kind: 'linear', from: 1, to: 3, start: 0, end: 5, action: 'imposed' }
		]
	};
	patch(c);
	return c;
}

const paths = (json: unknown): string[] => {
	const r = parseCase(json);
	return r.ok ? [] : r.issues.map((i) => i.path);
};

describe('parseCase: valid files', () => {
	it('converts m, kN and kN/m to mm, N and N/mm', () => {
		const r = parseCase(makeCase());
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.value.beam).toEqual({ spans: [6000], supports: ['pin', 'pin'], joints: [] });
		const [p, u, l] = r.value.loads;
		expect(p).toEqual({ kind: 'point', x: 2000, value: 12_500, action: 'temporary' });
		// 1 kN/m = 1000 N / 1000 mm = 1 N/mm (definition of the units).
		expect(u).toEqual({ kind: 'uniform', from: 0, to: 6000, value: 4, action: 'permanent' });
		const linear = { kind: 'linear', from: 1000, to: 3000, start: 0, end: 5 };
		expect(l).toEqual({ ...linear, action: 'imposed' });
	});

	it('defaults: joints continuous, EN 1990 6.10 recommended factors, self-weight on', () => {
		const r = parseCase(
			makeCase((c) => {
				c.beam.spans = [5, 7];
				c.beam.supports = ['pin', 'pin', 'pin'];
			})
		);
		if (!r.ok) throw new Error(r.issues[0].message);
		expect(r.value.beam.joints).toEqual(['continuous']);
		// EN 1990 Table A1.2(B): γG,sup 1.35, γQ 1.5; EN 1993-1-1 6.1 NOTE 2B: γM0 = γM1 = 1.0
		// (recommended values, from memory).
		const recommended = { permanent: 1.35, imposed: 1.5, temporary: 1.5, gammaM0: 1, gammaM1: 1 };
		expect(r.value.factors).toEqual(recommended);
		expect(r.value.selfWeight).toBe(true);
	});

	it('temporary factor defaults to the imposed-load factor in use', () => {
		const r = parseCase(makeCase((c) => (c.factors = { imposed: 1.6 })));
		expect(r.ok && r.value.factors.temporary).toBe(1.6);
	});

	it('self-weight is the section mass × g as a permanent line load per span', () => {
		const r = parseCase(makeCase());
		if (!r.ok) throw new Error(r.issues[0].message);
		const mass = r.value.sections[0].props!.mass; // kg/m, from the section library
		expect(r.value.selfWeightLoads).toEqual([
			{ kind: 'uniform', from: 0, to: 6000, value: (mass * GRAVITY) / 1000, action: 'permanent' }
		]);
		const off = parseCase(makeCase((c) => (c.beam.selfWeight = false)));
		expect(off.ok && off.value.selfWeightLoads).toEqual([]);
	});

	it('a known Mp needs no grade and adds self-weight only when its mass is given', () => {
		const bare = parseCase(makeCase((c) => ((c.beam.section = { mp: 150 }), delete c.beam.grade)));
		if (!bare.ok) throw new Error(bare.issues[0].message);
		expect(bare.value.sections[0].mpKnown).toBe(150e6);
		expect(bare.value.grades).toEqual([null]);
		expect(bare.value.selfWeightLoads).toEqual([]);
		expect(bare.value.selfWeightMissing).toEqual([0]);
		const heavy = parseCase(
			makeCase((c) => ((c.beam.section = { mp: 150, mass: 40 }), delete c.beam.grade))
		);
		expect(heavy.ok && heavy.value.selfWeightLoads.length).toBe(1);
	});

	it('passes restraint, bearing, deflection limit and factor set through for the checks', () => {
		const r = parseCase(
			makeCase((c) => {
				c.beam.restraint = { lateral: [3, 1.5], loadHeight: 'top-flange' };
				c.beam.bearing = [100, 50];
				c.deflectionLimit = 200;
				c.factors = { set: 'en1990-6.10ab', xi: 0.85, psi0: 0.7 };
			})
		);
		if (!r.ok) throw new Error(r.issues[0].message);
		expect(r.value.restraint).toEqual({ lateral: [1500, 3000], loadHeight: 'top-flange' });
		expect(r.value.bearing).toEqual([100, 50]);
		expect(r.value.deflectionLimit).toBe(200);
		expect(r.value.factors).toMatchObject({ set: 'en1990-6.10ab', xi: 0.85, psi0: 0.7 });
	});

	it('passes the other check settings through without unknown-key warnings', () => {
		const r = parseCase(
			makeCase((c) => {
				const settings = { deflectionLimitTotal: 250, deflectionGoverns: true, eta: 1.2 };
				Object.assign(c, { ...settings, place: 'Bay 3' });
				Object.assign(c.beam, { bearingLoads: 50, gradeConfirmed: true });
				c.factors = { permanentFavourable: 1.0 };
			})
		);
		if (!r.ok) throw new Error(r.issues[0].message);
		expect(r.value).toMatchObject({
			deflectionLimitTotal: 250,
			deflectionGoverns: true,
			eta: 1.2,
			place: 'Bay 3',
			bearingLoads: 50,
			gradeConfirmed: true
		});
		expect(r.value.factors.permanentFavourable).toBe(1);
		expect(r.warnings.filter((w) => w.code === 'unknown-key')).toEqual([]);
	});

	it('accepts a load ending at the beam end when the span sum rounds below it (8.1 + 1.2 = 9.2999… m)', () => {
		// Regression: a UDL to 9.3 m was refused as off the beam, found by the random-case property.
		const r = parseCase(
			makeCase((c) => {
				c.beam.spans = [8.1, 1.2];
				c.beam.supports = ['pin', 'pin', 'pin'];
				c.loads = [{ kind: 'uniform', from: 0, to: 9.3, value: 1, action: 'permanent' }];
			})
		);
		expect(r.ok && r.value.loads[0]).toMatchObject({ from: 0, to: 9300 });
	});

	it('unknown keys are warnings, not errors', () => {
		const r = parseCase(makeCase((c) => ((c.colour = 'blue'), (c.beam.paint = 'red'))));
		expect(r.ok).toBe(true);
		expect(r.ok && r.warnings.map((w) => [w.path, w.severity])).toEqual(
			expect.arrayContaining([
				['colour', 'warning'],
				['beam.paint', 'warning']
			])
		);
	});

	it('does not modify its input', () => {
		const input = makeCase();
		const copy = structuredClone(input);
		parseCase(input);
		expect(input).toEqual(copy);
	});
});

describe('parseCase: every problem names its field', () => {
	it.each([
		[
			'negative span',
			(c: any) => ((c.beam.spans = [6, -2]), (c.beam.supports = ['pin', 'pin', 'pin'])),
			'beam.spans[1]'
		],
		['NaN span', (c: any) => (c.beam.spans = [Number.NaN]), 'beam.spans[0]'],
		['span given as text', (c: any) => (c.beam.spans = ['6']), 'beam.spans[0]'],
		['support list of wrong length', (c: any) => (c.beam.supports = ['pin']), 'beam.supports'],
		['unknown support kind', (c: any) => (c.beam.supports = ['pin', 'roller']), 'beam.supports[1]'],
		['joint list of wrong length', (c: any) => (c.beam.joints = ['simple']), 'beam.joints'],
		['load off the beam', (c: any) => (c.loads[0].x = 6.5), 'loads[0].x'],
		['load before the beam', (c: any) => (c.loads[1].from = -1), 'loads[1].from'],
		['from after to', (c: any) => ((c.loads[1].from = 4), (c.loads[1].to = 2)), 'loads[1].to'],
		['load value not a number', (c: any) => (c.loads[0].value = '12'), 'loads[0].value'],
		// Regression: 1.5e62 kN passed and overflowed to Infinity in the checks (found by fuzzing).
		['load beyond any plausible size', (c: any) => (c.loads[0].value = 1.5e62), 'loads[0].value'],
		['span beyond any plausible size', (c: any) => (c.beam.spans = [1e9]), 'beam.spans[0]'],
		// Regression: 3.5e-323 kN passed and made "allowed ÷ entered" Infinity (found by fuzzing).
		[
			'load too small to mean anything',
			(c: any) => (c.loads[0].value = 3.5e-323),
			'loads[0].value'
		],
		['span too short to mean anything', (c: any) => (c.beam.spans = [1e-6]), 'beam.spans[0]'],
		[
			'factor too small to mean anything',
			(c: any) => (c.factors = { imposed: 1e-9 }),
			'factors.imposed'
		],
		['missing action', (c: any) => delete c.loads[0].action, 'loads[0].action'],
		['unknown load kind', (c: any) => (c.loads[2].kind = 'moment'), 'loads[2].kind'],
		['fy of zero', (c: any) => (c.beam.grade = { fy: 0 }), 'beam.grade.fy'],
		['cast iron', (c: any) => (c.beam.grade = 'cast-iron'), 'beam.grade'],
		['no grade for a steel section', (c: any) => delete c.beam.grade, 'beam.grade'],
		[
			'unknown designation',
			(c: any) => (c.beam.section = { designation: 'UB 305x165x41' }),
			'beam.section.designation'
		],
		[
			'flange thicker than half the depth',
			(c: any) => (c.beam.section = { shape: 'I', h: 100, b: 100, tw: 6, tf: 60, r: 5 }),
			'beam.section.tf'
		],
		['unknown shape', (c: any) => (c.beam.section = { shape: 'Z', h: 100 }), 'beam.section.shape'],
		['negative section loss', (c: any) => (c.beam.sectionLoss = -1), 'beam.sectionLoss'],
		['negative factor', (c: any) => (c.factors = { permanent: -1 }), 'factors.permanent'],
		['wrong format tag', (c: any) => (c.format = 'beam'), 'format'],
		['newer version', (c: any) => (c.version = 2), 'version'],
		['a mechanism', (c: any) => (c.beam.supports = ['pin', 'free']), 'beam.supports'],
		['flag not a boolean', (c: any) => (c.deflectionGoverns = 'yes'), 'deflectionGoverns'],
		['negative bearing under loads', (c: any) => (c.beam.bearingLoads = -5), 'beam.bearingLoads']
	])('%s', (_name, patch, path) => {
		expect(paths(makeCase(patch))).toContain(path);
	});

	it('a section per span reports the span index in the path', () => {
		const r = makeCase((c) => {
			c.beam.spans = [5, 7];
			c.beam.supports = ['pin', 'pin', 'pin'];
			c.beam.section = [
				{ designation: 'UB 305x165x40' },
				{ shape: 'I', h: 300, b: 150, tw: 7, tf: 0, r: 8 }
			];
		});
		expect(paths(r)).toContain('beam.section[1].tf');
	});

	it('an unknown designation comes with the nearest suggestions', () => {
		const r = parseCase(makeCase((c) => (c.beam.section = { designation: 'UB 305x165x41' })));
		expect(!r.ok && r.issues[0].message).toContain('UB 305x165x40');
	});

	it('reports all problems at once, not only the first', () => {
		const p = paths(
			makeCase((c) => ((c.beam.spans = [-6]), (c.loads[0].value = null), (c.format = 'x')))
		);
		expect(p).toEqual(expect.arrayContaining(['beam.spans[0]', 'loads[0].value', 'format']));
	});

	it('rejects anything that is not an object', () => {
		for (const json of [null, 42, 'case', []]) expect(parseCase(json).ok).toBe(false);
	});
});
