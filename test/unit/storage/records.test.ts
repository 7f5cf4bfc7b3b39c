import { describe, expect, it } from 'vitest';
import {
	deleteCheck,
	duplicateCheck,
	getCheck,
	listChecks,
	purgeDeleted,
	saveCheck,
	undoDelete,
	updateCheck,
	type CheckStore
} from '../../../src/lib/storage';
import { MAX_REVISIONS } from '../../../src/lib/storage/constants';
import { createId } from '../../../src/lib/storage/ids';
import { demoCase, openFreshStore, plainCheck, stubWritesQuota } from '../../storage/support';

const at = (iso: string) => new Date(iso);

async function saveDemo(store: CheckStore, title: string, when: string, extra: object = {}) {
	const saved = await saveCheck(store, {
		title,
		input: demoCase(),
		result: { demo: true },
		engineVersion: '0.1.0',
		now: at(when),
		...extra
	});
	if (!saved.ok) throw new Error(saved.message);
	return saved.value.record;
}

describe('saving and reading checks', () => {
	it('saves with title, place, notes and the date, and reads back the same record', async () => {
		const store = await openFreshStore('save');
		const record = await saveDemo(store, '  Trimmer to lift shaft ', '2026-05-01T10:00:00.000Z', {
			place: { building: 'Demo House', level: 'L1', grid: 'B/2' },
			notes: 'Hoist beam'
		});
		expect(record.title).toBe('Trimmer to lift shaft');
		expect(record.createdAt).toBe('2026-05-01T10:00:00.000Z');
		expect(record.schemaVersion).toBe(3);
		expect(record.computed).toBeNull();
		const read = await getCheck(store, record.id);
		expect(read).toEqual({ ok: true, value: record });
		store.close();
	});

	it('reports a missing id as not found', async () => {
		const store = await openFreshStore('missing');
		const read = await getCheck(store, 'nope');
		expect(read.ok === false && read.reason).toBe('not-found');
		store.close();
	});

	it('lists newest change first and searches title, place, notes and section designation', async () => {
		const store = await openFreshStore('list');
		const day = (d: number) => `2026-05-0${d}T10:00:00.000Z`;
		await saveDemo(store, 'Alpha', day(1), { place: { building: 'North Wing' } });
		const b = await saveDemo(store, 'Beta', day(2), { notes: 'over the café' });
		const c = await saveDemo(store, 'Gamma', day(3), { input: demoCase('IPE 300') });
		await updateCheck(store, b.id, { notes: 'over the café, moved' }, { now: at(day(4)) });
		const titles = async (search?: string) => {
			const list = await listChecks(store, { search });
			return list.ok ? list.value.map((r) => r.title) : [];
		};
		expect(await titles()).toEqual(['Beta', 'Gamma', 'Alpha']);
		expect(await titles('north')).toEqual(['Alpha']);
		expect(await titles('CAFE moved')).toEqual(['Beta']);
		expect(await titles('ipe 300')).toEqual(['Gamma']);
		expect(await titles('ipe alpha')).toEqual([]);
		expect(c.title).toBe('Gamma');
		store.close();
	});

	it('duplicates under a new id without the revision history', async () => {
		const store = await openFreshStore('dup');
		const original = await saveDemo(store, 'Original', '2026-05-01T10:00:00.000Z');
		await updateCheck(store, original.id, { result: { demo: 2 } });
		const copy = await duplicateCheck(store, original.id, { now: at('2026-06-01T00:00:00.000Z') });
		expect(copy.ok).toBe(true);
		if (!copy.ok) return;
		expect(copy.value.id).not.toBe(original.id);
		expect(copy.value.title).toBe('Original (copy)');
		expect(copy.value.revisions).toEqual([]);
		expect(copy.value.input).toEqual(original.input);
		expect(copy.value.createdAt).toBe('2026-06-01T00:00:00.000Z');
		store.close();
	});
});

