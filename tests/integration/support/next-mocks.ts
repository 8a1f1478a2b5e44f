/**
 * Stand-ins for the request-bound parts of Next.js, so server actions and route handlers can be called
 * directly in vitest: a cookie jar per test, and redirect/forbidden/notFound as catchable signals.
 */
export class NavigationSignal extends Error {
  constructor(
    readonly kind: "redirect" | "forbidden" | "notFound" | "unauthorized",
    readonly url?: string,
  ) {
    super(`${kind}${url ? ` ${url}` : ""}`);
  }
}

export const cookieJar = new Map<string, string>();

/**
 * The request's headers as a test wants them: by default one client at 203.0.113.7 (the connection's
 * address, and the same in a forwarding header). A test may change them and must put them back.
 */
export const DEFAULT_REQUEST_HEADERS: Record<string, string> = { "x-forwarded-for": "203.0.113.7", "x-towmargin-peer": "203.0.113.7" };
export const requestHeaders = new Map<string, string>(Object.entries(DEFAULT_REQUEST_HEADERS));
export function resetRequestHeaders() {
  requestHeaders.clear();
  for (const [key, value] of Object.entries(DEFAULT_REQUEST_HEADERS)) requestHeaders.set(key, value);
}

export const headersMock = {
  cookies: async () => ({
    get: (name: string) => (cookieJar.has(name) ? { name, value: cookieJar.get(name)! } : undefined),
    set: (name: string, value: string) => {
      if (value === "") cookieJar.delete(name);
      else cookieJar.set(name, value);
    },
    delete: (name: string) => cookieJar.delete(name),
  }),
  headers: async () => new Headers([...requestHeaders]),
};

export const navigationMock = {
  redirect: (url: string) => {
    throw new NavigationSignal("redirect", url);
  },
  forbidden: () => {
    throw new NavigationSignal("forbidden");
  },
  notFound: () => {
    throw new NavigationSignal("notFound");
  },
  unauthorized: () => {
    throw new NavigationSignal("unauthorized");
  },
};

export const cacheMock = { revalidatePath: () => undefined, revalidateTag: () => undefined };
