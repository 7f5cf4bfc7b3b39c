// Database v3 → v4 on fake IndexedDB against the frozen fixture test/fixtures/db/checks-v3.json:
// a photos store is added and nothing stored before changes, records, draft and settings alike.
import { describe, expect, it } from 'vitest';
import fixture from '../fixtures/db/checks-v3.json';
import {
	addPhoto,
	listChecks,
	listPhotos,
	loadDraft,
	loadSettings,
	purgeDeleted,
	DB_VERSION
} from '../../src/lib/storage';
import { jpegBlob, openUpgradedFixture } from './support';

/** The frozen fixture, written at v3 and opened (so upgraded) by the current code. */
function openUpgraded(label: string) {
	return openUpgradedFixture(label, 3, fixture, (names) =>
		expect(names.contains('photos')).toBe(false)
	);
}

describe('v3 → v4 migration', () => {
	it('adds the photos store keyed by check id and photo id', async () => {
		const store = await openUpgraded('v3v4');
		expect(store.db?.version).toBe(DB_VERSION);
		expect(store.readOnly).toBe(false);
		const photos = store.db?.transaction('photos').store;
		expect(photos?.keyPath).toEqual(['checkId', 'id']);
		expect(await photos?.count()).toBe(0);
		store.close();
	});

	it('keeps every record exactly, deleted one included, with the draft and settings', async () => {
		const store = await openUpgraded('v3v4-keep');
		for (const frozen of fixture.records) {
			expect(await store.db?.get('checks', frozen.id)).toEqual(frozen);
		}
		const list = await listChecks(store);
		expect(list.ok && list.value.map((r) => r.title)).toEqual([
			'Demo chain block on trimmer',
			'Demo gantry on landing beam'
		]);
		expect(await loadDraft(store)).toEqual({ ok: true, value: fixture.drafts[0] });
		const settings = await loadSettings(store);
		expect(settings.ok && settings.value).toMatchObject(fixture.meta[0].value as object);
		store.close();
	});

	it('takes photos on a migrated check, leaving the record untouched', async () => {
		const store = await openUpgraded('v3v4-photo');
		const frozen = fixture.records[0];
		const added = await addPhoto(store, {
			checkId: frozen.id,
			image: jpegBlob(),
			width: 40,
			height: 30,
			caption: 'Label on the web'
		});
		expect(added.ok).toBe(true);
		const listed = await listPhotos(store, frozen.id);
		expect(listed.ok && listed.value.map((p) => [p.caption, p.width, p.height])).toEqual([
			['Label on the web', 40, 30]
		]);
		expect(await store.db?.get('checks', frozen.id)).toEqual(frozen);
		store.close();
	});

	it('purges the check deleted before the upgrade for good, with nothing left behind', async () => {
		const store = await openUpgraded('v3v4-purge');
		const purged = await purgeDeleted(store, { before: new Date('2026-07-01T00:00:00.000Z') });
		expect(purged).toEqual({ ok: true, value: 1 });
		expect(await store.db?.count('checks')).toBe(fixture.records.length - 1);
		store.close();
	});
});
