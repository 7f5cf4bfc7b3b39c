import { IMPORTED_SUFFIX } from './constants';
import type { CheckRecord } from './types';

/** What an import did, check by check. */
export interface ImportCounts {
	/** Added under their own id (no check here had it). */
	added: number;
	/** Added under a new id beside a different check here with the same id. */
	beside: number;
	/** Already here with the same content: left out. */
	skipped: number;
	/** Of those added, how many did not pass validation (listed as needing attention). */
	attention: number;
	/** Photos added (to the checks added, kept beside, or already here). */
	photos: number;
}

/** The records to add and the counts to report. */
export interface ImportPlan {
	writes: CheckRecord[];
	counts: ImportCounts;
	/**
	 * Where each incoming check ended up, by its id in the file: its own id, the id of the copy
	 * kept beside, or the id of the check already here with the same content. Its photos follow.
	 */
	targets: Map<string, string>;
}

/**
 * Decides what an import adds. It only ever adds: a stored check, deleted or not, is never
 * replaced, hidden or touched. Per incoming record, in order:
 * - the same content is already here (any live check, whatever its id) → skipped;
 * - its id is free → added as it is;
 * - its id is taken → added beside under a new id, its title marked " (imported)".
 * Content means the title (less any " (imported)"), inputs, place, notes, dates and revisions,
 * so a copy kept beside is recognised as already here when the same file is imported again. Pure.
 * @param newId makes a fresh id (tests pass a counter)
 */
export function planImport(
	existing: readonly CheckRecord[],
	incoming: readonly CheckRecord[],
	newId: () => string
): ImportPlan {
	const ids = new Set(existing.map((r) => r.id));
	const live = existing.filter((r) => r.deletedAt === null);
	const contents = new Map(live.map((r) => [contentKey(r), r.id]));
	const counts: ImportCounts = { added: 0, beside: 0, skipped: 0, attention: 0, photos: 0 };
	const writes: CheckRecord[] = [];
	const targets = new Map<string, string>();
	for (const record of incoming) {
		const key = contentKey(record);
		const here = contents.get(key);
		if (here !== undefined) {
			counts.skipped += 1;
			targets.set(record.id, here);
			continue;
		}
		const taken = ids.has(record.id);
		const write = taken ? keepBeside(record, newId()) : record;
		counts[taken ? 'beside' : 'added'] += 1;
		if (write.computed?.verdict === 'needs-attention') counts.attention += 1;
		ids.add(write.id);
		contents.set(key, write.id);
		targets.set(record.id, write.id);
		writes.push(write);
	}
	return { writes, counts, targets };
}

function keepBeside(record: CheckRecord, id: string): CheckRecord {
	return { ...record, id, title: `${baseTitle(record.title)}${IMPORTED_SUFFIX}` };
}

// The title without the mark an import adds, so a copy kept beside matches its source.
function baseTitle(title: unknown): string {
	const text = typeof title === 'string' ? title.trim() : '';
	const base = text.endsWith(IMPORTED_SUFFIX) ? text.slice(0, -IMPORTED_SUFFIX.length) : text;
	return base.trim() || 'Untitled check';
}

/**
 * A record's content as one text, key order ignored: two records with the same text hold the
 * same check. Results and verdicts are left out (they follow from the inputs).
 */
export function contentKey(record: CheckRecord): string {
	const revisions = Array.isArray(record.revisions) ? record.revisions : [];
	return stableText({
		title: baseTitle(record.title),
		createdAt: record.createdAt,
		updatedAt: record.updatedAt,
		place: record.place,
		notes: record.notes,
		input: record.input,
		revisions: revisions.map((r) => ({ savedAt: r.savedAt, input: r.input }))
	});
}

function stableText(value: unknown): string {
	if (Array.isArray(value)) return `[${value.map(stableText).join(',')}]`;
	if (typeof value === 'object' && value !== null) {
		const entries = Object.keys(value)
			.sort()
			.map((k) => `${JSON.stringify(k)}:${stableText((value as Record<string, unknown>)[k])}`);
		return `{${entries.join(',')}}`;
	}
	return JSON.stringify(value) ?? 'null';
}
