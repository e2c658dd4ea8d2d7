// Sign-in timing: `npm run bench sign-in-timing` (the measurement: ./support/sign-in-timing-child.ts).
import { runServerChild } from "./support/server-child";

export function run(): void {
  runServerChild("sign-in-timing-child.ts");
}
