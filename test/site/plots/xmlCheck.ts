/**
 * A small XML well-formedness check for the generated SVG: balanced and
 * properly nested elements, quoted attributes without duplicates, only the
 * five predefined entities, no script, no external references.
 * Returns the list of problems (empty when fine) and the element names met.
 */
export function checkXml(text: string): { problems: string[]; elements: string[] } {
  const problems: string[] = [];
  const elements: string[] = [];
  const stack: string[] = [];
  const tag = /<(\/?)([A-Za-z][\w:-]*)((?:\s+[\w:-]+="[^"<]*")*)\s*(\/?)>/y;
  let i = 0;
  let roots = 0;
  while (i < text.length) {
    const lt = text.indexOf("<", i);
    const chunk = lt === -1 ? text.slice(i) : text.slice(i, lt);
    for (const m of chunk.matchAll(/&([^;]*);?/g)) if (!/^(amp|lt|gt|quot|apos);$/.test(m[0])) problems.push(`bad entity ${m[0]}`);
    if (chunk.trim() && stack.length === 0) problems.push("text outside the root element");
    if (lt === -1) break;
    tag.lastIndex = lt;
    const m = tag.exec(text);
    if (!m) {
      problems.push(`malformed tag at ${lt}: ${text.slice(lt, lt + 40)}`);
      break;
    }
    const [, close, name, attrs, selfClose] = m as unknown as [string, string, string, string, string];
    if (close) {
      if (stack.pop() !== name) problems.push(`mismatched </${name}>`);
    } else {
      if (stack.length === 0) roots++;
      elements.push(name);
      const names = [...attrs.matchAll(/([\w:-]+)=/g)].map((a) => a[1]!);
      if (new Set(names).size !== names.length) problems.push(`duplicate attribute in <${name}>`);
      for (const a of attrs.matchAll(/="([^"]*)"/g))
        for (const e of a[1]!.matchAll(/&([^;]*);?/g)) if (!/^(amp|lt|gt|quot|apos);$/.test(e[0])) problems.push(`bad entity ${e[0]}`);
      if (!selfClose) stack.push(name);
    }
    i = tag.lastIndex;
  }
  if (stack.length) problems.push(`unclosed ${stack.join(", ")}`);
  if (roots !== 1) problems.push(`${roots} root elements`);
  if (elements.includes("script")) problems.push("script element");
  if (/href=|url\(|@import/.test(text)) problems.push("external reference");
  return { problems, elements };
}
