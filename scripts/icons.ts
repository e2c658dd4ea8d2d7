// Renders the app's install icons (public/icons/*.png) from our own mark, app/icon.svg, in Debian's Chromium:
// `npx tsx scripts/icons.ts`. "any" icons are the mark as drawn; "maskable" ones put the mark inside the
// central safe circle (80% of the side) on a full-bleed spruce square, so a launcher's mask never cuts it.
// app/favicon.ico is the 32 px mark in an ICO file holding one PNG (browsers ask for /favicon.ico by name).
import { readFile, writeFile } from "node:fs/promises";
import path from "node:path";
import { launchChromium } from "../tests/e2e/support/browser";

const SPRUCE = "#1E5B4F";

function page(svg: string, size: number, maskable: boolean): string {
  const inner = maskable ? Math.round(size * 0.62) : size;
  const background = maskable ? SPRUCE : "transparent";
  return `<!doctype html><html><body style="margin:0;width:${size}px;height:${size}px;background:${background};display:grid;place-items:center">
    <div style="width:${inner}px;height:${inner}px">${svg.replace("<svg ", `<svg width="${inner}" height="${inner}" `)}</div></body></html>`;
}

/** An ICO file with one PNG image: the 6-byte header, one 16-byte directory entry, then the PNG. */
function icoWithPng(png: Buffer, size: number): Buffer {
  const header = Buffer.alloc(22);
  header.writeUInt16LE(0, 0); // reserved
  header.writeUInt16LE(1, 2); // type: icon
  header.writeUInt16LE(1, 4); // one image
  header.writeUInt8(size, 6);
  header.writeUInt8(size, 7);
  header.writeUInt8(0, 8); // no palette
  header.writeUInt8(0, 9);
  header.writeUInt16LE(1, 10); // color planes
  header.writeUInt16LE(32, 12); // bits per pixel
  header.writeUInt32LE(png.length, 14);
  header.writeUInt32LE(22, 18); // the image starts after the header and the entry
  return Buffer.concat([header, png]);
}

async function main(): Promise<void> {
  const svg = await readFile(path.resolve("app/icon.svg"), "utf8");
  const browser = await launchChromium();
  try {
    const targets = [
      { file: "icon-192.png", size: 192, maskable: false },
      { file: "icon-512.png", size: 512, maskable: false },
      { file: "icon-maskable-192.png", size: 192, maskable: true },
      { file: "icon-maskable-512.png", size: 512, maskable: true },
      { file: "apple-touch-icon.png", size: 180, maskable: true },
    ];
    for (const t of targets) {
      const context = await browser.newContext({ viewport: { width: t.size, height: t.size }, deviceScaleFactor: 1 });
      const tab = await context.newPage();
      await tab.setContent(page(svg, t.size, t.maskable));
      const png = await tab.screenshot({ omitBackground: !t.maskable, clip: { x: 0, y: 0, width: t.size, height: t.size } });
      await writeFile(path.resolve("public/icons", t.file), png);
      await context.close();
      console.log(`public/icons/${t.file} ${t.size}x${t.size}`);
    }
    const context = await browser.newContext({ viewport: { width: 32, height: 32 }, deviceScaleFactor: 1 });
    const tab = await context.newPage();
    await tab.setContent(page(svg, 32, false));
    const png = await tab.screenshot({ omitBackground: true, clip: { x: 0, y: 0, width: 32, height: 32 } });
    await writeFile(path.resolve("app/favicon.ico"), icoWithPng(png, 32));
    await context.close();
    console.log("app/favicon.ico 32x32");
  } finally {
    await browser.close();
  }
}

await main();
