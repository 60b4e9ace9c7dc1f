"use client";

import { useCallback, useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import { FormProvider, useForm, useWatch } from "react-hook-form";

import { LineDiagramInteractive } from "@/components/line-diagram-interactive";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";

import { AccessEditor } from "./access-editor";
import { BoundaryEditor } from "./boundary-editor";
import { ClipsSection, secondsText, type ClipMoment } from "./clips-section";
import { emptyFinding, fromRecord, localProblems, parseNumber, toRecord, type WorkspaceForm } from "./draft-record";
import { FindingsEditor, proposalKey, type FootageProposal } from "./findings-editor";
import { LiveCheckPanel } from "./live-check-panel";
import { LocatesEditor } from "./locates-editor";
import { NarrativeEditor } from "./narrative-editor";
import { focusTargets, listProblems, problemMessage, sectionOf, SECTIONS, valueAt, type SectionId } from "./problem-fields";
import { ReviewSubmit } from "./review-submit";
import { SaveBar, useScrollPadding } from "./save-bar";
import { Section, type SectionStatus } from "./section";
import { firstOpen, sectionStatus, sectionSummary } from "./section-state";
import { SegmentsEditor } from "./segments-editor";
import { uploadStill } from "./still-frame";
import { SurveyEndEditor } from "./survey-end-editor";
import { useClips } from "./use-clips";
import { CONFLICT_MESSAGE, useDraft } from "./use-draft";
import { useEvaluation } from "./use-evaluation";
import { WorkspaceContext } from "./workspace-context";

export type WorkspaceJob = { id: string; accessNotes: string; cleanoutNote: string | null };
export type WorkspaceInitial = { record: Record<string, unknown>; narrative: string; recommendation: string; revision: number };

type Errors = Record<string, string[]>;

function merge(...maps: Errors[]): Errors {
  const out: Errors = {};
  for (const m of maps)
    for (const [k, v] of Object.entries(m)) out[k] = [...(out[k] ?? []), ...v.filter((x) => !(out[k] ?? []).includes(x))];
  return out;
}

const payloadKeyOf = (form: WorkspaceForm) => JSON.stringify([toRecord(form), form.narrative, form.recommendation]);

export function Workspace({ job, initial }: { job: WorkspaceJob; initial: WorkspaceInitial }) {
  const [defaults] = useState(() => fromRecord(initial.record, initial.narrative, initial.recommendation));
  const [initialKey] = useState(() => payloadKeyOf(defaults));
  const methods = useForm<WorkspaceForm>({ defaultValues: defaults });
  // useWatch re-renders on every change; getValues gives the whole form, fully typed.
  useWatch({ control: methods.control });
  const values = methods.getValues();
  const record = toRecord(values);
  const recordJson = JSON.stringify(record);
  const payloadKey = JSON.stringify([record, values.narrative, values.recommendation]);

  const draft = useDraft({ jobId: job.id, initialRevision: initial.revision, initialKey });
  const { schedule } = draft;
  useEffect(() => {
    schedule(
      { record: JSON.parse(recordJson) as Record<string, unknown>, narrative: values.narrative, recommendation: values.recommendation },
      payloadKey,
    );
  }, [schedule, payloadKey, recordJson, values.narrative, values.recommendation]);

  const check = useEvaluation(recordJson);
  const clips = useClips(job.id);

  const [open, setOpen] = useState<Set<SectionId>>(() => new Set([firstOpen(defaults)]));
  const [revealAll, setRevealAll] = useState(false);
  const [activeFinding, setActiveFinding] = useState<number | null>(null);
  const [proposals, setProposals] = useState<Map<string, FootageProposal>>(() => new Map());
  const [notice, setNotice] = useState<string | null>(null);
  const [submitting, setSubmitting] = useState(false);
  const [submitError, setSubmitError] = useState<string | null>(null);
  const [submitResult, setSubmitResult] = useState<{ key: string; fieldErrors: Errors } | null>(null);
  const [delivered, setDelivered] = useState(false);
  const deliveredRef = useRef<HTMLDivElement>(null);
  const barRef = useRef<HTMLDivElement>(null);
  useScrollPadding(barRef);

  const engineErrors = check.result?.kind === "problems" ? check.result.fieldErrors : {};
  const liveErrors = merge(engineErrors, localProblems(values));
  const preSubmit: Errors = {};
  if (!clips.error && !clips.isLoading && clips.ready.length === 0) preSubmit.clips = ["Upload at least one ready clip of the line."];
  if (values.narrative.trim().length < 20) preSubmit.narrative = ["Write your summary for the buyer (a few sentences)."];
  const serverErrors = submitResult && submitResult.key === payloadKey ? submitResult.fieldErrors : {};
  const allErrors = merge(liveErrors, preSubmit, serverErrors);
  const liveList = listProblems(liveErrors, values);
  const reviewList = listProblems(allErrors, values);

  const shown = (path: string) => revealAll || (valueAt(values, path) ?? "") !== "";
  const errorFor = (path: string) => {
    const messages = (revealAll ? allErrors : merge(liveErrors, serverErrors))[path];
    if (!messages || !shown(path)) return undefined;
    return problemMessage(path, messages[0], values);
  };

  const goTo = useCallback((path: string) => {
    setOpen((s) => new Set(s).add(sectionOf(path)));
    requestAnimationFrame(() =>
      requestAnimationFrame(() => {
        for (const id of focusTargets(path)) {
          const el = document.getElementById(id);
          if (el && el.getClientRects().length > 0) {
            el.scrollIntoView({ block: "center" });
            el.focus({ preventScroll: true });
            return;
          }
        }
      }),
    );
  }, []);

  const toggle = (id: SectionId) =>
    setOpen((s) => {
      const n = new Set(s);
      if (n.has(id)) n.delete(id);
      else n.add(id);
      return n;
    });

  const openOnly = (id: SectionId) => {
    setOpen(new Set([id]));
    if (id === "review") setRevealAll(true);
    requestAnimationFrame(() => {
      const el = document.getElementById(`section-${id}`);
      el?.scrollIntoView({ block: "start" });
      el?.focus({ preventScroll: true });
    });
  };

  function addFromClip(m: ClipMoment) {
    const second = String(m.second);
    const finding = { ...emptyFinding(), at: m.footage.toFixed(1), clipId: m.clip.id, second };
    const index = methods.getValues("findings").length;
    methods.setValue("findings", [...methods.getValues("findings"), finding], { shouldDirty: true });
    const start =
      m.clip.startFootage !== null ? `${m.clip.startFootage.toFixed(1)} ft at the clip's start` : "0 ft (the clip has no start footage)";
    const stillText = m.still ? "A still frame is being attached." : "No still frame: the browser could not take one from this clip.";
    setProposals((p) =>
      new Map(p).set(proposalKey(m.clip.id, second), {
        text: `${m.clip.label} at ${secondsText(m.second)}: ${start} + ${m.second.toFixed(1)} s × ${m.speed} ft/s = ${m.footage.toFixed(1)} ft. Check it against the counter on the video and correct it if they differ. ${stillText}`,
      }),
    );
    goTo(`findings[${index}].type`);
    setActiveFinding(index);
    if (!m.still) return;
    uploadStill(job.id, m.still, m.clip.id, m.second)
      .then((stillId) => {
        // The finding may have moved if others were removed meanwhile; never attach to one that has a still.
        const list = methods.getValues("findings");
        const same = (f: (typeof list)[number] | undefined) => f?.clipId === m.clip.id && f.second === second && !f.stillId;
        const i = same(list[index]) ? index : list.findLastIndex(same);
        if (i >= 0) methods.setValue(`findings.${i}.stillId`, stillId, { shouldDirty: true });
      })
      .catch(() => setNotice("The still frame could not be stored. The finding keeps the clip and the second."));
  }

  async function submit() {
    setRevealAll(true);
    setSubmitError(null);
    if (Object.keys(localProblems(values)).length > 0) {
      setSubmitError("Fix the problems listed above first.");
      document.getElementById("review-problems")?.focus();
      return;
    }
    setSubmitting(true);
    const key = payloadKey;
    const saved = await draft.flush();
    if (!saved) {
      setSubmitting(false);
      setSubmitError(
        draft.state.kind === "conflict" ? CONFLICT_MESSAGE : "The latest changes are not saved yet, so nothing was submitted. Try again.",
      );
      return;
    }
    try {
      const res = await fetch(`/api/jobs/${job.id}/submit`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ baseRevision: draft.revision() }),
      });
      const body = (await res.json().catch(() => null)) as { error?: { message?: string; fieldErrors?: Errors } } | null;
      if (res.ok) {
        setDelivered(true);
        return;
      }
      if (res.status === 400 && body?.error?.fieldErrors) {
        setSubmitResult({ key, fieldErrors: body.error.fieldErrors });
        setSubmitError(body.error.message ?? "The record has problems to fix.");
        requestAnimationFrame(() => document.getElementById("review-problems")?.focus());
      } else {
        setSubmitError(res.status === 409 ? CONFLICT_MESSAGE : (body?.error?.message ?? "The report could not be submitted. Try again."));
      }
    } catch {
      setSubmitError("Gradeline could not be reached. Nothing was submitted; try again.");
    } finally {
      setSubmitting(false);
    }
  }

  useEffect(() => {
    if (delivered) deliveredRef.current?.focus();
  }, [delivered]);

  const context = useMemo(
    () => ({ errorFor, readyClips: clips.ready, setActiveFinding }),
    // errorFor reads this render's values; a fresh context each render is what the editors need.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [payloadKey, revealAll, check, submitResult, clips.ready],
  );

  if (delivered) {
    return (
      <div ref={deliveredRef} tabIndex={-1} className="max-w-2xl space-y-4 outline-none">
        <Alert tone="success" title="Delivered — the buyer has been invited">
          The report is in. The buyer can now unlock the rated summary, and the agent has been told.
        </Alert>
        <ButtonLink href={`/jobs/${job.id}`} size="lg">
          Back to the job
        </ButtonLink>
      </div>
    );
  }

  const evaluation = check.result?.kind === "ok" ? check.result.evaluation : null;
  const statusOf = (id: SectionId): SectionStatus => sectionStatus(id, values, allErrors, shown, clips.ready.length);
  const summaryOf = (id: SectionId) => sectionSummary(id, values, clips.ready.length);
  const nextOf = (i: number) => {
    const next = SECTIONS[i + 1];
    return next ? { label: next.title, onClick: () => openOnly(next.id) } : undefined;
  };
  const bodies: Record<SectionId, ReactNode> = {
    clips: <ClipsSection jobId={job.id} clips={clips.clips} error={clips.error} onReload={clips.reload} onAddFinding={addFromClip} />,
    access: (
      <>
        {job.accessNotes || job.cleanoutNote ? (
          <div className="bg-paper-2 rounded-md px-3 py-2 text-sm">
            <p className="text-ink-2 font-medium">From the order</p>
            {job.accessNotes ? <p>{job.accessNotes}</p> : null}
            {job.cleanoutNote ? <p>Cleanout: {job.cleanoutNote}</p> : null}
          </div>
        ) : null}
        <AccessEditor />
      </>
    ),
    profile: (
      <>
        <SurveyEndEditor />
        <hr />
        <SegmentsEditor />
      </>
    ),
    locates: <LocatesEditor />,
    boundary: <BoundaryEditor />,
    findings: <FindingsEditor proposals={proposals} />,
    narrative: <NarrativeEditor />,
    review: (
      <ReviewSubmit
        counts={{
          readyClips: clips.ready.length,
          segments: values.segments.length,
          surveyedFt: parseNumber(values.surveyEnd.at) ?? null,
          locates: values.locates.length,
          findings: values.findings.length,
        }}
        problems={reviewList}
        evaluation={evaluation}
        onGo={goTo}
        onSubmit={submit}
        submitting={submitting}
        submitError={submitError}
      />
    ),
  };

  return (
    <FormProvider {...methods}>
      <WorkspaceContext.Provider value={context}>
        <form
          onSubmit={(e) => e.preventDefault()}
          noValidate
          className="grid grid-cols-[minmax(0,1fr)] gap-4 pb-32 lg:grid-cols-[minmax(0,1fr)_31rem] lg:items-start"
        >
          <aside
            aria-label="Line diagram and live check"
            className="min-w-0 lg:sticky lg:top-4 lg:order-2 lg:max-h-[calc(100dvh-6.5rem)] lg:overflow-y-auto"
          >
            <Card className="px-4 pt-3 pb-2 max-sm:-mx-4 max-sm:rounded-none max-sm:border-x-0">
              <h2 className="text-ink-2 font-sans text-sm font-semibold tracking-[0.08em] uppercase">Line diagram</h2>
              <LineDiagramInteractive
                compact
                record={record}
                evaluation={evaluation}
                selectedFindingIndex={activeFinding}
                onSelectFinding={(i) => {
                  setActiveFinding(i);
                  goTo(`findings[${i}].at`);
                }}
              />
              <LiveCheckPanel check={check} problems={liveList} onGo={goTo} />
            </Card>
          </aside>

          <div className="min-w-0 space-y-3 lg:order-1">
            {notice ? (
              <Alert tone="warning" role="status">
                {notice}
              </Alert>
            ) : null}
            {SECTIONS.map((s, i) => (
              <Section
                key={s.id}
                id={s.id}
                step={i + 1}
                title={s.title}
                summary={summaryOf(s.id)}
                status={statusOf(s.id)}
                open={open.has(s.id)}
                onToggle={() => {
                  toggle(s.id);
                  if (s.id === "review") setRevealAll(true);
                }}
                next={nextOf(i)}
              >
                {bodies[s.id]}
              </Section>
            ))}
          </div>
        </form>
        <SaveBar
          barRef={barRef}
          state={draft.state}
          everSaved={initial.revision > 0}
          onRetry={() => void draft.retry()}
          action={
            open.has("review") && open.size === 1
              ? { label: "Submit and deliver", onClick: submit, pending: submitting }
              : { label: "Review and submit", onClick: () => openOnly("review") }
          }
        />
      </WorkspaceContext.Provider>
    </FormProvider>
  );
}
