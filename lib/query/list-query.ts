import { z } from "zod";

/** Largest page a list endpoint returns; a bigger request is refused, not silently cut. */
export const MAX_PAGE_SIZE = 100;
export const DEFAULT_PAGE_SIZE = 25;

const optionalText = z
  .string()
  .trim()
  .max(100, "Search text must be at most 100 characters.")
  .optional()
  .transform((v) => (v ? v : undefined));

/** Paging, sorting and text filter shared by every list; `sorts` are the columns it may sort by. */
export function makeListQuery<const S extends readonly [string, ...string[]]>(
  sorts: S,
  defaultSort: S[number],
) {
  return z.object({
    page: z.coerce
      .number({ error: "page must be a whole number of 1 or more." })
      .int("page must be a whole number of 1 or more.")
      .min(1, "page must be a whole number of 1 or more.")
      .default(1),
    pageSize: z.coerce
      .number({ error: `pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.` })
      .int(`pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.`)
      .min(1, `pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.`)
      .max(MAX_PAGE_SIZE, `pageSize must be at most ${MAX_PAGE_SIZE}.`)
      .default(DEFAULT_PAGE_SIZE),
    sort: z
      .enum(sorts, { error: `sort must be one of: ${sorts.join(", ")}.` })
      .default(defaultSort as S[number]),
    dir: z.enum(["asc", "desc"], { error: "dir must be asc or desc." }).default("asc"),
    q: optionalText,
  });
}

/** An optional id filter (`customerId`, `machineId`) on a list. */
export const uuidFilter = z.uuid("Must be an id (UUID).").optional();

/** One page of a list as every list endpoint answers it. */
export type TPage<T> = {
  items: T[];
  page: number;
  pageSize: number;
  total: number;
  pageCount: number;
};
