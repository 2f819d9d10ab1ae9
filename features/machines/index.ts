// Public server entry of the machines feature (machines, templates, the machine form and the
// geometry view). Client code imports features/machines/client.ts.
export { getMachine, loadMachine } from "./server/get-machine";
export { listMachines } from "./server/list-machines";
export type { TMachineDto, TMachineRow } from "./schemas/machine";
// Request schemas, also read by the OpenAPI document (features/api/openapi).
export { ZMachineRecordInput, ZMachineRecordPatch, ZCopyTemplateInput } from "./schemas/machine";
export { ZMachineListQuery } from "./schemas/machine-list-query";
