"use client";
import { LibraryForm } from "@/components/stones/library-form";
import { restoreVersionAction } from "../actions";

/** Restoring writes a new version with its own reason; nothing in the history is overwritten. */
export function RestoreForm({ stoneId, versionId, version }: { stoneId: string; versionId: string; version: number }) {
  return (
    <LibraryForm
      action={restoreVersionAction}
      fields={[{ name: "reason", label: "Why restore it? (required)", kind: "textarea", wide: true }]}
      hidden={{ stoneId, versionId }}
      submitLabel={`Restore version ${version}`}
      testId="restore-form"
    />
  );
}
