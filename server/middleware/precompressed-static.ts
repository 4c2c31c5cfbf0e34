import type { NextFunction, Request, RequestHandler, Response } from 'express';
import fs from 'node:fs';
import path from 'node:path';

const TYPES: Record<string, string> = { '.js': 'text/javascript; charset=utf-8', '.css': 'text/css; charset=utf-8' };

/**
 * The web build's hashed scripts and styles (under /_expo/static/) as compressed once at build
 * time (scripts/lib/web-build.ts writes a `.br` and a `.gz` beside each): brotli at its
 * strongest setting is about a fifth smaller than what can be afforded per request. Anything
 * without such a file goes on to express.static and the compression middleware.
 * @param root the web build's directory
 */
export function precompressedStatic(root: string): RequestHandler {
  const base = path.resolve(root);
  const known = new Map<string, boolean>();
  const exists = (file: string) => {
    let found = known.get(file);
    if (found === undefined) {
      found = fs.existsSync(file);
      // The build's file names are fixed until the next build; remember a bounded number of them.
      if (known.size < 10_000) known.set(file, found);
    }
    return found;
  };
  return (req: Request, res: Response, next: NextFunction) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || !req.path.startsWith('/_expo/static/')) return next();
    const type = TYPES[path.extname(req.path)];
    if (!type) return next();
    let file: string;
    try {
      file = path.resolve(base, `.${decodeURIComponent(req.path)}`);
    } catch {
      return next();
    }
    if (!file.startsWith(base + path.sep)) return next();
    const encoding = req.acceptsEncodings('br') === 'br' ? 'br' : req.acceptsEncodings('gzip') === 'gzip' ? 'gzip' : null;
    const suffix = encoding === 'br' ? '.br' : '.gz';
    if (!encoding || !exists(file) || !exists(file + suffix)) return next();
    res.vary('Accept-Encoding');
    res.sendFile(file + suffix, {
      headers: { 'Content-Type': type, 'Content-Encoding': encoding, 'Cache-Control': 'public, max-age=31536000, immutable' },
      cacheControl: false,
    }, (err) => {
      if (err && !res.headersSent) next();
    });
  };
}
