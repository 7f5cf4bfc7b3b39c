import type { GradeBand, GradeRow } from './types';

/** AD 135 thickness bands: flange ≤ 16, 16–19 and 20–40 mm; fu is not given. */
function makeAd135Bands(upTo16: number, upTo19: number, upTo40: number): GradeBand[] {
	return [
		{ upTo: 16, fy: upTo16, fu: null },
		{ upTo: 19, fy: upTo19, fu: null },
		{ upTo: 40, fy: upTo40, fu: null }
	];
}

const AD135 = 'SCI Advisory Desk AD 135, Table 1';
const AD135_SOURCE = '[C: SCI AD 135 Table 1; its footnotes are not reproduced — consult AD 135]';
const CONFIRM =
	'Approximate yield strength of older hot-rolled open sections by date of rolling; confirm the ' +
	'date, that the member is steel (not cast or wrought iron), and consider coupon tests.';

/** One AD 135 row. */
function makeAd135Row(id: string, name: string, bands: GradeBand[]): GradeRow {
	const source = AD135_SOURCE;
	const region = 'eurocode';
	return {
		id,
		name,
		standard: AD135,
		source,
		bands,
		region,
		needsConfirmation: true,
		note: CONFIRM
	};
}

/**
 * Historic steels by era as UK guidance gives them (SCI AD 135 Table 1), each a default the user
 * must confirm. Thickness is the flange thickness; AD 135 covers flanges up to 40 mm. The US path
 * by ASTM specification is in ./us-historic-grades.ts.
 */
export const HISTORIC_GRADE_ROWS: readonly GradeRow[] = [
	makeAd135Row('uk-1910-1947', 'British sections, 1910–1947', makeAd135Bands(235, 235, 225)),
	makeAd135Row('uk-1948-1958', 'British sections, 1948–1958', makeAd135Bands(235, 235, 225)),
	makeAd135Row('uk-1959-1968', 'British sections, 1959–1968', makeAd135Bands(250, 245, 230)),
	makeAd135Row('uk-1969-1985', 'British sections, 1969–1985', makeAd135Bands(255, 245, 245)),
	makeAd135Row('uk-1986-on', 'British sections, 1986 on', makeAd135Bands(275, 265, 265)),
	makeAd135Row(
		'continental-ecsc',
		'Continental sections, ECSC, from about 1962',
		makeAd135Bands(235, 225, 225)
	),
	makeAd135Row('continental-other', 'Continental sections, other', makeAd135Bands(220, 210, 210)),
	makeAd135Row('us-to-1968', 'American sections up to 1968', makeAd135Bands(230, 230, 230)),
	makeAd135Row('us-from-1969', 'American sections from 1969', makeAd135Bands(250, 250, 250))
];
