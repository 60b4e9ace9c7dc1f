import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { POST as complete } from "@/app/api/clips/[clipId]/complete/route";
import { POST as completePoster } from "@/app/api/clips/[clipId]/poster/complete/route";
import { POST as presignPoster } from "@/app/api/clips/[clipId]/poster/route";
import { DELETE as deleteClip, PATCH as patchClip } from "@/app/api/clips/[clipId]/route";
import { GET as listClips, POST as startClip } from "@/app/api/jobs/[id]/clips/route";
import { POST as presignStill } from "@/app/api/jobs/[id]/stills/route";
import { POST as completeStill } from "@/app/api/stills/[stillId]/complete/route";
import { getClip as clipRow, listStillsForOrder, verifiedStillIds } from "@/db/queries/clips";
import { headObject } from "@/lib/storage/multipart";
import { webmDuration } from "@/lib/uploads/verify";

import { call } from "../utils/session";
import { acceptedJob, demoClip, demoPoster, putPart, startUploadStorage, type PartUrl } from "./support/harness";

let storage: Awaited<ReturnType<typeof startUploadStorage>>;
let job: Awaited<ReturnType<typeof acceptedJob>>;

beforeAll(async () => {
  storage = await startUploadStorage();
  job = await acceptedJob();
});
afterAll(() => storage.close());

/** The whole browser flow for a one-part file; answers the completion. */
async function uploadWhole(bytes: Uint8Array, fileName: string, contentType = "video/mp4") {
  const started = await call(startClip, {
    method: "POST",
    params: { id: job.jobId },
    body: { fileName, sizeBytes: bytes.length, contentType },
    cookie: job.inspector.cookie,
  });
  expect(started.status).toBe(201);
  const clipId = started.json.clipId as string;
  const etag = await putPart((started.json.parts as PartUrl[])[0].url, bytes);
  const res = await call(complete, {
    method: "POST",
    params: { clipId },
    body: { parts: [{ partNumber: 1, etag }] },
    cookie: job.inspector.cookie,
  });
  return { clipId, res };
}

const enc = (s: string) => new TextEncoder().encode(s);
const padded = (head: Uint8Array, size = 4096) => {
  const out = new Uint8Array(size);
  out.set(head);
  return out;
};

// A WebM header as a recorder writes it, with a Duration of 7500 ms at the default timecode scale.
function webmHead(durationMs: number | null) {
  const float = new Uint8Array(8);
  new DataView(float.buffer).setFloat64(0, durationMs ?? 0);
  const info = [0x2a, 0xd7, 0xb1, 0x83, 0x0f, 0x42, 0x40, ...(durationMs === null ? [] : [0x44, 0x89, 0x88, ...float])];
  const docType = [0x42, 0x82, 0x84, ...enc("webm")];
  return new Uint8Array([
    ...[0x1a, 0x45, 0xdf, 0xa3, 0x80 | docType.length, ...docType],
    ...[0x18, 0x53, 0x80, 0x67, 0x01, 0xff, 0xff, 0xff, 0xff, 0xff, 0xff, 0xff],
    ...[0xec, 0x82, 0x00, 0x00],
    ...[0x15, 0x49, 0xa9, 0x66, 0x80 | info.length, ...info],
    ...[0x1f, 0x43, 0xb6, 0x75, 0x01, 0xff, 0xff, 0xff, 0xff, 0xff, 0xff, 0xff],
  ]);
}

