/** Demo sign-ins, one per role, printed by `npm start` and listed in the README. Invented people. */
export const DEMO_PASSWORD = "treadcast-demo";

export const DEMO_ACCOUNTS: {
  email: string;
  name: string;
  role: string;
  dealership: string;
  customerKey?: string;
}[] = [
  {
    email: "admin@brackenridge.test",
    name: "Rhoswen Caddick",
    role: "dealer_admin",
    dealership: "brackenridge",
  },
  {
    email: "estimator@brackenridge.test",
    name: "Tobias Wrenfield",
    role: "estimator",
    dealership: "brackenridge",
  },
  {
    email: "billing@brackenridge.test",
    name: "Ffion Halloway",
    role: "billing_admin",
    dealership: "brackenridge",
  },
  {
    email: "morwenna@hollinvale.test",
    name: "Morwenna Tisdale",
    role: "customer",
    dealership: "brackenridge",
    customerKey: "hollin-vale",
  },
  {
    email: "admin@copperfold.test",
    name: "Declan Ashby",
    role: "dealer_admin",
    dealership: "copperfold",
  },
];
