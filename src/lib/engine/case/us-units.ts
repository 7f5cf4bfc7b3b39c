/**
 * A case file written in US customary units (`"units": "us"`) turned into the same file in SI
 * file units, before any reader sees it: ft → m, in → mm, kip → kN, kip/ft → kN/m,
 * kip·ft → kNm, ksi → MPa, lb/ft → kg/m. Every limit and plausibility range then applies to the
 * converted value, so a US file and its SI twin are held to the same bounds. Values that are
 * not finite numbers are left for the readers to report.
 */
import type { InputIssue } from '../model/issue';
import { US } from '../units';
import { isRecord } from './read-value';

/** One US quantity: its factor to the SI file unit and both unit names. */
interface UnitRule {
	factor: number;
	us: string;
	si: string;
}

/**
 * Factors from the exact definitions of the foot, inch and pound (NIST SP 811 Appendix B):
 * 1 ft = 0.3048 m, 1 in = 25.4 mm, 1 kip = 4.448 221 615 260 5 kN, 1 lb = 0.453 592 37 kg.
 */
const FT: UnitRule = { factor: US.ftToM, us: 'ft', si: 'm' };
const IN: UnitRule = { factor: US.inToMm, us: 'in', si: 'mm' };
const KIP: UnitRule = { factor: US.kipToKN, us: 'kip', si: 'kN' };
const KIP_PER_FT: UnitRule = { factor: US.kipToKN / US.ftToM, us: 'kip/ft', si: 'kN/m' };
const KIP_FT: UnitRule = { factor: US.kipToKN * US.ftToM, us: 'kip·ft', si: 'kNm' };
const KSI: UnitRule = { factor: US.ksiToMPa, us: 'ksi', si: 'MPa' };
const LB_PER_FT: UnitRule = { factor: US.lbPerFtToKgPerM, us: 'lb/ft', si: 'kg/m' };

/** Dimensions of a section given by its shape, all lengths in the file's size unit. */
const SECTION_SIZES = ['h', 'b', 'tw', 'tf', 'r', 'd', 't'] as const;

/** A value as the file gave it, kept to explain a message about its converted twin. */
export interface ConvertedValue {
	value: number;
	unit: string;
	si: number;
	siUnit: string;
}

/** The SI twin of a US file and, by field path, the values that were converted. */
export interface UsConversion {
	json: Record<string, unknown>;
	converted: Map<string, ConvertedValue>;
}

/**
 * Converts the numbers of a US case file to SI file units; the input is not changed.
 * @example convertUsFile({ beam: { spans: [20] }, … }).json.beam.spans // [6.096]
 */
export function convertUsFile(json: Record<string, unknown>): UsConversion {
	const out = structuredClone(json);
	const converted = new Map<string, ConvertedValue>();
	const at = (obj: Record<string, unknown>, key: string, path: string, rule: UnitRule) => {
		const value = obj[key];
		if (typeof value !== 'number' || !Number.isFinite(value)) return;
		const si = value * rule.factor;
		obj[key] = si;
		converted.set(path, { value, unit: rule.us, si, siUnit: rule.si });
	};
	const each = (obj: Record<string, unknown>, key: string, path: string, rule: UnitRule) => {
		const list = obj[key];
		if (!Array.isArray(list)) return;
		const holder = list as unknown as Record<string, unknown>;
		list.forEach((_, i) => at(holder, String(i), `${path}[${i}]`, rule));
	};
	if (isRecord(out.beam)) convertBeam(out.beam, { at, each });
	if (Array.isArray(out.loads)) {
		out.loads.forEach((load, i) => {
			if (!isRecord(load)) return;
			const p = `loads[${i}]`;
			for (const key of ['x', 'from', 'to']) at(load, key, `${p}.${key}`, FT);
			const force = load.kind === 'point' ? KIP : KIP_PER_FT;
			for (const key of ['value', 'start', 'end']) at(load, key, `${p}.${key}`, force);
		});
	}
	return { json: out, converted };
}

type Convert = (obj: Record<string, unknown>, key: string, path: string, rule: UnitRule) => void;

function convertBeam(beam: Record<string, unknown>, c: { at: Convert; each: Convert }): void {
	c.each(beam, 'spans', 'beam.spans', FT);
	c.at(beam, 'sectionLoss', 'beam.sectionLoss', IN);
	c.each(beam, 'bearing', 'beam.bearing', IN);
	c.at(beam, 'bearingLoads', 'beam.bearingLoads', IN);
	if (isRecord(beam.restraint)) c.each(beam.restraint, 'lateral', 'beam.restraint.lateral', FT);
	if (isRecord(beam.grade)) {
		c.at(beam.grade, 'fy', 'beam.grade.fy', KSI);
		c.at(beam.grade, 'fu', 'beam.grade.fu', KSI);
	}
	const convertSection = (spec: unknown, path: string) => {
		if (!isRecord(spec) || 'designation' in spec) return;
		if ('mp' in spec) {
			c.at(spec, 'mp', `${path}.mp`, KIP_FT);
			c.at(spec, 'mass', `${path}.mass`, LB_PER_FT);
			return;
		}
		for (const key of SECTION_SIZES) c.at(spec, key, `${path}.${key}`, IN);
	};
	if (Array.isArray(beam.section)) {
		beam.section.forEach((spec, i) => convertSection(spec, `beam.section[${i}]`));
	} else convertSection(beam.section, 'beam.section');
}

/** Four significant figures, as people read a value back. */
function show(value: number): string {
	return String(Number(value.toPrecision(4)));
}

/**
 * Adds the file's own value to each message about a converted field, since the readers speak
 * SI: "The span (m) must be between 0.1 and 100; got 30.48. (The file gives 100 ft.)"
 */
export function explainConverted(
	issues: InputIssue[],
	converted: Map<string, ConvertedValue>
): InputIssue[] {
	return issues.map((issue) => {
		const c = converted.get(issue.path);
		if (!c) return issue;
		const note = ` (The file gives ${show(c.value)} ${c.unit}.)`;
		return { ...issue, message: issue.message + note };
	});
}
