import type { SectionFamily, SectionShape } from './types';
import { listSectionRecords } from './library';

/** One family of the section tables: what it is, where its rows come from, how many. */
export interface SectionFamilyEntry {
	family: SectionFamily;
	/** Shapes its rows have (HSS holds rectangular, square and round tubes). */
	shapes: Exclude<SectionShape, 'known-mp'>[];
	/** Product standard(s) of its rows. */
	standards: string[];
	/** Number of rows. */
	count: number;
	/** Material id of the family's usual grade. */
	defaultGrade: string;
}

/**
 * The families the section tables hold, in library order, read from the rows themselves so a
 * new table shows up in every list (CLI help, messages) without being named twice.
 * @example listSectionFamilies().map((f) => f.family) // ['UB', 'UC', 'IPE', …, 'CFCHS']
 */
export function listSectionFamilies(): SectionFamilyEntry[] {
	const byFamily = new Map<SectionFamily, SectionFamilyEntry>();
	for (const record of listSectionRecords()) {
		let entry = byFamily.get(record.family);
		if (!entry) {
			const { family, defaultGrade } = record;
			entry = { family, shapes: [], standards: [], count: 0, defaultGrade };
			byFamily.set(record.family, entry);
		}
		entry.count += 1;
		if (!entry.shapes.includes(record.shape)) entry.shapes.push(record.shape);
		if (!entry.standards.includes(record.standard)) entry.standards.push(record.standard);
	}
	return [...byFamily.values()];
}
