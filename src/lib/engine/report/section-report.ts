/**
 * Section and grade summaries for the report; the class comes from the design run.
 */
import type { SectionClassReading } from '../checks/run-design';
import type { SteelGrade } from '../material/types';
import type { ResolvedSection } from '../section/types';
import type { GradeReport, SectionReport } from './types';

/** The report entry of one span's section. */
export function reportSection(
	section: ResolvedSection,
	grade: SteelGrade | null,
	cls: SectionClassReading,
	rankWords: Record<string, string> = {}
): SectionReport {
	const rank = grade || section.shape === 'known-mp' ? cls.class : null;
	return {
		designation: section.designation,
		shape: section.shape,
		family: section.family ?? null,
		standard: section.standard ?? null,
		dims: section.dims ? { ...section.dims } : null,
		props: section.props ? { ...section.props } : null,
		loss: section.loss,
		class: rank,
		classWords: rank === null ? null : (rankWords[rank] ?? `Class ${rank}`),
		classNote: cls.note ?? (grade ? null : 'No grade given: the class was not found.')
	};
}

/** The report entry of one span's grade. */
export function reportGrade(grade: SteelGrade | null): GradeReport | null {
	if (!grade) return null;
	return {
		id: grade.id,
		name: grade.name,
		fy: grade.fy,
		fu: grade.fu,
		standard: grade.standard,
		source: grade.source,
		needsConfirmation: grade.needsConfirmation,
		note: grade.note ?? null
	};
}
