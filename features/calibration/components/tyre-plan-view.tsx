"use client";

import { useState } from "react";
import type { TPlanItem, TPlanStatus } from "@/lib/calibration";
import { Card } from "@/lib/ui/card";
import { Select } from "@/lib/ui/input";
import { toQueryString } from "@/lib/query/api-fetch";
import { useTyrePlan } from "@/features/calibration/api/calibration";
import { PlanTimeline } from "@/features/calibration/components/plan-timeline";
import {
  formatDay,
  formatDepth,
  formatHours,
  formatMoney,
  POSITION_NAMES,
  type TUnitSystem,
} from "@/features/calibration/components/format";
import { ChoiceOptions } from "@/lib/ui/choice-options";

const STATUS: Record<TPlanStatus, string> = {
  planned: "",
  "due-now": "due now",
  "no-reading": "no reading yet",
  "no-usage": "read the hour meter again to date it",
  "no-wear": "no wear predicted",
  "no-estimate": "no estimate yet",
};

const monthName = (m: string) =>
  new Date(`${m}-01T00:00:00Z`).toLocaleDateString("en-GB", {
    month: "long",
    year: "numeric",
    timeZone: "UTC",
  });

function ItemRow({
  i,
  system,
  showCustomer,
}: {
  i: TPlanItem;
  system: TUnitSystem;
  showCustomer: boolean;
}) {
  return (
    <tr className="border-t border-ink-100" data-machine={i.machineId} data-position={i.position}>
      {showCustomer ? <td className="py-2 pr-2">{i.customerName}</td> : null}
      <td className="py-2 pr-2">{i.machineName}</td>
      <td className="py-2 pr-2">{POSITION_NAMES[i.position]}</td>
      <td className="py-2 pr-2">{i.designation}</td>
      <td className="py-2 pr-2">{formatDepth(system, i.depthNow)}</td>
      <td className="py-2 pr-2">{formatHours(i.hoursLeft)}</td>
      <td className="py-2 pr-2" data-testid="due-on">
        {i.dueOn ? formatDay(i.dueOn) : STATUS[i.status]}
        {i.status === "due-now" ? " (due now)" : ""}
      </td>
      <td className="py-2">{i.calibrated ? "calibrated" : "model only"}</td>
    </tr>
  );
}

