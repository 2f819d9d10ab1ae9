import type { NavItem } from "@/lib/ui/app-shell";
import type { TActor } from "@/lib/authz/actor";
import { can, type TAction } from "@/lib/authz/policy";

/** Navigation entries the accounts feature adds, each shown only to roles that may use it. */
export const AUTH_NAV: (NavItem & { requires: TAction })[] = [
  { href: "/team", label: "Team", requires: "staff:manage" },
  { href: "/audit", label: "Audit log", requires: "audit:read" },
];

/** The entries this actor may see, ready for AppShell's `nav`. */
export function authNavItems(actor: TActor | null): NavItem[] {
  if (!actor) return [];
  return AUTH_NAV.filter((item) => can(actor, item.requires)).map(({ href, label }) => ({
    href,
    label,
  }));
}
