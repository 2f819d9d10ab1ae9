// Public server entry of the auth feature (accounts, dealerships, roles, invitations, mail).
export { getActor } from "./server/get-actor";
export { getMailer, type TMail, type TMailer } from "./server/mailer";
export { issueInvitation } from "./server/invite-member";
export { getActorFromRequest } from "./server/get-actor";
export { recordAudit, type TAuditKind } from "./server/audit";
export { hitRateLimit } from "./server/rate-limit";
export { clientIp } from "./server/sign-in-limits";
export { SIGNED_OUT, NOT_ALLOWED, invalidInput, type TActionState } from "./server/action-state";
