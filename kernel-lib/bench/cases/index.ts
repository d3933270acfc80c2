/** Every benchmark case, in print order. Other areas add their case lists here. */
import type { BenchCase } from "../harness.js";
import { engineCases } from "./engineCases.js";
import { referenceCases } from "./referenceCases.js";
import { envelopeCases } from "./envelopeCases.js";
import { flashCases } from "./flashCases.js";
import { pvtCases } from "./pvtCases.js";
import { transportCases } from "./transportCases.js";

export const allCases: BenchCase[] = [
  ...engineCases,
  ...referenceCases,
  ...envelopeCases,
  ...flashCases,
  ...pvtCases,
  ...transportCases,
];
