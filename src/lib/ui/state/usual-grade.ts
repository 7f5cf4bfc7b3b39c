/**
 * The grade a section usually comes in, and when the form may move the grade to it. The section
 * tables name each family's grade (A992 for W, A500 Gr C for HSS, S355 for EN hollow sections,
 * S275 for UB/UC); a section without a table row takes its basis's usual grade for its shape.
 * A grade the user picked is never replaced.
 */
import type { CaseBasis } from '$lib/engine/case';
import type { SectionShape } from '$lib/engine/section/types';
import { readSection, type CaseFile } from './case-file';
import { readBasis } from './design-basis';

/** What the form needs of a table row (the shape `findSection` returns). */
export interface TableRow {
	designation: string;
	shape: SectionShape;
	defaultGrade: string;
}

/** The usual grade of the case's section: id, name, and what it is usual for. */
export interface UsualGrade {
	id: string;
	name: string;
	/** E.g. `W12x26`, or `a round tube on the AISC basis`. */
	forWhat: string;
}

/** What the form reads from the section tables and grade list. */
export interface GradeLookup {
	findSection: (text: string) => TableRow | null;
	listGrades: () => { id: string; name: string }[];
}

/**
 * Usual grade of a section without a table row, by basis and shape: EN 10025-2 S275 for open
 * sections and EN 10210 S355 for tubes (the tables' own family defaults); on AISC, A992 for I
 * sections, A500 Gr C for tubes and A36 for flats (common practice).
 * @example basisGrade('aisc-lrfd', 'CHS') // 'A500-C'
 */
export function basisGrade(basis: CaseBasis, shape: SectionShape | undefined): string {
	const hollow = shape === 'RHS' || shape === 'CHS';
	if (basis === 'eurocode') return hollow ? 'S355' : 'S275';
	if (hollow) return 'A500-C';
	return shape === 'flat' ? 'A36' : 'A992';
}

const SHAPE_WORDS: Record<string, string> = {
	I: 'an I section',
	'welded-I': 'a welded I section',
	RHS: 'a rectangular tube',
	CHS: 'a round tube',
	flat: 'a flat bar'
};

/**
 * The usual grade of the case's section on its basis; null for a known Mp (no grade needed).
 * @example findUsualGrade(caseWithW12x26, lookup) // { id: 'A992', name: 'ASTM A992', forWhat: 'W12x26' }
 */
export function findUsualGrade(c: CaseFile, lookup: GradeLookup): UsualGrade | null {
	const section = readSection(c);
	if ('mp' in section) return null;
	const basis = readBasis(c);
	const row =
		'designation' in section && typeof section.designation === 'string'
			? lookup.findSection(section.designation)
			: null;
	const shape = 'shape' in section ? section.shape : 'I';
	const id = row?.defaultGrade ?? basisGrade(basis, shape);
	const name = lookup.listGrades().find((g) => g.id === id)?.name ?? id;
	const on = basis === 'eurocode' ? 'the Eurocode basis' : 'the AISC basis';
	const forWhat = row ? row.designation : `${SHAPE_WORDS[shape] ?? 'this section'} on ${on}`;
	return { id, name, forWhat };
}

/**
 * The grade after a change of section or basis, or null to keep it: a grade not picked by hand
 * that is still the usual grade before the change (or none) moves to the usual grade after it.
 * Own strengths (`{ fy }`) and any other grade were chosen by someone and stay.
 * @example followGrade({ grade: 'S275', byHand: false, before: 'S275', after: w12 }) // w12 (A992)
 */
export function followGrade(o: {
	grade: CaseFile['beam']['grade'];
	byHand: boolean;
	before: string | undefined;
	after: UsualGrade | null;
}): UsualGrade | null {
	if (o.byHand || !o.after) return null;
	const unset = o.grade === undefined || o.grade === '';
	if (!unset && o.grade !== o.before) return null;
	return o.grade === o.after.id ? null : o.after;
}

/** The note under the grade picker after the form moved the grade. */
export function describeGradeMove(usual: UsualGrade): string {
	return `Steel grade set to ${usual.name}, the usual grade for ${usual.forWhat}. Choose another if the steel is known.`;
}
