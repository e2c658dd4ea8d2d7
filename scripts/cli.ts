// Command-line entry: `npm run --silent solve|check|size -- FILE` (FILE a path, or - for standard input).
// Each command lives in scripts/cli/<name>.ts and exports `run(json: unknown, flags: string[])`,
// which returns the result object or throws a CliInputError (exit 2, message on standard error).
import { readFile } from "node:fs/promises";
import { CliInputError } from "./cli/errors";

const COMMANDS = ["solve", "check", "size"] as const;
type CommandName = (typeof COMMANDS)[number];

interface CommandModule {
  run(json: unknown, flags: string[]): Promise<unknown> | unknown;
}

async function readInput(file: string): Promise<string> {
  if (file === "-") {
    const chunks: Buffer[] = [];
    for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
    return Buffer.concat(chunks).toString("utf8");
  }
  return readFile(file, "utf8");
}

async function main(): Promise<number> {
  const [name, ...rest] = process.argv.slice(2);
  if (!COMMANDS.includes(name as CommandName)) {
    process.stderr.write(`usage: npm run --silent <${COMMANDS.join("|")}> -- FILE   (FILE a path, or - for standard input)\n`);
    return 2;
  }
  const flags = rest.filter((a) => a.startsWith("--"));
  const files = rest.filter((a) => !a.startsWith("--"));
  if (files.length !== 1) {
    process.stderr.write(`${name}: give exactly one input FILE (a path, or - for standard input)\n`);
    return 2;
  }
  let text: string;
  try {
    text = await readInput(files[0]);
  } catch (err) {
    process.stderr.write(`${name}: cannot read ${files[0]}: ${(err as Error).message}\n`);
    return 2;
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (err) {
    process.stderr.write(`${name}: input is not valid JSON: ${(err as Error).message}\n`);
    return 2;
  }
  const mod = (await import(`./cli/${name}.ts`)) as CommandModule;
  try {
    const result = await mod.run(json, flags);
    process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
    return 0;
  } catch (err) {
    if (err instanceof CliInputError) {
      process.stderr.write(`${name}: ${err.message}\n`);
      return 2;
    }
    process.stderr.write(`${name}: internal error: ${(err as Error).stack ?? String(err)}\n`);
    return 1;
  }
}

main().then((code) => process.exit(code));
