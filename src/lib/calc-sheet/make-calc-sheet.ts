/**
 * The calc sheet as a file, loaded on demand with the PDF library: the app's version is added
 * here, so the first screen carries neither.
 */
import { version as APP_VERSION } from '../../../package.json';
import { buildCalcSheet } from './build-calc-sheet';
import { sheetFileName } from './deliver-file';
import type { SheetContext } from './sheet-context';
import type { SheetReport } from './sheet-report';

export async function makeCalcSheet(
	report: SheetReport,
	context: Omit<SheetContext, 'appVersion'>
): Promise<File> {
	const bytes = await buildCalcSheet(report, { ...context, appVersion: APP_VERSION });
	return new File([bytes as BlobPart], sheetFileName(context.title), { type: 'application/pdf' });
}
