"use client";

import { useEffect } from "react";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

export function AreaError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div className="space-y-4 py-8">
      <Alert tone="danger" title="This page could not load">
        Something went wrong on our side. Your data is safe. Try again; if it keeps happening, tell us the code {error.digest ?? "shown in the console"}.
      </Alert>
      <Button onClick={reset}>Try again</Button>
    </div>
  );
}
