import "server-only";
// The workspace's refusal type and respond() already map to the API's error shape.
export {
  WorkspaceError as CalibrationError,
  notFound,
  forbidden,
  parseOrThrow,
} from "@/features/workspace/server/errors";
