/**
 * The scope gate of the AISC bases: which analysis route the answer may rest on. Plastic
 * collapse (design by inelastic analysis, AISC 360-22 Appendix 1) only on LRFD — Appendix 1.1
 * makes it an LRFD method — and only where hinges may form: sections compact to λpd (1.3.2b),
 * Fy ≤ 65 ksi (1.3.2a) and the unbraced length next to each hinge within Lpd (1.3.2c), all from
 * memory of the Appendix (engineering reference C.5, tagged "verify"). Otherwise elastic
 * analysis with the available flexural strength of Chapter F, named in the reasons.
 */
import type { ScopeDecision, ScopeInput } from '../basis-types';
import type { AiscMethod } from './resistance';

/**
 * Decides the analysis route on an AISC basis.
 * @example
 * decideAiscRoute({ sectionClass: 1, ductile: true, gradeConfirmed: true,
 *   needsShearBucklingCheck: false, collapseCertified: true, hingesRestrained: true }, 'asd').route
 * // 'elastic-plastic-section' (ASD never uses plastic collapse)
 */
export function decideAiscRoute(s: ScopeInput, method: AiscMethod): ScopeDecision {
	const out: string[] = [];
	if (!s.ductile) {
		out.push('The material is not ductile steel (cast or wrought iron): not assessed here.');
	}
	if (!s.gradeConfirmed) {
		out.push(
			'The steel grade is unknown and has not been confirmed: confirm the assumed yield ' +
				'stress (or enter a grade from drawings or tests) to bring the beam into scope.'
		);
	}
	if (s.sectionClass === 4) {
		out.push(
			'The section has a slender element (AISC 360-22 Table B4.1b), or a noncompact I-shape ' +
				'web (F4, F5), which this tool does not cover. Only a section with compact or ' +
				'noncompact elements comes into scope.'
		);
	}
	if (s.needsShearBucklingCheck) {
		out.push(
			'The web is more slender than h/tw = 260, beyond the shear strength of AISC 360-22 G2.1 ' +
				'used here: an engineer must check the web.'
		);
	}
	out.push(...(s.otherReasons ?? []));
	if (out.length > 0) return { route: 'outside-scope', reasons: out };
	if (s.sectionClass === 3) {
		return {
			route: 'elastic-first-yield',
			reasons: [
				'Noncompact section (AISC 360-22 Table B4.1b): elastic analysis with the flexural ' +
					'strength of F3 or F7/F8 (local buckling), and lateral-torsional buckling per ' +
					'unbraced segment.'
			]
		};
	}
	const elastic =
		'elastic analysis (AISC 360-22 Chapter C) with the available flexural strength of ' +
		'Chapter F for each unbraced segment';
	if (method === 'asd') {
		return {
			route: 'elastic-plastic-section',
			reasons: [
				'ASD basis: design by inelastic analysis (Appendix 1) is an LRFD method, so plastic ' +
					`collapse is not used: ${elastic}, Mn/Ωb. The Appendix 8 redistribution of ` +
					'negative moments is not taken.'
			]
		};
	}
	if (s.sectionClass === 2) {
		return {
			route: 'elastic-plastic-section',
			reasons: [
				'Compact section, but not compact to λpd of Appendix 1 (1.3.2b) or Fy above 65 ksi ' +
					`(1.3.2a): no plastic hinges, so ${elastic}, φbMn.`
			]
		};
	}
	if (!s.hingesRestrained) {
		const note = s.hingeRestraintNote ? `: ${s.hingeRestraintNote}` : '';
		return {
			route: 'elastic-plastic-section',
			reasons: [
				'A plastic hinge would form where the compression flange is not braced enough ' +
					`(AISC 360-22 Appendix 1, 1.3.2c${note}), so plastic collapse is not used: ` +
					`${elastic}, φbMn, with Lb, Lp, Lr and Cb (F2).`
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
			'Compact to λpd, Fy ≤ 65 ksi, ductile steel, hinges braced within Lpd: design by ' +
				'inelastic analysis, plastic collapse with φb = 0.90 on Mp (AISC 360-22 Appendix 1).'
		]
	};
}
