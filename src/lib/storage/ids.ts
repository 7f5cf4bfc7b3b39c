/**
 * A random record id (UUID v4 layout). Uses getRandomValues, which unlike randomUUID also works
 * on a plain-http LAN address.
 * @example
 * createId() // 'b3e1c0de-…'
 */
export function createId(): string {
	const bytes = crypto.getRandomValues(new Uint8Array(16));
	bytes[6] = (bytes[6] & 0x0f) | 0x40;
	bytes[8] = (bytes[8] & 0x3f) | 0x80;
	const hex = Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
	const cuts = [0, 8, 12, 16, 20, 32];
	// 8-4-4-4-12 hex digits.
	return cuts
		.slice(1)
		.map((end, i) => hex.slice(cuts[i], end))
		.join('-');
}

/** The current time as ISO 8601 (UTC), from the caller's clock when given. */
export function stampNow(now?: Date): string {
	return (now ?? new Date()).toISOString();
}
