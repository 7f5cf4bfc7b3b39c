import type { IDBPDatabase, IDBPTransaction, StoreNames } from 'idb';
import type { CheckStore } from './db';
import { fail, toFailure } from './errors';
import type { HingepointDB } from './schema';
import type { StoreResult } from './types';

type Names = StoreNames<HingepointDB>;
/** A read-write transaction over some of our stores. */
export type WriteTx = IDBPTransaction<HingepointDB, Names[], 'readwrite'>;

/**
 * Runs read-only work on the store's connection, turning any failure into an outcome.
 * `work` must await nothing but IndexedDB.
 */
export async function readFrom<T>(
	store: CheckStore,
	work: (db: IDBPDatabase<HingepointDB>) => Promise<StoreResult<T>>
): Promise<StoreResult<T>> {
	const db = store.db;
	if (!db) return fail('closed');
	try {
		return await work(db);
	} catch (error) {
		return toFailure(error);
	}
}

/**
 * Runs `work` in one read-write transaction and commits only if it returns ok: a failed outcome
 * or a thrown error (a full disk, an eviction) aborts, so nothing is half-written.
 * `work` must await nothing but IndexedDB.
 */
export async function writeTo<T>(
	store: CheckStore,
	names: Names[],
	work: (tx: WriteTx) => Promise<StoreResult<T>>
): Promise<StoreResult<T>> {
	if (store.readOnly) return fail('read-only');
	const db = store.db;
	if (!db) return fail('closed');
	let tx: WriteTx;
	try {
		tx = db.transaction(names, 'readwrite');
	} catch (error) {
		return toFailure(error);
	}
	const done = tx.done;
	// Observed below; this stops an abort from surfacing as an unhandled rejection.
	done.catch(() => undefined);
	try {
		const outcome = await work(tx);
		if (!outcome.ok) {
			abortQuietly(tx);
			return outcome;
		}
		await done;
		return outcome;
	} catch (error) {
		abortQuietly(tx);
		return toFailure(error);
	}
}

function abortQuietly(tx: WriteTx): void {
	try {
		tx.abort();
	} catch {
		// Already committed or aborted.
	}
}
