/**
 * A form for every field of the design-file format, generated from the design file's JSON Schema
 * (`designJsonSchema()` of `hotjunction/design`), so a field added to the format appears here without a change.
 * The form edits a draft JSON value that may be invalid (a number field holding "abc" keeps the text, so the
 * library's validation names it); it never validates by itself.
 * @module
 */

/** A JSON Schema node (the subset the design schema uses). */
export type SchemaNode = Readonly<Record<string, unknown>>;
/** A path into the draft, as zod reports it. */
export type DraftPath = readonly (string | number)[];

/** What the form asks of its owner. */
export interface FormHost {
  /** The current draft (a JSON value, possibly invalid). */
  readonly draft: () => unknown;
  /** Sets the value at a path (undefined removes the key). `structural` edits re-render the form. */
  readonly set: (path: DraftPath, value: unknown, structural: boolean) => void;
}

// Deliberately alike: src/design/scanJson.ts `_formatPath` is the same format; the page imports the library only
// through its public entries, and the path format is an internal detail of the messages.
/** Formats a path as the design file's messages do (`setpoints[1].tripTemperatureC`). */
export function formatPath(path: DraftPath): string {
  let text = "";
  for (const part of path) {
    if (typeof part === "number") text += `[${part}]`;
    else if (/^[A-Za-z_$][\w$]*$/.test(part)) text += text.length === 0 ? part : `.${part}`;
    else text += `[${JSON.stringify(part.length > 40 ? `${part.slice(0, 37)}...` : part)}]`;
  }
  return text;
}

const unitSuffixes: readonly (readonly [RegExp, string])[] = [
  [/PpmPer1000h$/, "ppm/1000 h"],
  [/PpmPerVolt$/, "ppm/V"],
  [/PpmPerMilliamp$/, "ppm/mA"],
  [/PpmPerC$/, "ppm/°C"],
  [/Ppm$/, "ppm"],
  [/MicrovoltsPerC$/, "µV/°C"],
  [/MillivoltsPerC$/, "mV/°C"],
  [/CPerS$/, "°C/s"],
  [/WattsPerC$/, "W/°C"],
  [/JoulesPerC$/, "J/°C"],
  [/Microvolts$/, "µV"],
  [/Millivolts$/, "mV"],
  [/Volts$/, "V"],
  [/Milliamps$/, "mA"],
  [/Nanoamps$/, "nA"],
  [/Ohms$/, "Ω"],
  [/Hours$/, "h"],
  [/Watts$/, "W"],
  [/Hz$/, "Hz"],
  [/Ms$/, "ms"],
  [/Seconds$/, "s"],
  [/Lsb$/, "LSB"],
  [/Fraction$/, "± fraction"],
  [/(?<=[a-z])C$/, "°C"],
  [/(?<=[a-z])S$/, "s"],
  [/(?<=[a-z])h$/, "h"],
];

/** The unit of a key, from its name (units are in every key) or the end of its description. */
export function unitOfKey(key: string, description: string | undefined): string | undefined {
  for (const [pattern, unit] of unitSuffixes) if (pattern.test(key)) return unit;
  if (description !== undefined) {
    const tail = description.split(", ").pop();
    if (tail !== undefined && tail !== description && tail.length <= 12 && /^[±\s]*(°C|V|mV|µV|Ω|mA|h|s|ms|%|ppm[^\s]*)$/.test(tail)) return tail.trim();
  }
  return undefined;
}

