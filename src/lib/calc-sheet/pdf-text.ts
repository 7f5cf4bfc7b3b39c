/**
 * Text the PDF's standard fonts can show. They carry only the WinAnsi characters, so Greek
 * symbols are spelled out and other signs get plain look-alikes; anything else becomes '?'
 * rather than stopping the sheet.
 */

const WIN_ANSI_EXTRA = '€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ';

const SPELLED: Record<string, string> = {
	α: 'alpha',
	β: 'beta',
	γ: 'gamma',
	δ: 'delta',
	Δ: 'Delta',
	ε: 'eps',
	η: 'eta',
	λ: 'lambda',
	μ: 'µ',
	ξ: 'xi',
	ρ: 'rho',
	σ: 'sigma',
	τ: 'tau',
	φ: 'phi',
	χ: 'chi',
	ψ: 'psi',
	ω: 'omega',
	'−': '-',
	'≤': '<=',
	'≥': '>=',
	'≈': '~',
	'→': '->',
	'←': '<-',
	'√': 'sqrt',
	'′': "'",
	'\u00a0': ' ',
	'\u202f': ' ',
	'\u2009': ' ',
	'✔': '',
	'✖': '',
	'⊘': ''
};

const DIGITS = '₀₁₂₃₄₅₆₇₈₉';
const POWERS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

function canShow(ch: string): boolean {
	const code = ch.codePointAt(0) ?? 0;
	return (
		(code >= 0x20 && code <= 0x7e) || (code >= 0xa0 && code <= 0xff) || WIN_ANSI_EXTRA.includes(ch)
	);
}

/**
 * Replaces what the standard fonts cannot draw.
 * @example
 * toPdfText('γM0 ≤ 1.0 → χLT') // 'gammaM0 <= 1.0 -> chiLT'
 */
export function toPdfText(text: string): string {
	let out = '';
	for (const ch of text) {
		if (canShow(ch)) out += ch;
		else if (ch in SPELLED) out += SPELLED[ch];
		else if (DIGITS.includes(ch)) out += String(DIGITS.indexOf(ch));
		else if (POWERS.includes(ch)) out += `^${POWERS.indexOf(ch)}`;
		else if (ch === '\n' || ch === '\t') out += ' ';
		else out += '?';
	}
	return out;
}
