import { isCaseLike, isPlainObject } from './case-file';

// ISO 8601 exactly as toISOString writes it, so dates compare correctly as text.
const ISO_DATE = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;

/**
 * Checks the shape of a stored check record of schema version 1 to 3 (callers refuse newer
 * versions first). Returns a message naming the first bad field, or null when the record is sound.
 * @param path where the record sits, e.g. 'records[3]', for the message
 */
export function findRecordProblem(raw: unknown, path: string): string | null {
	if (!isPlainObject(raw)) return `${path} is not a saved check.`;
	const r = raw;
	if (typeof r.id !== 'string' || r.id === '') return `${path}.id is missing.`;
	const strings = ['title', 'notes', 'engineVersion'];
	for (const key of strings) if (typeof r[key] !== 'string') return `${path}.${key} is not text.`;
	for (const key of ['createdAt', 'updatedAt']) {
		if (!isIsoDate(r[key])) return `${path}.${key} is not a date.`;
	}
	if (r.deletedAt !== null && !isIsoDate(r.deletedAt)) return `${path}.deletedAt is not a date.`;
	if (!isCaseLike(r.input)) return `${path}.input is not a Hingepoint case.`;
	if (r.schemaVersion === 1 ? typeof r.place !== 'string' : !isPlace(r.place)) {
		return `${path}.place is not a place.`;
	}
	if (!Array.isArray(r.revisions)) return `${path}.revisions is not a list.`;
	for (let i = 0; i < r.revisions.length; i++) {
		const problem = findRevisionProblem(r.revisions[i], `${path}.revisions[${i}]`);
		if (problem) return problem;
	}
	if (!('result' in r)) return `${path}.result is missing.`;
	return null;
}

function findRevisionProblem(raw: unknown, path: string): string | null {
	if (!isPlainObject(raw)) return `${path} is not a revision.`;
	if (!isIsoDate(raw.savedAt)) return `${path}.savedAt is not a date.`;
	if (!isCaseLike(raw.input)) return `${path}.input is not a Hingepoint case.`;
	if (typeof raw.engineVersion !== 'string') return `${path}.engineVersion is not text.`;
	if (!('result' in raw)) return `${path}.result is missing.`;
	return null;
}

function isPlace(value: unknown): boolean {
	return (
		isPlainObject(value) &&
		typeof value.building === 'string' &&
		typeof value.level === 'string' &&
		typeof value.grid === 'string'
	);
}

function isIsoDate(value: unknown): boolean {
	return typeof value === 'string' && ISO_DATE.test(value) && !Number.isNaN(Date.parse(value));
}
