/**
 * The two diagrams of the calc sheet, side by side: the moment diagram of the analysis that
 * governs, and the governing capacity curve. Where there is none, a sentence says why.
 */
import { formatQuantity, toDisplay, type UnitSystem } from '$lib/ui/format';
import { drawPlot, type PlotSpec } from './draw-plot';
import type { SheetPen } from './sheet-pen';
import type { SheetReport } from './sheet-report';
import { routeSentence } from './sheet-words';

/** Height of the diagram row, points (before the pen's scale). */
export const DIAGRAM_HEIGHT = 118;

/** The governing moment diagram as a plot, or null when the report has none to draw. */
export function momentPlot(r: SheetReport, units: UnitSystem): PlotSpec | null {
	const length = toDisplay(
		r.case.beam.spans.reduce((s, L) => s + L, 0),
		'length',
		units
	);
	const m = (v: number) => toDisplay(v, 'moment', units);
	const at = (v: number) => toDisplay(v, 'length', units);
	const extremes = (M: number[]) => {
		const sag = Math.max(0, ...M);
		const hog = Math.min(0, ...M);
		const parts = [`largest sagging ${formatQuantity(sag, 'moment', units)}`];
		if (hog < 0) parts.push(`hogging ${formatQuantity(-hog, 'moment', units)}`);
		return parts.join(', ');
	};
	const c = r.collapse;
	if (c?.decides && c.diagram) {
		const hogs = c.diagram.M.some((v) => v < -1e-9);
		return {
			title: 'Bending moment at plastic collapse (this analysis governs bending)',
			length,
			x: c.diagram.x.map(at),
			y: c.diagram.M.map(m),
			limits: c.resistance.flatMap((s) => [
				{ from: at(s.from), to: at(s.to), value: m(s.sagging) },
				...(hogs ? [{ from: at(s.from), to: at(s.to), value: -m(s.hogging) }] : [])
			]),
			marks: c.hinges.map((h) => ({ x: at(h.x), y: m(h.moment) })),
			positiveDown: true,
			caption: `${extremes(c.diagram.M)}; dashed: hinge resistance; squares: hinges. Sagging below the line.`
		};
	}
	const d = r.designMoments;
	if (d && d.x.length > 1) {
		const hogs = d.M.some((v) => v < -1e-9);
		return {
			title: `Design bending moment, elastic analysis (governs): ${d.arrangement}`,
			length,
			x: d.x.map(at),
			y: d.M.map(m),
			limits: d.limits.flatMap((l) => [
				{ from: at(l.from), to: at(l.to), value: m(l.value) },
				...(hogs ? [{ from: at(l.from), to: at(l.to), value: -m(l.value) }] : [])
			]),
			positiveDown: true,
			caption: `${extremes(d.M)}; dashed: ${[...new Set(d.limits.map((l) => l.label))].join(', ')}. Sagging below the line.`
		};
	}
	return null;
}

/** The governing capacity curve as a plot, or null when the report has none. */
export function curvePlot(r: SheetReport, units: UnitSystem): PlotSpec | null {
	const k = r.capacityCurve;
	if (!k || k.points.length < 2) return null;
	const length = toDisplay(
		r.case.beam.spans.reduce((s, L) => s + L, 0),
		'length',
		units
	);
	const least = k.min
		? `least ${formatQuantity(k.min.p, 'force', units)} at ${formatQuantity(k.min.x, 'length', units)}` +
			(k.min.governing ? ` (${k.min.governing.label})` : '')
		: 'nothing limits a single point load';
	return {
		title:
			'Governing capacity curve: largest single proposed point load along the beam (partial result)',
		length,
		x: k.points.map((p) => toDisplay(p.x, 'length', units)),
		y: k.points.map((p) => (p.p === null ? null : toDisplay(p.p, 'force', units))),
		marks: k.min
			? [{ x: toDisplay(k.min.x, 'length', units), y: toDisplay(k.min.p, 'force', units) }]
			: [],
		caption: `${least}; with the existing loads and no other proposed load.`
	};
}

/** Draws the diagram row at the cursor; a sentence stands in for a diagram there is none of. */
export function drawDiagrams(pen: SheetPen, r: SheetReport, units: UnitSystem): void {
	const top = pen.y;
	const height = DIAGRAM_HEIGHT * pen.scale;
	const gap = 10;
	const half = (pen.right - pen.left - gap) / 2;
	const plots: [PlotSpec | null, string][] = [
		[momentPlot(r, units), routeSentence(r)],
		[
			curvePlot(r, units),
			'No capacity curve: outside scope, or no proposed load to move along the beam.'
		]
	];
	plots.forEach(([plot, instead], i) => {
		const left = pen.left + i * (half + gap);
		if (plot) drawPlot(pen, plot, left, top, half, height);
		else {
			pen.box(left, top, half, height, 0.4);
			pen.textAt(instead, left + 6, top + 6, { size: 7.5, width: half - 12 });
		}
	});
	pen.y = top + height;
	pen.gap(4);
	// Without a moment diagram its box already says which analysis governs.
	if (plots[0][0]) pen.text(routeSentence(r), { size: 7.5 });
}
