import type { Request, Response } from 'express';
import type { PreparedJson } from '../services/prepared-json';

/** Below this a body goes out as it is (as the compression middleware's threshold). */
const COMPRESS_FROM_BYTES = 1024;

/** Brotli whenever the client takes it (the smaller, and made only once here), else gzip, else none. */
function bestEncoding(req: Request): 'br' | 'gzip' | 'identity' {
  if (req.acceptsEncodings('br') === 'br') return 'br';
  if (req.acceptsEncodings('gzip') === 'gzip') return 'gzip';
  return 'identity';
}

/**
 * Answers with a prepared JSON body: its entity tag, 304 when the client's copy is current
 * (If-None-Match), else the body in the best encoding the client takes (brotli, gzip, none),
 * compressed once per body rather than per request. The answer may be kept by the browser but
 * is checked with the server every time (`private, no-cache`): the caller has authorised the
 * request before this.
 */
export async function sendPreparedJson(req: Request, res: Response, prepared: PreparedJson): Promise<void> {
  res.set('Cache-Control', 'private, no-cache');
  res.set('ETag', prepared.etag);
  res.vary('Accept-Encoding');
  if (req.fresh) {
    res.status(304).end();
    return;
  }
  const accepted = prepared.body.length >= COMPRESS_FROM_BYTES ? bestEncoding(req) : 'identity';
  res.type('application/json');
  if (accepted === 'br' || accepted === 'gzip') {
    const bytes = await prepared.encoded(accepted);
    res.set('Content-Encoding', accepted);
    res.send(bytes);
    return;
  }
  res.send(prepared.body);
}
