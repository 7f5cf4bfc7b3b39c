import { DRAFT_SLOT } from './constants';
import type { CheckStore } from './db';
import { stampNow } from './ids';
import type { DraftRecord } from './schema';
import { readFrom, writeTo } from './tx';
import type { ClockOptions, StoreResult } from './types';

export type { DraftRecord } from './schema';

/** What the form hands over on every change and when the app is hidden. */
export interface DraftInput extends ClockOptions {
	/** The form's state, possibly half-filled; must be structured-cloneable. */
	form: unknown;
	/** The saved check being edited, or null for a new check. */
	recordId?: string | null;
}

/** Saves the one current draft, replacing the previous one. */
export async function saveDraft(
	store: CheckStore,
	draft: DraftInput
): Promise<StoreResult<DraftRecord>> {
	const record: DraftRecord = {
		slot: DRAFT_SLOT,
		savedAt: stampNow(draft.now),
		recordId: draft.recordId ?? null,
		form: draft.form
	};
	return writeTo(store, ['drafts'], async (tx) => {
		await tx.objectStore('drafts').put(record);
		return { ok: true, value: record };
	});
}

/** The current draft, or null when there is none (after a reload, a crash or an update). */
export async function loadDraft(store: CheckStore): Promise<StoreResult<DraftRecord | null>> {
	return readFrom(store, async (db) => ({
		ok: true,
		value: (await db.get('drafts', DRAFT_SLOT)) ?? null
	}));
}

/** Forgets the current draft (after the check is saved or discarded). */
export async function clearDraft(store: CheckStore): Promise<StoreResult<null>> {
	return writeTo(store, ['drafts'], async (tx) => {
		await tx.objectStore('drafts').delete(DRAFT_SLOT);
		return { ok: true, value: null };
	});
}