/** "tripTemperatureC" → "Trip temperature". */
export function labelOfKey(key: string): string {
  let stem = key;
  for (const [pattern] of unitSuffixes) {
    if (pattern.test(stem)) {
      const shorter = stem.replace(pattern, "");
      if (shorter.length > 0) stem = shorter;
      break;
    }
  }
  const words = stem
    .replace(/^\$/, "")
    .replace(/([a-z0-9])([A-Z])/g, "$1 $2")
    .replace(/([A-Z]+)([A-Z][a-z])/g, "$1 $2")
    .toLowerCase();
  const text = words.replace(/\b(adc|rss|lsb|inl|cj|iec|astm)\b/g, (w) => w.toUpperCase());
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function singular(label: string): string {
  if (/ies$/.test(label)) return label.replace(/ies$/, "y");
  if (/s$/.test(label)) return label.replace(/s$/, "");
  return label;
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function props(schema: SchemaNode): Record<string, SchemaNode> {
  return (schema["properties"] as Record<string, SchemaNode> | undefined) ?? {};
}

function required(schema: SchemaNode): readonly string[] {
  return (schema["required"] as string[] | undefined) ?? [];
}

/** The key whose `const` tells the variants of a oneOf apart, or undefined. */
function discriminatorOf(variants: readonly SchemaNode[]): string | undefined {
  const first = variants[0];
  if (first === undefined || first["type"] !== "object") return undefined;
  for (const key of Object.keys(props(first))) {
    if (variants.every((v) => v["type"] === "object" && props(v)[key]?.["const"] !== undefined)) return key;
  }
  return undefined;
}

/** A starting value for a new item or section: its required parts, constants and first choices. */
export function defaultValue(schema: SchemaNode): unknown {
  if (schema["const"] !== undefined) return schema["const"];
  const variants = schema["oneOf"] as SchemaNode[] | undefined;
  if (variants !== undefined && variants[0] !== undefined) return defaultValue(variants[0]);
  const any = schema["anyOf"] as SchemaNode[] | undefined;
  if (any !== undefined && any[0] !== undefined) return defaultValue(any[0]);
  const enumeration = schema["enum"] as unknown[] | undefined;
  if (enumeration !== undefined) return enumeration[0];
  switch (schema["type"]) {
    case "object": {
      const out: Record<string, unknown> = {};
      for (const key of required(schema)) {
        const v = defaultValue(props(schema)[key] ?? {});
        if (v !== undefined) out[key] = v;
      }
      return out;
    }
    case "array":
      return [];
    case "string":
      return schema["minLength"] !== undefined ? "new" : "";
    case "boolean":
      return false;
    default:
      return undefined;
  }
}

/** Value at a path of the draft. */
export function valueAt(root: unknown, path: DraftPath): unknown {
  let current = root;
  for (const part of path) {
    if (current === null || typeof current !== "object") return undefined;
    current = (current as Record<string | number, unknown>)[part];
  }
  return current;
}

/** Reads a number field: empty → absent, a finite number → the number, anything else stays text for validation to name. */
export function readNumberText(text: string): unknown {
  const trimmed = text.trim();
  if (trimmed === "") return undefined;
  const n = Number(trimmed);
  return Number.isFinite(n) && /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(trimmed) ? n : trimmed;
}

function el<K extends keyof HTMLElementTagNameMap>(tag: K, attrs: Record<string, string> = {}, text?: string): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, v);
  if (text !== undefined) node.textContent = text;
  return node;
}

/** The enclosing path of a formatted path ("a.b[2]" → "a.b", "a" → ""). */
export function parentPath(path: string): string {
  const cut = path.replace(/(\.[^.[\]]+|\[[^\]]*\])$/, "");
  return cut === path ? "" : cut;
}

function idOf(path: DraftPath): string {
  return `hj-f-${formatPath(path).replace(/[^A-Za-z0-9_-]/g, "_")}`;
}

/** The generated form. */
export class DesignForm {
  private readonly messageSlots = new Map<string, HTMLElement>();
  private readonly fieldsByPath = new Map<string, HTMLElement>();
  private readonly topSlot: HTMLElement;

  constructor(
    private readonly container: HTMLElement,
    private readonly schema: SchemaNode,
    private readonly host: FormHost,
    topSlot: HTMLElement,
  ) {
    this.topSlot = topSlot;
  }

  /** Renders the whole form from the draft, keeping focus on the same field when it still exists. */
  render(): void {
    const focusedId = document.activeElement instanceof HTMLElement ? document.activeElement.id : "";
    this.messageSlots.clear();
    this.fieldsByPath.clear();
    this.container.replaceChildren();
    const root = this.host.draft();
    this.renderObjectBody(this.schema, [], isObject(root) ? root : {}, this.container);
    if (focusedId !== "") document.getElementById(focusedId)?.focus();
  }

