import { http, HttpResponse } from "msw";
import { createFakeStripe, type TFakeStripe } from "@/mocks/stripe/fake-stripe";

/**
 * The fake's handlers as msw request handlers, for unit tests of code that calls the real
 * Stripe host: the same answers as the HTTP fake, from an in-memory store, no webhooks.
 */
export function stripeMswHandlers(
  fake: TFakeStripe = createFakeStripe({ publicUrl: "https://fake-pay.test" }),
) {
  return [
    http.all("https://api.stripe.com/*", async ({ request }) => {
      const url = new URL(request.url);
      const answer = await fake.handle({
        method: request.method,
        path: url.pathname,
        query: url.search.slice(1),
        headers: request.headers,
        body: request.method === "GET" ? "" : await request.text(),
      });
      return HttpResponse.json(answer.body as object, {
        status: answer.status,
        headers: answer.headers,
      });
    }),
  ];
}
