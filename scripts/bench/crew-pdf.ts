// Crew sheet PDF benchmark: `npm run bench crew-pdf`. What a crew of ten opening the site-board PDF of an unchanged
// schedule costs the server: drawing it for every open (as the route did before it was cached), against the
// route's cache (one drawing, nine served from memory) and a phone that holds the current copy (If-None-Match:
// a 304, nothing drawn: what the service worker's keep-a-copy fetch on every crew page view now costs). The
// database read that every request makes (the crew link and the job) is the same in each case and not measured.
// Runs in a child process with the react-server condition, as the app's route code runs on the server.
import { runServerChild } from "./support/server-child";

export function run(): void {
  runServerChild("crew-pdf-child.ts");
}
