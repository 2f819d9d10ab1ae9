import { z } from "zod";
import { makeListQuery, uuidFilter } from "@/lib/query/list-query";

export const ZEstimateListQuery = makeListQuery(
  ["createdAt", "title", "machineName", "costPerHour", "hoursToFirstReplacement"],
  "createdAt",
).extend({
  customerId: uuidFilter,
  machineId: uuidFilter,
});
export type TEstimateListQuery = z.infer<typeof ZEstimateListQuery>;
