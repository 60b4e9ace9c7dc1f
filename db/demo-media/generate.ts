// Renders the invented demo clips: a camera inside a pipe, drawn pixel by pixel here and encoded by
// ffmpeg. Only needed to regenerate the files (the app and CI never run it).
// Run: npx tsx db/demo-media/generate.ts   (needs ffmpeg on the PATH)
import { spawn, spawnSync } from "node:child_process";
import path from "node:path";

const W = 320;
const H = 240;
const FPS = 15;
const OUT = path.dirname(new URL(import.meta.url).pathname);

type Scene = {
  file: string;
  seconds: number;
  startFootage: number;
  feetPerSecond: number;
  /** Pipe wall colour (RGB) and the spacing of its joints in feet. */
  wall: [number, number, number];
  jointEvery: number;
  roots?: { from: number; to: number };
  water?: { from: number; to: number; depth: number };
};

const SCENES: Scene[] = [
  { file: "clay-joints", seconds: 10, startFootage: 0, feetPerSecond: 1.2, wall: [168, 96, 58], jointEvery: 3 },
  {
    file: "roots-at-joint",
    seconds: 12,
    startFootage: 18,
    feetPerSecond: 1.0,
    wall: [150, 88, 56],
    jointEvery: 3,
    roots: { from: 24.6, to: 26.2 },
  },
  {
    file: "sag-water",
    seconds: 8,
    startFootage: 42,
    feetPerSecond: 1.1,
    wall: [176, 178, 168],
    jointEvery: 14,
    water: { from: 44, to: 49, depth: 0.35 },
  },
];

function hash(x: number, y: number): number {
  const s = Math.sin(x * 127.1 + y * 311.7) * 43758.5453;
  return s - Math.floor(s);
}

function noise(x: number, y: number): number {
  const xi = Math.floor(x);
  const yi = Math.floor(y);
  const fx = x - xi;
  const fy = y - yi;
  const a = hash(xi, yi);
  const b = hash(xi + 1, yi);
  const c = hash(xi, yi + 1);
  const d = hash(xi + 1, yi + 1);
  const u = fx * fx * (3 - 2 * fx);
  const v = fy * fy * (3 - 2 * fy);
  return a + (b - a) * u + (c - a) * v + (a - b - c + d) * u * v;
}

// A 5x7 pixel font for the footage counter, drawn here so no system font is needed.
const GLYPHS: Record<string, string[]> = {
  "0": ["01110", "10001", "10011", "10101", "11001", "10001", "01110"],
  "1": ["00100", "01100", "00100", "00100", "00100", "00100", "01110"],
  "2": ["01110", "10001", "00001", "00010", "00100", "01000", "11111"],
  "3": ["11110", "00001", "00001", "01110", "00001", "00001", "11110"],
  "4": ["00010", "00110", "01010", "10010", "11111", "00010", "00010"],
  "5": ["11111", "10000", "11110", "00001", "00001", "10001", "01110"],
  "6": ["00110", "01000", "10000", "11110", "10001", "10001", "01110"],
  "7": ["11111", "00001", "00010", "00100", "01000", "01000", "01000"],
  "8": ["01110", "10001", "10001", "01110", "10001", "10001", "01110"],
  "9": ["01110", "10001", "10001", "01111", "00001", "00010", "01100"],
  ".": ["00000", "00000", "00000", "00000", "00000", "01100", "01100"],
  F: ["11111", "10000", "10000", "11110", "10000", "10000", "10000"],
  T: ["11111", "00100", "00100", "00100", "00100", "00100", "00100"],
  " ": ["00000", "00000", "00000", "00000", "00000", "00000", "00000"],
};

function drawText(frame: Buffer, text: string, x0: number, y0: number, scale: number) {
  [...text].forEach((ch, i) => {
    const glyph = GLYPHS[ch] ?? GLYPHS[" "];
    glyph.forEach((row, gy) => {
      [...row].forEach((bit, gx) => {
        if (bit !== "1") return;
        for (let sy = -1; sy <= scale; sy++) {
          for (let sx = -1; sx <= scale; sx++) {
            const x = x0 + (i * 6 + gx) * scale + sx;
            const y = y0 + gy * scale + sy;
            if (x < 0 || y < 0 || x >= W || y >= H) continue;
            const inside = sx >= 0 && sy >= 0 && sx < scale && sy < scale;
            const o = (y * W + x) * 3;
            if (inside) frame.fill(240, o, o + 3);
            else if (frame[o] !== 240) frame.fill(0, o, o + 3);
          }
        }
      });
    });
  });
}

