/**
 * Sentences written by the checks, the material table and the case reader quote their figures in
 * SI ("stiff bearing 100 mm", "the hinge at 2.40 m", "fy = 235 N/mm²"). This rewrites each such
 * figure into the units the report is read in, so a US-customary report carries no SI figure.
 * The engine keeps its units; only the words change, here at the report's edge.
 */
import {
	convertTo,
	formatNumber,
	unitSymbol,
	type SummaryQuantity,
	type SummaryUnits
} from './summary-units';

/** SI symbols as the engine's sentences write them, longest first, with their quantity. */
const SI_SYMBOLS: [symbol: string, quantity: SummaryQuantity][] = [
	['kN·m', 'moment'],
	['kNm', 'moment'],
	['kN/m', 'lineLoad'],
	['kN', 'force'],
	['N/mm²', 'stress'],
	['MPa', 'stress'],
	['mm', 'small'],
	['m', 'length']
];

const QUANTITY_OF = new Map(SI_SYMBOLS);
const NUMBER = String.raw`[-−]?\d+(?:\.\d+)?`;
// A figure, or a run of figures sharing one symbol ("from 1.20 to 3.40 m", "210 / 380 MPa").
const FIGURES = String.raw`${NUMBER}(?:\s*(?:to|and|\/|–)\s*${NUMBER})*`;
const SYMBOLS = SI_SYMBOLS.map(([s]) => s.replace('/', '\\/')).join('|');
// Not inside a name (S355, x40) and not followed by more of a word (1 member, 3 m², 5 mm³).
const FIGURE_WITH_SYMBOL = new RegExp(
	String.raw`(?<![\p{L}\d.,])(${FIGURES})(\s?)(${SYMBOLS})(?![\p{L}\d²³/·])`,
	'gu'
);

/**
 * The sentence with every SI figure in `units`; unchanged for SI.
 * @example
 * restateUnits('stiff bearing 100 mm.', 'us') // 'stiff bearing 3.94 in.'
 * restateUnits('from 1.20 to 3.40 m', 'us') // 'from 3.94 to 11.2 ft'
 */
export function restateUnits(text: string, units: SummaryUnits): string {
	if (units === 'si') return text;
	return text.replace(
		FIGURE_WITH_SYMBOL,
		(_all, figures: string, space: string, symbol: string) => {
			const q = QUANTITY_OF.get(symbol)!;
			const shown = figures.replace(new RegExp(NUMBER, 'g'), (n) => {
				const value = formatNumber(convertTo(Number(n.replace('−', '-')), q, units));
				// A minus sign written as − stays one.
				return n.startsWith('−') ? value.replace('-', '−') : value;
			});
			return `${shown}${space || ' '}${unitSymbol(q, units)}`;
		}
	);
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
