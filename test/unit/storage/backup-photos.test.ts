// Photos in the backup file: carried as base64, checked again on import, and only ever added —
// each follows its check, to a copy kept beside or to the same check already here.
import { describe, expect, it } from 'vitest';
import {
	addPhoto,
	deleteCheck,
	exportBackup,
	importBackup,
	listChecks,
	listPhotos,
	removePhoto,
	saveCheck,
	updateCheck,
	BACKUP_FORMAT,
	MAX_PHOTOS_PER_CHECK,
	type CheckStore
} from '../../../src/lib/storage';
import { planPhotos } from '../../../src/lib/storage/backup-photo-merge';
import { MAX_PHOTO_BYTES } from '../../../src/lib/storage/constants';
import type { PhotoRecord } from '../../../src/lib/storage';
import {
	jpegBlob,
	openFreshStore,
	plainCheck,
	stubEngine,
	stubWritesQuota
} from '../../storage/support';

const versions = { appVersion: '0.1.0', engineVersion: '0.1.0' };

async function checkWithPhotos(store: CheckStore, title: string, seeds: number[]): Promise<string> {
	const saved = await saveCheck(store, {
		...plainCheck(title),
		now: new Date('2026-06-01T08:00:00.000Z')
	});
	if (!saved.ok) throw new Error(saved.message);
	const id = saved.value.record.id;
	for (const seed of seeds) {
		const now = new Date(Date.UTC(2026, 5, 1, 9, seed));
		const caption = `Photo ${seed}`;
		const added = await addPhoto(store, {
			checkId: id,
			image: jpegBlob(seed),
			width: 40 + seed,
			height: 30,
			caption,
			now
		});
		if (!added.ok) throw new Error(added.message);
	}
	return id;
}

async function exported(store: CheckStore): Promise<string> {
	const text = await exportBackup(store, versions);
	if (!text.ok) throw new Error(text.message);
	return text.value;
}

// Each photo as [caption, width, first bytes after the JPEG opening], for comparing stores.
async function photosOf(store: CheckStore, checkId: string): Promise<[string, number, number[]][]> {
	const list = await listPhotos(store, checkId);
	if (!list.ok) throw new Error(list.message);
	const out: [string, number, number[]][] = [];
	for (const p of list.value) {
		out.push([
			p.caption,
			p.width,
			Array.from(new Uint8Array(await p.blob.arrayBuffer()).slice(4, 8))
		]);
	}
	return out;
}

async function idOf(store: CheckStore, title: string): Promise<string> {
	const list = await listChecks(store);
	const found = list.ok ? list.value.find((r) => r.title === title) : undefined;
	if (!found) throw new Error(`no check titled ${title}`);
	return found.id;
}

async function everything(store: CheckStore) {
	return { checks: await store.db!.getAll('checks'), photos: await store.db!.getAll('photos') };
}

