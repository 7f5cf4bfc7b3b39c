/**
 * The check report: assembly of a plain, structured-cloneable CheckReport from a validated case.
 */
export { buildCheckReport, type ReportOptions } from './build-report';
export { buildDesignLoads, type DesignLoadSet } from './design-loads';
export { computeSpanResistances, type SpanResistances } from './resistance';
export { ENGINE_VERSION } from './version';
export type * from './types';