  /** The input of a field by path (for tests and focus). */
  fieldAt(path: string): HTMLElement | undefined {
    return this.fieldsByPath.get(path);
  }

  /**
   * Shows problems next to their fields: each by its path, or at the nearest enclosing section, or at the top.
   * @returns the element that holds each message
   */
  showProblems(problems: readonly { readonly path: string; readonly message: string }[]): HTMLElement[] {
    for (const slot of [...this.messageSlots.values(), this.topSlot]) {
      slot.replaceChildren();
      slot.hidden = true;
    }
    for (const field of this.fieldsByPath.values()) field.removeAttribute("aria-invalid");
    const used: HTMLElement[] = [];
    for (const problem of problems) {
      let path = problem.path;
      let slot = this.messageSlots.get(path);
      while (slot === undefined && path.length > 0) {
        path = parentPath(path);
        slot = this.messageSlots.get(path);
      }
      const target = slot ?? this.topSlot;
      const line = el("p", { class: "hj-problem" });
      line.append(el("span", { class: "hj-problem-mark", "aria-hidden": "true" }, "✗ "), problem.message);
      target.append(line);
      target.hidden = false;
      (this.fieldsByPath.get(problem.path) ?? this.fieldsByPath.get(path))?.setAttribute("aria-invalid", "true");
      used.push(target);
    }
    return used;
  }

  private slotFor(path: DraftPath, parent: HTMLElement): HTMLElement {
    const slot = el("div", { class: "hj-messages", id: `${idOf(path)}-msg`, role: "alert" });
    slot.hidden = true;
    parent.append(slot);
    this.messageSlots.set(formatPath(path), slot);
    return slot;
  }

  private renderObjectBody(schema: SchemaNode, path: DraftPath, value: Record<string, unknown>, parent: HTMLElement, skip?: string): void {
    if (path.length > 0) this.slotFor(path, parent);
    const properties = props(schema);
    const req = required(schema);
    for (const [key, child] of Object.entries(properties)) {
      if (key === skip) continue;
      this.renderNode(child, [...path, key], value[key], parent, labelOfKey(key), req.includes(key), key);
    }
    const extra = schema["additionalProperties"];
    if (isObject(extra) && Object.keys(properties).length === 0) this.renderRecord(extra, path, value, parent);
  }

  private renderNode(schema: SchemaNode, path: DraftPath, value: unknown, parent: HTMLElement, label: string, isRequired: boolean, key: string): void {
    const description = schema["description"] as string | undefined;
    const variants = schema["oneOf"] as SchemaNode[] | undefined;
    if (variants !== undefined) {
      const discriminator = discriminatorOf(variants);
      if (discriminator !== undefined) return this.renderVariants(variants, discriminator, path, value, parent, label, isRequired, description);
      return this.renderJsonText(path, value, parent, label, description);
    }
    const any = schema["anyOf"] as SchemaNode[] | undefined;
    if (any !== undefined && any.every((a) => a["const"] !== undefined)) {
      return this.renderChoice(any.map((a) => a["const"]), path, value, parent, label, isRequired, description);
    }
    if (schema["const"] !== undefined) return this.renderConst(schema["const"], path, value, parent, label, description);
    const enumeration = schema["enum"] as unknown[] | undefined;
    if (enumeration !== undefined) return this.renderChoice(enumeration, path, value, parent, label, isRequired, description);
    switch (schema["type"]) {
      case "object":
        return this.renderSection(schema, path, value, parent, label, isRequired, description);
      case "array":
        return this.renderArray(schema, path, value, parent, label, description);
      case "number":
      case "integer":
        return this.renderText(path, value, parent, label, description, unitOfKey(key, description), "number", schema);
      case "string":
        return this.renderText(path, value, parent, label, description, undefined, (schema["maxLength"] as number | undefined ?? 0) >= 5000 ? "long" : "string", schema);
      case "boolean":
        return this.renderBoolean(path, value, parent, label, description);
      default:
        return this.renderJsonText(path, value, parent, label, description);
    }
  }

