/**
 * Fault injection on the CLI's file handling: a full disk (a 64 KiB tmpfs when this process may mount one, and
 * an injected ENOSPC always), short writes, a write that lies about its length, a symlink or a file swapped in
 * while the command computes, a FIFO input, a device or FIFO output with --force, and two outputs where the
 * second fails. Every case must leave every input and every file that existed byte-identical, leave no
 * temporary file, and exit non-zero with one line (common practice for safe file replacement, no source: the
 * POSIX guarantees used are that open(O_CREAT|O_EXCL) and link() fail on an existing name and rename() is atomic).
 */
import { execFileSync, spawnSync } from "node:child_process";
import {
  chmodSync,
  copyFileSync,
  existsSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmdirSync,
  rmSync,
  statSync,
  symlinkSync,
  unlinkSync,
  writeFileSync,
  writeSync,
} from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { WriteHooks } from "../../src/cli/writeOutput.js";
import { oneLine, projectRoot, run, tempDir } from "./helpers.js";

const reflow = join(projectRoot, "examples/reflow-oven-trip.json");
const enclosure = join(projectRoot, "examples/heated-enclosure-adc.json");

/** Every regular file under `dir` (hidden ones included) with its bytes; other entries by their kind. */
function snapshot(dir: string): Map<string, string> {
  const files = new Map<string, string>();
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    const stats = lstatSync(path);
    files.set(name, stats.isFile() ? readFileSync(path).toString("base64") : stats.isSymbolicLink() ? "symlink" : "other");
  }
  return files;
}

/** A folder with the design as input and two precious files that must survive. */
function workspace(): { dir: string; before: Map<string, string> } {
  const dir = tempDir();
  copyFileSync(reflow, join(dir, "oven.json"));
  writeFileSync(join(dir, "report.md"), "precious report\n");
  writeFileSync(join(dir, "bands.svg"), "<svg>precious chart</svg>\n");
  return { dir, before: snapshot(dir) };
}

function expectUntouched(dir: string, before: Map<string, string>): void {
  expect(snapshot(dir)).toEqual(before);
}

const refTableArgs = ["ref-table", "K", "--from", "-270", "--to", "1372", "--step", "1", "--csv"];

