import { planImport, type ImportCounts } from './backup-merge';
import { parseBackup } from './backup-parse';
import { BACKUP_FORMAT, BACKUP_VERSION } from './constants';
import type { CheckStore } from './db';
import { FAILURE_MESSAGES } from './errors';
import { createId, stampNow } from './ids';
import { readFrom, writeTo } from './tx';
import type { CheckRecord, ClockOptions, ComputedVerdict, StoreResult } from './types';
import type { Recompute } from './verdicts';

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
	const outcome = await writeTo(store, ['checks'], async (tx) => {
		const checks = tx.objectStore('checks');
		const plan = planImport(await checks.getAll(), records, options.newId ?? createId);
		// add, never put: a clash with a stored id aborts rather than replaces.
		for (const record of plan.writes) await checks.add(record);
		return { ok: true, value: plan.counts };
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
