/** Longest side of a photo as kept, in pixels: tape readings stay legible, a photo stays small. */
export const PHOTO_LONG_SIDE = 1600;

/** JPEG quality of a kept photo (0–1). */
export const PHOTO_QUALITY = 0.8;

/** Pixel size of an image. */
export interface PixelSize {
	width: number;
	height: number;
}

/**
 * The size to draw an image at so its longest side is at most `longSide`, keeping its shape and
 * never enlarging it. Sides are whole pixels, at least 1. Null for a size that is not a picture
 * (zero, negative or not finite). Pure.
 * @example
 * fitWithin({ width: 4000, height: 3000 }, 1600) // { width: 1600, height: 1200 }
 * fitWithin({ width: 800, height: 600 }, 1600)   // { width: 800, height: 600 }
 */
export function fitWithin(size: PixelSize, longSide = PHOTO_LONG_SIDE): PixelSize | null {
	const { width, height } = size;
	if (!(width > 0 && height > 0 && Number.isFinite(width) && Number.isFinite(height))) return null;
	if (!(longSide >= 1)) return null;
	const scale = Math.min(1, longSide / Math.max(width, height));
	return {
		width: Math.max(1, Math.min(Math.floor(longSide), Math.round(width * scale))),
		height: Math.max(1, Math.min(Math.floor(longSide), Math.round(height * scale)))
	};
}
