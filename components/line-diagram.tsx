import clsx from "clsx";
import type { KeyboardEvent } from "react";

import { SEVERITY_LABELS, type Severity } from "@/components/ui/severity-badge";
import type { Evaluation } from "@/lib/engine/evaluate";
import { FINDING_TYPES, type FindingType } from "@/lib/engine/finding-types";
import {
  MATERIAL_LABELS,
  STOPPED_IN_LINE,
  SURFACE_LABELS,
  SURVEY_END_LABELS,
  type AccessKind,
  type Material,
  type Surface,
  type SurveyEndReason,
} from "@/lib/engine/vocabulary";

// The side view of a building sewer: the same drawing in the inspector's workspace, the buyer's
// rated summary and print. No state and no browser APIs, so it renders on the server.

type Maybe<T> = T | null | undefined;

/** An inspection record, or a draft of one: anything missing or unfinished is left out of the drawing. */
export type DiagramRecord = {
  access?: Maybe<{ kind?: Maybe<AccessKind | string> }>;
  segments?: Maybe<
    readonly { from?: Maybe<number>; to?: Maybe<number>; material?: Maybe<Material | string>; diameterIn?: Maybe<number> }[]
  >;
  locates?: Maybe<readonly { at?: Maybe<number>; depthFt?: Maybe<number>; surface?: Maybe<Surface | string> }[]>;
  boundaryAt?: Maybe<number>;
  findings?: Maybe<
    readonly { at?: Maybe<number>; to?: Maybe<number>; type?: Maybe<FindingType | string>; grade?: Maybe<number>; clock?: Maybe<string> }[]
  >;
  surveyEnd?: Maybe<{ at?: Maybe<number>; reason?: Maybe<SurveyEndReason | string> }>;
};

export type LineDiagramProps = {
  record: DiagramRecord;
  evaluation?: Evaluation | null;
  highlightFindingIndex?: number | null;
  onSelectFinding?: (index: number) => void;
  /** Always the narrow drawing (for a side column); otherwise narrow on phones and wide from 640 px. */
  compact?: boolean;
  className?: string;
};

const WIDE = 720;
const PAD_L = 60;
const PAD_R = 28;
const LANE_H = 24;
const CHIP_W = 22;
const CHIP_H = 18;
const MAX_LANES = 4;

// Gradeline's own calm pipe palette; every segment also carries its material and size in words.
const MATERIAL_COLOURS: Record<Material, string> = {
  cast_iron: "#6a6560",
  ductile_iron: "#4f5b66",
  vitrified_clay: "#c08a5f",
  concrete: "#aaa89d",
  bituminous_fibre: "#5a4a3c",
  abs: "#33383b",
  pvc: "#e7e3d6",
  hdpe: "#3f5a66",
  unknown: "#cfcabe",
};

// A white edge under small labels, so a finding's stem crossing them does not cut the words.
const HALO = { stroke: "#fff", strokeWidth: 3, strokeLinejoin: "round", paintOrder: "stroke" } as const;

const SEV_CLASSES: Record<Severity, { fill: string; stroke: string }> = {
  1: { fill: "fill-sev-1", stroke: "stroke-sev-1" },
  2: { fill: "fill-sev-2", stroke: "stroke-sev-2" },
  3: { fill: "fill-sev-3", stroke: "stroke-sev-3" },
  4: { fill: "fill-sev-4", stroke: "stroke-sev-4" },
  5: { fill: "fill-sev-5", stroke: "stroke-sev-5" },
};

const ACCESS_SHORT: Record<AccessKind, string> = {
  cleanout_inside: "Cleanout",
  cleanout_outside: "Cleanout",
  toilet_removed: "Toilet drain",
  roof_vent: "Roof vent",
  other: "Access",
};

const finite = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);
const tenth = (v: number) => (Math.round(v * 10) / 10).toFixed(1);

