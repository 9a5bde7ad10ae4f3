/**
 * The one error type of the data layer, and the aggregate that carries every
 * problem of a run. A run never stops at the first problem: a lab fixing its
 * files should see the whole list at once.
 */

/** One problem in one input file, at a 1-based line and column. */
export class AtlasInputError extends Error {
  override readonly name = "AtlasInputError";
  constructor(
    /** Path the user can open: relative to the working directory when inside it, else absolute. */
    readonly file: string,
    readonly line: number,
    readonly column: number,
    /** What is wrong. */
    message: string,
    /** What would be right; may be empty. */
    readonly hint: string = "",
  ) {
    super(message);
  }

  /** `file:line:column: what is wrong; hint` — the form editors and terminals turn into links. */
  format(): string {
    const head = `${this.file}:${this.line}:${this.column}: ${this.message}`;
    return this.hint ? `${head}; ${this.hint}` : head;
  }
}

function byPlace(a: AtlasInputError, b: AtlasInputError): number {
  if (a.file !== b.file) return a.file < b.file ? -1 : 1;
  return a.line - b.line || a.column - b.column;
}

/** Every problem found in a data folder. Thrown by loadDataFolder. */
export class InputProblems extends Error {
  override readonly name = "InputProblems";
  readonly problems: AtlasInputError[];
  constructor(problems: AtlasInputError[]) {
    const sorted = [...problems].sort(byPlace);
    super(
      `${sorted.length} problem${sorted.length === 1 ? "" : "s"} in the data folder:\n` +
        sorted.map((p) => p.format()).join("\n"),
    );
    this.problems = sorted;
  }

  /** One line per problem, sorted by file, then line, then column. */
  format(): string {
    return this.problems.map((p) => p.format()).join("\n");
  }
}

/** Where a problem is, before it becomes an AtlasInputError. */
export interface Place {
  line: number;
  column: number;
}

/** Collects problems for one file so validation can go on after each one. */
export class ProblemSink {
  readonly problems: AtlasInputError[] = [];
  constructor(readonly file: string) {}

  add(at: Place, message: string, hint = ""): void {
    this.problems.push(new AtlasInputError(this.file, at.line, at.column, message, hint));
  }

  get count(): number {
    return this.problems.length;
  }
}
