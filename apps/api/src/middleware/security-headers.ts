// helmet with a Content Security Policy the built client passes: scripts and styles from this origin
// only, plus the hashes of the two inline pieces the client needs — the theme script in index.html
// (it runs before first paint) and the one style element cytoscape injects for its container.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import helmet from 'helmet';
import type { RequestHandler } from 'express';

// cytoscape's renderer adds exactly this rule (node_modules/cytoscape, "__________cytoscape_stylesheet")
export const cytoscapeInjectedStyle = '.__________cytoscape_container { position: relative; }';

export function cspHash(text: string): string {
  return `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;
}

/** Hashes of the inline <script> elements of the built index.html (no src attribute). */
export function inlineScriptHashes(staticDir: string): string[] {
  const index = path.join(staticDir, 'index.html');
  if (!staticDir || !existsSync(index)) return [];
  const html = readFileSync(index, 'utf8');
  return [...html.matchAll(/<script(?![^>]*\bsrc=)[^>]*>([\s\S]*?)<\/script>/g)].map((m) => cspHash(m[1]!));
}

export function securityHeaders(options: { staticDir: string; production: boolean; imageHosts: string[] }): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        'default-src': ["'self'"],
        'script-src': ["'self'", ...inlineScriptHashes(options.staticDir)],
        'style-src': ["'self'", cspHash(cytoscapeInjectedStyle)],
        'img-src': ["'self'", 'data:', 'blob:', ...options.imageHosts],
        'font-src': ["'self'"],
        'connect-src': ["'self'"],
        'form-action': ["'self'"],
        'frame-ancestors': ["'none'"],
        'base-uri': ["'none'"],
        'object-src': ["'none'"],
        ...(options.production ? { 'upgrade-insecure-requests': [] } : {}),
      },
    },
    strictTransportSecurity: options.production ? { maxAge: 31_536_000, includeSubDomains: true } : false,
    crossOriginEmbedderPolicy: false,
    referrerPolicy: { policy: 'same-origin' },
  });
}
