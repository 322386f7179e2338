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
];
