import "server-only";
// The certificate as a one-page PDF (pdf-lib + @pdf-lib/fontkit), our own design: landscape, a
// warm paper tone, an "axis line" with level-meter ticks across the page, the graduate's name
// large, the course, the facts in a row, and at the foot the verification code beside a QR code
// (drawn as vector squares from the `qrcode` package's module matrix) that opens /verify/<code>.
// Fonts: IBM Plex Sans (SIL OFL, fonts/ibm-plex-sans/LICENSE) as .woff with subset: true
// (a woff2 or an unsubset woff breaks in pdf-lib; see STACK.md trap 7).
import { readFile } from "node:fs/promises";
import path from "node:path";
import fontkit from "@pdf-lib/fontkit";
import { PDFDocument, rgb, type PDFFont, type PDFPage } from "pdf-lib";
import QRCode from "qrcode";
import { formatCode } from "./code";

/** Landscape page sizes in PostScript points (1/72 in): ISO 216 A4 is 297 × 210 mm; US Letter is 11 × 8.5 in. */
export const PAPER = { a4: { width: 841.89, height: 595.28 }, letter: { width: 792, height: 612 } } as const;
export type Paper = keyof typeof PAPER;

export type CertificatePdfInput = {
  recipientName: string;
  courseTitle: string;
  issuedAt: Date;
  hours: number;
  schoolName: string | null;
  instructorName: string | null;
  code: string;
  verifyUrl: string;
  paper: Paper;
};

const INK = rgb(0x17 / 255, 0x16 / 255, 0x1c / 255);
const MUTED = rgb(0x55 / 255, 0x52 / 255, 0x5e / 255);
const PAPER_TONE = rgb(0xfb / 255, 0xf8 / 255, 0xf1 / 255);
const ACCENT = rgb(0xa8 / 255, 0x64 / 255, 0x00 / 255);
const RULE = rgb(0xd9 / 255, 0xd5 / 255, 0xcc / 255);

let fontBytes: Promise<{ regular: Buffer; bold: Buffer }> | undefined;

function loadFonts() {
  const dir = path.join(process.cwd(), "fonts", "ibm-plex-sans");
  fontBytes ??= Promise.all([readFile(path.join(dir, "ibm-plex-sans-latin-400-normal.woff")), readFile(path.join(dir, "ibm-plex-sans-latin-700-normal.woff"))]).then(([regular, bold]) => ({ regular, bold }));
  return fontBytes;
}

/** "4 December 2026", in UTC (the date the certificate was issued, wherever it is printed). */
export function certificateDate(at: Date): string {
  return new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" }).format(at);
}

export function hoursText(hours: number): string {
  return `${Number.isInteger(hours) ? hours : hours.toFixed(1)} ${hours === 1 ? "hour" : "hours"}`;
}

/** The largest size ≤ max at which the text fits the width. */
function fitSize(font: PDFFont, text: string, max: number, width: number): number {
  const at = font.widthOfTextAtSize(text, max);
  return at <= width ? max : Math.max(10, Math.floor((max * width) / at));
}

/** The axis line: a rule across the page with meter-style ticks, taller every fifth. */
function drawAxisLine(page: PDFPage, y: number, margin: number) {
  const { width } = page.getSize();
  page.drawLine({ start: { x: margin, y }, end: { x: width - margin, y }, thickness: 1.2, color: ACCENT });
  const step = (width - 2 * margin) / 60;
  for (let i = 0; i <= 60; i++) {
    const tall = i % 5 === 0;
    page.drawLine({ start: { x: margin + i * step, y }, end: { x: margin + i * step, y: y + (tall ? 7 : 3.5) }, thickness: tall ? 1 : 0.6, color: ACCENT });
  }
}

/** The QR code as filled squares, runs of dark modules in a row merged into one rectangle. */
function drawQr(page: PDFPage, text: string, x: number, y: number, size: number) {
  const qr = QRCode.create(text, { errorCorrectionLevel: "M" });
  const n = qr.modules.size;
  const quiet = 4; // ISO/IEC 18004 quiet zone: four modules on every side
  const cell = size / (n + 2 * quiet);
  page.drawRectangle({ x, y, width: size, height: size, color: rgb(1, 1, 1) });
  for (let row = 0; row < n; row++) {
    let col = 0;
    while (col < n) {
      if (!qr.modules.get(row, col)) {
        col++;
        continue;
      }
      const start = col;
      while (col < n && qr.modules.get(row, col)) col++;
      page.drawRectangle({ x: x + (quiet + start) * cell, y: y + size - (quiet + row + 1) * cell, width: (col - start) * cell, height: cell, color: INK });
    }
  }
}

