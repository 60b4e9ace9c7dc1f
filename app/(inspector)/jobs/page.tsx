import type { Metadata } from "next";

import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { inspectorStanding } from "@/db/queries/orders";
import { requireUser } from "@/lib/auth/session";

import { JobBoard } from "./job-board";

export const metadata: Metadata = { title: "Job board" };

const DESCRIPTION = "Open sewer scopes in your service area, soonest deadline first. The first inspector to accept gets the job.";

export default async function JobBoardPage() {
  const user = await requireUser("inspector");
  const standing = await inspectorStanding(user.id);
  const profileLink = (
    <ButtonLink href="/profile" variant="secondary">
      Your profile
    </ButtonLink>
  );
  if (!standing.canTakeJobs) {
    return (
      <>
        <PageHeader title="Job board" description={DESCRIPTION} actions={profileLink} />
        <Alert tone="warning" title={standing.verified ? "Your licence has expired" : "Your account is waiting for verification"}>
          {standing.verified
            ? "Add your renewed licence to your profile; the job board opens again once an admin has checked it."
            : "An admin checks your licence and insurance before the job board opens. This usually takes one working day."}
        </Alert>
      </>
    );
  }
  return (
    <>
      <PageHeader title="Job board" description={DESCRIPTION} actions={profileLink} />
      <JobBoard />
    </>
  );
}
