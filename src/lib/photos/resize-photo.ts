import { fitWithin, PHOTO_LONG_SIDE, PHOTO_QUALITY, type PixelSize } from './target-size';

/** A photo made small enough to keep, or why it could not be. */
export type ResizeOutcome =
	{ ok: true; blob: Blob; width: number; height: number } | { ok: false; message: string };

/** What to keep a photo as: longest side in pixels, JPEG quality. */
export interface ResizeOptions {
	longSide?: number;
	quality?: number;
}

interface Decoded extends PixelSize {
	image: CanvasImageSource;
	release: () => void;
}

type Context2D = CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D;

const UNREADABLE = 'This file could not be read as a picture, so it was not kept.';

/**
 * Re-encodes a picture from the camera or a file as a JPEG whose longest side is at most 1600 px,
 * turned upright as its EXIF orientation says, on the device (nothing is uploaded). Uses
 * createImageBitmap and OffscreenCanvas where the browser has them, else an <img> and a <canvas>.
 */
export async function resizePhoto(file: Blob, options: ResizeOptions = {}): Promise<ResizeOutcome> {
	let decoded: Decoded;
	try {
		decoded = await decode(file);
	} catch {
		return { ok: false, message: UNREADABLE };
	}
	try {
		const size = fitWithin(decoded, options.longSide ?? PHOTO_LONG_SIDE);
		if (!size) return { ok: false, message: UNREADABLE };
		const blob = await encode(decoded.image, size, options.quality ?? PHOTO_QUALITY);
		if (!blob)
			return { ok: false, message: 'This browser could not shrink the photo, so it was not kept.' };
		return { ok: true, blob, ...size };
	} catch {
		return { ok: false, message: 'This browser could not shrink the photo, so it was not kept.' };
	} finally {
		decoded.release();
	}
}

async function decode(file: Blob): Promise<Decoded> {
	if (typeof createImageBitmap === 'function') {
		const bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
		return {
			image: bitmap,
			width: bitmap.width,
			height: bitmap.height,
			release: () => bitmap.close()
		};
	}
	// Older browsers: an <img> turns the picture upright by its EXIF orientation itself.
	const url = URL.createObjectURL(file);
	const img = new Image();
	img.src = url;
	try {
		await img.decode();
	} catch (error) {
		URL.revokeObjectURL(url);
		throw error;
	}
	const release = () => URL.revokeObjectURL(url);
	return { image: img, width: img.naturalWidth, height: img.naturalHeight, release };
}

async function encode(
	image: CanvasImageSource,
	size: PixelSize,
	quality: number
): Promise<Blob | null> {
	if (typeof OffscreenCanvas === 'function') {
		const canvas = new OffscreenCanvas(size.width, size.height);
		const context = canvas.getContext('2d');
		if (context) {
			paint(context, image, size);
			return canvas.convertToBlob({ type: 'image/jpeg', quality });
		}
	}
	const canvas = document.createElement('canvas');
	canvas.width = size.width;
	canvas.height = size.height;
	const context = canvas.getContext('2d');
	if (!context) return null;
	paint(context, image, size);
	return new Promise((resolve) => canvas.toBlob(resolve, 'image/jpeg', quality));
}

function paint(context: Context2D, image: CanvasImageSource, size: PixelSize): void {
	// JPEG has no transparency: a see-through PNG would otherwise come out black.
	context.fillStyle = '#ffffff';
	context.fillRect(0, 0, size.width, size.height);
	context.imageSmoothingQuality = 'high';
	context.drawImage(image, 0, 0, size.width, size.height);
}
