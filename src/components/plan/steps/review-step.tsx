import { Cautions } from "../cautions";
import { IssuesList } from "../issues-list";
import type { Options, StepProps } from "./types";

/** Step 5: every warning with its numbers and the cautions; saving happens in the wizard's buttons. */
export function ReviewStep<D extends Options>({ preview, units, stoneName }: StepProps<D>) {
  return (
    <>
      {preview ? (
        <p className={preview.canRelease ? "text-pass" : "text-stop"} data-testid="review-verdict">
          {preview.canRelease ? "No errors: this plan can be released once saved." : `${preview.errorCount} error(s) to resolve before release; a draft can still be saved.`}
        </p>
      ) : null}
      <h3 className="font-semibold">Warnings and errors</h3>
      <IssuesList cylinders={preview?.cylinders ?? []} units={units} stoneName={stoneName} emptyText="No warnings." />
      <Cautions />
    </>
  );
}