describe("output writes under faults", () => {
  it("--force replaces a regular file whole and keeps its permission bits", async () => {
    const dir = tempDir();
    writeFileSync(join(dir, "e.txt"), "old\n", { mode: 0o640 });
    chmodSync(join(dir, "e.txt"), 0o640);
    const result = await run(["emf", "K", "500", "--out", "e.txt", "--force"], dir);
    expect(result.code).toBe(0);
    expect(result.stderr).toBe("hotjunction: wrote e.txt\n");
    expect(readFileSync(join(dir, "e.txt"), "utf8")).toBe("type K at 500 °C, cold junction 0 °C: 20.644 mV\n");
    expect(statSync(join(dir, "e.txt")).mode & 0o777).toBe(0o640);
    expect(readdirSync(dir)).toEqual(["e.txt"]);
  });

  it("short writes are completed by the write loop (5 bytes per call): the file is whole", async () => {
    const dir = tempDir();
    const plain = await run([...refTableArgs, "--out", "plain.csv"], dir);
    expect(plain.code).toBe(0);
    let calls = 0;
    const hooks: WriteHooks = {
      write: (fd, buffer, offset, length) => {
        calls++;
        return writeSync(fd, buffer, offset, Math.min(5, length));
      },
    };
    const chopped = await run([...refTableArgs, "--out", "chopped.csv"], dir, hooks);
    expect(chopped.code).toBe(0);
    expect(readFileSync(join(dir, "chopped.csv"), "utf8")).toBe(readFileSync(join(dir, "plain.csv"), "utf8"));
    expect(calls).toBe(Math.ceil(statSync(join(dir, "plain.csv")).size / 5));
    expect(readdirSync(dir).sort()).toEqual(["chopped.csv", "plain.csv"]);
  });

  it("a write that stops taking bytes, one that lies about its length, and an injected ENOSPC: exit 1, nothing changed", async () => {
    const stall: WriteHooks = { write: (fd, buffer, offset, length) => (offset >= 100 ? 0 : writeSync(fd, buffer, offset, Math.min(100 - offset, length))) };
    const lie: WriteHooks = { write: (fd, buffer, offset, length) => (writeSync(fd, buffer, offset, Math.ceil(length / 2)), length) };
    const full: WriteHooks = {
      write: (fd, buffer, offset, length) => {
        if (offset > 0) throw Object.assign(new Error("ENOSPC: no space left on device, write"), { code: "ENOSPC" });
        return writeSync(fd, buffer, offset, Math.min(512, length));
      },
    };
    const cases: [WriteHooks, RegExp][] = [
      [stall, /^hotjunction: cannot write report\.md: the device took no more bytes after 100 of \d+; nothing was written$/],
      [lie, /^hotjunction: cannot write report\.md: \d+ bytes reached the disk of \d+; nothing was written$/],
      [full, /^hotjunction: cannot write report\.md: no space left on the device \(ENOSPC\); nothing was written$/],
    ];
    for (const [hooks, message] of cases) {
      const { dir, before } = workspace();
      const result = await run(["check", "oven.json", "--out", "report.md", "--force", "--trials", "200"], dir, hooks);
      expect(result.code).toBe(1);
      expect(oneLine(result.stderr)).toMatch(message);
      expect(result.stdout).toBe("");
      expectUntouched(dir, before);
      // A new file is not left half-written either.
      const fresh = await run(["check", "oven.json", "--out", "new.md", "--trials", "200"], dir, hooks);
      expect(fresh.code).toBe(1);
      oneLine(fresh.stderr);
      expectUntouched(dir, before);
    }
  });

  it("a symlink to the input swapped in while the command computes is refused (with and without --force)", async () => {
    const { dir, before } = workspace();
    const input = join(dir, "oven.json");
    // The output did not exist when the command started; a link to the input appears before the write.
    const planted: WriteHooks = { beforeCommit: () => symlinkSync(input, join(dir, "late.md")) };
    const result = await run(["check", "oven.json", "--out", "late.md", "--trials", "200"], dir, planted);
    expect(result.code).toBe(2);
    expect(oneLine(result.stderr)).toBe(
      "hotjunction: refusing to write late.md: it became the input file oven.json while the command ran; nothing was written",
    );
    unlinkSync(join(dir, "late.md"));
    expectUntouched(dir, before);
    // With --force, an existing report replaced by a link to the input meanwhile.
    const swapped: WriteHooks = {
      beforeCommit: () => {
        unlinkSync(join(dir, "report.md"));
        symlinkSync(input, join(dir, "report.md"));
      },
    };
    const forced = await run(["check", "oven.json", "--out", "report.md", "--force", "--trials", "200"], dir, swapped);
    expect(forced.code).toBe(2);
    expect(oneLine(forced.stderr)).toBe(
      "hotjunction: refusing to write report.md: it became the input file oven.json while the command ran; nothing was written",
    );
    expect(readFileSync(input).toString("base64")).toBe(before.get("oven.json"));
    expect(lstatSync(join(dir, "report.md")).isSymbolicLink()).toBe(true);
    expect(readdirSync(dir).sort()).toEqual(["bands.svg", "oven.json", "report.md"]);
  });

  it("a file created meanwhile is never overwritten without --force, even in the last instant (link refuses)", async () => {
    for (const stage of ["beforeCommit", "afterVerify"] as const) {
      const { dir } = workspace();
      const hooks: WriteHooks = { [stage]: () => writeFileSync(join(dir, "late.md"), "someone else's file\n") };
      const result = await run(["check", "oven.json", "--out", "late.md", "--trials", "200"], dir, hooks);
      expect(result.code, stage).toBe(2);
      expect(oneLine(result.stderr)).toMatch(/^hotjunction: refusing to overwrite late\.md: it was created while the command ran; nothing was written/);
      expect(readFileSync(join(dir, "late.md"), "utf8")).toBe("someone else's file\n");
      expect(readdirSync(dir).sort()).toEqual(["bands.svg", "late.md", "oven.json", "report.md"]);
    }
  });

  it("two outputs where the second fails: nothing is written, the first is rolled back", async () => {
    // (a) The second output's write fails (injected ENOSPC on the second file only): the first stays unwritten.
    {
      const { dir, before } = workspace();
      let files = 0;
      const hooks: WriteHooks = {
        write: (fd, buffer, offset, length) => {
          // Each file is written from offset 0 (descriptor numbers are reused, so count starts instead).
          if (offset === 0) files++;
          if (files === 2) throw Object.assign(new Error("no space"), { code: "ENOSPC" });
          return writeSync(fd, buffer, offset, length);
        },
      };
      const result = await run(["check", "oven.json", "--out", "new.md", "--svg", "new.svg", "--trials", "200"], dir, hooks);
      expect(result.code).toBe(1);
      expect(oneLine(result.stderr)).toBe("hotjunction: cannot write new.svg: no space left on the device (ENOSPC); nothing was written");
      expectUntouched(dir, before);
    }
    // (b) The second target turns into a directory after the checks: the first, already replaced, comes back.
    {
      const { dir, before } = workspace();
      const hooks: WriteHooks = {
        afterVerify: () => {
          unlinkSync(join(dir, "bands.svg"));
          mkdirSync(join(dir, "bands.svg"));
        },
      };
      const result = await run(["check", "oven.json", "--out", "report.md", "--svg", "bands.svg", "--force", "--trials", "200"], dir, hooks);
      expect(result.code).toBe(1);
      oneLine(result.stderr);
      expect(readFileSync(join(dir, "report.md")).toString("base64")).toBe(before.get("report.md"));
      expect(readFileSync(join(dir, "oven.json")).toString("base64")).toBe(before.get("oven.json"));
      rmdirSync(join(dir, "bands.svg"));
      expect(readdirSync(dir).sort()).toEqual(["oven.json", "report.md"]);
    }
    // (c) Without --force, the second name is taken in the last instant: the first, already linked, is removed.
    {
      const { dir, before } = workspace();
      const hooks: WriteHooks = { afterVerify: () => writeFileSync(join(dir, "second.svg"), "taken\n") };
      const result = await run(["check", "oven.json", "--out", "first.md", "--svg", "second.svg", "--trials", "200"], dir, hooks);
      expect(result.code).toBe(2);
      oneLine(result.stderr);
      expect(existsSync(join(dir, "first.md"))).toBe(false);
      expect(readFileSync(join(dir, "second.svg"), "utf8")).toBe("taken\n");
      unlinkSync(join(dir, "second.svg"));
      expectUntouched(dir, before);
    }
  });

  it("a FIFO as input is refused at once (exit 1), as design file and as --extra-faults", async () => {
    const dir = tempDir();
    execFileSync("mkfifo", [join(dir, "pipe.json")]);
    copyFileSync(enclosure, join(dir, "enclosure.json"));
    const before = snapshot(dir);
    for (const args of [
      ["check", "pipe.json"],
      ["validate", "pipe.json"],
      ["faults", "enclosure.json", "--extra-faults", "pipe.json"],
    ]) {
      const result = await run(args, dir);
      expect(result.code, args.join(" ")).toBe(1);
      expect(oneLine(result.stderr)).toBe("hotjunction: pipe.json: cannot read: it is a FIFO, not a regular file");
    }
    const device = await run(["validate", "/dev/null"], dir);
    expect(device.code).toBe(1);
    expect(oneLine(device.stderr)).toBe("hotjunction: /dev/null: cannot read: it is a character device, not a regular file");
    expect(lstatSync(join(dir, "pipe.json")).isFIFO()).toBe(true);
    expect(snapshot(dir)).toEqual(before);
  });

  it("a device or a FIFO as output is refused even with --force, and stays what it was", async () => {
    const dir = tempDir();
    execFileSync("mkfifo", [join(dir, "out.fifo")]);
    for (const out of ["/dev/null", join(dir, "out.fifo")]) {
      for (const flag of ["--out", "--svg"]) {
        const args = flag === "--out" ? ["emf", "K", "500", "--out", out, "--force"] : ["check", reflow, "--svg", out, "--force", "--trials", "200"];
        const result = await run(args, dir);
        expect(result.code, `${flag} ${out}`).toBe(2);
        const kind = out === "/dev/null" ? "a character device" : "a FIFO";
        expect(oneLine(result.stderr)).toBe(`hotjunction: refusing to write ${out}: it is ${kind}, not a regular file`);
      }
    }
    expect(statSync("/dev/null").isCharacterDevice()).toBe(true);
    expect(lstatSync(join(dir, "out.fifo")).isFIFO()).toBe(true);
    // The same at write time: a FIFO swapped in for the output while the command computes.
    writeFileSync(join(dir, "late.txt"), "old\n");
    const swap: WriteHooks = {
      beforeCommit: () => {
        unlinkSync(join(dir, "late.txt"));
        execFileSync("mkfifo", [join(dir, "late.txt")]);
      },
    };
    const late = await run(["emf", "K", "500", "--out", "late.txt", "--force"], dir, swap);
    expect(late.code).toBe(2);
    expect(oneLine(late.stderr)).toBe("hotjunction: refusing to write late.txt: it became a FIFO while the command ran; nothing was written");
    expect(lstatSync(join(dir, "late.txt")).isFIFO()).toBe(true);
    expect(readdirSync(dir).sort()).toEqual(["late.txt", "out.fifo"]);
  });
});

