/**
 * Width-to-thickness classes for flexure, AISC 360-22 Table B4.1b, and the stricter limits λpd
 * for sections that must form plastic hinges, Appendix 1, 1.3.2b. Pure numbers in, classes out:
 * the caller passes the element dimensions (mm) and Fy, E (MPa).
 *
 * Status: the Table B4.1b limits are from memory of the Specification (the same in 360-16 and
 * 360-22 as far as recalled); the Appendix 1 limits are from memory (engineering reference C.5,
 * tagged "verify").
 */

/** Class of one element, or of the whole section (its worst element). */
export type AiscCompactness = 'compact' | 'noncompact' | 'slender';

/** One compression element of Table B4.1b. */
export interface ElementCompactness {
	element: 'flange' | 'web' | 'wall';
	/** Width-to-thickness ratio λ (bf/2tf, h/tw, b/t, h/t or D/t). */
	lambda: number;
	/** Compact limit λp. */
	lambdaP: number;
	/** Noncompact limit λr. */
	lambdaR: number;
	status: AiscCompactness;
	/** Table B4.1b case, e.g. `AISC 360-22 Table B4.1b case 10`. */
	clause: string;
}

/** All elements and the worst of them. */
export interface SectionCompactness {
	elements: ElementCompactness[];
	overall: AiscCompactness;
	/** The element that sets `overall` (the flange when flange and web tie). */
	governing: ElementCompactness['element'];
}

const RANK: Record<AiscCompactness, number> = { compact: 0, noncompact: 1, slender: 2 };
const TABLE = 'AISC 360-22 Table B4.1b';

/** λ ≤ λp compact, λ ≤ λr noncompact, otherwise slender (Table B4.1b, B4.1(b)). */
function classify(
	element: ElementCompactness['element'],
	lambda: number,
	limits: { lambdaP: number; lambdaR: number; tableCase: number }
): ElementCompactness {
	const status: AiscCompactness =
		lambda <= limits.lambdaP ? 'compact' : lambda <= limits.lambdaR ? 'noncompact' : 'slender';
	const clause = `${TABLE} case ${limits.tableCase}`;
	return { element, lambda, lambdaP: limits.lambdaP, lambdaR: limits.lambdaR, status, clause };
}

function summarise(elements: ElementCompactness[]): SectionCompactness {
	const worst = elements.reduce((a, b) => (RANK[b.status] > RANK[a.status] ? b : a));
	return { elements, overall: worst.status, governing: worst.element };
}

/**
 * kc of F3-2 and Table B4.1b note [a]: 4/√(h/tw), taken between 0.35 and 0.76.
 * @example computeKc({ h: 400, tw: 8 }) // 4/√50 ≈ 0.566
 */
export function computeKc(o: { h: number; tw: number }): number {
	return Math.min(0.76, Math.max(0.35, 4 / Math.sqrt(o.h / o.tw)));
}

/** Inputs of {@link classifyIShapeFlexure}; mm and MPa. */
export interface IShapeCompactnessInput {
	/** Flange width bf and thickness tf, mm. */
	bf: number;
	tf: number;
	/** Web depth h (rolled: clear distance between flanges less the fillets, d − 2k), mm. */
	h: number;
	tw: number;
	Fy: number;
	E: number;
	/** Built-up (welded) section: flange λr = 0.95√(kc·E/FL), FL = 0.7Fy (doubly symmetric). */
	builtUp?: boolean;
}

/**
 * Doubly symmetric I-shape in major-axis flexure.
 * Flange λ = bf/2tf: λp = 0.38√(E/Fy), λr = 1.0√(E/Fy) (case 10, rolled) or 0.95√(kc·E/FL)
 * (case 11, built-up); web λ = h/tw: λp = 3.76√(E/Fy), λr = 5.70√(E/Fy) (case 15).
 * @example
 * // W16x40, Fy = 50 ksi: bf/2tf = 6.93 ≤ 9.15 and h/tw = 46.5 ≤ 90.6, compact
 * classifyIShapeFlexure({ bf: 177.8, tf: 12.83, h: 360.3, tw: 7.75, Fy: 344.7, E: 199948 }).overall
 */
export function classifyIShapeFlexure(o: IShapeCompactnessInput): SectionCompactness {
	const root = Math.sqrt(o.E / o.Fy);
	const flangeR = o.builtUp ? 0.95 * Math.sqrt((computeKc(o) * o.E) / (0.7 * o.Fy)) : 1.0 * root;
	return summarise([
		classify('flange', o.bf / (2 * o.tf), {
			lambdaP: 0.38 * root,
			lambdaR: flangeR,
			tableCase: o.builtUp ? 11 : 10
		}),
		classify('web', o.h / o.tw, { lambdaP: 3.76 * root, lambdaR: 5.7 * root, tableCase: 15 })
	]);
}

