// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen } from "@testing-library/react";
import { AppRouterContext } from "next/dist/shared/lib/app-router-context.shared-runtime";
import { afterEach, describe, expect, it, vi } from "vitest";
import { InvoiceTable } from "@/features/billing/components/invoice-table";
import { DutyCyclesTable } from "@/features/duty-cycles/components/duty-cycles-table";
import { dutyCycleKeys, DEFAULT_DUTY_CYCLE_LIST } from "@/features/duty-cycles/api/duty-cycles";
import { formatDate } from "@/lib/format/format";

// One date format on every list: "2 Dec 2026", never "02/12/2026" on one and words on another.
vi.mock("next/navigation", () => ({
  useRouter: () => ({ push: () => {}, replace: () => {} }),
  usePathname: () => "/duty-cycles",
  useSearchParams: () => new URLSearchParams(),
}));

afterEach(cleanup);

const CREATED = "2026-12-02T10:30:00.000Z";

describe("dates on lists", () => {
  it("the shared format reads day, short month, year", () => {
    expect(formatDate(CREATED)).toBe("2 Dec 2026");
  });

  it("invoices show their date in the shared format", () => {
    render(
      <InvoiceTable
        invoices={[
          {
            id: "in_1",
            number: "TC-0001",
            createdAt: CREATED,
            amountMinor: 4900,
            currency: "GBP",
            status: "paid",
            pdfUrl: null,
          },
        ]}
      />,
    );
    expect(screen.getByText("2 Dec 2026")).toBeTruthy();
    expect(screen.queryByText("02/12/2026")).toBeNull();
  });

  it("duty cycles show their date in the shared format", () => {
    const client = new QueryClient();
    client.setQueryData(dutyCycleKeys.list(DEFAULT_DUTY_CYCLE_LIST), {
      items: [
        {
          id: "5d7c3a2b-1e0f-4a9b-8c7d-6e5f4a3b2c1d",
          name: "Spring drilling",
          customerId: "7f1c7a5e-1d1e-4c59-9a52-2f7c62f1b1a1",
          customerName: "Hollow Lane Farm",
          machineId: null,
          source: "builder",
          status: "ready",
          progress: 1,
          operatingHours: null,
          turnsPerHour: 40,
          createdAt: CREATED,
          updatedAt: CREATED,
        },
      ],
      page: 1,
      pageSize: 25,
      total: 1,
      pageCount: 1,
    });
    render(
      <AppRouterContext.Provider value={{} as never}>
        <QueryClientProvider client={client}>
          <DutyCyclesTable canWrite />
        </QueryClientProvider>
      </AppRouterContext.Provider>,
    );
    expect(screen.getByText("2 Dec 2026")).toBeTruthy();
    expect(screen.queryByText("02/12/2026")).toBeNull();
  });
});
