// Where and why a text is not JSON, found by a scan of its grammar: the
// runtime's own parse error says too little (no line, column or found text
// in every case), and the usual mistakes, a comment, a trailing comma, a
// NaN, deserve their own words. Iterative, so no nesting depth overflows it.

export interface JsonSyntaxError {
  /** Offset of the offending text (the text's length at an early end). */
  offset: number;
  /** A comment (JSON has none), a NaN or Infinity literal, or any other mistake. */
  kind: 'comment' | 'notFinite' | 'syntax';
  /** What the grammar wanted there, in words. */
  expected: string;
}

type State = 'value' | 'valueOrClose' | 'keyOrClose' | 'key' | 'colon' | 'commaOrClose' | 'end';

const SPACE = new Set([' ', '\t', '\n', '\r']);
const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][-+]?\d+)?/y;
const LITERAL = /true|false|null/y;
const NOT_FINITE = /[-+]?(?:NaN|Infinity)\b/y;
// A string's body: anything but a quote, a backslash or a control character; or an escape.
const STRING_BODY = /(?:[^"\\\u0000-\u001f]|\\["\\/bfnrt]|\\u[0-9a-fA-F]{4})*/y;

/** The first thing wrong with the text as JSON, or undefined for valid JSON. */
export function jsonSyntaxError(text: string): JsonSyntaxError | undefined {
  const stack: ('object' | 'array')[] = [];
  let state = 'value' as State;
  let i = 0;
  const fail = (expected: string, kind: JsonSyntaxError['kind'] = 'syntax'): JsonSyntaxError => ({ offset: i, kind, expected });
  const afterValue = () => {
    state = stack.length ? 'commaOrClose' : 'end';
  };
  // Past a closing bracket: the collection it closes is a value done.
  const closeCollection = () => {
    i++;
    stack.pop();
    afterValue();
  };
  for (;;) {
    while (i < text.length && SPACE.has(text[i])) i++;
    const c = text[i];
    if (c === undefined) return state === 'end' ? undefined : fail(expectation(state, stack));
    if (c === '#' || (c === '/' && (text[i + 1] === '/' || text[i + 1] === '*'))) return fail('no comment', 'comment');
    switch (state) {
      case 'end':
        return fail('the end of the file (JSON holds one value)');
      case 'colon':
        if (c !== ':') return fail('":" after the key');
        i++;
        state = 'value';
        continue;
      case 'commaOrClose': {
        const close = stack[stack.length - 1] === 'object' ? '}' : ']';
        if (c === ',') {
          i++;
          state = stack[stack.length - 1] === 'object' ? 'key' : 'value';
        } else if (c === close) closeCollection();
        else return fail(`"," or "${close}"`);
        continue;
      }
      case 'keyOrClose':
      case 'key':
        if (c === '}' && state === 'keyOrClose') {
          closeCollection();
          continue;
        }
        if (c === '}') return fail('another key after the comma (JSON allows no trailing comma)');
        if (c !== '"') return fail('a key in double quotes');
        if (!readString()) return fail(stringTrouble());
        state = 'colon';
        continue;
      case 'value':
      case 'valueOrClose':
        if (c === ']' && state === 'valueOrClose') {
          closeCollection();
          continue;
        }
        if (c === ']' || c === '}') return fail(stack.length && text.slice(0, i).trimEnd().endsWith(',') ? 'another value after the comma (JSON allows no trailing comma)' : 'a value');
        if (c === '{' || c === '[') {
          i++;
          stack.push(c === '{' ? 'object' : 'array');
          state = c === '{' ? 'keyOrClose' : 'valueOrClose';
          continue;
        }
        if (c === '"') {
          if (!readString()) return fail(stringTrouble());
        } else if (startsWith(NOT_FINITE)) {
          return fail('a finite number', 'notFinite');
        } else if (!matches(NUMBER) && !matches(LITERAL)) {
          return fail('a value: a number, a string in double quotes, true, false, null, an object or a list');
        }
        afterValue();
        continue;
    }
  }

  // At a quote: past the closing quote; or false, with i where the string goes wrong (at its opening quote if it never ends).
  function readString(): boolean {
    STRING_BODY.lastIndex = i + 1;
    STRING_BODY.exec(text);
    const stop = STRING_BODY.lastIndex;
    if (text[stop] === '"') {
      i = stop + 1;
      return true;
    }
    if (stop < text.length) i = stop;
    return false;
  }

  function stringTrouble(): string {
    if (text[i] === '"') return 'a closing double quote for the string that starts here';
    if (text[i] === '\\') return 'an escape JSON knows (\\n, \\t, \\", \\\\, \\/ or \\u and four hex digits)';
    return 'no line break, tab or other control character inside a string (write \\n or \\t)';
  }

  function startsWith(re: RegExp): boolean {
    re.lastIndex = i;
    return re.test(text);
  }

  function matches(re: RegExp): boolean {
    re.lastIndex = i;
    if (!re.test(text)) return false;
    // A number or word running on into letters ("12abc", "nulls") is not a value.
    if (/[\w.]/.test(text[re.lastIndex] ?? '')) return false;
    i = re.lastIndex;
    return true;
  }
}

function expectation(state: State, stack: readonly string[]): string {
  const close = stack[stack.length - 1] === 'object' ? '}' : ']';
  if (state === 'colon') return '":" after the key';
  if (state === 'commaOrClose') return `"," or "${close}"`;
  if (state === 'key' || state === 'keyOrClose') return 'a key in double quotes';
  return 'a value';
}

/** The text at an offset as an error shows it: the token there (a string as written, anything else in quotes), or "the end of the file". */
export function foundAt(text: string, offset: number): string {
  if (offset >= text.length) return 'the end of the file';
  const token = /^(?:"[^"\n]{0,30}"?|\/\/[^\n]*|\/\*[^\n]*|#[^\n]*|[^\s,:[\]{}"]+|.)/.exec(text.slice(offset, offset + 80))?.[0] ?? text[offset];
  return /^".*"$/.test(token) ? token : `"${token}"`;
}
