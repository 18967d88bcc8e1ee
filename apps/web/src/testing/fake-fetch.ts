/** A recorded request, as the fake server saw it. */
export interface FakeRequest {
  method: string;
  url: string;
  headers: Record<string, string>;
  body: unknown;
}

/** What the fake server answers: a status and an optional body (a string is sent as is). */
export interface FakeAnswer {
  status: number;
  body?: unknown;
}

type FakeServer = (request: FakeRequest) => FakeAnswer;

/**
 * Replaces global fetch with a tiny in-memory server for unit tests. jsdom has no Response class;
 * the client reads only `status` and `text()`, so the answer provides just those.
 */
export function installFakeFetch(server: FakeServer): FakeRequest[] {
  const requests: FakeRequest[] = [];
  const fakeFetch = jest.fn(async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const request: FakeRequest = {
      method: init?.method ?? 'GET',
      url: String(input),
      headers: { ...(init?.headers as Record<string, string> | undefined) },
      body: typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined,
    };
    requests.push(request);
    const { status, body } = server(request);
    const text = body === undefined ? '' : typeof body === 'string' ? body : JSON.stringify(body);
    return { status, ok: status < 400, text: () => Promise.resolve(text) } as unknown as Response;
  });
  globalThis.fetch = fakeFetch;
  return requests;
}
