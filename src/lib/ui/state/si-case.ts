/**
 * The form edits cases in SI (case-file.ts). A case written in US units (`"units": "us"`, e.g. a
 * file made for the command line and opened through a link) is turned into its SI twin on the
 * way in, so a value in ft is never shown or saved as if it were m.
 */
// From its file, not the case index (which brings the section tables into this bundle).
import { convertUsFile } from '$lib/engine/case/us-units';
import type { CaseFile } from './case-file';

/**
 * The case with its numbers in SI file units and no `units` field; an SI case is returned as is.
 * @example toSiCase({ units: 'us', beam: { spans: [20] }, … }).beam.spans // [6.096]
 */
export function toSiCase(c: CaseFile): CaseFile {
	if ((c as { units?: unknown }).units !== 'us') return c;
	const { units: _units, ...si } = convertUsFile(c as unknown as Record<string, unknown>).json;
	return si as unknown as CaseFile;
}
