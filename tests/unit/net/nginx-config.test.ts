import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { renderNginxConfig, type ProxySettings } from "@/scripts/nginx/render-config";

// The reverse proxy's config as rendered from the template kept in the repo. Directive meanings:
// nginx's documentation of ngx_http_proxy_module (proxy_set_header, proxy_next_upstream,
// proxy_no_cache, proxy_cache_key) and ngx_http_core_module (listen, client_max_body_size).

const template = readFileSync(path.resolve(import.meta.dirname, "../../../scripts/nginx/axisline.conf.template"), "utf8");
const base: ProxySettings = {
  dir: "/srv/axisline/.data/nginx",
  listen: "127.0.0.1:8080",
  upstreams: ["127.0.0.1:3001", "127.0.0.1:3002"],
  buildId: "Abc_123-x",
  user: "www-data",
  brotli: true,
};

/** The directives of a rendered config, comments dropped, one per line. */
const directives = (conf: string) =>
  conf
    .split("\n")
    .map((l) => l.replace(/#.*$/, "").trim())
    .filter(Boolean);

describe("renderNginxConfig", () => {
  const conf = renderNginxConfig(template, base);
  const lines = directives(conf);

  it("fills every name and leaves none behind", () => {
    expect(conf).not.toMatch(/\{\{|\}\}/);
    expect(lines).toContain("user www-data;");
    expect(lines).toContain("pid /srv/axisline/.data/nginx/nginx.pid;");
    expect(lines).toContain("proxy_cache_key \"Abc_123-x|$axisline_encoding|$scheme://$host$request_uri|$http_rsc|$http_next_router_prefetch|$http_next_router_segment_prefetch\";");
  });

  it("listens on the loopback address given, and the internal block only on a unix socket in its folder", () => {
    expect(lines.filter((l) => l.startsWith("listen "))).toEqual(["listen unix:/srv/axisline/.data/nginx/compress.sock;", "listen 127.0.0.1:8080;"]);
  });

  it("overwrites X-Forwarded-For at the edge with the address nginx saw, never appends", () => {
    expect(lines).toContain("proxy_set_header X-Forwarded-For $remote_addr;");
    expect(lines.join("\n")).not.toContain("$proxy_add_x_forwarded_for");
    expect(lines).toContain('proxy_set_header Forwarded "";');
    expect(lines).toContain('proxy_set_header X-Real-IP "";');
  });

  it("never stores a response with Set-Cookie or a private Cache-Control, and marks every answer with the cache status", () => {
    expect(lines).toContain("proxy_no_cache $upstream_http_set_cookie $axisline_private_response;");
    expect(lines).toContain("~*(private|no-store|no-cache) 1;");
    expect(lines).toContain("add_header X-Cache-Status $upstream_cache_status always;");
    expect(lines.some((l) => l.startsWith("proxy_cache_valid"))).toBe(false);
  });

  it("fails over on errors, timeouts, 502 and 503 with a short connect timeout, and never retries a sent POST", () => {
    expect(lines).toContain("proxy_next_upstream error timeout http_502 http_503;");
    expect(lines).toContain("proxy_connect_timeout 1s;");
    expect(lines.join("\n")).not.toContain("non_idempotent");
    expect(lines).toContain("server 127.0.0.1:3001 max_fails=1 fail_timeout=10s;");
    expect(lines).toContain("server 127.0.0.1:3002 max_fails=1 fail_timeout=10s;");
  });

  it("caps request bodies at 1 MB (server actions' default limit)", () => {
    expect(lines).toContain("client_max_body_size 1m;");
  });

  it("loads brotli only when the module is there", () => {
    expect(lines).toContain("load_module /usr/lib/nginx/modules/ngx_http_brotli_filter_module.so;");
    expect(lines).toContain("brotli on;");
    const gzipOnly = directives(renderNginxConfig(template, { ...base, brotli: false, user: null }));
    expect(gzipOnly.some((l) => l.includes("brotli"))).toBe(false);
    expect(gzipOnly.some((l) => l.startsWith("user "))).toBe(false);
    expect(gzipOnly).toContain("gzip on;");
  });

  it("refuses anything off loopback, a relative folder and an odd build id", () => {
    expect(() => renderNginxConfig(template, { ...base, listen: "0.0.0.0:8080" })).toThrow(/loopback/);
    expect(() => renderNginxConfig(template, { ...base, upstreams: ["10.0.0.5:3001"] })).toThrow(/loopback/);
    expect(() => renderNginxConfig(template, { ...base, upstreams: [] })).toThrow(/at least one/);
    expect(() => renderNginxConfig(template, { ...base, dir: ".data/nginx" })).toThrow(/absolute/);
    expect(() => renderNginxConfig(template, { ...base, buildId: "x; include /etc/passwd" })).toThrow(/build id/);
    expect(() => renderNginxConfig(template + "\n{{UNKNOWN}}", base)).toThrow(/UNKNOWN/);
  });
});
