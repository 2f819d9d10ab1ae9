import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { getActor } from "@/features/auth/server/get-actor";
import { authNavItems } from "@/features/auth/nav";
import { UserMenu } from "@/features/auth/components/user-menu";
import { GlobalSearch } from "@/features/search/components/global-search";
import { isStaff } from "@/lib/authz/policy";
import { AppShell, type NavItem } from "@/lib/ui/app-shell";

/** Everything a signed-in member works in: navigation, search and the user menu. */
export default async function WorkspaceLayout({ children }: { children: ReactNode }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const nav: NavItem[] = [
    { href: "/dashboard", label: "Dashboard" },
    isStaff(actor)
      ? { href: "/customers", label: "Customers" }
      : { href: `/customers/${actor.customerId}`, label: "My details" },
    { href: "/machines", label: "Machines" },
    { href: "/duty-cycles", label: "Duty cycles" },
    { href: "/estimates", label: "Estimates" },
    ...authNavItems(actor),
  ];
  return (
    <AppShell
      nav={nav}
      userMenu={
        <div className="flex items-center gap-3">
          <GlobalSearch />
          <UserMenu />
        </div>
      }
    >
      {children}
    </AppShell>
  );
}
