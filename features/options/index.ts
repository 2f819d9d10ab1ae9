/**
 * Options: comparisons of machine variants and parameter sweeps, stored like estimates.
 * Public entry for higher features (reports read comparisons through `readComparison` and
 * `readComparisonSource`).
 */
export type {
  TComparisonDto,
  TSweepDto,
  TStudyRow,
  TStudyPage,
  TStudyKind,
  TComparisonCreate,
  TSweepCreate,
} from "./schemas/study";
export { ZComparisonCreate, ZSweepCreate, ZStudyListQuery } from "./schemas/study";
export { readComparison, readSweep } from "./server/read-study";
export { readComparisonSource } from "./server/read-comparison-source";
