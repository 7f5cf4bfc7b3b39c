import type { CheckOutcome as EngineOutcome } from '$lib/engine';

/** The engine calls the check screen uses, loaded after the screen is up so it paints quickly. */
export interface EngineTools {
	checkCase: (json: unknown, options?: { curve?: boolean }) => EngineOutcome;
	findSection: typeof import('$lib/engine/section').findSection;
	suggestSections: typeof import('$lib/engine/section').suggestSections;
	identifySection: typeof import('$lib/engine/section').identifySection;
	listGrades: typeof import('$lib/engine/material').listGrades;
}

let loading: Promise<EngineTools> | null = null;

/**
 * Loads the engine and the section tables once (a separate chunk, precached for offline use like
 * every other file of the app).
 */
export function loadEngineTools(): Promise<EngineTools> {
	loading ??= Promise.all([import('$lib/engine'), import('$lib/engine/section'), import('$lib/engine/material')]).then(
		([engine, section, material]) => ({
			checkCase: engine.checkCase,
			findSection: section.findSection,
			suggestSections: section.suggestSections,
			identifySection: section.identifySection,
			listGrades: material.listGrades
		})
	);
	return loading;
}
