import type { PhotoRecord } from './types';

/**
 * Decides which photos of a backup to add. A photo follows its check to wherever the check
 * plan sent it (its own id, the copy kept beside, or the check already here). It only adds:
 * a photo with the same bytes already on that check is left out, and one whose id is taken
 * there by a different photo is added under a new id. Pure.
 * @param targets file check id → stored check id (from `planImport`)
 * @param existing stored photos of each target check
 * @param newId makes a fresh photo id (tests pass a counter)
 */
export function planPhotos(
	incoming: readonly PhotoRecord[],
	targets: ReadonlyMap<string, string>,
	existing: ReadonlyMap<string, readonly PhotoRecord[]>,
	newId: () => string
): PhotoRecord[] {
	const held = new Map<string, PhotoRecord[]>();
	const writes: PhotoRecord[] = [];
	for (const photo of incoming) {
		const checkId = targets.get(photo.checkId);
		if (checkId === undefined) continue;
		const here = held.get(checkId) ?? [...(existing.get(checkId) ?? [])];
		held.set(checkId, here);
		if (here.some((p) => sameBytes(p.data, photo.data))) continue;
		const taken = here.some((p) => p.id === photo.id);
		const write = { ...photo, checkId, id: taken ? newId() : photo.id };
		here.push(write);
		writes.push(write);
	}
	return writes;
}

/** Whether two photos hold exactly the same bytes. */
export function sameBytes(a: ArrayBuffer, b: ArrayBuffer): boolean {
	if (a.byteLength !== b.byteLength) return false;
	const x = new Uint8Array(a);
	const y = new Uint8Array(b);
	for (let i = 0; i < x.length; i++) if (x[i] !== y[i]) return false;
	return true;
}
