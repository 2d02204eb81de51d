"use client";
import { LibraryForm } from "@/components/stones/library-form";
import { setStoneActiveAction } from "../actions";

/** Retire (or bring back) a stone set, with the reason the history keeps. */
export function ActiveForm({ stoneId, active }: { stoneId: string; active: boolean }) {
  return (
    <LibraryForm
      action={setStoneActiveAction}
      fields={[{ name: "reason", label: active ? "Why retire it? (required)" : "Why bring it back? (required)", kind: "textarea", wide: true }]}
      hidden={{ stoneId, active: active ? "false" : "true" }}
      submitLabel={active ? "Retire stone set" : "Bring back into use"}
      testId="stone-active-form"
    />
  );
}
