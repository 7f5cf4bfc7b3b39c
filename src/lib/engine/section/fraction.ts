/**
 * Replaces inch fractions as US tables print them by decimals: `5-1/2` → `5.5`, `3/8` → `0.375`.
 * A hyphen between two plain numbers (`305-165-40`) is left alone.
 * @example replaceFractions('hss5-1/2x5-1/2x3/8') // 'hss5.5x5.5x0.375'
 */
export function replaceFractions(text: string): string {
	const decimal = (value: number) => String(Math.round(value * 1e6) / 1e6);
	return text
		.replace(/(\d+)-(\d+)\/(\d+)/g, (_, whole, num, den) =>
			decimal(Number(whole) + Number(num) / Number(den))
		)
		.replace(/(\d+)\/(\d+)/g, (_, num, den) => decimal(Number(num) / Number(den)));
}
