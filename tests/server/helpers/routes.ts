/**
 * Every API route behind sign-in, with the roles that may use it. Each new route adds a line,
 * and the access tests check all of them.
 */
export const protectedRoutes: {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  roles: ('owner' | 'assistant' | 'gallery')[];
}[] = [
  { method: 'get', path: '/api/me', roles: ['owner', 'assistant', 'gallery'] },
  { method: 'put', path: '/api/me/active-membership', roles: ['owner', 'assistant', 'gallery'] },
  { method: 'post', path: '/api/auth/sign-out', roles: ['owner', 'assistant', 'gallery'] },
  { method: 'get', path: '/api/overview', roles: ['owner', 'assistant'] },
  { method: 'get', path: '/api/venue/consignments', roles: ['gallery'] },
  { method: 'post', path: '/api/quotes/split', roles: ['owner', 'assistant'] },
  { method: 'post', path: '/api/quotes/price-plan', roles: ['owner', 'assistant'] },
  { method: 'get', path: '/api/works', roles: ['owner', 'assistant'] },
  { method: 'get', path: '/api/works/facets', roles: ['owner', 'assistant'] },
  { method: 'get', path: '/api/works/export.csv', roles: ['owner', 'assistant'] },
  { method: 'post', path: '/api/works/import', roles: ['owner', 'assistant'] },
  { method: 'post', path: '/api/works', roles: ['owner', 'assistant'] },
  { method: 'get', path: '/api/works/1', roles: ['owner', 'assistant'] },
  { method: 'patch', path: '/api/works/1', roles: ['owner', 'assistant'] },
  { method: 'delete', path: '/api/works/1', roles: ['owner', 'assistant'] },
  { method: 'post', path: '/api/works/1/archive', roles: ['owner', 'assistant'] },
  { method: 'post', path: '/api/works/1/restore', roles: ['owner', 'assistant'] },
  { method: 'get', path: '/api/works/1/history', roles: ['owner', 'assistant'] },
  { method: 'post', path: '/api/works/1/photos', roles: ['owner', 'assistant'] },
  { method: 'put', path: '/api/works/1/photos/order', roles: ['owner', 'assistant'] },
  { method: 'delete', path: '/api/works/1/photos/1', roles: ['owner', 'assistant'] },
  { method: 'get', path: '/api/photos/1', roles: ['owner', 'assistant', 'gallery'] },
  { method: 'get', path: '/api/photos/1/thumbnail', roles: ['owner', 'assistant', 'gallery'] },
  { method: 'get', path: '/api/studio', roles: ['owner', 'assistant'] },
  // The assistant's 403 is checked in tests/server/studio.
  { method: 'patch', path: '/api/studio', roles: ['owner'] },
  { method: 'get', path: '/api/venues', roles: ['owner', 'assistant'] },
  { method: 'post', path: '/api/venues', roles: ['owner', 'assistant'] },
  { method: 'get', path: '/api/venues/1', roles: ['owner', 'assistant'] },
  { method: 'patch', path: '/api/venues/1', roles: ['owner', 'assistant'] },
];
