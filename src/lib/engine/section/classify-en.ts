import type { ChsDims, IDims, ResolvedSection, RhsDims } from './types';
import { computeEpsilon } from '../material/epsilon';

/** One compression element and its class (EN 1993-1-1 Table 5.2). */
export interface EnElementClass {
	element: 'flange' | 'web' | 'wall';
	/** c/t (or d/t for CHS). */
	ratio: number;
	limits: { class1: number; class2: number; class3: number };
	class: 1 | 2 | 3 | 4;
}

/** Classification in major-axis bending; class null only when it cannot be found (known Mp). */
export interface EnClassification {
	class: 1 | 2 | 3 | 4 | null;
	governing: 'flange' | 'web' | 'wall' | null;
	elements: EnElementClass[];
	/** ε = √(235/fy). */
	epsilon: number;
	note?: string;
}

type Limits = EnElementClass['limits'];

/** Builds one element's class from its ratio and the three limits. */
function classifyElement(element: EnElementClass['element'], ratio: number, limits: Limits) {
	const { class1, class2, class3 } = limits;
	const cls = ratio <= class1 ? 1 : ratio <= class2 ? 2 : ratio <= class3 ? 3 : 4;
	return { element, ratio, limits, class: cls } satisfies EnElementClass;
}

/** Table 5.2 limits as multiples of ε (or ε² for CHS). */
const scaleLimits = (f: number, c1: number, c2: number, c3: number): Limits => ({
	class1: c1 * f,
	class2: c2 * f,
	class3: c3 * f
});

/** The compression elements of a dimensioned section, in the order flange, web (or wall). */
function listElements(section: ResolvedSection, e: number): EnElementClass[] {
	if (section.shape === 'I' || section.shape === 'welded-I') {
		const { h, b, tw, tf, r } = section.dims as IDims;
		return [
			classifyElement('flange', (b - tw - 2 * r) / 2 / tf, scaleLimits(e, 9, 10, 14)),
			classifyElement('web', (h - 2 * tf - 2 * r) / tw, scaleLimits(e, 72, 83, 124))
		];
	}
	if (section.shape === 'RHS') {
		const { h, b, t } = section.dims as RhsDims;
		return [
			// The compression flange is an internal part in compression.
			classifyElement('flange', (b - 3 * t) / t, scaleLimits(e, 33, 38, 42)),
			classifyElement('web', (h - 3 * t) / t, scaleLimits(e, 72, 83, 124))
		];
	}
	const { d, t } = section.dims as ChsDims;
	return [classifyElement('wall', d / t, scaleLimits(e * e, 50, 70, 90))];
}

/**
 * Cross-section class in pure major-axis bending, EN 1993-1-1:2005 Table 5.2.
 * I: flange outstand c = (b − tw − 2r)/2 (9ε, 10ε, 14ε); web c = h − 2tf − 2r
 * (72ε, 83ε, 124ε). RHS: compression flange c = b − 3t as an internal part in compression
 * (33ε, 38ε, 42ε), webs c = h − 3t in bending (72ε, 83ε, 124ε). CHS: d/t against 50ε², 70ε²,
 * 90ε². Solid flats have no slender element (Class 1). Welded I uses c = (b − tw)/2, ignoring
 * the weld throat.
 * @param fy yield strength, N/mm²
 * @example classifySectionEN(ub305x165x40, 275).class
 * // 1 (flange 6.92 ≤ 8.32, web 44.2 ≤ 66.6)
 */
export function classifySectionEN(section: ResolvedSection, fy: number): EnClassification {
	const epsilon = computeEpsilon(fy);
	if (section.shape === 'known-mp' || section.dims === null) {
		const note =
			'Only Mp is known: the class cannot be found from the dimensions; ' +
			'the user must confirm Class 1.';
		return { class: null, governing: null, elements: [], epsilon, note };
	}
	if (section.shape === 'flat') {
		const note = 'Solid section: no element can buckle locally.';
		return { class: 1, governing: null, elements: [], epsilon, note };
	}
	const elements = listElements(section, epsilon);
	// The worst element governs; on a tie the first listed (flange) is named.
	const worst = elements.reduce((a, b) => (b.class > a.class ? b : a));
	return { class: worst.class, governing: worst.element, elements, epsilon };
}
