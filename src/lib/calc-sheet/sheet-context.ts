/** What the calc sheet prints besides the report: who, where, when, which record, which paper. */
import type { UnitSystem } from '$lib/ui/format';

/** A4 (210 × 297 mm) or US Letter (8.5 × 11 in). */
export type Paper = 'a4' | 'letter';

export interface SheetContext {
	title: string;
	place: string;
	/** As the user reads it, e.g. `2 Dec 2026`. */
	date: string;
	/** Name and company from the settings. */
	preparedBy: string;
	/** The saved check's id and revision; null before it is saved. */
	record: { id: string; revision: string } | null;
	appVersion: string;
	units: UnitSystem;
	paper: Paper;
	/** Photos printed on the pages after the sheet (set by the builder; none when left out). */
	photoCount?: number;
}

/** Photos per page after the sheet: two columns of three rows. */
export const PHOTOS_PER_PAGE = 6;

/** Page size in PDF points (1/72 in). */
export const PAPER_SIZE: Record<Paper, [width: number, height: number]> = {
	a4: [(210 / 25.4) * 72, (297 / 25.4) * 72],
	letter: [8.5 * 72, 11 * 72]
};

/** Letter for US customary units, A4 otherwise. */
export function paperFor(units: UnitSystem): Paper {
	return units === 'US' ? 'letter' : 'a4';
}
