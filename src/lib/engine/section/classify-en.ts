import type { ChsDims, IDims, ResolvedSection, RhsDims } from './types';

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

/** Builds one element's class from its ratio and the three limits. */
function classifyElement(
	element: EnElementClass['element'],
	ratio: number,
	limits: EnElementClass['limits']
): EnElementClass {
	const cls = ratio <= limits.class1 ? 1 : ratio <= limits.class2 ? 2 : ratio <= limits.class3 ? 3 : 4;
	return { element, ratio, limits, class: cls };
}

/**
 * Cross-section class in pure major-axis bending, EN 1993-1-1:2005 Table 5.2.
 * I: flange outstand c = (b − tw − 2r)/2 (9ε, 10ε, 14ε); web c = h − 2tf − 2r (72ε, 83ε, 124ε).
 * RHS: compression flange c = b − 3t as an internal part in compression (33ε, 38ε, 42ε), webs
 * c = h − 3t in bending (72ε, 83ε, 124ε). CHS: d/t against 50ε², 70ε², 90ε². Solid flats have
 * no slender element (Class 1).
 * @param fy yield strength, N/mm²
 * @example classifySectionEN(ub305x165x40, 275).class // 1 (flange 6.92 ≤ 8.32, web 44.2 ≤ 66.6)
 */
export function classifySectionEN(section: ResolvedSection, fy: number): EnClassification {
	const epsilon = Math.sqrt(235 / fy);
	const e = epsilon;
	const elements: EnElementClass[] = [];
	if (section.shape === 'known-mp' || section.dims === null) {
		return { class: null, governing: null, elements, epsilon, note: 'Only Mp is known: the class cannot be found from the dimensions; the user must confirm Class 1.' };
	}
	if (section.shape === 'I' || section.shape === 'welded-I') {
		const { h, b, tw, tf, r } = section.dims as IDims;
		elements.push(classifyElement('flange', (b - tw - 2 * r) / 2 / tf, { class1: 9 * e, class2: 10 * e, class3: 14 * e }));
		elements.push(classifyElement('web', (h - 2 * tf - 2 * r) / tw, { class1: 72 * e, class2: 83 * e, class3: 124 * e }));
	} else if (section.shape === 'RHS') {
		const { h, b, t } = section.dims as RhsDims;
		elements.push(classifyElement('flange', (b - 3 * t) / t, { class1: 33 * e, class2: 38 * e, class3: 42 * e }));
		elements.push(classifyElement('web', (h - 3 * t) / t, { class1: 72 * e, class2: 83 * e, class3: 124 * e }));
	} else if (section.shape === 'CHS') {
		const { d, t } = section.dims as ChsDims;
		elements.push(classifyElement('wall', d / t, { class1: 50 * e * e, class2: 70 * e * e, class3: 90 * e * e }));
	} else {
		return { class: 1, governing: null, elements, epsilon, note: 'Solid section: no element can buckle locally.' };
	}
	// The worst element governs; on a tie the first listed (flange) is named.
	const worst = elements.reduce((a, b) => (b.class > a.class ? b : a));
	return { class: worst.class, governing: worst.element, elements, epsilon };
}
