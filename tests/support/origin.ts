/** The origin Auth.js answers with: AUTH_URL when the test command sets it, else the dev default. */
export const APP_ORIGIN = process.env.AUTH_URL ?? "http://localhost:3000";
