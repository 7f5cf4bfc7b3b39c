/**
 * Plain text for messages: nothing a messaging app could render as markup. Characters that
 * start bold, italic, code, headings, strike-through, quotes or links are replaced by plain
 * look-alikes (× for *, ' for `, No. for #, ≈ for ~, ( ) for [ ]).
 */

const REPLACEMENTS: [RegExp, string][] = [
	[/\*/g, '×'],
	[/_/g, ' '],
	[/`/g, "'"],
	[/#/g, 'No.'],
	[/~/g, '≈'],
	[/>/g, '›'],
	[/</g, '‹'],
	[/\[/g, '('],
	[/\]/g, ')'],
	[/\|/g, '/']
];

/**
 * Removes markup characters from text.
 * @example
 * toPlainText('[UB] *305* _S275_ ~ok~ > #1') // "(UB) ×305× S275  ≈ok≈ › No.1"
 */
export function toPlainText(text: string): string {
	let out = text;
	for (const [pattern, plain] of REPLACEMENTS) out = out.replace(pattern, plain);
	return out;
}

/** True when the text has none of the markup characters {@link toPlainText} removes. */
export function isPlainText(text: string): boolean {
	return !/[*_`#~<>[\]|]/.test(text);
}
