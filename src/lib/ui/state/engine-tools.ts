/**
 * The section tables and grades the form's pickers use, loaded after the screen is up so it
 * paints quickly (the checks themselves run in a worker).
 */
export interface EngineTools {
	findSection: typeof import('$lib/engine/section').findSection;
	suggestSections: typeof import('$lib/engine/section').suggestSections;
	identifySection: typeof import('$lib/engine/section').identifySection;
	listGrades: typeof import('$lib/engine/material').listGrades;
}

let loading: Promise<EngineTools> | null = null;

/**
 * Loads the section tables and grades once (a separate chunk, precached for offline use like
 * every other file of the app).
 */
export function loadEngineTools(): Promise<EngineTools> {
	loading ??= Promise.all([import('$lib/engine/section'), import('$lib/engine/material')]).then(
		([section, material]) => ({
			findSection: section.findSection,
			suggestSections: section.suggestSections,
			identifySection: section.identifySection,
			listGrades: material.listGrades
		})
	);
	return loading;
}
