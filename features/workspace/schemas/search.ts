export type TSearchHit = {
  type: "customer" | "machine";
  id: string;
  title: string;
  subtitle: string;
  href: string;
};
export type TSearchResult = { q: string; customers: TSearchHit[]; machines: TSearchHit[] };
