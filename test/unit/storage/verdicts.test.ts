import { describe, expect, it } from 'vitest';
import {
	deleteCheck,
	getCheck,
	needsVerdict,
	saveCheck,
	storeVerdicts,
	updateCheck
} from '../../../src/lib/storage';
import { openFreshStore, plainCheck } from '../../storage/support';

const fail = { verdict: 'fail' as const, computedBy: 'e1' };

describe('storeVerdicts', () => {
	it('sets only the verdict: same dates, no revision', async () => {
		const store = await openFreshStore('verdict-only');
		const saved = await saveCheck(store, plainCheck('A'));
		if (!saved.ok) throw new Error(saved.message);
		const { record } = saved.value;
		const update = { id: record.id, updatedAt: record.updatedAt, computed: fail };
		const written = await storeVerdicts(store, [update]);
		expect(written).toEqual({ ok: true, value: 1 });
		const after = await getCheck(store, record.id);
		expect(after).toEqual({ ok: true, value: { ...record, computed: fail } });
		store.close();
	});

	it('leaves alone a check edited since the verdict was computed, or deleted', async () => {
		const store = await openFreshStore('verdict-stale');
		const a = await saveCheck(store, plainCheck('A'));
		const b = await saveCheck(store, plainCheck('B'));
		if (!a.ok || !b.ok) throw new Error('save failed');
		const ra = a.value.record;
		const rb = b.value.record;
		const edited = await updateCheck(
			store,
			ra.id,
			{ title: 'A2' },
			{ now: new Date('2030-01-01T00:00:00.000Z') }
		);
		await deleteCheck(store, rb.id);
		const written = await storeVerdicts(store, [
			{ id: ra.id, updatedAt: ra.updatedAt, computed: fail },
			{ id: rb.id, updatedAt: rb.updatedAt, computed: fail },
			{ id: 'missing', updatedAt: ra.updatedAt, computed: fail }
		]);
		expect(written).toEqual({ ok: true, value: 0 });
		const after = await getCheck(store, ra.id);
		expect(after.ok && edited.ok && after.value).toEqual(edited.ok && edited.value);
		expect((await store.db?.get('checks', rb.id))?.computed).toBeNull();
		store.close();
	});
});

describe('needsVerdict', () => {
	it('asks for a verdict when there is none or it came from another engine', () => {
		expect(needsVerdict({ computed: null }, 'e1')).toBe(true);
		expect(needsVerdict({ computed: fail }, 'e2')).toBe(true);
		expect(needsVerdict({ computed: fail }, 'e1')).toBe(false);
	});
});
