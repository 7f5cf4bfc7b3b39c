import { MAX_CAPTION_CHARS, MAX_PHOTOS_PER_CHECK, PHOTO_SCHEMA_VERSION } from './constants';
import type { CheckStore } from './db';
import { fail } from './errors';
import { createId, stampNow } from './ids';
import { findPhotoProblem } from './photo-check';
import { readFrom, writeTo } from './tx';
import type { ClockOptions, PhotoRecord, StoreResult } from './types';

/** A photo as screens and the calc sheet use it. */
export interface CheckPhoto {
	id: string;
	blob: Blob;
	caption: string;
	width: number;
	height: number;
}

/** A resized photo to attach to a saved check. */
export interface NewPhoto extends ClockOptions {
	checkId: string;
	/** The image as it will be kept (already resized on the device); its `type` is stored. */
	image: Blob;
	width: number;
	height: number;
	caption?: string;
}

/** Every key `[checkId, …]`: arrays sort after strings, so `[checkId, []]` is past the last id. */
export function photoRange(checkId: string): IDBKeyRange {
	return IDBKeyRange.bound([checkId], [checkId, []]);
}

/**
 * Attaches a photo to a saved, live check. Refused when the check is gone, deleted or newer, the
 * photo is not one we store, or the check already holds the most photos allowed. A full disk
 * aborts the one transaction: nothing else changes.
 */
export async function addPhoto(
	store: CheckStore,
	photo: NewPhoto
): Promise<StoreResult<CheckPhoto>> {
	let data: ArrayBuffer;
	try {
		data = await photo.image.arrayBuffer();
	} catch {
		return fail('invalid', 'The photo could not be read, so it was not kept.');
	}
	const caption = (photo.caption ?? '').trim();
	const problem = findPhotoProblem({ ...photo, type: photo.image.type, data, caption });
	if (problem) return fail('invalid', `This photo was not kept: ${problem}.`);
	const record: PhotoRecord = {
		checkId: photo.checkId,
		id: createId(),
		schemaVersion: PHOTO_SCHEMA_VERSION,
		type: photo.image.type as PhotoRecord['type'],
		data,
		width: photo.width,
		height: photo.height,
		caption,
		addedAt: stampNow(photo.now)
	};
	return writeTo(store, ['checks', 'photos'], async (tx) => {
		const check = await tx.objectStore('checks').get(photo.checkId);
		if (!check || check.deletedAt !== null) return fail('not-found');
		const photos = tx.objectStore('photos');
		if ((await photos.count(photoRange(photo.checkId))) >= MAX_PHOTOS_PER_CHECK) {
			return fail(
				'invalid',
				`This check already holds ${MAX_PHOTOS_PER_CHECK} photos, the most one check keeps. Remove one to add another.`
			);
		}
		await photos.add(record);
		return { ok: true, value: toCheckPhoto(record) };
	});
}

/**
 * The photos of one check, oldest first, as `{ id, blob, caption, width, height }`: for the check
 * screen and the calc sheet. Photos written by a newer app version in a shape we do not know are
 * left out (never rewritten).
 */
export async function listPhotos(
	store: CheckStore,
	checkId: string
): Promise<StoreResult<CheckPhoto[]>> {
	return readFrom(store, async (db) => {
		const records = await db.getAll('photos', photoRange(checkId));
		const readable = records.filter(isReadable).sort(byAdded);
		return { ok: true, value: readable.map(toCheckPhoto) };
	});
}

/** Removes one photo of a check for good (nothing else is touched). */
export async function removePhoto(
	store: CheckStore,
	checkId: string,
	photoId: string
): Promise<StoreResult<null>> {
	return writeTo(store, ['photos'], async (tx) => {
		const photos = tx.objectStore('photos');
		if (!(await photos.get([checkId, photoId])))
			return fail('not-found', 'That photo is not on this device any more.');
		await photos.delete([checkId, photoId]);
		return { ok: true, value: null };
	});
}

/** Sets a photo's caption (trimmed, at most MAX_CAPTION_CHARS characters). */
export async function setPhotoCaption(
	store: CheckStore,
	checkId: string,
	photoId: string,
	caption: string
): Promise<StoreResult<string>> {
	const text = caption.trim();
	if (text.length > MAX_CAPTION_CHARS) {
		return fail(
			'invalid',
			`A caption can be at most ${MAX_CAPTION_CHARS} characters. Nothing was changed.`
		);
	}
	return writeTo(store, ['photos'], async (tx) => {
		const photos = tx.objectStore('photos');
		const current = await photos.get([checkId, photoId]);
		if (!current) return fail('not-found', 'That photo is not on this device any more.');
		if (current.schemaVersion > PHOTO_SCHEMA_VERSION) return fail('newer');
		await photos.put({ ...current, caption: text });
		return { ok: true, value: text };
	});
}

/** Orders photos as they were attached; the id breaks ties so the order never changes. */
export function byAdded(a: PhotoRecord, b: PhotoRecord): number {
	if (a.addedAt !== b.addedAt) return a.addedAt < b.addedAt ? -1 : 1;
	return a.id < b.id ? -1 : a.id > b.id ? 1 : 0;
}

function isReadable(record: PhotoRecord): boolean {
	return record.schemaVersion <= PHOTO_SCHEMA_VERSION && record.data instanceof ArrayBuffer;
}

function toCheckPhoto(record: PhotoRecord): CheckPhoto {
	return {
		id: record.id,
		blob: new Blob([record.data], { type: record.type }),
		caption: record.caption,
		width: record.width,
		height: record.height
	};
}
