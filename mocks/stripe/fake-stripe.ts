import {
  handleApiRequest,
  type TFakeAnswer,
  type TFakeContext,
  type TFakeRequest,
} from "@/mocks/stripe/api";
import { handlePageRequest } from "@/mocks/stripe/pages";
import { FakeStore } from "@/mocks/stripe/store";
import { WebhookSender, type TWebhookTarget } from "@/mocks/stripe/webhooks";

export type TFakeStripe = {
  store: FakeStore;
  webhooks: WebhookSender;
  handle: (req: TFakeRequest) => Promise<TFakeAnswer>;
};

/** The fake's core, shared by the HTTP server and the msw handlers. */
export function createFakeStripe(opts: {
  publicUrl: string;
  stateFile?: string;
  webhook?: TWebhookTarget | null;
  retryDelaysMs?: number[];
  log?: (m: string) => void;
}): TFakeStripe {
  const store = new FakeStore(opts.stateFile);
  const webhooks = new WebhookSender(store, opts.webhook ?? null, opts.retryDelaysMs, opts.log);
  const ctx: TFakeContext = {
    store,
    publicUrl: opts.publicUrl.replace(/\/$/, ""),
    now: () => Date.now(),
    emit: (type, object) => void webhooks.emit(ctx, type, object),
  };
  return {
    store,
    webhooks,
    handle: async (req) =>
      req.path.startsWith("/v1/")
        ? handleApiRequest(ctx, req)
        : ((await handlePageRequest(ctx, req)) ?? {
            status: 404,
            body: {
              error: {
                type: "invalid_request_error",
                message: `Unrecognized request URL (${req.method}: ${req.path}).`,
              },
            },
          }),
  };
}
