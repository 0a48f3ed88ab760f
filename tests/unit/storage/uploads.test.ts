// Pure parts of placement photos: format signatures, display names, the stand-in's signatures
// (checked against the upload SDK's own signer and verifier, @uploadthing/shared 7.1.10, and an
// RFC 4231 HMAC-SHA256 test vector) and the upload settings.
import { generateSignedURL, signPayload as sdkSign, verifySignature as sdkVerify } from "@uploadthing/shared";
import * as Micro from "effect/Micro";
import * as Redacted from "effect/Redacted";
import { describe, expect, it } from "vitest";
import { encodeUploadToken, LOCAL_UPLOADS, uploadConnectSources, uploadsSettings } from "@/lib/env";
import { displayName } from "@/lib/server/uploads";
import { signPayload, signUrl, urlValue, verifyPayload, verifySignedUrl } from "@/lib/storage/fake/signing";
import { sniffFormat } from "@/lib/storage/photo-pipeline";

describe("format by signature", () => {
  it("JPEG, PNG and WebP by their first bytes; anything else is null", () => {
    // ITU-T T.81 (JPEG) B.1.1.3: SOI is FF D8, and every marker starts FF.
    expect(sniffFormat(Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]))).toBe("jpeg");
    // PNG (W3C, 3rd ed.) 5.2: 137 80 78 71 13 10 26 10.
    expect(sniffFormat(Uint8Array.from([137, 80, 78, 71, 13, 10, 26, 10, 0]))).toBe("png");
    // RFC 9649 2.5: "RIFF", a 32-bit size, "WEBP".
    expect(sniffFormat(Uint8Array.from([...Buffer.from("RIFF"), 1, 2, 3, 4, ...Buffer.from("WEBPVP8 ")]))).toBe("webp");
    expect(sniffFormat(Uint8Array.from([...Buffer.from("RIFF"), 1, 2, 3, 4, ...Buffer.from("WAVEfmt ")]))).toBeNull();
    expect(sniffFormat(Buffer.from("<svg xmlns="))).toBeNull();
    expect(sniffFormat(Buffer.from("GIF89a"))).toBeNull();
    expect(sniffFormat(new Uint8Array(0))).toBeNull();
  });
});

describe("display names", () => {
  it.each([
    ["../../etc/passwd", "passwd"],
    ["..\\..\\windows\\win.ini", "win.ini"],
    ["kick drum (front).JPG", "kick drum (front).JPG"],
    ["a\u0000b<script>.jpg", "a_b_script_.jpg"],
    ["...", "photo"],
    ["Straße.jpg", "Straße.jpg"],
    ["x".repeat(300), "x".repeat(100)],
  ])("%j → %j", (raw, shown) => expect(displayName(raw)).toBe(shown));
});

describe("the stand-in's signatures match the service SDK's", () => {
  const key = LOCAL_UPLOADS.apiKey;
  it("HMAC-SHA256 as RFC 4231 test case 2 gives it", () => {
    expect(signPayload("what do ya want for nothing?", "Jefe")).toBe("hmac-sha256=5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843");
  });

  it("a payload signed by either side verifies on the other; a changed byte does not", async () => {
    const payload = JSON.stringify({ status: "uploaded", file: { key: "abc" } });
    expect(await Micro.runPromise(sdkVerify(payload, signPayload(payload, key), Redacted.make(key)))).toBe(true);
    const bySdk = await Micro.runPromise(sdkSign(payload, Redacted.make(key)));
    expect(verifyPayload(payload, bySdk, key)).toBe(true);
    expect(verifyPayload(payload.replace("abc", "abd"), bySdk, key)).toBe(false);
  });

  it("a presigned URL made by the SDK verifies, with its values encoded twice; tampering or expiry is refused", async () => {
    const url = await Micro.runPromise(
      generateSignedURL("http://127.0.0.1:2620/KEY123", Redacted.make(key), { ttlInSeconds: 60, data: { "x-ut-identifier": "axisline-local", "x-ut-file-name": "kick drum & snare.jpg", "x-ut-file-size": 1234 } }),
    );
    const check = verifySignedUrl(url, key);
    expect(check.ok).toBe(true);
    if (check.ok) expect(urlValue(check.params, "x-ut-file-name")).toBe("kick drum & snare.jpg");
    expect(verifySignedUrl(url.replace("1234", "9999"), key)).toMatchObject({ ok: false, error: "Invalid signature" });
    expect(verifySignedUrl(url, "sk_other")).toMatchObject({ ok: false });
    expect(verifySignedUrl(url, key, Date.now() + 61_000)).toMatchObject({ ok: false, error: "URL expired" });
    expect(verifySignedUrl(signUrl("http://127.0.0.1:2620/f/K", key, 60), key).ok).toBe(true);
  });
});

describe("upload settings", () => {
  it("local mode: the stand-in's token and address unless set; only loopback", () => {
    const s = uploadsSettings({}, "local");
    expect(s).toMatchObject({ apiKey: LOCAL_UPLOADS.apiKey, appId: "axisline-local", ingestUrl: "http://127.0.0.1:2620", apiUrl: "http://127.0.0.1:2620" });
    expect(() => uploadsSettings({ UPLOADTHING_INGEST_URL: "http://uploads.example:2620" }, "local")).toThrow(/loopback/);
  });

  it("hosted mode: a real token is required, the SDK's own hosts unless https URLs are set", () => {
    expect(() => uploadsSettings({}, "hosted")).toThrow(/UPLOADTHING_TOKEN must be set/);
    expect(() => uploadsSettings({ UPLOADTHING_TOKEN: encodeUploadToken(LOCAL_UPLOADS) }, "hosted")).toThrow(/not the local stand-in's/);
    const token = encodeUploadToken({ apiKey: "sk_live_abc", appId: "app1", regions: ["sea1"] });
    expect(uploadsSettings({ UPLOADTHING_TOKEN: token }, "hosted")).toMatchObject({ appId: "app1", ingestUrl: undefined, apiUrl: undefined });
    expect(() => uploadsSettings({ UPLOADTHING_TOKEN: token, UPLOADTHING_API_URL: "http://api.example" }, "hosted")).toThrow(/https/);
    expect(() => uploadsSettings({ UPLOADTHING_TOKEN: Buffer.from('{"apiKey":"pk_x"}').toString("base64") }, "hosted")).toThrow(/base64 of/);
  });

  it("the CSP's connect-src names the ingest the browser PUTs to", () => {
    expect(uploadConnectSources({ UPLOADTHING_INGEST_URL: "http://127.0.0.1:2621/" })).toEqual(["http://127.0.0.1:2621"]);
    expect(uploadConnectSources({ SERVICES_MODE: "local" })).toEqual(["http://127.0.0.1:2620"]);
    expect(uploadConnectSources({ NODE_ENV: "production" })).toEqual(["https://*.ingest.uploadthing.com"]);
  });
});

describe("the served photos' headers", () => {
  it("next.config gives /api/photos/* the photo policy after the general one (config headers replace a route's own)", async () => {
    const config = (await import("@/next.config")).default;
    const rules = await config.headers!();
    const photo = rules.findLast((r) => r.source === "/api/photos/:path*");
    expect(rules.indexOf(photo!)).toBeGreaterThan(rules.findIndex((r) => r.source === "/:path*"));
    expect(photo!.headers).toEqual([{ key: "Content-Security-Policy", value: "default-src 'none'; sandbox" }]);
  });
});
