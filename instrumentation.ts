// Runs once when the server starts: a bad environment stops it here, with a sentence.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { env } = await import("./lib/env");
    try {
      env();
    } catch (err) {
      console.error(err instanceof Error ? err.message : err);
      process.exit(1);
    }
    // Static pages are answered with the cached page as a string: send its bytes, encoded once,
    // and to a client that accepts gzip, its gzip, compressed once.
    const { ServerResponse } = await import("node:http");
    const { installPrecompressedEnd } = await import("./lib/server/runtime/precompressed-end");
    const { installCachedByteLength } = await import("./lib/server/runtime/encoded-body-cache");
    installCachedByteLength(Buffer as never, installPrecompressedEnd(ServerResponse.prototype as never));
  }
}
