import { ProblemSchema, type FieldError, type Problem } from '../../shared/problem/problem.schema';

/**
 * The only module that calls `fetch`. JSON in, JSON out, cookies same-origin. Every non-2xx answer
 * becomes an ApiError carrying the server's RFC 9457 problem (with field errors when it has them).
 */
export class ApiError extends Error {
  readonly problem: Problem;

  constructor(problem: Problem) {
    super(problem.detail ?? problem.title);
    this.name = 'ApiError';
    this.problem = problem;
  }

  get status(): number {
    return this.problem.status;
  }

  /** True when the server was never reached (offline, server down, request blocked). */
  get isNetworkError(): boolean {
    return this.problem.status === 0;
  }

  get fieldErrors(): FieldError[] {
    return this.problem.errors ?? [];
  }
}

export const isApiError = (error: unknown): error is ApiError => error instanceof ApiError;

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface RequestOptions {
  method?: Method;
  /** JSON-encoded unless it is FormData (file uploads), which the browser encodes itself. */
  body?: unknown;
  signal?: AbortSignal;
}

const networkProblem = (): Problem => ({
  type: 'about:blank',
  title: 'No connection',
  status: 0,
  detail: 'Ringseat could not reach the server. Check the connection and try again.',
});

async function readProblem(response: Response): Promise<Problem> {
  const fallback: Problem = {
    type: 'about:blank',
    title: response.statusText || 'Request failed',
    status: response.status,
    detail: `The server answered with status ${response.status}.`,
  };
  try {
    const parsed = ProblemSchema.safeParse(await response.json());
    return parsed.success ? parsed.data : fallback;
  } catch {
    return fallback;
  }
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const { method = 'GET', body, signal } = options;
  const headers: Record<string, string> = { Accept: 'application/json, application/problem+json' };
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  if (body !== undefined && !isForm) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
      credentials: 'same-origin',
      signal,
    });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw new ApiError(networkProblem());
  }

  if (!response.ok) throw new ApiError(await readProblem(response));
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }),
  post: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'POST', body }),
  put: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'PUT', body }),
  patch: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'PATCH', body }),
  delete: <T>(path: string) => apiRequest<T>(path, { method: 'DELETE' }),
  /** multipart/form-data, for file uploads. */
  postForm: <T>(path: string, form: FormData) =>
    apiRequest<T>(path, { method: 'POST', body: form }),
};

/** A message fit to show a person, for any error a request can end with. */
export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  return 'Something went wrong. Try again.';
}
