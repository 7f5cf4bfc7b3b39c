/**
 * Reads and validates a case file once, at the door: every problem comes back as an InputIssue
 * naming its field path, and a valid file becomes a CaseModel in internal units.
 */
import type { Checked, InputIssue } from '../model/issue';
import type { Load } from '../model/types';
import { massToLineLoad } from '../units';
import { parseGeometry } from './parse-geometry';
import { parseLoads } from './parse-loads';
import { parseBearing, parseCheckSettings, parseRestraint } from './parse-options';
import { parseFactors } from './parse-factors';
import { parseSections } from './parse-section';
import { echoFile, FILE_KEYS } from './echo-file';
import { checkJsonShape } from './json-shape';
import { RANGES, SIZE_LIMITS } from './limits';
import {
	addError,
	isRecord,
	readChoice,
	readNumber,
	readText,
	warnUnknownKeys
} from './read-value';
import { convertUsFile, explainConverted } from './us-units';
import {
	CASE_BASES,
	CASE_FORMAT,
	CASE_UNITS,
	CASE_VERSION,
	type CaseBasis,
	type CaseModel,
	type CaseUnits
} from './types';

/**
 * Validates a parsed JSON value as a case file and converts it to internal units.
 * Unknown keys are warnings and are dropped; everything else wrong is an error with its path.
 * Sizes, text lengths and number ranges are those of ./limits.ts.
 * @example
 * parseCase({ format: 'hingepoint.case', version: 1, beam: { spans: [-6], … }, loads: [] })
 * // { ok: false, issues: [{ path: 'beam.spans[0]', code: 'not-positive', … }] }
 */
export function parseCase(json: unknown): Checked<CaseModel> {
	const issues: InputIssue[] = [];
	if (!isRecord(json)) {
		const message = 'A case file is a JSON object with format, version, beam and loads.';
		addError(issues, '', 'not-an-object', message);
		return { ok: false, issues };
	}
	// Bounded before any reader walks it.
	if (!checkJsonShape(json, issues)) return { ok: false, issues };
	warnUnknownKeys(json, FILE_KEYS.top, '', issues);
	checkHeader(json, issues);
	const basis = readBasis(json.basis, issues);
	const units = readUnits(json.units, issues);
	// A US file is read as its SI twin, so every range applies after conversion.
	const us = units === 'us' ? convertUsFile(json) : null;
	const read = readFile({ json: us?.json ?? json, original: json, basis, units }, issues);
	if (!us) return read;
	return read.ok
		? { ...read, warnings: explainConverted(read.warnings, us.converted) }
		: { ok: false, issues: explainConverted(read.issues, us.converted) };
}

/** Reads the top-level `basis` (default `eurocode`, so files written before it keep working). */
function readBasis(value: unknown, issues: InputIssue[]): CaseBasis {
	if (value === undefined) return 'eurocode';
	return readChoice(value, 'basis', issues, CASE_BASES, 'design basis') ?? 'eurocode';
}

/** Reads the top-level `units` (default `si`). */
function readUnits(value: unknown, issues: InputIssue[]): CaseUnits {
	if (value === undefined) return 'si';
	return readChoice(value, 'units', issues, CASE_UNITS, 'units of the file') ?? 'si';
}

/** What {@link readFile} reads: the file in SI file units, and the file as given. */
interface FileToRead {
	json: Record<string, unknown>;
	original: Record<string, unknown>;
	basis: CaseBasis;
	units: CaseUnits;
}

