/**
 * Sentences written by the checks, the material table and the case reader quote their figures in
 * the units of their basis: SI on the Eurocode basis ("stiff bearing 100 mm", "fy = 235 N/mm²"),
 * US customary on the AISC basis ("Fy ≤ 65 ksi", "E = 29 000 ksi"). This rewrites each figure
 * into the units the report is read in, so a report carries one system of units in its words.
 * The engine keeps its units; only the words change, here at the report's edge. Inches are left
 * as written when the text is read in SI ("in" is also a word); every other symbol converts.
 */
import {
	convertFrom,
	convertTo,
	formatNumber,
	unitSymbol,
	type SummaryQuantity,
	type SummaryUnits
} from './summary-units';

/** Symbols as the engine's sentences write them, longest first: quantity and unit system. */
const SYMBOLS: [symbol: string, quantity: SummaryQuantity, system: SummaryUnits][] = [
	['kN·m', 'moment', 'si'],
	['kNm', 'moment', 'si'],
	['kN/m', 'lineLoad', 'si'],
	['kN', 'force', 'si'],
	['N/mm²', 'stress', 'si'],
	['MPa', 'stress', 'si'],
	['mm', 'small', 'si'],
	['m', 'length', 'si'],
	['kip·ft', 'moment', 'us'],
	['kip-ft', 'moment', 'us'],
	['kip/ft', 'lineLoad', 'us'],
	['kips', 'force', 'us'],
	['kip', 'force', 'us'],
	['ksi', 'stress', 'us'],
	['ft', 'length', 'us'],
	['in', 'small', 'us']
];

const UNIT_OF = new Map(SYMBOLS.map(([symbol, q, system]) => [symbol, { q, system }]));
// A figure: digits grouped by spaces in thousands ("210 000") or plain, with decimals.
const NUMBER = String.raw`[-−]?(?:\d{1,3}(?:[ \u00a0\u202f]\d{3})+|\d+)(?:\.\d+)?`;
// A figure, or a run of figures sharing one symbol ("from 1.20 to 3.40 m", "210 / 380 MPa").
const FIGURES = String.raw`${NUMBER}(?:\s*(?:to|and|\/|–)\s*${NUMBER})*`;
const ALTERNATIVES = SYMBOLS.map(([s]) => s.replace('/', '\\/')).join('|');
// Not inside a name (S355, x40) and not followed by more of a word (1 member, 3 m², 5 mm³).
const FIGURE_WITH_SYMBOL = new RegExp(
	String.raw`(?<![\p{L}\d.,])(${FIGURES})(\s?)(${ALTERNATIVES})(?![\p{L}\d²³/·-])`,
	'gu'
);

/**
 * The sentence with every figure in `units`: SI figures in US customary ones and the other way
 * round; figures already in `units` are left exactly as written.
 * @example
 * restateUnits('stiff bearing 100 mm.', 'us') // 'stiff bearing 3.94 in.'
 * restateUnits('from 1.20 to 3.40 m', 'us') // 'from 3.94 to 11.2 ft'
 * restateUnits('Fy above 65 ksi', 'si') // 'Fy above 448 MPa'
 */
export function restateUnits(text: string, units: SummaryUnits): string {
	return text.replace(FIGURE_WITH_SYMBOL, (all, figures: string, space: string, symbol: string) => {
		const unit = UNIT_OF.get(symbol)!;
		// Already in the reader's units, or an inch read in SI (too easily the word "in").
		if (unit.system === units || symbol === 'in') return all;
		const shown = figures.replace(new RegExp(NUMBER, 'g'), (n) => {
			const written = Number(n.replace('−', '-').replace(/[ \u00a0\u202f]/g, ''));
			const value = formatNumber(
				convertTo(convertFrom(written, unit.q, unit.system), unit.q, units)
			);
			// A minus sign written as − stays one.
			return n.startsWith('−') ? value.replace('-', '−') : value;
		});
		return `${shown}${space || ' '}${unitSymbol(unit.q, units)}`;
	});
}

/**
 * A measured section's name (`I 300x150x7.1x10.7 (measured)`, sizes in mm) with its sizes in
 * `units`; any other name goes through {@link restateUnits}.
 * @example
 * restateSectionName('I 254x127x6.35x12.7 (measured)', 'us') // 'I 10x5x0.25x0.5 in (measured)'
 */
export function restateSectionName(name: string, units: SummaryUnits): string {
	const measured = /^(\S+) (\d+(?:\.\d+)?(?:x\d+(?:\.\d+)?)*) \(measured\)$/.exec(name);
	if (units === 'si' || !measured) return restateUnits(name, units);
	const sizes = measured[2]
		.split('x')
		.map((v) => formatNumber(convertTo(Number(v), 'small', units)));
	return `${measured[1]} ${sizes.join('x')} ${unitSymbol('small', units)} (measured)`;
}

/** Each sentence of a list restated. */
export function restateAll(texts: readonly string[], units: SummaryUnits): string[] {
	return texts.map((t) => restateUnits(t, units));
}
