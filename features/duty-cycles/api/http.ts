/** A refusal from the API with the server's own words about what to fix. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fieldErrors: Record<string, string[]> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

type TErrorBody = {
  error?: { code?: string; message?: string; fieldErrors?: Record<string, string[]> };
};

export function apiErrorOf(status: number, data: unknown): ApiError {
  const err = (data as TErrorBody | null)?.error;
  return new ApiError(
    status,
    err?.code ?? "http_error",
    err?.message ?? `The server answered ${status}.`,
    err?.fieldErrors ?? {},
  );
}

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
    data = null;
  }
  if (!res.ok) throw apiErrorOf(res.status, data);
  return data as T;
}
