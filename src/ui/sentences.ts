/**
 * A text cut into sentences, each keeping its closing mark and the space after it. A sentence ends at
 * ".", "!" or "?" followed by a space or the end of the text, never at a decimal point: "b = 0.01" and
 * "2.405" stay whole (a number cut at its point read as two numbers, on a phone, in a fold).
 */
export function sentences(text: string): string[] {
  return text.match(/[^]+?[.!?]+(?=\s|$)\s*|[^]+$/g) ?? [];
}