describe('editing keeps a revision history', () => {
	it('pushes the previous inputs and result with their date when the content changes', async () => {
		const store = await openFreshStore('revisions');
		const v1 = await saveDemo(store, 'Beam', '2026-05-01T10:00:00.000Z');
		const newInput = demoCase('305x165x40 UB', 7);
		const v2 = await updateCheck(
			store,
			v1.id,
			{ input: newInput, result: { demo: 'second' } },
			{ now: at('2026-05-02T10:00:00.000Z') }
		);
		expect(v2.ok).toBe(true);
		if (!v2.ok) return;
		expect(v2.value.input).toEqual(newInput);
		expect(v2.value.revisions).toEqual([
			{ savedAt: v1.updatedAt, input: v1.input, result: v1.result, engineVersion: v1.engineVersion }
		]);
		const retitled = await updateCheck(store, v1.id, { title: 'Renamed' });
		expect(retitled.ok && retitled.value.revisions.length).toBe(1);
		store.close();
	});

	it('clears the computed verdict when the inputs change, keeps it for a rename', async () => {
		const store = await openFreshStore('verdict-follows-input');
		const computed = { verdict: 'pass' as const, computedBy: '1' };
		const saved = await saveCheck(store, { ...plainCheck('Beam'), computed });
		if (!saved.ok) throw new Error(saved.message);
		const { id } = saved.value.record;
		expect(saved.value.record.computed).toEqual(computed);
		const renamed = await updateCheck(store, id, { title: 'Renamed' });
		expect(renamed.ok && renamed.value.computed).toEqual(computed);
		const edited = await updateCheck(store, id, { input: demoCase('IPE 300', 9) });
		expect(edited.ok && edited.value.computed).toBeNull();
		const stamped = await updateCheck(store, id, { input: demoCase('IPE 300', 8), computed });
		expect(stamped.ok && stamped.value.computed).toEqual(computed);
		store.close();
	});

	it('keeps at most the newest revisions', async () => {
		const store = await openFreshStore('revision-cap');
		const record = await saveDemo(store, 'Beam', '2026-05-01T10:00:00.000Z');
		let last = record;
		for (let i = 0; i < MAX_REVISIONS + 3; i++) {
			const next = await updateCheck(store, record.id, { result: { step: i } });
			if (!next.ok) throw new Error(next.message);
			last = next.value;
		}
		expect(last.revisions.length).toBe(MAX_REVISIONS);
		expect(last.revisions.at(-1)?.result).toEqual({ step: MAX_REVISIONS + 1 });
		store.close();
	});
});

describe('delete and undo', () => {
	it('hides a deleted check and undo restores it exactly', async () => {
		const store = await openFreshStore('undo');
		const record = await saveDemo(store, 'To delete', '2026-05-01T10:00:00.000Z');
		const deleted = await deleteCheck(store, record.id, { now: at('2026-05-02T00:00:00.000Z') });
		expect(deleted).toEqual({
			ok: true,
			value: { id: record.id, title: 'To delete', deletedAt: '2026-05-02T00:00:00.000Z' }
		});
		expect((await getCheck(store, record.id)).ok).toBe(false);
		const list = await listChecks(store);
		expect(list.ok && list.value.length).toBe(0);
		const restored = await undoDelete(store, record.id);
		expect(restored).toEqual({ ok: true, value: record });
		expect(await getCheck(store, record.id)).toEqual({ ok: true, value: record });
		store.close();
	});

	it('purges only checks deleted before the cut-off', async () => {
		const store = await openFreshStore('purge');
		const old = await saveDemo(store, 'Old', '2026-05-01T10:00:00.000Z');
		const recent = await saveDemo(store, 'Recent', '2026-05-01T11:00:00.000Z');
		await saveDemo(store, 'Kept', '2026-05-01T12:00:00.000Z');
		await deleteCheck(store, old.id, { now: at('2026-05-02T00:00:00.000Z') });
		await deleteCheck(store, recent.id, { now: at('2026-05-09T00:00:00.000Z') });
		const purged = await purgeDeleted(store, { before: at('2026-05-05T00:00:00.000Z') });
		expect(purged).toEqual({ ok: true, value: 1 });
		expect((await undoDelete(store, old.id)).ok).toBe(false);
		expect((await undoDelete(store, recent.id)).ok).toBe(true);
		store.close();
	});
});

describe('a full disk', () => {
	it('returns a clear quota failure and loses nothing already stored', async () => {
		const store = await openFreshStore('quota');
		const kept = await saveDemo(store, 'Kept', '2026-05-01T10:00:00.000Z');
		const restore = stubWritesQuota(0);
		try {
			const save = await saveCheck(store, plainCheck('New'));
			const edit = await updateCheck(store, kept.id, { title: 'Changed' });
			for (const outcome of [save, edit]) {
				expect(outcome.ok).toBe(false);
				if (!outcome.ok) {
					expect(outcome.reason).toBe('quota');
					expect(outcome.message).toMatch(/storage is full/);
				}
			}
		} finally {
			restore();
		}
		const list = await listChecks(store);
		expect(list).toEqual({ ok: true, value: [kept] });
		store.close();
	});
});

describe('record ids', () => {
	it('have the version-4 UUID layout of RFC 4122 §4.4 and do not repeat', () => {
		const ids = Array.from({ length: 500 }, createId);
		const layout = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;
		for (const id of ids) expect(id).toMatch(layout);
		expect(new Set(ids).size).toBe(ids.length);
	});
});
