/**
 * The HTTP boundary for component tests: `jest.mock('@/lib/api/client', () => require('./helpers/mock-client').clientModule())`
 * keeps the real ApiRequestError and replaces the requests with jest functions.
 */
export function clientModule() {
  const actual = jest.requireActual('@/lib/api/client');
  return {
    ...actual,
    apiRequest: jest.fn(),
    api: { get: jest.fn(), post: jest.fn(), patch: jest.fn(), delete: jest.fn() },
  };
}
