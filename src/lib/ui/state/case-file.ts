/**
 * The case file as the app edits it: the engine's own JSON shape (`hingepoint.case`), in SI
 * (m, kN, kN/m, kNm; section dimensions mm, stresses MPa). A stored check, a draft and a shared
 * link all hold exactly what the command line reads.
 */
import type { CaseFile } from '$lib/engine/case';

export type { CaseAction, CaseFile, CaseLoad, CaseRestraint } from '$lib/engine/case';
export type {
	SupportKind as SupportChoice,
	JointKind as JointChoice
} from '$lib/engine/model/types';

/** Where the load acts over the depth (for lateral-torsional buckling). */
export type LoadHeight = 'top-flange' | 'shear-centre' | 'bottom-flange';

/** The one section of a beam (the app edits a single section for all spans). */
export type CaseSection = Exclude<CaseFile['beam']['section'], unknown[]>;

/**
 * The section the form edits: the first when the case gives one per span.
 * @example
 * readSection({ beam: { section: [{ mp: 100 }, { mp: 80 }] } }) // { mp: 100 }
 */
export function readSection(c: Pick<CaseFile, 'beam'>): CaseSection {
	const section = c.beam.section;
	return Array.isArray(section) ? section[0] : section;
}

/**
 * Treats stored or linked JSON as a case file. Safe because every case goes through the engine's
 * validation before anything is computed, and problems come back as field messages.
 */
export function asCaseFile(json: unknown): CaseFile {
	return json as CaseFile;
}

/** The case as the storage layer types it (plain JSON with string keys). */
export function asStoredCase(c: CaseFile): CaseFile & Record<string, unknown> {
	return c as CaseFile & Record<string, unknown>;
}
