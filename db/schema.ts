// Every table, for the drizzle client's relational queries. drizzle-kit reads db/tables/*.ts.
export * from "@/db/tables/tenancy";
export * from "@/db/tables/workspace";
export * from "@/db/tables/duty-cycles";
export * from "@/db/tables/accounts";
export * from "@/db/tables/billing";
export * from "@/db/tables/reports";
export * from "@/db/tables/readings";
export * from "@/db/tables/options";
export * from "@/db/tables/api";
