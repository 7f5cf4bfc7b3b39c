import type { Checked, InputIssue } from '$lib/engine/model/issue';
import { CASE_FORMAT, isCaseLike, isPlainObject, type CaseFile } from '$lib/storage/case-file';
import { decodeBase64Url, encodeBase64Url } from './base64url';
import { findShapeProblem, type ShapeProblem } from './case-shape';
import { compactCase, expandCase } from './compact';

/** Version of the link encoding, written before the payload (`c=1.…`). */
export const LINK_VERSION = 1;
/** Newest case-file version this app reads. */
const CASE_VERSION_READ = 1;
/**
 * Bounds on what a link may hold before anything walks it: far above any real check (the demo
 * link is under 400 characters and 5 levels deep), far below what could stall the page.
 */
export const LINK_LIMITS = { characters: 100_000, depth: 32, values: 50_000 } as const;

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
	if (payload.length > LINK_LIMITS.characters) return refuse('link-too-large', TOO_LARGE);
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
	if (!withinLimits(data)) return refuse('link-too-large', TOO_LARGE);
	const caseFile = isPlainObject(data)
		? { format: CASE_FORMAT, ...(expandCase(data) as object) }
		: null;
	if (!isCaseLike(caseFile)) return refuse('link-damaged', DAMAGED);
	if (caseFile.version > CASE_VERSION_READ) return refuse('link-newer', NEWER);
	return { ok: true, value: caseFile, warnings: [] };
}

/**
 * Reads a shared case for the check screen: `decodeCaseFromFragment`, then the structure the
 * screen draws and edits. A hollow or malformed case is refused with a plain message instead of
 * reaching the form, where it would break the screen.
 * @example
 * openSharedCase('#c=1.eyJ2IjoxLCJCIjp7fSwibCI6W119') // the link of { v: 1, B: {}, l: [] }
 * // { ok: false, issues: [{ code: 'link-incomplete', … }] }
 */
export function openSharedCase(hash: string): Checked<CaseFile> {
	const decoded = decodeCaseFromFragment(hash);
	if (!decoded.ok) return decoded;
	const problem = findShapeProblem(decoded.value);
	return problem ? refuse('link-incomplete', describeIncomplete(problem)) : decoded;
}

/** The message for a case that lacks what the check screen needs, from a link or a saved record. */
export function describeIncomplete(
	{ path, problem }: ShapeProblem,
	from: 'link' | 'record' = 'link'
): string {
	const where = `${path || 'the case'}: ${problem}`;
	return from === 'link'
		? `This link does not hold a complete check (${where}), so it was not opened. ` +
				'Ask for the link again.'
		: `This saved check is incomplete (${where}), so it was not opened. ` +
				'A backup may hold a good copy.';
}

// Counts with its own stack, so a value nested thousands deep cannot overflow before it is refused.
function withinLimits(data: unknown): boolean {
	const stack: { value: unknown; depth: number }[] = [{ value: data, depth: 0 }];
	let count = 0;
	while (stack.length > 0) {
		const { value, depth } = stack.pop()!;
		if (++count > LINK_LIMITS.values) return false;
		if (typeof value !== 'object' || value === null) continue;
		if (depth >= LINK_LIMITS.depth) return false;
		for (const inner of Object.values(value)) stack.push({ value: inner, depth: depth + 1 });
	}
	return true;
}

const TOO_LARGE =
	'This link holds far more than a check, so it was not opened. Ask for the link again.';
const DAMAGED =
	'This link is damaged or cut short, so the check cannot be opened. Ask for the link again, or copy all of it.';
const NEWER =
	'This link was made by a newer version of Hingepoint. Update the app, then open it again.';

function refuse(code: string, message: string): Checked<CaseFile> {
	const issue: InputIssue = { path: 'link', message, code, severity: 'error' };
	return { ok: false, issues: [issue] };
}