  private fieldRow(path: DraftPath, parent: HTMLElement, label: string, description: string | undefined, unit?: string): { row: HTMLElement; id: string; describedBy: string } {
    const id = idOf(path);
    const row = el("div", { class: "hj-field" });
    const labelEl = el("label", { for: id }, label);
    row.append(labelEl);
    const describedBy: string[] = [`${id}-msg`];
    if (unit !== undefined) {
      row.dataset["unit"] = unit;
    }
    if (description !== undefined) describedBy.push(`${id}-help`);
    parent.append(row);
    return { row, id, describedBy: describedBy.join(" ") };
  }

  private finishRow(row: HTMLElement, path: DraftPath, input: HTMLElement, description: string | undefined, unit: string | undefined): void {
    const id = idOf(path);
    const wrap = el("div", { class: "hj-input" });
    wrap.append(input);
    if (unit !== undefined) wrap.append(el("span", { class: "hj-unit", id: `${id}-unit` }, unit));
    row.append(wrap);
    if (description !== undefined) row.append(el("p", { class: "hj-help", id: `${id}-help` }, description));
    this.slotFor(path, row);
    this.fieldsByPath.set(formatPath(path), input);
  }

  private renderText(path: DraftPath, value: unknown, parent: HTMLElement, label: string, description: string | undefined, unit: string | undefined, kind: "number" | "string" | "long", schema: SchemaNode): void {
    const { row, id, describedBy } = this.fieldRow(path, parent, label, description, unit);
    const input = kind === "long" ? el("textarea", { id, rows: "3" }) : el("input", { id, type: "text" });
    if (kind === "number") {
      input.setAttribute("inputmode", "decimal");
      input.setAttribute("autocomplete", "off");
      input.setAttribute("spellcheck", "false");
    }
    input.setAttribute("aria-describedby", unit !== undefined ? `${id}-unit ${describedBy}` : describedBy);
    input.setAttribute("name", formatPath(path));
    (input as HTMLInputElement).value = value === undefined || value === null ? "" : typeof value === "string" ? value : String(value);
    const placeholder = schema["minimum"] !== undefined || schema["exclusiveMinimum"] !== undefined ? "" : "";
    if (placeholder !== "") input.setAttribute("placeholder", placeholder);
    input.addEventListener("input", () => {
      const text = (input as HTMLInputElement).value;
      this.host.set(path, kind === "number" ? readNumberText(text) : text === "" ? undefined : text, false);
    });
    this.finishRow(row, path, input, description, unit);
  }

  private renderBoolean(path: DraftPath, value: unknown, parent: HTMLElement, label: string, description: string | undefined): void {
    const { row, id, describedBy } = this.fieldRow(path, parent, label, description);
    row.classList.add("hj-check");
    const input = el("input", { id, type: "checkbox", "aria-describedby": describedBy });
    input.checked = value === true;
    input.addEventListener("change", () => this.host.set(path, input.checked ? true : undefined, false));
    this.finishRow(row, path, input, description, undefined);
  }

  private renderChoice(choices: readonly unknown[], path: DraftPath, value: unknown, parent: HTMLElement, label: string, isRequired: boolean, description: string | undefined): void {
    const { row, id, describedBy } = this.fieldRow(path, parent, label, description);
    const select = el("select", { id, "aria-describedby": describedBy });
    if (!isRequired || value === undefined) select.append(el("option", { value: "" }, isRequired ? "(choose)" : "(default)"));
    choices.forEach((choice, i) => {
      const option = el("option", { value: String(i) }, String(choice));
      if (choice === value) option.selected = true;
      select.append(option);
    });
    select.addEventListener("change", () => {
      const i = select.value === "" ? -1 : Number(select.value);
      this.host.set(path, i < 0 ? undefined : choices[i], false);
    });
    this.finishRow(row, path, select, description, undefined);
  }

