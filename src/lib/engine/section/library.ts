import type { LibrarySection, SectionDims, SectionFamily, SectionShape } from './types';
import { computeSectionProperties } from './properties';
import { computeRhsCornerRadii } from './rhs';
import { UB_ROWS, UB_STANDARD } from './tables/ub';
import { UC_ROWS, UC_STANDARD } from './tables/uc';
import { EUROPEAN_STANDARD, HEA_ROWS, HEB_ROWS, IPE_ROWS } from './tables/european';
import { W_ROWS, W_STANDARD } from './tables/w-shapes';
import { CHS_ROWS, HOLLOW_STANDARD, RHS_ROWS, SHS_ROWS } from './tables/hollow';
import { US } from '../units';

/** Builds one library entry, computing its properties from its dimensions. */
function makeSection(
	designation: string,
	family: SectionFamily,
	standard: string,
	shape: Exclude<SectionShape, 'known-mp'>,
	dims: SectionDims,
	nominalMass?: number
): LibrarySection {
	const props = computeSectionProperties(shape, dims);
	// Shared by every caller and deliberately not frozen: Svelte's $state proxies cannot wrap
	// frozen objects. Callers copy before changing anything (resolveSection does).
	const section = { designation, family, standard, shape, dims, props };
	return nominalMass === undefined ? section : { ...section, nominalMass };
}

/** Wall thickness as printed in hollow-section designations: always one decimal (5.0, 6.3). */
export function formatWall(t: number): string {
	return t.toFixed(1);
}

/** US rows to mm: inches × 25.4; r = kdes − tf. */
function buildWShapes(): LibrarySection[] {
	return W_ROWS.map(([name, d, bf, tw, tf, kdes]) => {
		const mm = (inch: number) => Math.round(inch * US.inToMm * 1000) / 1000;
		const dims = { h: mm(d), b: mm(bf), tw: mm(tw), tf: mm(tf), r: mm(kdes - tf) };
		const lbPerFt = Number(name.split('x')[1]);
		return makeSection(name, 'W', W_STANDARD, 'I', dims, lbPerFt * US.lbPerFtToKgPerM);
	});
}

/** Builds every standard section of the library, in table order. */
function buildLibrary(): LibrarySection[] {
	const sections: LibrarySection[] = [];
	for (const [family, rows, standard] of [
		['UB', UB_ROWS, UB_STANDARD],
		['UC', UC_ROWS, UC_STANDARD]
	] as const) {
		for (const [serial, h, b, tw, tf, r] of rows) {
			const mass = Number(serial.split('x')[2]);
			const dims = { h, b, tw, tf, r };
			sections.push(makeSection(`${family} ${serial}`, family, standard, 'I', dims, mass));
		}
	}
	for (const [family, rows] of [
		['IPE', IPE_ROWS],
		['HEA', HEA_ROWS],
		['HEB', HEB_ROWS]
	] as const) {
		for (const [size, h, b, tw, tf, r, mass] of rows) {
			const dims = { h, b, tw, tf, r };
			sections.push(makeSection(`${family} ${size}`, family, EUROPEAN_STANDARD, 'I', dims, mass));
		}
	}
	sections.push(...buildWShapes());
	for (const [family, rows] of [
		['SHS', SHS_ROWS],
		['RHS', RHS_ROWS]
	] as const) {
		for (const [h, b, t] of rows) {
			const dims = { h, b, t, ...computeRhsCornerRadii(t, 'hot') };
			const name = `${family} ${h}x${b}x${formatWall(t)}`;
			sections.push(makeSection(name, family, HOLLOW_STANDARD, 'RHS', dims));
		}
	}
	for (const [d, t] of CHS_ROWS) {
		const name = `CHS ${d.toFixed(1)}x${formatWall(t)}`;
		sections.push(makeSection(name, 'CHS', HOLLOW_STANDARD, 'CHS', { d, t }));
	}
	return sections;
}

let cache: readonly LibrarySection[] | null = null;

/**
 * Every standard section of the library (UB, UC, IPE, HEA, HEB, W, SHS, RHS, CHS), dims in mm,
 * properties computed once and shared; treat the result as read-only.
 * @example listSections().find((s) => s.designation === 'UB 305x165x40')?.props.Wply // ≈ 623.1e3
 */
export function listSections(): readonly LibrarySection[] {
	// Built on first use and kept: the tables are constant, so this cache is invisible to callers.
	if (!cache) cache = buildLibrary();
	return cache;
}