/** Tick spacing for a line of this length: every 5 ft up to 40 ft, 10 ft up to 150, 25 ft up to 400, then 50. */
export function axisStep(lengthFt: number): number {
  if (lengthFt <= 40) return 5;
  if (lengthFt <= 150) return 10;
  if (lengthFt <= 400) return 25;
  return 50;
}

/** The footage axis: ticks from 0 to the first tick at or past the line's end. */
export function axisTicks(lengthFt: number): { step: number; max: number; ticks: number[] } {
  const length = finite(lengthFt) && lengthFt > 0 ? lengthFt : 0;
  const step = axisStep(length);
  const max = Math.max(step, Math.ceil(length / step - 1e-9) * step);
  const ticks: number[] = [];
  for (let t = 0; t <= max + 1e-9; t += step) ticks.push(Math.round(t * 1000) / 1000);
  return { step, max, ticks };
}

/**
 * Stacks labels that would overlap into lanes, left to right, each in the first lane where it
 * fits. Past maxLanes a label goes to the lane that frees up first (it may overlap there).
 */
export function assignLanes(spans: readonly { x0: number; x1: number }[], gap = 4, maxLanes = MAX_LANES): number[] {
  const order = spans.map((s, i) => ({ ...s, i })).sort((a, b) => a.x0 - b.x0 || a.i - b.i);
  const ends: number[] = [];
  const lanes = new Array<number>(spans.length).fill(0);
  for (const s of order) {
    let lane = ends.findIndex((end) => s.x0 >= end + gap);
    if (lane === -1 && ends.length < maxLanes) lane = ends.length;
    if (lane === -1) lane = ends.indexOf(Math.min(...ends));
    ends[lane] = Math.max(ends[lane] ?? -Infinity, s.x1);
    lanes[s.i] = lane;
  }
  return lanes;
}

/** Depth of the pipe at a footage from the locate marks: straight between marks, level beyond them. */
export function depthAt(marks: readonly { at: number; depthFt: number }[], ft: number): number | null {
  if (marks.length === 0) return null;
  if (ft <= marks[0].at) return marks[0].depthFt;
  for (let i = 1; i < marks.length; i++) {
    const a = marks[i - 1];
    const b = marks[i];
    if (ft <= b.at) return a.depthFt + ((b.depthFt - a.depthFt) * (ft - a.at)) / (b.at - a.at);
  }
  return marks[marks.length - 1].depthFt;
}

export function clockText(clock: string): string {
  const [from, to] = clock.split(/\s*(?:-|to)\s*/);
  return to ? `${from} to ${to} o'clock` : `${from} o'clock`;
}

type Seg = { index: number; from: number; to: number; material: Material; diameterIn: number | null };
type Mark = { index: number; at: number; depthFt: number; surface: string | null };
type Find = { index: number; at: number; to: number | null; type: string; label: string; grade: Severity; clock: string | null };

function readRecord(record: DiagramRecord) {
  const segments: Seg[] = [];
  (record.segments ?? []).forEach((s, index) => {
    if (!finite(s.from) || !finite(s.to) || s.to <= s.from) return;
    const material = (s.material && s.material in MATERIAL_LABELS ? s.material : "unknown") as Material;
    segments.push({ index, from: s.from, to: s.to, material, diameterIn: finite(s.diameterIn) ? s.diameterIn : null });
  });
  const locates: Mark[] = [];
  (record.locates ?? []).forEach((l, index) => {
    if (finite(l.at) && finite(l.depthFt) && l.depthFt >= 0)
      locates.push({ index, at: l.at, depthFt: l.depthFt, surface: l.surface ?? null });
  });
  locates.sort((a, b) => a.at - b.at);
  const findings: Find[] = [];
  (record.findings ?? []).forEach((f, index) => {
    if (!finite(f.at) || !f.type || !(f.type in FINDING_TYPES)) return;
    const grade = finite(f.grade) ? (Math.min(5, Math.max(1, Math.round(f.grade))) as Severity) : null;
    if (grade === null) return;
    const to = finite(f.to) && f.to > f.at ? f.to : null;
    findings.push({ index, at: f.at, to, type: f.type, label: FINDING_TYPES[f.type as FindingType].label, grade, clock: f.clock || null });
  });
  const end = finite(record.surveyEnd?.at) && record.surveyEnd.at > 0 ? record.surveyEnd.at : null;
  const reason =
    record.surveyEnd?.reason && record.surveyEnd.reason in SURVEY_END_LABELS ? (record.surveyEnd.reason as SurveyEndReason) : null;
  const boundaryAt = finite(record.boundaryAt) ? record.boundaryAt : null;
  const kind = record.access?.kind && record.access.kind in ACCESS_SHORT ? (record.access.kind as AccessKind) : null;
  const reach = Math.max(end ?? 0, ...segments.map((s) => s.to), ...locates.map((l) => l.at), ...findings.map((f) => f.to ?? f.at));
  return { segments, locates, findings, end, reason, boundaryAt, kind, reach };
}

