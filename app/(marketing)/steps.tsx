// The order's path from booking to payout, shared by the landing and how-it-works pages.
export const STEPS = [
  {
    title: "The agent orders",
    text: "Listing address, access notes (where the cleanout is, who lets the inspector in) and the contingency deadline. Two minutes.",
  },
  {
    title: "An inspector takes the job",
    text: "The order appears on the job board of every verified inspector who serves that postal code, soonest deadline first. The first to accept has it.",
  },
  {
    title: "The visit is set",
    text: "The inspector confirms an appointment that fits the deadline. If none can, the order is flagged at risk to the agent right away, not the day before.",
  },
  {
    title: "The line is scoped",
    text: "Camera in at the cleanout, counter zeroed, pushed to the main. Clips, the line profile, locate marks with depths and each finding at its footage.",
  },
  {
    title: "The report is delivered",
    text: "Gradeline rates the line and works out which repairs fit. The buyer gets a locked preview; the agent sees that it is ready.",
  },
  {
    title: "The buyer unlocks, the inspector is paid",
    text: "One payment opens the rated summary, the PDF and a share link. The inspector's share goes to their payout account.",
  },
] as const;

export function Steps({ headingLevel = "h3" }: { headingLevel?: "h3" | "h2" }) {
  const H = headingLevel;
  return (
    <ol className="grid gap-x-10 gap-y-8 sm:grid-cols-2 lg:grid-cols-3">
      {STEPS.map((step, i) => (
        <li key={step.title} className="border-ink border-t pt-4">
          <p className="num text-copper text-sm" aria-hidden="true">
            {String(i + 1).padStart(2, "0")}
          </p>
          <H className="mt-2 text-lg leading-snug font-semibold">
            <span className="sr-only">Step {i + 1}: </span>
            {step.title}
          </H>
          <p className="text-ink-2 mt-2 text-[0.9375rem] leading-relaxed">{step.text}</p>
        </li>
      ))}
    </ol>
  );
}
