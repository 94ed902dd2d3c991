import type { ApiErrorBody, FieldError } from "@shared/api/errors";
import type { Problem } from "@shared/diagram/problems";

/** An /api answer that was not 2xx, carrying the server's code, message, field errors and diagram problems. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: FieldError[] = [],
    /** The problems of a 422 `invalid_document` answer. */
    readonly problems: Problem[] = [],
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export const isApiError = (e: unknown, status?: number): e is ApiError =>
  e instanceof ApiError && (status === undefined || e.status === status);

/** The sentence to show for any error thrown by a fetcher or a mutation. */
export const errorMessage = (e: unknown): string =>
  e instanceof Error ? e.message : "Something went wrong. Try again.";

type Method = "GET" | "POST" | "PATCH" | "DELETE";

/**
 * Calls the same-origin JSON API. Cookies carry the session; the browser adds the Origin header the
 * server checks on mutations. A FormData body goes as multipart (the browser writes its content type);
 * any other body as JSON. 204 answers resolve to undefined.
 */
export async function api<T>(path: string, method: Method = "GET", body?: unknown): Promise<T> {
  const asJson = body !== undefined && !(body instanceof FormData);
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      credentials: "same-origin",
      headers: asJson ? { accept: "application/json", "content-type": "application/json" } : { accept: "application/json" },
      body: body instanceof FormData ? body : asJson ? JSON.stringify(body) : undefined,
    });
  } catch {
    throw new ApiError(0, "network", "Cannot reach the Loopwright server. Check your connection and try again.");
  }
  if (res.status === 204) return undefined as T;
  const data: unknown = await res.json().catch(() => null);
  if (res.ok) return data as T;
  const answer = data as (Partial<ApiErrorBody> & { problems?: Problem[] }) | null;
  const err = answer?.error;
  throw new ApiError(
    res.status,
    err?.code ?? "http",
    err?.message ?? `The server answered ${res.status} ${res.statusText}.`.replace(" .", "."),
    err?.fields ?? [],
    answer?.problems ?? [],
  );
}
