/**
 * Builds the one-page calc sheet (PDF) of a check on the device, from the report the screen
 * shows: the answer first, then the record, inputs, drawings, checks, notes, the notice and a
 * box for the reviewer. Loaded only when asked for (it carries the PDF library).
 */
import { PDFDocument, StandardFonts } from 'pdf-lib';
import { drawBeam } from './draw-beam';
import { PAPER_SIZE, type SheetContext } from './sheet-context';
import {
	drawAnswer,
	drawChecks,
	drawHeading,
	drawInputs,
	drawNotes,
	drawRecord
} from './sheet-blocks';
import { drawDiagrams } from './sheet-diagrams';
import { drawFooter, footerTop } from './sheet-footer';
import { SheetPen } from './sheet-pen';
import { addPhotoPages, type SheetPhoto } from './sheet-photos';
import type { SheetReport } from './sheet-report';
import { toPdfText } from './pdf-text';

const MARGIN = 34;
/** Text and drawing sizes tried in turn until everything fits on the one page. */
const SCALES = [1, 0.92, 0.84, 0.76, 0.68];

/**
 * The calc sheet as PDF bytes: one page, then the check's photos on pages of their own when
 * any are given.
 * @example
 * const bytes = await buildCalcSheet(report, { ...context, paper: 'a4' });
 * new TextDecoder().decode(bytes.slice(0, 4)) // '%PDF'
 */
export async function buildCalcSheet(
	r: SheetReport,
	context: SheetContext,
	photos: SheetPhoto[] = []
): Promise<Uint8Array> {
	const c = { ...context, photoCount: photos.length };
	for (const [i, scale] of SCALES.entries()) {
		const last = i === SCALES.length - 1;
		const doc = await PDFDocument.create();
		const page = doc.addPage(PAPER_SIZE[c.paper]);
		const fonts = {
			regular: await doc.embedFont(StandardFonts.Helvetica),
			bold: await doc.embedFont(StandardFonts.HelveticaBold)
		};
		const pen = new SheetPen(page, fonts, MARGIN, scale);
		const leftOut = drawSheet(pen, r, c, last);
		if (leftOut === 0 || last) {
			if (photos.length > 0) await addPhotoPages(doc, photos, c, fonts);
			doc.setTitle(toPdfText(`Calc sheet: ${c.title || 'beam check'}`));
			doc.setCreator('Hingepoint');
			doc.setProducer('Hingepoint');
			if (c.preparedBy) doc.setAuthor(toPdfText(c.preparedBy));
			return doc.save({ useObjectStreams: false });
		}
	}
	throw new Error('invariant: the last scale always returns');
}

/** Draws the page; returns how many notes did not fit (0 when all did). */
function drawSheet(pen: SheetPen, r: SheetReport, c: SheetContext, last: boolean): number {
	const bottom = pen.height - MARGIN;
	const end = footerTop(pen, bottom);
	pen.text(`Calc sheet: ${c.title || 'beam check'}`, { size: 13, bold: true });
	pen.text('Hingepoint screening check of an existing steel beam for a temporary load', {
		size: 7.5,
		grey: true
	});
	pen.gap(4);
	drawAnswer(pen, r, c.units);
	drawRecord(pen, r, c);
	drawInputs(pen, r, c.units);
	drawHeading(pen, 'Beam and loads (L1, L2 … as listed; * proposed temporary load)');
	drawBeam(pen, r, c.units);
	drawDiagrams(pen, r, c.units);
	drawChecks(pen, r);
	// The first notice is the engineer-of-record notice, printed in full at the foot; the
	// restraint assumption is already among the inputs.
	const assumptions = r.assumptions.filter((a) => !a.startsWith('Restraint:'));
	const notes = [...r.notices.slice(1), ...assumptions];
	const room = last ? end - 4 : Number.POSITIVE_INFINITY;
	const leftOut = drawNotes(pen, 'Notices and assumptions', notes, room);
	drawFooter(pen, end, bottom);
	return pen.y > end - 4 ? Math.max(1, leftOut) : leftOut;
}