  private renderConst(constant: unknown, path: DraftPath, value: unknown, parent: HTMLElement, label: string, description: string | undefined): void {
    const { row, id, describedBy } = this.fieldRow(path, parent, label, description);
    const output = el("input", { id, type: "text", readonly: "", "aria-describedby": describedBy });
    output.value = String(value ?? constant);
    this.finishRow(row, path, output, description, undefined);
  }

  private renderJsonText(path: DraftPath, value: unknown, parent: HTMLElement, label: string, description: string | undefined): void {
    const { row, id, describedBy } = this.fieldRow(path, parent, `${label} (JSON)`, description);
    const area = el("textarea", { id, rows: "3", "aria-describedby": describedBy, spellcheck: "false" });
    area.value = value === undefined ? "" : JSON.stringify(value);
    area.addEventListener("input", () => {
      const text = area.value.trim();
      if (text === "") return this.host.set(path, undefined, false);
      try {
        this.host.set(path, JSON.parse(text) as unknown, false);
      } catch {
        this.host.set(path, text, false);
      }
    });
    this.finishRow(row, path, area, description, undefined);
  }

  private sectionShell(path: DraftPath, parent: HTMLElement, label: string, description: string | undefined): { fieldset: HTMLFieldSetElement; body: HTMLElement } {
    const fieldset = el("fieldset", { class: `hj-section hj-depth-${Math.min(path.length, 4)}`, id: `${idOf(path)}-section` });
    const legend = el("legend", {}, label);
    fieldset.append(legend);
    if (description !== undefined) {
      const help = el("p", { class: "hj-help", id: `${idOf(path)}-section-help` }, description);
      fieldset.append(help);
      fieldset.setAttribute("aria-describedby", help.id);
    }
    const body = el("div", { class: "hj-section-body" });
    fieldset.append(body);
    parent.append(fieldset);
    return { fieldset, body };
  }

  private includeToggle(path: DraftPath, fieldset: HTMLElement, label: string, present: boolean, schema: SchemaNode): void {
    const id = `${idOf(path)}-include`;
    const row = el("div", { class: "hj-field hj-check hj-include" });
    const box = el("input", { id, type: "checkbox" });
    box.checked = present;
    box.addEventListener("change", () => this.host.set(path, box.checked ? defaultValue(schema) : undefined, true));
    row.append(box, el("label", { for: id }, `Include ${/^[A-Z][a-z]/.test(label) ? label.charAt(0).toLowerCase() + label.slice(1) : label}`));
    fieldset.insertBefore(row, fieldset.children[1] ?? null);
  }

  private renderSection(schema: SchemaNode, path: DraftPath, value: unknown, parent: HTMLElement, label: string, isRequired: boolean, description: string | undefined): void {
    const { fieldset, body } = this.sectionShell(path, parent, label, description);
    if (!isRequired) this.includeToggle(path, fieldset, label, value !== undefined, schema);
    if (value === undefined && !isRequired) {
      this.slotFor(path, body);
      return;
    }
    this.renderObjectBody(schema, path, isObject(value) ? value : {}, body);
  }

  private renderVariants(variants: readonly SchemaNode[], discriminator: string, path: DraftPath, value: unknown, parent: HTMLElement, label: string, isRequired: boolean, description: string | undefined): void {
    const { fieldset, body } = this.sectionShell(path, parent, label, description);
    const present = value !== undefined;
    if (!isRequired) this.includeToggle(path, fieldset, label, present, { oneOf: variants });
    if (!present && !isRequired) {
      this.slotFor(path, body);
      return;
    }
    const current = isObject(value) ? value : {};
    const chosenIndex = variants.findIndex((v) => props(v)[discriminator]?.["const"] === current[discriminator]);
    const id = `${idOf([...path, discriminator])}`;
    const row = el("div", { class: "hj-field" });
    row.append(el("label", { for: id }, labelOfKey(discriminator)));
    const select = el("select", { id, "aria-describedby": `${id}-msg` });
    if (chosenIndex < 0) select.append(el("option", { value: "" }, "(choose)"));
    variants.forEach((v, i) => {
      const constant = props(v)[discriminator]?.["const"];
      const text = `${String(constant)}${v["description"] !== undefined ? ` — ${String(v["description"])}` : ""}`;
      const option = el("option", { value: String(i) }, text);
      if (i === chosenIndex) option.selected = true;
      select.append(option);
    });
    select.addEventListener("change", () => {
      const next = variants[Number(select.value)];
      if (next === undefined) return;
      const fresh = defaultValue(next) as Record<string, unknown>;
      for (const key of Object.keys(props(next))) if (key !== discriminator && current[key] !== undefined) fresh[key] = current[key];
      this.host.set(path, fresh, true);
    });
    const wrap = el("div", { class: "hj-input" });
    wrap.append(select);
    row.append(wrap);
    body.append(row);
    this.slotFor([...path, discriminator], row);
    this.fieldsByPath.set(formatPath([...path, discriminator]), select);
    const chosen = variants[chosenIndex];
    if (chosen !== undefined) this.renderObjectBody(chosen, path, current, body, discriminator);
    else this.slotFor(path, body);
  }

