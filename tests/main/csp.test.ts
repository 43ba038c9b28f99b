import { describe, expect, it } from 'vitest';
import { CSP, SECURITY_HEADERS } from '../../main/csp';

const directives = new Map(
  CSP.split(';')
    .map((d) => d.trim().split(/\s+/))
    .map(([name, ...sources]) => [name as string, sources]),
);

describe('Content-Security-Policy', () => {
  it('allows no eval and no inline script anywhere', () => {
    expect(CSP).not.toContain("'unsafe-eval'");
    expect(CSP).not.toContain("'wasm-unsafe-eval'");
    expect(CSP).not.toContain("'unsafe-inline'");
    expect(directives.get('script-src')).toEqual(["'self'"]);
  });

  it('defaults to the app itself and names no remote source', () => {
    expect(directives.get('default-src')).toEqual(["'self'"]);
    for (const [name, sources] of directives) {
      for (const s of sources) {
        expect(s, `${name} ${s}`).toMatch(/^('self'|'none'|data:|blob:)$/);
      }
    }
  });

  it('shuts plugins, framing, base and form targets', () => {
    expect(directives.get('object-src')).toEqual(["'none'"]);
    expect(directives.get('frame-ancestors')).toEqual(["'none'"]);
    expect(directives.get('base-uri')).toEqual(["'none'"]);
    expect(directives.get('form-action')).toEqual(["'none'"]);
  });

  it('is sent as a header', () => {
    expect(SECURITY_HEADERS['Content-Security-Policy']).toBe(CSP);
    expect(SECURITY_HEADERS['X-Content-Type-Options']).toBe('nosniff');
  });
});
