import { planImport, type ImportCounts } from './backup-merge';
import { parseBackup } from './backup-parse';
import { planPhotos } from './backup-photo-merge';
import { toBackupPhotos, type BackupPhoto } from './backup-photos';
import { BACKUP_FORMAT, BACKUP_VERSION, MAX_BACKUP_CHARS } from './constants';
import type { CheckStore } from './db';
import { fail, FAILURE_MESSAGES } from './errors';
import { createId, stampNow } from './ids';
import { byAdded, photoRange } from './photos';
import { readFrom, writeTo, type WriteTx } from './tx';
import type { CheckRecord, ClockOptions, ComputedVerdict, PhotoRecord, StoreResult } from './types';
import type { Recompute } from './verdicts';

/** The backup file: every saved check and its photos, in our own format. */
export interface BackupFile {
	format: typeof BACKUP_FORMAT;
	version: number;
	/** When the file was made (ISO 8601, UTC). */
	exportedAt: string;
	appVersion: string;
	engineVersion: string;
	records: CheckRecord[];
	/** Since version 2: the photos of those checks, bytes as base64. */
	photos: BackupPhoto[];
}

/** Versions written into the backup, for whoever reads it later. */
export interface ExportOptions extends ClockOptions {
	appVersion: string;
	engineVersion: string;
}

/** What an import needs from the UI: the engine's verdict, and which engine gave it. */
export interface ImportOptions {
	recompute: Recompute;
	engineVersion: string;
	/** Makes ids for checks kept beside; tests pass a counter. */
	newId?: () => string;
}

/** Outcome of an import: counts, or why nothing changed. */
export type ImportResult =
	| ({ ok: true } & ImportCounts)
	| { ok: false; reason: 'damaged' | 'foreign' | 'newer' | 'storage'; message: string };

/**
 * Writes every saved check (deleted ones left out) and their photos as one JSON text, oldest
 * first. A file too large to be read back is refused with a message rather than written.
 */
export async function exportBackup(
	store: CheckStore,
	options: ExportOptions
): Promise<StoreResult<string>> {
	const exportedAt = stampNow(options.now);
	return readFrom(store, async (db) => {
		const records = (await db.getAll('checks'))
			.filter((r) => r.deletedAt === null)
			.sort((a, b) => (a.createdAt < b.createdAt ? -1 : a.createdAt > b.createdAt ? 1 : 0));
		const live = new Set(records.map((r) => r.id));
		const photos = (await db.getAll('photos')).filter((p) => live.has(p.checkId)).sort(byAdded);
		const file: BackupFile = {
			format: BACKUP_FORMAT,
			version: BACKUP_VERSION,
			exportedAt,
			appVersion: options.appVersion,
			engineVersion: options.engineVersion,
			records,
			photos: toBackupPhotos(photos)
		};
		const text = JSON.stringify(file, null, '\t');
		if (text.length > MAX_BACKUP_CHARS) return tooLarge(text.length);
		return { ok: true, value: text };
	});
}

function tooLarge(chars: number): StoreResult<string> {
	const mb = (n: number) => Math.round(n / 1e6);
	return fail(
		'invalid',
		`With its photos this backup would be about ${mb(chars)} MB, more than the ${mb(MAX_BACKUP_CHARS)} MB one backup can hold. Remove photos from checks you no longer need, then export again. Nothing was changed.`
	);
}

/**
 * Adds a backup's checks to the store without changing any check already here (see
 * `planImport` for the rule). Each imported case is checked again by `recompute` before it is
 * stored; the file's own results and verdicts are never listed. The whole file is checked
 * before writing and the write is one transaction, so a refusal or a failure (a full disk)
 * changes nothing.
 */
export async function importBackup(
	store: CheckStore,
	text: string,
	options: ImportOptions
): Promise<ImportResult> {
	const parsed = parseBackup(text);
	if (!parsed.ok) return parsed;
	// Computed before the transaction opens: it may await, and a transaction must not.
	const records = await withVerdicts(parsed.records, options);
	const newId = options.newId ?? createId;
	const outcome = await writeTo(store, ['checks', 'photos'], async (tx) => {
		const checks = tx.objectStore('checks');
		const plan = planImport(await checks.getAll(), records, newId);
		// add, never put: a clash with a stored id aborts rather than replaces.
		for (const record of plan.writes) await checks.add(record);
		const photos = await addPhotos(tx, parsed.photos, plan.targets, newId);
		return { ok: true, value: { ...plan.counts, photos } };
	});
	if (outcome.ok) return { ok: true, ...outcome.value };
	const known = ['read-only', 'quota', 'closed'].includes(outcome.reason);
	const message = known ? `${outcome.message} Nothing was imported.` : FAILURE_MESSAGES.storage;
	return { ok: false, reason: 'storage', message };
}

async function withVerdicts(
	records: readonly CheckRecord[],
	options: ImportOptions
): Promise<CheckRecord[]> {
	const out: CheckRecord[] = [];
	for (const record of records) {
		let verdict: ComputedVerdict;
		try {
			verdict = await options.recompute(record.input);
		} catch {
			verdict = 'needs-attention';
		}
		out.push({ ...record, computed: { verdict, computedBy: options.engineVersion } });
	}
	return out;
}

// Each photo follows its check (see planPhotos); returns how many were added.
async function addPhotos(
	tx: WriteTx,
	incoming: readonly PhotoRecord[],
	targets: ReadonlyMap<string, string>,
	newId: () => string
): Promise<number> {
	const store = tx.objectStore('photos');
	const existing = new Map<string, PhotoRecord[]>();
	for (const photo of incoming) {
		const target = targets.get(photo.checkId);
		if (target === undefined || existing.has(target)) continue;
		existing.set(target, await store.getAll(photoRange(target)));
	}
	const writes = planPhotos(incoming, targets, existing, newId);
	for (const photo of writes) await store.add(photo);
	return writes.length;
}
