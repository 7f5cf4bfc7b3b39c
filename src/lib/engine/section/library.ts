import type { LibrarySection } from './types';
import { makeSection, type SectionRecord } from './make-section';
import { computeRhsCornerRadii } from './rhs';
import { buildUsSections } from './library-us';
import { UB_ROWS, UB_STANDARD, UK_DEFAULT_GRADE } from './tables/ub';
import { UC_ROWS, UC_STANDARD } from './tables/uc';
import {
	EUROPEAN_DEFAULT_GRADE,
	EUROPEAN_STANDARD,
	HEA_ROWS,
	HEB_ROWS,
	HEM_ROWS,
	IPE_ROWS
} from './tables/european';
import {
	CHS_ROWS,
	HOLLOW_DEFAULT_GRADE,
	HOLLOW_STANDARD,
	RHS_ROWS,
	SHS_ROWS
} from './tables/hollow';
import { CF_CHS_ROWS, CF_RHS_ROWS, CF_SHS_ROWS, COLD_HOLLOW_STANDARD } from './tables/hollow-cold';

/** Wall thickness as printed in hollow-section designations: always one decimal (5.0, 6.3). */
export function formatWall(t: number): string {
	return t.toFixed(1);
}

/** UK and European rolled I and H sections. */
function buildEuropeanRolled(): SectionRecord[] {
	const sections: SectionRecord[] = [];
	for (const [family, rows, standard] of [
		['UB', UB_ROWS, UB_STANDARD],
		['UC', UC_ROWS, UC_STANDARD]
	] as const) {
		for (const [serial, h, b, tw, tf, r] of rows) {
			sections.push({
				designation: `${family} ${serial}`,
				family,
				standard,
				shape: 'I',
				dims: { h, b, tw, tf, r },
				defaultGrade: UK_DEFAULT_GRADE,
				nominalMass: Number(serial.split('x')[2])
			});
		}
	}
	for (const [family, rows] of [
		['IPE', IPE_ROWS],
		['HEA', HEA_ROWS],
		['HEB', HEB_ROWS],
		['HEM', HEM_ROWS]
	] as const) {
		for (const [size, h, b, tw, tf, r, nominalMass] of rows) {
			sections.push({
				designation: `${family} ${size}`,
				family,
				standard: EUROPEAN_STANDARD,
				shape: 'I',
				dims: { h, b, tw, tf, r },
				defaultGrade: EUROPEAN_DEFAULT_GRADE,
				nominalMass
			});
		}
	}
	return sections;
}

/** Hot-finished (EN 10210-2) and cold-formed (EN 10219-2, designations `CF …`) hollow sections. */
function buildEuropeanHollow(): SectionRecord[] {
	const sections: SectionRecord[] = [];
	const groups = [
		{ prefix: '', process: 'hot', standard: HOLLOW_STANDARD, SHS: SHS_ROWS, RHS: RHS_ROWS },
		{
			prefix: 'CF',
			process: 'cold',
			standard: COLD_HOLLOW_STANDARD,
			SHS: CF_SHS_ROWS,
			RHS: CF_RHS_ROWS
		}
	] as const;
	for (const group of groups) {
		for (const kind of ['SHS', 'RHS'] as const) {
			for (const [h, b, t] of group[kind]) {
				sections.push({
					designation: `${group.prefix} ${kind} ${h}x${b}x${formatWall(t)}`.trim(),
					family: `${group.prefix}${kind}`,
					standard: group.standard,
					shape: 'RHS',
					dims: { h, b, t, ...computeRhsCornerRadii(t, group.process) },
					defaultGrade: HOLLOW_DEFAULT_GRADE
				});
			}
		}
	}
	for (const [prefix, rows, standard] of [
		['', CHS_ROWS, HOLLOW_STANDARD],
		['CF', CF_CHS_ROWS, COLD_HOLLOW_STANDARD]
	] as const) {
		for (const [d, t] of rows) {
			sections.push({
				designation: `${prefix} CHS ${d.toFixed(1)}x${formatWall(t)}`.trim(),
				family: `${prefix}CHS`,
				standard,
				shape: 'CHS',
				dims: { d, t },
				defaultGrade: HOLLOW_DEFAULT_GRADE
			});
		}
	}
	return sections;
}

let records: readonly SectionRecord[] | null = null;
let cache: readonly LibrarySection[] | null = null;
const built = new Map<SectionRecord, LibrarySection>();

/**
 * Every standard section as a record without its properties, in library order: enough to
 * search by designation or by dimensions without computing 1 600 sets of properties.
 */
export function listSectionRecords(): readonly SectionRecord[] {
	// Built on first use and kept: the tables are constant, so this cache is invisible to callers.
	records ??= [...buildEuropeanRolled(), ...buildUsSections(), ...buildEuropeanHollow()];
	return records;
}

/** The library entry of one record, its properties computed on first request and kept. */
export function getLibrarySection(record: SectionRecord): LibrarySection {
	let section = built.get(record);
	if (!section) {
		section = makeSection(record);
		built.set(record, section);
	}
	return section;
}

/**
 * Every standard section of the library (UB, UC, IPE, HEA, HEB, HEM, W, HP, S, HSS, PIPE, SHS,
 * RHS, CHS and the cold-formed CFSHS, CFRHS, CFCHS), dims in mm, properties computed once and
 * shared; treat the result as read-only.
 * @example listSections().find((s) => s.designation === 'UB 305x165x40')?.props.Wply // ≈ 623.1e3
 */
export function listSections(): readonly LibrarySection[] {
	cache ??= listSectionRecords().map(getLibrarySection);
	return cache;
}
