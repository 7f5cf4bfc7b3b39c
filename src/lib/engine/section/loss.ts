import type { InputIssue } from '../model/issue';
import type { ChsDims, FlatDims, IDims, RhsDims, SectionDims, SectionShape } from './types';

/** Outcome of applying a section loss: the reduced dimensions, or why they do not exist. */
export type LossOutcome = { ok: true; dims: SectionDims } | { ok: false; issues: InputIssue[] };

/**
 * Least plate or wall left after a loss, mm. Thinner than this the element is taken as eaten:
 * no tape or gauge on site reads it, and a sliver of round-off thickness made NaN properties.
 */
const LEAST_REMAINING = 0.5;

/** The issue for a loss that eats a whole element (or leaves less than {@link LEAST_REMAINING}). */
function makeConsumedIssue(element: string, thickness: number, c: number): InputIssue {
	return {
		path: 'loss',
		code: 'loss-consumes-element',
		severity: 'error',
		message:
			`A loss of ${c} mm on each exposed face would consume the ${element} or leave less than ${LEAST_REMAINING} mm of it ` +
			`(${thickness} mm thick). Measure the remaining thickness and enter the section ` +
			'by its dimensions.'
	};
}

/**
 * Applies a uniform thickness loss c (mm) on every exposed face.
 * Open sections (I, flat) are exposed on both faces of each plate: tf, tw, h and b each lose 2c,
 * and the root radius grows to r + c (an offset of a concave arc). Hollow sections are taken as
 * exposed on the outside only (sealed ends): t, ro lose c and h, b, d lose 2c; ri is unchanged.
 * @example applySectionLoss('CHS', { d: 100, t: 5 }, 1) // { ok: true, dims: { d: 98, t: 4 } }
 */
export function applySectionLoss(
	shape: Exclude<SectionShape, 'known-mp'>,
	dims: SectionDims,
	c: number
): LossOutcome {
	if (c === 0) return { ok: true, dims };
	if (shape === 'I' || shape === 'welded-I') {
		const { h, b, tw, tf, r, slope } = dims as IDims;
		if (tf - 2 * c < LEAST_REMAINING)
			return { ok: false, issues: [makeConsumedIssue('flange', tf, c)] };
		if (tw - 2 * c < LEAST_REMAINING)
			return { ok: false, issues: [makeConsumedIssue('web', tw, c)] };
		const rAfter = shape === 'I' ? r + c : 0;
		return {
			ok: true,
			dims: {
				h: h - 2 * c,
				b: b - 2 * c,
				tw: tw - 2 * c,
				tf: tf - 2 * c,
				r: rAfter,
				// A tapered flange keeps its slope: both faces lose c.
				...(slope === undefined ? {} : { slope })
			}
		};
	}
	if (shape === 'RHS') {
		const { h, b, t, ro, ri } = dims as RhsDims;
		if (t - c < LEAST_REMAINING) return { ok: false, issues: [makeConsumedIssue('wall', t, c)] };
		const roAfter = Math.max(ro - c, 0);
		return { ok: true, dims: { h: h - 2 * c, b: b - 2 * c, t: t - c, ro: roAfter, ri } };
	}
	if (shape === 'CHS') {
		const { d, t } = dims as ChsDims;
		if (t - c < LEAST_REMAINING) return { ok: false, issues: [makeConsumedIssue('wall', t, c)] };
		return { ok: true, dims: { d: d - 2 * c, t: t - c } };
	}
	const { h, b } = dims as FlatDims;
	const thinnest = Math.min(h, b);
	if (thinnest - 2 * c < LEAST_REMAINING)
		return { ok: false, issues: [makeConsumedIssue('bar', thinnest, c)] };
	return { ok: true, dims: { h: h - 2 * c, b: b - 2 * c } };
}
