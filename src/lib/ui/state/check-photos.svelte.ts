import { resizePhoto, type ResizeOutcome } from '$lib/photos/resize-photo';
import {
	addPhoto,
	listPhotos,
	removePhoto,
	setPhotoCaption,
	MAX_PHOTOS_PER_CHECK,
	type CheckPhoto,
	type CheckStore
} from '$lib/storage';

/** A photo as the check screen shows it: an object URL for the thumbnail. */
export interface PhotoView {
	id: string;
	url: string;
	caption: string;
	width: number;
	height: number;
}

/** Makes and frees object URLs (tests pass counting stand-ins). */
export interface UrlMaker {
	create: (blob: Blob) => string;
	revoke: (url: string) => void;
}

export interface CheckPhotosOptions {
	connect: () => Promise<CheckStore | null>;
	resize?: (file: Blob) => Promise<ResizeOutcome>;
	urls?: UrlMaker;
}

/** Shown while the open check is not saved: photos belong to a saved check. */
export const SAVE_FIRST =
	'Save this check first: photos are kept with a saved check, on this phone only.';

/** Larger than any phone photo; a bigger file is refused before it is decoded. */
const MAX_SOURCE_BYTES = 60_000_000;

/**
 * The photos of the check open on the check screen: attach (resized on the device), list as
 * thumbnails, caption, remove. Every object URL made is freed when its photo leaves the screen.
 */
export class CheckPhotos {
	/** The saved check whose photos are shown; null for a check not saved yet. */
	checkId = $state<string | null>(null);
	items = $state<PhotoView[]>([]);
	busy = $state(false);
	message = $state('');
	#connect: () => Promise<CheckStore | null>;
	#resize: (file: Blob) => Promise<ResizeOutcome>;
	#urls: UrlMaker;
	// Rises on every `show`, so a list that arrives late for an earlier check is dropped.
	#shown = 0;

	constructor(options: CheckPhotosOptions) {
		this.#connect = options.connect;
		this.#resize = options.resize ?? ((file) => resizePhoto(file));
		this.#urls = options.urls ?? {
			create: (blob) => URL.createObjectURL(blob),
			revoke: (url) => URL.revokeObjectURL(url)
		};
	}

	/** Shows the photos of a saved check (null: a new check, which holds none). */
	async show(checkId: string | null): Promise<void> {
		if (checkId === this.checkId) return;
		const ticket = ++this.#shown;
		this.#clear();
		this.checkId = checkId;
		this.message = '';
		if (!checkId) return;
		const store = await this.#connect();
		if (ticket !== this.#shown) return;
		if (!store) {
			this.message = 'Photos cannot be kept: this browser does not let the app store data.';
			return;
		}
		const listed = await listPhotos(store, checkId);
		if (ticket !== this.#shown) return;
		if (!listed.ok) this.message = listed.message;
		else this.items = listed.value.map((photo) => this.#view(photo));
	}

	/** Resizes and keeps each picture, one at a time; stops at a full disk. */
	async add(files: readonly Blob[]): Promise<void> {
		const checkId = this.checkId;
		if (!checkId) {
			this.message = SAVE_FIRST;
			return;
		}
		const store = await this.#connect();
		if (!store) {
			this.message = 'Photos cannot be kept: this browser does not let the app store data.';
			return;
		}
		this.busy = true;
		const notes: string[] = [];
		let kept = 0;
		try {
			for (const file of files) {
				if (this.items.length >= MAX_PHOTOS_PER_CHECK) {
					notes.push(`A check keeps at most ${MAX_PHOTOS_PER_CHECK} photos.`);
					break;
				}
				const saved = await this.#keep(store, checkId, file);
				// The user opened another check meanwhile: this photo stays with its own check.
				if (this.checkId !== checkId) return;
				if (!saved.ok) {
					notes.push(saved.message);
					if (saved.full) break;
					continue;
				}
				this.items.push(this.#view(saved.photo));
				kept += 1;
			}
		} finally {
			this.busy = false;
		}
		const done = kept > 0 ? `${kept} photo${kept === 1 ? '' : 's'} kept on this phone.` : '';
		this.message = [done, ...notes].filter(Boolean).join(' ');
	}

	/** Removes a photo for good and frees its thumbnail. */
	async remove(photoId: string): Promise<void> {
		const checkId = this.checkId;
		const store = await this.#connect();
		if (!checkId || !store) return;
		const removed = await removePhoto(store, checkId, photoId);
		if (!removed.ok && removed.reason !== 'not-found') {
			this.message = `Photo not removed: ${removed.message}`;
			return;
		}
		const item = this.items.find((p) => p.id === photoId);
		if (item) this.#urls.revoke(item.url);
		this.items = this.items.filter((p) => p.id !== photoId);
		this.message = 'Photo removed.';
	}

	/** Stores a new caption for a photo. */
	async setCaption(photoId: string, caption: string): Promise<void> {
		const checkId = this.checkId;
		const store = await this.#connect();
		if (!checkId || !store) return;
		const saved = await setPhotoCaption(store, checkId, photoId, caption);
		if (!saved.ok) {
			this.message = `Caption not saved: ${saved.message}`;
			return;
		}
		const item = this.items.find((p) => p.id === photoId);
		if (item) item.caption = saved.value;
		this.message = 'Caption saved.';
	}

	/** Frees every object URL (the screen is closing). */
	dispose(): void {
		this.#shown += 1;
		this.#clear();
	}

	async #keep(
		store: CheckStore,
		checkId: string,
		file: Blob
	): Promise<{ ok: true; photo: CheckPhoto } | { ok: false; message: string; full: boolean }> {
		if (file.size > MAX_SOURCE_BYTES) {
			return {
				ok: false,
				message: 'This file is too large to be a photo, so it was not kept.',
				full: false
			};
		}
		const resized = await this.#resize(file);
		if (!resized.ok) return { ok: false, message: resized.message, full: false };
		const { blob, width, height } = resized;
		const saved = await addPhoto(store, { checkId, image: blob, width, height });
		if (saved.ok) return { ok: true, photo: saved.value };
		return {
			ok: false,
			message: `Photo not kept: ${saved.message}`,
			full: saved.reason === 'quota'
		};
	}

	#view(photo: CheckPhoto): PhotoView {
		const { id, caption, width, height } = photo;
		return { id, url: this.#urls.create(photo.blob), caption, width, height };
	}

	#clear(): void {
		for (const item of this.items) this.#urls.revoke(item.url);
		this.items = [];
	}
}
