// Photos of a check on fake IndexedDB: kept, listed, captioned, removed; refused when they are not
// photos we keep; a full disk loses nothing.
import { describe, expect, it } from 'vitest';
import {
	addPhoto,
	deleteCheck,
	listPhotos,
	purgeDeleted,
	removePhoto,
	saveCheck,
	setPhotoCaption,
	undoDelete,
	MAX_CAPTION_CHARS,
	MAX_PHOTOS_PER_CHECK,
	type CheckStore
} from '../../../src/lib/storage';
import { MAX_PHOTO_BYTES } from '../../../src/lib/storage/constants';
import { jpegBlob, openFreshStore, plainCheck, stubWritesQuota } from '../../storage/support';

async function newCheck(store: CheckStore, title = 'Beam'): Promise<string> {
	const saved = await saveCheck(store, plainCheck(title));
	if (!saved.ok) throw new Error(saved.message);
	return saved.value.record.id;
}

async function attach(store: CheckStore, checkId: string, seed: number, minute = seed) {
	const now = new Date(Date.UTC(2026, 5, 1, 8, minute));
	const added = await addPhoto(store, {
		checkId,
		image: jpegBlob(seed),
		width: 160,
		height: 120,
		now
	});
	if (!added.ok) throw new Error(added.message);
	return added.value;
}

async function bytesOf(blob: Blob): Promise<number[]> {
	return Array.from(new Uint8Array(await blob.arrayBuffer()));
}

async function listed(store: CheckStore, checkId: string) {
	const list = await listPhotos(store, checkId);
	if (!list.ok) throw new Error(list.message);
	return list.value;
}

