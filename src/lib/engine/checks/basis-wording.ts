/**
 * The words of a basis as plain data for the report, which may not call into the checks.
 */
import type { ReportWording } from './basis-types';
import type { BasisFactors, DesignBasis } from './design-basis';

/**
 * The report's wording for a basis and its resolved factors.
 * @example writeReportWording(en1993, factors).notation.vRd // 'Vpl,Rd'
 */
export function writeReportWording(
	basis: DesignBasis<unknown>,
	factors: BasisFactors
): ReportWording {
	const w = basis.words;
	return {
		basisId: basis.id,
		short: w.short,
		notation: { ...w.notation },
		sectionRank: { ...w.sectionRank },
		factors: w.describeFactors(factors.table, factors.set),
		modulus: w.modulus,
		plasticAssumption: w.plasticAssumption,
		knownMpNotice: w.knownMpNotice
	};
}
