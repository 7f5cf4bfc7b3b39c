import { isPlainObject } from './case-file';
import {
	MAX_BACKUP_PHOTOS,
	MAX_PHOTOS_PER_CHECK,
	MAX_PHOTO_BYTES,
	PHOTO_SCHEMA_VERSION
} from './constants';
import { base64ToBytes, bytesToBase64, decodedLength } from './photo-base64';
import { findPhotoProblem } from './photo-check';
import type { PhotoRecord } from './types';

// ISO 8601 exactly as toISOString writes it.
const ISO_DATE = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;

/** A photo in the backup file: the stored record with its bytes as base64 text. */
export interface BackupPhoto extends Omit<PhotoRecord, 'data'> {
	data: string;
}

/** Why the photos of a backup were refused. */
export type PhotoRefusal = { ok: false; reason: 'damaged' | 'newer'; message: string };

/** Stored photos as the backup file carries them. */
export function toBackupPhotos(photos: readonly PhotoRecord[]): BackupPhoto[] {
	return photos.map((p) => ({ ...pickPhoto(p), data: bytesToBase64(p.data) }));
}

/**
 * Reads and checks every photo of a backup before anything is written: each must belong to a
 * check in the same file, be a JPEG, PNG or WebP whose bytes say so, within the size limits,
 * and appear once; a check may hold at most MAX_PHOTOS_PER_CHECK. Pure.
 * @param recordIds the ids of the checks in the file
 */
export function readBackupPhotos(
	raw: unknown,
	recordIds: ReadonlySet<string>
): { ok: true; photos: PhotoRecord[] } | PhotoRefusal {
	if (raw === undefined) return { ok: true, photos: [] };
	if (!Array.isArray(raw)) return damaged('its list of photos is not a list');
	if (raw.length > MAX_BACKUP_PHOTOS)
		return damaged(`it lists more than ${MAX_BACKUP_PHOTOS} photos`);
	const photos: PhotoRecord[] = [];
	const seen = new Set<string>();
	const perCheck = new Map<string, number>();
	for (let i = 0; i < raw.length; i++) {
		const read = readPhoto(raw[i], recordIds);
		if (read === 'newer') {
			return {
				ok: false,
				reason: 'newer',
				message: `Photo ${i + 1} in this backup was saved by a newer version of Hingepoint. Update the app, then import again.`
			};
		}
		if (typeof read === 'string') return damaged(`photo ${i + 1} ${read}`);
		const key = JSON.stringify([read.checkId, read.id]);
		if (seen.has(key)) return damaged(`photo ${i + 1} is listed twice`);
		seen.add(key);
		const count = (perCheck.get(read.checkId) ?? 0) + 1;
		if (count > MAX_PHOTOS_PER_CHECK) {
			return damaged(`a check holds more than ${MAX_PHOTOS_PER_CHECK} photos`);
		}
		perCheck.set(read.checkId, count);
		photos.push(read);
	}
	return { ok: true, photos };
}

// A photo record, 'newer', or what is wrong with it (as the end of a sentence).
function readPhoto(raw: unknown, recordIds: ReadonlySet<string>): PhotoRecord | 'newer' | string {
	if (!isPlainObject(raw)) return 'is not a photo';
	const version = raw.schemaVersion;
	if (!Number.isInteger(version) || (version as number) < 1) return 'has no valid schema version';
	if ((version as number) > PHOTO_SCHEMA_VERSION) return 'newer';
	if (typeof raw.checkId !== 'string' || !recordIds.has(raw.checkId)) {
		return 'belongs to no check in this backup';
	}
	if (typeof raw.id !== 'string' || raw.id === '' || raw.id.length > 100) return 'has no valid id';
	if (typeof raw.addedAt !== 'string' || !ISO_DATE.test(raw.addedAt)) return 'has no valid date';
	if (typeof raw.data !== 'string' || decodedLength(raw.data.length) > MAX_PHOTO_BYTES + 2) {
		return 'is missing or too large';
	}
	const data = base64ToBytes(raw.data);
	if (!data) return 'is not readable base64';
	const facts = {
		type: raw.type,
		data,
		width: raw.width,
		height: raw.height,
		caption: raw.caption
	};
	const problem = findPhotoProblem(facts);
	if (problem) return `was refused: ${problem}`;
	return pickPhoto({ ...(raw as unknown as PhotoRecord), data });
}

// Only the fields we know, so nothing unexpected is stored or written out.
function pickPhoto(p: PhotoRecord): PhotoRecord {
	return {
		checkId: p.checkId,
		id: p.id,
		schemaVersion: p.schemaVersion,
		type: p.type,
		data: p.data,
		width: p.width,
		height: p.height,
		caption: p.caption,
		addedAt: p.addedAt
	};
}

function damaged(what: string): PhotoRefusal {
	return {
		ok: false,
		reason: 'damaged',
		message: `This backup is damaged: ${what}. Nothing was imported.`
	};
}
