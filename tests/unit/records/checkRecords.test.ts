// The browser checker must fail on what it exists to catch: a request leaving file://, a page
// error, a console error, and a chart that never becomes live. Pages are written by hand here.
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  checkRecords,
  DEFAULT_CHROMIUM_PATH,
  INJECTION_FLAG,
} from "../../browser/checkRecords.mjs";
import { requiredUnderCI } from "../requiredUnderCI.js";

const chromium = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;

requiredUnderCI(fs.existsSync(chromium), `Chromium at ${chromium}`);

describe.skipIf(!fs.existsSync(chromium))("checkRecords (headless Chromium)", () => {
  let dir: string;
  const page = (name: string, body: string): string => {
    const file = path.join(dir, name);
    fs.writeFileSync(
      file,
      `<!doctype html><html><head><meta charset="utf-8"></head><body>${body}</body></html>`,
    );
    return file;
  };
  beforeAll(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-check-pages-"));
  });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  it("passes a plain page and fails each kind of problem, with a message saying which", async () => {
    const files = [
      page("plain.html", "<p>no charts</p>"),
      // 192.0.2.0/24 is TEST-NET-1 (RFC 5737): never routed; the request is blocked before it goes out.
      page("network.html", '<img src="http://192.0.2.1/logo.png">'),
      page("pageerror.html", "<script>undefinedFunction()</script>"),
      page("console.html", '<script>console.error("bad state")</script>'),
      page("static.html", '<figure data-isochor-chart="static"><svg></svg></figure>'),
      path.join(dir, "absent.html"),
    ];
    const results = await checkRecords(files, { chromiumPath: chromium, timeoutMs: 1500 });
    const byName = Object.fromEntries(results.map((r) => [r.name, r]));
    expect(byName["plain.html"].ok).toBe(true);
    expect(byName["network.html"]).toMatchObject({ ok: false });
    expect(byName["network.html"].message).toContain(
      "request outside file:// blocked: http://192.0.2.1/logo.png",
    );
    expect(byName["pageerror.html"]).toMatchObject({ ok: false });
    expect(byName["pageerror.html"].message).toMatch(/page error: .*undefinedFunction/);
    expect(byName["console.html"].message).toContain("console error: bad state");
    expect(byName["static.html"]).toMatchObject({
      ok: false,
      message: "1 of 1 charts did not become live",
    });
    expect(byName["absent.html"]).toMatchObject({
      ok: false,
      message: `no such file: ${path.join(dir, "absent.html")}`,
    });
  }, 60_000);

  it("fails when an injected script ran or an expected text is not shown; checks sibling calculation records", async () => {
    const escaped = "&lt;script&gt;window.__isochorInjected=1&lt;/script&gt;";
    const files = [
      page("escaped.html", `<p>${escaped}</p>`),
      page("ran.html", `<p>x</p><script>window.${INJECTION_FLAG}=1</script>`),
      page("hidden.html", `<p>nothing here</p><script>var t = "<b>label</b>";</script>`),
    ];
    page("escaped.record.html", `<p>calculation</p><script>window.${INJECTION_FLAG}=1</script>`);
    const results = await checkRecords(files, {
      chromiumPath: chromium,
      timeoutMs: 1500,
      expectText: ["<script>window.__isochorInjected=1</script>"],
    });
    const byName = Object.fromEntries(results.map((r) => [r.name, r]));
    expect(byName["escaped.html"]).toMatchObject({ ok: true });
    expect(byName["ran.html"].message).toContain(
      `injected script ran: window.${INJECTION_FLAG} is set`,
    );
    // Text inside a <script> element is not "shown".
    expect(byName["hidden.html"].message).toContain("text not shown");
    // The sibling calculation record of escaped.html was found and checked on its own.
    expect(byName["escaped.record.html"].message).toContain("injected script ran");
    expect(results.map((r) => r.name)).toEqual([
      "escaped.html",
      "escaped.record.html",
      "ran.html",
      "hidden.html",
    ]);
  }, 60_000);
});
