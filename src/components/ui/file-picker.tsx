"use client";
import { useId, useState, type DragEvent } from "react";
import { describeBytes, fileSizeText } from "@/shared/bytes";
import { acceptAttribute, fileProblem, typesText, type FileRule } from "@/shared/uploads/file-rules";

type Props = {
  label: string;
  /** The types and byte limit the server checks for this upload (src/shared/uploads/file-rules.ts). */
  rule: FileRule;
  /** The file chosen so far, shown by name and size; null when none. */
  chosen: { name: string; size: number } | null;
  /** Called with a file that passed the type and size checks; a refused one is explained here instead. */
  onChoose: (file: File) => void;
  disabled?: boolean;
  optional?: boolean;
  /** On the floor's screens: a taller target for a gloved hand. */
  large?: boolean;
  testId?: string;
};

/**
 * The one file picker: click (or Space/Enter on it) to choose, or drop a file on it. It states what it
 * takes from the same rule the server applies, and refuses a wrong type or an oversize file at once.
 */
export function FilePicker({ label, rule, chosen, onChoose, disabled = false, optional = false, large = false, testId }: Props) {
  const id = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const [over, setOver] = useState(false);
  const rules = `${typesText(rule.extensions)}, up to ${describeBytes(rule.maxBytes)}${optional ? "; optional" : ""}`;

  function take(files: FileList | null | undefined) {
    const file = files?.[0];
    if (!file) return;
    if (files.length > 1) return setProblem("Drop one file at a time.");
    const refused = fileProblem(file, rule);
    setProblem(refused);
    if (!refused) onChoose(file);
  }
  function drop(event: DragEvent<HTMLLabelElement>) {
    event.preventDefault();
    setOver(false);
    if (!disabled) take(event.dataTransfer?.files);
  }
  function dragOver(event: DragEvent<HTMLLabelElement>) {
    event.preventDefault();
    if (!disabled) setOver(true);
  }

  return (
    <div className="flex min-w-0 flex-col gap-1" data-testid={testId ? `${testId}-picker` : undefined}>
      <span id={`${id}-label`} className="font-semibold">{label}</span>
      <label
        htmlFor={id}
        onDragOver={dragOver}
        onDragEnter={dragOver}
        onDragLeave={() => setOver(false)}
        onDrop={drop}
        data-dragging={over ? "true" : undefined}
        className={`flex ${large ? "min-h-16" : "min-h-touch"} min-w-0 cursor-pointer flex-wrap items-center gap-x-3 gap-y-1 rounded-md border-2 border-dashed px-3 py-2 focus-within:outline focus-within:outline-2 focus-within:outline-offset-2 focus-within:outline-steel ${
          disabled ? "cursor-not-allowed border-rule bg-paper-sunk text-ink-faint" : over ? "border-steel bg-steel-light" : "border-rule-strong bg-white hover:bg-paper-sunk"
        }`}
      >
        <input
          id={id}
          type="file"
          className="sr-only"
          accept={acceptAttribute(rule.extensions)}
          disabled={disabled}
          aria-labelledby={`${id}-label ${id}-state`}
          aria-describedby={`${id}-rules${problem ? ` ${id}-problem` : ""}`}
          aria-invalid={problem ? true : undefined}
          onChange={(e) => { take(e.target.files); e.target.value = ""; }}
          data-testid={testId}
        />
        <span id={`${id}-state`} className="min-w-0 break-words" data-testid={testId ? `${testId}-chosen` : undefined}>
          {chosen ? <><span className="font-semibold">{chosen.name}</span> <span className="num text-ink-soft">({fileSizeText(chosen.size)})</span></> : "No file chosen"}
        </span>
        <span className={`ml-auto rounded-md border px-3 py-1 font-semibold ${disabled ? "border-rule" : "border-steel text-steel"}`} aria-hidden="true">
          {chosen ? "Choose another" : "Choose a file"}
        </span>
      </label>
      <p id={`${id}-rules`} className="text-caption text-ink-soft">{rules}. Or drop the file on the box.</p>
      {problem ? <p id={`${id}-problem`} className="text-caption text-stop" role="alert" data-testid={testId ? `${testId}-problem` : undefined}>{problem}</p> : null}
    </div>
  );
}
