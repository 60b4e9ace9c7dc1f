// P4: First Load JS per route, from the build's manifests (Next 16 prints no size table): the
// framework's root chunks plus every chunk the route's segments (layouts, page, error, not-found)
// load, each gzip-sized. The noModule polyfill chunk is left out: modern browsers never fetch it.
import fs from "node:fs";
import path from "node:path";
import vm from "node:vm";
import zlib from "node:zlib";

const NEXT = ".next";

export type RouteJs = { route: string; totalKb: number; frameworkKb: number; sharedKb: number; routeKb: number; chunks: string[] };
export type FirstLoad = { frameworkKb: number; sharedKb: number; routes: RouteJs[] };

const kb = (bytes: number) => bytes / 1000;

function gzipSize(file: string, cache: Map<string, number>): number {
  let size = cache.get(file);
  if (size === undefined) {
    size = zlib.gzipSync(fs.readFileSync(path.join(NEXT, file)), { level: 9 }).length;
    cache.set(file, size);
  }
  return size;
}

function manifests(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return manifests(full);
    return e.name === "page_client-reference-manifest.js" ? [full] : [];
  });
}

function entryChunks(file: string): { key: string; chunks: string[] } {
  const sandbox = { globalThis: {} as { __RSC_MANIFEST?: Record<string, { entryJSFiles: Record<string, string[]> }> } };
  vm.runInNewContext(fs.readFileSync(file, "utf8"), sandbox);
  const [[key, manifest]] = Object.entries(sandbox.globalThis.__RSC_MANIFEST ?? {});
  return { key, chunks: [...new Set(Object.values(manifest.entryJSFiles).flat())] };
}

export function firstLoadJs(exclude: (route: string) => boolean = () => false): FirstLoad {
  const build = JSON.parse(fs.readFileSync(path.join(NEXT, "build-manifest.json"), "utf8")) as { rootMainFiles: string[] };
  const routeOf = JSON.parse(fs.readFileSync(path.join(NEXT, "app-path-routes-manifest.json"), "utf8")) as Record<string, string>;
  const cache = new Map<string, number>();
  const framework = build.rootMainFiles;
  const pages = manifests(path.join(NEXT, "server", "app"))
    .map(entryChunks)
    .map(({ key, chunks }) => ({ route: routeOf[key] ?? key, chunks: chunks.filter((c) => !framework.includes(c)) }))
    .filter((p) => !exclude(p.route));
  // Chunks every page loads besides the framework: the root layout, its providers, global-error.
  const shared = pages.length ? pages.map((p) => p.chunks).reduce((a, b) => a.filter((c) => b.includes(c))) : [];
  const sum = (files: string[]) => kb(files.reduce((s, f) => s + gzipSize(f, cache), 0));
  const frameworkKb = sum(framework);
  const sharedKb = sum(shared);
  const routes = pages
    .map((p) => {
      const own = p.chunks.filter((c) => !shared.includes(c));
      const routeKb = sum(own);
      return { route: p.route, totalKb: frameworkKb + sharedKb + routeKb, frameworkKb, sharedKb, routeKb, chunks: own };
    })
    .sort((a, b) => b.totalKb - a.totalKb);
  return { frameworkKb, sharedKb, routes };
}
