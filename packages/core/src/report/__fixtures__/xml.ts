/**
 * A small well-formedness check for the SVG and HTML we generate (test use only): every tag is
 * closed in order, attributes are quoted, no raw '<' or stray '&' in text. Not a full XML parser:
 * it knows elements, attributes, comments, a doctype and text, which is all our output holds.
 */
export interface XmlElement {
  name: string;
  attrs: Record<string, string>;
  children: XmlElement[];
  text: string;
}

export function parseXml(src: string, options: { voidElements?: readonly string[] } = {}): XmlElement {
  const voids = new Set(options.voidElements ?? []);
  const root: XmlElement = { name: '#root', attrs: {}, children: [], text: '' };
  const stack: XmlElement[] = [root];
  let i = 0;
  const entity = /^&(amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);/;
  while (i < src.length) {
    if (src.startsWith('<!--', i)) {
      const end = src.indexOf('-->', i);
      if (end < 0) throw new Error(`unclosed comment at ${i}`);
      i = end + 3;
    } else if (src.startsWith('<!', i) || src.startsWith('<?', i)) {
      const end = src.indexOf('>', i);
      i = end + 1;
    } else if (src.startsWith('</', i)) {
      const m = /^<\/([A-Za-z][\w:-]*)\s*>/.exec(src.slice(i));
      if (!m) throw new Error(`bad closing tag at ${i}: ${src.slice(i, i + 30)}`);
      const top = stack.pop();
      if (!top || top.name !== m[1]) throw new Error(`</${m[1]}> closes <${top?.name}> at ${i}`);
      i += m[0].length;
    } else if (src[i] === '<') {
      const m = /^<([A-Za-z][\w:-]*)((?:\s+[\w:-]+\s*=\s*"[^"<]*")*)\s*(\/?)>/.exec(src.slice(i));
      if (!m) throw new Error(`bad opening tag at ${i}: ${src.slice(i, i + 60)}`);
      const attrs: Record<string, string> = {};
      for (const a of m[2].matchAll(/([\w:-]+)\s*=\s*"([^"]*)"/g)) {
        if (a[1] in attrs) throw new Error(`duplicate attribute ${a[1]} at ${i}`);
        attrs[a[1]] = a[2];
      }
      const node: XmlElement = { name: m[1], attrs, children: [], text: '' };
      stack[stack.length - 1].children.push(node);
      if (!m[3] && !voids.has(m[1])) stack.push(node);
      i += m[0].length;
    } else {
      if (src[i] === '&' && !entity.test(src.slice(i))) throw new Error(`stray & at ${i}`);
      stack[stack.length - 1].text += src[i];
      i++;
    }
  }
  if (stack.length !== 1) throw new Error(`unclosed <${stack[stack.length - 1].name}>`);
  return root;
}

/** All elements in document order. */
export function allElements(node: XmlElement): XmlElement[] {
  return node.children.flatMap((c) => [c, ...allElements(c)]);
}

/** Text of an element and its descendants, with the five XML entities decoded. */
function rawText(node: XmlElement): string {
  return node.text + node.children.map(rawText).join('');
}
export function textOf(node: XmlElement): string {
  return rawText(node).replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&apos;/g, "'").replace(/&amp;/g, '&');
}
