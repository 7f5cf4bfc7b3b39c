/**
 * The case file as the app edits it: plain JSON in SI (m, kN, kN/m, kNm; section dimensions mm,
 * stresses MPa). Structurally the engine's case format (`hingepoint.case`, version 1), so a stored
 * check, a draft and a shared link all hold exactly what the command line reads.
 */

export type SupportChoice = 'pin' | 'fixed' | 'free';
export type JointChoice = 'continuous' | 'simple';
/** Existing permanent, existing imposed, proposed temporary. */
export type CaseAction = 'permanent' | 'imposed' | 'temporary';

/** Section of the beam: a library designation, measured I dimensions (mm) or a known Mp (kNm). */
export type CaseSection =
	| { designation: string }
	| { shape: 'I'; h: number; b: number; tw: number; tf: number; r: number }
	| { mp: number; mass?: number };

export type CaseLoad =
	| { kind: 'point'; x: number; value: number; action: CaseAction }
	| { kind: 'uniform'; from: number; to: number; value: number; action: CaseAction }
	| { kind: 'linear'; from: number; to: number; start: number; end: number; action: CaseAction };

export type LoadHeight = 'top-flange' | 'shear-centre' | 'bottom-flange';

export interface CaseRestraint {
	/** Continuous (e.g. a slab on the top flange), only at the supports, or at given positions (m). */
	lateral: 'continuous' | 'ends-only' | number[];
	loadHeight: LoadHeight;
}

export interface CaseFactors {
	set?: string;
	permanent?: number;
	imposed?: number;
	temporary?: number;
	gammaM0?: number;
	gammaM1?: number;
	xi?: number;
	psi0?: number;
}

/** The JSON case file, SI units. */
export interface CaseFile {
	format: 'hingepoint.case';
	version: number;
	title?: string;
	beam: {
		spans: number[];
		supports: SupportChoice[];
		joints?: JointChoice[];
		section: CaseSection;
		grade?: string | { fy: number };
		/** Uniform thickness loss per exposed face, mm. */
		sectionLoss?: number;
		selfWeight?: boolean;
		restraint?: CaseRestraint;
		/** Stiff bearing lengths, mm. */
		bearing?: { supports?: number; loads?: number };
	};
	loads: CaseLoad[];
	factors?: CaseFactors;
	/** Deflection limit as span / this number. */
	deflectionLimit?: number;
}
