/**
 * The foot of the calc sheet: the engineer-of-record notice in full and an empty box for the
 * reviewer's name, signature and date. Drawn up from the bottom margin so it is always there.
 */
import { ENGINEER_NOTICE_FULL } from '$lib/engine/notice';
import type { SheetPen } from './sheet-pen';

const BOX_HEIGHT = 40;

const NOTICE = ENGINEER_NOTICE_FULL.join(' ');

/** Where the foot starts above `bottom`: the body must end above it. */
export function footerTop(pen: SheetPen, bottom: number): number {
	const size = 6.5 * pen.scale;
	const noticeHeight = pen.wrap(NOTICE, size, false, pen.right - pen.left).length * size * 1.25;
	return bottom - BOX_HEIGHT - noticeHeight - 16 * pen.scale;
}

/** Draws the foot between `top` (from footerTop) and `bottom`; drawn last, read last. */
export function drawFooter(pen: SheetPen, top: number, bottom: number): void {
	const width = pen.right - pen.left;
	const boxTop = bottom - BOX_HEIGHT;
	const saved = pen.y;
	pen.y = top;
	pen.text('Engineer of record', { size: 7.5, bold: true });
	pen.text(NOTICE, { size: 6.5 });
	const half = width * 0.62;
	pen.box(pen.left, boxTop, half, BOX_HEIGHT, 0.8);
	pen.box(pen.left + half, boxTop, width - half, BOX_HEIGHT, 0.8);
	pen.textAt('Reviewed by (name, signature)', pen.left + 4, boxTop + 2, { size: 7, grey: true });
	pen.textAt('Date', pen.left + half + 4, boxTop + 2, { size: 7, grey: true });
	pen.y = saved;
}
