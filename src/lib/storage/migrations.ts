import type { IDBPDatabase, IDBPTransaction, StoreNames } from 'idb';
import { upgradeRecord } from './record-upgrade';
import type { HingepointDB } from './schema';

type UpgradeDB = IDBPDatabase<HingepointDB>;
type UpgradeTx = IDBPTransaction<HingepointDB, StoreNames<HingepointDB>[], 'versionchange'>;

/** One store-level upgrade, run inside the version-change transaction. */
export interface StoreMigration {
	/** Database version this step produces; rises by exactly one, never reused. */
	version: number;
	reason: string;
	up: (db: UpgradeDB, tx: UpgradeTx) => void;
	/** Records change shape at this step: rewrite them (once, however many steps ask). */
	rewritesRecords?: boolean;
}

/** Ordered store migrations. Each awaits nothing but IndexedDB. */
export const STORE_MIGRATIONS: readonly StoreMigration[] = [
	{
		version: 1,
		reason: 'first stores: checks, the current draft, settings and flags',
		up: (db) => {
			db.createObjectStore('checks', { keyPath: 'id' });
			db.createObjectStore('drafts', { keyPath: 'slot' });
			db.createObjectStore('meta', { keyPath: 'key' });
		}
	},
	{
		version: 2,
		reason: 'newest-first list index; records rewritten with the place split out',
		up: (_db, tx) => {
			tx.objectStore('checks').createIndex('by-updated', 'updatedAt');
		},
		rewritesRecords: true
	},
	{
		version: 3,
		reason: 'records rewritten with an empty computed-verdict slot, filled by the current engine',
		up: () => undefined,
		rewritesRecords: true
	},
	{
		version: 4,
		reason: 'photos of a check in their own store, so listing checks never loads image bytes',
		up: (db) => {
			db.createObjectStore('photos', { keyPath: ['checkId', 'id'] });
		}
	}
];

/**
 * Runs every store migration above `oldVersion` up to `newVersion`, in order (falls through by
 * old version, so a database two versions behind gets both steps).
 */
export function applyStoreMigrations(
	db: UpgradeDB,
	tx: UpgradeTx,
	oldVersion: number,
	newVersion: number
): void {
	let rewrite = false;
	for (const step of STORE_MIGRATIONS) {
		if (step.version <= oldVersion || step.version > newVersion) continue;
		step.up(db, tx);
		// A new database has no records; an old one is walked once, to the current shape.
		rewrite ||= oldVersion > 0 && step.rewritesRecords === true;
	}
	if (rewrite) void rewriteRecords(tx).catch(() => abortQuietly(tx));
}

// Walks the checks with a cursor and rewrites each older record in place. Records already at
// or above the current shape are left untouched (a newer record is never rewritten).
async function rewriteRecords(tx: UpgradeTx): Promise<void> {
	let cursor = await tx.objectStore('checks').openCursor();
	while (cursor) {
		const upgraded = upgradeRecord(cursor.value);
		if (upgraded.ok && upgraded.upgraded) await cursor.update(upgraded.record);
		cursor = await cursor.continue();
	}
}

function abortQuietly(tx: { abort(): void }): void {
	try {
		tx.abort();
	} catch {
		// Already finished or aborted.
	}
}
