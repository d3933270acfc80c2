/**
 * Browser entry: the isochor engine core for in-page computation (no kernel round-trip; tslab has no
 * comm channel). Explorers are added here as they land.
 */
export * as engine from "../../kernel-lib/src/core.js";
