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
	/** Which draft this is (default: the current one); each slot holds one draft. */
	slot?: string;
}

/** Saves a draft, replacing the one in its slot. */
export async function saveDraft(
	store: CheckStore,
	draft: DraftInput
): Promise<StoreResult<DraftRecord>> {
	const record: DraftRecord = {
		slot: draft.slot ?? DRAFT_SLOT,
		savedAt: stampNow(draft.now),
		recordId: draft.recordId ?? null,
		form: draft.form
	};
	return writeTo(store, ['drafts'], async (tx) => {
		await tx.objectStore('drafts').put(record);
		return { ok: true, value: record };
	});
}

/** The draft in a slot (default: the current one), or null when there is none. */
export async function loadDraft(
	store: CheckStore,
	slot: string = DRAFT_SLOT
): Promise<StoreResult<DraftRecord | null>> {
	return readFrom(store, async (db) => ({
		ok: true,
		value: (await db.get('drafts', slot)) ?? null
	}));
}

/** Every stored draft, any slot (e.g. to offer the ones set aside). */
export async function listDrafts(store: CheckStore): Promise<StoreResult<DraftRecord[]>> {
	return readFrom(store, async (db) => ({ ok: true, value: await db.getAll('drafts') }));
}

/** Forgets the draft in a slot (after the check is saved or discarded). */
export async function clearDraft(
	store: CheckStore,
	slot: string = DRAFT_SLOT
): Promise<StoreResult<null>> {
	return writeTo(store, ['drafts'], async (tx) => {
		await tx.objectStore('drafts').delete(slot);
		return { ok: true, value: null };
	});
}

/**
 * Moves a draft to another slot in one transaction, so it is never in neither (setting a check
 * aside, or taking one back). Does nothing when the slot is empty.
 */
export async function moveDraft(
	store: CheckStore,
	from: string,
	to: string
): Promise<StoreResult<DraftRecord | null>> {
	return writeTo(store, ['drafts'], async (tx) => {
		const drafts = tx.objectStore('drafts');
		const found = await drafts.get(from);
		if (!found) return { ok: true, value: null };
		const moved = { ...found, slot: to };
		await drafts.put(moved);
		await drafts.delete(from);
		return { ok: true, value: moved };
	});
}
