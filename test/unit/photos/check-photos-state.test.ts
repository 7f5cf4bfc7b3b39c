// The photos of the open check as the check screen holds them: object URLs are freed when a photo
// leaves the screen, a new check asks to be saved first, and a full disk stops the batch plainly.
import { describe, expect, it } from 'vitest';
import { listPhotos, saveCheck, type CheckStore } from '../../../src/lib/storage';
import { CheckPhotos, SAVE_FIRST } from '../../../src/lib/ui/state/check-photos.svelte';
import type { ResizeOutcome } from '../../../src/lib/photos/resize-photo';
import { jpegBlob, openFreshStore, plainCheck, stubWritesQuota } from '../../storage/support';

// Counting stand-ins for URL.createObjectURL / revokeObjectURL.
function urlBook() {
	let n = 0;
	const live = new Set<string>();
	return {
		live,
		create: () => {
			const url = `blob:test/${++n}`;
			live.add(url);
			return url;
		},
		revoke: (url: string) => {
			if (!live.delete(url)) throw new Error(`revoked twice or never made: ${url}`);
		}
	};
}

// The resize step without a canvas: hands the picture on with a fixed size.
const passThrough = async (file: Blob): Promise<ResizeOutcome> => ({
	ok: true,
	blob: file,
	width: 64,
	height: 48
});

async function setUp(label: string) {
	const store = await openFreshStore(label);
	const saved = await saveCheck(store, plainCheck('Beam'));
	if (!saved.ok) throw new Error(saved.message);
	const urls = urlBook();
	const photos = new CheckPhotos({ connect: async () => store, resize: passThrough, urls });
	return { store, urls, photos, id: saved.value.record.id };
}

async function stored(store: CheckStore, id: string): Promise<number> {
	const list = await listPhotos(store, id);
	return list.ok ? list.value.length : -1;
}

describe('CheckPhotos', () => {
	it('asks for a save first on a new check and keeps nothing', async () => {
		const { store, photos } = await setUp('state-new');
		await photos.show(null);
		await photos.add([jpegBlob()]);
		expect(photos.message).toBe(SAVE_FIRST);
		expect(photos.items).toEqual([]);
		expect(await store.db?.count('photos')).toBe(0);
		store.close();
	});

	it('keeps, lists again on reopening, and frees every URL when photos leave the screen', async () => {
		const { store, urls, photos, id } = await setUp('state-urls');
		await photos.show(id);
		await photos.add([jpegBlob(1), jpegBlob(2)]);
		expect(photos.message).toMatch(/2 photos kept/);
		expect(photos.items.map((p) => [p.width, p.height])).toEqual([
			[64, 48],
			[64, 48]
		]);
		expect(urls.live.size).toBe(2);

		await photos.remove(photos.items[0].id);
		expect(urls.live.size).toBe(1);
		expect(await stored(store, id)).toBe(1);

		await photos.show(null);
		expect(urls.live.size).toBe(0);
		await photos.show(id);
		expect(photos.items.length).toBe(1);
		await photos.setCaption(photos.items[0].id, 'Tape at support');
		photos.dispose();
		expect(urls.live.size).toBe(0);

		const again = new CheckPhotos({ connect: async () => store, resize: passThrough, urls });
		await again.show(id);
		expect(again.items.map((p) => p.caption)).toEqual(['Tape at support']);
		store.close();
	});

	it('reports a picture that could not be shrunk, and keeps the others', async () => {
		const { store, photos, id } = await setUp('state-resize');
		let calls = 0;
		const flaky = new CheckPhotos({
			connect: async () => store,
			resize: async (file) =>
				++calls === 1 ? { ok: false, message: 'Could not read it.' } : passThrough(file),
			urls: urlBook()
		});
		await flaky.show(id);
		await flaky.add([jpegBlob(1), jpegBlob(2)]);
		expect(flaky.message).toBe('1 photo kept on this phone. Could not read it.');
		expect(await stored(store, id)).toBe(1);
		photos.dispose();
		store.close();
	});

	it('stops at a full disk with a plain message, keeping the photos already there', async () => {
		const { store, photos, id } = await setUp('state-quota');
		await photos.show(id);
		await photos.add([jpegBlob(1)]);
		const restore = stubWritesQuota();
		try {
			await photos.add([jpegBlob(2), jpegBlob(3)]);
		} finally {
			restore();
		}
		expect(photos.message).toMatch(/^Photo not kept: The phone’s storage is full/);
		expect(photos.message.match(/storage is full/g)?.length).toBe(1);
		expect(photos.items.length).toBe(1);
		expect(await stored(store, id)).toBe(1);
		store.close();
	});
});
