/**
 * The design basis of the check on the form: its choices, the default from settings, the factors
 * a basis starts from, and which grades its picker offers. Separate from units: a US engineer
 * may work in SI and a European one in US units.
 */
// From the files themselves, not the case index: the index brings the parser and with it the
// section tables into the first screen's bundle (they load later, in their own chunk).
import { ASCE7_FACTORS } from '$lib/engine/case/parse-factors';
import { isCaseBasis, type CaseBasis } from '$lib/engine/case/types';
import type { GradeProduct } from '$lib/engine/material';
import type { SectionShape } from '$lib/engine/section/types';
import type { FactorSet } from '$lib/storage';
import { factorsFromSet } from './case-defaults';
import type { CaseFile } from './case-file';

/** The bases in the order the picker shows them, with their plain names. */
export const BASIS_CHOICES: readonly { id: CaseBasis; name: string }[] = [
	{ id: 'eurocode', name: 'Eurocode (EN 1990, EN 1993-1-1)' },
	{ id: 'aisc-lrfd', name: 'AISC 360-22 LRFD (ASCE 7-22)' },
	{ id: 'aisc-asd', name: 'AISC 360-22 ASD (ASCE 7-22)' }
];

/**
 * The basis a case is checked on: the one it names, Eurocode when it names none.
 * @example readBasis({ basis: 'aisc-asd' }) // 'aisc-asd'
 */
export function readBasis(c: Pick<CaseFile, 'basis'>): CaseBasis {
	return isCaseBasis(c.basis) ? c.basis : 'eurocode';
}

/**
 * The factors a new or switched case starts from: the active EN factor set on the Eurocode basis,
 * the ASCE 7-22 values (temporary load as live load) on an AISC basis.
 * @example factorsForBasis('aisc-lrfd', set).permanentAlone // 1.4
 */
export function factorsForBasis(
	basis: CaseBasis,
	set: FactorSet
): NonNullable<CaseFile['factors']> {
	if (basis === 'eurocode') return factorsFromSet(set);
	const name = basis === 'aisc-lrfd' ? 'asce7-lrfd' : 'asce7-asd';
	const f = ASCE7_FACTORS[name];
	return { set: name, ...f, temporary: f.imposed };
}

/**
 * The case moved to another basis, its factors replaced by that basis's (factors of one code
 * mean nothing in another). Does not mutate its argument.
 */
export function switchBasis(c: CaseFile, basis: CaseBasis, set: FactorSet): CaseFile {
	return { ...c, basis, factors: factorsForBasis(basis, set) };
}

/** Which region's grades a basis's picker offers. */
function gradeRegionOf(basis: CaseBasis): 'eurocode' | 'us' {
	return basis === 'eurocode' ? 'eurocode' : 'us';
}

/** The product form of a section shape, for the grade picker (undefined when not known). */
function productOfShape(shape: SectionShape | undefined): GradeProduct | undefined {
	if (shape === 'CHS') return 'round-hollow';
	if (shape === 'RHS') return 'rectangular-hollow';
	return shape === undefined || shape === 'known-mp' ? undefined : 'open';
}

/** A grade entry of the picker (the shape `listGrades` returns). */
export interface GradeEntry {
	id: string;
	name: string;
	standard: string;
	refused: boolean;
}

/**
 * The picker's grades for a basis and section shape. Listed first when the basis's own list
 * lacks them: the chosen grade (it is the case's, and must show as chosen) and the usual grade
 * of the section's family (A992 for a W shape checked on the Eurocode basis).
 * @example pickGrades({ list: listGrades, basis: 'aisc-lrfd', shape: 'CHS', chosen: 'A500-C' })
 */
export function pickGrades(o: {
	list: (options?: { region?: 'eurocode' | 'us'; product?: GradeProduct }) => GradeEntry[];
	basis: CaseBasis;
	shape: SectionShape | undefined;
	chosen: string | null;
	/** Usual grade of the section's family, where the section is a table one. */
	familyGrade?: string;
}): GradeEntry[] {
	const offered = o.list({ region: gradeRegionOf(o.basis), product: productOfShape(o.shape) });
	const wanted = [o.chosen, o.familyGrade].filter(
		(id, i, all): id is string =>
			typeof id === 'string' && all.indexOf(id) === i && !offered.some((g) => g.id === id)
	);
	if (wanted.length === 0) return offered;
	const all = o.list();
	const extra = wanted.flatMap((id) => all.filter((g) => g.id === id));
	return [...extra, ...offered];
}