/** Mounts a 64 KiB tmpfs when allowed (root on Linux); undefined otherwise. */
function mountTinyTmpfs(): string | undefined {
  if (process.platform !== "linux" || process.getuid?.() !== 0) return undefined;
  const dir = mkdtempSync(join(tmpdir(), "hotjunction-full-"));
  const result = spawnSync("mount", ["-t", "tmpfs", "-o", "size=64k", "tmpfs", dir], { encoding: "utf8" });
  if (result.status !== 0) {
    rmdirSync(dir);
    return undefined;
  }
  return dir;
}

const fullDisk = mountTinyTmpfs();

describe.skipIf(fullDisk === undefined)("a real full disk (64 KiB tmpfs; skipped where this process may not mount one)", () => {
  const dir = fullDisk as string;
  let before: Map<string, string>;
  let normal: string;

  beforeAll(() => {
    copyFileSync(reflow, join(dir, "oven.json"));
    writeFileSync(join(dir, "old.csv"), "precious table\n");
    // Fill what is left with a filler file until the file system refuses.
    const chunk = Buffer.alloc(1024, 120);
    let n = 0;
    for (;;) {
      try {
        writeFileSync(join(dir, `filler-${n++}`), chunk);
      } catch {
        break;
      }
    }
    before = snapshot(dir);
    normal = tempDir();
  });

  afterAll(() => {
    spawnSync("umount", [dir]);
    rmSync(dir, { recursive: true, force: true });
  });

  it("replacing a file, writing a new one, and a second output on the full disk: exit 1, every file as it was", async () => {
    const replace = await run([...refTableArgs, "--out", "old.csv", "--force"], dir);
    expect(replace.code).toBe(1);
    expect(oneLine(replace.stderr)).toMatch(/^hotjunction: cannot write old\.csv: no space left on the device \(ENOSPC\); nothing was written$/);
    const fresh = await run([...refTableArgs, "--out", "new.csv"], dir);
    expect(fresh.code).toBe(1);
    oneLine(fresh.stderr);
    // First output on a healthy disk, second on the full one: neither is written.
    const pair = await run(["check", join(dir, "oven.json"), "--out", join(normal, "r.md"), "--svg", join(dir, "b.svg"), "--trials", "200"], normal);
    expect(pair.code).toBe(1);
    oneLine(pair.stderr);
    expect(readdirSync(normal)).toEqual([]);
    expect(snapshot(dir)).toEqual(before);
  });
});
