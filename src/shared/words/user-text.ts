// The trade computation cites its sources inside its rule and message strings ("[V S17]", "[D]",
// "DESIGN §5.3") for the tests and the reviewers; users read the words without them (issue 17 §3).

/** A bracketed source tag: "[V S17]", "[D]", "[C, DESIGN §5.3]", "[V S17 bore-to = target − allowance; C]". */
const SOURCE_TAG = /\s*\[(?:[VDC](?:\b[^\]]*)?|DESIGN[^\]]*|trade-facts[^\]]*)\]/g;
const DESIGN_REF = /\s*(?:per |, )?DESIGN(?:\.md)? §[\d.]+/g;
const REPO_PATH = /\s*(?:See )?docs\/[\w./-]+\.?/g;

/** The text with its source tags, design references and repository paths taken out. */
export function userText(text: string): string {
  return text.replace(SOURCE_TAG, "").replace(DESIGN_REF, "").replace(REPO_PATH, "").replace(/\s+([.,;:])/g, "$1").replace(/\s{2,}/g, " ").trim();
}

/** What a user must never read: a source tag or a path into the repository. */
export const INTERNAL_TEXT = /\[(?:V S\d+|[VDC]|[VDC], [^\]]*)\]|docs\/[\w-]+\.md|DESIGN(?:\.md)? §/;
