/**
 * The design basis on the form, in settings, in saved records and in share links. Factors on the
 * AISC bases: ASCE 7-22 §2.3.1 (1.4D; 1.2D + 1.6L) and §2.4.1 (D; D + L), from memory; the
 * proposed temporary load as live load (common practice until a construction-load factor is
 * confirmed). EN 1990 Table A1.2(B) recommended γG = 1.35, γQ = 1.5 on the Eurocode basis.
 */
import { describe, expect, it } from 'vitest';
import { listGrades } from '../../../src/lib/engine/material/index';
import { parseCase } from '../../../src/lib/engine/case/index';
import { decodeCaseFromFragment, encodeCaseToFragment } from '../../../src/lib/share/index';
import {
	BUILT_IN_FACTOR_SETS,
	DEFAULT_SETTINGS,
	getCheck,
	sanitizeSettings,
	saveCheck
} from '../../../src/lib/storage/index';
import { applySettingsDefaults } from '../../../src/lib/ui/state/case-defaults';
import {
	factorsForBasis,
	pickGrades,
	readBasis,
	switchBasis
} from '../../../src/lib/ui/state/design-basis';
import type { CaseFile } from '../../../src/lib/ui/state/case-file';
import { demoCase, openFreshStore } from '../../storage/support';

const en610 = BUILT_IN_FACTOR_SETS[0];

/** A valid invented US case on the SI form (demo numbers). */
function usBeam(): CaseFile {
	return {
		format: 'hingepoint.case',
		version: 1,
		beam: {
			spans: [6],
			supports: ['pin', 'pin'],
			section: { designation: 'UB 305x165x40' },
			grade: 'S275',
			restraint: { lateral: 'continuous' }
		},
		loads: [{ kind: 'point', x: 3, value: 10, action: 'temporary' }]
	};
}

describe('factors a basis starts from', () => {
	it('AISC LRFD: 1.2D + 1.6L, 1.4D alone, temporary as live (1.6)', () => {
		expect(factorsForBasis('aisc-lrfd', en610)).toEqual({
			set: 'asce7-lrfd',
			permanent: 1.2,
			permanentAlone: 1.4,
			imposed: 1.6,
			temporary: 1.6
		});
	});

	it('AISC ASD: every factor 1.0', () => {
		const f = factorsForBasis('aisc-asd', en610);
		expect(f).toMatchObject({ set: 'asce7-asd', permanent: 1, permanentAlone: 1, imposed: 1 });
		expect(f.temporary).toBe(1);
	});

	it('Eurocode: the factor set from settings (γG 1.35, γQ 1.5)', () => {
		expect(factorsForBasis('eurocode', en610)).toMatchObject({ permanent: 1.35, imposed: 1.5 });
	});
});

describe('switching the basis of a check', () => {
	it('replaces the factors (an EN set is refused on AISC), keeps the rest, mutates nothing', () => {
		const before = { ...usBeam(), factors: factorsForBasis('eurocode', en610) };
		const copy = structuredClone(before);
		const after = switchBasis(before, 'aisc-lrfd', en610);
		expect(before).toEqual(copy);
		expect(readBasis(after)).toBe('aisc-lrfd');
		expect(after.factors?.set).toBe('asce7-lrfd');
		expect(after.beam).toEqual(before.beam);
		const parsed = parseCase(after);
		expect(parsed.ok && parsed.value.basis).toBe('aisc-lrfd');
		const back = parseCase(switchBasis(after, 'eurocode', en610));
		expect(back.ok && back.value.factors.permanent).toBe(1.35);
	});

	it('a case without a basis reads as Eurocode', () => {
		expect(readBasis(usBeam())).toBe('eurocode');
	});
});

