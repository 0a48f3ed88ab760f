// Draws the web app manifest's icons (public/icons/*.png) from app/icon.svg, so the tab icon and the
// installed-app icon are one drawing. Run after changing app/icon.svg:
//   npx tsx scripts/draw-icons.ts
// sharp is the image library Next.js itself uses (a dependency of `next`); it renders SVG through librsvg.
// The maskable icon fills the whole square (the platform cuts its own shape) and keeps the mark
// inside the central circle of radius 40 % that every mask leaves visible (W3C Web App Manifest,
// "purpose" member: maskable icons and their safe zone).
import { readFileSync, mkdirSync, writeFileSync } from "node:fs";
import sharp from "sharp";

const svg = readFileSync("app/icon.svg", "utf8");
const tile = /<rect width="32" height="32" rx="[\d.]+" fill="(#[0-9a-f]{6})"\/>/i.exec(svg);
if (!tile) throw new Error("app/icon.svg: expected a 32×32 rounded tile as its first shape; update scripts/draw-icons.ts");
const tileColour = tile[1];
const mark = svg.slice(tile.index + tile[0].length, svg.lastIndexOf("</svg>"));

// The mark reaches 12.75 of 16 units from the centre (the ring and its stroke): scaled by 0.78 it ends at 31 % of the width.
const maskable = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" fill="${tileColour}"/><g transform="translate(16 16) scale(0.78) translate(-16 -16)">${mark}</g></svg>`;

async function draw(source: string, size: number, file: string) {
  const png = await sharp(Buffer.from(source), { density: (72 * size) / 32 }).resize(size, size).png({ compressionLevel: 9 }).toBuffer();
  writeFileSync(file, png);
  console.log(`${file}: ${size}×${size}, ${png.length} bytes`);
}

mkdirSync("public/icons", { recursive: true });
await draw(svg, 192, "public/icons/icon-192.png");
await draw(svg, 512, "public/icons/icon-512.png");
await draw(maskable, 512, "public/icons/icon-maskable-512.png");
