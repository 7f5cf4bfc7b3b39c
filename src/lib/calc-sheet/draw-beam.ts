/**
 * The beam as drawn on the calc sheet, from the case itself: the beam line, supports, span
 * lengths, lateral restraints and the loads (numbered as in the inputs), in vector lines.
 */
import { formatQuantity, type UnitSystem } from '$lib/ui/format';
import type { SheetPen } from './sheet-pen';
import type { SheetReport } from './sheet-report';

/** Height the drawing takes, points (before the pen's scale). */
export const BEAM_DRAWING_HEIGHT = 78;

/** Draws the beam across the page at the cursor and moves the cursor below it. */
export function drawBeam(pen: SheetPen, r: SheetReport, units: UnitSystem): void {
	const beam = r.case.beam;
	const total = beam.spans.reduce((s, L) => s + L, 0) || 1;
	const x0 = pen.left + 14;
	const width = pen.right - pen.left - 28;
	const sx = (x: number) => x0 + (x / total) * width;
	const top = pen.y;
	const axis = top + 34 * pen.scale;
	const nodes = beam.spans.reduce<number[]>((acc, L) => [...acc, acc[acc.length - 1] + L], [0]);

	drawLoads(pen, r, sx, axis);
	pen.line(sx(0), axis, sx(total), axis, 2);
	nodes.forEach((x, i) => drawSupport(pen, beam.supports[i] ?? 'free', sx(x), axis));
	const lateral = beam.restraint?.lateral;
	if (Array.isArray(lateral)) {
		// A small cross on the beam where the compression flange is held sideways.
		for (const x of lateral) {
			pen.line(sx(x) - 3, axis - 3, sx(x) + 3, axis + 3, 0.8);
			pen.line(sx(x) - 3, axis + 3, sx(x) + 3, axis - 3, 0.8);
		}
	}
	// Span lengths on a dimension line under the supports.
	const dim = axis + 24 * pen.scale;
	pen.line(sx(0), dim, sx(total), dim, 0.4);
	nodes.forEach((x) => pen.line(sx(x), dim - 3, sx(x), dim + 3, 0.4));
	beam.spans.forEach((L, i) => {
		const label = formatQuantity(L, 'length', units);
		pen.textAt(label, (sx(nodes[i]) + sx(nodes[i + 1])) / 2 - 14, dim + 1, { size: 7 });
	});
	pen.y = top + BEAM_DRAWING_HEIGHT * pen.scale;
}

function drawSupport(pen: SheetPen, kind: string, x: number, axis: number): void {
	if (kind === 'pin') {
		pen.polyline(
			[
				[x, axis + 1],
				[x - 6, axis + 11],
				[x + 6, axis + 11],
				[x, axis + 1]
			],
			0.8
		);
	} else if (kind === 'fixed') {
		pen.line(x, axis - 10, x, axis + 10, 1.6);
		// Hatching on the wall side.
		const side = x < pen.page.getWidth() / 2 ? -1 : 1;
		for (let k = -8; k <= 8; k += 4) pen.line(x, axis + k, x + side * 5, axis + k + 4, 0.5);
	}
	// A free end has no mark.
}

function drawLoads(pen: SheetPen, r: SheetReport, sx: (x: number) => number, axis: number): void {
	const arrow = (x: number, from: number) => {
		pen.line(x, from, x, axis - 2, 0.7);
		pen.polyline(
			[
				[x - 2.5, axis - 6],
				[x, axis - 2],
				[x + 2.5, axis - 6]
			],
			0.7
		);
	};
	r.case.loads.forEach((l, i) => {
		const name = `L${i + 1}${l.action === 'temporary' ? '*' : ''}`;
		if (l.kind === 'point') {
			const from = axis - 26 * pen.scale;
			arrow(sx(l.x), from);
			pen.textAt(name, sx(l.x) + 2, from - 8, { size: 6.5, bold: l.action === 'temporary' });
			return;
		}
		// Line loads: a band above the beam with arrows at its ends and every so often.
		const band = axis - (10 + 4 * (i % 3)) * pen.scale;
		const [a, b] = [sx(l.from), sx(l.to)];
		pen.line(a, band - 4, b, band - 4, 0.5);
		const count = Math.max(2, Math.round((b - a) / 24));
		for (let k = 0; k <= count; k++) arrow(a + ((b - a) * k) / count, band - 4);
		pen.textAt(name, a + 2, band - 13, { size: 6.5, bold: l.action === 'temporary' });
	});
}