describe("checking a completed clip by its bytes", () => {
  const fakes: [string, Uint8Array, RegExp][] = [
    ["page.mp4", enc("<!doctype html><html><body><script>alert(1)</script></body></html>"), /not an MP4, QuickTime or WebM video/],
    ["tool.mp4", padded(new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0])), /not an MP4, QuickTime or WebM video.*x-elf/],
    [
      "setup.mp4",
      padded(new Uint8Array([0x4d, 0x5a, 0x90, 0x00, 0x03, 0, 0, 0, 0x04, 0, 0, 0, 0xff, 0xff, 0, 0])),
      /not an MP4, QuickTime or WebM video/,
    ],
  ];
  for (const [name, bytes, reason] of fakes) {
    it(`rejects ${name} that is not video: 422 with the reason, the row rejected, the object deleted`, async () => {
      const { clipId, res } = await uploadWhole(bytes, name);
      expect(res.status).toBe(422);
      expect(res.json.error).toMatchObject({ code: "unprocessable" });
      expect(res.json.error?.message).toMatch(reason);
      const row = await clipRow(clipId);
      expect(row).toMatchObject({ status: "rejected" });
      expect(row?.rejectedReason).toMatch(reason);
      expect(await headObject(row!.objectKey)).toBeNull();
      const again = await call(complete, {
        method: "POST",
        params: { clipId },
        body: { parts: [{ partNumber: 1, etag: "x" }] },
        cookie: job.inspector.cookie,
      });
      expect(again.status).toBe(422);
    });
  }

  it("keeps a real MP4 as ready, with its duration within 0.2 s of the true 10 s", async () => {
    const { clipId, res } = await uploadWhole(demoClip("clay-joints"), "clay-joints.mp4");
    expect(res.status).toBe(200);
    const clip = res.json.clip as { status: string; durationSeconds: number; contentType: string };
    expect(clip).toMatchObject({ id: clipId, status: "ready", contentType: "video/mp4" });
    expect(Math.abs(clip.durationSeconds - 10)).toBeLessThanOrEqual(0.2);
    expect((await clipRow(clipId))?.completedAt).toBeInstanceOf(Date);
  });

  it("removing a ready clip marks it removed, deletes its object and takes it off the job's list", async () => {
    const { clipId, res } = await uploadWhole(demoClip("clay-joints"), "to-remove.mp4");
    expect(res.status).toBe(200);
    const key = (await clipRow(clipId))!.objectKey;
    expect(await headObject(key)).not.toBeNull();
    expect((await call(deleteClip, { method: "DELETE", params: { clipId }, cookie: job.inspector.cookie })).status).toBe(200);
    expect((await clipRow(clipId))?.status).toBe("removed");
    expect(await headObject(key)).toBeNull();
    const listed = await call(listClips, { params: { id: job.jobId }, cookie: job.inspector.cookie });
    expect((listed.json.clips as { id: string }[]).map((c) => c.id)).not.toContain(clipId);
    expect((await call(patchClip, { method: "PATCH", params: { clipId }, body: { startFootage: 3 }, cookie: job.inspector.cookie })).status).toBe(409);
  });

  it("judges by the bytes, not the declared type: an MP4 declared as WebM is kept as MP4, a QuickTime brand as QuickTime", async () => {
    const asWebm = await uploadWhole(demoClip("sag-water"), "sag.webm", "video/webm");
    expect(asWebm.res.json.clip).toMatchObject({ status: "ready", contentType: "video/mp4" });
    const qt = demoClip("roots-at-joint");
    qt.set(enc("qt  "), 8);
    const mov = await uploadWhole(qt, "roots.mov", "video/quicktime");
    expect(mov.res.status).toBe(200);
    expect(mov.res.json.clip).toMatchObject({ status: "ready", contentType: "video/quicktime" });
    expect(Math.abs((mov.res.json.clip as { durationSeconds: number }).durationSeconds - 12)).toBeLessThanOrEqual(0.2);
  });

  it("rejects an MP4 cut off before its index", async () => {
    const clip = demoClip("clay-joints");
    const noMoov = new Uint8Array(clip.length);
    noMoov.set(clip.subarray(0, 32));
    noMoov.set([0, 0, 0, 8, ...enc("free")], 32);
    const { res } = await uploadWhole(noMoov.subarray(0, 40), "cut.mp4");
    expect(res.status).toBe(422);
    expect(res.json.error?.message).toMatch(/no index/);
  });

  it("reads a WebM duration from its EBML header (null when the recorder wrote none) and keeps the WebM", async () => {
    expect(webmDuration(webmHead(7500))).toBe(7.5);
    expect(webmDuration(webmHead(null))).toBeNull();
    const { res } = await uploadWhole(padded(webmHead(7500), 2048), "pipe.webm", "video/webm");
    expect(res.status).toBe(200);
    expect(res.json.clip).toMatchObject({ status: "ready", contentType: "video/webm", durationSeconds: 7.5 });
  });
});

