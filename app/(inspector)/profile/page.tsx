import type { Metadata } from "next";

import { PageHeader } from "@/components/ui/page-header";
import { getInspectorProfile } from "@/db/queries/inspectors";
import { requireUser } from "@/lib/auth/session";

import { ProfileForm } from "./profile-form";

export const metadata: Metadata = { title: "Profile" };

export default async function ProfilePage() {
  const user = await requireUser("inspector");
  const profile = await getInspectorProfile(user.id);
  return (
    <>
      <PageHeader
        back={{ href: "/jobs", label: "Job board" }}
        title="Your profile"
        description="Your licence, insurance, service area and working hours. Agents see your name, company and licence number on their orders."
      />
      <ProfileForm initial={profile} />
    </>
  );
}
