import { BACKUP_FORMAT, BACKUP_VERSION, RECORD_SCHEMA_VERSION } from './constants';
import type { CheckStore } from './db';
import { FAILURE_MESSAGES } from './errors';
import { stampNow } from './ids';
import { parseBackup } from './backup-parse';
import { readFrom, writeTo } from './tx';
import type { CheckRecord, ClockOptions, StoreResult } from './types';

/** The backup file: every saved check, in our own format. */
export interface BackupFile {
	format: typeof BACKUP_FORMAT;
	version: number;
	/** When the file was made (ISO 8601, UTC). */
	exportedAt: string;
	appVersion: string;
	engineVersion: string;
	records: CheckRecord[];
}

/** Versions written into the backup, for whoever reads it later. */
export interface ExportOptions extends ClockOptions {
	appVersion: string;
	engineVersion: string;
}

/** Outcome of an import: counts, or why nothing changed. */
export type ImportResult =
	| { ok: true; added: number; updated: number; skipped: number }
	| { ok: false; reason: 'damaged' | 'foreign' | 'newer' | 'storage'; message: string };

/** Writes every saved check (deleted ones left out) as one JSON text, oldest first. */
export async function exportBackup(
	store: CheckStore,
	options: ExportOptions
): Promise<StoreResult<string>> {
	const exportedAt = stampNow(options.now);
	return readFrom(store, async (db) => {
		const records = (await db.getAll('checks'))
			.filter((r) => r.deletedAt === null)
			.sort((a, b) => (a.createdAt < b.createdAt ? -1 : a.createdAt > b.createdAt ? 1 : 0));
		const file: BackupFile = {
			format: BACKUP_FORMAT,
			version: BACKUP_VERSION,
			exportedAt,
			appVersion: options.appVersion,
			engineVersion: options.engineVersion,
			records
		};
		return { ok: true, value: JSON.stringify(file, null, '\t') };
	});
}

/**
 * Merges a backup into the store: a new id is added, a newer `updatedAt` replaces the stored
 * record, anything else (identical, older, or same date) is skipped. The whole file is checked
 * before writing, and the write is one transaction, so a refusal or a failure changes nothing.
 */
export async function importBackup(store: CheckStore, text: string): Promise<ImportResult> {
	const parsed = parseBackup(text);
	if (!parsed.ok) return parsed;
	const outcome = await writeTo(store, ['checks'], async (tx) => {
		const checks = tx.objectStore('checks');
		const counts = { added: 0, updated: 0, skipped: 0 };
		for (const incoming of parsed.records) {
			const existing = await checks.get(incoming.id);
			const action = decideMerge(existing, incoming);
			if (action === 'skip') counts.skipped += 1;
			else {
				await checks.put(incoming);
				counts[action === 'add' ? 'added' : 'updated'] += 1;
			}
		}
		return { ok: true, value: counts };
	});
	if (outcome.ok) return { ok: true, ...outcome.value };
	const known = ['read-only', 'quota', 'closed'].includes(outcome.reason);
	const message = known ? `${outcome.message} Nothing was imported.` : FAILURE_MESSAGES.storage;
	return { ok: false, reason: 'storage', message };
}

/**
 * What a merge does with one incoming record. Pure.
 * @example
 * decideMerge(undefined, record) // 'add'
 */
export function decideMerge(
	existing: CheckRecord | undefined,
	incoming: CheckRecord
): 'add' | 'update' | 'skip' {
	if (!existing) return 'add';
	// A record written by a newer app version is never rewritten.
	if (existing.schemaVersion > RECORD_SCHEMA_VERSION) return 'skip';
	return incoming.updatedAt > existing.updatedAt ? 'update' : 'skip';
}
