/**
 * The grade follows the section until the user picks one. Family grades as issue 11 §5 and the
 * section tables name them: ASTM A992 for W shapes and ASTM A500 Gr C for HSS (the AISC Manual's
 * preferred grades, Table 2-4, from memory), S355 for EN 10210/10219 hollow sections and S275 for
 * UB/UC (common UK practice). Without a table row: S275/S355 on the Eurocode basis, A992/A500 Gr C
 * on AISC (common practice).
 */
import { describe, expect, it } from 'vitest';
import { listGrades } from '../../../src/lib/engine/material/index';
import { findSection } from '../../../src/lib/engine/section/index';
import { CheckForm } from '../../../src/lib/ui/state/check-form.svelte';
import type { CaseFile } from '../../../src/lib/ui/state/case-file';
import { createBlankCase, createDemoCase } from '../../../src/lib/ui/state/demo-case';
import { switchBasis } from '../../../src/lib/ui/state/design-basis';
import { blankMeasured } from '../../../src/lib/ui/state/measured-section';
import { BUILT_IN_FACTOR_SETS, DEFAULT_SETTINGS } from '../../../src/lib/storage/index';
import { applySettingsDefaults } from '../../../src/lib/ui/state/case-defaults';
import { findUsualGrade, followGrade } from '../../../src/lib/ui/state/usual-grade';

const tools = { findSection, listGrades };
const usualOf = (c: CaseFile) => findUsualGrade(c, tools);
const en610 = BUILT_IN_FACTOR_SETS[0];

function withSection(section: CaseFile['beam']['section'], basis = 'eurocode'): CaseFile {
	const c = createDemoCase();
	return { ...c, basis: basis as CaseFile['basis'], beam: { ...c.beam, section } };
}

function makeForm(c: CaseFile = createDemoCase()): CheckForm {
	const form = new CheckForm({ run: () => null, delay: 10_000 });
	form.load(c);
	return form;
}

describe('findUsualGrade', () => {
	it.each([
		['W12x26', 'A992'],
		['HSS8x6x1/2', 'A500-C'],
		['HSS6.625x0.280', 'A500-C'],
		['SHS 100x100x5.0', 'S355'],
		['CF CHS 48.3x3.0', 'S355'],
		['UB 305x165x40', 'S275'],
		['UC 203x203x46', 'S275']
	])('%s: %s on either basis (the family decides)', (designation, grade) => {
		for (const basis of ['eurocode', 'aisc-lrfd']) {
			const usual = usualOf(withSection({ designation }, basis));
			expect(usual).toMatchObject({ id: grade, forWhat: findSection(designation)!.designation });
		}
	});

	it('a measured section takes its basis and shape; a known Mp needs none', () => {
		expect(usualOf(withSection(blankMeasured('I')))?.id).toBe('S275');
		expect(usualOf(withSection(blankMeasured('CHS')))?.id).toBe('S355');
		expect(usualOf(withSection(blankMeasured('I'), 'aisc-asd'))).toMatchObject({
			id: 'A992',
			name: 'ASTM A992',
			forWhat: 'an I section on the AISC basis'
		});
		expect(usualOf(withSection(blankMeasured('RHS'), 'aisc-lrfd'))?.id).toBe('A500-C');
		expect(usualOf(withSection({ mp: 100 }))).toBeNull();
	});
});

describe('followGrade', () => {
	const w = { id: 'A992', name: 'ASTM A992', forWhat: 'W12x26' };
	it('moves a grade that is still the usual one, or none; keeps any other', () => {
		expect(followGrade({ grade: 'S275', byHand: false, before: 'S275', after: w })).toBe(w);
		expect(followGrade({ grade: undefined, byHand: false, before: 'S275', after: w })).toBe(w);
		expect(followGrade({ grade: 'S355', byHand: false, before: 'S275', after: w })).toBeNull();
		expect(followGrade({ grade: { fy: 235 }, byHand: false, before: 'S275', after: w })).toBeNull();
		expect(followGrade({ grade: 'S275', byHand: true, before: 'S275', after: w })).toBeNull();
		expect(followGrade({ grade: 'A992', byHand: false, before: 'A992', after: w })).toBeNull();
	});
});

