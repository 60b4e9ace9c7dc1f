import { describe, expect, it } from "vitest";

import {
  checkCompletionList,
  checkStoredParts,
  expectedPartBytes,
  GiB,
  MAX_CLIP_BYTES,
  MAX_PARTS,
  MiB,
  missingParts,
  partRange,
  planUpload,
} from "@/lib/uploads/plan";

describe("the multipart plan", () => {
  it("never cuts parts under 8 MiB", () => {
    expect(planUpload(1)).toEqual({ sizeBytes: 1, partSizeBytes: 8 * MiB, partCount: 1 });
    expect(planUpload(8 * MiB)).toMatchObject({ partSizeBytes: 8 * MiB, partCount: 1 });
    expect(planUpload(8 * MiB + 1)).toMatchObject({ partSizeBytes: 8 * MiB, partCount: 2 });
    expect(planUpload(1 * GiB)).toMatchObject({ partSizeBytes: 8 * MiB, partCount: 128 });
  });

  it("grows the part size in whole MiB once 10,000 parts of 8 MiB are not enough", () => {
    const size = 100 * GiB;
    const plan = planUpload(size);
    expect(plan.partSizeBytes).toBeGreaterThanOrEqual(size / MAX_PARTS);
    expect(plan.partSizeBytes % MiB).toBe(0);
    expect(plan.partCount).toBeLessThanOrEqual(MAX_PARTS);
    expect(plan.partSizeBytes * plan.partCount).toBeGreaterThanOrEqual(size);
  });

  it("stays within 10,000 parts for every size up to well past the clip limit", () => {
    for (const size of [MAX_CLIP_BYTES, MAX_CLIP_BYTES - 1, 78 * GiB + 12345, 5 * 1024 * GiB, 10_000 * 8 * MiB + 1]) {
      const plan = planUpload(size);
      expect(plan.partCount).toBeLessThanOrEqual(MAX_PARTS);
      expect(plan.partSizeBytes).toBeGreaterThanOrEqual(8 * MiB);
      expect(expectedPartBytes(plan, plan.partCount)).toBeGreaterThan(0);
      expect(partRange(plan, plan.partCount).end).toBe(size);
    }
  });

  it("refuses sizes that are not whole positive byte counts", () => {
    expect(() => planUpload(0)).toThrow();
    expect(() => planUpload(-5)).toThrow();
    expect(() => planUpload(1.5)).toThrow();
  });

  it("accepts a completion list only when it names 1..count once each, ascending", () => {
    expect(checkCompletionList([{ partNumber: 1 }, { partNumber: 2 }, { partNumber: 3 }], 3)).toEqual([]);
    expect(checkCompletionList([{ partNumber: 1 }, { partNumber: 3 }, { partNumber: 2 }], 3).map((p) => p.path)).toEqual([
      "parts[1].partNumber",
      "parts[2].partNumber",
    ]);
    expect(checkCompletionList([{ partNumber: 1 }, { partNumber: 1 }, { partNumber: 2 }], 3).length).toBeGreaterThan(0);
    expect(checkCompletionList([{ partNumber: 1 }, { partNumber: 2 }], 3)[0].path).toBe("parts");
    expect(checkCompletionList([{ partNumber: 0 }], 1)[0].path).toBe("parts[0].partNumber");
    expect(checkCompletionList([{ partNumber: 10_001 }], 1)[0].path).toBe("parts[0].partNumber");
  });

  it("checks what storage holds: sizes, the 5 MiB floor and no bytes past the declared size", () => {
    const plan = planUpload(17 * MiB);
    const good = [
      { partNumber: 1, size: 8 * MiB, etag: "a" },
      { partNumber: 2, size: 8 * MiB, etag: "b" },
      { partNumber: 3, size: 1 * MiB, etag: "c" },
    ];
    expect(checkStoredParts(plan, good)).toEqual([]);
    expect(checkStoredParts(plan, good.slice(0, 2)).map((p) => p.message)).toEqual(["Part 3 has not arrived in storage."]);
    expect(checkStoredParts(plan, [{ ...good[0], size: 4 * MiB }, good[1], good[2]])[0].message).toMatch(/at least 5 MiB/);
    expect(
      checkStoredParts(plan, [good[0], good[1], { ...good[2], size: 2 * MiB }])
        .map((p) => p.message)
        .join(" "),
    ).toMatch(/More bytes arrived than the/);
    expect(
      checkStoredParts(plan, [...good, { partNumber: 4, size: 1, etag: "d" }])
        .map((p) => p.message)
        .join(" "),
    ).toMatch(/More bytes arrived/);
    expect(missingParts(plan, [good[0], { ...good[1], size: 3 }])).toEqual([2, 3]);
  });
});
