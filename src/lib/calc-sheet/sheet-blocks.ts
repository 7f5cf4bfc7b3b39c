/**
 * The text blocks of the calc sheet, top to bottom: the answer (first, boxed), the record, the
 * inputs, the checks table and the notes. Each draws at the pen's cursor and moves it on.
 */
import type { UnitSystem } from '$lib/ui/format';
import type { SheetContext } from './sheet-context';
import type { SheetPen } from './sheet-pen';
import type { SheetReport } from './sheet-report';
import { answerLines, checkRows, inputLines, recordLines } from './sheet-words';

/** The verdict and the largest proposed loads, boxed: the first thing read. */
export function drawAnswer(pen: SheetPen, r: SheetReport, units: UnitSystem): void {
	const { head, lines } = answerLines(r, units);
	const top = pen.y;
	pen.gap(5);
	const x = pen.left + 8;
	const width = pen.right - x - 8;
	pen.text(head, { size: 15, bold: true, x, width });
	lines.forEach((line, i) => pen.text(line, { size: i === 0 ? 10 : 8.5, bold: i === 0, x, width }));
	pen.gap(5);
	pen.box(pen.left, top, pen.right - pen.left, pen.y - top, 1.6);
	pen.gap(6);
}

/** Label and value pairs in two columns. */
export function drawPairs(
	pen: SheetPen,
	pairs: [string, string][],
	columns: 1 | 2,
	size = 7.5
): void {
	const colWidth = (pen.right - pen.left) / columns;
	const labelWidth = 62 * pen.scale;
	for (let i = 0; i < pairs.length; i += columns) {
		const top = pen.y;
		let used = 0;
		for (let c = 0; c < columns && i + c < pairs.length; c++) {
			const [label, value] = pairs[i + c];
			const x = pen.left + c * colWidth;
			pen.textAt(label, x, top, { size, bold: true, width: labelWidth - 4 });
			const h = pen.textAt(value, x + labelWidth, top, { size, width: colWidth - labelWidth - 6 });
			used = Math.max(used, h);
		}
		pen.y = top + used + 1;
	}
}

export function drawHeading(pen: SheetPen, text: string): void {
	pen.gap(3);
	pen.text(text, { size: 9, bold: true });
	pen.gap(1);
}

export function drawRecord(pen: SheetPen, r: SheetReport, c: SheetContext): void {
	drawPairs(pen, recordLines(r, c), 2);
	pen.gap(2);
}

export function drawInputs(pen: SheetPen, r: SheetReport, units: UnitSystem): void {
	drawHeading(pen, 'Inputs');
	drawPairs(pen, inputLines(r, units), 1);
}

/** Every check with its clause, utilisation and state; none outside scope. */
export function drawChecks(pen: SheetPen, r: SheetReport): void {
	drawHeading(pen, 'Checks (utilisation at the loads entered)');
	if (r.checks.length === 0) {
		pen.text('No checks are reported: the beam is outside the scope of the method.', { size: 7.5 });
		return;
	}
	const w = pen.right - pen.left;
	const cols = [0, 0.46, 0.79, 0.88].map((f) => pen.left + f * w);
	const widths = [0.45, 0.32, 0.08, 0.12].map((f) => f * w);
	const row = (cells: string[], bold: boolean) => {
		const top = pen.y;
		const used = Math.max(
			...cells.map((cell, i) => pen.textAt(cell, cols[i], top, { size: 7, bold, width: widths[i] }))
		);
		pen.y = top + used + 0.5;
	};
	row(['Check', 'Clause', 'Utilisation', 'Result'], true);
	pen.line(pen.left, pen.y, pen.right, pen.y, 0.3);
	for (const cells of checkRows(r)) row(cells, false);
}

/**
 * Notices and assumptions as a bulleted list, as many as fit above `limit`; returns how many
 * were left out (0 when all fit).
 */
export function drawNotes(pen: SheetPen, title: string, notes: string[], limit: number): number {
	if (notes.length === 0) return 0;
	drawHeading(pen, title);
	for (let i = 0; i < notes.length; i++) {
		const lines = pen.wrap(notes[i], 6.5 * pen.scale, false, pen.right - pen.left - 8).length;
		if (pen.y + lines * 6.5 * pen.scale * 1.25 + 9 * pen.scale > limit) {
			pen.text(`… ${notes.length - i} more in the full report.`, { size: 6.5, grey: true });
			return notes.length - i;
		}
		pen.textAt('•', pen.left, pen.y, { size: 6.5 });
		pen.text(notes[i], { size: 6.5, x: pen.left + 8 });
	}
	return 0;
}
