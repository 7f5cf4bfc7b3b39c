/**
 * A cursor over one PDF page, top-down: text that wraps, rules, boxes and polylines. Positions
 * are in points from the top-left corner, turned into PDF coordinates (from the bottom) here only.
 */
import { rgb, type PDFFont, type PDFPage } from 'pdf-lib';
import { toPdfText } from './pdf-text';

export const INK = rgb(0.1, 0.1, 0.1);
export const GREY = rgb(0.45, 0.45, 0.45);

export interface PenFonts {
	regular: PDFFont;
	bold: PDFFont;
}

export interface TextStyle {
	size?: number;
	bold?: boolean;
	/** Left edge, points from the page's left; the margin by default. */
	x?: number;
	/** Room for the text, points; to the right margin by default. */
	width?: number;
	grey?: boolean;
}

export class SheetPen {
	/** Distance from the top of the page to the next line, points. */
	y: number;
	readonly left: number;
	readonly right: number;
	readonly height: number;
	readonly page: PDFPage;
	readonly fonts: PenFonts;
	/** Multiplies every text size, so a long sheet can be drawn again smaller. */
	readonly scale: number;

	constructor(page: PDFPage, fonts: PenFonts, margin: number, scale: number) {
		this.page = page;
		this.fonts = fonts;
		this.scale = scale;
		this.left = margin;
		this.right = page.getWidth() - margin;
		this.height = page.getHeight();
		this.y = margin;
	}

	/** Breaks text into lines that fit `width` at `size`. */
	wrap(text: string, size: number, bold: boolean, width: number): string[] {
		const font = bold ? this.fonts.bold : this.fonts.regular;
		const lines: string[] = [];
		let line = '';
		// Split on plain spaces only: a no-break space keeps a number with its unit.
		for (const word of text.split(/[ \n]/).map(toPdfText)) {
			const next = line ? `${line} ${word}` : word;
			if (line && font.widthOfTextAtSize(next, size) > width) {
				lines.push(line);
				line = word;
			} else line = next;
		}
		if (line) lines.push(line);
		return lines;
	}

	/** Writes wrapped text at the cursor and moves the cursor below it; returns its height. */
	text(text: string, style: TextStyle = {}): number {
		const size = (style.size ?? 8) * this.scale;
		const x = style.x ?? this.left;
		const width = style.width ?? this.right - x;
		const lines = this.wrap(text, size, style.bold ?? false, width);
		const font = style.bold ? this.fonts.bold : this.fonts.regular;
		const step = size * 1.25;
		lines.forEach((line, i) => {
			const baseline = this.y + size + i * step;
			this.page.drawText(line, {
				x,
				y: this.height - baseline,
				size,
				font,
				color: style.grey ? GREY : INK
			});
		});
		const used = lines.length * step;
		this.y += used;
		return used;
	}

	/** Writes text without moving the cursor (for columns and labels). */
	textAt(text: string, x: number, top: number, style: TextStyle = {}): number {
		const saved = this.y;
		this.y = top;
		const used = this.text(text, { ...style, x });
		this.y = saved;
		return used;
	}

	gap(points: number): void {
		this.y += points * this.scale;
	}

	/** A straight line between two top-down points. */
	line(x1: number, y1: number, x2: number, y2: number, thickness = 0.6, dashed = false): void {
		this.page.drawLine({
			start: { x: x1, y: this.height - y1 },
			end: { x: x2, y: this.height - y2 },
			thickness,
			color: INK,
			dashArray: dashed ? [3, 2] : undefined
		});
	}

	/** An open polyline through top-down points, drawn as one vector path. */
	polyline(points: [number, number][], thickness = 0.8, fill = false): void {
		if (points.length < 2) return;
		const path = points
			.map(([x, y], i) => `${i ? 'L' : 'M'}${x.toFixed(2)} ${y.toFixed(2)}`)
			.join(' ');
		// drawSvgPath measures y downward from the origin given: the page's top-left corner.
		this.page.drawSvgPath(fill ? `${path} Z` : path, {
			x: 0,
			y: this.height,
			borderColor: INK,
			borderWidth: thickness,
			color: fill ? rgb(0.85, 0.85, 0.85) : undefined
		});
	}

	/** A rectangle outline, top-down. */
	box(x: number, top: number, width: number, height: number, thickness = 0.8): void {
		this.page.drawRectangle({
			x,
			y: this.height - top - height,
			width,
			height,
			borderColor: INK,
			borderWidth: thickness
		});
	}

	/** A rule across the page at the cursor. */
	rule(): void {
		this.line(this.left, this.y, this.right, this.y, 0.4);
		this.gap(4);
	}
}
