import type { Checked, InputIssue } from '$lib/engine/model/issue';
import { CASE_FORMAT, isCaseLike, isPlainObject, type CaseFile } from '$lib/storage/case-file';
import { decodeBase64Url, encodeBase64Url } from './base64url';
import { compactCase, expandCase } from './compact';

/** Version of the link encoding, written before the payload (`c=1.…`). */
export const LINK_VERSION = 1;
/** Newest case-file version this app reads. */
const CASE_VERSION_READ = 1;

/**
 * Encodes a case into a URL fragment (without the '#'): `c=<link version>.<base64url of the
 * UTF-8 JSON with short keys and values>`. The format name is implied by the link and left out.
 * @example
 * encodeCaseToFragment({ format: 'hingepoint.case', version: 1, beam: { spans: [6] }, loads: [] })
 * // 'c=1.eyJ2IjoxLCJCIjp7InMiOls2XX0sImwiOltdfQ'
 */
export function encodeCaseToFragment(caseFile: CaseFile): string {
	const { format: _format, ...rest } = caseFile;
	return `c=${LINK_VERSION}.${encodeBase64Url(JSON.stringify(compactCase(rest)))}`;
}

/**
 * A full link that reopens the case in the app: `<base>/check#c=…`. No server sees the case:
 * browsers never send the fragment.
 * @param base the app's origin and base path, e.g. 'https://example.org'
 */
export function buildShareLink(base: string, caseFile: CaseFile): string {
	return `${base.replace(/\/+$/, '')}/check#${encodeCaseToFragment(caseFile)}`;
}

/**
 * Reads a case back from a location hash (with or without the '#'). A damaged, cut or foreign
 * link comes back as issues with a plain message. Only the header and the top-level shape are
 * checked here; the engine's `checkCase` validates the beam and loads when the form runs.
 */
export function decodeCaseFromFragment(hash: string): Checked<CaseFile> {
	const params = new URLSearchParams(hash.replace(/^#/, ''));
	const payload = params.get('c');
	if (payload === null || payload === '') {
		return refuse('link-missing-case', 'This link has no check in it.');
	}
	const dot = payload.indexOf('.');
	const version = Number(payload.slice(0, dot));
	if (dot < 1 || !Number.isInteger(version) || version < 1) return refuse('link-damaged', DAMAGED);
	if (version > LINK_VERSION) return refuse('link-newer', NEWER);
	const json = decodeBase64Url(payload.slice(dot + 1));
	if (json === null) return refuse('link-damaged', DAMAGED);
	let data: unknown;
	try {
		data = JSON.parse(json);
	} catch {
		return refuse('link-damaged', DAMAGED);
	}
	const caseFile = isPlainObject(data)
		? { format: CASE_FORMAT, ...(expandCase(data) as object) }
		: null;
	if (!isCaseLike(caseFile)) return refuse('link-damaged', DAMAGED);
	if (caseFile.version > CASE_VERSION_READ) return refuse('link-newer', NEWER);
	return { ok: true, value: caseFile, warnings: [] };
}

const DAMAGED =
	'This link is damaged or cut short, so the check cannot be opened. Ask for the link again, or copy all of it.';
const NEWER =
	'This link was made by a newer version of Hingepoint. Update the app, then open it again.';

function refuse(code: string, message: string): Checked<CaseFile> {
	const issue: InputIssue = { path: 'link', message, code, severity: 'error' };
	return { ok: false, issues: [issue] };
}
