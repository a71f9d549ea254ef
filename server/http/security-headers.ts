import type { RequestHandler } from 'express';

// A small fixed set; the client ships its fonts and scripts itself, so 'self' is enough.
// 'wasm-unsafe-eval' lets the session planner compile its solver (WebAssembly from our own
// origin); it does not allow eval of JavaScript.
export const securityHeaders: RequestHandler = (_req, res, next) => {
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Referrer-Policy', 'same-origin');
  res.setHeader('X-Frame-Options', 'DENY');
  res.setHeader(
    'Content-Security-Policy',
    "default-src 'self'; script-src 'self' 'wasm-unsafe-eval'; worker-src 'self'; img-src 'self' data: blob:; style-src 'self' 'unsafe-inline'; font-src 'self' data:; object-src 'none'; frame-ancestors 'none'; base-uri 'self'",
  );
  next();
};
