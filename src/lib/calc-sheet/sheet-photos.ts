/**
 * The check's photos on the calc sheet, when asked for: on pages after the one-page sheet (the
 * sheet itself keeps its single page), two columns of three, each photo scaled to fit its cell
 * with its caption under it. Photos are kept as JPEG (resized on the phone); PNG is taken too,
 * anything else is listed by caption as not printable.
 */
import type { PDFDocument, PDFImage } from 'pdf-lib';
import { PAPER_SIZE, PHOTOS_PER_PAGE, type SheetContext } from './sheet-context';
import { SheetPen, type PenFonts } from './sheet-pen';

/** A photo ready for the sheet: its bytes and what it shows. */
export interface SheetPhoto {
	bytes: Uint8Array;
	/** MIME type as stored, e.g. `image/jpeg`. */
	type: string;
	caption: string;
}

const COLUMNS = 2;
const ROWS = 3;
const MARGIN = 34;
const CAPTION_ROOM = 22;

/**
 * Reads stored photos (`{ blob, caption }`) into bytes for the sheet.
 * @example
 * const photos = await readSheetPhotos(listed.value);
 */
export async function readSheetPhotos(
	photos: { blob: Blob; caption: string }[]
): Promise<SheetPhoto[]> {
	return Promise.all(
		photos.map(async (p) => ({
			bytes: new Uint8Array(await p.blob.arrayBuffer()),
			type: p.blob.type,
			caption: p.caption
		}))
	);
}

/** How many pages the photos take after the sheet's own page. */
function countPhotoPages(photos: number): number {
	return Math.ceil(photos / PHOTOS_PER_PAGE);
}

async function embed(doc: PDFDocument, photo: SheetPhoto): Promise<PDFImage | null> {
	try {
		if (photo.type === 'image/jpeg') return await doc.embedJpg(photo.bytes);
		if (photo.type === 'image/png') return await doc.embedPng(photo.bytes);
	} catch {
		// A damaged image is named below instead of stopping the sheet.
	}
	return null;
}

/** Adds the photo pages to the document, after the sheet's page. */
export async function addPhotoPages(
	doc: PDFDocument,
	photos: SheetPhoto[],
	c: SheetContext,
	fonts: PenFonts
): Promise<void> {
	const pages = countPhotoPages(photos.length);
	for (let p = 0; p < pages; p++) {
		const page = doc.addPage(PAPER_SIZE[c.paper]);
		const pen = new SheetPen(page, fonts, MARGIN, 1);
		const record = c.record ? `check ${c.record.id}, revision ${c.record.revision}` : 'not saved';
		pen.text(`Photos: ${c.title || 'beam check'} (page ${p + 2} of ${pages + 1})`, {
			size: 11,
			bold: true
		});
		pen.text(`${record}; ${c.date}. Belongs to the calc sheet on page 1.`, {
			size: 7.5,
			grey: true
		});
		pen.gap(6);
		const top = pen.y;
		const cellW = (pen.right - pen.left) / COLUMNS;
		const cellH = (pen.height - MARGIN - top) / ROWS;
		const onPage = photos.slice(p * PHOTOS_PER_PAGE, (p + 1) * PHOTOS_PER_PAGE);
		for (const [i, photo] of onPage.entries()) {
			const x = pen.left + (i % COLUMNS) * cellW;
			const y = top + Math.floor(i / COLUMNS) * cellH;
			const number = p * PHOTOS_PER_PAGE + i + 1;
			const caption = `Photo ${number}${photo.caption ? `: ${photo.caption}` : ''}`;
			const image = await embed(doc, photo);
			const roomW = cellW - 8;
			const roomH = cellH - CAPTION_ROOM - 6;
			if (image) {
				const fit = Math.min(roomW / image.width, roomH / image.height);
				const [w, h] = [image.width * fit, image.height * fit];
				page.drawImage(image, { x, y: pen.height - y - h, width: w, height: h });
				pen.textAt(caption, x, y + h + 2, { size: 7, width: roomW });
			} else {
				pen.box(x, y, roomW, roomH, 0.5);
				pen.textAt(`${caption} (this image type cannot be printed)`, x + 4, y + 4, {
					size: 7,
					width: roomW - 8
				});
			}
		}
	}
}