describe('CheckForm: the grade follows the section until the user picks one', () => {
	it('a W shape picked from the table takes A992 and the form says so', () => {
		const form = makeForm();
		expect(form.case.beam.grade).toBe('S275');
		form.updateFollowingGrade((c) => (c.beam.section = { designation: 'W12x26' }), usualOf);
		expect(form.case.beam.grade).toBe('A992');
		expect(form.gradeNote).toBe(
			'Steel grade set to ASTM A992, the usual grade for W12x26. Choose another if the steel is known.'
		);
		// Another W: still its family's grade, and the note names the new section.
		form.updateFollowingGrade((c) => (c.beam.section = { designation: 'W14x22' }), usualOf);
		expect(form.case.beam.grade).toBe('A992');
		expect(form.gradeNote).toContain('W14x22');
		// An HSS: A500 Gr C.
		form.updateFollowingGrade((c) => (c.beam.section = { designation: 'HSS8x6x1/2' }), usualOf);
		expect(form.case.beam.grade).toBe('A500-C');
	});

	it('never replaces a grade picked by hand, even the usual one', () => {
		const form = makeForm();
		form.pickGrade('S275');
		form.updateFollowingGrade((c) => (c.beam.section = { designation: 'W12x26' }), usualOf);
		expect(form.case.beam.grade).toBe('S275');
		expect(form.gradeNote).toBeNull();
		form.pickGrade('A572-50');
		form.updateFollowingGrade((c) => (c.beam.section = { designation: 'HSS8x6x1/2' }), usualOf);
		expect(form.case.beam.grade).toBe('A572-50');
	});

	it('keeps an opened grade that is not the usual one of its section', () => {
		const form = makeForm({
			...withSection({ designation: 'W12x26' }),
			beam: { ...withSection({ designation: 'W12x26' }).beam, grade: 'A36' }
		});
		form.updateFollowingGrade((c) => (c.beam.section = { designation: 'W14x22' }), usualOf);
		expect(form.case.beam.grade).toBe('A36');
		expect(form.gradeByHand).toBe(false);
	});

	it('a basis switch moves a grade nobody picked to the section’s usual one on that basis', () => {
		const form = makeForm(withSection(blankMeasured('I')));
		expect(form.case.beam.grade).toBe('S275');
		form.updateFollowingGrade((c) => Object.assign(c, switchBasis(c, 'aisc-lrfd', en610)), usualOf);
		expect(form.case.beam.grade).toBe('A992');
		expect(form.gradeNote).toContain('an I section on the AISC basis');
		form.updateFollowingGrade((c) => Object.assign(c, switchBasis(c, 'eurocode', en610)), usualOf);
		expect(form.case.beam.grade).toBe('S275');
		// A UB keeps its family's grade on either basis; a W takes A992 on AISC.
		const ub = makeForm(withSection({ designation: 'UB 305x165x40' }, 'aisc-lrfd'));
		ub.updateFollowingGrade((c) => Object.assign(c, switchBasis(c, 'eurocode', en610)), usualOf);
		expect(ub.case.beam.grade).toBe('S275');
	});

	it('a measured tube on the Eurocode basis takes S355; a known Mp leaves the grade and the note', () => {
		const form = makeForm(withSection(blankMeasured('I')));
		form.updateFollowingGrade((c) => (c.beam.section = blankMeasured('CHS')), usualOf);
		expect(form.case.beam.grade).toBe('S355');
		expect(form.gradeNote).toContain('a round tube on the Eurocode basis');
		form.updateFollowingGrade((c) => (c.beam.section = { mp: 100 }), usualOf);
		expect(form.case.beam.grade).toBe('S355');
		expect(form.gradeNote).toBeNull();
	});

	it('a new check on the AISC basis starts from A992, so a W shape typed next keeps it', () => {
		const settings = { ...DEFAULT_SETTINGS, defaultBasis: 'aisc-lrfd' as const };
		const blank = applySettingsDefaults(createBlankCase(), settings, en610);
		expect(blank.beam.grade).toBe('A992');
		const en = applySettingsDefaults(createBlankCase(), DEFAULT_SETTINGS, en610);
		expect(en.beam.grade).toBe('S275');
		const form = makeForm(blank);
		form.updateFollowingGrade((c) => (c.beam.section = { designation: 'HSS6.625x0.280' }), usualOf);
		expect(form.case.beam.grade).toBe('A500-C');
	});
});
