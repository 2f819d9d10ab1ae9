/** What a billing form's server action answers; a success with a URL sends the browser there. */
export type TBillingActionState = {
  ok: boolean;
  code?: string;
  message?: string;
};
