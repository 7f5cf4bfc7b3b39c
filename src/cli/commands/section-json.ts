import type { LibrarySection, ResolvedSection } from '../../lib/engine/section/index';

/** The machine-readable form of one section: designation, family, standard, shape, dims, props. */
export function toSectionJson(section: LibrarySection | ResolvedSection): Record<string, unknown> {
	const { designation, family, standard, shape, dims, props } = section;
	const json: Record<string, unknown> = { designation, family, standard, shape, dims, props };
	if ('loss' in section && section.loss > 0) json.loss = section.loss;
	return json;
}

/** Rounds to 4 significant figures for the human-readable tables. */
export function formatSig(value: number): string {
	return Number(value.toPrecision(4)).toString();
}
