/**
 * A small HTTP client over XMLHttpRequest, with the few things the app used axios for: a base
 * URL, query params, JSON or FormData bodies, JSON / blob / text replies, cookies, a timeout,
 * upload progress, and interceptors on the request and the reply. XMLHttpRequest rather than
 * fetch because only it reports upload progress (the photo upload's progress bar).
 */
export type Params = Record<string, string | number | boolean | null | undefined>;

export type RequestConfig = {
  url?: string;
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  baseURL?: string;
  params?: Params;
  data?: unknown;
  headers?: Record<string, string>;
  responseType?: 'json' | 'blob' | 'text';
  timeout?: number;
  withCredentials?: boolean;
  onUploadProgress?: (event: { loaded: number; total?: number }) => void;
  /** Which statuses count as an answer; 2xx by default. */
  validateStatus?: (status: number) => boolean;
};

export type HttpResponse<T> = {
  data: T;
  status: number;
  /** Reply headers, names in lower case. */
  headers: Record<string, string>;
  config: RequestConfig;
};

/** A request that failed: `response` is there when the server answered (status ≥ 400). */
export class HttpError extends Error {
  constructor(
    message: string,
    readonly config: RequestConfig,
    readonly response?: { status: number; data: unknown; headers: Record<string, string> },
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

type OnRequest = (config: RequestConfig) => RequestConfig;
type OnError = (error: unknown) => Promise<HttpResponse<unknown>>;

export function buildUrl(config: RequestConfig): string {
  const url = `${config.baseURL ?? ''}${config.url ?? ''}`;
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(config.params ?? {})) {
    if (value !== undefined && value !== null) search.append(key, String(value));
  }
  const query = search.toString();
  return query ? `${url}${url.includes('?') ? '&' : '?'}${query}` : url;
}

function parseHeaders(raw: string): Record<string, string> {
  const headers: Record<string, string> = {};
  for (const line of raw.trim().split(/[\r\n]+/)) {
    const at = line.indexOf(':');
    if (at > 0) headers[line.slice(0, at).trim().toLowerCase()] = line.slice(at + 1).trim();
  }
  return headers;
}

function parseBody(xhr: XMLHttpRequest, responseType: RequestConfig['responseType']): unknown {
  if (responseType === 'blob') return xhr.response as Blob;
  const text = xhr.responseText;
  if (responseType === 'text' || !text) return text;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}

/** One request, no interceptors. */
export function send<T>(config: RequestConfig): Promise<HttpResponse<T>> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(config.method ?? 'GET', buildUrl(config), true);
    xhr.withCredentials = Boolean(config.withCredentials);
    if (config.timeout) xhr.timeout = config.timeout;
    if (config.responseType === 'blob') xhr.responseType = 'blob';
    const headers: Record<string, string> = { Accept: 'application/json, text/plain, */*', ...config.headers };
    let body: XMLHttpRequestBodyInit | null = null;
    if (config.data instanceof FormData || config.data instanceof Blob) {
      body = config.data; // the browser sets the multipart boundary itself
    } else if (config.data !== undefined) {
      body = JSON.stringify(config.data);
      headers['Content-Type'] = 'application/json';
    }
    for (const [name, value] of Object.entries(headers)) xhr.setRequestHeader(name, value);
    if (config.onUploadProgress && xhr.upload) {
      const report = config.onUploadProgress;
      xhr.upload.onprogress = (event) => report({ loaded: event.loaded, total: event.lengthComputable ? event.total : undefined });
    }
    xhr.onload = () => {
      const reply = { status: xhr.status, data: parseBody(xhr, config.responseType), headers: parseHeaders(xhr.getAllResponseHeaders()) };
      const ok = config.validateStatus ?? ((status: number) => status >= 200 && status < 300);
      if (xhr.status > 0 && ok(xhr.status)) resolve({ ...reply, data: reply.data as T, config });
      else reject(new HttpError(`The server answered ${xhr.status}.`, config, reply));
    };
    xhr.onerror = () => reject(new HttpError('Network error', config));
    xhr.ontimeout = () => reject(new HttpError('Timed out', config));
    xhr.send(body);
  });
}

type Options = Omit<RequestConfig, 'url' | 'method' | 'data'>;

/** A client with defaults and interceptors, in the shape the API files call. */
export function createHttpClient(defaults: RequestConfig) {
  const onRequest: OnRequest[] = [];
  const onError: OnError[] = [];
  const request = async <T>(config: RequestConfig): Promise<HttpResponse<T>> => {
    let merged: RequestConfig = { ...defaults, ...config, headers: { ...defaults.headers, ...config.headers } };
    for (const use of onRequest) merged = use(merged);
    try {
      return await send<T>(merged);
    } catch (error) {
      let failure: unknown = error;
      for (const handle of onError) {
        try {
          return (await handle(failure)) as HttpResponse<T>;
        } catch (next) {
          failure = next;
        }
      }
      throw failure;
    }
  };
  return {
    request,
    get: <T>(url: string, options?: Options) => request<T>({ ...options, url, method: 'GET' }),
    delete: <T>(url: string, options?: Options) => request<T>({ ...options, url, method: 'DELETE' }),
    post: <T>(url: string, data?: unknown, options?: Options) => request<T>({ ...options, url, data, method: 'POST' }),
    put: <T>(url: string, data?: unknown, options?: Options) => request<T>({ ...options, url, data, method: 'PUT' }),
    patch: <T>(url: string, data?: unknown, options?: Options) => request<T>({ ...options, url, data, method: 'PATCH' }),
    interceptors: {
      request: { use: (fn: OnRequest) => void onRequest.push(fn) },
      /** Runs on a failed request; return a reply to recover, or throw. */
      error: { use: (fn: OnError) => void onError.push(fn) },
    },
  };
}
