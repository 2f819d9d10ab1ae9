// Public browser entry of the machines feature: query hooks, key factories and components.
export { machineKeys, useMachine, useMachines } from "./api/machines";
export { MachinesTable } from "./components/machines-table";
export { LAYOUT_LABELS } from "./lib/steering-layouts";
