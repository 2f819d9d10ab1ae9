/** A refusal from the API, carrying what the server said to fix. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fieldErrors: Record<string, string[]> = {},
    /** The whole `error` object, for answers that carry more (e.g. what a delete would remove). */
    readonly body: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

type TErrorBody = {
  error?: { code?: string; message?: string; fieldErrors?: Record<string, string[]> };
};

/** Builds the ApiError for a non-2xx answer from its parsed JSON body (or null). */
export function apiErrorOf(status: number, data: unknown): ApiError {
  const err = (data as TErrorBody | null)?.error;
  return new ApiError(
    status,
    err?.code ?? "http_error",
    err?.message ?? `The server answered ${status}.`,
    err?.fieldErrors ?? {},
    (err ?? {}) as Record<string, unknown>,
  );
}

/** Fetches JSON from the versioned API; non-2xx answers throw an ApiError with the server's words. */
export async function apiFetch<T>(
  path: string,
  init: { method?: string; body?: unknown } = {},
): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, {
      method: init.method ?? "GET",
      headers: init.body !== undefined ? { "content-type": "application/json" } : undefined,
      body: init.body !== undefined ? JSON.stringify(init.body) : undefined,
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(
      0,
      "network",
      "Could not reach the Treadcast server. Check the connection and try again.",
    );
  }
  const text = await res.text();
  let data: unknown = null;
  try {
    data = text ? JSON.parse(text) : null;
  } catch {
    // A proxy's HTML error page, say: the status alone then explains the refusal.
    data = null;
  }
  if (!res.ok) throw apiErrorOf(res.status, data);
  return data as T;
}

/** Query string from a list state, dropping empty values. */
export function toQueryString(params: Record<string, string | number | undefined | null>): string {
  const sp = new URLSearchParams();
  for (const [k, v] of Object.entries(params))
    if (v !== undefined && v !== null && v !== "") sp.set(k, String(v));
  const s = sp.toString();
  return s ? `?${s}` : "";
}