export function findingText(f: { label: string; at: number; to: number | null; grade: number; clock: string | null }): string {
  const place = f.to !== null ? `${tenth(f.at)} to ${tenth(f.to)} ft` : `${tenth(f.at)} ft`;
  const grade = `grade ${f.grade} (${SEVERITY_LABELS[f.grade as Severity]})`;
  return [f.label, place, grade, f.clock ? clockText(f.clock) : null].filter(Boolean).join(", ");
}

const segmentText = (s: Seg) => `${MATERIAL_LABELS[s.material]}${s.diameterIn !== null ? ` ${s.diameterIn} in` : ""}`;

/** Where a label of about `width` px goes so that it stays inside the drawing. */
function place(x: number, width: number, W: number, prefer: "start" | "end"): { x: number; anchor: "start" | "end" } {
  if (prefer === "end" && x - width >= 4) return { x, anchor: "end" };
  if (x + width <= W - 4) return { x, anchor: "start" };
  return x - width >= 4 ? { x, anchor: "end" } : { x: Math.max(4, Math.min(x, W - 4 - width)), anchor: "start" };
}

// Phones get a narrower drawing, so its words stay readable; a long line still scrolls sideways.
const narrowWidth = (reach: number) => Math.round(Math.min(WIDE, Math.max(360, reach * 4 + 80)));

export function LineDiagram({ record, evaluation, highlightFindingIndex, onSelectFinding, compact = false, className }: LineDiagramProps) {
  const r = readRecord(record);
  const stretches = evaluation?.stretches ?? [];
  const highlight = r.findings.find((f) => f.index === highlightFindingIndex) ?? null;
  const narrow = narrowWidth(r.reach);
  const common = { r, stretches, highlightFindingIndex, onSelectFinding };
  return (
    <figure className={clsx("min-w-0", className)}>
      <div className="overflow-x-auto overscroll-x-contain">
        {compact ? (
          <Drawing {...common} W={narrow} className="block" minWidth={narrow * 0.9} />
        ) : (
          <>
            <Drawing {...common} W={WIDE} className="hidden min-w-[620px] sm:block print:block" />
            <Drawing {...common} W={narrow} className="sm:hidden print:hidden" minWidth={narrow * 0.9} />
          </>
        )}
      </div>

      <figcaption className="mt-2 space-y-2 text-sm">
        <p className="text-ink min-h-5" aria-live="polite">
          {highlight ? (
            <>
              <span className="font-medium">Finding {highlight.index + 1}:</span> {findingText(highlight)}
            </>
          ) : r.findings.length > 0 ? (
            <span className="text-ink-2 print:hidden">Focus or tap a numbered mark to see that finding. The number is its grade.</span>
          ) : null}
        </p>
        <Legend
          segments={r.segments}
          hasStretches={stretches.length > 0}
          hasLocates={r.locates.length > 0}
          hasBoundary={r.boundaryAt !== null}
        />
        <Description r={r} evaluation={evaluation ?? null} />
      </figcaption>
    </figure>
  );
}

