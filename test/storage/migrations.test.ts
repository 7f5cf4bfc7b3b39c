// Database migrations on fake IndexedDB: open the old version, write, upgrade, read. The v1
// fixture in test/fixtures/db/checks-v1.json is frozen; the upgrade must keep every record.
import { describe, expect, it } from 'vitest';
import { openDB } from 'idb';
import fixture from '../fixtures/db/checks-v1.json';
import { applyStoreMigrations } from '../../src/lib/storage/migrations';
import type { HingepointDB, HingepointDBv1 } from '../../src/lib/storage/schema';
import {
	getCheck,
	listChecks,
	loadDraft,
	loadSettings,
	openStore,
	saveCheck,
	updateCheck,
	DB_VERSION,
	RECORD_SCHEMA_VERSION
} from '../../src/lib/storage';
import { demoCase, plainCheck, uniqueDbName } from './support';

async function writeV1Fixture(name: string, extra: unknown[] = []): Promise<void> {
	const db = await openDB<HingepointDBv1>(name, 1, {
		upgrade: (database, oldVersion, _newVersion, tx) =>
			applyStoreMigrations(database as never, tx as never, oldVersion, 1)
	});
	const tx = db.transaction(['checks', 'drafts', 'meta'], 'readwrite');
	for (const record of [...fixture.records, ...extra]) {
		await tx.objectStore('checks').put(record as never);
	}
	for (const draft of fixture.drafts) await tx.objectStore('drafts').put(draft);
	for (const entry of fixture.meta) await tx.objectStore('meta').put(entry);
	await tx.done;
	db.close();
}

describe('v1 → v2 → v3 migration', () => {
	it('splits the place out, keeps every field and revision, and adds the newest-first index', async () => {
		const name = uniqueDbName('v1v2');
		await writeV1Fixture(name);
		const opened = await openStore(name);
		expect(opened.ok).toBe(true);
		if (!opened.ok) return;
		const { store } = opened;
		expect(store.readOnly).toBe(false);
		expect(store.db?.version).toBe(DB_VERSION);
		expect(store.db?.transaction('checks').store.indexNames.contains('by-updated')).toBe(true);

		const first = await getCheck(store, fixture.records[0].id);
		expect(first.ok).toBe(true);
		if (!first.ok) return;
		const { place, schemaVersion, ...rest } = fixture.records[0];
		expect(first.value.schemaVersion).toBe(RECORD_SCHEMA_VERSION);
		expect(first.value.place).toEqual({ building: place, level: '', grid: '' });
		expect(first.value.computed).toBeNull();
		expect(first.value).toMatchObject(rest);
		expect(first.value.revisions).toEqual(fixture.records[0].revisions);
		expect(schemaVersion).toBe(1);
		store.close();
	});

	it('lists the migrated checks newest first, leaves the deleted one out, and finds by place', async () => {
		const name = uniqueDbName('v1v2-list');
		await writeV1Fixture(name);
		const opened = await openStore(name);
		if (!opened.ok) throw new Error(opened.message);
		const all = await listChecks(opened.store);
		const titles = all.ok ? all.value.map((r) => r.title) : [];
		expect(titles).toEqual(['Scaffold landing beam', 'Plant room trimmer']);
		const found = await listChecks(opened.store, { search: 'block a grid c/4' });
		expect(found.ok && found.value.map((r) => r.id)).toEqual([fixture.records[0].id]);
		opened.store.close();
	});

	it('keeps the draft and the settings written by version 1', async () => {
		const name = uniqueDbName('v1v2-draft');
		await writeV1Fixture(name);
		const opened = await openStore(name);
		if (!opened.ok) throw new Error(opened.message);
		expect(await loadDraft(opened.store)).toEqual({ ok: true, value: fixture.drafts[0] });
		const settings = await loadSettings(opened.store);
		expect(settings.ok && settings.value).toMatchObject(fixture.meta[0].value as object);
		opened.store.close();
	});

	it('accepts new saves and edits after the upgrade', async () => {
		const name = uniqueDbName('v1v2-write');
		await writeV1Fixture(name);
		const opened = await openStore(name);
		if (!opened.ok) throw new Error(opened.message);
		const saved = await saveCheck(opened.store, {
			title: 'After upgrade',
			input: demoCase(),
			result: null,
			engineVersion: '0.2.0'
		});
		expect(saved.ok).toBe(true);
		const id = fixture.records[1].id;
		const edited = await updateCheck(opened.store, id, { place: { level: 'L3' } });
		expect(edited.ok && edited.value.place).toEqual({ building: '', level: 'L3', grid: '' });
		opened.store.close();
	});

	it('never rewrites a record written by a newer app version', async () => {
		const name = uniqueDbName('v1v2-newer-record');
		const future = {
			...fixture.records[1],
			id: 'future-1',
			schemaVersion: RECORD_SCHEMA_VERSION + 1,
			place: { site: 'X' }
		};
		await writeV1Fixture(name, [future]);
		const opened = await openStore(name);
		if (!opened.ok) throw new Error(opened.message);
		const db = opened.store.db;
		expect(await db?.get('checks', 'future-1')).toEqual(future);
		const edit = await updateCheck(opened.store, 'future-1', { title: 'changed' });
		expect(edit.ok).toBe(false);
		if (!edit.ok) expect(edit.reason).toBe('newer');
		expect(await db?.get('checks', 'future-1')).toEqual(future);
		opened.store.close();
	});
});

describe('data written by a newer app version', () => {
	it('opens read-only with an "update the app" notice, and is never rewritten', async () => {
		const name = uniqueDbName('newer-db');
		const newer = await openDB<HingepointDB>(name, DB_VERSION + 1, {
			upgrade: (database, oldVersion, _v, tx) =>
				applyStoreMigrations(database, tx, oldVersion, DB_VERSION)
		});
		const place = { building: 'B', level: '', grid: '' };
		const record = { ...fixture.records[1], schemaVersion: 2, place };
		await newer.put('checks', record as never);
		newer.close();

		const opened = await openStore(name);
		if (!opened.ok) throw new Error(opened.message);
		const { store } = opened;
		expect(store.readOnly).toBe(true);
		expect(store.notice).toMatch(/update the app/i);
		const list = await listChecks(store);
		expect(list.ok && list.value.length).toBe(1);
		const save = await saveCheck(store, plainCheck('x'));
		expect(save.ok).toBe(false);
		if (!save.ok) expect(save.reason).toBe('read-only');
		expect(store.db?.version).toBe(DB_VERSION + 1);
		expect(await store.db?.get('checks', record.id)).toEqual(record);
		store.close();
	});
});

describe('a newer version waiting to upgrade', () => {
	it('closes the open connection and signals the UI to show the update notice', async () => {
		const name = uniqueDbName('blocking');
		const statuses: string[] = [];
		const opened = await openStore(name, { onStatus: (s) => statuses.push(s) });
		if (!opened.ok) throw new Error(opened.message);
		const next = await openDB(name, DB_VERSION + 1);
		expect(statuses).toEqual(['update-needed']);
		expect(opened.store.status).toBe('update-needed');
		const after = await listChecks(opened.store);
		expect(after.ok).toBe(false);
		if (!after.ok) expect(after.reason).toBe('closed');
		next.close();
	});
});
