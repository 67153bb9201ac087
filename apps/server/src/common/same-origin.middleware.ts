/** Refuses state-changing requests a browser sends from another site (cross-site request forgery on the cookie session). */
import type { NextFunction, Request, Response } from 'express';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * For POST, PUT, PATCH and DELETE: a browser request whose `Origin` is not `publicOrigin`, or (without `Origin`) whose
 * `Sec-Fetch-Site` is `cross-site`, is answered 403 before any handler runs (Fetch Metadata and Origin checks, OWASP
 * CSRF prevention, common practice). Clients that are not browsers send neither header and are let through: they
 * do not carry another site's cookies.
 */
export function sameOriginOnly(publicOrigin: string) {
  return (req: Request, res: Response, next: NextFunction): void => {
    if (SAFE.has(req.method)) return next();
    const origin = req.headers.origin;
    const site = req.headers['sec-fetch-site'];
    const foreign = origin !== undefined ? origin !== publicOrigin : site === 'cross-site';
    if (!foreign) return next();
    res.status(403).type('application/json').json({ statusCode: 403, error: 'Forbidden', message: `Cross-site ${req.method} refused: the request comes from ${origin ?? 'another site'}, not ${publicOrigin}` });
  };
}
