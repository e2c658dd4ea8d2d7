import { ESLint } from "eslint";
import { describe, expect, test } from "vitest";

/** The import boundaries of DEVELOPERS.md are lint rules (eslint.config.mjs): a wrong-way import fails `npm test`. */
const eslint = new ESLint({ cwd: process.cwd() });

async function restricted(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return result.messages.filter((m) => m.ruleId === "no-restricted-imports").map((m) => m.message);
}

describe("import boundaries", () => {
  test.each([
    { file: "lib/sheets/probe.ts", code: 'import { cx } from "@/components/ui/cx";\nexport const a = cx;\n', why: "lib imports components" },
    {
      file: "lib/mail/probe.ts",
      code: 'import { Caution } from "../../components/ui/caution";\nexport const a = Caution;\n',
      why: "lib imports components (relative)",
    },
    { file: "components/jobs/probe.ts", code: 'import type { Role } from "@/models/user";\nexport type A = Role;\n', why: "components import models" },
    { file: "app/probe.ts", code: 'import { User } from "@/models";\nexport const a = User;\n', why: "app imports models" },
    { file: "lib/solver/probe.ts", code: 'import { useState } from "react";\nexport const a = useState;\n', why: "the engine imports a framework" },
    { file: "lib/flow/probe.ts", code: 'import { getSequelize } from "@/lib/db";\nexport const a = getSequelize;\n', why: "the flow imports the database" },
    { file: "lib/solver/design/probe.ts", code: 'import { Member } from "@/models/member";\nexport const a = Member;\n', why: "the engine imports a model" },
    {
      file: "lib/payments/probe.ts",
      code: 'import { startStandin } from "@/scripts/stripe-standin/server";\nexport const a = startStandin;\n',
      why: "shipped code imports a dev tool",
    },
    {
      file: "components/jobs/probe.tsx",
      code: 'import Link from "next/link";\nexport const a = Link;\n',
      why: "a component links with next/link, not the intent link",
    },
  ])(
    "$why: refused",
    async ({ file, code }) => {
      expect(await restricted(file, code)).toHaveLength(1);
    },
    60_000,
  );

  test.each([
    { file: "lib/sheets/probe.ts", code: 'import { CAUTION } from "@/lib/caution";\nexport const a = CAUTION;\n' },
    { file: "components/jobs/probe.ts", code: 'import type { Role } from "@/lib/auth/role-list";\nexport type A = Role;\n' },
    { file: "lib/solver/probe.ts", code: 'import { z } from "zod";\nexport const a = z;\n' },
    { file: "app/probe.tsx", code: 'import { Link } from "@/components/ui/link";\nexport const a = Link;\n' },
    { file: "components/ui/link.tsx", code: 'import NextLink from "next/link";\nexport const a = NextLink;\n' },
  ])(
    "$file may import what it needs",
    async ({ file, code }) => {
      expect(await restricted(file, code)).toEqual([]);
    },
    60_000,
  );
});
