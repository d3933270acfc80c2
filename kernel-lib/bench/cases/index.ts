/** Every benchmark case, in print order. Other areas add their case lists here. */
import type { BenchCase } from "../harness.js";
import { engineCases } from "./engineCases.js";
import { referenceCases } from "./referenceCases.js";
import { envelopeCases } from "./envelopeCases.js";
import { flashCases } from "./flashCases.js";
import { pvtCases } from "./pvtCases.js";
import { processCases } from "./processCases.js";
import { sweepCases } from "./sweepCases.js";
import { transportCases } from "./transportCases.js";
import { vesselCases } from "./vesselCases.js";
import { chartSamplerCases } from "./chartSamplerCases.js";

export const allCases: BenchCase[] = [
  ...engineCases,
  ...referenceCases,
  ...envelopeCases,
  ...flashCases,
  ...pvtCases,
  ...processCases,
  ...sweepCases,
  ...transportCases,
  ...vesselCases,
  ...chartSamplerCases,
];
