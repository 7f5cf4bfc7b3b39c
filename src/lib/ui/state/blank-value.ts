/**
 * A value the user has not entered yet. Stored as null: JSON, IndexedDB and share links keep it,
 * the engine names the field ("must be a number"), and no made-up number can pass for a measurement.
 */
export const BLANK = null as unknown as number;

/** True when the value at a field was never entered (or was cleared). */
export function isBlank(value: unknown): boolean {
	return value === null;
}
