import type { InputIssue } from '../model/issue';
import type { SectionDims, SectionShape } from './types';

/** Builds one error issue. */
function makeError(path: string, code: string, message: string): InputIssue {
	return { path, code, message, severity: 'error' };
}

/** Root and corner radii may be zero; every other dimension must be positive. */
const MAY_BE_ZERO = new Set(['r', 'ro', 'ri']);

/** Checks that an I or welded I fits together: flanges inside the depth, web inside the width. */
function checkIFit(d: Record<string, number>, r: number): InputIssue[] {
	const issues: InputIssue[] = [];
	if (2 * d.tf >= d.h) {
		const message = 'Two flanges (2·tf) must be less than the depth h.';
		issues.push(makeError('tf', 'flange-too-thick', message));
	} else if (d.h - 2 * d.tf - 2 * r <= 0) {
		const message = 'The root radii leave no straight web: h − 2tf − 2r must be positive.';
		issues.push(makeError('r', 'root-radius-too-large', message));
	}
	if (d.tw + 2 * r >= d.b) {
		const message = 'The web and root radii (tw + 2r) must be narrower than the flange width b.';
		issues.push(makeError('tw', 'web-too-thick', message));
	}
	// A tapered (S-shape) flange must keep some thickness at its toes: tf − slope·b/4 > 0.
	if (d.slope !== undefined && d.tf - (d.slope * d.b) / 4 <= 0) {
		const message = 'The tapered flange runs out before its toes: tf must exceed slope·b/4.';
		issues.push(makeError('tf', 'flange-toe-too-thin', message));
	}
	return issues;
}

/**
 * Checks that dimensions (mm) describe a real cross-section of the given shape.
 * Paths are relative to the section spec (`tf`, `t`, …).
 * @example validateSectionDims('CHS', { d: 100, t: 60 })[0].code // 'wall-too-thick'
 */
export function validateSectionDims(
	shape: Exclude<SectionShape, 'known-mp'>,
	dims: SectionDims
): InputIssue[] {
	const issues: InputIssue[] = [];
	for (const [key, value] of Object.entries(dims)) {
		if (!Number.isFinite(value) || value < 0 || (!MAY_BE_ZERO.has(key) && value === 0)) {
			const message = `${key} must be a positive number of mm.`;
			issues.push(makeError(key, 'dimension-not-positive', message));
		}
	}
	if (issues.length > 0) return issues;
	const d = dims as unknown as Record<string, number>;
	if (shape === 'I') return checkIFit(d, d.r);
	if (shape === 'welded-I') return checkIFit(d, 0);
	if (shape === 'RHS') {
		if (2 * d.t >= Math.min(d.h, d.b)) {
			return [makeError('t', 'wall-too-thick', 'Two walls (2t) must be less than both h and b.')];
		}
		if (2 * d.ro > Math.min(d.h, d.b)) {
			return [makeError('t', 'corner-too-large', 'The corner radii do not fit in the section.')];
		}
	}
	if (shape === 'CHS' && 2 * d.t >= d.d) {
		return [makeError('t', 'wall-too-thick', 'Two walls (2t) must be less than the diameter d.')];
	}
	return [];
}
