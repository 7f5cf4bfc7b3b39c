import type { ChsDims, LibrarySection, RhsDims, SectionDims, SectionShape } from './types';
import { computeSectionProperties } from './properties';

/**
 * Design wall over nominal wall of a US hollow section made of the given grade:
 * AISC 360-22 B4.2 takes 0.93 × nominal for ERW tubes (A500, and A53 pipe, as the AISC Manual
 * does) and the nominal wall for A1085 tubes, whose wall tolerance is tighter.
 * @example designWallFactor('A1085') // 1
 */
export function designWallFactor(gradeId: string): number {
	return gradeId === 'A1085' ? 1 : 0.93;
}

/** Outer and inner corner radii AISC uses for HSS properties: ro = 2t, ri = t of the wall t. */
export function computeHssCornerRadii(t: number): { ro: number; ri: number } {
	return { ro: 2 * t, ri: t };
}

/**
 * The dims of a US HSS or pipe (table dims, A500 design wall) on the design wall of a grade: the
 * wall and, for a rectangular tube, its corner radii follow it.
 * @example withDesignWall('CHS', { d: 168.3, t: 6.6 }, 7.11, 'A1085') // { d: 168.3, t: 7.11 }
 */
export function withDesignWall(
	shape: SectionShape,
	dims: SectionDims,
	nominalWall: number,
	gradeId: string
): SectionDims {
	const t = nominalWall * designWallFactor(gradeId);
	return shape === 'RHS'
		? { ...(dims as RhsDims), t, ...computeHssCornerRadii(t) }
		: { ...(dims as ChsDims), t };
}

/**
 * The same US HSS or pipe with the design wall of another grade (properties recomputed); any
 * other section is returned unchanged. Library sections carry the A500 design wall.
 * @example applyDesignWall(findSection('HSS8x6x1/2')!, 'A1085').dims // t = 12.7 mm
 */
export function applyDesignWall(section: LibrarySection, gradeId: string): LibrarySection {
	if (section.nominalWall === undefined) return section;
	const dims = withDesignWall(section.shape, section.dims, section.nominalWall, gradeId);
	return {
		...section,
		dims,
		props: computeSectionProperties(section.shape as Exclude<SectionShape, 'known-mp'>, dims)
	};
}