function Drawing({
  r,
  stretches,
  highlightFindingIndex,
  onSelectFinding,
  W,
  className,
  minWidth,
}: {
  r: ReturnType<typeof readRecord>;
  stretches: Evaluation["stretches"];
  highlightFindingIndex?: number | null;
  onSelectFinding?: (index: number) => void;
  W: number;
  className: string;
  minWidth?: number;
}) {
  const empty = r.reach <= 0;
  const axis = axisTicks(empty ? 50 : r.reach);
  const x = (ft: number) => PAD_L + (ft / axis.max) * (W - PAD_L - PAD_R);

  const chipX = (f: Find) => x(f.to !== null ? (f.at + f.to) / 2 : f.at);
  const lanes = assignLanes(r.findings.map((f) => ({ x0: chipX(f) - CHIP_W / 2, x1: chipX(f) + CHIP_W / 2 })));
  const laneCount = Math.max(1, ...lanes.map((l) => l + 1));
  const lanesTop = 26;
  const ground = lanesTop + laneCount * LANE_H + 10;
  const deepest = Math.max(3, ...r.locates.map((l) => l.depthFt));
  const k = Math.min(10, 60 / deepest);
  const pipeY = (ft: number) => ground + 18 + (depthAt(r.locates, ft) ?? 2.5) * k;
  const lineEnd = r.end ?? Math.max(0, ...r.segments.map((s) => s.to));
  const pipeLow = Math.max(pipeY(0), pipeY(lineEnd), ...r.locates.map((l) => pipeY(l.at))) + 6;
  const segLabelY = pipeLow + 18;
  const stretchY = segLabelY + 11;
  const axisY = stretchY + 12;
  const endLabelY = axisY + 34;
  const height = endLabelY + 10;

  const polyline = (from: number, to: number) => {
    const pts = [from, ...r.locates.map((l) => l.at).filter((a) => a > from && a < to), to];
    return pts.map((ft) => `${x(ft).toFixed(1)},${pipeY(ft).toFixed(1)}`).join(" ");
  };
  const depthLanes = assignLanes(
    r.locates.map((l) => ({ x0: x(l.at), x1: x(l.at) + 46 })),
    2,
    2,
  );
  const highlight = r.findings.find((f) => f.index === highlightFindingIndex) ?? null;
  const drawn = highlight ? [...r.findings.filter((f) => f !== highlight), highlight] : r.findings;
  const boundaryLabel = place(x(r.boundaryAt ?? 0), 160, W, "start");
  const endText = `Survey ended at ${r.end !== null ? tenth(r.end) : ""} ft${r.reason ? `: ${SURVEY_END_LABELS[r.reason]}` : ""}`;
  const endLabel = place(x(r.end ?? 0), endText.length * 5.9, W, "end");
  const stoppedShort = r.reason !== null && (STOPPED_IN_LINE.includes(r.reason) || r.reason === "cable_end");

  function onKey(e: KeyboardEvent, index: number) {
    if (e.key === "Enter" || e.key === " ") {
      e.preventDefault();
      onSelectFinding?.(index);
    }
  }

  return (
    <svg
      viewBox={`0 0 ${W} ${height}`}
      className={clsx("h-auto w-full font-sans select-none", className)}
      style={minWidth ? { minWidth: `${Math.round(minWidth)}px` } : undefined}
      aria-label="Side view of the line; the findings are buttons, and the list below describes the whole line"
    >
      <g aria-hidden="true" className="pointer-events-none">
        <path d={`M8 ${ground}H${W - 8}`} className="stroke-ink-2" strokeWidth="1.2" />
        <text x="8" y={ground - 5} className="fill-ink-2 text-[10.5px]">
          Ground
        </text>

        {axis.ticks.map((t) => (
          <g key={t}>
            <path d={`M${x(t)} ${axisY}v5`} className="stroke-ink-2" strokeWidth="1" />
            <text x={x(t)} y={axisY + 17} textAnchor="middle" className="fill-ink-2 font-mono text-[10.5px]">
              {t}
            </text>
          </g>
        ))}
        <path d={`M${x(0)} ${axisY}H${x(axis.max)}`} className="stroke-ink-2" strokeWidth="1" />
        <text x={x(0) - 8} y={axisY + 17} textAnchor="end" className="fill-ink-2 text-[10.5px]">
          ft
        </text>

        {empty ? (
          <text x={W / 2} y={pipeY(0) + 4} textAnchor="middle" className="fill-ink-2 text-[12px]">
            Enter the survey end and the segments to draw the line
          </text>
        ) : null}

        {r.segments.length > 0 ? (
          <polyline points={polyline(0, Math.max(...r.segments.map((s) => s.to)))} fill="none" stroke="#3b4542" strokeWidth="12" />
        ) : lineEnd > 0 ? (
          <polyline points={polyline(0, lineEnd)} fill="none" className="stroke-rule-strong" strokeWidth="10" strokeDasharray="6 4" />
        ) : null}
        {r.segments.map((s) => (
          <polyline key={s.index} points={polyline(s.from, s.to)} fill="none" stroke={MATERIAL_COLOURS[s.material]} strokeWidth="8" />
        ))}
        {r.segments.slice(1).map((s) => (
          <path key={s.index} d={`M${x(s.from)} ${pipeY(s.from) - 6}v12`} stroke="#fff" strokeWidth="1.6" />
        ))}
        {r.segments.map((s) => {
          const text = segmentText(s);
          const room = x(s.to) - x(s.from);
          const fits = text.length * 6.1 + 8 <= room;
          const short = s.diameterIn !== null ? `${s.diameterIn}″` : "";
          return fits || short.length * 6.1 + 4 <= room ? (
            <text
              key={s.index}
              x={(x(s.from) + x(s.to)) / 2}
              y={segLabelY}
              textAnchor="middle"
              {...HALO}
              className="fill-ink text-[10.5px]"
            >
              {fits ? text : short}
            </text>
          ) : null;
        })}

        {stoppedShort && r.end !== null && x(axis.max) - x(r.end) > 12 ? (
          <g>
            <path
              d={`M${x(r.end) + 8} ${pipeY(r.end)}H${x(axis.max)}`}
              className="stroke-rule-strong"
              strokeWidth="8"
              strokeDasharray="2 5"
            />
            <text x={x(r.end) + 10} y={pipeY(r.end) - 10} className="fill-ink-2 text-[10px]">
              not seen
            </text>
          </g>
        ) : null}

        {r.end !== null ? (
          r.reason === "reached_main" ? (
            <circle cx={x(r.end) + 9} cy={pipeY(r.end)} r="9" className="fill-paper stroke-ink-2" strokeWidth="3" />
          ) : (
            <path d={`M${x(r.end)} ${pipeY(r.end) - 11}v22`} className="stroke-ink" strokeWidth="3" />
          )
        ) : null}

        {!empty ? (
          <g>
            <path d={`M${x(0)} ${ground}V${pipeY(0)}`} className="stroke-ink-2" strokeWidth="4" />
            <rect x={x(0) - 5} y={ground - 5} width="10" height="5" rx="1" className="fill-ink-2" />
            <text x={x(0) - 4} y={ground + 14} textAnchor="end" className="fill-ink text-[10.5px]">
              {r.kind ? ACCESS_SHORT[r.kind] : "Access"}
            </text>
          </g>
        ) : null}

        {r.locates.map((l, i) => {
          const top = ground + 4;
          const bottom = pipeY(l.at) - 7;
          const labelY = top + 10 + depthLanes[i] * 12;
          return (
            <g key={l.index}>
              <path d={`M${x(l.at) - 4} ${ground - 6}h8l-4 6z`} className="fill-copper" />
              <path d={`M${x(l.at)} ${top}V${bottom}`} className="stroke-copper" strokeWidth="1.2" strokeDasharray="3 2" />
              <text x={x(l.at) + 4} y={labelY} {...HALO} className="fill-copper-dark font-mono text-[10px]">
                ~{tenth(l.depthFt)} ft
              </text>
            </g>
          );
        })}

        {r.boundaryAt !== null && r.boundaryAt <= axis.max ? (
          <g>
            <path d={`M${x(r.boundaryAt)} 20V${axisY}`} className="stroke-teal" strokeWidth="1.3" strokeDasharray="5 4" />
            <text
              x={boundaryLabel.x + (boundaryLabel.anchor === "end" ? -5 : 5)}
              y="14"
              textAnchor={boundaryLabel.anchor}
              className="fill-teal text-[11px] font-medium"
            >
              Public side begins <tspan className="font-mono text-[10.5px]">{tenth(r.boundaryAt)} ft</tspan>
            </text>
          </g>
        ) : null}

        {stretches.map((s, i) => (
          <path
            key={i}
            d={`M${x(s.from)} ${stretchY - 4}v4H${x(Math.min(s.to, axis.max))}v-4`}
            fill="none"
            className="stroke-copper"
            strokeWidth="1.6"
          />
        ))}

        {r.end !== null ? (
          <text x={endLabel.x} y={endLabelY} textAnchor={endLabel.anchor} className="fill-ink text-[11px]">
            Survey ended at <tspan className="font-mono text-[10.5px]">{tenth(r.end)} ft</tspan>
            {r.reason ? `: ${SURVEY_END_LABELS[r.reason]}` : ""}
          </text>
        ) : null}
      </g>

      {drawn.map((f) => {
        const cx = chipX(f);
        const lane = lanes[r.findings.indexOf(f)];
        const chipTop = lanesTop + lane * LANE_H;
        const py = pipeY(f.at);
        const sev = SEV_CLASSES[f.grade];
        const active = f.index === highlightFindingIndex;
        const tip = `${f.label} · ${f.to !== null ? `${tenth(f.at)}–${tenth(f.to)}` : tenth(f.at)} ft · grade ${f.grade}`;
        const tipW = tip.length * 6 + 14;
        const tipX = Math.min(W - 4 - tipW, Math.max(4, cx - tipW / 2));
        return (
          <g
            key={f.index}
            data-finding-index={f.index}
            tabIndex={0}
            role="button"
            aria-label={findingText(f)}
            aria-pressed={onSelectFinding ? active : undefined}
            className="group cursor-pointer outline-none"
            onClick={onSelectFinding ? () => onSelectFinding(f.index) : undefined}
            onKeyDown={onSelectFinding ? (e) => onKey(e, f.index) : undefined}
          >
            {/* The whole column from chip to pipe takes a tap, not only the thin stem. */}
            <rect x={cx - CHIP_W / 2 - 3} y={chipTop - 3} width={CHIP_W + 6} height={Math.max(CHIP_H + 6, py - chipTop + 10)} fill="transparent" />
            <path d={`M${cx} ${chipTop + CHIP_H}V${py - 6}`} className={sev.stroke} strokeWidth={active ? 2 : 1} />
            {f.to !== null ? (
              <polyline points={polyline(f.at, f.to)} fill="none" className={sev.stroke} strokeWidth="14" strokeOpacity="0.85" />
            ) : (
              <circle cx={x(f.at)} cy={py} r="7" fill="#fff" fillOpacity="0.6" className={sev.stroke} strokeWidth="3" />
            )}
            <rect
              x={cx - CHIP_W / 2 - 3}
              y={chipTop - 3}
              width={CHIP_W + 6}
              height={CHIP_H + 6}
              rx="6"
              fill="none"
              className={clsx("stroke-ink", active ? "opacity-100" : "opacity-0 group-focus-visible:opacity-100")}
              strokeWidth="2"
            />
            <rect x={cx - CHIP_W / 2} y={chipTop} width={CHIP_W} height={CHIP_H} rx="4" className={sev.fill} />
            <text x={cx} y={chipTop + 13} textAnchor="middle" className="fill-white font-mono text-[11.5px] font-semibold">
              {f.grade}
            </text>
            <g className="pointer-events-none opacity-0 group-hover:opacity-100 group-focus:opacity-100 print:hidden" aria-hidden="true">
              <rect x={tipX} y={chipTop + CHIP_H + 5} width={tipW} height="20" rx="3" className="fill-ink" />
              <text x={tipX + 7} y={chipTop + CHIP_H + 19} className="fill-white text-[11px]">
                {tip}
              </text>
            </g>
          </g>
        );
      })}
    </svg>
  );
}

