/**
 * Security headers for every answer (helmet): a Content-Security-Policy the exported web app runs
 * under (its own scripts only, no inline script; inline styles, which react-native-web writes at
 * run time; images and fonts from this origin or data: URLs), nosniff, no framing by other sites,
 * no Referer sent (a reset link carries its token in the address), and HSTS when served over HTTPS.
 * The browser test checks that the pages it visits report no CSP violation.
 */
import type { RequestHandler } from 'express';
import helmet from 'helmet';
import type { Config } from '../config';

export const CONTENT_SECURITY_POLICY = {
  defaultSrc: ["'self'"],
  scriptSrc: ["'self'"],
  styleSrc: ["'self'", "'unsafe-inline'"],
  imgSrc: ["'self'", 'data:', 'blob:'],
  fontSrc: ["'self'", 'data:'],
  connectSrc: ["'self'"],
  workerSrc: ["'self'", 'blob:'],
  manifestSrc: ["'self'"],
  objectSrc: ["'none'"],
  baseUri: ["'self'"],
  formAction: ["'self'"],
  frameAncestors: ["'none'"],
};

/** HSTS: one year, sub-domains included; sent only on answers that went out over HTTPS. */
const HSTS = 'max-age=31536000; includeSubDomains';

export function securityHeaders(config: Config): RequestHandler[] {
  return [
    helmet({
      contentSecurityPolicy: { useDefaults: false, directives: CONTENT_SECURITY_POLICY },
      // HSTS over plain http is ignored by browsers and wrong on a machine's own address: set below.
      strictTransportSecurity: false,
      referrerPolicy: { policy: 'no-referrer' },
      xFrameOptions: { action: 'deny' },
      crossOriginEmbedderPolicy: false,
    }),
    (req, res, next) => {
      if (req.secure || (config.env === 'production' && config.appUrl.startsWith('https:') && config.trustProxy)) {
        res.setHeader('Strict-Transport-Security', HSTS);
      }
      next();
    },
  ];
}
