/**
 * The numbers the member checks need from one span's section and grade, gathered once.
 * Hollow sections count both webs (tw = 2t) so the I-section formulas for shear and
 * interaction apply to them as well.
 */
import type { ChsDims, FlatDims, IDims, ResolvedSection, RhsDims } from '../section/types';

/** Section and material of one span, mm-based units and N/mm². */
export interface SpanMember {
	shape: ResolvedSection['shape'];
	designation: string;
	/** Overall depth, width, web thickness (all webs), flange thickness, root radius, mm. */
	h: number;
	b: number;
	tw: number;
	tf: number;
	r: number;
	/** Clear web depth between flanges, mm. */
	hw: number;
	/** Section properties (0 where unknown), mm², mm³, mm⁴, mm⁶, mm. */
	A: number;
	Wpl: number;
	Wel: number;
	Iy: number;
	Iz: number;
	It: number;
	Iw: number;
	iz: number;
	fy: number;
	/** Plastic moment Wpl·fy, or the known Mp, N·mm. */
	mp: number;
	/** False for a section known only by its Mp: no elastic or member checks possible. */
	propsKnown: boolean;
}

/**
 * Gathers a span's numbers.
 * @param fy yield strength, N/mm² (0 when only Mp is known)
 */
export function describeMember(section: ResolvedSection, fy: number): SpanMember {
	const p = section.props;
	const base = {
		shape: section.shape,
		designation: section.designation,
		A: p?.A ?? 0,
		Wpl: p?.Wply ?? 0,
		Wel: p?.Wely ?? 0,
		Iy: p?.Iy ?? 0,
		Iz: p?.Iz ?? 0,
		It: p?.It ?? 0,
		Iw: p?.Iw ?? 0,
		iz: p?.iz ?? 0,
		fy,
		mp: p ? p.Wply * fy : (section.mpKnown ?? 0),
		propsKnown: p !== null && section.dims !== null
	};
	const d = section.dims;
	if (d === null) return { ...base, h: 0, b: 0, tw: 0, tf: 0, r: 0, hw: 0 };
	switch (section.shape) {
		case 'I':
		case 'welded-I': {
			const { h, b, tw, tf, r } = d as IDims;
			return { ...base, h, b, tw, tf, r, hw: h - 2 * tf };
		}
		case 'RHS': {
			const { h, b, t } = d as RhsDims;
			return { ...base, h, b, tw: 2 * t, tf: t, r: 0, hw: h - 2 * t };
		}
		case 'CHS': {
			const { d: D, t } = d as ChsDims;
			return { ...base, h: D, b: D, tw: 2 * t, tf: t, r: 0, hw: D - 2 * t };
		}
		default: {
			const { h, b } = d as FlatDims;
			return { ...base, h, b, tw: b, tf: 0, r: 0, hw: h };
		}
	}
}