function Legend({
  segments,
  hasStretches,
  hasLocates,
  hasBoundary,
}: {
  segments: Seg[];
  hasStretches: boolean;
  hasLocates: boolean;
  hasBoundary: boolean;
}) {
  const seen = new Map<string, Seg>();
  for (const s of segments) seen.set(segmentText(s), s);
  return (
    <ul className="text-ink-2 flex flex-wrap gap-x-4 gap-y-1 text-xs" aria-hidden="true">
      {[...seen.entries()].map(([text, s]) => (
        <li key={text} className="inline-flex items-center gap-1.5">
          <span className="border-ink-2 inline-block h-2.5 w-5 rounded-[2px] border" style={{ background: MATERIAL_COLOURS[s.material] }} />
          {text}
        </li>
      ))}
      {hasLocates ? (
        <li className="inline-flex items-center gap-1.5">
          <span className="text-copper">▾</span> locate mark, depth approximate
        </li>
      ) : null}
      {hasBoundary ? (
        <li className="inline-flex items-center gap-1.5">
          <span className="border-teal inline-block h-3 border-l border-dashed" /> public side begins
        </li>
      ) : null}
      {hasStretches ? (
        <li className="inline-flex items-center gap-1.5">
          <span className="border-copper inline-block h-1.5 w-5 border-x border-b" /> needs work
        </li>
      ) : null}
      <li>Depths not to scale</li>
    </ul>
  );
}

