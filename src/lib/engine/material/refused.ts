import type { InputIssue } from '../model/issue';

/**
 * Materials the app refuses for plastic analysis, with the plain reason shown to the user
 * (engineering reference E.3: no yield plateau or no demonstrated rotation capacity).
 */
export const REFUSED_MATERIALS: Record<string, { name: string; reason: string }> = {
	'cast-iron': {
		name: 'Cast iron',
		reason:
			'Cast iron is brittle: it has no yield plateau, is weak in tension and can hide ' +
			'casting flaws, so it cannot form plastic hinges and a collapse (plastic) check ' +
			'would be unsafe. ' +
			'It must be assessed elastically by permissible stresses by a specialist engineer.'
	},
	'wrought-iron': {
		name: 'Wrought iron',
		reason:
			'Wrought iron is fibrous and laminated, weak across the grain and variable; its rotation ' +
			'capacity at a plastic hinge is not demonstrated, so the plastic check is not allowed. ' +
			'It must be assessed elastically by a specialist engineer.'
	}
};

/**
 * The issue for a refused material, or null when the id names no refused material.
 * @example explainRefusedMaterial('cast-iron')?.code // 'material-not-ductile'
 */
export function explainRefusedMaterial(id: string): InputIssue | null {
	// Own keys only: user text such as "constructor" must not reach Object.prototype.
	if (!Object.hasOwn(REFUSED_MATERIALS, id)) return null;
	const refused = REFUSED_MATERIALS[id];
	return { path: '', code: 'material-not-ductile', message: refused.reason, severity: 'error' };
}
