import { z } from "zod";
import { makeListQuery, uuidFilter } from "@/lib/query/list-query";
import { ZCustomerKind } from "@/features/customers/schemas/customer";

export const ZCustomerListQuery = makeListQuery(
  ["name", "kind", "updatedAt", "createdAt"],
  "name",
).extend({
  kind: ZCustomerKind.optional(),
});
export type TCustomerListQuery = z.infer<typeof ZCustomerListQuery>;

export const ZSiteListQuery = makeListQuery(["name", "updatedAt"], "name").extend({
  customerId: uuidFilter,
});
export type TSiteListQuery = z.infer<typeof ZSiteListQuery>;
