/** SWR's fetcher: JSON, and a thrown error (with the server's message) when the response is not ok. */
export class FetchError extends Error {
  constructor(
    message: string,
    readonly status: number,
  ) {
    super(message);
  }
}

export async function fetchJson<T>(url: string): Promise<T> {
  const response = await fetch(url, { headers: { accept: "application/json" } });
  if (!response.ok) {
    let message = `The server answered ${response.status}.`;
    try {
      const body = (await response.json()) as { message?: string };
      if (body.message) message = body.message;
    } catch {
      // not JSON: keep the status line
    }
    throw new FetchError(message, response.status);
  }
  return (await response.json()) as T;
}
