import { describe, expect, it } from "vitest";

import { POST as completeInsurance } from "@/app/api/inspector/insurance/complete/route";
import { POST as presignInsurance } from "@/app/api/inspector/insurance/route";
import { GET as getProfile, PUT as putProfile } from "@/app/api/inspector/profile/route";
import { GET as board } from "@/app/api/jobs/route";

import { call } from "../utils/session";
import { signedIn, verifiedInspector } from "../utils/world";

const PDF = new TextEncoder().encode("%PDF-1.7\n1 0 obj << /Type /Catalog >> endobj\ntrailer << >>\n%%EOF\n");

async function upload(cookie: string, bytes: Uint8Array, contentType = "application/pdf", fileName = "certificate.pdf") {
  const presigned = await call(presignInsurance, { method: "POST", body: { fileName, sizeBytes: bytes.length || 1, contentType }, cookie });
  expect(presigned.status).toBe(200);
  const put = await fetch(presigned.json.uploadUrl as string, { method: "PUT", body: new Blob([Buffer.from(bytes)]), headers: { "content-type": contentType } });
  expect(put.ok).toBe(true);
  return call(completeInsurance, { method: "POST", body: { key: presigned.json.key, fileName }, cookie });
}

describe("the inspector profile", async () => {
  const inspector = await verifiedInspector(["97991"]);

  it("saves the service area and availability; a new licence goes back to verification and hides the board", async () => {
    const body = { licenceNumber: "HF-PLB-99999", licenceExpiresOn: "2029-05-31", baseLocation: "Harrow Falls", postalCodes: ["97991", "97992", "97992"], availability: { mon: [{ start: "08:00", end: "16:00" }] } };
    const res = await call(putProfile, { method: "PUT", body, cookie: inspector.cookie });
    expect(res.status).toBe(200);
    expect(res.json.profile).toMatchObject({ postalCodes: ["97991", "97992"], verified: false, licenceValid: true });
    expect((await call(board, { path: "/api/jobs", cookie: inspector.cookie })).status).toBe(403);
  });

  it("refuses bad input field by field", async () => {
    const res = await call(putProfile, { method: "PUT", body: { licenceNumber: "", licenceExpiresOn: "31/05/2029", baseLocation: "x", postalCodes: ["123"], availability: { mon: [{ start: "8am", end: "16:00" }] } }, cookie: inspector.cookie });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error?.fieldErrors ?? {}).sort()).toEqual(["availability.mon[0].start", "baseLocation", "licenceExpiresOn", "licenceNumber", "postalCodes[0]"]);
  });

  it("is for inspectors only", async () => {
    const agent = await signedIn("agent");
    expect((await call(getProfile, { cookie: agent.cookie })).status).toBe(403);
  });
});

describe("the insurance certificate upload", async () => {
  const inspector = await verifiedInspector(["97991"]);

  it("keeps a real PDF", async () => {
    const res = await upload(inspector.cookie, PDF);
    expect(res.status).toBe(200);
    expect((await call(getProfile, { cookie: inspector.cookie })).json.profile).toMatchObject({ insurance: { fileName: "certificate.pdf" } });
  });

  it("rejects HTML named .pdf by its bytes and deletes it", async () => {
    const res = await upload(inspector.cookie, new TextEncoder().encode("<html><script>alert(1)</script></html>"));
    expect(res.status).toBe(422);
    expect(res.json.error?.message).toMatch(/not a PDF, PNG or JPEG/);
  });

  it("refuses another inspector's upload key", async () => {
    const other = await verifiedInspector(["97991"]);
    const presigned = await call(presignInsurance, { method: "POST", body: { fileName: "c.pdf", sizeBytes: PDF.length, contentType: "application/pdf" }, cookie: inspector.cookie });
    const res = await call(completeInsurance, { method: "POST", body: { key: presigned.json.key, fileName: "c.pdf" }, cookie: other.cookie });
    expect(res.status).toBe(404);
  });

  it("refuses an oversize or odd file before signing any URL", async () => {
    expect((await call(presignInsurance, { method: "POST", body: { fileName: "big.pdf", sizeBytes: 50 * 1024 * 1024, contentType: "application/pdf" }, cookie: inspector.cookie })).status).toBe(400);
    expect((await call(presignInsurance, { method: "POST", body: { fileName: "x.exe", sizeBytes: 10, contentType: "application/x-msdownload" }, cookie: inspector.cookie })).status).toBe(400);
  });
});
