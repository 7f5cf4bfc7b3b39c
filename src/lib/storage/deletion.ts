import type { CheckStore } from './db';
import { fail } from './errors';
import { stampNow } from './ids';
import { photoRange } from './photos';
import { writeTo } from './tx';
import type { CheckRecord, ClockOptions, StoreResult } from './types';

/** What `deleteCheck` hands back, enough for an "Undo" button. */
export interface DeletedCheck {
	id: string;
	title: string;
	deletedAt: string;
}

/**
 * Deletes a check softly: it disappears from lists and reads but stays stored, so
 * `undoDelete` restores it exactly. `purgeDeleted` removes it for good later.
 */
export async function deleteCheck(
	store: CheckStore,
	id: string,
	options: ClockOptions = {}
): Promise<StoreResult<DeletedCheck>> {
	const deletedAt = stampNow(options.now);
	return writeTo(store, ['checks'], async (tx) => {
		const checks = tx.objectStore('checks');
		const record = await checks.get(id);
		if (!record || record.deletedAt !== null) return fail('not-found');
		// Only the marker changes; updatedAt stays, so the undone record is identical.
		await checks.put({ ...record, deletedAt });
		return { ok: true, value: { id, title: record.title, deletedAt } };
	});
}

/** Restores a softly deleted check exactly as it was before `deleteCheck`. */
export async function undoDelete(store: CheckStore, id: string): Promise<StoreResult<CheckRecord>> {
	return writeTo(store, ['checks'], async (tx) => {
		const checks = tx.objectStore('checks');
		const record = await checks.get(id);
		if (!record || record.deletedAt === null) return fail('not-found');
		const restored = { ...record, deletedAt: null };
		await checks.put(restored);
		return { ok: true, value: restored };
	});
}

/** Removes for good the checks deleted before `before`, with their photos; returns how many went. */
export async function purgeDeleted(
	store: CheckStore,
	options: { before: Date }
): Promise<StoreResult<number>> {
	const cutoff = options.before.toISOString();
	return writeTo(store, ['checks', 'photos'], async (tx) => {
		let removed = 0;
		let cursor = await tx.objectStore('checks').openCursor();
		while (cursor) {
			const { deletedAt, id } = cursor.value;
			if (deletedAt !== null && deletedAt < cutoff) {
				await tx.objectStore('photos').delete(photoRange(id));
				await cursor.delete();
				removed += 1;
			}
			cursor = await cursor.continue();
		}
		return { ok: true, value: removed };
	});
}
