/**
 * The calc sheet as a file, loaded on demand with the PDF library: the app's version is added
 * here, so the first screen carries neither.
 */
import { version as APP_VERSION } from '../../../package.json';
import { buildCalcSheet } from './build-calc-sheet';
import { sheetFileName } from './deliver-file';
import type { SheetContext } from './sheet-context';
import type { SheetReport } from './sheet-report';
import { readSheetPhotos } from './sheet-photos';

/** The sheet as a PDF file; `photos` (stored blobs with captions) go on pages after it. */
export async function makeCalcSheet(
	report: SheetReport,
	context: Omit<SheetContext, 'appVersion'>,
	photos: { blob: Blob; caption: string }[] = []
): Promise<File> {
	const sheetPhotos = await readSheetPhotos(photos);
	const bytes = await buildCalcSheet(report, { ...context, appVersion: APP_VERSION }, sheetPhotos);
	return new File([bytes as BlobPart], sheetFileName(context.title), { type: 'application/pdf' });
}
