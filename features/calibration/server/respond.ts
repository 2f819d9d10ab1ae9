export { pathId, queryOf, readJson, respond } from "@/features/platform";
