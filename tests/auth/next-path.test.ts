import { describe, expect, it } from "vitest";

import { authLink, safeNextPath } from "@/lib/auth/next-path";

describe("the page to go to after signing in", () => {
  it("keeps a path on this site", () => {
    expect(safeNextPath("/reports/6f1c2a9e-0b7d-4c51-9a43-2e8f7d1b5c60")).toBe("/reports/6f1c2a9e-0b7d-4c51-9a43-2e8f7d1b5c60");
    expect(safeNextPath("/orders?status=open")).toBe("/orders?status=open");
  });

  it.each([
    ["another origin", "https://elsewhere.test/reports"],
    ["a protocol-relative address", "//elsewhere.test/x"],
    ["a backslash that browsers read as a slash", "/\\elsewhere.test"],
    ["a script address", "javascript:alert(1)"],
    ["a relative path", "reports/1"],
    ["spaces and quotes", '/reports/1" onload="x'],
    ["an overlong value", `/${"a".repeat(250)}`],
    ["nothing", undefined],
  ])("refuses %s", (_what, value) => {
    expect(safeNextPath(value)).toBeNull();
  });

  it("builds sign-in and sign-up links with only the parts that are set", () => {
    expect(authLink("/sign-in", { email: "wren@example.test", next: "/reports/1" })).toBe("/sign-in?email=wren%40example.test&next=%2Freports%2F1");
    expect(authLink("/sign-up", { email: "", role: "buyer", next: null })).toBe("/sign-up?role=buyer");
    expect(authLink("/sign-in", {})).toBe("/sign-in");
  });
});