describe('the default in settings, separate from units', () => {
	it('settings stored before the basis existed read as Eurocode', () => {
		const { defaultBasis: _, ...old } = DEFAULT_SETTINGS;
		expect(sanitizeSettings({ ...old, units: 'US' })).toMatchObject({
			units: 'US',
			defaultBasis: 'eurocode'
		});
	});

	it.each(['aisc-lrfd', 'aisc-asd'])(
		'keeps %s with SI units, and refuses an unknown basis',
		(b) => {
			expect(sanitizeSettings({ units: 'SI', defaultBasis: b })).toMatchObject({
				units: 'SI',
				defaultBasis: b
			});
			expect(sanitizeSettings({ defaultBasis: 'aisc' }).defaultBasis).toBe('eurocode');
		}
	);

	it('a new check takes the default basis and its factors, and is a valid case', () => {
		const settings = { ...sanitizeSettings(DEFAULT_SETTINGS), defaultBasis: 'aisc-asd' as const };
		const c = applySettingsDefaults(usBeam(), settings, en610);
		expect(c.basis).toBe('aisc-asd');
		expect(c.factors?.set).toBe('asce7-asd');
		const parsed = parseCase(c);
		if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
		expect(parsed.value.factors.imposed).toBe(1);
	});
});

describe('the grade picker follows the basis and the section', () => {
	it('AISC with a W shape: US open-section grades, no EN grades, irons last', () => {
		const ids = pickGrades({
			list: listGrades,
			basis: 'aisc-lrfd',
			shape: 'I',
			chosen: 'A992'
		}).map((g) => g.id);
		expect(ids).toContain('A992');
		expect(ids).not.toContain('S275');
		expect(ids).not.toContain('A500-C');
		expect(ids.slice(-2)).toEqual(['cast-iron', 'wrought-iron']);
	});

	it('a round tube on AISC offers the A500, A1085 and A53 grades', () => {
		const ids = pickGrades({ list: listGrades, basis: 'aisc-asd', shape: 'CHS', chosen: null }).map(
			(g) => g.id
		);
		expect(ids).toEqual(expect.arrayContaining(['A500-B', 'A500-C', 'A1085', 'A53-B']));
		expect(ids).not.toContain('A992');
	});

	it("a W shape on the Eurocode basis also offers its family's grade (A992)", () => {
		const ids = pickGrades({
			list: listGrades,
			basis: 'eurocode',
			shape: 'I',
			chosen: 'S275',
			familyGrade: 'A992'
		}).map((g) => g.id);
		expect(ids[0]).toBe('A992');
		expect(ids).toContain('S275');
		expect(ids.filter((id) => id === 'A992')).toHaveLength(1);
	});

	it('the chosen grade stays listed when it belongs to the other basis', () => {
		const list = pickGrades({ list: listGrades, basis: 'aisc-lrfd', shape: 'I', chosen: 'S275' });
		expect(list[0].id).toBe('S275');
		const en = pickGrades({ list: listGrades, basis: 'eurocode', shape: 'I', chosen: 'S275' });
		expect(en.map((g) => g.id)).not.toContain('A992');
	});
});

describe('saved records and share links keep the basis', () => {
	it('a share link round-trips basis and units', () => {
		const c = { ...switchBasis(usBeam(), 'aisc-lrfd', en610), units: 'si' as const };
		const decoded = decodeCaseFromFragment(`#${encodeCaseToFragment(c)}`);
		expect(decoded).toMatchObject({ ok: true, value: { basis: 'aisc-lrfd', units: 'si' } });
	});

	it('a saved check reads back with its basis', async () => {
		const store = await openFreshStore('basis');
		const input = { ...demoCase(), basis: 'aisc-asd' as const };
		const saved = await saveCheck(store, {
			title: 'Basis kept',
			input,
			result: { demo: true },
			engineVersion: '0.1.0',
			now: new Date('2026-05-01T10:00:00.000Z')
		});
		if (!saved.ok) throw new Error(saved.message);
		const read = await getCheck(store, saved.value.record.id);
		expect(read.ok && (read.value?.input as CaseFile).basis).toBe('aisc-asd');
	});
});
