/** Drafts in slots: the current one, one per saved check being edited, and ones set aside. */
import { describe, expect, it } from 'vitest';
import {
	clearDraft,
	listDrafts,
	loadDraft,
	moveDraft,
	saveDraft
} from '../../../src/lib/storage/drafts';
import { openFreshStore } from '../../storage/support';

const NOW = new Date('2026-05-01T00:00:00.000Z');

describe('draft slots', () => {
	it('keeps one draft per slot, apart from the current one', async () => {
		const store = await openFreshStore('draft-slots');
		await saveDraft(store, { form: { span: 4 }, now: NOW });
		await saveDraft(store, { form: { span: 7 }, recordId: 'r1', slot: 'check:r1', now: NOW });
		expect(await loadDraft(store)).toMatchObject({ ok: true, value: { form: { span: 4 } } });
		expect(await loadDraft(store, 'check:r1')).toMatchObject({
			ok: true,
			value: { recordId: 'r1', form: { span: 7 } }
		});
		await clearDraft(store, 'check:r1');
		expect(await loadDraft(store, 'check:r1')).toEqual({ ok: true, value: null });
		expect(await loadDraft(store)).toMatchObject({ value: { form: { span: 4 } } });
	});

	it('moves a draft whole to another slot, and moving an empty slot changes nothing', async () => {
		const store = await openFreshStore('draft-move');
		await saveDraft(store, { form: { span: 4 }, now: NOW });
		const moved = await moveDraft(store, 'current', 'aside:1');
		expect(moved).toMatchObject({ ok: true, value: { slot: 'aside:1', form: { span: 4 } } });
		expect(await loadDraft(store)).toEqual({ ok: true, value: null });
		const all = await listDrafts(store);
		expect(all.ok && all.value.map((d) => d.slot)).toEqual(['aside:1']);
		expect(await moveDraft(store, 'current', 'aside:2')).toEqual({ ok: true, value: null });
		const after = await listDrafts(store);
		expect(after.ok && after.value.map((d) => d.slot)).toEqual(['aside:1']);
	});
});