/** Inputs of {@link classifyRectHssFlexure}; mm and MPa. */
export interface RectHssCompactnessInput {
	/** Outside width B (flange) and depth H (web), mm; bending about the axis parallel to B. */
	B: number;
	H: number;
	/** Design wall thickness t (0.93 × nominal for ASTM A500, B4.2), mm. */
	t: number;
	Fy: number;
	E: number;
}

/**
 * Rectangular or square HSS in major-axis flexure. Flat widths b = B − 3t and h = H − 3t
 * (B4.1b(d): the corner radius taken as 1.5t when not known).
 * Flange b/t: λp = 1.12√(E/Fy), λr = 1.40√(E/Fy) (case 17); web h/t: λp = 2.42√(E/Fy),
 * λr = 5.70√(E/Fy) (case 19).
 * @example classifyRectHssFlexure({ B: 203.2, H: 203.2, t: 4.42, Fy: 317.2, E: 199948 }).overall
 * // 'slender' (HSS8x8x3/16, b/t = 43.0 > 35.2)
 */
export function classifyRectHssFlexure(o: RectHssCompactnessInput): SectionCompactness {
	const root = Math.sqrt(o.E / o.Fy);
	return summarise([
		classify('flange', (o.B - 3 * o.t) / o.t, {
			lambdaP: 1.12 * root,
			lambdaR: 1.4 * root,
			tableCase: 17
		}),
		classify('web', (o.H - 3 * o.t) / o.t, {
			lambdaP: 2.42 * root,
			lambdaR: 5.7 * root,
			tableCase: 19
		})
	]);
}

/**
 * Round HSS in flexure, D/t: λp = 0.07E/Fy, λr = 0.31E/Fy (case 20). F8 applies only up to
 * D/t = 0.45E/Fy (see `computeRoundHssFlexure`).
 * @example classifyRoundHssFlexure({ D: 141.3, t: 6.04, Fy: 241.3, E: 199948 }).overall // 'compact'
 */
export function classifyRoundHssFlexure(o: {
	D: number;
	t: number;
	Fy: number;
	E: number;
}): SectionCompactness {
	return summarise([
		classify('wall', o.D / o.t, {
			lambdaP: (0.07 * o.E) / o.Fy,
			lambdaR: (0.31 * o.E) / o.Fy,
			tableCase: 20
		})
	]);
}

/** One element against its Appendix 1 limit λpd. */
export interface HingeElementCheck {
	element: ElementCompactness['element'];
	lambda: number;
	lambdaPd: number;
	ok: boolean;
	clause: string;
}

/** Which shape family the λpd limits are taken for. */
export type HingeShape = 'I' | 'rect-HSS' | 'round-HSS';

/**
 * Width-to-thickness limits λpd for members with plastic hinges, AISC 360-22 Appendix 1,
 * 1.3.2b, for beams without axial force (Pu = 0) [from memory — verify against the text]:
 * I flanges λpd = λp = 0.38√(E/Fy); I webs 3.76√(E/Fy) (A-1-1 at Pu = 0);
 * rectangular HSS flanges 0.94√(E/Fy) (A-1-3); rectangular HSS webs: the lower of A-1-1 at
 * Pu = 0 and the Table B4.1b λp, 2.42√(E/Fy) (our cautious reading); round HSS D/t ≤ 0.045E/Fy
 * (A-1-4). Takes the λ of each element from a Table B4.1b classification of the same section.
 * @example
 * checkHingeCompactness({ shape: 'I', compactness: w16x40, Fy: 344.7, E: 199948 }).every((e) => e.ok)
 */
export function checkHingeCompactness(o: {
	shape: HingeShape;
	compactness: SectionCompactness;
	Fy: number;
	E: number;
}): HingeElementCheck[] {
	const root = Math.sqrt(o.E / o.Fy);
	const limit = (element: ElementCompactness['element']): number => {
		if (o.shape === 'round-HSS') return (0.045 * o.E) / o.Fy;
		if (o.shape === 'rect-HSS') return element === 'flange' ? 0.94 * root : 2.42 * root;
		return element === 'flange' ? 0.38 * root : 3.76 * root;
	};
	return o.compactness.elements.map((e) => {
		const lambdaPd = limit(e.element);
		const clause = 'AISC 360-22 Appendix 1, 1.3.2b';
		return { element: e.element, lambda: e.lambda, lambdaPd, ok: e.lambda <= lambdaPd, clause };
	});
}
