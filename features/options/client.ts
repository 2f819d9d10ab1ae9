// Public browser entry of the options feature: query hooks, key factories and components.
export {
  studyKeys,
  useComparison,
  useStudies,
  useSweep,
  comparisonOptions,
  sweepOptions,
} from "./api/studies";
export { StudiesTable } from "./components/studies-table";
export { describeChange, PARAMETER_LABELS, parameterUnit } from "./lib/setup-choices";