/** The tyre plan: timeline, monthly order table with cost, what is due soon, and every position. */
export function TyrePlanView({
  system,
  customers,
  fixedCustomerId,
}: {
  system: TUnitSystem;
  /** Staff may narrow the plan to one customer; a customer account sees only its own. */
  customers: { id: string; name: string }[] | null;
  fixedCustomerId?: string;
}) {
  const [customerId, setCustomerId] = useState(fixedCustomerId ?? "");
  const [months, setMonths] = useState("12");
  const query: Record<string, string> = { months, ...(customerId ? { customerId } : {}) };
  const { data, error, isPending } = useTyrePlan(query);
  const showCustomer = customers !== null && !customerId;
  return (
    <div className="flex flex-col gap-5">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <h1 className="text-2xl font-bold text-ink-900">Tyre plan</h1>
        <div className="flex flex-wrap items-end gap-3">
          {customers ? (
            <label className="flex flex-col text-sm">
              Customer
              <Select
                value={customerId}
                onChange={(e) => setCustomerId(e.target.value)}
                className="min-w-48"
              >
                <option value="">Whole dealership</option>
                <ChoiceOptions choices={customers} />
              </Select>
            </label>
          ) : null}
          <label className="flex flex-col text-sm">
            Period
            <Select value={months} onChange={(e) => setMonths(e.target.value)}>
              {["3", "6", "12", "24"].map((m) => (
                <option key={m} value={m}>
                  next {m} months
                </option>
              ))}
            </Select>
          </label>
          <a
            href={`/api/v1/tyre-plan/csv${toQueryString(query)}`}
            className="inline-flex h-11 items-center rounded-md border border-ink-300 bg-white px-4 font-medium text-ink-800 hover:bg-ink-100"
          >
            Download CSV
          </a>
        </div>
      </header>
      {isPending ? <p>Loading the plan…</p> : null}
      {error ? <p role="alert">Could not load the plan: {error.message}</p> : null}
      {data ? (
        <>
          <p className="text-sm text-ink-700">
            Due dates follow from the last tread reading, the wear predicted for each tyre
            (calibrated on measured wear where the readings allow) and each machine&apos;s hours per
            week from its hour meter. Prices in {data.currency}. Tyre sizes, load and pressure must
            match the tyre and machine makers&apos; data.
          </p>
          <Card title={`Due in the next 90 days (${data.dueSoon.length})`}>
            {data.dueSoon.length === 0 ? (
              <p className="text-ink-700">Nothing is due in the next 90 days.</p>
            ) : (
              <ul className="divide-y divide-ink-100 text-sm" data-testid="due-soon">
                {data.dueSoon.map((i) => (
                  <li
                    key={`${i.machineId}-${i.position}`}
                    className="flex justify-between gap-2 py-2"
                  >
                    <span>
                      {i.machineName} · {POSITION_NAMES[i.position]} · {i.designation}
                    </span>
                    <span>{formatDay(i.dueOn)}</span>
                  </li>
                ))}
              </ul>
            )}
          </Card>
          <Card title="Timeline">
            <div className="overflow-x-auto">
              <PlanTimeline items={data.items} today={data.today} until={data.until} />
            </div>
          </Card>
          <Card title="Tyres to order per month">
            {data.orders.length === 0 ? (
              <p className="text-ink-700">No tyres to order in this period.</p>
            ) : (
              <div className="overflow-x-auto">
                <table className="w-full min-w-[28rem] text-sm" data-testid="orders">
                  <thead>
                    <tr className="text-left text-ink-600">
                      <th className="py-1 pr-2">Month</th>
                      <th className="py-1 pr-2">Tyre size</th>
                      <th className="py-1 pr-2">Tyres</th>
                      <th className="py-1 pr-2">Each</th>
                      <th className="py-1">Cost</th>
                    </tr>
                  </thead>
                  <tbody>
                    {data.orders.map((o) => (
                      <tr
                        key={`${o.month}-${o.designation}-${o.unitPrice}`}
                        className="border-t border-ink-100"
                      >
                        <td className="py-2 pr-2">{monthName(o.month)}</td>
                        <td className="py-2 pr-2">{o.designation}</td>
                        <td className="py-2 pr-2">{o.count}</td>
                        <td className="py-2 pr-2">{formatMoney(o.unitPrice, data.currency)}</td>
                        <td className="py-2">{formatMoney(o.total, data.currency)}</td>
                      </tr>
                    ))}
                  </tbody>
                  <tfoot>
                    <tr className="border-t-2 border-ink-300 font-medium">
                      <td className="py-2" colSpan={4}>
                        Total
                      </td>
                      <td className="py-2">
                        {formatMoney(
                          data.orders.reduce((s, o) => s + o.total, 0),
                          data.currency,
                        )}
                      </td>
                    </tr>
                  </tfoot>
                </table>
              </div>
            )}
          </Card>
          <Card title="Every tyre">
            <div className="overflow-x-auto">
              <table className="w-full min-w-[40rem] text-sm" data-testid="plan-items">
                <thead>
                  <tr className="text-left text-ink-600">
                    {showCustomer ? <th className="py-1 pr-2">Customer</th> : null}
                    <th className="py-1 pr-2">Machine</th>
                    <th className="py-1 pr-2">Position</th>
                    <th className="py-1 pr-2">Size</th>
                    <th className="py-1 pr-2">Depth now</th>
                    <th className="py-1 pr-2">Hours left</th>
                    <th className="py-1 pr-2">Due</th>
                    <th className="py-1">Wear</th>
                  </tr>
                </thead>
                <tbody>
                  {data.items.map((i) => (
                    <ItemRow
                      key={`${i.machineId}-${i.position}`}
                      i={i}
                      system={system}
                      showCustomer={showCustomer}
                    />
                  ))}
                </tbody>
              </table>
            </div>
          </Card>
        </>
      ) : null}
    </div>
  );
}
