import type { InputIssue } from '../model/issue';
import type { SectionDims, SectionShape } from './types';

/** Builds one error issue. */
function makeError(path: string, code: string, message: string): InputIssue {
	return { path, code, message, severity: 'error' };
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
		const mayBeZero = key === 'r' || key === 'ri' || key === 'ro';
		if (!Number.isFinite(value) || value < 0 || (!mayBeZero && value === 0)) {
			issues.push(makeError(key, 'dimension-not-positive', `${key} must be a positive number of mm.`));
		}
	}
	if (issues.length > 0) return issues;
	const d = dims as unknown as Record<string, number>;
	if (shape === 'I' || shape === 'welded-I') {
		const r = shape === 'I' ? d.r : 0;
		if (2 * d.tf >= d.h) issues.push(makeError('tf', 'flange-too-thick', 'Two flanges (2·tf) must be less than the depth h.'));
		else if (d.h - 2 * d.tf - 2 * r <= 0) issues.push(makeError('r', 'root-radius-too-large', 'The root radii leave no straight web: h − 2tf − 2r must be positive.'));
		if (d.tw + 2 * r >= d.b) issues.push(makeError('tw', 'web-too-thick', 'The web and root radii (tw + 2r) must be narrower than the flange width b.'));
	} else if (shape === 'RHS') {
		if (2 * d.t >= Math.min(d.h, d.b)) issues.push(makeError('t', 'wall-too-thick', 'Two walls (2t) must be less than both h and b.'));
		else if (2 * d.ro > Math.min(d.h, d.b)) issues.push(makeError('t', 'corner-too-large', 'The corner radii do not fit in the section.'));
	} else if (shape === 'CHS') {
		if (2 * d.t >= d.d) issues.push(makeError('t', 'wall-too-thick', 'Two walls (2t) must be less than the diameter d.'));
	}
	return issues;
}
