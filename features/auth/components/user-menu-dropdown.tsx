"use client";

import * as Menu from "@radix-ui/react-dropdown-menu";
import Link from "next/link";
import { useTransition } from "react";
import { toast } from "@/lib/ui/toast";
import {
  signOutAction,
  switchDealershipAction,
} from "@/features/auth/server/actions/session-actions";

type Props = {
  displayName: string;
  email: string;
  unitSystem: "metric" | "imperial";
  activeDealershipId: string;
  dealerships: { id: string; name: string }[];
};

const item =
  "flex min-h-10 cursor-pointer select-none items-center rounded px-3 text-sm text-ink-800 outline-none data-[highlighted]:bg-furrow-50 data-[highlighted]:text-furrow-800";

export function UserMenuDropdown(props: Props) {
  const [pending, startTransition] = useTransition();
  const active = props.dealerships.find((d) => d.id === props.activeDealershipId);

  function switchTo(id: string) {
    const form = new FormData();
    form.set("dealershipId", id);
    startTransition(async () => {
      const result = await switchDealershipAction(undefined, form);
      if (!result.ok) toast.error(result.message ?? "Could not switch dealership.");
    });
  }

  return (
    <Menu.Root>
      <Menu.Trigger
        className="flex h-11 items-center gap-2 rounded-md border border-ink-200 px-3 text-left text-sm hover:bg-ink-100"
        aria-busy={pending || undefined}
      >
        <span className="flex flex-col leading-tight">
          <span className="font-medium text-ink-900">{props.displayName}</span>
          {active ? <span className="text-xs text-ink-600">{active.name}</span> : null}
        </span>
        <span aria-hidden className="text-ink-500">
          ▾
        </span>
      </Menu.Trigger>
      <Menu.Portal>
        <Menu.Content
          align="end"
          sideOffset={6}
          className="z-50 min-w-60 rounded-md border border-ink-200 bg-white p-1 shadow-lg"
        >
          <Menu.Label className="px-3 py-2 text-xs text-ink-600">{props.email}</Menu.Label>
          {props.dealerships.length > 1 ? (
            <>
              <Menu.Separator className="my-1 h-px bg-ink-200" />
              <Menu.Label className="px-3 pt-1 text-xs font-medium uppercase text-ink-600">
                Dealership
              </Menu.Label>
              <Menu.RadioGroup value={props.activeDealershipId} onValueChange={switchTo}>
                {props.dealerships.map((d) => (
                  <Menu.RadioItem key={d.id} value={d.id} className={item}>
                    <Menu.ItemIndicator className="mr-2">✓</Menu.ItemIndicator>
                    {d.name}
                  </Menu.RadioItem>
                ))}
              </Menu.RadioGroup>
            </>
          ) : null}
          <Menu.Separator className="my-1 h-px bg-ink-200" />
          <Menu.Item asChild className={item}>
            <Link href="/account">
              Account and units ({props.unitSystem === "metric" ? "metric" : "imperial"})
            </Link>
          </Menu.Item>
          <Menu.Item className={item} onSelect={() => startTransition(async () => signOutAction())}>
            Sign out
          </Menu.Item>
        </Menu.Content>
      </Menu.Portal>
    </Menu.Root>
  );
}
