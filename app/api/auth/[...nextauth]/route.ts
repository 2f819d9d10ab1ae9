import { handlers } from "@/features/auth/server/auth-config";

// Auth.js endpoints (sign-in, callback, sign-out, session, csrf). Public by design.
export const { GET, POST } = handlers;
