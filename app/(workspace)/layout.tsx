import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { getActor } from "@/features/auth/server/get-actor";
import { authNavItems } from "@/features/auth/nav";
import { UserMenu } from "@/features/auth/components/user-menu";
import { GlobalSearch } from "@/features/search/components/global-search";
import { can, isStaff } from "@/lib/authz/policy";
import { AppShell, type NavItem } from "@/lib/ui/app-shell";

/** Everything a signed-in member works in: navigation, search and the user menu. */
export default async function WorkspaceLayout({ children }: { children: ReactNode }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  // A customer's account is the portal: their machines and what the dealer shared, never the
  // dealer's drafts, estimates or duty cycles.
  const nav: NavItem[] = isStaff(actor)
    ? [
        { href: "/dashboard", label: "Dashboard" },
        { href: "/customers", label: "Customers" },
        { href: "/machines", label: "Machines" },
        { href: "/duty-cycles", label: "Duty cycles" },
        { href: "/estimates", label: "Estimates" },
        { href: "/reports", label: "Reports" },
        { href: "/tyre-plan", label: "Tyre plan" },
        ...(can(actor, "billing:read") ? [{ href: "/billing", label: "Report plan" }] : []),
        ...authNavItems(actor),
        ...(can(actor, "staff:manage")
          ? [
              { href: "/settings/branding", label: "Branding" },
              { href: "/settings/api-tokens", label: "API tokens" },
            ]
          : []),
      ]
    : [
        { href: "/dashboard", label: "Home" },
        { href: "/reports", label: "Reports" },
        ...(can(actor, "billing:read") ? [{ href: "/billing", label: "Report plan" }] : []),
        { href: "/tyre-plan", label: "My tyre plan" },
        { href: `/customers/${actor.customerId}`, label: "My details" },
      ];
  return (
    <AppShell
      nav={nav}
      userMenu={
        <div className="flex items-center gap-3">
          {isStaff(actor) ? <GlobalSearch /> : null}
          <UserMenu />
        </div>
      }
    >
      {children}
    </AppShell>
  );
}
