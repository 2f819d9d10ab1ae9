import type { Fake } from "@/mocks/fake";
import { mailFake } from "@/mocks/mail/smtp-fake";
import { stripeFake } from "@/mocks/stripe/server";

export type { Fake } from "@/mocks/fake";

/** Every local fake, started by `npm start` and the end-to-end tier. */
export const fakes: Fake[] = [mailFake, stripeFake];
