import clsx from "clsx";

import { Caution } from "@/components/ui/caution";
import type { Caution as EngineCaution } from "@/lib/engine";

// Said word for word by the standing cautions block and the disclaimer.
const STANDING = new Set(["not-a-warranty"]);

/** The cautions the engine raised for this line, then the standing cautions block. */
export function ReportCautions({ cautions }: { cautions: EngineCaution[] }) {
  const ordered = [...cautions]
    .filter((c) => !STANDING.has(c.id))
    .sort((a, b) => (a.level === b.level ? 0 : a.level === "warning" ? -1 : 1));
  return (
    <div className="space-y-6">
      <ul className="space-y-2">
        {ordered.map((c) => (
          <li
            key={c.id}
            className={clsx(
              "rounded-card border px-4 py-3 text-[0.9375rem]",
              c.level === "warning" ? "bg-warning-bg border-[#ead4a4]" : "border-rule bg-white",
            )}
          >
            {c.level === "warning" ? <p className="text-warning text-xs font-semibold tracking-[0.08em] uppercase">Take care</p> : null}
            <p className="text-ink">{c.text}</p>
            {c.source ? <p className="text-ink-2 mt-1 text-xs">Source: {c.source}</p> : null}
          </li>
        ))}
      </ul>
      <Caution as="h3" />
    </div>
  );
}
