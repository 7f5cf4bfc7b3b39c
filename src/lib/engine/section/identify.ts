import type { ChsDims, IDims, LibrarySection, RhsDims, SectionFamily } from './types';
import type { SectionRecord } from './make-section';
import { getLibrarySection, listSectionRecords } from './library';

/**
 * Measured dimensions, mm; any subset. An I or H section by h, b, tf, tw; a rectangular or square
 * hollow section by h, b and its wall t; a circular one by its outside diameter d and wall t.
 */
export interface SectionMeasurements {
	h?: number;
	b?: number;
	tf?: number;
	tw?: number;
	/** Outside diameter of a circular hollow section. */
	d?: number;
	/** Wall thickness of a hollow section. */
	t?: number;
	/** Restrict the search to one family. */
	family?: SectionFamily;
}

type Key = 'h' | 'b' | 'tf' | 'tw' | 'd' | 't';

/** Options for identifySection. */
export interface IdentifyOptions {
	/** How many candidates to return (default 5). */
	limit?: number;
	/**
	 * Measuring tolerance per dimension, mm (default: tape ±3 on h, b and d, callipers ±1 on tf
	 * and tw, a wall gauge ±0.5 on t).
	 */
	tolerance?: Partial<Record<Key, number>>;
}

/** One candidate: the section, how far each measured dimension is off (measured − table), mm. */
export interface IdentifyCandidate {
	section: LibrarySection;
	offsets: Partial<Record<Key, number>>;
	/** Root-mean-square of offsets divided by tolerances; 0 is a perfect match. */
	score: number;
	/** Every measured dimension lies within its tolerance. */
	withinTolerance: boolean;
}

const DEFAULT_TOLERANCE: Record<Key, number> = { h: 3, b: 3, tf: 1, tw: 1, d: 3, t: 0.5 };

/** What a measurement set describes, and the table value of each key for one section. */
type Reader = {
	shape: LibrarySection['shape'];
	keys: readonly Key[];
	/** Table values; a hollow wall reads as the nominal wall, which is what a gauge finds. */
	read: (s: SectionRecord) => Partial<Record<Key, number>>;
};

const READERS: Record<'I' | 'RHS' | 'CHS', Reader> = {
	I: { shape: 'I', keys: ['h', 'b', 'tf', 'tw'], read: (s) => s.dims as IDims },
	RHS: {
		shape: 'RHS',
		keys: ['h', 'b', 't'],
		read: (s) => ({ ...(s.dims as RhsDims), t: s.nominalWall ?? (s.dims as RhsDims).t })
	},
	CHS: {
		shape: 'CHS',
		keys: ['d', 't'],
		read: (s) => ({ ...(s.dims as ChsDims), t: s.nominalWall ?? (s.dims as ChsDims).t })
	}
};

/** Which kind of section the given keys describe: a diameter means CHS, a wall means RHS. */
function pickReader(measured: SectionMeasurements): Reader {
	const has = (k: Key) => typeof measured[k] === 'number' && Number.isFinite(measured[k]);
	if (has('d')) return READERS.CHS;
	if (has('t') && !has('tf') && !has('tw')) return READERS.RHS;
	return READERS.I;
}

/**
 * Ranks the standard sections closest to measured dimensions: I and H sections by h, b, tf, tw;
 * hollow sections by h, b, t or d, t (a rectangular tube measured either way up). Thickness is
 * weighted more than depth because a tape reads h and b to a few mm while callipers or a wall
 * gauge read thicknesses to a millimetre or better (common practice). US tubes compare the
 * measured wall with their nominal wall.
 * @example identifySection({ h: 304, b: 165, tf: 10 }, { limit: 1 })[0].section.designation
 * // 'UB 305x165x40'
 * @example identifySection({ d: 168.3, t: 6.3 }, { limit: 1 })[0].section.designation
 * // 'CHS 168.3x6.3'
 */
export function identifySection(
	measured: SectionMeasurements,
	options: IdentifyOptions = {}
): IdentifyCandidate[] {
	const tolerance = { ...DEFAULT_TOLERANCE, ...options.tolerance };
	const reader = pickReader(measured);
	const given = reader.keys.filter(
		(k) => typeof measured[k] === 'number' && Number.isFinite(measured[k])
	);
	if (given.length === 0) return [];
	// A tube's depth is its larger side: the tape does not know which way up it was read.
	const wanted = { ...measured };
	if (reader.shape === 'RHS' && wanted.h !== undefined && wanted.b !== undefined) {
		[wanted.h, wanted.b] = [Math.max(wanted.h, wanted.b), Math.min(wanted.h, wanted.b)];
	}
	// Records, not sections: properties are computed only for the candidates returned.
	const candidates = listSectionRecords()
		.filter((s) => s.shape === reader.shape && (!measured.family || s.family === measured.family))
		.map((record) => {
			const table = reader.read(record);
			const offsets: IdentifyCandidate['offsets'] = {};
			let sum = 0;
			for (const k of given) {
				offsets[k] = (wanted[k] as number) - (table[k] as number);
				sum += (offsets[k]! / tolerance[k]) ** 2;
			}
			const score = Math.sqrt(sum / given.length);
			const withinTolerance = given.every((k) => Math.abs(offsets[k]!) <= tolerance[k]);
			return { record, offsets, score, withinTolerance };
		});
	candidates.sort((a, b) => a.score - b.score);
	return candidates
		.slice(0, options.limit ?? 5)
		.map(({ record, ...rest }) => ({ section: getLibrarySection(record), ...rest }));
}
