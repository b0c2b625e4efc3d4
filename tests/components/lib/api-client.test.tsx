import { apiRequest, ApiRequestError } from '@/lib/api/client';

const fetchMock = jest.fn();
beforeAll(() => {
  global.fetch = fetchMock as unknown as typeof fetch;
});
beforeEach(() => fetchMock.mockReset());

async function rejection(request: Promise<unknown>): Promise<ApiRequestError> {
  try {
    await request;
  } catch (error) {
    return error as ApiRequestError;
  }
  throw new Error('expected the request to fail');
}

function answer(status: number, body?: unknown) {
  return new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

describe('the HTTP client', () => {
  it('sends JSON with the session cookie and returns the parsed body', async () => {
    fetchMock.mockResolvedValueOnce(answer(200, { user: { id: 1 } }));
    await expect(apiRequest('POST', '/api/auth/sign-in', { email: 'a@b.example' })).resolves.toEqual({ user: { id: 1 } });
    const [url, init] = fetchMock.mock.calls[0];
    expect(url).toBe('/api/auth/sign-in');
    expect(init).toMatchObject({ method: 'POST', credentials: 'include', body: '{"email":"a@b.example"}' });
    expect(init.headers['Content-Type']).toBe('application/json');
  });

  it('throws ApiRequestError with status, sentence and issues on a 400', async () => {
    fetchMock.mockResolvedValueOnce(answer(400, { error: 'Check the highlighted fields.', issues: [{ path: 'email', message: 'Not an e-mail' }] }));
    const error: ApiRequestError = await rejection(apiRequest('POST', '/api/team/invitations', {}));
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error.status).toBe(400);
    expect(error.error).toBe('Check the highlighted fields.');
    expect(error.issues).toEqual([{ path: 'email', message: 'Not an e-mail' }]);
  });

  it('answers a 204 with undefined', async () => {
    fetchMock.mockResolvedValueOnce(new Response(null, { status: 204 }));
    await expect(apiRequest('POST', '/api/auth/sign-out', {})).resolves.toBeUndefined();
  });

  it('reports an unreachable server as status 0 with a sentence a person can act on', async () => {
    fetchMock.mockRejectedValueOnce(new TypeError('Failed to fetch'));
    const error: ApiRequestError = await rejection(apiRequest('GET', '/api/auth/me'));
    expect(error.status).toBe(0);
    expect(error.message).toMatch(/could not reach the server/);
  });
});
