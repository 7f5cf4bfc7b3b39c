import type { LibrarySection } from './types';
import type { SectionRecord } from './make-section';
import { getLibrarySection, listSectionRecords } from './library';
import { parseDesignation } from './designation';

export { listSections } from './library';

interface Indexed {
	section: SectionRecord;
	numbers: number[];
	/** Pipe weight class; null for every other family. */
	weight: string | null;
}

let indexed: Indexed[] | null = null;

/** Every library section with its designation's numbers, parsed once (the tables never change). */
function listIndexed(): Indexed[] {
	if (!indexed) {
		indexed = listSectionRecords().map((section) => {
			const { numbers, weight } = parseDesignation(section.designation);
			return { section, numbers, weight };
		});
	}
	return indexed;
}

/** True when both lists hold the same numbers (5 equals 5.0). */
function isSameNumbers(a: number[], b: number[]): boolean {
	return a.length === b.length && a.every((value, i) => Math.abs(value - b[i]) < 1e-9);
}

/**
 * Finds a library section by designation, forgiving how it is typed: `305x165x40`,
 * `UB305x165x40`, `w 12 x 26`, `HE 300 B`, `SHS 100x100x5`, `100x100x6,3`, `×` or `X`,
 * `HSS8x6x1/2`, `Pipe 4 XS` (a pipe without its weight class is the standard weight).
 * Without a family, the first family whose designation has exactly these numbers wins, in
 * library order (UB and UC serial sizes never collide; hot-finished before cold-formed, W
 * before HP).
 * @example findSection('305 x 165 x 40 UB')?.designation // 'UB 305x165x40'
 * @example findSection('UB 305x165x41') // null
 */
export function findSection(text: string): LibrarySection | null {
	const parsed = parseDesignation(text);
	if (parsed.unknownWord !== null || parsed.numbers.length === 0) return null;
	const weight = parsed.family === 'PIPE' ? (parsed.weight ?? 'std') : null;
	for (const entry of listIndexed()) {
		if (parsed.family && entry.section.family !== parsed.family) continue;
		if (weight !== null && entry.weight !== weight) continue;
		if (isSameNumbers(entry.numbers, parsed.numbers)) return getLibrarySection(entry.section);
	}
	return null;
}

/** Distance between two number lists: sum of |ln ratio|, plus a penalty per missing number. */
function measureNumberDistance(a: number[], b: number[]): number {
	let sum = 0;
	for (let i = 0; i < Math.min(a.length, b.length); i++) {
		sum += Math.abs(Math.log(Math.max(a[i], 1e-6) / Math.max(b[i], 1e-6)));
	}
	return sum + Math.abs(a.length - b.length) * 3;
}

/** Edit distance between two short strings (for designations typed with no usable numbers). */
function measureEditDistance(a: string, b: string): number {
	let row = Array.from({ length: b.length + 1 }, (_, j) => j);
	for (let i = 1; i <= a.length; i++) {
		const next = [i];
		for (let j = 1; j <= b.length; j++) {
			next[j] = Math.min(row[j] + 1, next[j - 1] + 1, row[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
		}
		row = next;
	}
	return row[b.length];
}

/**
 * The n library designations nearest to what was typed, nearest first: same family first
 * (when one was named), then by how far the numbers are off (ratio-wise).
 * @example suggestSections('UB 305x165x41', 3)[0] // 'UB 305x165x40'
 */
export function suggestSections(text: string, n: number): string[] {
	const parsed = parseDesignation(text);
	const typed = text.toLowerCase().replace(/\s+/g, '');
	const scored = listIndexed().map(({ section, numbers }) => {
		const familyPenalty = parsed.family && parsed.family !== section.family ? 10 : 0;
		const score =
			parsed.numbers.length > 0
				? familyPenalty + measureNumberDistance(parsed.numbers, numbers)
				: measureEditDistance(typed, section.designation.toLowerCase().replace(/\s+/g, ''));
		return { designation: section.designation, score };
	});
	scored.sort((a, b) => a.score - b.score);
	return scored.slice(0, Math.max(0, n)).map((s) => s.designation);
}
