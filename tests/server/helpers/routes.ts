type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** Routes anyone may call. */
export const publicRoutes = [
  'GET /api/health',
  'POST /api/auth/sign-in/email',
  'POST /api/auth/request-password-reset',
  'GET /api/auth/reset-password/lookup',
  'POST /api/auth/reset-password',
  'GET /api/invitations/lookup',
  'POST /api/invitations/accept',
  'GET /api/calendar/:token.ics',
  // The payment provider's notices: no session, but a signature checked over the raw body.
  'POST /api/payments/webhook',
] as const;

/**
 * Every API route behind sign-in, with the roles that may use it. The access tests walk the
 * routes Express has mounted and fail on one missing here, so a new route must add its line.
 */
export const protectedRoutes: {
  route: `${Method} /api/${string}`;
  roles: ('owner' | 'assistant' | 'gallery')[];
}[] = [
  { route: 'GET /api/me', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'PUT /api/me/active-membership', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'POST /api/auth/sign-out', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'GET /api/overview', roles: ['owner', 'assistant'] },
  { route: 'GET /api/venue/consignments', roles: ['gallery'] },
  { route: 'GET /api/venue/consignments/:id', roles: ['gallery'] },
  { route: 'GET /api/venue/pieces', roles: ['gallery'] },
  { route: 'GET /api/venue/lines/:lineId', roles: ['gallery'] },
  { route: 'POST /api/quotes/split', roles: ['owner', 'assistant'] },
  { route: 'POST /api/quotes/price-plan', roles: ['owner', 'assistant'] },
  { route: 'GET /api/works', roles: ['owner', 'assistant'] },
  { route: 'GET /api/works/facets', roles: ['owner', 'assistant'] },
  { route: 'GET /api/works/export.csv', roles: ['owner', 'assistant'] },
  { route: 'GET /api/works/import/template.csv', roles: ['owner', 'assistant'] },
  { route: 'POST /api/works/import', roles: ['owner', 'assistant'] },
  { route: 'POST /api/works', roles: ['owner', 'assistant'] },
  { route: 'GET /api/works/:id', roles: ['owner', 'assistant'] },
  { route: 'PATCH /api/works/:id', roles: ['owner', 'assistant'] },
  { route: 'DELETE /api/works/:id', roles: ['owner', 'assistant'] },
  { route: 'POST /api/works/:id/archive', roles: ['owner', 'assistant'] },
  { route: 'POST /api/works/:id/restore', roles: ['owner', 'assistant'] },
  { route: 'GET /api/works/:id/history', roles: ['owner', 'assistant'] },
  { route: 'POST /api/works/:id/photos', roles: ['owner', 'assistant'] },
  { route: 'PUT /api/works/:id/photos/order', roles: ['owner', 'assistant'] },
  { route: 'DELETE /api/works/:id/photos/:photoId', roles: ['owner', 'assistant'] },
  { route: 'GET /api/photos/:photoId', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'GET /api/photos/:photoId/thumbnail', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'GET /api/studio', roles: ['owner', 'assistant'] },
  // The assistant's 403 is checked in tests/server/studio.
  { route: 'PATCH /api/studio', roles: ['owner'] },
  { route: 'GET /api/venues', roles: ['owner', 'assistant'] },
  { route: 'POST /api/venues', roles: ['owner', 'assistant'] },
  { route: 'GET /api/venues/:id', roles: ['owner', 'assistant'] },
  { route: 'PATCH /api/venues/:id', roles: ['owner', 'assistant'] },
  { route: 'GET /api/consignments', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'POST /api/consignments', roles: ['owner', 'assistant'] },
  { route: 'GET /api/consignments/:id', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'PATCH /api/consignments/:id', roles: ['owner', 'assistant'] },
  { route: 'POST /api/consignments/:id/lines', roles: ['owner', 'assistant'] },
  { route: 'PATCH /api/consignments/:id/lines/:lineId', roles: ['owner', 'assistant'] },
  { route: 'DELETE /api/consignments/:id/lines/:lineId', roles: ['owner', 'assistant'] },
  { route: 'POST /api/consignments/:id/agree', roles: ['owner', 'assistant'] },
  { route: 'POST /api/consignments/:id/dispatch', roles: ['owner', 'assistant'] },
  { route: 'POST /api/consignments/:id/cancel', roles: ['owner', 'assistant'] },
  { route: 'POST /api/consignments/:id/close', roles: ['owner', 'assistant'] },
  { route: 'GET /api/consignment-lines/:lineId/claim.pdf', roles: ['owner', 'assistant'] },
  { route: 'GET /api/year', roles: ['owner'] },
  { route: 'GET /api/calendar-feed', roles: ['owner'] },
  { route: 'POST /api/bank-imports/matches', roles: ['owner'] },
  { route: 'POST /api/calendar-feed', roles: ['owner'] },
  { route: 'DELETE /api/calendar-feed', roles: ['owner'] },
  { route: 'GET /api/year/sales.csv', roles: ['owner'] },
  { route: 'GET /api/year/payments.csv', roles: ['owner'] },
  { route: 'GET /api/year/statements.csv', roles: ['owner'] },
  { route: 'POST /api/consignments/:id/acknowledge', roles: ['gallery'] },
  { route: 'POST /api/consignments/:id/sales', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'POST /api/consignment-lines/:lineId/sale', roles: ['owner', 'assistant', 'gallery'] },
  {
    route: 'DELETE /api/consignment-lines/:lineId/sale',
    roles: ['owner', 'assistant', 'gallery'],
  },
  {
    route: 'POST /api/consignment-lines/:lineId/resolve',
    roles: ['owner', 'assistant', 'gallery'],
  },
  { route: 'GET /api/consignments/:id/sheet.pdf', roles: ['owner', 'assistant', 'gallery'] },
  {
    route: 'GET /api/consignments/:id/condition-report.pdf',
    roles: ['owner', 'assistant', 'gallery'],
  },
  { route: 'GET /api/consignments/:id/labels.pdf', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'POST /api/condition-photos', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'GET /api/condition-photos/:fileId', roles: ['owner', 'assistant', 'gallery'] },
  {
    route: 'GET /api/condition-photos/:fileId/thumbnail',
    roles: ['owner', 'assistant', 'gallery'],
  },
  {
    route: 'POST /api/consignment-lines/:lineId/condition-reports',
    roles: ['owner', 'assistant', 'gallery'],
  },
  { route: 'GET /api/statements', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'POST /api/statements', roles: ['owner'] },
  { route: 'GET /api/statements/:id.pdf', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'GET /api/statements/:id', roles: ['owner', 'assistant', 'gallery'] },
  { route: 'POST /api/statements/:id/issue', roles: ['owner'] },
  { route: 'POST /api/statements/:id/payments', roles: ['owner'] },
  { route: 'POST /api/statements/:id/adjustments', roles: ['owner'] },
  // The assistant's 403 is checked in tests/server/payments.
  { route: 'POST /api/statements/:id/checkout', roles: ['owner', 'gallery'] },
  { route: 'GET /api/outbox', roles: ['owner'] },
  { route: 'GET /api/outbox/:id', roles: ['owner'] },
  { route: 'GET /api/outbox/:id/attachments/:index', roles: ['owner'] },
  { route: 'POST /api/outbox/:id/retry', roles: ['owner'] },
];

/** A route's method (lower case, as supertest names it) and a path with an id for each parameter. */
export function callable(route: `${Method} /api/${string}`) {
  const [method, pattern] = route.split(' ') as [Method, string];
  return {
    method: method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete',
    path: pattern.replace(/:\w+/g, '1'),
  };
}
