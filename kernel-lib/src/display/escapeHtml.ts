// HTML escaping lives with the browser-safe tables (tables/escapeHtml.ts), below display/ in the
// layer order; the Node side keeps importing it from here.
export { escapeHtml, jsonForScript } from "../tables/escapeHtml.js";
