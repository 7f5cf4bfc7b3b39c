/**
 * The design bases the engine knows, and the default. The one place basis-neutral code reaches a
 * basis folder from (the layering test exempts this file only).
 */
import type { FactorSettings } from './basis-types';
import type { DesignBasis } from './design-basis';
import { en1993 } from './en1993/index';

/** The basis a case is checked on when it names none. */
export const DEFAULT_BASIS: DesignBasis<FactorSettings> = en1993;
