import type {
	ChsDims,
	FlatDims,
	IDims,
	RhsDims,
	SectionDims,
	SectionProps,
	SectionShape
} from './types';
import { computeISectionProperties } from './i-section';
import { computeRhsProperties } from './rhs';
import { computeChsProperties } from './chs';
import { computeFlatProperties } from './flat';
import { assertFinite } from '../model/issue';

/**
 * Properties of any dimensioned shape, every number checked finite.
 * Dimensions must already be valid (see validateSectionDims); a non-finite result is a bug.
 * @example computeSectionProperties('CHS', { d: 114.3, t: 5 }).A // ≈ 1717 mm²
 */
export function computeSectionProperties(
	shape: Exclude<SectionShape, 'known-mp'>,
	dims: SectionDims
): SectionProps {
	const props =
		shape === 'I'
			? computeISectionProperties(dims as IDims)
			: shape === 'welded-I'
				? computeISectionProperties({ ...(dims as IDims), r: 0 }, { welded: true })
				: shape === 'RHS'
					? computeRhsProperties(dims as RhsDims)
					: shape === 'CHS'
						? computeChsProperties(dims as ChsDims)
						: computeFlatProperties(dims as FlatDims);
	for (const [key, value] of Object.entries(props)) assertFinite(value, `section property ${key}`);
	return props;
}
