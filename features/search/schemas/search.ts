import { z } from "zod";

export const ZSearchQuery = z.object({
  q: z
    .string({ error: "q is required." })
    .trim()
    .min(2, "Type at least 2 characters to search.")
    .max(100, "Search text must be at most 100 characters."),
  limit: z.coerce.number().int().min(1).max(20, "limit must be at most 20.").default(8),
});
export type TSearchQuery = z.infer<typeof ZSearchQuery>;

export type TSearchHit = {
  type: "customer" | "machine";
  id: string;
  title: string;
  subtitle: string;
  href: string;
};
export type TSearchResult = { q: string; customers: TSearchHit[]; machines: TSearchHit[] };
