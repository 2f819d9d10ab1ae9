// Public server entry of the auth feature (accounts, dealerships, roles, invitations, mail).
export { getActor } from "./server/get-actor";
export { getMailer, type TMail, type TMailer } from "./server/mailer";
export { issueInvitation } from "./server/invite-member";
