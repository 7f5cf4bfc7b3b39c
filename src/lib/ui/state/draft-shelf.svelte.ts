import { clearDraft, listDrafts, moveDraft, type DraftRecord } from '$lib/storage/drafts';
import type { FormDraft } from './check-form.svelte';
import { ASIDE_PREFIX, draftSlot, readDraft } from './draft-keeper';
import { connectStore } from './store-connection';

/** A new check set aside unsaved, as the screen offers it back. */
export interface AsideDraft {
	slot: string;
	savedAt: string;
	title: string;
}

/**
 * New checks set aside unsaved when "New check" started another: each keeps its own slot until
 * the user reopens or discards it, so starting a new check never loses one.
 */
export class DraftShelf {
	items = $state.raw<AsideDraft[]>([]);

	async refresh(): Promise<void> {
		const store = await connectStore();
		const all = store ? await listDrafts(store) : null;
		this.items = all?.ok
			? all.value
					.filter((d) => d.slot.startsWith(ASIDE_PREFIX))
					.map(describeAside)
					.sort(newestFirst)
			: [];
	}

	/** Moves the current new check's draft (if any) to a slot of its own. */
	async setAside(): Promise<void> {
		const store = await connectStore();
		if (!store) return;
		const slot = `${ASIDE_PREFIX}${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
		await moveDraft(store, draftSlot(null), slot);
		await this.refresh();
	}

	/** Makes a set-aside draft the current one again (the current slot must be free) and returns it. */
	async takeBack(slot: string): Promise<FormDraft | null> {
		const store = await connectStore();
		const moved = store ? await moveDraft(store, slot, draftSlot(null)) : null;
		await this.refresh();
		return moved?.ok && moved.value ? readDraft(moved.value.form) : null;
	}

	async discard(slot: string): Promise<void> {
		const store = await connectStore();
		if (store) await clearDraft(store, slot);
		await this.refresh();
	}
}

function describeAside(record: DraftRecord): AsideDraft {
	const title = readDraft(record.form)?.case.title?.trim();
	return { slot: record.slot, savedAt: record.savedAt, title: title || 'Untitled check' };
}

function newestFirst(a: AsideDraft, b: AsideDraft): number {
	return a.savedAt < b.savedAt ? 1 : a.savedAt > b.savedAt ? -1 : 0;
}
