import type { LibrarySection, SectionDims, SectionFamily, SectionShape } from './types';
import { computeSectionProperties } from './properties';

/** What a table row becomes: everything a library entry holds except its computed properties. */
export interface SectionRecord {
	designation: string;
	family: SectionFamily;
	standard: string;
	shape: Exclude<SectionShape, 'known-mp'>;
	dims: SectionDims;
	defaultGrade: string;
	nominalMass?: number;
	nominalWall?: number;
}

/** Builds one library entry, computing its properties from its dimensions. */
export function makeSection(record: SectionRecord): LibrarySection {
	const props = computeSectionProperties(record.shape, record.dims);
	// Shared by every caller and deliberately not frozen: Svelte's $state proxies cannot wrap
	// frozen objects. Callers copy before changing anything (resolveSection does).
	const section: LibrarySection = { ...record, props };
	// Optional fields stay absent rather than undefined (JSON output and equality tests).
	if (record.nominalMass === undefined) delete section.nominalMass;
	if (record.nominalWall === undefined) delete section.nominalWall;
	return section;
}
