// Public server entry of the auth feature (accounts, dealerships, roles, invitations, mail).
export { getActor } from "./server/get-actor";
