import { readSectionDesignation } from './case-file';
import type { CheckRecord } from './types';

/**
 * Whether a record matches a search: every word of the query must appear (case- and
 * accent-insensitive) in the title, place, notes or section designation. An empty query matches.
 * @example
 * matchesSearch(record, 'ipe level 2') // true when all three words appear somewhere
 */
export function matchesSearch(record: CheckRecord, query: string): boolean {
	const words = normalise(query).split(/\s+/).filter(Boolean);
	if (words.length === 0) return true;
	const haystack = normalise(collectSearchText(record));
	return words.every((word) => haystack.includes(word));
}

/** The text a record is searched by. Defensive: a newer record may have another place shape. */
export function collectSearchText(record: CheckRecord): string {
	const place = record.place as unknown;
	const placeText =
		typeof place === 'string'
			? place
			: typeof place === 'object' && place !== null
				? Object.values(place)
						.filter((v) => typeof v === 'string')
						.join(' ')
				: '';
	return [record.title, placeText, record.notes, readSectionDesignation(record.input)]
		.filter((part) => typeof part === 'string')
		.join('\n');
}

function normalise(text: string): string {
	return text
		.normalize('NFD')
		.replace(/\p{Diacritic}/gu, '')
		.toLowerCase();
}
