/**
 * The case file: the JSON shape people write, the phone app stores and the command line reads,
 * and the validated model in internal units that the analyses use.
 */
import type { GradeSpec, SteelGrade } from '../material/types';
import type { BeamLine, JointKind, Load, SupportKind } from '../model/types';
import type { ResolvedSection, SectionSpec } from '../section/types';

/** Format tag of a case file. */
export const CASE_FORMAT = 'hingepoint.case';
/** Version of the case-file format this engine writes and reads. */
export const CASE_VERSION = 1;

/**
 * Design bases a case may name (top-level `basis`): EN 1990 / EN 1993 with recommended values,
 * or AISC 360-22 with ASCE 7-22 combinations by LRFD or ASD. Files without it are Eurocode.
 */
export const CASE_BASES = ['eurocode', 'aisc-lrfd', 'aisc-asd'] as const;
export type CaseBasis = (typeof CASE_BASES)[number];

/** True for a basis id a case file may hold (a stored setting, a linked or saved case). */
export function isCaseBasis(value: unknown): value is CaseBasis {
	return typeof value === 'string' && (CASE_BASES as readonly string[]).includes(value);
}

/**
 * Units a case file is written in (top-level `units`): `si` (default) m, kN, kN/m, kNm, mm, MPa,
 * kg/m; `us` ft, kip, kip/ft, kip·ft, in, ksi, lb/ft. Converted to internal units on reading.
 */
export const CASE_UNITS = ['si', 'us'] as const;
export type CaseUnits = (typeof CASE_UNITS)[number];

/** Action category of a load in a case file. */
export type CaseAction = 'permanent' | 'imposed' | 'temporary';

/**
 * A load as written in a case file: positions in m, forces in kN, line loads in kN/m (with
 * `units: "us"`: ft, kip and kip/ft).
 */
export type CaseLoad =
	| { kind: 'point'; x: number; value: number; action: CaseAction; label?: string }
	| { kind: 'uniform'; from: number; to: number; value: number; action: CaseAction; label?: string }
	| {
			kind: 'linear';
			from: number;
			to: number;
			start: number;
			end: number;
			action: CaseAction;
			label?: string;
	  };

/** Lateral restraint of the compression flange (read by the member checks). */
export interface CaseRestraint {
	/** `continuous`, `ends-only`, or the restraint positions in m from the left end. */
	lateral: 'continuous' | 'ends-only' | number[];
	/** Where the load is applied over the depth. */
	loadHeight?: 'top-flange' | 'shear-centre' | 'bottom-flange';
}

/**
 * Partial factors. Eurocode defaults: EN 1990 6.10 recommended values, γM0 = γM1 = 1.0. AISC
 * defaults: ASCE 7-22 2.3.1 (LRFD: 1.4D; 1.2D + 1.6L) or 2.4.1 (ASD: D; D + L), the temporary
 * load taking the live-load factor.
 */
export interface CaseFactors {
	/** γG,sup: permanent load where unfavourable; AISC: the dead-load factor with live load. */
	permanent?: number;
	/** AISC only: the dead-load factor of the dead-load-only combination (1.4 LRFD, 1.0 ASD). */
	permanentAlone?: number;
	/** γG,inf: permanent load where favourable (default 1.0; read by the checks). */
	permanentFavourable?: number;
	imposed?: number;
	temporary?: number;
	gammaM0?: number;
	gammaM1?: number;
	/** ξ, reduction on unfavourable permanent actions in EN 1990 6.10b (read by the checks). */
	xi?: number;
	/** ψ0, combination value of accompanying imposed load (read by the checks). */
	psi0?: number;
	/**
	 * ψ0 of the temporary (construction) load when another variable action leads (default 1.0,
	 * EN 1991-1-6 Annex A1 recommended value for construction loads).
	 */
	psi0Temporary?: number;
	/**
	 * Eurocode: `en1990-6.10` (default), `en1990-6.10ab` (the worse of 6.10a and 6.10b) or
	 * `custom`. AISC: `asce7-lrfd` (default on aisc-lrfd), `asce7-asd` (default on aisc-asd) or
	 * `custom`.
	 */
	set?: string;
}

/**
 * The beam as written in a case file: spans in m, section dimensions in mm (with `units: "us"`:
 * ft and in).
 */