/** Reads a file whose numbers are in SI file units (after any conversion). */
function readFile(f: FileToRead, issues: InputIssue[]): Checked<CaseModel> {
	const { json, basis, units } = f;
	const beam = isRecord(json.beam) ? json.beam : undefined;
	if (!beam) addError(issues, 'beam', 'beam-missing', 'The case needs a "beam" object.');
	else warnUnknownKeys(beam, FILE_KEYS.beam, 'beam', issues);
	const b = beam ?? {};
	const line = beam ? parseGeometry(b, issues) : undefined;
	const spansM = readSpanList(b.spans);
	const loss =
		b.sectionLoss === undefined
			? 0
			: readNumber(b.sectionLoss, 'beam.sectionLoss', issues, {
					label: 'section loss (mm per face)',
					range: RANGES.sectionLoss
				});
	if (b.selfWeight !== undefined && typeof b.selfWeight !== 'boolean')
		addError(issues, 'beam.selfWeight', 'not-a-boolean', 'selfWeight must be true or false.');
	const materials =
		beam && loss !== undefined ? parseSections(b, spansM?.length, loss, issues, issues) : undefined;
	const loads = parseLoads(json.loads, spansM, issues);
	const factors = parseFactors(json.factors, issues, basis);
	const restraint = parseRestraint(b.restraint, spansM, issues);
	const bearing = parseBearing(b.bearing, spansM ? spansM.length + 1 : undefined, issues);
	const settings = parseCheckSettings(json, b, issues);
	const errors = issues.filter((i) => i.severity === 'error');
	if (errors.length > 0 || !line || !materials || !loads || !factors || loss === undefined) {
		if (errors.length === 0) throw new Error('invariant: an unusable case part recorded no error');
		return { ok: false, issues: errors };
	}
	const selfWeight = b.selfWeight !== false;
	const nodes = line.spans.reduce((xs, L) => [...xs, xs[xs.length - 1] + L], [0]);
	const selfWeightLoads: Load[] = [];
	const selfWeightMissing: number[] = [];
	if (selfWeight) {
		materials.sections.forEach((s, e) => {
			const mass = s.props?.mass ?? s.massKnown;
			if (mass === undefined) return void selfWeightMissing.push(e);
			if (mass <= 0) return;
			const [from, to] = [nodes[e], nodes[e + 1]];
			const value = massToLineLoad(mass);
			selfWeightLoads.push({ kind: 'uniform', from, to, value, action: 'permanent' });
		});
	}
	const model: CaseModel = {
		title: typeof json.title === 'string' ? json.title : '',
		basis,
		units,
		beam: line,
		sections: materials.sections,
		grades: materials.grades,
		loads: loads.loads,
		loadLabels: loads.labels,
		selfWeightLoads,
		selfWeightMissing,
		selfWeight,
		sectionLoss: loss,
		factors,
		...(restraint ? { restraint } : {}),
		restraintAssumed: b.restraint === undefined,
		...(bearing ? { bearing } : {}),
		...settings,
		file: echoFile(f.original),
		fileSI: units === 'us' ? { ...echoFile(json), units: 'si' } : echoFile(json)
	};
	return { ok: true, value: model, warnings: issues.filter((i) => i.severity === 'warning') };
}

function checkHeader(json: Record<string, unknown>, issues: InputIssue[]): void {
	if (json.format !== CASE_FORMAT) {
		const message = `Not a case file: "format" must be "${CASE_FORMAT}".`;
		addError(issues, 'format', 'format-unknown', message);
	}
	if (typeof json.version === 'number' && json.version > CASE_VERSION) {
		const message =
			`Written by a newer version (${json.version}); this engine reads version ` +
			`${CASE_VERSION}. Update the app.`;
		addError(issues, 'version', 'version-newer', message);
	} else if (json.version !== CASE_VERSION) {
		addError(issues, 'version', 'version-unknown', `"version" must be ${CASE_VERSION}.`);
	}
	if (json.title !== undefined) {
		readText(json.title, 'title', issues, { label: 'title', max: SIZE_LIMITS.title });
	}
}

/** The span list in m when every entry is a positive number (parseGeometry reports the rest). */
function readSpanList(value: unknown): number[] | undefined {
	if (!Array.isArray(value) || value.length === 0) return undefined;
	const ok = value.every((v) => typeof v === 'number' && Number.isFinite(v) && v > 0);
	return ok ? (value as number[]) : undefined;
}
