// Placement photos through the real upload SDK against a private stand-in: the route's middleware,
// the presigned PUT, the signed callback, processing, and what a bad upload comes to. Metadata of
// served copies is read with Debian's exiftool (an outside tool) and with sharp.
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/connection";
import { uploads } from "@/db/schema";
import { PHOTO_LIMITS } from "@/lib/dto/uploads";
import { signInWithPassword } from "@/lib/server/accounts";
import { sessionCookieName } from "@/lib/server/session-policy";
import { readPhoto } from "@/lib/server/uploads";
import { processPhoto, sniffFormat } from "@/lib/storage/photo-pipeline";
import { exiftoolRead, exiftoolWrite, noiseJpeg, pixelFloodPng, solidPng } from "../support/photos";
import { putFile, requestUpload, startUploadsHarness, uploadFiles, type Harness } from "../support/uploads";
import { uniqueAddress } from "../support/unique";
import { createUser, ctx, testDb, viewerFromToken } from "./helpers";

let h: Harness;
let apprentice: { cookie: string; viewer: NonNullable<Awaited<ReturnType<typeof viewerFromToken>>> };

async function signedIn(role: "apprentice" | "instructor" = "apprentice") {
  const u = await createUser(role);
  const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
  if (!s.ok) throw new Error("sign-in failed");
  return { cookie: `${sessionCookieName()}=${s.sessionToken}`, viewer: (await viewerFromToken(s.sessionToken))! };
}

const row = async (id: string) => (await testDb().select().from(uploads).where(eq(uploads.id, id)))[0];

/** Uploads one file as the apprentice; answers the row, the PUT's serverData and the service's key. */
async function uploadOne(name: string, type: string, bytes: Uint8Array) {
  const { presigned, puts } = await uploadFiles(h.appUrl, apprentice.cookie, uniqueAddress(), [{ name, type, bytes }]);
  expect(puts[0].status).toBe(200);
  return { id: presigned[0].customId!, key: presigned[0].key, serviceName: presigned[0].name, serverData: puts[0].body.serverData as Record<string, unknown>, row: await row(presigned[0].customId!) };
}

beforeAll(async () => {
  h = await startUploadsHarness();
  apprentice = await signedIn();
});

afterAll(async () => {
  await h.close();
  await closeDb();
});

describe("a good photo", () => {
  it("is recorded before the upload, stored by the signed callback, processed, and its original deleted", async () => {
    const bytes = await noiseJpeg(800, 600);
    const asked = await requestUpload(h.appUrl, apprentice.cookie, uniqueAddress(), [{ name: "kick.jpg", type: "image/jpeg", size: bytes.length }]);
    expect(asked.status).toBe(200);
    const [presigned] = asked.body as { url: string; key: string; customId: string; name: string }[];
    // The row exists, pending, before any byte moves; its id is the service's customId.
    expect(await row(presigned.customId)).toMatchObject({ status: "pending", ownerId: apprentice.viewer.id, originalName: "kick.jpg", byteSize: bytes.length });
    const put = await putFile({ ...presigned }, { name: "kick.jpg", type: "image/jpeg", bytes });
    expect(put.rangeStart).toBe("0");
    expect(put.status).toBe(200);
    expect(put.body.serverData).toMatchObject({ uploadId: presigned.customId, status: "processed", width: 800, height: 600 });
    const done = await row(presigned.customId);
    expect(done).toMatchObject({ status: "processed", fileKey: presigned.key, width: 800, height: 600 });
    expect(h.fake.state.store.get(presigned.key)).toBeUndefined(); // the original is gone
    expect(h.fake.state.deliveries.find((d) => d.fileKey === presigned.key)).toMatchObject({ outcome: "delivered", status: 200 });
    const thumb = await readPhoto(apprentice.viewer, { uploadId: presigned.customId, variant: "thumb" });
    if (!thumb.ok) throw new Error(thumb.code);
    expect(await sharp(thumb.photo.body).metadata()).toMatchObject({ format: "jpeg", width: 320, height: 240 });
  });
});