export interface CaseBeam {
	spans: number[];
	supports: SupportKind[];
	/** One per internal node; omitted means all continuous. */
	joints?: JointKind[];
	/** One section for the whole beam, or one per span. */
	section: SectionSpec | SectionSpec[];
	/** Grade id (`S275`) or own values in MPa; not needed when every section is a known Mp. */
	grade?: GradeSpec;
	/** Uniform thickness loss per exposed face, mm. */
	sectionLoss?: number;
	/** Add the section's own weight as a permanent load (default true). */
	selfWeight?: boolean;
	restraint?: CaseRestraint;
	/** Stiff bearing length at each support, mm (one per support; read by the web checks). */
	bearing?: number[];
	/** Stiff bearing length under point loads, mm (read by the web checks; default 0). */
	bearingLoads?: number;
	/** The user confirms the strength of an unknown or historic grade (default false). */
	gradeConfirmed?: boolean;
}

/** A case file (`format: 'hingepoint.case'`, version 1). Plain JSON data. */
export interface CaseFile {
	format: typeof CASE_FORMAT;
	version: typeof CASE_VERSION;
	title?: string;
	/** Design basis (default `eurocode`). */
	basis?: CaseBasis;
	/** Units of the numbers in the file (default `si`). */
	units?: CaseUnits;
	beam: CaseBeam;
	loads: CaseLoad[];
	factors?: CaseFactors;
	/** Deflection limit as a span ratio: the limit is span / deflectionLimit (e.g. 200). */
	deflectionLimit?: number;
	/** Limit for the deflection under all loads, span / n (default 200). */
	deflectionLimitTotal?: number;
	/** Count the deflection checks in the verdict (default false: reported as warnings). */
	deflectionGoverns?: boolean;
	/** η of EN 1993-1-5 5.1(2) for the shear area and web slenderness (default 1.0). */
	eta?: number;
	/** Where the beam is, for the shared summary. */
	place?: string;
}

/** Partial factors after defaults (the basis's own defaults). */
export interface ResolvedFactors {
	permanent: number;
	imposed: number;
	temporary: number;
	/** Eurocode basis only: the AISC bases take φ or Ω from the Specification. */
	gammaM0?: number;
	gammaM1?: number;
	/** AISC bases only: dead-load factor of the dead-load-only combination. */
	permanentAlone?: number;
	xi?: number;
	psi0?: number;
	psi0Temporary?: number;
	permanentFavourable?: number;
	set?: string;
}

/** A validated case in internal units (mm, N, N/mm, MPa). */
export interface CaseModel {
	title: string;
	/** The design basis the case names (`eurocode` when it names none). */
	basis: CaseBasis;
	/** The units the file was written in, for reports and the command line to answer in. */
	units: CaseUnits;
	beam: BeamLine;
	/** One resolved section per span (after section loss). */
	sections: ResolvedSection[];
	/** One grade per span (fy for that section's governing thickness); null for a known Mp without grade. */
	grades: (SteelGrade | null)[];
	/** User loads, characteristic values, internal units, in file order. */
	loads: Load[];
	/** Optional labels of the user loads, same order. */
	loadLabels: (string | null)[];
	/** Self-weight as permanent uniform loads, one per span with a known mass. */
	selfWeightLoads: Load[];
	/** Spans whose self-weight is not known (a known Mp without mass) while selfWeight is on. */
	selfWeightMissing: number[];
	selfWeight: boolean;
	/** Section loss per face, mm. */
	sectionLoss: number;
	factors: ResolvedFactors;
	/** True when the file gave no restraint and the cautious default was taken. */
	restraintAssumed?: boolean;
	/** Lateral restraint positions converted to mm. */
	restraint?: {
		lateral: 'continuous' | 'ends-only' | number[];
		loadHeight?: CaseRestraint['loadHeight'];
	};
	/** Stiff bearing length per support, mm. */
	bearing?: number[];
	/** Stiff bearing length under point loads, mm. */
	bearingLoads?: number;
	deflectionLimit?: number;
	deflectionLimitTotal?: number;
	deflectionGoverns?: boolean;
	eta?: number;
	gradeConfirmed?: boolean;
	place?: string;
	/** The case as read (file units, `units` kept), for echoing and storing. */
	file: CaseFile;
	/** The same case with its numbers in SI file units (m, kN, kN/m, kNm, mm, MPa, kg/m). */
	fileSI: CaseFile;
}
