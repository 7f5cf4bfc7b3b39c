/**
 * Geometry of one spandrel: the area between two perpendicular faces and a quarter circle of
 * radius r tangent to both (a root fillet of an I-section, or the piece cut from a square corner
 * to round it). Engineering reference D.0 and any geometry handbook (area (1 − π/4)r², centroid
 * r(10 − 3π)/(12 − 3π) from each face).
 */

/** Area of one spandrel of radius r (mm), mm². */
export function computeSpandrelArea(r: number): number {
	return (1 - Math.PI / 4) * r * r;
}

/** Distance of the spandrel centroid from each straight face, mm. */
export function computeSpandrelOffset(r: number): number {
	return (r * (10 - 3 * Math.PI)) / (12 - 3 * Math.PI);
}

/** Second moment of one spandrel about its own centroidal axis parallel to a face, mm⁴. */
export function computeSpandrelOwnI(r: number): number {
	// ∫y²dA about the face minus A·ȳ² (parallel axes); the face integral is r⁴(1 − 5π/16).
	const a = computeSpandrelArea(r);
	const y = computeSpandrelOffset(r);
	return r ** 4 * (1 - (5 * Math.PI) / 16) - a * y * y;
}
