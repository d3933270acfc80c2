/**
 * The explorer registry: kind -> definition (controls, update, chart, table). Browser-safe.
 */
import { departureExplorer } from "./departureExplorer.js";
import type { ExplorerDefinition } from "./explorerControls.js";
import type { ExplorerKind, ExplorerState } from "./explorerState.js";
import { isothermExplorer } from "./isothermExplorer.js";
import { pressureEnthalpyExplorer } from "./pressureEnthalpyExplorer.js";

const DEFINITIONS: Readonly<Record<ExplorerKind, ExplorerDefinition<never>>> = {
  isotherms: isothermExplorer as ExplorerDefinition<never>,
  departures: departureExplorer as ExplorerDefinition<never>,
  "pressure-enthalpy": pressureEnthalpyExplorer as ExplorerDefinition<never>,
};

/** The definition of an explorer state's kind. */
export function explorerDefinition(state: ExplorerState): ExplorerDefinition<ExplorerState> {
  return DEFINITIONS[state.kind] as unknown as ExplorerDefinition<ExplorerState>;
}
