/**
 * A DOM id for the field at a case path.
 * @example
 * fieldId('loads[1].x') // 'f-loads-1-x'
 */
export function fieldId(path: string): string {
	return `f-${path.replace(/[^a-zA-Z0-9]+/g, '-').replace(/-$/, '')}`;
}
