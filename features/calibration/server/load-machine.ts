export { loadMachine } from "@/features/machines";
