// Types of database-down.mjs for the tests (the server itself runs as plain JavaScript).
import type { IncomingMessage, ServerResponse } from "node:http";

export const DATABASE_DOWN_PAGE: string;
export function databaseIsDown(url?: string): Promise<boolean>;
export function isPageRequest(req: Pick<IncomingMessage, "method" | "url">): boolean;
export function holdFailedPages(req: IncomingMessage, res: ServerResponse, isDown?: () => Promise<boolean>): void;