describe('photos in the backup file', () => {
	it('round-trips every photo of the live checks, bytes, caption and size alike', async () => {
		const source = await openFreshStore('photo-export');
		const a = await checkWithPhotos(source, 'A', [1, 2]);
		const gone = await checkWithPhotos(source, 'Gone', [3]);
		await deleteCheck(source, gone);
		const text = await exported(source);
		const file = JSON.parse(text);
		expect(file.photos.map((p: { checkId: string }) => p.checkId)).toEqual([a, a]);
		expect(file.photos[0].data).toMatch(/^\/9j\//);

		const target = await openFreshStore('photo-import');
		const result = await importBackup(target, text, stubEngine());
		expect(result).toMatchObject({ ok: true, added: 1, photos: 2 });
		expect(await photosOf(target, a)).toEqual(await photosOf(source, a));
		expect(await photosOf(target, a)).toEqual([
			['Photo 1', 41, Array.from(new Uint8Array(await jpegBlob(1).arrayBuffer()).slice(4, 8))],
			['Photo 2', 42, Array.from(new Uint8Array(await jpegBlob(2).arrayBuffer()).slice(4, 8))]
		]);
		source.close();
		target.close();
	});

	it('adds no photo twice when the same file is imported again', async () => {
		const store = await openFreshStore('photo-again');
		const id = await checkWithPhotos(store, 'A', [1, 2]);
		const text = await exported(store);
		expect(await importBackup(store, text, stubEngine())).toMatchObject({
			ok: true,
			skipped: 1,
			photos: 0
		});
		expect((await photosOf(store, id)).length).toBe(2);
		store.close();
	});

	it('brings back a photo removed since the backup, to the same check already here', async () => {
		const store = await openFreshStore('photo-restore');
		const id = await checkWithPhotos(store, 'A', [1, 2]);
		const text = await exported(store);
		const list = await listPhotos(store, id);
		if (!list.ok) throw new Error(list.message);
		await removePhoto(store, id, list.value[0].id);
		expect(await importBackup(store, text, stubEngine())).toMatchObject({
			ok: true,
			skipped: 1,
			photos: 1
		});
		expect((await photosOf(store, id)).map((p) => p[0])).toEqual(['Photo 1', 'Photo 2']);
		store.close();
	});

	it('sends the photos of a check kept beside as “(imported)” to that copy, not the one here', async () => {
		const store = await openFreshStore('photo-beside');
		const id = await checkWithPhotos(store, 'A', [1, 2]);
		const text = await exported(store);
		await updateCheck(store, id, { notes: 'changed here' });
		const list = await listPhotos(store, id);
		if (!list.ok) throw new Error(list.message);
		await removePhoto(store, id, list.value[0].id);
		const here = await photosOf(store, id);

		expect(await importBackup(store, text, stubEngine())).toMatchObject({
			ok: true,
			beside: 1,
			photos: 2
		});
		const copy = await idOf(store, 'A (imported)');
		expect(copy).not.toBe(id);
		expect((await photosOf(store, copy)).map((p) => p[0])).toEqual(['Photo 1', 'Photo 2']);
		expect(await photosOf(store, id)).toEqual(here);
		store.close();
	});

	it('refuses a file whose photos are damaged, foreign or too many, and changes nothing', async () => {
		const store = await openFreshStore('photo-refuse');
		await checkWithPhotos(store, 'A', [1]);
		const good = JSON.parse(await exported(store));
		const photo = good.photos[0];
		const before = await everything(store);
		const withPhotos = (photos: unknown) => JSON.stringify({ ...good, photos });
		const pngBytes = btoa(
			String.fromCharCode(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 1, 2)
		);
		const tooMany = Array.from({ length: MAX_PHOTOS_PER_CHECK + 1 }, (_, i) => ({
			...photo,
			id: `p${i}`
		}));
		const cases: [string, string, RegExp][] = [
			[withPhotos('none'), 'damaged', /not a list/],
			[withPhotos([{ ...photo, checkId: 'someone-else' }]), 'damaged', /belongs to no check/],
			[withPhotos([{ ...photo, data: 'not base64!' }]), 'damaged', /not readable base64/],
			[withPhotos([{ ...photo, data: pngBytes }]), 'damaged', /not a image\/jpeg file/],
			[withPhotos([{ ...photo, type: 'image/gif' }]), 'damaged', /not a JPEG, PNG or WebP/],
			[withPhotos([{ ...photo, width: 100_000 }]), 'damaged', /width or height/],
			[withPhotos([{ ...photo, caption: 7 }]), 'damaged', /caption is not text/],
			[
				withPhotos([{ ...photo, data: 'A'.repeat(Math.ceil((MAX_PHOTO_BYTES * 4) / 3) + 8) }]),
				'damaged',
				/too large/
			],
			[withPhotos([photo, photo]), 'damaged', /listed twice/],
			[withPhotos(tooMany), 'damaged', /more than/],
			[withPhotos([{ ...photo, addedAt: 'today' }]), 'damaged', /no valid date/],
			[withPhotos([{ ...photo, schemaVersion: 9 }]), 'newer', /newer version/]
		];
		for (const [text, reason, message] of cases) {
			const engine = stubEngine();
			const result = await importBackup(store, text, engine);
			expect(result, text.slice(-120)).toMatchObject({ ok: false, reason });
			if (!result.ok) expect(result.message, reason).toMatch(message);
			expect(engine.calls).toHaveLength(0);
		}
		expect(await everything(store)).toEqual(before);
		store.close();
	});

	it('reads a version 1 file (before photos) and adds its checks', async () => {
		const source = await openFreshStore('photo-v1-source');
		await checkWithPhotos(source, 'Old', []);
		const good = JSON.parse(await exported(source));
		const v1 = JSON.stringify({ format: BACKUP_FORMAT, version: 1, records: good.records });
		const target = await openFreshStore('photo-v1');
		expect(await importBackup(target, v1, stubEngine())).toMatchObject({
			ok: true,
			added: 1,
			photos: 0
		});
		source.close();
		target.close();
	});

	it('is one transaction: a full disk at a photo leaves no check and no photo behind', async () => {
		const source = await openFreshStore('photo-quota-source');
		await checkWithPhotos(source, 'A', [1, 2]);
		const text = await exported(source);
		const target = await openFreshStore('photo-quota');
		await checkWithPhotos(target, 'Here', [5]);
		const before = await everything(target);
		// The check is written, then the first photo meets a full disk.
		const restore = stubWritesQuota(1);
		let result: Awaited<ReturnType<typeof importBackup>>;
		try {
			result = await importBackup(target, text, stubEngine());
		} finally {
			restore();
		}
		expect(result).toMatchObject({ ok: false, reason: 'storage' });
		if (!result.ok) expect(result.message).toMatch(/storage is full.*Nothing was imported/);
		expect(await everything(target)).toEqual(before);
		source.close();
		target.close();
	});
});

describe('planPhotos', () => {
	const photo = (checkId: string, id: string, byte: number): PhotoRecord => ({
		checkId,
		id,
		schemaVersion: 1,
		type: 'image/jpeg',
		data: new Uint8Array([0xff, 0xd8, 0xff, byte]).buffer,
		width: 1,
		height: 1,
		caption: '',
		addedAt: '2026-06-01T00:00:00.000Z'
	});
	let n = 0;
	const newId = () => `new-${++n}`;

	it('follows the target, skips the same bytes, and re-ids a taken id with other bytes', () => {
		const targets = new Map([
			['f1', 'here'],
			['f2', 'copy']
		]);
		const existing = new Map([['here', [photo('here', 'p1', 1)]]]);
		const incoming = [
			photo('f1', 'p1', 1),
			photo('f1', 'p1', 2),
			photo('f2', 'p1', 1),
			photo('gone', 'p9', 3)
		];
		const writes = planPhotos(incoming, targets, existing, newId);
		expect(writes.map((p) => [p.checkId, p.id, new Uint8Array(p.data)[3]])).toEqual([
			['here', 'new-1', 2],
			['copy', 'p1', 1]
		]);
	});
});
