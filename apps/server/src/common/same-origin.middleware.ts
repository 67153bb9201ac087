/** Refuses state-changing requests a browser sends from another site (cross-site request forgery on the cookie session). */
import type { NextFunction, Request, Response } from 'express';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * For POST, PUT, PATCH and DELETE: a browser request whose `Origin` is not `publicOrigin`, or (without `Origin`, or
 * with the opaque `Origin: null`) whose `Sec-Fetch-Site` says another site, is answered 403 before any handler runs (Fetch Metadata and Origin checks, OWASP
 * CSRF prevention, common practice). Clients that are not browsers send neither header and are let through: they
 * do not carry another site's cookies.
 */
export function sameOriginOnly(publicOrigin: string) {
  return (req: Request, res: Response, next: NextFunction): void => {
    if (SAFE.has(req.method)) return next();
    const origin = req.headers.origin;
    const site = req.headers['sec-fetch-site'];
    // A page with `Referrer-Policy: no-referrer` (the default here) makes the browser send `Origin: null` on form posts;
    // then Fetch Metadata tells whether the form was this site's own.
    const foreign = origin !== undefined && origin !== 'null' ? origin !== publicOrigin : origin === 'null' ? site !== 'same-origin' && site !== 'none' : site === 'cross-site';
    if (!foreign) return next();
    res.status(403).type('application/json').json({ statusCode: 403, error: 'Forbidden', message: `Cross-site ${req.method} refused: the request comes from ${origin ?? 'another site'}, not ${publicOrigin}` });
  };
}
