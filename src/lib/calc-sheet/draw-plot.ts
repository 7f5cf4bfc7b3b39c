/**
 * A small x–y diagram along the beam for the calc sheet: one or more polylines (a null value
 * breaks the line), dashed limit lines over stretches, marked points, a title and the extreme
 * values written with their units. Vector lines only.
 */
import type { SheetPen } from './sheet-pen';

export interface PlotSpec {
	title: string;
	/** Beam length, in the same unit as the x values. */
	length: number;
	x: number[];
	y: (number | null)[];
	/** Dashed lines at a value over a stretch (e.g. the resistance). */
	limits?: { from: number; to: number; value: number }[];
	/** Points to mark with a small square (e.g. hinges, the least value). */
	marks?: { x: number; y: number }[];
	/** Draw positive values below the axis (sagging moment on the tension side). */
	positiveDown?: boolean;
	/** Words under the plot: the extreme values with their units. */
	caption: string;
}

/** Draws the plot in a frame at (left, top) of the given size. */
export function drawPlot(
	pen: SheetPen,
	spec: PlotSpec,
	left: number,
	top: number,
	width: number,
	height: number
): void {
	pen.box(left, top, width, height, 0.4);
	const titleUsed = pen.textAt(spec.title, left + 4, top + 2, {
		size: 7,
		bold: true,
		width: width - 8
	});
	const captionRoom = 18 * pen.scale;
	const inner = { top: top + titleUsed + 6, bottom: top + height - captionRoom - 4 };
	const x0 = left + 8;
	const x1 = left + width - 8;
	const values = [
		...spec.y.filter((v): v is number => v !== null),
		...(spec.limits ?? []).map((l) => l.value),
		0
	];
	const lo = Math.min(...values);
	const hi = Math.max(...values);
	const span = hi - lo || 1;
	const sx = (x: number) => x0 + (x / (spec.length || 1)) * (x1 - x0);
	const sy = (v: number) =>
		spec.positiveDown
			? inner.top + ((v - lo) / span) * (inner.bottom - inner.top)
			: inner.bottom - ((v - lo) / span) * (inner.bottom - inner.top);
	pen.line(sx(0), sy(0), sx(spec.length), sy(0), 0.5);
	for (const l of spec.limits ?? [])
		pen.line(sx(l.from), sy(l.value), sx(l.to), sy(l.value), 0.5, true);
	let run: [number, number][] = [];
	spec.x.forEach((x, i) => {
		const v = spec.y[i];
		if (v === null || v === undefined) {
			pen.polyline(run, 1);
			run = [];
		} else run.push([sx(x), sy(v)]);
	});
	pen.polyline(run, 1);
	for (const m of spec.marks ?? []) pen.box(sx(m.x) - 2, sy(m.y) - 2, 4, 4, 0.8);
	pen.textAt(spec.caption, left + 4, top + height - captionRoom - 1, {
		size: 6.5,
		width: width - 8,
		grey: true
	});
}
