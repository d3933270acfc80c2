// Public exports of eos/ (filled by the area as it lands).
export * from "./multiparameter/index.js";
