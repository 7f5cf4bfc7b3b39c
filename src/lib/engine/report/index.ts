/**
 * The check report: a plain, structured-cloneable CheckReport written from one design run.
 */
export { buildCheckReport, describeRestraint, type ReportOptions } from './build-report';
export { ENGINE_VERSION } from './version';
export type * from './types';
