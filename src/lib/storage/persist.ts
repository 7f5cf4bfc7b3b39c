import { META_KEYS } from './constants';
import type { CheckStore } from './db';
import { fail } from './errors';
import { readFrom, writeTo } from './tx';
import type { StoreResult } from './types';

/** The browser's answer to a request for persistent storage. */
export type PersistenceAnswer = 'granted' | 'denied' | 'unsupported';

/** The part of `navigator.storage` we use; tests pass a stub. */
export interface PersistCapable {
	persist?: () => Promise<boolean>;
}

/**
 * Asks the browser not to evict our data (`navigator.storage.persist()`), never throwing.
 * @example
 * await requestPersistence() // 'denied' in headless Chromium
 */
export async function requestPersistence(
	storage: PersistCapable | undefined = globalThis.navigator?.storage
): Promise<PersistenceAnswer> {
	if (!storage || typeof storage.persist !== 'function') return 'unsupported';
	try {
		return (await storage.persist()) ? 'granted' : 'denied';
	} catch {
		return 'denied';
	}
}

/**
 * Asks for persistent storage the first time only (a flag in `meta` remembers); null when it
 * was asked before. The flag is written before asking so a slow prompt is not asked twice.
 */
export async function requestPersistenceOnce(
	store: CheckStore,
	storage?: PersistCapable
): Promise<PersistenceAnswer | null> {
	const flagged = await writeTo(store, ['meta'], async (tx) => {
		const meta = tx.objectStore('meta');
		if (await meta.get(META_KEYS.persistAsked)) return { ok: true, value: false };
		await meta.put({ key: META_KEYS.persistAsked, value: true });
		return { ok: true, value: true };
	});
	if (!flagged.ok || !flagged.value) return null;
	return requestPersistence(storage ?? globalThis.navigator?.storage);
}

/** Whether the app has yet to explain what installing to the home screen does for keeping data. */
export async function shouldExplainInstall(store: CheckStore): Promise<StoreResult<boolean>> {
	return readFrom(store, async (db) => ({
		ok: true,
		value: !(await db.get('meta', META_KEYS.installExplained))
	}));
}

/** Records that the install explanation was shown, so it is shown once. */
export async function markInstallExplained(store: CheckStore): Promise<StoreResult<true>> {
	if (store.readOnly) return fail('read-only');
	return writeTo(store, ['meta'], async (tx) => {
		await tx.objectStore('meta').put({ key: META_KEYS.installExplained, value: true });
		return { ok: true, value: true };
	});
}
