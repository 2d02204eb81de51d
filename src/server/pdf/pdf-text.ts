import "server-only";
import { execFile } from "node:child_process";
import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";

const run = promisify(execFile);

/** The text of a PDF as poppler's pdftotext reads it (tests and checks; Debian package poppler-utils). */
export async function pdfText(bytes: Uint8Array, { layout = false } = {}): Promise<string> {
  const dir = await mkdtemp(path.join(tmpdir(), "borewise-pdf-"));
  try {
    const file = path.join(dir, "in.pdf");
    await writeFile(file, bytes);
    const { stdout } = await run("pdftotext", [...(layout ? ["-layout"] : []), "-enc", "UTF-8", file, "-"], { maxBuffer: 8 * 1024 * 1024 });
    return stdout;
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

/** The embedded fonts of a PDF as pdffonts lists them. */
export async function pdfFonts(bytes: Uint8Array): Promise<string> {
  const dir = await mkdtemp(path.join(tmpdir(), "borewise-pdf-"));
  try {
    const file = path.join(dir, "in.pdf");
    await writeFile(file, bytes);
    return (await run("pdffonts", [file])).stdout;
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

/** The images of a PDF as `pdfimages -list` lists them: one row per image with its pixel size. */
export async function pdfImages(bytes: Uint8Array): Promise<Array<{ width: number; height: number }>> {
  const dir = await mkdtemp(path.join(tmpdir(), "borewise-pdf-"));
  try {
    const file = path.join(dir, "in.pdf");
    await writeFile(file, bytes);
    const { stdout } = await run("pdfimages", ["-list", file]);
    // Two header lines, then: page num type width height ...
    return stdout.split("\n").slice(2).filter((l) => l.trim()).map((l) => l.trim().split(/\s+/)).filter((cols) => cols[2] === "image")
      .map((cols) => ({ width: Number(cols[3]), height: Number(cols[4]) }));
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
