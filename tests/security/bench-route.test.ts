import { renderToStaticMarkup } from "react-dom/server";
import { afterEach, describe, expect, it, vi } from "vitest";

import BenchShellLayout from "@/app/bench/(shell)/layout";
import FixedOrdersPage from "@/app/bench/(shell)/orders-fixed/page";

describe("the bench's fixed-data orders page (/bench/orders-fixed)", () => {
  afterEach(() => vi.unstubAllEnvs());

  it("answers 404, page and layout, unless the server was started with GRADELINE_BENCH_ROUTES=1", async () => {
    for (const value of ["", "0", "true"]) {
      vi.stubEnv("GRADELINE_BENCH_ROUTES", value);
      await expect(FixedOrdersPage(), `GRADELINE_BENCH_ROUTES=${value}`).rejects.toThrow(/NEXT_HTTP_ERROR_FALLBACK;404/);
      await expect(BenchShellLayout({ children: null }), `GRADELINE_BENCH_ROUTES=${value}`).rejects.toThrow(/NEXT_HTTP_ERROR_FALLBACK;404/);
    }
  });

  it("with the flag, renders the orders table from its fixed first page without a session", async () => {
    vi.stubEnv("GRADELINE_BENCH_ROUTES", "1");
    const html = renderToStaticMarkup(await FixedOrdersPage());
    expect(html).toContain("200 orders, showing 1–20.");
    expect(html).toContain("300 Millrace Lane");
    expect(html.match(/href="\/orders\/0{8}-/g)?.length).toBeGreaterThanOrEqual(20);
  });
});
