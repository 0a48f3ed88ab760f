// Writes the reverse proxy's configuration from axisline.conf.template (kept in the repo) into
// its folder under .data/, with the folders nginx writes to, ready for
//   nginx -c <dir>/nginx.conf -p <dir> -e <dir>/logs/error.log
// Used by scripts/lib.sh (start_proxy) for npm run start:cluster and npm test, and by the
// cluster tests for a proxy in front of a stand-in upstream.
//   node --import tsx scripts/nginx/render-config.ts --dir <abs> --listen 127.0.0.1:8080 \
//        --upstream 127.0.0.1:3001 --upstream 127.0.0.1:3002 [--build-id <id>]
import { chmodSync, chownSync, existsSync, mkdirSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { execFileSync } from "node:child_process";
import path from "node:path";
import { fileURLToPath } from "node:url";

const TEMPLATE = path.join(path.dirname(fileURLToPath(import.meta.url)), "axisline.conf.template");
/** Debian's libnginx-mod-http-brotli-filter puts the module here (absolute: -p would re-root a relative path). */
export const BROTLI_MODULE = "/usr/lib/nginx/modules/ngx_http_brotli_filter_module.so";

export type ProxySettings = {
  /** Absolute folder for the config, pid, logs, temp files and cache. */
  dir: string;
  /** host:port; loopback only. */
  listen: string;
  upstreams: string[];
  buildId: string;
  /** Workers drop to this account when the master runs as root; null when it does not. */
  user: string | null;
  brotli: boolean;
};

const LOOPBACK_LISTEN = /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}:\d{1,5}$/;

/** Pure: the template with every {{NAME}} filled; a name left unfilled or unknown is an error. */
export function renderNginxConfig(template: string, s: ProxySettings): string {
  if (!path.isAbsolute(s.dir)) throw new Error(`the proxy folder must be an absolute path, not ${s.dir}`);
  if (!LOOPBACK_LISTEN.test(s.listen)) throw new Error(`the proxy listens on loopback only (127.x.x.x:port), not ${s.listen}`);
  if (s.upstreams.length === 0) throw new Error("the proxy needs at least one app instance");
  for (const u of s.upstreams) if (!LOOPBACK_LISTEN.test(u)) throw new Error(`app instances are on loopback (127.x.x.x:port), not ${u}`);
  // A unix socket's path must fit in sockaddr_un (108 bytes on Linux, with its terminating NUL).
  if (Buffer.byteLength(path.join(s.dir, "compress.sock")) > 100) throw new Error(`the proxy folder's path is too long for a unix socket inside it: ${s.dir}`);
  if (!/^[\w-]+$/.test(s.buildId)) throw new Error(`a build id is letters, digits, - and _, not ${s.buildId}`);
  const values: Record<string, string> = {
    DIR: s.dir,
    LISTEN: s.listen,
    BUILD_ID: s.buildId,
    USER_LINE: s.user ? `user ${s.user};` : "# (not root: workers run as the current user)",
    LOAD_MODULES: s.brotli ? `load_module ${BROTLI_MODULE};` : "# (brotli module not installed: gzip only)",
    BROTLI: s.brotli
      ? ["    brotli on;", "    brotli_comp_level 5;", "    brotli_min_length 1024;", "    brotli_types text/plain text/css text/csv text/xml application/javascript application/json application/manifest+json application/xml image/svg+xml;"].join("\n")
      : "    # (no brotli module)",
    BROTLI_ENCODING: s.brotli ? '    "~*\\bbr\\b" br;' : "    # (no brotli module: gzip or nothing)",
    // One failure takes an instance out for 10 s; the other carries the load meanwhile.
    UPSTREAM_SERVERS: s.upstreams.map((u) => `    server ${u} max_fails=1 fail_timeout=10s;`).join("\n"),
  };
  const out = template.replace(/\{\{([A-Z_]+)\}\}/g, (_, name: string) => {
    if (!(name in values)) throw new Error(`the nginx template names {{${name}}}, which render-config.ts does not fill`);
    return values[name];
  });
  return out;
}

const UNAVAILABLE_PAGE = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Axisline is restarting</title></head>
<body style="font-family: system-ui, sans-serif; max-width: 36rem; margin: 4rem auto; padding: 0 1rem; line-height: 1.5">
<h1>Axisline is restarting</h1>
<p>The site is not answering right now. Please try again in a few seconds; what the site already confirmed as saved is kept.</p>
</body></html>
`;

/** Writes nginx.conf and the folders nginx needs; the cache and temp folders belong to the workers' account. */
export function writeProxyFolder(s: ProxySettings): string {
  const folders = ["logs", "temp", "temp/client_body", "temp/proxy", "temp/fastcgi", "temp/uwsgi", "temp/scgi", "cache", "html", "bench"];
  for (const f of folders) mkdirSync(path.join(s.dir, f), { recursive: true });
  writeFileSync(path.join(s.dir, "html", "__unavailable.html"), UNAVAILABLE_PAGE);
  // A socket left by an nginx that was killed would make the next one fail to bind (callers stop it first).
  rmSync(path.join(s.dir, "compress.sock"), { force: true });
  const file = path.join(s.dir, "nginx.conf");
  writeFileSync(file, renderNginxConfig(readFileSync(TEMPLATE, "utf8"), s));
  if (s.user) {
    const uid = Number(execFileSync("id", ["-u", s.user], { encoding: "utf8" }).trim());
    const gid = Number(execFileSync("id", ["-g", s.user], { encoding: "utf8" }).trim());
    for (const f of ["temp", "temp/client_body", "temp/proxy", "temp/fastcgi", "temp/uwsgi", "temp/scgi", "cache"]) chownSync(path.join(s.dir, f), uid, gid);
    // The workers' account must be able to walk down to the cache and temp folders.
    for (let p = s.dir; p !== path.dirname(p); p = path.dirname(p)) chmodSync(p, (statSync(p).mode | 0o001) & 0o7777);
  }
  return file;
}

/** root: workers drop to www-data (Debian's web account), else nobody. Not root: no user line. */
export function workerAccount(): string | null {
  if (process.getuid?.() !== 0) return null;
  for (const name of ["www-data", "nobody"]) {
    try {
      execFileSync("id", ["-u", name], { stdio: "ignore" });
      return name;
    } catch {
      // try the next one
    }
  }
  throw new Error("no unprivileged account (www-data or nobody) for nginx's workers");
}

function main(argv: string[]) {
  const take = (flag: string) => argv.flatMap((a, i) => (a === flag && argv[i + 1] ? [argv[i + 1]] : []));
  const dir = take("--dir")[0];
  const listen = take("--listen")[0];
  if (!dir || !listen) throw new Error("usage: render-config.ts --dir <abs> --listen 127.0.0.1:<port> --upstream 127.0.0.1:<port>... [--build-id <id>]");
  const settings: ProxySettings = {
    dir: path.resolve(dir),
    listen,
    upstreams: take("--upstream"),
    buildId: take("--build-id")[0] ?? "no-build",
    user: workerAccount(),
    brotli: existsSync(BROTLI_MODULE),
  };
  console.log(writeProxyFolder(settings));
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  try {
    main(process.argv.slice(2));
  } catch (err) {
    console.error(`[nginx] ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  }
}
