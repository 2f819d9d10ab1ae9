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
export { readSetupBase, type TSetupBase } from "./server/read-setup-base";
// Plain words for an option's changes and the swept settings, for reports and other pages.
export { describeChange, PARAMETER_LABELS, parameterUnit } from "./lib/setup-choices";
