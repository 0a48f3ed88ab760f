// The certificate PDF read back by outside tools: Debian's poppler-utils (pdftotext, pdftoppm)
// and zbar-tools (zbarimg), and the npm decoder jsQR on the same rendered page.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import jsQR from "jsqr";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { renderCertificatePdf, type Paper } from "@/lib/certificates/pdf";

const input = {
  recipientName: "Sunniva Hale",
  courseTitle: "Miking the Band",
  issuedAt: new Date("2027-05-14T10:20:00Z"),
  hours: 7.5,
  schoolName: "Kestrel Bay Audio School",
  instructorName: "Ines Calloway",
  code: "7KQ2M9XH4RTB",
  verifyUrl: "http://127.0.0.1:3100/verify/7KQ2-M9XH-4RTB",
};

async function render(paper: Paper) {
  const dir = mkdtempSync(path.join(tmpdir(), "axisline-pdf-"));
  const file = path.join(dir, "certificate.pdf");
  const bytes = await renderCertificatePdf({ ...input, paper });
  writeFileSync(file, bytes);
  return { dir, file, bytes };
}

describe("the certificate PDF", () => {
  it.each(["a4", "letter"] as const)("on %s: pdftotext finds the name, course, date, hours, school, instructor and code", async (paper) => {
    const { file, bytes } = await render(paper);
    expect(bytes.length).toBeLessThan(100 * 1024);
    const text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
    for (const expected of ["Sunniva Hale", "Miking the Band", "14 May 2027", "7.5 hours", "Kestrel Bay Audio School", "Ines Calloway", "7KQ2-M9XH-4RTB"]) expect(text).toContain(expected);
    // pdfinfo (poppler) reports the page in points and names the paper: ISO 216 A4 is 297 × 210 mm
    // (× 72 / 25.4 = 841.89 × 595.28 pt), US Letter 11 × 8.5 in (792 × 612 pt); landscape here.
    const info = execFileSync("pdfinfo", [file], { encoding: "utf8" });
    const [, w, h, name] = /Page size:\s+([\d.]+) x ([\d.]+) pts(?: \((\w+)\))?/.exec(info)!;
    expect([Number(w), Number(h)]).toEqual(paper === "a4" ? [841.89, 595.28] : [792, 612]);
    expect(name?.toLowerCase()).toBe(paper);
  });

  it("has a QR code that zbarimg and jsQR both read as the verification URL", async () => {
    const { dir, file } = await render("a4");
    execFileSync("pdftoppm", ["-r", "150", "-png", "-singlefile", file, path.join(dir, "page")]);
    const png = path.join(dir, "page.png");
    const zbar = execFileSync("zbarimg", ["-q", "--raw", png], { encoding: "utf8" }).trim();
    expect(zbar).toBe(input.verifyUrl);
    const { data, info } = await sharp(readFileSync(png)).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
    const decoded = jsQR(new Uint8ClampedArray(data.buffer, data.byteOffset, data.length), info.width, info.height);
    expect(decoded?.data).toBe(input.verifyUrl);
  });

  it("leaves school and instructor out when there are none (a seat bought alone)", async () => {
    const bytes = await renderCertificatePdf({ ...input, schoolName: null, instructorName: null, paper: "letter" });
    const dir = mkdtempSync(path.join(tmpdir(), "axisline-pdf-"));
    writeFileSync(path.join(dir, "c.pdf"), bytes);
    const text = execFileSync("pdftotext", [path.join(dir, "c.pdf"), "-"], { encoding: "utf8" });
    expect(text).not.toContain("SCHOOL");
    expect(text).not.toContain("INSTRUCTOR");
    expect(text).toContain("Sunniva Hale");
  });
});
