import { META_KEYS } from './constants';
import type { CheckStore } from './db';
import { readFrom, writeTo } from './tx';
import { sanitizeSettings, type Settings } from './settings-model';
import type { StoreResult } from './types';

/** Stores the settings (one entry in `meta`), sanitised first so only valid data is written. */
export async function saveSettings(
	store: CheckStore,
	settings: Settings
): Promise<StoreResult<Settings>> {
	const clean = sanitizeSettings(settings);
	return writeTo(store, ['meta'], async (tx) => {
		await tx.objectStore('meta').put({ key: META_KEYS.settings, value: clean });
		return { ok: true, value: clean };
	});
}

/** Reads the settings; defaults when none were saved, and field by field where damaged. */
export async function loadSettings(store: CheckStore): Promise<StoreResult<Settings>> {
	return readFrom(store, async (db) => {
		const entry = await db.get('meta', META_KEYS.settings);
		return { ok: true, value: sanitizeSettings(entry?.value) };
	});
}
