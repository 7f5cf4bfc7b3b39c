/**
 * A linear map from data values to drawing units.
 * @example
 * createScale([0, 6], [20, 340])(3) // 180
 */
export function createScale(
	domain: [number, number],
	range: [number, number]
): (v: number) => number {
	const [d0, d1] = domain;
	const [r0, r1] = range;
	const span = d1 - d0 || 1;
	return (v) => r0 + ((v - d0) / span) * (r1 - r0);
}

/**
 * Node positions of a beam line from its span lengths.
 * @example
 * nodePositions([4, 1.5]) // [0, 4, 5.5]
 */
export function nodePositions(spans: readonly number[]): number[] {
	const xs = [0];
	for (const span of spans) xs.push(xs[xs.length - 1] + span);
	return xs;
}

/** A number rounded for an SVG attribute (keeps the markup short). */
export function round1(v: number): number {
	return Math.round(v * 10) / 10;
}
