import { describe, expect, it } from "vitest";
import { readUrlState, writeUrlState } from "@/lib/ui/use-url-state";

const defaults = { page: 1, pageSize: 25, sort: "name", dir: "asc", q: "" };

describe("table state in the URL", () => {
  it("reads page, sort, search and filters over the defaults, numbers as numbers", () => {
    const state = readUrlState(
      new URLSearchParams("page=3&sort=updatedAt&dir=desc&q=vale&layout=skid&other=x"),
      defaults,
      "",
      ["layout"],
    );
    expect(state).toEqual({
      page: 3,
      pageSize: 25,
      sort: "updatedAt",
      dir: "desc",
      q: "vale",
      layout: "skid",
    });
  });

  it("ignores a page that is not a whole number of 1 or more", () => {
    for (const page of ["0", "-2", "1.5", "two"])
      expect(readUrlState(new URLSearchParams({ page }), defaults).page).toBe(1);
  });

  it("writes only what differs from the defaults and keeps other tables' parameters", () => {
    const params = writeUrlState(
      new URLSearchParams("e_page=2"),
      { ...defaults, page: 4, q: "", layout: "" },
      defaults,
      "m_",
      ["layout"],
    );
    expect(params.toString()).toBe("e_page=2&m_page=4");
    // Back to the defaults: the table's parameters go, the other table's stay.
    expect(writeUrlState(params, defaults, defaults, "m_").toString()).toBe("e_page=2");
  });

  it("round-trips a state through the query string (what a shared link carries)", () => {
    const state = {
      ...defaults,
      page: 2,
      sort: "createdAt",
      dir: "desc",
      q: "Fen Farm",
      kind: "farm",
    };
    const query = writeUrlState(new URLSearchParams(), state, defaults, "", ["kind"]).toString();
    expect(readUrlState(new URLSearchParams(query), defaults, "", ["kind"])).toEqual(state);
  });
});