  private renderArray(schema: SchemaNode, path: DraftPath, value: unknown, parent: HTMLElement, label: string, description: string | undefined): void {
    const { body } = this.sectionShell(path, parent, label, description);
    this.slotFor(path, body);
    const items = Array.isArray(value) ? value : [];
    const itemSchema = (schema["items"] as SchemaNode | undefined) ?? {};
    const itemLabel = singular(label);
    const list = el("ol", { class: "hj-items" });
    items.forEach((item, i) => {
      const li = el("li", { class: "hj-item" });
      const itemPath = [...path, i];
      const name = `${itemLabel} ${i + 1}`;
      this.renderNode(itemSchema, itemPath, item, li, name, true, String(i));
      const remove = el("button", { type: "button", class: "hj-small" }, `Remove ${name.toLowerCase()}`);
      remove.addEventListener("click", () => {
        const next = [...items];
        next.splice(i, 1);
        this.host.set(path, next, true);
      });
      li.append(remove);
      list.append(li);
    });
    body.append(list);
    const add = el("button", { type: "button", class: "hj-small" }, `Add ${itemLabel.toLowerCase()}`);
    add.addEventListener("click", () => this.host.set(path, [...items, defaultValue(itemSchema)], true));
    body.append(add);
  }

  private renderRecord(valueSchema: SchemaNode, path: DraftPath, value: Record<string, unknown>, parent: HTMLElement): void {
    const entries = Object.entries(value);
    const list = el("ol", { class: "hj-items" });
    entries.forEach(([key, entry], i) => {
      const li = el("li", { class: "hj-item" });
      const keyId = `${idOf(path)}-key-${i}`;
      const row = el("div", { class: "hj-field" });
      row.append(el("label", { for: keyId }, `Name of entry ${i + 1}`));
      const keyInput = el("input", { id: keyId, type: "text", spellcheck: "false" });
      keyInput.value = key;
      keyInput.addEventListener("change", () => {
        const next: Record<string, unknown> = {};
        entries.forEach(([k, v], j) => (next[j === i ? keyInput.value : k] = v));
        this.host.set(path, next, true);
      });
      const wrap = el("div", { class: "hj-input" });
      wrap.append(keyInput);
      row.append(wrap);
      li.append(row);
      this.renderNode(valueSchema, [...path, key], entry, li, `Entry ${i + 1}: ${key}`, true, key);
      const remove = el("button", { type: "button", class: "hj-small" }, `Remove entry ${i + 1}`);
      remove.addEventListener("click", () => {
        const next = { ...value };
        delete next[key];
        this.host.set(path, next, true);
      });
      li.append(remove);
      list.append(li);
    });
    parent.append(list);
    const add = el("button", { type: "button", class: "hj-small" }, "Add entry");
    add.addEventListener("click", () => {
      let name = "source.name";
      for (let n = 2; value[name] !== undefined; n++) name = `source.name${n}`;
      this.host.set(path, { ...value, [name]: defaultValue(valueSchema) }, true);
    });
    parent.append(add);
  }
}
