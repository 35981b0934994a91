import type { Request, RequestHandler } from 'express';
import helmet from 'helmet';

const DIRECTIVES = {
  defaultSrc: ["'self'"],
  // WebAssembly compiles only with 'wasm-unsafe-eval' (CSP3): the label scanner's decoder. It allows no eval of JS.
  scriptSrc: ["'self'", "'wasm-unsafe-eval'"],
  styleSrc: ["'self'", "'unsafe-inline'"], // react-native-web writes its styles at run time
  imgSrc: ["'self'", 'data:', 'blob:'],
  fontSrc: ["'self'", 'data:'],
  connectSrc: ["'self'"],
};

/**
 * Helmet's headers, in two variants. Over HTTPS: all of them, including the Content-Security-Policy's
 * `upgrade-insecure-requests` and Strict-Transport-Security. Over plain HTTP (a phone at the dock on the
 * plant intranet, at an address that is not localhost) without those: `upgrade-insecure-requests` made
 * the browser fetch the app's own scripts over HTTPS, which nothing serves, and the page stayed blank.
 * Strict-Transport-Security and Cross-Origin-Opener-Policy are ignored by browsers over plain HTTP
 * anyway (the latter with a console message), so they are left out there too.
 *
 * A request counts as HTTPS when the public URL is https (`BUNGWISE_PUBLIC_URL`), or when it reached
 * this process over TLS, which behind a proxy Express reads from X-Forwarded-Proto only when the proxy
 * is trusted (`trust proxy`, `BUNGWISE_TRUST_PROXY`).
 */
export function securityHeaders(publicUrl?: string): RequestHandler {
  const overHttps = helmet({ contentSecurityPolicy: { directives: DIRECTIVES } });
  const overHttp = helmet({
    contentSecurityPolicy: { directives: { ...DIRECTIVES, upgradeInsecureRequests: null } },
    strictTransportSecurity: false,
    crossOriginOpenerPolicy: false,
  });
  const alwaysHttps = /^https:/i.test(publicUrl ?? '');
  const isHttps = (req: Request) => alwaysHttps || req.secure;
  return (req, res, next) => (isHttps(req) ? overHttps : overHttp)(req, res, next);
}

/**
 * `BUNGWISE_TRUST_PROXY` as Express's `trust proxy`: a number of proxy hops, `true`/`false`, or a list of
 * addresses and subnets (`loopback`, `10.0.0.0/8`, ...). Unset: loopback only (a proxy on the same machine).
 */
export function trustProxyFromEnv(value = process.env.BUNGWISE_TRUST_PROXY): boolean | number | string {
  const v = (value ?? '').trim();
  if (!v) return 'loopback';
  if (/^\d+$/.test(v)) return Number(v);
  if (v === 'true' || v === 'false') return v === 'true';
  return v;
}
