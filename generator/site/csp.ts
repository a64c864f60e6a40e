// The Content-Security-Policy every page carries: only this host, nothing external. Scripts are
// bundled files (no inline script at all); 'wasm-unsafe-eval' lets the full-text search run its
// WebAssembly; inline style attributes are allowed for the SVG plots.
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self' 'wasm-unsafe-eval'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
].join("; ");
