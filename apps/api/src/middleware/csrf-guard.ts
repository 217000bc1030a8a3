// Cross-site request forgery guard for every state-changing request (OWASP ASVS 5.0 V3.5):
// SameSite=Lax cookies plus Fetch Metadata: a browser says where a request came from in
// Sec-Fetch-Site; without that header (older browsers, scripts) the Origin must be one we serve.
import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/app-error';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

export function csrfGuard(options: { isAllowedOrigin: (origin: string, req: Request) => boolean }): RequestHandler {
  return (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const site = req.get('sec-fetch-site');
    if (site !== undefined) {
      if (site === 'same-origin' || site === 'none') return next();
      return next(new AppError(403, 'cross_site_request', `Refused a ${site} ${req.method} request`));
    }
    const origin = req.get('origin');
    if (origin && options.isAllowedOrigin(origin, req)) return next();
    next(
      new AppError(
        403,
        'cross_site_request',
        origin ? `Refused a ${req.method} request from origin ${origin}` : `Refused a ${req.method} request without an Origin header`,
      ),
    );
  };
}

/** JSON routes take only application/json bodies (a form post cannot smuggle one in). */
export const requireJsonBody: RequestHandler = (req, _res, next) => {
  if (safeMethods.has(req.method) || req.method === 'DELETE') return next();
  if (!req.is('application/json')) {
    return next(new AppError(415, 'unsupported_media_type', 'Send the body as application/json'));
  }
  next();
};
