import { clearDraft, saveDraft } from '$lib/storage/drafts';
import type { FormDraft } from './check-form.svelte';
import { connectStore } from './store-connection';

/**
 * Keeps the form's draft in IndexedDB: every change is queued, one write at a time, the latest
 * wins; `flush` writes at once (used when the app is hidden, which may be the last chance).
 */
export class DraftKeeper {
	#latest: FormDraft | null = null;
	#writing: Promise<void> | null = null;

	/** Queues the newest state of the form. */
	queue(draft: FormDraft): void {
		this.#latest = draft;
		this.#writing ??= this.#drain();
	}

	/** Writes anything queued now and resolves when it is stored. */
	async flush(draft?: FormDraft): Promise<void> {
		if (draft) this.#latest = draft;
		while (this.#latest || this.#writing) {
			this.#writing ??= this.#drain();
			await this.#writing;
		}
	}

	/** Forgets a form's draft once anything queued is written (after a save or a discard). */
	async discard(savedId: string | null): Promise<void> {
		await this.flush();
		const store = await connectStore();
		if (store) await clearDraft(store, draftSlot(savedId));
	}

	async #drain(): Promise<void> {
		try {
			const store = await connectStore();
			while (store && this.#latest) {
				const draft = this.#latest;
				this.#latest = null;
				await saveDraft(store, {
					form: draft,
					recordId: draft.savedId,
					slot: draftSlot(draft.savedId)
				});
			}
		} finally {
			this.#writing = null;
		}
	}
}

/**
 * The slot a form's draft is kept in: each saved check has its own, so unsaved edits of one are
 * never overwritten by another; a new check uses the current slot.
 * @example
 * draftSlot('abc') // 'check:abc'
 */
export function draftSlot(savedId: string | null): string {
	return savedId ? `check:${savedId}` : 'current';
}

/** Slot names of new checks set aside by "New check" start with this. */
export const ASIDE_PREFIX = 'aside:';

/**
 * Reads a stored draft back, or null when it is not a draft this form wrote.
 * @example
 * readDraft({ case: {...}, texts: {}, units: 'SI', savedId: null })?.units // 'SI'
 */
export function readDraft(form: unknown): FormDraft | null {
	if (form === null || typeof form !== 'object') return null;
	const d = form as Partial<FormDraft>;
	if (!d.case || typeof d.case !== 'object' || d.case.format !== 'hingepoint.case') return null;
	return {
		case: d.case,
		texts: d.texts && typeof d.texts === 'object' ? d.texts : {},
		units: d.units === 'US' ? 'US' : 'SI',
		savedId: typeof d.savedId === 'string' ? d.savedId : null
	};
}
