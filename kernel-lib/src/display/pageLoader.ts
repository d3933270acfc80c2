/**
 * The page-side half of "live in any page": every chart and explorer output checks in the page
 * whether the chart runtime (and the explorers' bundle) is there, and if not, loads it from the
 * Jupyter server that serves the page, then goes live.
 *
 * Why: the kernel sends the inline runtime (about 830 KB; the explorers' bundle about 500 KB) with
 * the first chart or explorer of a kernel session only, and cannot know which page it reaches. A
 * page refreshed or reopened on a running kernel has lost it, and inlining both in every output
 * would put about 1.3 MB into every output of the saved notebook. So the inline copy stays once per
 * session, and a page that lacks it asks its own server:
 *
 *   <base_url>nbextensions/isochor/chart-runtime.js     (vegaRuntimeSource, wrapped as inline)
 *   <base_url>nbextensions/isochor/explorers.js         (the explorers' bundle, wrapped as inline)
 *
 * `npm run notebook` (scripts/install-kernel.mjs, through writeNotebookRuntimeFiles) writes them
 * into the project-local Jupyter data directory, which the classic notebook serves under
 * /nbextensions/. Same origin, no CDN, no internet. The base URL comes from the classic
 * notebook's `<body data-base-url>` (or a `#jupyter-config-data` element); a page without either
 * (an exported HTML file, a record) never makes a request: records carry the runtime in their
 * head, and anything else keeps its static chart with a note naming the cause.
 *
 * The loader is plain ES2017 text placed in each boot script; one load per file and page
 * (the promise is kept on `window.isochorRuntimeLoads`).
 */

/** Folder name under the server's /nbextensions/ path. */
export const NBEXTENSION_FOLDER = "isochor";

/** File names of the served runtime parts. */
export const RUNTIME_FILES = {
  chart: "chart-runtime.js",
  explorers: "explorers.js",
} as const;

/**
 * Defines `isochorLoad(file, ready)` in the boot script's scope: a promise that resolves when
 * `ready()` is true (at once if it already is), after loading `file` from the server's
 * nbextensions folder when needed; it rejects with an Error whose message says why.
 */
export function pageLoaderSource(): string {
  return `function isochorLoad(file, ready) {
    if (ready()) return Promise.resolve("already on the page");
    var loads = window.isochorRuntimeLoads || (window.isochorRuntimeLoads = {});
    if (loads[file]) return loads[file];
    var base = document.body ? document.body.getAttribute("data-base-url") : null;
    if (base === null) {
      var config = document.getElementById("jupyter-config-data");
      if (config) {
        try { base = JSON.parse(config.textContent).baseUrl || null; } catch (e) { base = null; }
      }
    }
    if (base === null) {
      loads[file] = Promise.reject(new Error("no notebook server behind this page to load it from"));
      return loads[file];
    }
    var url = base.replace(/\\/?$/, "/") + "nbextensions/${NBEXTENSION_FOLDER}/" + file;
    loads[file] = new Promise(function (resolve, reject) {
      var s = document.createElement("script");
      s.src = url;
      s.async = true;
      s.onload = function () {
        if (ready()) resolve(url);
        else reject(new Error(url + " loaded but did not define it"));
      };
      s.onerror = function () {
        reject(new Error("could not load " + url + " (start the server with npm run notebook, " +
          "which serves it, or run npm run kernel:install)"));
      };
      document.head.appendChild(s);
    });
    return loads[file];
  }`;
}

/**
 * How long an output waits for an inline runtime before it asks the server, ms: the inline copy
 * normally runs before the output's boot script, so this only covers renderers that run scripts
 * out of order.
 */
export const LOAD_AFTER_MS = 300;
