import { CSRF_HEADER, userSchema } from '@evenset/contracts';
import { installFakeFetch, type FakeAnswer, type FakeRequest } from '../testing/fake-fetch';
import { ApiError, apiGet, apiWrite, setCsrfToken, setUnauthorizedHandler } from './api-client';

const person = {
  id: 'u1',
  email: 'ana@example.com',
  displayName: 'Ana Ruiz',
  roles: ['inspector'],
  active: true,
  displayUnit: 'mm',
  createdAt: '2026-01-05T10:00:00.000Z',
};

/** A fake server that hands out numbered CSRF tokens and answers everything else with `answer`. */
function serverWith(answer: (request: FakeRequest) => FakeAnswer) {
  let issued = 0;
  return installFakeFetch((request) => {
    if (request.url === '/api/auth/csrf') return { status: 200, body: { csrfToken: `token-${++issued}` } };
    return answer(request);
  });
}

const writes = (requests: FakeRequest[]) => requests.filter((request) => request.method !== 'GET');

async function refusalOf(promise: Promise<unknown>): Promise<ApiError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof ApiError) return error;
    throw error;
  }
  throw new Error('Expected the request to be refused.');
}

beforeEach(() => setCsrfToken(null));

describe('reads', () => {
  it('send no CSRF token, skip empty query values and check the answer against the schema', async () => {
    const requests = serverWith(() => ({ status: 200, body: person }));
    const user = await apiGet('/users/u1', userSchema, { page: 0, q: '', sort: undefined });
    expect(user.displayName).toBe('Ana Ruiz');
    expect(requests).toHaveLength(1);
    expect(requests[0]?.url).toBe('/api/users/u1?page=0');
    expect(requests[0]?.headers[CSRF_HEADER]).toBeUndefined();
  });

  it('refuse an answer that does not match the contract', async () => {
    serverWith(() => ({ status: 200, body: { id: 'u1' } }));
    expect((await refusalOf(apiGet('/users/u1', userSchema))).code).toBe('UNEXPECTED_ANSWER');
  });
});

describe('writes', () => {
  it('fetch a CSRF token first when none is known, then carry it in the header', async () => {
    const requests = serverWith(() => ({ status: 201, body: person }));
    await apiWrite('POST', '/users', { email: 'ana@example.com' }, userSchema);
    expect(requests.map((request) => request.url)).toEqual(['/api/auth/csrf', '/api/users']);
    expect(writes(requests)[0]?.headers[CSRF_HEADER]).toBe('token-1');
    expect(writes(requests)[0]?.body).toEqual({ email: 'ana@example.com' });
  });

  it('use the token handed over at sign-in without asking for another', async () => {
    setCsrfToken('from-login');
    const requests = serverWith(() => ({ status: 204 }));
    await apiWrite('POST', '/auth/logout');
    expect(requests).toHaveLength(1);
    expect(requests[0]?.headers[CSRF_HEADER]).toBe('from-login');
  });

  it('on CSRF_INVALID fetch a fresh token and retry once, with the fresh token', async () => {
    setCsrfToken('stale');
    const requests = serverWith((request) =>
      request.headers[CSRF_HEADER] === 'stale'
        ? { status: 403, body: { code: 'CSRF_INVALID', message: 'The page is out of date.' } }
        : { status: 200, body: person },
    );
    await apiWrite('PUT', '/users/u1/roles', { roles: ['admin'] }, userSchema);
    expect(writes(requests).map((request) => request.headers[CSRF_HEADER])).toEqual(['stale', 'token-1']);
  });

  it('retry only once: a second CSRF_INVALID reaches the caller', async () => {
    const requests = serverWith(() => ({
      status: 403,
      body: { code: 'CSRF_INVALID', message: 'The page is out of date.' },
    }));
    const refusal = await refusalOf(apiWrite('POST', '/users/u1/deactivate'));
    expect(refusal.code).toBe('CSRF_INVALID');
    expect(writes(requests)).toHaveLength(2);
  });

  it('do not retry other refusals', async () => {
    setCsrfToken('good');
    const requests = serverWith(() => ({ status: 403, body: { code: 'FORBIDDEN', message: 'Admins only.' } }));
    expect((await refusalOf(apiWrite('POST', '/users/u1/deactivate'))).code).toBe('FORBIDDEN');
    expect(requests).toHaveLength(1);
  });
});

describe('errors', () => {
  it('carry the error body: status, code, message, field details and request id', async () => {
    setCsrfToken('good');
    serverWith(() => ({
      status: 400,
      body: {
        code: 'VALIDATION_FAILED',
        message: 'Some fields need attention.',
        details: [{ path: 'email', message: 'Enter a valid e-mail address, like name@example.com.' }],
        requestId: 'req-7',
      },
    }));
    const refusal = await refusalOf(apiWrite('POST', '/users', {}));
    expect(refusal).toMatchObject({
      status: 400,
      code: 'VALIDATION_FAILED',
      message: 'Some fields need attention.',
      details: [{ path: 'email', message: 'Enter a valid e-mail address, like name@example.com.' }],
      requestId: 'req-7',
    });
  });

  it('explain answers without an error body (e.g. a proxy page) in plain words', async () => {
    serverWith(() => ({ status: 502, body: '<html>Bad gateway</html>' }));
    const refusal = await refusalOf(apiGet('/users/u1', userSchema));
    expect(refusal.code).toBe('HTTP_502');
    expect(refusal.message).toMatch(/server ran into a problem/i);
  });

  it('turn a network failure into an ApiError that says the server cannot be reached', async () => {
    globalThis.fetch = jest.fn(() => Promise.reject(new TypeError('Failed to fetch')));
    const refusal = await refusalOf(apiGet('/users/u1', userSchema));
    expect(refusal).toMatchObject({ status: 0, code: 'NETWORK_ERROR' });
    expect(refusal.message).toMatch(/can't be reached/);
  });
});

describe('a lost session (401)', () => {
  const unauthorized = { status: 401, body: { code: 'AUTH_REQUIRED', message: 'Sign in first.' } };

  it('sends the person back to sign in when any other request finds it', async () => {
    const onUnauthorized = jest.fn();
    const unregister = setUnauthorizedHandler(onUnauthorized);
    serverWith(() => unauthorized);
    expect((await refusalOf(apiGet('/users/u1', userSchema))).status).toBe(401);
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
    unregister();
  });

  it('is only an answer from /auth/me and /auth/login', async () => {
    const onUnauthorized = jest.fn();
    const unregister = setUnauthorizedHandler(onUnauthorized);
    serverWith(() => unauthorized);
    await refusalOf(apiGet('/auth/me', userSchema));
    await refusalOf(apiWrite('POST', '/auth/login', { email: 'a@b.c', password: 'x' }));
    expect(onUnauthorized).not.toHaveBeenCalled();
    unregister();
  });
});
