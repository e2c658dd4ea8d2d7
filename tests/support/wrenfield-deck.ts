// The invented Wrenfield Road deck shared by the load-path, live-job and order tests: deck joists under 40 psf
// live and 10 psf dead onto a 24 ft deck beam on four supports 8 ft apart.
import { defaultFlowState } from "@/lib/flow/defaults";
import type { FlowState } from "@/lib/flow/state";

export const WRENFIELD_JOISTS: FlowState = {
  ...defaultFlowState("deck-joist"),
  areaLoads: [
    { id: "l", preset: "deck", label: "Deck", case: "L", psf: 40 },
    { id: "d", preset: "floor-dead", label: "Dead", case: "D", psf: 10 },
  ],
};

export const WRENFIELD_BEAM: FlowState = {
  ...defaultFlowState("deck-beam"),
  lengthFt: 24,
  supports: [
    { x: 0, type: "pin" },
    { x: 8, type: "roller" },
    { x: 16, type: "roller" },
    { x: 24, type: "roller" },
  ],
};