function renderFrame(scene: Scene, t: number, frame: Buffer) {
  const camera = scene.startFootage + t * scene.feetPerSecond;
  const wobbleX = Math.sin(t * 1.3) * 6;
  const wobbleY = Math.cos(t * 0.9) * 4;
  const waterDepth = scene.water && camera + 2 > scene.water.from && camera < scene.water.to ? scene.water.depth : 0;
  for (let y = 0; y < H; y++) {
    for (let x = 0; x < W; x++) {
      const px = (x - W / 2 - wobbleX) / (H / 2);
      const py = (y - H / 2 - wobbleY) / (H / 2);
      const r = Math.hypot(px, py) + 1e-4;
      const angle = Math.atan2(py, px);
      let z = 1 / r;
      let onWater = false;
      if (waterDepth && py > 0) {
        const zWater = (1 - waterDepth) / py;
        if (zWater < z) {
          z = zWater;
          onWater = true;
        }
      }
      const s = camera + z;
      const light = 1.25 / (1 + 0.14 * z * z);
      let [cr, cg, cb] = scene.wall;
      let shade = 0.75 + 0.35 * noise(s * 3, angle * 4) + 0.08 * Math.sin(angle * 9 + s);
      const toJoint = Math.abs(s - Math.round(s / scene.jointEvery) * scene.jointEvery);
      if (toJoint < 0.05) shade *= 0.35;
      else if (toJoint < 0.12) shade *= 1.2;
      if (scene.roots && s > scene.roots.from && s < scene.roots.to && angle > -1.5 && angle < -0.2) {
        const strand = Math.sin(angle * 45 + Math.sin(s * 7) * 5 + noise(s * 5, angle * 8) * 6) * noise(s * 4 + 9, angle * 6);
        if (strand > 0.35) {
          [cr, cg, cb] = [222, 196, 150];
          shade = 0.9 + 0.3 * strand;
        }
      }
      if (onWater) {
        [cr, cg, cb] = [70, 84, 80];
        shade = 0.7 + 0.25 * Math.sin(s * 5 + t * 3 + px * 4) * noise(s * 2, px * 6);
      }
      const grain = (hash(x + t * 97, y - t * 53) - 0.5) * 18;
      const o = (y * W + x) * 3;
      frame[o] = Math.max(0, Math.min(255, cr * shade * light + grain));
      frame[o + 1] = Math.max(0, Math.min(255, cg * shade * light + grain));
      frame[o + 2] = Math.max(0, Math.min(255, cb * shade * light + grain));
    }
  }
  drawText(frame, `${camera.toFixed(1)} FT`, 10, H - 26, 2);
}

async function render(scene: Scene) {
  const mp4 = path.join(OUT, `${scene.file}.mp4`);
  const ffmpeg = spawn(
    "ffmpeg",
    [
      "-y",
      "-loglevel",
      "error",
      "-f",
      "rawvideo",
      "-pix_fmt",
      "rgb24",
      "-s",
      `${W}x${H}`,
      "-r",
      String(FPS),
      "-i",
      "-",
      "-c:v",
      "libx264",
      "-preset",
      "slow",
      "-crf",
      "27",
      "-pix_fmt",
      "yuv420p",
      "-movflags",
      "+faststart",
      mp4,
    ],
    { stdio: ["pipe", "inherit", "inherit"] },
  );
  const frame = Buffer.alloc(W * H * 3);
  for (let i = 0; i < scene.seconds * FPS; i++) {
    renderFrame(scene, i / FPS, frame);
    if (!ffmpeg.stdin.write(frame)) await new Promise((r) => ffmpeg.stdin.once("drain", r));
  }
  ffmpeg.stdin.end();
  await new Promise((resolve, reject) =>
    ffmpeg.once("exit", (code) => (code === 0 ? resolve(null) : reject(new Error(`ffmpeg exited ${code}`)))),
  );
  spawnSync(
    "ffmpeg",
    ["-y", "-loglevel", "error", "-ss", "1", "-i", mp4, "-frames:v", "1", "-q:v", "4", path.join(OUT, `${scene.file}.jpg`)],
    { stdio: "inherit" },
  );
  console.log(`${scene.file}.mp4: ${scene.seconds} s from ${scene.startFootage} ft`);
}

for (const scene of SCENES) await render(scene);
