import { encode } from "next-auth/jwt";
import { describe, expect, it } from "vitest";

import { decodeSessionToken } from "@/lib/auth/session-token";

const SECRET = "a-test-secret-of-forty-characters-long-x";

describe("reading the session cookie with the key derived once", () => {
  it("reads a cookie that next-auth's own encoder made", async () => {
    const token = await encode({ token: { sid: "session-1", sub: "user-1" }, secret: SECRET });
    expect(await decodeSessionToken(token, SECRET)).toMatchObject({ sid: "session-1", sub: "user-1" });
    // The second read uses the kept key and gives the same answer.
    expect(await decodeSessionToken(token, SECRET)).toMatchObject({ sid: "session-1" });
  });

  it("refuses a cookie made with another secret, a changed cookie and an expired one", async () => {
    const token = await encode({ token: { sid: "session-2" }, secret: SECRET });
    expect(await decodeSessionToken(token, `${SECRET}-other`)).toBeNull();
    const changed = token.slice(0, -4) + (token.endsWith("AAAA") ? "BBBB" : "AAAA");
    expect(await decodeSessionToken(changed, SECRET)).toBeNull();
    expect(await decodeSessionToken("not-a-token", SECRET)).toBeNull();
    const expired = await encode({ token: { sid: "session-3" }, secret: SECRET, maxAge: -60 });
    expect(await decodeSessionToken(expired, SECRET)).toBeNull();
  });
});
