import Link from "next/link";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { listMyDealerships } from "@/features/auth/server/list-my-dealerships";
import { UserMenuDropdown } from "@/features/auth/components/user-menu-dropdown";

/**
 * The signed-in person's menu for the header: name, active dealership (with a switcher when
 * they belong to several), units and sign-out. Renders a sign-in link when signed out.
 */
export async function UserMenu() {
  const actor = await getActor();
  if (!actor) {
    return (
      <Link href="/sign-in" className="text-sm font-medium text-furrow-700 hover:underline">
        Sign in
      </Link>
    );
  }
  const dealerships = await listMyDealerships(getDb(), actor.userId);
  return (
    <UserMenuDropdown
      displayName={actor.name ?? actor.email}
      email={actor.email}
      unitSystem={actor.unitSystem}
      activeDealershipId={actor.dealershipId}
      dealerships={dealerships}
    />
  );
}
