import { MAX_CAPTION_CHARS, MAX_PHOTO_BYTES, MAX_PHOTO_SIDE, PHOTO_TYPES } from './constants';
import type { PhotoType } from './types';

/** The parts of a photo checked before it is stored, whether from the camera or a backup. */
export interface PhotoFacts {
	type: unknown;
	data: ArrayBuffer;
	width: unknown;
	height: unknown;
	caption: unknown;
}

/**
 * Names the first reason a photo may not be stored, or null when it may: an unknown type, bytes
 * that do not start the way that type's files do, too many bytes, or odd sizes or caption. Pure.
 * @example
 * findPhotoProblem({ type: 'image/png', data: jpegBytes, width: 10, height: 10, caption: '' })
 * // 'its bytes are not a image/png file'
 */
export function findPhotoProblem(photo: PhotoFacts): string | null {
	if (!isPhotoType(photo.type)) return 'it is not a JPEG, PNG or WebP image';
	if (photo.data.byteLength === 0) return 'it is empty';
	if (photo.data.byteLength > MAX_PHOTO_BYTES) {
		return `it is larger than ${Math.round(MAX_PHOTO_BYTES / 1e6)} MB`;
	}
	if (!startsLike(photo.type, new Uint8Array(photo.data, 0, Math.min(12, photo.data.byteLength)))) {
		return `its bytes are not a ${photo.type} file`;
	}
	if (!isSide(photo.width) || !isSide(photo.height)) return 'its width or height is not sensible';
	if (typeof photo.caption !== 'string') return 'its caption is not text';
	if (photo.caption.length > MAX_CAPTION_CHARS) {
		return `its caption is longer than ${MAX_CAPTION_CHARS} characters`;
	}
	return null;
}

/** Whether a value is one of the image types we store. */
export function isPhotoType(value: unknown): value is PhotoType {
	return (PHOTO_TYPES as readonly unknown[]).includes(value);
}

function isSide(value: unknown): boolean {
	return Number.isInteger(value) && (value as number) >= 1 && (value as number) <= MAX_PHOTO_SIDE;
}

// The first bytes each format always starts with: a renamed or damaged file is caught here.
function startsLike(type: PhotoType, head: Uint8Array): boolean {
	const has = (offset: number, bytes: number[]) => bytes.every((b, i) => head[offset + i] === b);
	if (type === 'image/jpeg') return has(0, [0xff, 0xd8, 0xff]);
	if (type === 'image/png') return has(0, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
	return has(0, [0x52, 0x49, 0x46, 0x46]) && has(8, [0x57, 0x45, 0x42, 0x50]);
}
