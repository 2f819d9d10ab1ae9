import { redirect } from "next/navigation";
import { getActor } from "@/features/auth/server/get-actor";
import { SearchResults } from "@/features/search/components/search-results";

export const metadata = { title: "Search" };

export default async function SearchPage({
  searchParams,
}: {
  searchParams: Promise<{ q?: string }>;
}) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const { q = "" } = await searchParams;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">Search{q ? `: “${q}”` : ""}</h1>
      <SearchResults q={q} />
    </div>
  );
}
