// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { listState } from "@/lib/query/list-state";
import { EmptyState } from "@/lib/ui/empty-state";
import { ServerDataTable } from "@/lib/ui/server-data-table";

afterEach(cleanup);

const emptyPage = {
  data: { items: [], page: 1, pageSize: 25, total: 0, pageCount: 0 },
  isPending: false,
  isError: false,
  error: null,
  isFetching: false,
  refetch: () => {},
};

function show(filters: Record<string, string>, q = "") {
  render(
    <ServerDataTable<{ id: string }>
      caption="Machines"
      columns={[{ id: "name", header: "Name", cell: ({ row }) => row.original.id }]}
      state={listState({ sort: "name", q, filters })}
      onStateChange={() => {}}
      query={emptyPage}
      searchLabel="Find a machine"
      getRowId={(r) => r.id}
      scopeKeys={["customerId"]}
      empty={
        <EmptyState title="No machines yet" action={<button type="button">Add a machine</button>} />
      }
    />,
  );
}

describe("empty tables", () => {
  it("on a new customer's page say what is missing and offer the action, not 'nothing matches'", () => {
    show({ customerId: "7f1c7a5e-1d1e-4c59-9a52-2f7c62f1b1a1" });
    expect(screen.getByText("No machines yet")).toBeTruthy();
    expect(screen.getByRole("button", { name: "Add a machine" })).toBeTruthy();
    expect(screen.queryByText(/Nothing matches these filters/)).toBeNull();
  });

  it("say 'nothing matches' only when the user has set a filter or a search", () => {
    show({ customerId: "7f1c7a5e-1d1e-4c59-9a52-2f7c62f1b1a1", layout: "skid" });
    expect(screen.getByText(/Nothing matches these filters/)).toBeTruthy();
    cleanup();
    show({}, "quillby");
    expect(screen.getByText(/Nothing matches these filters/)).toBeTruthy();
  });
});

describe("search box", () => {
  const onePage = {
    ...emptyPage,
    data: { items: [{ id: "row-1" }], page: 1, pageSize: 25, total: 1, pageCount: 1 },
  };
  function showWithLink(onStateChange: (s: unknown) => void) {
    render(
      <ServerDataTable<{ id: string }>
        caption="Machines"
        columns={[
          {
            id: "name",
            header: "Name",
            cell: ({ row }) => (
              // The link does not navigate in jsdom; the click alone is what matters.
              <a href={`#${row.original.id}`} onClick={(e) => e.preventDefault()}>
                {row.original.id}
              </a>
            ),
          },
        ]}
        state={listState({ sort: "name" })}
        onStateChange={onStateChange}
        query={onePage}
        searchLabel="Find a machine"
        getRowId={(r) => r.id}
        empty={null}
      />,
    );
  }
  afterEach(() => vi.useRealTimers());

  it("applies the text once typing pauses", () => {
    vi.useFakeTimers();
    const changes: unknown[] = [];
    showWithLink((s) => changes.push(s));
    fireEvent.change(screen.getByLabelText("Find a machine"), { target: { value: "yard" } });
    expect(changes).toEqual([]);
    act(() => vi.advanceTimersByTime(300));
    expect(changes).toEqual([expect.objectContaining({ q: "yard", page: 1 })]);
  });

  it("drops a search still waiting when the user follows a link out of the list", () => {
    vi.useFakeTimers();
    const changes: unknown[] = [];
    showWithLink((s) => changes.push(s));
    fireEvent.change(screen.getByLabelText("Find a machine"), { target: { value: "yard" } });
    fireEvent.click(screen.getByRole("link", { name: "row-1" }));
    act(() => vi.advanceTimersByTime(300));
    expect(changes).toEqual([]);
    // Typing again means the user stayed: the search applies as usual.
    fireEvent.change(screen.getByLabelText("Find a machine"), { target: { value: "yard 2" } });
    act(() => vi.advanceTimersByTime(300));
    expect(changes).toEqual([expect.objectContaining({ q: "yard 2" })]);
  });
});
