import type { RequestHandler } from './$types';

// Public no-op for the benchmarks: no database, no session, no body. `npm run bench` measures
// every route against it, so the ratios show a route's own cost over the server's floor.
export const GET: RequestHandler = () => new Response(null, { status: 204 });