/**
 * The facts in columns, label over value. Widths are measured only where a value can be long
 * (school, instructor): every measurement is a text layout in fontkit, the main cost of a page.
 */
function drawFacts(page: PDFPage, facts: { label: string; value: string; long: boolean }[], x: number, y: number, width: number, fonts: { regular: PDFFont; bold: PDFFont }) {
  const column = width / facts.length;
  facts.forEach((fact, i) => {
    const left = x + column * i;
    page.drawText(fact.label.toUpperCase(), { x: left, y: y + 18, size: 8.5, font: fonts.regular, color: MUTED });
    const size = fact.long ? fitSize(fonts.bold, fact.value, 13, column - 14) : 13;
    page.drawText(fact.value, { x: left, y, size, font: fonts.bold, color: INK });
  });
}

export async function renderCertificatePdf(input: CertificatePdfInput): Promise<Uint8Array> {
  const { width, height } = PAPER[input.paper];
  const doc = await PDFDocument.create();
  doc.registerFontkit(fontkit);
  const bytes = await loadFonts();
  const fonts = { regular: await doc.embedFont(bytes.regular, { subset: true }), bold: await doc.embedFont(bytes.bold, { subset: true }) };
  doc.setTitle(`${input.courseTitle}: certificate of ${input.recipientName}`);
  doc.setAuthor("Axisline");
  doc.setSubject(`Verification code ${formatCode(input.code)}`);
  doc.setCreationDate(input.issuedAt);

  const page = doc.addPage([width, height]);
  const margin = 56;
  const text = (value: string, x: number, y: number, size: number, font: PDFFont, color = INK) => page.drawText(value, { x, y, size, font, color });
  page.drawRectangle({ x: 0, y: 0, width, height, color: PAPER_TONE });
  page.drawRectangle({ x: 22, y: 22, width: width - 44, height: height - 44, borderColor: RULE, borderWidth: 1 });
  page.drawRectangle({ x: 22, y: 22, width: 8, height: height - 44, color: ACCENT });

  text("AXISLINE", margin, height - 74, 15, fonts.bold);
  text("Training for live-sound technicians", margin + 96, height - 73, 10, fonts.regular, MUTED);
  drawAxisLine(page, height - 94, margin);

  text("CERTIFICATE OF COMPLETION", margin, height - 148, 13, fonts.regular, ACCENT);
  const usable = width - 2 * margin;
  text(input.recipientName, margin, height - 200, fitSize(fonts.bold, input.recipientName, 38, usable), fonts.bold);
  text("has completed every lesson, module quiz and reviewed placement of the course", margin, height - 234, 12, fonts.regular, MUTED);
  text(input.courseTitle, margin, height - 272, fitSize(fonts.bold, input.courseTitle, 26, usable), fonts.bold);

  const facts = [
    { label: "Issued", value: certificateDate(input.issuedAt), long: false },
    { label: "Study time", value: hoursText(input.hours), long: false },
  ];
  if (input.schoolName) facts.push({ label: "School", value: input.schoolName, long: true });
  if (input.instructorName) facts.push({ label: "Instructor", value: input.instructorName, long: true });
  drawFacts(page, facts, margin, height - 345, usable, fonts);

  const qrSize = 104;
  const footY = 44;
  drawQr(page, input.verifyUrl, width - margin - qrSize, footY, qrSize);
  page.drawLine({ start: { x: margin, y: footY + qrSize + 14 }, end: { x: width - margin, y: footY + qrSize + 14 }, thickness: 0.6, color: RULE });
  text("VERIFICATION CODE", margin, footY + 78, 8.5, fonts.regular, MUTED);
  text(formatCode(input.code), margin, footY + 52, 20, fonts.bold);
  text(`Check this certificate at ${input.verifyUrl}`, margin, footY + 30, 9.5, fonts.regular, MUTED);
  text("or scan the code on the right. Axisline keeps the record; a revoked certificate shows as revoked there.", margin, footY + 16, 9.5, fonts.regular, MUTED);

  return doc.save({ useObjectStreams: true });
}
