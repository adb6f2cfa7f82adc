/**
 * The design in the page's address fragment: `#design=z.<base64url of deflate-raw of the JSON text>` (or `j.` and
 * the JSON text itself in base64url where the browser cannot compress). Decoding gives back the exact text.
 * @module
 */

function toBase64Url(bytes: Uint8Array): string {
  let binary = "";
  for (let i = 0; i < bytes.length; i += 0x8000) binary += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  return btoa(binary).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

function fromBase64Url(text: string): Uint8Array {
  const b64 = text.replace(/-/g, "+").replace(/_/g, "/");
  const binary = atob(b64 + "=".repeat((4 - (b64.length % 4)) % 4));
  const out = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) out[i] = binary.charCodeAt(i);
  return out;
}

async function pipe(bytes: Uint8Array, stream: CompressionStream | DecompressionStream): Promise<Uint8Array> {
  const response = new Response(new Blob([bytes as BlobPart]).stream().pipeThrough(stream));
  return new Uint8Array(await response.arrayBuffer());
}

/** Encodes a design's JSON text for the fragment. */
export async function encodeFragment(jsonText: string): Promise<string> {
  const bytes = new TextEncoder().encode(jsonText);
  if (typeof CompressionStream === "function") return `design=z.${toBase64Url(await pipe(bytes, new CompressionStream("deflate-raw")))}`;
  return `design=j.${toBase64Url(bytes)}`;
}

/** Decodes a fragment (with or without `#`); undefined when it holds no design. Throws on a damaged one. */
export async function decodeFragment(fragment: string): Promise<string | undefined> {
  const match = /^#?design=([zj])\.([A-Za-z0-9_-]*)$/.exec(fragment);
  if (match === null) return undefined;
  const bytes = fromBase64Url(match[2] ?? "");
  const raw = match[1] === "z" ? await pipe(bytes, new DecompressionStream("deflate-raw")) : bytes;
  return new TextDecoder("utf-8", { fatal: true }).decode(raw);
}
