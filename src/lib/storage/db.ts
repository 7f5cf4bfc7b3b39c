import { openDB, type IDBPDatabase } from 'idb';
import { DB_NAME, DB_VERSION } from './constants';
import { FAILURE_MESSAGES } from './errors';
import { applyStoreMigrations } from './migrations';
import type { HingepointDB } from './schema';

/** Connection state the UI can react to ('update-needed': show the update notice). */
export type StoreStatus = 'open' | 'update-needed' | 'terminated' | 'closed';

/** Callbacks for events the UI should show. */
export interface OpenStoreOptions {
	/** Another tab holds an older version open; ask the user to close it. */
	onBlocked?: () => void;
	/** The connection closed itself (newer version waiting, or the browser ended it). */
	onStatus?: (status: StoreStatus) => void;
}

/** An open saved-checks database. UI code gets one from `openStore` and passes it back in. */
export class CheckStore {
	readonly name: string;
	/** True when the data was written by a newer app version: reads work, writes are refused. */
	readonly readOnly: boolean;
	/** A message to show while read-only, else null. */
	readonly notice: string | null;
	#db: IDBPDatabase<HingepointDB>;
	#status: StoreStatus = 'open';
	#listeners = new Set<(status: StoreStatus) => void>();

	constructor(options: { name: string; db: IDBPDatabase<HingepointDB>; readOnly: boolean }) {
		this.name = options.name;
		this.#db = options.db;
		this.readOnly = options.readOnly;
		this.notice = options.readOnly ? FAILURE_MESSAGES['read-only'] : null;
	}

	get status(): StoreStatus {
		return this.#status;
	}

	/** The live connection, or null once closed. */
	get db(): IDBPDatabase<HingepointDB> | null {
		return this.#status === 'open' ? this.#db : null;
	}

	/** Subscribes to status changes; returns the unsubscribe function. */
	onStatus(listener: (status: StoreStatus) => void): () => void {
		this.#listeners.add(listener);
		return () => this.#listeners.delete(listener);
	}

	/** Closes the connection and tells listeners why. */
	close(status: StoreStatus = 'closed'): void {
		if (this.#status !== 'open') return;
		this.#status = status;
		this.#db.close();
		for (const listener of this.#listeners) listener(status);
	}

	/** Records that the browser ended the connection (no close call is needed). */
	markTerminated(): void {
		if (this.#status !== 'open') return;
		this.#status = 'terminated';
		for (const listener of this.#listeners) listener('terminated');
	}
}

/** Outcome of opening the store. */
export type OpenStoreResult =
	{ ok: true; store: CheckStore } | { ok: false; reason: 'storage'; message: string };

/**
 * Opens (creating or upgrading as needed) the saved-checks database. Data written by a newer app
 * version opens read-only with an "update the app" notice and is never rewritten.
 * @param name database name; tests pass a distinct one each
 */
export async function openStore(
	name: string = DB_NAME,
	options: OpenStoreOptions = {}
): Promise<OpenStoreResult> {
	let store: CheckStore | null = null;
	try {
		const db = await openDB<HingepointDB>(name, DB_VERSION, {
			upgrade: (database, oldVersion, newVersion, tx) => {
				// A failed upgrade rejects openDB itself; this only keeps the abort from surfacing twice.
				tx.done.catch(() => undefined);
				applyStoreMigrations(database, tx, oldVersion, newVersion ?? DB_VERSION);
			},
			blocked: () => options.onBlocked?.(),
			// A newer version waits for us: let it upgrade, and have the UI offer the reload.
			blocking: () => store?.close('update-needed'),
			terminated: () => store?.markTerminated()
		});
		store = new CheckStore({ name, db, readOnly: false });
	} catch (error) {
		const opened = isVersionError(error) ? await openNewerReadOnly(name) : null;
		if (!opened) return { ok: false, reason: 'storage', message: FAILURE_MESSAGES.storage };
		store = opened;
	}
	if (options.onStatus) store.onStatus(options.onStatus);
	return { ok: true, store };
}

// Opening without a version takes whatever version exists and runs no upgrade.
async function openNewerReadOnly(name: string): Promise<CheckStore | null> {
	let store: CheckStore | null = null;
	try {
		const db = await openDB<HingepointDB>(name, undefined, {
			blocking: () => store?.close('update-needed'),
			terminated: () => store?.markTerminated()
		});
		store = new CheckStore({ name, db, readOnly: true });
		return store;
	} catch {
		return null;
	}
}

function isVersionError(error: unknown): boolean {
	return (
		typeof error === 'object' && error !== null && 'name' in error && error.name === 'VersionError'
	);
}
