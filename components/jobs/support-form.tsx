"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { parseLength } from "@/lib/flow/length";
import type { FootingDesign, PostDesign, SupportDesign } from "@/lib/jobs/load-path";
import { SOIL_CLASSES } from "@/lib/solver/design/footing";
import { POST_SIZES } from "@/lib/solver/design/post";
import { SAWN_GRADES, SPECIES } from "@/lib/tables/types";
import { addSupport, updateMember } from "./actions";

export type SupportFormProps = {
  jobId: string;
  /** "post": posts under a framing member; "footing": footings under posts */
  type: SupportDesign["type"];
  /** adding under this member, or changing this post or footing member */
  under?: { id: string; label: string };
  editing?: { id: string; label: string; design: SupportDesign };
  onDone: () => void;
};

const DEFAULT_POST: PostDesign = { type: "post", size: "6x6", plies: 1, species: "Douglas Fir-Larch", grade: "No.2", heightFt: 8, wet: true };
const DEFAULT_FOOTING: FootingDesign = { type: "footing", shape: "round", sizeIn: null, thicknessIn: 10, soilPsf: 1500, frostDepthIn: 36, bottomDepthIn: null };

function numberOrError(raw: string, label: string): number | string {
  const v = Number(raw.trim());
  return raw.trim() !== "" && Number.isFinite(v) ? v : `${label}: enter a number`;
}

/** Adds posts or footings on the job's load path, or changes them. The server checks each field again. */
export function SupportForm({ jobId, type, under, editing, onDone }: SupportFormProps) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const start = editing?.design ?? (type === "post" ? DEFAULT_POST : DEFAULT_FOOTING);
  const post = start.type === "post" ? start : DEFAULT_POST;
  const footing = start.type === "footing" ? start : DEFAULT_FOOTING;
  const [label, setLabel] = useState(
    editing?.label ?? (type === "post" ? `P${under ? ` under ${under.label}` : ""}` : `F${under ? ` under ${under.label}` : ""}`),
  );
  const [size, setSize] = useState<string>(post.size);
  const [plies, setPlies] = useState(String(post.plies));
  const [species, setSpecies] = useState<string>(post.species);
  const [grade, setGrade] = useState<string>(post.grade);
  const [height, setHeight] = useState(String(post.heightFt));
  const [wet, setWet] = useState(post.wet ? "wet" : "dry");
  const [shape, setShape] = useState<string>(footing.shape);
  const [footSize, setFootSize] = useState(footing.sizeIn === null ? "" : String(footing.sizeIn));
  const [thickness, setThickness] = useState(String(footing.thicknessIn));
  const [soil, setSoil] = useState(String(footing.soilPsf));
  const [frost, setFrost] = useState(String(footing.frostDepthIn));
  const [problem, setProblem] = useState<string | null>(null);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setProblem(null);
    let design: Record<string, unknown>;
    if (type === "post") {
      const h = parseLength(height);
      if (!h.ok) {
        setProblem(`Post height: ${h.message}`);
        return;
      }
      const studs = size === "2x4" || size === "2x6";
      design = { type: "post", size, plies: studs ? Number(plies) : 1, species, grade, heightFt: h.feet, wet: wet === "wet" };
    } else {
      const fields = {
        thicknessIn: numberOrError(thickness, "Thickness"),
        soilPsf: numberOrError(soil, "Soil bearing"),
        frostDepthIn: numberOrError(frost, "Frost depth"),
      };
      const bad = Object.values(fields).find((v) => typeof v === "string");
      if (typeof bad === "string") {
        setProblem(bad);
        return;
      }
      const sized = footSize.trim() === "" ? null : numberOrError(footSize, "Size");
      if (typeof sized === "string") {
        setProblem(sized);
        return;
      }
      design = { type: "footing", shape, sizeIn: sized, bottomDepthIn: null, ...fields };
    }
    startTransition(async () => {
      const result = editing
        ? await updateMember({ memberId: editing.id, label, supportDesign: design })
        : await addSupport({ jobId, underMemberId: under?.id, label, design });
      if (!result.ok) {
        setProblem("issues" in result && result.issues?.length ? result.issues.map((i) => i.message).join("; ") : result.error);
        return;
      }
      router.refresh();
      onDone();
    });
  };

  return (
    <form onSubmit={submit} className="flex flex-col gap-3" noValidate>
      <TextField label="Name" value={label} onChange={(e) => setLabel(e.target.value)} required />
      {type === "post" ? (
        <>
          <SelectField
            label="Post"
            options={POST_SIZES.map((s) => ({ value: s, label: s === "2x4" || s === "2x6" ? `${s} studs nailed together` : s }))}
            value={size}
            onChange={(e) => setSize(e.target.value)}
          />
          {size === "2x4" || size === "2x6" ? (
            <SelectField
              label="Studs"
              options={["2", "3", "4"].map((n) => ({ value: n, label: `${n} studs` }))}
              value={plies === "1" ? "3" : plies}
              onChange={(e) => setPlies(e.target.value)}
            />
          ) : null}
          <SelectField label="Species" options={SPECIES.map((s) => ({ value: s, label: s }))} value={species} onChange={(e) => setSpecies(e.target.value)} />
          <SelectField label="Grade" options={SAWN_GRADES.map((g) => ({ value: g, label: g }))} value={grade} onChange={(e) => setGrade(e.target.value)} />
          <TextField
            label="Height, top of footing to underside of the beam"
            hint={`e.g. 8' 6"`}
            value={height}
            onChange={(e) => setHeight(e.target.value)}
            inputMode="text"
          />
          <SelectField
            label="Service"
            options={[
              { value: "wet", label: "Outdoors (deck post): wet service" },
              { value: "dry", label: "Indoors: dry" },
            ]}
            value={wet}
            onChange={(e) => setWet(e.target.value)}
          />
        </>
      ) : (
        <>
          <SelectField
            label="Shape"
            options={[
              { value: "round", label: "Round (tube form)" },
              { value: "square", label: "Square pad" },
            ]}
            value={shape}
            onChange={(e) => setShape(e.target.value)}
          />
          <TextField
            label="Diameter or side, in"
            hint="Leave empty to find the smallest that works"
            value={footSize}
            onChange={(e) => setFootSize(e.target.value)}
            inputMode="decimal"
          />
          <TextField
            label="Thickness, in"
            hint="At least 6 in (IRC 2021 R403.1.1)"
            value={thickness}
            onChange={(e) => setThickness(e.target.value)}
            inputMode="decimal"
          />
          <SelectField
            label="Soil bearing, psf"
            hint="IRC 2021 Table R401.4.1; 1,500 psf when you do not know the soil"
            options={SOIL_CLASSES.map((c) => ({ value: String(c.psf), label: `${c.psf.toLocaleString("en-US")} psf — ${c.words.split(" (")[0]}` }))}
            value={soil}
            onChange={(e) => setSoil(e.target.value)}
          />
          <TextField
            label="Frost depth, in"
            hint="From your building department"
            value={frost}
            onChange={(e) => setFrost(e.target.value)}
            inputMode="decimal"
          />
        </>
      )}
      {problem ? (
        <p role="alert" className="font-bold text-over-ink">
          {problem}
        </p>
      ) : null}
      <Button type="submit" loading={pending}>
        {editing ? "Save" : type === "post" ? "Add posts" : "Add footings"}
      </Button>
    </form>
  );
}
