// Connection life cycle on fake IndexedDB: an older tab blocking our upgrade, a connection the
// browser ends or closes under us, and data IndexedDB cannot clone.
import { describe, expect, it } from 'vitest';
import { openDB } from 'idb';
import { applyStoreMigrations } from '../../src/lib/storage/migrations';
import type { HingepointDB } from '../../src/lib/storage/schema';
import { getCheck, listChecks, openStore, saveCheck, saveDraft } from '../../src/lib/storage';
import { demoCase, openFreshStore, plainCheck, uniqueDbName } from './support';

describe('store connection', () => {
	it('tells the UI when an older open tab blocks the upgrade, then opens once it closes', async () => {
		const name = uniqueDbName('blocked');
		// A version-1 connection with no versionchange handler stands in for an old tab.
		const old = await openDB<HingepointDB>(name, 1, {
			upgrade: (db, oldVersion, _v, tx) => applyStoreMigrations(db, tx, oldVersion, 1)
		});
		let blocked = 0;
		const opening = openStore(name, { onBlocked: () => (blocked += 1) });
		await new Promise((resolve) => setTimeout(resolve, 20));
		expect(blocked).toBe(1);
		old.close();
		const opened = await opening;
		expect(opened.ok).toBe(true);
		if (opened.ok) opened.store.close();
	});

	it('reports a failed upgrade as a storage failure and leaves the old database as it was', async () => {
		const name = uniqueDbName('failed-upgrade');
		// A version-1 database without our stores: step 2 cannot add its index, so the upgrade aborts.
		(await openDB(name, 1)).close();
		const opened = await openStore(name);
		expect(opened.ok === false && opened.reason).toBe('storage');
		const after = await openDB(name);
		expect(after.version).toBe(1);
		after.close();
	});

	it('gives a clear "closed" failure, and keeps stored data, when the connection goes away', async () => {
		const store = await openFreshStore('evicted');
		const saved = await saveCheck(store, plainCheck('Kept'));
		if (!saved.ok) throw new Error(saved.message);
		// Close the raw connection behind the store's back, as an eviction does.
		store.db?.close();
		const list = await listChecks(store);
		expect(list.ok).toBe(false);
		if (!list.ok) {
			expect(list.reason).toBe('closed');
			expect(list.message).toMatch(/reload/i);
		}
		const reopened = await openStore(store.name);
		if (!reopened.ok) throw new Error(reopened.message);
		const { record } = saved.value;
		expect(await getCheck(reopened.store, record.id)).toEqual({ ok: true, value: record });
		reopened.store.close();
	});

	it('reports a connection ended by the browser to its listeners and refuses further calls', async () => {
		const store = await openFreshStore('terminated');
		const seen: string[] = [];
		store.onStatus((status) => seen.push(status));
		store.markTerminated();
		expect(seen).toEqual(['terminated']);
		const draft = await saveDraft(store, { form: {} });
		expect(draft.ok === false && draft.reason).toBe('closed');
	});

	it('refuses data IndexedDB cannot clone without changing anything', async () => {
		const store = await openFreshStore('clone');
		const saved = await saveCheck(store, {
			title: 'Bad result',
			input: demoCase(),
			result: { run: () => 1 },
			engineVersion: '0'
		});
		expect(saved.ok).toBe(false);
		if (!saved.ok) expect(saved.message).toMatch(/cannot be stored/);
		expect(await listChecks(store)).toEqual({ ok: true, value: [] });
		store.close();
	});
});