describe('photos of a check', () => {
	it('keeps the bytes, size and caption, and lists them oldest first', async () => {
		const store = await openFreshStore('photos-keep');
		const id = await newCheck(store);
		const later = await attach(store, id, 2, 30);
		const first = await addPhoto(store, {
			checkId: id,
			image: jpegBlob(1),
			width: 1600,
			height: 1200,
			caption: '  Tape at mid-span  ',
			now: new Date(Date.UTC(2026, 5, 1, 8, 0))
		});
		expect(first.ok).toBe(true);
		const photos = await listed(store, id);
		expect(photos.map((p) => [p.caption, p.width, p.height])).toEqual([
			['Tape at mid-span', 1600, 1200],
			['', 160, 120]
		]);
		expect(photos[1].id).toBe(later.id);
		expect(photos[0].blob.type).toBe('image/jpeg');
		expect(await bytesOf(photos[0].blob)).toEqual(await bytesOf(jpegBlob(1)));
		store.close();
	});

	it('lists only the photos of the check asked for, even when one id starts another', async () => {
		const store = await openFreshStore('photos-apart');
		const a = await newCheck(store, 'A');
		const b = await newCheck(store, 'B');
		await attach(store, a, 1);
		await attach(store, b, 2);
		await attach(store, b, 3);
		expect((await listed(store, a)).length).toBe(1);
		expect((await listed(store, b)).length).toBe(2);
		// A raw photo under a longer id that begins with `a` stays out of `a`'s list.
		const tx = store.db!.transaction('photos', 'readwrite');
		const stray = { checkId: `${a}x`, id: 'p', schemaVersion: 1, type: 'image/jpeg' as const };
		await tx.store.put({
			...stray,
			data: new ArrayBuffer(4),
			width: 1,
			height: 1,
			caption: '',
			addedAt: ''
		});
		await tx.done;
		expect((await listed(store, a)).length).toBe(1);
		store.close();
	});

	it('refuses what is not a photo we keep, and stores nothing', async () => {
		const store = await openFreshStore('photos-refuse');
		const id = await newCheck(store);
		const png = new Blob([await jpegBlob().arrayBuffer()], { type: 'image/png' });
		const huge = new Uint8Array(MAX_PHOTO_BYTES + 1);
		huge.set([0xff, 0xd8, 0xff]);
		const cases: [Parameters<typeof addPhoto>[1], RegExp][] = [
			[{ checkId: id, image: png, width: 10, height: 10 }, /not a image\/png file/],
			[
				{ checkId: id, image: new Blob(['hello'], { type: 'text/plain' }), width: 10, height: 10 },
				/not a JPEG/
			],
			[
				{ checkId: id, image: new Blob([], { type: 'image/jpeg' }), width: 10, height: 10 },
				/empty/
			],
			[
				{ checkId: id, image: new Blob([huge], { type: 'image/jpeg' }), width: 10, height: 10 },
				/larger than/
			],
			[{ checkId: id, image: jpegBlob(), width: 10.5, height: 10 }, /width or height/],
			[{ checkId: id, image: jpegBlob(), width: 10, height: 0 }, /width or height/],
			[
				{
					checkId: id,
					image: jpegBlob(),
					width: 10,
					height: 10,
					caption: 'x'.repeat(MAX_CAPTION_CHARS + 1)
				},
				/caption/
			]
		];
		for (const [photo, message] of cases) {
			const added = await addPhoto(store, photo);
			expect(added.ok).toBe(false);
			if (!added.ok) {
				expect(added.reason).toBe('invalid');
				expect(added.message).toMatch(message);
			}
		}
		const missing = await addPhoto(store, {
			checkId: 'nope',
			image: jpegBlob(),
			width: 1,
			height: 1
		});
		expect(!missing.ok && missing.reason).toBe('not-found');
		expect(await store.db?.count('photos')).toBe(0);
		store.close();
	});

	it('holds at most the photos one check may keep', async () => {
		const store = await openFreshStore('photos-limit');
		const id = await newCheck(store);
		for (let i = 0; i < MAX_PHOTOS_PER_CHECK; i++) await attach(store, id, i);
		const over = await addPhoto(store, { checkId: id, image: jpegBlob(99), width: 1, height: 1 });
		expect(over.ok).toBe(false);
		if (!over.ok) expect(over.message).toMatch(`${MAX_PHOTOS_PER_CHECK} photos`);
		expect((await listed(store, id)).length).toBe(MAX_PHOTOS_PER_CHECK);
		store.close();
	});

	it('removes one photo and sets a caption without touching the others', async () => {
		const store = await openFreshStore('photos-remove');
		const id = await newCheck(store);
		const one = await attach(store, id, 1);
		const two = await attach(store, id, 2);
		expect(await setPhotoCaption(store, id, two.id, ' Label ')).toEqual({
			ok: true,
			value: 'Label'
		});
		const long = await setPhotoCaption(store, id, two.id, 'y'.repeat(MAX_CAPTION_CHARS + 1));
		expect(long.ok).toBe(false);
		expect(await removePhoto(store, id, one.id)).toEqual({ ok: true, value: null });
		expect((await listed(store, id)).map((p) => [p.id, p.caption])).toEqual([[two.id, 'Label']]);
		const again = await removePhoto(store, id, one.id);
		expect(!again.ok && again.reason).toBe('not-found');
		store.close();
	});

	it('keeps the photos of a deleted check for undo; purging the check removes them', async () => {
		const store = await openFreshStore('photos-delete');
		const gone = await newCheck(store, 'Gone');
		const kept = await newCheck(store, 'Kept');
		await attach(store, gone, 1);
		await attach(store, kept, 2);
		await deleteCheck(store, gone, { now: new Date('2026-01-01T00:00:00.000Z') });
		const refused = await addPhoto(store, {
			checkId: gone,
			image: jpegBlob(3),
			width: 1,
			height: 1
		});
		expect(!refused.ok && refused.reason).toBe('not-found');
		await undoDelete(store, gone);
		expect((await listed(store, gone)).length).toBe(1);
		await deleteCheck(store, gone, { now: new Date('2026-01-01T00:00:00.000Z') });
		expect(await purgeDeleted(store, { before: new Date('2026-02-01T00:00:00.000Z') })).toEqual({
			ok: true,
			value: 1
		});
		expect((await listed(store, gone)).length).toBe(0);
		expect((await listed(store, kept)).length).toBe(1);
		store.close();
	});
});

describe('a full disk while keeping a photo', () => {
	it('says so plainly and loses nothing: the check and its other photos stay as they were', async () => {
		const store = await openFreshStore('photos-quota');
		const id = await newCheck(store);
		await attach(store, id, 1);
		const before = {
			checks: await store.db!.getAll('checks'),
			photos: await store.db!.getAll('photos')
		};
		const restore = stubWritesQuota();
		let added: Awaited<ReturnType<typeof addPhoto>>;
		try {
			added = await addPhoto(store, { checkId: id, image: jpegBlob(2), width: 10, height: 10 });
		} finally {
			restore();
		}
		expect(added).toMatchObject({ ok: false, reason: 'quota' });
		if (!added.ok) expect(added.message).toMatch(/storage is full.*still there/);
		expect(await store.db!.getAll('checks')).toEqual(before.checks);
		expect(await store.db!.getAll('photos')).toEqual(before.photos);
		// Space freed: the same photo is kept.
		expect(
			(await addPhoto(store, { checkId: id, image: jpegBlob(2), width: 10, height: 10 })).ok
		).toBe(true);
		store.close();
	});
});
