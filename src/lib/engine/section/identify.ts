import type { IDims, LibrarySection, SectionFamily } from './types';
import { listSections } from './library';

/** Measured dimensions of an I or H section, mm; any subset. */
export interface SectionMeasurements {
	h?: number;
	b?: number;
	tf?: number;
	tw?: number;
	/** Restrict the search to one family. */
	family?: SectionFamily;
}

/** Options for identifySection. */
export interface IdentifyOptions {
	/** How many candidates to return (default 5). */
	limit?: number;
	/** Measuring tolerance per dimension, mm (default: tape ±3 on h and b, ±1 on tf and tw). */
	tolerance?: Partial<Record<'h' | 'b' | 'tf' | 'tw', number>>;
}

/** One candidate: the section, how far each measured dimension is off (measured − table), mm. */
export interface IdentifyCandidate {
	section: LibrarySection;
	offsets: Partial<Record<'h' | 'b' | 'tf' | 'tw', number>>;
	/** Root-mean-square of offsets divided by tolerances; 0 is a perfect match. */
	score: number;
	/** Every measured dimension lies within its tolerance. */
	withinTolerance: boolean;
}

const KEYS = ['h', 'b', 'tf', 'tw'] as const;
const DEFAULT_TOLERANCE = { h: 3, b: 3, tf: 1, tw: 1 };

/**
 * Ranks the standard I and H sections closest to measured dimensions. Thickness is weighted
 * more than depth because a tape reads h and b to a few mm while callipers read tf and tw to
 * about 1 mm (common practice).
 * @example identifySection({ h: 304, b: 165, tf: 10 }, { limit: 1 })[0].section.designation
 * // 'UB 305x165x40'
 */
export function identifySection(
	measured: SectionMeasurements,
	options: IdentifyOptions = {}
): IdentifyCandidate[] {
	const tolerance = { ...DEFAULT_TOLERANCE, ...options.tolerance };
	const given = KEYS.filter((k) => typeof measured[k] === 'number' && Number.isFinite(measured[k]));
	if (given.length === 0) return [];
	const candidates = listSections()
		.filter((s) => s.shape === 'I' && (!measured.family || s.family === measured.family))
		.map((section) => {
			const dims = section.dims as IDims;
			const offsets: IdentifyCandidate['offsets'] = {};
			let sum = 0;
			for (const k of given) {
				offsets[k] = (measured[k] as number) - dims[k];
				sum += (offsets[k]! / tolerance[k]) ** 2;
			}
			const score = Math.sqrt(sum / given.length);
			const withinTolerance = given.every((k) => Math.abs(offsets[k]!) <= tolerance[k]);
			return { section, offsets, score, withinTolerance };
		});
	candidates.sort((a, b) => a.score - b.score);
	return candidates.slice(0, options.limit ?? 5);
}