function Description({ r, evaluation }: { r: ReturnType<typeof readRecord>; evaluation: Evaluation | null }) {
  const access = r.kind ? ACCESS_SHORT[r.kind].toLowerCase() : "access point";
  return (
    <div className="sr-only print:not-sr-only print:space-y-1 print:text-xs">
      <p>
        {r.end !== null
          ? `The camera went in at the ${access} and ran ${tenth(r.end)} ft${r.reason ? `; ${SURVEY_END_LABELS[r.reason]}` : ""}.`
          : "The survey end is not recorded yet."}
      </p>
      {r.segments.length > 0 ? (
        <p>Line profile: {r.segments.map((s) => `${tenth(s.from)} to ${tenth(s.to)} ft ${segmentText(s)}`).join("; ")}.</p>
      ) : null}
      <p>{r.boundaryAt !== null ? `The public side begins at ${tenth(r.boundaryAt)} ft.` : "Where the public side begins is not known."}</p>
      {r.locates.length > 0 ? (
        <p>
          Locate marks, depths approximate:{" "}
          {r.locates
            .map(
              (l) =>
                `${tenth(l.at)} ft, about ${tenth(l.depthFt)} ft deep${l.surface && l.surface in SURFACE_LABELS ? `, under ${SURFACE_LABELS[l.surface as Surface]}` : ""}`,
            )
            .join("; ")}
          .
        </p>
      ) : null}
      {r.findings.length > 0 ? (
        <>
          <p>Findings by footage:</p>
          <ul>
            {[...r.findings]
              .sort((a, b) => a.at - b.at)
              .map((f) => (
                <li key={f.index}>
                  Finding {f.index + 1}: {findingText(f)}
                </li>
              ))}
          </ul>
        </>
      ) : (
        <p>No findings recorded.</p>
      )}
      {evaluation && evaluation.stretches.length > 0 ? (
        <p>
          Needs work: {evaluation.stretches.map((s) => `${tenth(s.from)} to ${tenth(s.to)} ft on the ${s.side} side (${s.why})`).join("; ")}
          .
        </p>
      ) : null}
    </div>
  );
}
