import type { ChsDims, IDims, ResolvedSection, RhsDims } from './types';
import { US } from '../units';

/** AISC modulus of elasticity, E = 29 000 ksi, in N/mm² (AISC 360-16 Symbols, from memory). */
export const E_AISC = 29_000 * US.ksiToMPa;

export type AiscCategory = 'compact' | 'noncompact' | 'slender';

/** One element of AISC 360-16 Table B4.1b. */
export interface AiscElementClass {
	element: 'flange' | 'web' | 'wall';
	ratio: number;
	limits: { lambdaP: number; lambdaR: number };
	category: AiscCategory;
}

/** Flexural compactness; category null only when it cannot be found (known Mp). */
export interface AiscClassification {
	category: AiscCategory | null;
	governing: 'flange' | 'web' | 'wall' | null;
	elements: AiscElementClass[];
	note?: string;
}

const RANK: Record<AiscCategory, number> = { compact: 0, noncompact: 1, slender: 2 };

/** Builds one element's category from its ratio and λp, λr. */
function classifyElement(
	element: AiscElementClass['element'],
	ratio: number,
	lambdaP: number,
	lambdaR: number
): AiscElementClass {
	const category = ratio <= lambdaP ? 'compact' : ratio <= lambdaR ? 'noncompact' : 'slender';
	return { element, ratio, limits: { lambdaP, lambdaR }, category };
}

/** The elements of a dimensioned section; `root` = √(E/Fy). */
function listElements(section: ResolvedSection, root: number, Fy: number): AiscElementClass[] {
	if (section.shape === 'I' || section.shape === 'welded-I') {
		const { h, b, tw, tf, r } = section.dims as IDims;
		return [
			classifyElement('flange', b / (2 * tf), 0.38 * root, 1.0 * root),
			classifyElement('web', (h - 2 * tf - 2 * r) / tw, 3.76 * root, 5.7 * root)
		];
	}
	if (section.shape === 'RHS') {
		const { h, b, t } = section.dims as RhsDims;
		return [
			classifyElement('flange', (b - 3 * t) / t, 1.12 * root, 1.4 * root),
			classifyElement('web', (h - 3 * t) / t, 2.42 * root, 5.7 * root)
		];
	}
	const { d, t } = section.dims as ChsDims;
	return [classifyElement('wall', d / t, (0.07 * E_AISC) / Fy, (0.31 * E_AISC) / Fy)];
}

/**
 * Compactness for flexure, AISC 360-16 Table B4.1b (E = 29 000 ksi).
 * I: flange bf/2tf (0.38, 1.0 √(E/Fy)); web h/tw with h = d − 2tf − 2r,
 * λp 3.76, λr 5.70 √(E/Fy).
 * HSS: flange b/t with b = B − 3t (1.12, 1.40 √(E/Fy)); web h/t with h = H − 3t (2.42, 5.70).
 * Round HSS: D/t (0.07E/Fy, 0.31E/Fy). Welded I uses the rolled flange limits (kc not modelled).
 * @param Fy yield stress, N/mm²
 * @example classifySectionAISC(w16x40, 344.7).category // 'compact' (bf/2tf 6.93 ≤ 9.15)
 */
export function classifySectionAISC(section: ResolvedSection, Fy: number): AiscClassification {
	if (section.shape === 'known-mp' || section.dims === null) {
		const note =
			'Only Mp is known: compactness cannot be found from the dimensions; ' +
			'the user must confirm it.';
		return { category: null, governing: null, elements: [], note };
	}
	if (section.shape === 'flat') {
		const note = 'Solid section: no element can buckle locally.';
		return { category: 'compact', governing: null, elements: [], note };
	}
	const elements = listElements(section, Math.sqrt(E_AISC / Fy), Fy);
	const worst = elements.reduce((a, b) => (RANK[b.category] > RANK[a.category] ? b : a));
	return { category: worst.category, governing: worst.element, elements };
}
