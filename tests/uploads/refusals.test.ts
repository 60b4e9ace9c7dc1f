import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { POST as complete } from "@/app/api/clips/[clipId]/complete/route";
import { GET as listParts } from "@/app/api/clips/[clipId]/parts/route";
import { POST as presignPoster } from "@/app/api/clips/[clipId]/poster/route";
import { DELETE as deleteClip, GET as getClip, PATCH as patchClip } from "@/app/api/clips/[clipId]/route";
import { GET as listClips, POST as startClip } from "@/app/api/jobs/[id]/clips/route";
import { POST as presignStill } from "@/app/api/jobs/[id]/stills/route";
import { getClip as clipRow } from "@/db/queries/clips";
import { MiB } from "@/lib/uploads/plan";

import { call } from "../utils/session";
import { signedIn, verifiedInspector } from "../utils/world";
import { acceptedJob, inProgressUploads, putPart, startUploadStorage, type PartUrl } from "./support/harness";

let storage: Awaited<ReturnType<typeof startUploadStorage>>;
let job: Awaited<ReturnType<typeof acceptedJob>>;

beforeAll(async () => {
  storage = await startUploadStorage();
  job = await acceptedJob();
});
afterAll(() => storage.close());

const start = (body: Record<string, unknown>, cookie = job.inspector.cookie, id = job.jobId) =>
  call(startClip, {
    method: "POST",
    params: { id },
    body: { fileName: "lateral.mp4", sizeBytes: 1000, contentType: "video/mp4", ...body },
    cookie,
  });

async function refusedBeforeSigning(body: Record<string, unknown>) {
  const before = (await inProgressUploads()).length;
  const res = await start(body);
  expect(res.status).toBe(400);
  expect(res.json).not.toHaveProperty("parts");
  expect((await inProgressUploads()).length).toBe(before);
  return res;
}

describe("starting a clip upload", () => {
  it("refuses bad file names before any upload exists", async () => {
    for (const fileName of ["../x.mp4", "..\\x.mp4", "a/b.mp4", "clip\u0000.mp4", `${"a".repeat(296)}.mp4`, "", ".."]) {
      const res = await refusedBeforeSigning({ fileName });
      expect(Object.keys(res.json.error?.fieldErrors ?? {})).toEqual(["fileName"]);
    }
  });

  it("refuses a zero-byte or oversize file and a type that is not video", async () => {
    expect((await refusedBeforeSigning({ sizeBytes: 0 })).json.error?.fieldErrors?.sizeBytes).toEqual(["The file is empty."]);
    expect((await refusedBeforeSigning({ sizeBytes: 21 * 1024 ** 3 })).json.error?.fieldErrors?.sizeBytes?.[0]).toMatch(/20 GiB/);
    await refusedBeforeSigning({ sizeBytes: 1.5 });
    for (const contentType of ["text/html", "application/x-msdownload", "image/jpeg", "video/x-msvideo"])
      await refusedBeforeSigning({ contentType });
  });

  it("answers 404 to another inspector, 403 to an agent and 401 when signed out, creating nothing", async () => {
    const before = (await inProgressUploads()).length;
    const other = await verifiedInspector(["97991"]);
    expect((await start({}, other.cookie)).status).toBe(404);
    expect((await call(listClips, { params: { id: job.jobId }, cookie: other.cookie })).status).toBe(404);
    expect((await start({}, job.agent.cookie)).status).toBe(403);
    expect((await start({}, (await signedIn("buyer")).cookie)).status).toBe(403);
    expect((await start({}, "")).status).toBe(401);
    expect((await start({}, job.inspector.cookie, "00000000-0000-4000-8000-000000000000")).status).toBe(404);
    expect((await inProgressUploads()).length).toBe(before);
  });

  it("signs one URL per part with the part's exact length, and lists the clip as uploading", async () => {
    const res = await start({ sizeBytes: 17 * MiB, startFootage: 12.5 });
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ partSizeBytes: 8 * MiB, partCount: 3 });
    const parts = res.json.parts as PartUrl[];
    expect(parts.map((p) => p.partNumber)).toEqual([1, 2, 3]);
    expect(new URL(parts[0].url).searchParams.get("X-Amz-SignedHeaders")).toContain("content-length");
    expect(new URL(parts[0].url).pathname).toMatch(new RegExp(`/clips/${job.jobId}/[\\w-]+\\.mp4$`));
    expect(Number(new URL(parts[0].url).searchParams.get("X-Amz-Expires"))).toBeLessThanOrEqual(900);
    const listed = await call(listClips, { params: { id: job.jobId }, cookie: job.inspector.cookie });
    const clip = (listed.json.clips as Record<string, unknown>[]).find((c) => c.id === res.json.clipId);
    expect(clip).toMatchObject({
      status: "uploading",
      label: "lateral.mp4",
      sizeBytes: 17 * MiB,
      startFootage: 12.5,
      durationSeconds: null,
      posterUrl: null,
    });
    expect(JSON.stringify(listed.json)).not.toMatch(/objectKey|uploadId/);
  });
});