describe("posters, start footage and stills", () => {
  it("keeps a JPEG poster checked by its bytes and lists the clip with a signed poster URL", async () => {
    const { clipId } = await uploadWhole(demoClip("clay-joints"), "clay.mp4");
    const jpg = demoPoster("clay-joints");
    const presigned = await call(presignPoster, {
      method: "POST",
      params: { clipId },
      body: { contentType: "image/jpeg", sizeBytes: jpg.length },
      cookie: job.inspector.cookie,
    });
    expect(presigned.status).toBe(200);
    expect(presigned.json.key).toMatch(new RegExp(`^posters/${clipId}/`));
    expect(
      (
        await fetch(presigned.json.uploadUrl as string, {
          method: "PUT",
          body: new Blob([Buffer.from(jpg)]),
          headers: { "content-type": "image/jpeg" },
        })
      ).ok,
    ).toBe(true);
    const done = await call(completePoster, {
      method: "POST",
      params: { clipId },
      body: { key: presigned.json.key },
      cookie: job.inspector.cookie,
    });
    expect(done.status).toBe(200);
    expect(
      (await call(patchClip, { method: "PATCH", params: { clipId }, body: { startFootage: 18 }, cookie: job.inspector.cookie })).json.clip,
    ).toMatchObject({ startFootage: 18 });
    const listed = await call(listClips, { params: { id: job.jobId }, cookie: job.inspector.cookie });
    const clip = (listed.json.clips as { id: string; posterUrl: string | null; startFootage: number }[]).find((c) => c.id === clipId)!;
    expect(clip.startFootage).toBe(18);
    const poster = await fetch(clip.posterUrl!);
    expect(poster.headers.get("content-type")).toBe("image/jpeg");
    expect(new Uint8Array(await poster.arrayBuffer()).length).toBe(jpg.length);
  });

  it("refuses a poster that is HTML, and a key outside the clip's folder", async () => {
    const { clipId } = await uploadWhole(demoClip("sag-water"), "sag.mp4");
    const html = enc("<html>not a picture</html>");
    const presigned = await call(presignPoster, {
      method: "POST",
      params: { clipId },
      body: { contentType: "image/png", sizeBytes: html.length },
      cookie: job.inspector.cookie,
    });
    await fetch(presigned.json.uploadUrl as string, {
      method: "PUT",
      body: new Blob([Buffer.from(html)]),
      headers: { "content-type": "image/png" },
    });
    const done = await call(completePoster, {
      method: "POST",
      params: { clipId },
      body: { key: presigned.json.key },
      cookie: job.inspector.cookie,
    });
    expect(done.status).toBe(422);
    expect(await headObject(presigned.json.key as string)).toBeNull();
    expect(
      (
        await call(completePoster, {
          method: "POST",
          params: { clipId },
          body: { key: `clips/${job.jobId}/x.mp4` },
          cookie: job.inspector.cookie,
        })
      ).status,
    ).toBe(404);
    expect(
      (await call(patchClip, { method: "PATCH", params: { clipId }, body: { startFootage: -1 }, cookie: job.inspector.cookie })).status,
    ).toBe(400);
  });

  it("keeps a still frame that is a JPEG and drops one that is not", async () => {
    const { clipId } = await uploadWhole(demoClip("roots-at-joint"), "roots.mp4");
    const jpg = demoPoster("roots-at-joint");
    const still = await call(presignStill, {
      method: "POST",
      params: { id: job.jobId },
      body: { clipId, second: 6.5, contentType: "image/jpeg", sizeBytes: jpg.length },
      cookie: job.inspector.cookie,
    });
    expect(still.status).toBe(201);
    await fetch(still.json.uploadUrl as string, {
      method: "PUT",
      body: new Blob([Buffer.from(jpg)]),
      headers: { "content-type": "image/jpeg" },
    });
    const ok = await call(completeStill, {
      method: "POST",
      params: { stillId: still.json.stillId as string },
      cookie: job.inspector.cookie,
    });
    expect(ok.status).toBe(200);
    expect(ok.json.still).toMatchObject({ id: still.json.stillId, clipId, second: 6.5 });

    const bad = await call(presignStill, {
      method: "POST",
      params: { id: job.jobId },
      body: { contentType: "image/jpeg", sizeBytes: 20 },
      cookie: job.inspector.cookie,
    });
    await fetch(bad.json.uploadUrl as string, {
      method: "PUT",
      body: new Blob([Buffer.from(enc("MZ not a jpeg at all"))]),
      headers: { "content-type": "image/jpeg" },
    });
    expect(
      (await call(completeStill, { method: "POST", params: { stillId: bad.json.stillId as string }, cookie: job.inspector.cookie })).status,
    ).toBe(422);
    expect((await listStillsForOrder(job.jobId)).map((s) => s.id)).toEqual([still.json.stillId]);
    expect(await verifiedStillIds(job.jobId)).toEqual([still.json.stillId]);

    // A still whose upload was asked for but never completed is kept for its URL's lifetime, unverified.
    const pending = await call(presignStill, { method: "POST", params: { id: job.jobId }, body: { contentType: "image/jpeg", sizeBytes: 20 }, cookie: job.inspector.cookie });
    expect(pending.status).toBe(201);
    expect((await listStillsForOrder(job.jobId)).map((s) => s.id)).toContain(pending.json.stillId);
    expect(await verifiedStillIds(job.jobId)).toEqual([still.json.stillId]);

    const other = await acceptedJob();
    expect(
      (
        await call(presignStill, {
          method: "POST",
          params: { id: other.jobId },
          body: { clipId, contentType: "image/jpeg", sizeBytes: 20 },
          cookie: other.inspector.cookie,
        })
      ).status,
    ).toBe(400);
    expect(
      (await call(completeStill, { method: "POST", params: { stillId: still.json.stillId as string }, cookie: other.inspector.cookie }))
        .status,
    ).toBe(404);
  });
});
