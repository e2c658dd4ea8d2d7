/**
 * What every candidate member shares in one design problem: the load model, the combination
 * envelopes (strength, service, live-only) and the conditions. Built once per input.
 */
import { asdCombinations, lrfdCombinations } from "../asce7/combinations";
import type { LoadStandard } from "../asce7/standard";
import { loadDurationFactorCD, timeEffectFactorLambda } from "../nds/nds-2018";
import { LOAD_CASES, type Combination, type Load, type LoadCase, type NamedCombination } from "../types";
import type { MemberKind } from "./kinds";
import { buildLoadModel, type ComboEnvelope, type LoadModel } from "./load-model";
import { resolveLimits } from "./presets";
import type { CheckInput, DesignConditions } from "./schema";
import { loadsForShear, shearZones } from "./shear-near-supports";
import type { StudWall } from "./studs-under-steel";
import { takeDown, type TakenDownLoad } from "./take-down";

export interface DesignContext {
  model: LoadModel;
  method: "asd" | "lrfd";
  /** the ASCE 7 edition of the combinations and of snow */
  loadStandard: LoadStandard;
  kind?: MemberKind;
  /** combinations for strength: ASCE 7 §2.4.1 (ASD) or §2.3.1 (LRFD) of loadStandard */
  strength: ComboEnvelope[];
  strengthCombinations: NamedCombination[];
  /** per strength combination: the wood load duration factor CD (ASD) or time effect factor λ (LRFD) */
  woodDuration: number[];
  /** write the plain-words notes on each check (the sizing search leaves them out) */
  notes: boolean;
  /** ASCE 7 §2.4.1 combinations at service level (same edition): total deflection and the crew's reactions */
  service: ComboEnvelope[];
  /** the service combinations without D and W: live (or snow, roof live) deflection */
  live: ComboEnvelope[];
  conditions: DesignConditions;
  limits: { live: number | null; total: number | null; source: string };
  bearingIn: number;
  spacingIn?: number;
  tributaryFt?: number;
  loads: TakenDownLoad[];
  /**
   * The model the wood shear check reads with loads near supports left out (NDS 2018 §3.4.3.1), for a
   * member of depth d (in): built once per depth and kept.
   */
  shearModel(dIn: number): { model: LoadModel; strength: ComboEnvelope[] };
  /** every combination the checks may name (strength, service, live-only), by name */
  combinations: ReadonlyMap<string, Combination>;
  /** the stud wall the member sits in and the wood it bears on (counts jack studs under steel); absent when not in a wall */
  studWall?: StudWall | null;
}

function comboName(f: Combination): string {
  return LOAD_CASES.filter((c) => (f[c] ?? 0) !== 0)
    .map((c) => `${f[c] === 1 ? "" : String(Math.round((f[c] as number) * 1e4) / 1e4)}${c}`)
    .join("+");
}

/** Service combinations with the dead and wind parts removed, duplicates dropped. */
export function liveCombinations(service: NamedCombination[]): NamedCombination[] {
  const out: NamedCombination[] = [];
  const seen = new Set<string>();
  for (const c of service) {
    const f: Combination = {};
    for (const k of ["L", "Lr", "S"] as LoadCase[]) if ((c.factors[k] ?? 0) !== 0) f[k] = c.factors[k];
    const name = comboName(f);
    if (name === "" || seen.has(name)) continue;
    seen.add(name);
    out.push({ name, factors: f });
  }
  return out;
}

export type DesignProblem = Omit<CheckInput, "member">;

// The combinations depend only on the edition and the cases present: built once per set.
interface CombinationSet {
  asd: NamedCombination[];
  lrfd: NamedCombination[];
  live: NamedCombination[];
  byName: Map<string, Combination>;
}

const comboCache = new Map<string, CombinationSet>();

function combinationsFor(cases: LoadCase[], standard: LoadStandard): CombinationSet {
  const key = `${standard}|${cases.join(",")}`;
  let hit = comboCache.get(key);
  if (!hit) {
    const asd = asdCombinations(cases, standard);
    const lrfd = lrfdCombinations(cases, standard);
    const live = liveCombinations(asd);
    const byName = new Map<string, Combination>();
    for (const c of [...asd, ...lrfd, ...live]) if (!byName.has(c.name)) byName.set(c.name, c.factors);
    hit = { asd, lrfd, live, byName };
    comboCache.set(key, hit);
  }
  return hit;
}

export function buildContext(input: DesignProblem): DesignContext {
  const loads = takeDown(input.loads, input.lengthFt, { spacingIn: input.spacingIn, tributaryFt: input.tributaryFt }, input.loadStandard);
  const lineLoads = loads.map((l) => l.load);
  const model = buildLoadModel({
    length: input.lengthFt,
    supports: input.supports,
    loads: lineLoads,
    unbracedFt: input.conditions.unbracedLengthFt,
    bottomBraced: input.conditions.bottomEdgeBraced,
    pattern: input.conditions.patternLiveLoad,
  });
  const combos = combinationsFor(model.cases, input.loadStandard);
  const serviceEnv = model.envelopes(combos.asd);
  const strengthCombos = input.method === "lrfd" ? combos.lrfd : combos.asd;
  const strength = input.method === "lrfd" ? model.envelopes(strengthCombos) : serviceEnv;
  const shearCache = new Map<number, { model: LoadModel; strength: ComboEnvelope[] }>();
  const shearModel = (dIn: number) => {
    let hit = shearCache.get(dIn);
    if (!hit) {
      const zones = shearZones(input.supports, input.lengthFt, input.bearingIn, dIn);
      const cut = loadsForShear(lineLoads as (Load & { case: LoadCase })[], zones, input.lengthFt, dIn);
      const m = buildLoadModel({
        length: input.lengthFt,
        supports: input.supports,
        loads: cut.loads,
        unbracedFt: 0,
        pattern: input.conditions.patternLiveLoad,
        selfWeightSpans: cut.selfWeightSpans,
        extraStations: cut.sections,
        internalLoads: Math.max(0, cut.loads.length - lineLoads.length),
      });
      // the same combinations as the strength check (a case left out near the supports still has its factor)
      hit = { model: m, strength: m.envelopes(strengthCombos) };
      shearCache.set(dIn, hit);
    }
    return hit;
  };
  return {
    model,
    method: input.method,
    loadStandard: input.loadStandard,
    kind: input.kind,
    strength,
    strengthCombinations: strengthCombos,
    shearModel,
    woodDuration: strength.map((e) => (input.method === "lrfd" ? timeEffectFactorLambda(e.factors) : loadDurationFactorCD(e.factors))),
    notes: true,
    service: serviceEnv,
    live: model.envelopes(combos.live),
    conditions: input.conditions,
    limits: resolveLimits(input.limits),
    bearingIn: input.bearingIn,
    spacingIn: input.spacingIn,
    tributaryFt: input.tributaryFt,
    loads,
    combinations: combos.byName,
  };
}