// Each bad upload: what the apprentice is told, that the row says so, that nothing is served and
// that the original left the service (or never reached it).
async function expectRefused(upload: Awaited<ReturnType<typeof uploadOne>>, sentence: RegExp) {
  expect(upload.serverData).toMatchObject({ uploadId: upload.id, status: "failed" });
  expect(String(upload.serverData.message)).toMatch(sentence);
  expect(upload.row).toMatchObject({ status: "failed", failureReason: upload.serverData.message });
  expect(h.fake.state.store.get(upload.key)).toBeUndefined();
  expect(await readPhoto(apprentice.viewer, { uploadId: upload.id, variant: "display" })).toMatchObject({ ok: false, code: "not_found" });
}

describe("bad uploads are refused or sanitised", () => {
  it("an HTML page renamed .jpg (declared image/jpeg) is refused by its bytes", async () => {
    const html = Buffer.from("<!doctype html><html><body><script>alert(document.cookie)</script></body></html>");
    await expectRefused(await uploadOne("holiday.jpg", "image/jpeg", html), /not a JPEG, PNG or WebP/);
  });

  it("an SVG with a script (the route's 'image' type lets it through) is refused by its bytes", async () => {
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script><rect width="10" height="10"/></svg>');
    await expectRefused(await uploadOne("stage.svg", "image/svg+xml", svg), /not a JPEG, PNG or WebP/);
  });

  it("an oversized file is refused before any row or URL exists, and a PUT larger than its signed size is refused by the service", async () => {
    const before = (await testDb().select().from(uploads).where(eq(uploads.ownerId, apprentice.viewer.id))).length;
    const tooBig = PHOTO_LIMITS.maxBytes + 1;
    const asked = await requestUpload(h.appUrl, apprentice.cookie, uniqueAddress(), [{ name: "huge.jpg", type: "image/jpeg", size: tooBig }]);
    expect(asked.status).toBe(400);
    expect((asked.body as { message: string }).message).toMatch(/at most 16 MB/);
    expect((await testDb().select().from(uploads).where(eq(uploads.ownerId, apprentice.viewer.id))).length).toBe(before);
    // Lying about the size: 2 KB declared, 40 KB sent. The presigned URL is signed for 2 KB.
    const small = await requestUpload(h.appUrl, apprentice.cookie, uniqueAddress(), [{ name: "liar.jpg", type: "image/jpeg", size: 2048 }]);
    const [p] = small.body as { url: string; key: string; customId: string; name: string }[];
    const put = await putFile(p, { name: "liar.jpg", type: "image/jpeg", bytes: await noiseJpeg(160, 120, 100) });
    expect(put.status).toBe(413);
    expect(h.fake.state.store.get(p.key)).toBeUndefined();
    expect((await row(p.customId)).status).toBe("pending"); // reconciliation fails it once its URL has expired
    // And the pipeline's own cap, whatever the service let through.
    expect(await processPhoto(new Uint8Array(PHOTO_LIMITS.maxBytes + 1))).toMatchObject({ ok: false, reason: expect.stringMatching(/larger than 16 MB/) });
  });

  it("a pixel flood (a 20000 × 20000 PNG of one colour, a few tens of KB) is refused before decoding", async () => {
    const flood = pixelFloodPng(20000, 20000);
    expect(flood.length).toBeLessThan(100_000);
    expect(await sharp(flood, { limitInputPixels: false }).metadata()).toMatchObject({ format: "png", width: 20000, height: 20000 }); // a real PNG, by sharp's reading
    await expectRefused(await uploadOne("flood.png", "image/png", flood), /20000 × 20000 pixels, more than 40 megapixels/);
  });

  it("a photo with GPS, XMP, a camera orientation and a wide-gamut profile is served upright with no metadata at all", async () => {
    const plain = await sharp(await noiseJpeg(400, 300)).withIccProfile("p3").jpeg().toBuffer();
    // Orientation 6 = rotate 90° clockwise to display (EXIF 2.32 / CIPA DC-008, tag 0x0112).
    const tagged = await exiftoolWrite(plain, ["-GPSLatitude=51.5007", "-GPSLatitudeRef=N", "-GPSLongitude=0.1246", "-GPSLongitudeRef=W", "-Orientation=6", "-XMP-dc:Creator=Test Apprentice", "-Artist=Test Apprentice"]);
    const source = await exiftoolRead(tagged);
    expect(source["GPS:GPSLatitude"]).toBeCloseTo(51.5007, 3);
    expect(source["IFD0:Orientation"]).toBe(6);
    expect(source["ICC-header:ProfileDescription"] ?? source["ICC_Profile:ProfileDescription"]).toBeDefined();
    const upload = await uploadOne("gps.jpg", "image/jpeg", tagged);
    expect(upload.serverData).toMatchObject({ status: "processed", width: 300, height: 400 }); // turned upright
    for (const variant of ["display", "thumb"] as const) {
      const served = await readPhoto(apprentice.viewer, { uploadId: upload.id, variant });
      if (!served.ok) throw new Error(served.code);
      const tags = await exiftoolRead(served.photo.body);
      const groups = new Set(Object.keys(tags).map((k) => k.split(":")[0]));
      for (const banned of ["GPS", "IFD0", "ExifIFD", "XMP-dc", "XMP-x", "ICC_Profile", "ICC-header", "IPTC", "Photoshop"]) expect(groups.has(banned), banned).toBe(false);
      expect(Object.keys(tags).filter((k) => /GPS|Orientation|Artist|Creator/.test(k))).toEqual([]);
      const meta = await sharp(served.photo.body).metadata();
      expect(meta).toMatchObject({ format: "jpeg", space: "srgb" });
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.icc).toBeUndefined();
      expect(meta.orientation).toBeUndefined();
    }
  });

  it("a path-traversal file name is kept only as a display name; the service and the download see the sanitised one", async () => {
    const upload = await uploadOne("../../../etc/passwd\u0000.jpg", "image/jpeg", await noiseJpeg(200, 150));
    expect(upload.row).toMatchObject({ status: "processed", originalName: "passwd_.jpg" });
    expect(upload.serviceName).toBe("passwd_.jpg"); // the name signed into the presigned URL
    const served = await readPhoto(apprentice.viewer, { uploadId: upload.id, variant: "display" });
    if (!served.ok) throw new Error(served.code);
    expect(served.photo.filename).toBe("passwd_-display.jpg");
    const { photoResponse } = await import("@/lib/server/photo-response");
    const res = photoResponse(served.photo);
    expect(res.headers.get("content-disposition")).toBe(`inline; filename="passwd_-display.jpg"; filename*=UTF-8''passwd_-display.jpg`);
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("content-security-policy")).toBe("default-src 'none'; sandbox");
    expect(res.headers.get("content-type")).toBe("image/jpeg");
  });

  it("a declared type that disagrees with the bytes: the bytes decide, and what is served is our own JPEG", async () => {
    const png = await solidPng(300, 200);
    const upload = await uploadOne("really-a-png.jpg", "image/jpeg", png);
    expect(upload.serverData).toMatchObject({ status: "processed", width: 300, height: 200 });
    const served = await readPhoto(apprentice.viewer, { uploadId: upload.id, variant: "display" });
    if (!served.ok) throw new Error(served.code);
    expect(sniffFormat(png)).toBe("png");
    expect(sniffFormat(served.photo.body)).toBe("jpeg");
    expect(served.photo.contentType).toBe("image/jpeg");
  });

  it("a truncated JPEG is refused as damaged", async () => {
    const whole = await noiseJpeg(640, 480);
    const truncated = whole.subarray(0, Math.floor(whole.length * 0.6));
    await expectRefused(await uploadOne("cut.jpg", "image/jpeg", truncated), /damaged or incomplete/);
  });

  it("HEIC is refused with a sentence saying what to send instead", async () => {
    // The ftyp box of a HEIC file (ISO/IEC 23008-12): sharp's prebuilt libvips has no HEVC decoder.
    const heic = Buffer.concat([Buffer.from([0, 0, 0, 24]), Buffer.from("ftypheic\0\0\0\0mif1heic", "latin1"), Buffer.alloc(64)]);
    expect(await processPhoto(heic)).toMatchObject({ ok: false, reason: expect.stringMatching(/HEIC photos can't be read here/) });
  });
});
