import QRCode from "qrcode";

/**
 * QR codes of crew links (the `qrcode` package), so a phone's camera opens the schedule from the job page, the
 * printed job sheet or the site board. Error correction M (15 % of the code may be dirty or torn, which suits a
 * sheet stapled up outdoors) and the standard quiet zone of 4 modules.
 */
const OPTIONS = { errorCorrectionLevel: "M", margin: 4 } as const;

/** An SVG drawing of the code (dark modules in ink on white), to put straight into a page. */
export function crewQrSvg(url: string): Promise<string> {
  return QRCode.toString(url, { ...OPTIONS, type: "svg", color: { dark: "#15191E", light: "#FFFFFF" } });
}

/** A PNG of the code for PDFs, `widthPx` wide. */
export function crewQrPng(url: string, widthPx = 300): Promise<Buffer> {
  return QRCode.toBuffer(url, { ...OPTIONS, type: "png", width: widthPx });
}
