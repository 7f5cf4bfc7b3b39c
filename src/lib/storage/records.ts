import type { CaseFile } from './case-file';
import { MAX_REVISIONS, RECORD_SCHEMA_VERSION } from './constants';
import type { CheckStore } from './db';
import { fail } from './errors';
import { createId, stampNow } from './ids';
import { requestPersistenceOnce, type PersistenceAnswer } from './persist';
import { matchesSearch } from './search';
import { readFrom, writeTo } from './tx';
import type {
	CheckRecord,
	ClockOptions,
	Place,
	Revision,
	StoreResult,
	VerdictStamp
} from './types';

/** What the form hands over when a check is saved for the first time. */
export interface NewCheck extends ClockOptions {
	title: string;
	place?: Partial<Place>;
	notes?: string;
	/** The inputs as a case file (SI). */
	input: CaseFile;
	/** The report as computed (structured-cloneable), or null. */
	result: unknown;
	engineVersion: string;
	/** The verdict the app computed for `input`, if known; else the list computes it later. */
	computed?: VerdictStamp | null;
}

/** A saved record and, on the first save only, whether persistent storage was granted. */
export interface SavedCheck {
	record: CheckRecord;
	/** null when persistence was not asked on this save (it is asked once). */
	persistence: PersistenceAnswer | null;
}

/**
 * Saves a new check. On the first save ever it also asks the browser to keep the data
 * (`navigator.storage.persist()`), and says whether that was granted.
 */
export async function saveCheck(
	store: CheckStore,
	check: NewCheck
): Promise<StoreResult<SavedCheck>> {
	const at = stampNow(check.now);
	const record: CheckRecord = {
		id: createId(),
		schemaVersion: RECORD_SCHEMA_VERSION,
		title: check.title.trim(),
		place: mergePlace({ building: '', level: '', grid: '' }, check.place),
		notes: check.notes ?? '',
		createdAt: at,
		updatedAt: at,
		engineVersion: check.engineVersion,
		input: check.input,
		result: check.result,
		computed: check.computed ?? null,
		revisions: [],
		deletedAt: null
	};
	const saved = await writeTo(store, ['checks'], async (tx) => {
		await tx.objectStore('checks').add(record);
		return { ok: true, value: record };
	});
	if (!saved.ok) return saved;
	return { ok: true, value: { record, persistence: await requestPersistenceOnce(store) } };
}

/** Reads one check by id; a deleted check counts as not found. */
export async function getCheck(store: CheckStore, id: string): Promise<StoreResult<CheckRecord>> {
	return readFrom(store, async (db) => {
		const record = await db.get('checks', id);
		return record && record.deletedAt === null ? { ok: true, value: record } : fail('not-found');
	});
}

/** Search options for the list of saved checks. */
export interface ListOptions {
	/** Words to find in title, place, notes or section designation; empty lists all. */
	search?: string;
}

/** Lists saved checks, newest change first, optionally filtered by a search. */
export async function listChecks(
	store: CheckStore,
	options: ListOptions = {}
): Promise<StoreResult<CheckRecord[]>> {
	return readFrom(store, async (db) => {
		const all = await db.getAll('checks');
		const records = all
			.filter((r) => r.deletedAt === null && matchesSearch(r, options.search ?? ''))
			.sort((a, b) => (a.updatedAt < b.updatedAt ? 1 : a.updatedAt > b.updatedAt ? -1 : 0));
		return { ok: true, value: records };
	});
}

/** Copies a check under a new id and title, without its revision history. */
export async function duplicateCheck(
	store: CheckStore,
	id: string,
	options: ClockOptions & { title?: string } = {}
): Promise<StoreResult<CheckRecord>> {
	const at = stampNow(options.now);
	return writeTo(store, ['checks'], async (tx) => {
		const checks = tx.objectStore('checks');
		const source = await checks.get(id);
		if (!source || source.deletedAt !== null) return fail('not-found');
		if (source.schemaVersion > RECORD_SCHEMA_VERSION) return fail('newer');
		const copy: CheckRecord = {
			...structuredClone(source),
			id: createId(),
			title: options.title ?? `${source.title} (copy)`,
			createdAt: at,
			updatedAt: at,
			revisions: []
		};
		await checks.add(copy);
		return { ok: true, value: copy };
	});
}

/** Fields an edit may change. A new `input` or `result` keeps the previous pair as a revision. */
export type CheckChanges = Partial<
	Pick<CheckRecord, 'title' | 'notes' | 'input' | 'result' | 'engineVersion' | 'computed'>
> & {
	place?: Partial<Place>;
};

/** Edits a saved check; the previous inputs and result are pushed onto its revision history. */
export async function updateCheck(
	store: CheckStore,
	id: string,
	changes: CheckChanges,
	options: ClockOptions = {}
): Promise<StoreResult<CheckRecord>> {
	const at = stampNow(options.now);
	return writeTo(store, ['checks'], async (tx) => {
		const checks = tx.objectStore('checks');
		const current = await checks.get(id);
		if (!current || current.deletedAt !== null) return fail('not-found');
		if (current.schemaVersion > RECORD_SCHEMA_VERSION) return fail('newer');
		const next = applyChanges(current, changes, at);
		await checks.put(next);
		return { ok: true, value: next };
	});
}

// Pure: the edited record. A revision is kept only when the engineering content changes.
function applyChanges(current: CheckRecord, changes: CheckChanges, at: string): CheckRecord {
	const contentChanged = changes.input !== undefined || changes.result !== undefined;
	const previous: Revision = {
		savedAt: current.updatedAt,
		input: current.input,
		result: current.result,
		engineVersion: current.engineVersion
	};
	const revisions = contentChanged
		? [...current.revisions, previous].slice(-MAX_REVISIONS)
		: current.revisions;
	return {
		...current,
		title: (changes.title ?? current.title).trim(),
		notes: changes.notes ?? current.notes,
		place: mergePlace(current.place, changes.place),
		input: changes.input ?? current.input,
		result: changes.result !== undefined ? changes.result : current.result,
		engineVersion: changes.engineVersion ?? current.engineVersion,
		// A verdict belongs to its inputs: new inputs wait for a new one.
		computed:
			changes.computed !== undefined
				? changes.computed
				: changes.input !== undefined
					? null
					: current.computed,
		updatedAt: at,
		revisions
	};
}

function mergePlace(base: Place, changes: Partial<Place> | undefined): Place {
	return {
		building: changes?.building ?? base.building,
		level: changes?.level ?? base.level,
		grid: changes?.grid ?? base.grid
	};
}
