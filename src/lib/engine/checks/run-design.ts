/**
 * The one design run of a case: every number any surface reports (screen, command line, JSON,
 * share text) comes from here. The report only converts units and writes words, so no second
 * pipeline can answer the same question differently.
 */
import type { CaseModel } from '../case/types';
import type { DesignBasis } from './design-basis';
import type { FactorSettings } from './basis-types';
import { findBasis } from './bases';
import { buildDesignCheckInput } from './from-case';
import { computeGoverningCurve, type GoverningCurve } from './governing-curve';
import type { DesignCheckInput, DesignCheckOutcome } from './inputs';
import { runDesignChecks, type DesignRunOptions } from './run-checks';
import { decideAnswer, type Answer } from './answer';

/** A span's section class (EN 1993-1-1 Table 5.2) and any note on how it was found. */
export interface SectionClassReading {
	class: 1 | 2 | 3 | 4 | null;
	note?: string;
}

/** Everything the report of a case shows, internal units. */
export interface DesignOutcome {
	input: DesignCheckInput;
	/** Class per span, with that span's fy (235 MPa where no grade is given). */
	sectionClasses: SectionClassReading[];
	checked: DesignCheckOutcome;
	answer: Answer;
	/** The governing capacity curve, when asked for and the beam is in scope. */
	curve: GoverningCurve | null;
}

/** Options of {@link runDesign}. */
export interface DesignOptions {
	/** Also compute the governing capacity curve (one design run per position). */
	curve?: boolean;
	/** Overrides the basis the case names (tests). */
	basis?: DesignBasis<FactorSettings>;
}

/**
 * Runs the design checks of a validated case (parseCase has refused anything the solvers could
 * not take) and decides the answer.
 * @example
 * runDesign(model).answer.multiplier // the largest factor every deciding check allows
 */
export function runDesign(model: CaseModel, options: DesignOptions = {}): DesignOutcome {
	const basis = options.basis ?? findBasis(model.basis);
	// checkCase refuses a case whose basis is missing; no other basis may answer for it.
	if (!basis) throw new Error(`invariant: design basis "${model.basis}" is not available`);
	const input = buildDesignCheckInput(model);
	const run = (i: DesignCheckInput, o?: DesignRunOptions) => runDesignChecks(i, basis, o);
	const checked = run(input);
	const answer = decideAnswer(checked, model.loads);
	const inScope = checked.verdict.verdict !== 'outside-scope';
	const curve = options.curve && inScope ? computeGoverningCurve(input, run) : null;
	const sectionClasses = model.sections.map((sec, e) =>
		basis.classifySection(sec, model.grades[e]?.fy ?? 235)
	);
	return { input, sectionClasses, checked, answer, curve };
}