describe("the parts route and completion", () => {
  it("refuses part numbers outside 1..partCount and 1..10,000 without signing anything", async () => {
    const { json } = await start({ sizeBytes: 17 * MiB });
    const clipId = json.clipId as string;
    for (const [from, to] of [
      ["0", "1"],
      ["1", "10001"],
      ["1", "4"],
      ["4", "4"],
      ["2", "1"],
      ["x", "2"],
    ]) {
      const res = await call(listParts, {
        path: `/api/clips/${clipId}/parts?from=${from}&to=${to}`,
        params: { clipId },
        cookie: job.inspector.cookie,
      });
      expect(res.status).toBe(400);
      expect(res.json).not.toHaveProperty("parts");
    }
    const ok = await call(listParts, { path: `/api/clips/${clipId}/parts?from=2&to=3`, params: { clipId }, cookie: job.inspector.cookie });
    expect(ok.status).toBe(200);
    expect((ok.json.parts as PartUrl[]).map((p) => p.partNumber)).toEqual([2, 3]);
  });

  it("refuses part 0 and 10,001 in a completion list", async () => {
    const { json } = await start({});
    const clipId = json.clipId as string;
    for (const partNumber of [0, 10_001]) {
      const res = await call(complete, {
        method: "POST",
        params: { clipId },
        body: { parts: [{ partNumber, etag: "x" }] },
        cookie: job.inspector.cookie,
      });
      expect(res.status).toBe(400);
    }
    expect((await clipRow(clipId))?.status).toBe("uploading");
  });

  it("refuses a non-final part under 5 MiB even though the fake store took it", async () => {
    const { json } = await start({ sizeBytes: 8 * MiB + 1 });
    const clipId = json.clipId as string;
    const [p1, p2] = json.parts as PartUrl[];
    const parts = [
      { partNumber: 1, etag: await putPart(p1.url, new Uint8Array(4 * MiB)) },
      { partNumber: 2, etag: await putPart(p2.url, new Uint8Array(1)) },
    ];
    const res = await call(complete, { method: "POST", params: { clipId }, body: { parts }, cookie: job.inspector.cookie });
    expect(res.status).toBe(400);
    expect(res.json.error?.fieldErrors?.["parts[0]"]?.[0]).toMatch(/at least 5 MiB/);
    expect((await clipRow(clipId))?.status).toBe("uploading");
    // The resume route offers part 1 again, since what storage holds is not a whole part.
    const again = await call(listParts, { params: { clipId }, cookie: job.inspector.cookie });
    expect((again.json.parts as PartUrl[]).map((p) => p.partNumber)).toEqual([1]);
  });

  it("refuses more bytes than declared", async () => {
    const { json } = await start({ sizeBytes: 1 * MiB });
    const clipId = json.clipId as string;
    const etag = await putPart((json.parts as PartUrl[])[0].url, new Uint8Array(2 * MiB));
    const res = await call(complete, {
      method: "POST",
      params: { clipId },
      body: { parts: [{ partNumber: 1, etag }] },
      cookie: job.inspector.cookie,
    });
    expect(res.status).toBe(400);
    expect(res.json.error?.fieldErrors?.parts?.[0]).toMatch(/More bytes arrived than the 1048576 declared/);
    expect((await clipRow(clipId))?.status).toBe("uploading");
  });

  it("refuses an ETag that is not the stored part's", async () => {
    const { json } = await start({ sizeBytes: 10 });
    const clipId = json.clipId as string;
    await putPart((json.parts as PartUrl[])[0].url, new Uint8Array(10));
    const res = await call(complete, {
      method: "POST",
      params: { clipId },
      body: { parts: [{ partNumber: 1, etag: '"0123"' }] },
      cookie: job.inspector.cookie,
    });
    expect(res.status).toBe(400);
    expect(res.json.error?.fieldErrors?.["parts[0].etag"]).toBeDefined();
  });

  it("answers 404 for another inspector's clip on every clip route, and 403 to an agent", async () => {
    const { json } = await start({});
    const clipId = json.clipId as string;
    const other = await verifiedInspector(["97991"]);
    const asOther = { params: { clipId }, cookie: other.cookie };
    expect((await call(listParts, asOther)).status).toBe(404);
    expect((await call(complete, { ...asOther, method: "POST", body: { parts: [{ partNumber: 1, etag: "x" }] } })).status).toBe(404);
    expect((await call(getClip, asOther)).status).toBe(404);
    expect((await call(patchClip, { ...asOther, method: "PATCH", body: { startFootage: 3 } })).status).toBe(404);
    expect((await call(deleteClip, { ...asOther, method: "DELETE" })).status).toBe(404);
    expect((await call(presignPoster, { ...asOther, method: "POST", body: { contentType: "image/jpeg", sizeBytes: 100 } })).status).toBe(
      404,
    );
    expect(
      (
        await call(presignStill, {
          method: "POST",
          params: { id: job.jobId },
          body: { clipId, contentType: "image/jpeg", sizeBytes: 100 },
          cookie: other.cookie,
        })
      ).status,
    ).toBe(404);
    expect((await call(listParts, { params: { clipId }, cookie: job.agent.cookie })).status).toBe(403);
    expect((await call(listParts, { params: { clipId } })).status).toBe(401);
    expect((await clipRow(clipId))?.status).toBe("uploading");
  });

  it("cancels an upload: storage drops it and the clip leaves the list", async () => {
    const { json } = await start({});
    const clipId = json.clipId as string;
    expect((await call(deleteClip, { method: "DELETE", params: { clipId }, cookie: job.inspector.cookie })).status).toBe(200);
    expect((await clipRow(clipId))?.status).toBe("aborted");
    const listed = await call(listClips, { params: { id: job.jobId }, cookie: job.inspector.cookie });
    expect((listed.json.clips as { id: string }[]).map((c) => c.id)).not.toContain(clipId);
    expect((await call(listParts, { params: { clipId }, cookie: job.inspector.cookie })).status).toBe(409);
  });
});
