/**
 * The scope gate: which analysis route the verdict may rest on, by section class
 * (EN 1993-1-1 5.5, 5.6 and 6.2), material ductility (3.2.2) and member stability at hinges
 * (6.3.5), and what puts a beam outside this tool.
 */
import type { ScopeInput, ScopeDecision } from '../basis-types';
export type { SectionClass, ScopeInput, ScopeDecision } from '../basis-types';

/**
 * Decides the analysis route.
 * @example
 * decideRoute({ sectionClass: 2, ductile: true, gradeConfirmed: true,
 *   needsShearBucklingCheck: false, collapseCertified: true, hingesRestrained: true }).route
 * // 'elastic-plastic-section'
 */
export function decideRoute(s: ScopeInput): ScopeDecision {
	const out: string[] = [];
	if (!s.ductile) {
		out.push('The material is not ductile steel (cast or wrought iron): not assessed here.');
	}
	if (!s.gradeConfirmed) {
		out.push(
			'The steel grade is unknown and has not been confirmed: confirm the assumed strength ' +
				'(or enter a grade from drawings or tests) to bring the beam into scope.'
		);
	}
	if (s.sectionClass === 4) {
		out.push(
			'The section is Class 4 (EN 1993-1-1 5.5): local buckling is outside this tool. ' +
				'Only a stockier section (Class 3 or better) comes into scope.'
		);
	}
	if (s.needsShearBucklingCheck) {
		out.push(
			'The web needs a shear buckling check (hw/tw > 72ε/η, EN 1993-1-1 6.2.6(6)): ' +
				'outside this tool; an engineer must check the web (EN 1993-1-5 §5).'
		);
	}
	out.push(...(s.otherReasons ?? []));
	if (out.length > 0) return { route: 'outside-scope', reasons: out };
	if (s.sectionClass === 3) {
		return {
			route: 'elastic-first-yield',
			reasons: [
				'Class 3 section: elastic analysis with the elastic resistance Wel·fy (EN 1993-1-1 6.2.5).'
			]
		};
	}
	if (s.sectionClass === 2) {
		return {
			route: 'elastic-plastic-section',
			reasons: [
				'Class 2 section: no rotation capacity for plastic hinges (EN 1993-1-1 5.6), so ' +
					'elastic analysis with the plastic resistance Wpl·fy, up to the first hinge.'
			]
		};
	}
	if (!s.hingesRestrained) {
		return {
			route: 'elastic-plastic-section',
			reasons: [
				'A plastic hinge would form where the compression flange is not restrained enough ' +
					`(EN 1993-1-1 6.3.5${s.hingeRestraintNote ? `: ${s.hingeRestraintNote}` : ''}), ` +
					'so plastic analysis is not used: elastic analysis with the plastic resistance ' +
					'and the buckling resistance Mb,Rd.'
			]
		};
	}
	if (!s.collapseCertified) {
		return {
			route: 'outside-scope',
			reasons: [
				'The plastic collapse solution could not be verified by statics (its bounds do not ' +
					'meet), so no capacity is given.'
			]
		};
	}
	return {
		route: 'plastic',
		reasons: [
			'Class 1 section, ductile steel, hinges restrained: plastic collapse analysis ' +
				'(EN 1993-1-1 5.4.3, 5.6).'
		]
	};
}
