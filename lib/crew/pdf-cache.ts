import "server-only";
import { createHash } from "node:crypto";
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { formatSheetDate } from "@/lib/sheets/format";
import type { Paper } from "@/lib/sheets/pdf";
import type { CrewJobView } from "./links";
import { renderCrewPdf } from "./pdf";
import { crewQrPng } from "./qr";

/**
 * The crew sheet PDF, drawn once per version of what it shows. A crew of ten opening the same schedule costs one
 * render: the version (a hash of everything the sheet draws: the job, the schedule rows, what is not checked,
 * the link, the paper, the printed date and this build) is the route's ETag, so a phone that holds the current
 * copy gets a 304 and nothing is drawn, and any other request is served from a small per-process cache keyed by
 * that version. The key follows the database (it is computed from what was just read), so several processes or
 * instances never serve a stale sheet; they each draw it once.
 */

/** Bounds of the per-process cache: the fewest of this many sheets and this many bytes (a one-page sheet is tens of kB). */
export const CREW_PDF_CACHE_ENTRIES = 64;
export const CREW_PDF_CACHE_BYTES = 16 * 1024 * 1024;

let buildId: string | null = null;
/** This build's id (a new build may draw the sheet differently, so its copies are new versions). */
function currentBuild(): string {
  if (buildId === null) {
    const file = path.join(process.cwd(), ".next", "BUILD_ID");
    buildId = existsSync(file) ? readFileSync(file, "utf8").trim() : "dev";
  }
  return buildId;
}

/** The version of the sheet for this view, link, paper and day: equal versions draw byte-equal sheets but for the PDF's creation time. */
export function crewPdfVersion(view: CrewJobView, url: string, paper: Paper, now: Date): string {
  const drawn = {
    build: currentBuild(),
    job: view.job,
    rows: view.rows,
    notChecked: view.notChecked,
    url,
    paper,
    printed: formatSheetDate(now.toISOString()),
  };
  return createHash("sha256").update(JSON.stringify(drawn)).digest("base64url").slice(0, 32);
}

interface Entry<T> {
  value: Promise<T>;
  bytes: number;
}

/**
 * Values by version, least recently used first out when over `maxEntries` or `maxBytes`; callers asking for a
 * version while it is being made wait for the same making; a making that fails is not kept.
 */
export class VersionCache<T> {
  private readonly entries = new Map<string, Entry<T>>();
  private heldBytes = 0;
  readonly counts = { made: 0, hits: 0 };

  constructor(
    private readonly maxEntries: number,
    private readonly maxBytes: number,
    private readonly bytesOf: (value: T) => number,
  ) {}

  get(version: string, make: () => Promise<T>): Promise<T> {
    const held = this.entries.get(version);
    if (held) {
      this.counts.hits += 1;
      this.entries.delete(version);
      this.entries.set(version, held);
      return held.value;
    }
    this.counts.made += 1;
    const entry: Entry<T> = { value: make(), bytes: 0 };
    this.entries.set(version, entry);
    entry.value.then(
      (value) => {
        if (this.entries.get(version) !== entry) return;
        entry.bytes = this.bytesOf(value);
        this.heldBytes += entry.bytes;
        this.evict();
      },
      () => {
        if (this.entries.get(version) === entry) this.entries.delete(version);
      },
    );
    this.evict();
    return entry.value;
  }

  get size(): { entries: number; bytes: number } {
    return { entries: this.entries.size, bytes: this.heldBytes };
  }

  clear(): void {
    this.entries.clear();
    this.heldBytes = 0;
    this.counts.made = 0;
    this.counts.hits = 0;
  }

  private evict(): void {
    for (const [version, entry] of this.entries) {
      if (this.entries.size <= this.maxEntries && this.heldBytes <= this.maxBytes) break;
      this.entries.delete(version);
      this.heldBytes -= entry.bytes;
    }
  }
}

const sheets = new VersionCache<Buffer>(CREW_PDF_CACHE_ENTRIES, CREW_PDF_CACHE_BYTES, (pdf) => pdf.length);

/** The sheet of `version`, from the cache or drawn now (with its QR code). */
export function crewPdf(view: CrewJobView, url: string, paper: Paper, now: Date, version: string = crewPdfVersion(view, url, paper, now)): Promise<Buffer> {
  return sheets.get(version, async () => renderCrewPdf(view, { url, qrPng: await crewQrPng(url, 400) }, paper, now));
}

/** Sheets drawn and served from the cache since the process started (or the last reset), for the benchmark and the tests. */
export function crewPdfCounts(): { renders: number; hits: number; entries: number; bytes: number } {
  return { renders: sheets.counts.made, hits: sheets.counts.hits, ...sheets.size };
}

/** Empties the cache and its counts (tests and the benchmark). */
export function resetCrewPdfCache(): void {
  sheets.clear();
}

/** Does an If-None-Match header name this ETag (or "*")? Weak and strong tags match alike (RFC 9110 §13.1.2). */
export function etagMatches(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  const bare = etag.replace(/^W\//, "");
  return ifNoneMatch.split(",").some((t) => {
    const tag = t.trim();
    return tag === "*" || tag.replace(/^W\//, "") === bare;
  });
}
