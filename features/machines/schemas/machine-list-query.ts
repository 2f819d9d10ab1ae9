import { z } from "zod";
import { makeListQuery, uuidFilter } from "@/lib/query/list-query";

export const ZMachineListQuery = makeListQuery(
  ["name", "kind", "layout", "updatedAt", "customerName"],
  "name",
).extend({
  customerId: uuidFilter,
  layout: z.string().trim().max(40).optional(),
  /** "true": dealership templates only; "false": customers' machines only. */
  template: z.enum(["true", "false"], { error: "template must be true or false." }).optional(),
});
export type TMachineListQuery = z.infer<typeof ZMachineListQuery>;
