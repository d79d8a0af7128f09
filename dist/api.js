import { createRequire as __nbCreateRequire } from 'node:module';
const require = __nbCreateRequire(import.meta.url);
var __create = Object.create;
var __defProp = Object.defineProperty;
var __getOwnPropDesc = Object.getOwnPropertyDescriptor;
var __getOwnPropNames = Object.getOwnPropertyNames;
var __getProtoOf = Object.getPrototypeOf;
var __hasOwnProp = Object.prototype.hasOwnProperty;
var __require = /* @__PURE__ */ ((x) => typeof require !== "undefined" ? require : typeof Proxy !== "undefined" ? new Proxy(x, {
  get: (a, b) => (typeof require !== "undefined" ? require : a)[b]
}) : x)(function(x) {
  if (typeof require !== "undefined") return require.apply(this, arguments);
  throw Error('Dynamic require of "' + x + '" is not supported');
});
var __commonJS = (cb, mod) => function __require2() {
  try {
    return mod || (0, cb[__getOwnPropNames(cb)[0]])((mod = { exports: {} }).exports, mod), mod.exports;
  } catch (e) {
    throw mod = 0, e;
  }
};
var __copyProps = (to, from, except, desc) => {
  if (from && typeof from === "object" || typeof from === "function") {
    for (let key of __getOwnPropNames(from))
      if (!__hasOwnProp.call(to, key) && key !== except)
        __defProp(to, key, { get: () => from[key], enumerable: !(desc = __getOwnPropDesc(from, key)) || desc.enumerable });
  }
  return to;
};
var __toESM = (mod, isNodeMode, target) => (target = mod != null ? __create(__getProtoOf(mod)) : {}, __copyProps(
  // If the importer is in node compatibility mode or this is not an ESM
  // file that has been converted to a CommonJS file using a Babel-
  // compatible transform (i.e. "__esModule" has not been set), then set
  // "default" to the CommonJS "module.exports" for node compatibility.
  isNodeMode || !mod || !mod.__esModule ? __defProp(target, "default", { value: mod, enumerable: true }) : target,
  mod
));

// node_modules/picomatch/lib/constants.js
var require_constants = __commonJS({
  "node_modules/picomatch/lib/constants.js"(exports, module) {
    "use strict";
    var WIN_SLASH = "\\\\/";
    var WIN_NO_SLASH = `[^${WIN_SLASH}]`;
    var DEFAULT_MAX_EXTGLOB_RECURSION = 0;
    var DOT_LITERAL = "\\.";
    var PLUS_LITERAL = "\\+";
    var QMARK_LITERAL = "\\?";
    var SLASH_LITERAL = "\\/";
    var ONE_CHAR = "(?=.)";
    var QMARK = "[^/]";
    var END_ANCHOR = `(?:${SLASH_LITERAL}|$)`;
    var START_ANCHOR = `(?:^|${SLASH_LITERAL})`;
    var DOTS_SLASH = `${DOT_LITERAL}{1,2}${END_ANCHOR}`;
    var NO_DOT = `(?!${DOT_LITERAL})`;
    var NO_DOTS = `(?!${START_ANCHOR}${DOTS_SLASH})`;
    var NO_DOT_SLASH = `(?!${DOT_LITERAL}{0,1}${END_ANCHOR})`;
    var NO_DOTS_SLASH = `(?!${DOTS_SLASH})`;
    var QMARK_NO_DOT = `[^.${SLASH_LITERAL}]`;
    var STAR = `${QMARK}*?`;
    var SEP = "/";
    var POSIX_CHARS = {
      DOT_LITERAL,
      PLUS_LITERAL,
      QMARK_LITERAL,
      SLASH_LITERAL,
      ONE_CHAR,
      QMARK,
      END_ANCHOR,
      DOTS_SLASH,
      NO_DOT,
      NO_DOTS,
      NO_DOT_SLASH,
      NO_DOTS_SLASH,
      QMARK_NO_DOT,
      STAR,
      START_ANCHOR,
      SEP
    };
    var WINDOWS_CHARS = {
      ...POSIX_CHARS,
      SLASH_LITERAL: `[${WIN_SLASH}]`,
      QMARK: WIN_NO_SLASH,
      STAR: `${WIN_NO_SLASH}*?`,
      DOTS_SLASH: `${DOT_LITERAL}{1,2}(?:[${WIN_SLASH}]|$)`,
      NO_DOT: `(?!${DOT_LITERAL})`,
      NO_DOTS: `(?!(?:^|[${WIN_SLASH}])${DOT_LITERAL}{1,2}(?:[${WIN_SLASH}]|$))`,
      NO_DOT_SLASH: `(?!${DOT_LITERAL}{0,1}(?:[${WIN_SLASH}]|$))`,
      NO_DOTS_SLASH: `(?!${DOT_LITERAL}{1,2}(?:[${WIN_SLASH}]|$))`,
      QMARK_NO_DOT: `[^.${WIN_SLASH}]`,
      START_ANCHOR: `(?:^|[${WIN_SLASH}])`,
      END_ANCHOR: `(?:[${WIN_SLASH}]|$)`,
      SEP: "\\"
    };
    var POSIX_REGEX_SOURCE = {
      __proto__: null,
      alnum: "a-zA-Z0-9",
      alpha: "a-zA-Z",
      ascii: "\\x00-\\x7F",
      blank: " \\t",
      cntrl: "\\x00-\\x1F\\x7F",
      digit: "0-9",
      graph: "\\x21-\\x7E",
      lower: "a-z",
      print: "\\x20-\\x7E ",
      punct: "\\-!\"#$%&'()\\*+,./:;<=>?@[\\]^_`{|}~",
      space: " \\t\\r\\n\\v\\f",
      upper: "A-Z",
      word: "A-Za-z0-9_",
      xdigit: "A-Fa-f0-9"
    };
    module.exports = {
      DEFAULT_MAX_EXTGLOB_RECURSION,
      MAX_LENGTH: 1024 * 64,
      POSIX_REGEX_SOURCE,
      // regular expressions
      REGEX_BACKSLASH: /\\(?![*+?^${}(|)[\]])/g,
      REGEX_NON_SPECIAL_CHARS: /^[^@![\].,$*+?^{}()|\\/]+/,
      REGEX_SPECIAL_CHARS: /[-*+?.^${}(|)[\]]/,
      REGEX_SPECIAL_CHARS_BACKREF: /(\\?)((\W)(\3*))/g,
      REGEX_SPECIAL_CHARS_GLOBAL: /([-*+?.^${}(|)[\]])/g,
      REGEX_REMOVE_BACKSLASH: /(?:\[.*?[^\\]\]|\\(?=.))/g,
      // Replace globs with equivalent patterns to reduce parsing time.
      REPLACEMENTS: {
        __proto__: null,
        "***": "*",
        "**/**": "**",
        "**/**/**": "**"
      },
      // Digits
      CHAR_0: 48,
      /* 0 */
      CHAR_9: 57,
      /* 9 */
      // Alphabet chars.
      CHAR_UPPERCASE_A: 65,
      /* A */
      CHAR_LOWERCASE_A: 97,
      /* a */
      CHAR_UPPERCASE_Z: 90,
      /* Z */
      CHAR_LOWERCASE_Z: 122,
      /* z */
      CHAR_LEFT_PARENTHESES: 40,
      /* ( */
      CHAR_RIGHT_PARENTHESES: 41,
      /* ) */
      CHAR_ASTERISK: 42,
      /* * */
      // Non-alphabetic chars.
      CHAR_AMPERSAND: 38,
      /* & */
      CHAR_AT: 64,
      /* @ */
      CHAR_BACKWARD_SLASH: 92,
      /* \ */
      CHAR_CARRIAGE_RETURN: 13,
      /* \r */
      CHAR_CIRCUMFLEX_ACCENT: 94,
      /* ^ */
      CHAR_COLON: 58,
      /* : */
      CHAR_COMMA: 44,
      /* , */
      CHAR_DOT: 46,
      /* . */
      CHAR_DOUBLE_QUOTE: 34,
      /* " */
      CHAR_EQUAL: 61,
      /* = */
      CHAR_EXCLAMATION_MARK: 33,
      /* ! */
      CHAR_FORM_FEED: 12,
      /* \f */
      CHAR_FORWARD_SLASH: 47,
      /* / */
      CHAR_GRAVE_ACCENT: 96,
      /* ` */
      CHAR_HASH: 35,
      /* # */
      CHAR_HYPHEN_MINUS: 45,
      /* - */
      CHAR_LEFT_ANGLE_BRACKET: 60,
      /* < */
      CHAR_LEFT_CURLY_BRACE: 123,
      /* { */
      CHAR_LEFT_SQUARE_BRACKET: 91,
      /* [ */
      CHAR_LINE_FEED: 10,
      /* \n */
      CHAR_NO_BREAK_SPACE: 160,
      /* \u00A0 */
      CHAR_PERCENT: 37,
      /* % */
      CHAR_PLUS: 43,
      /* + */
      CHAR_QUESTION_MARK: 63,
      /* ? */
      CHAR_RIGHT_ANGLE_BRACKET: 62,
      /* > */
      CHAR_RIGHT_CURLY_BRACE: 125,
      /* } */
      CHAR_RIGHT_SQUARE_BRACKET: 93,
      /* ] */
      CHAR_SEMICOLON: 59,
      /* ; */
      CHAR_SINGLE_QUOTE: 39,
      /* ' */
      CHAR_SPACE: 32,
      /*   */
      CHAR_TAB: 9,
      /* \t */
      CHAR_UNDERSCORE: 95,
      /* _ */
      CHAR_VERTICAL_LINE: 124,
      /* | */
      CHAR_ZERO_WIDTH_NOBREAK_SPACE: 65279,
      /* \uFEFF */
      /**
       * Create EXTGLOB_CHARS
       */
      extglobChars(chars) {
        return {
          "!": { type: "negate", open: "(?:(?!(?:", close: `))${chars.STAR})` },
          "?": { type: "qmark", open: "(?:", close: ")?" },
          "+": { type: "plus", open: "(?:", close: ")+" },
          "*": { type: "star", open: "(?:", close: ")*" },
          "@": { type: "at", open: "(?:", close: ")" }
        };
      },
      /**
       * Create GLOB_CHARS
       */
      globChars(win32) {
        return win32 === true ? WINDOWS_CHARS : POSIX_CHARS;
      }
    };
  }
});

// node_modules/picomatch/lib/utils.js
var require_utils = __commonJS({
  "node_modules/picomatch/lib/utils.js"(exports) {
    "use strict";
    var {
      REGEX_BACKSLASH,
      REGEX_REMOVE_BACKSLASH,
      REGEX_SPECIAL_CHARS,
      REGEX_SPECIAL_CHARS_GLOBAL
    } = require_constants();
    exports.isObject = (val) => val !== null && typeof val === "object" && !Array.isArray(val);
    exports.hasRegexChars = (str) => REGEX_SPECIAL_CHARS.test(str);
    exports.isRegexChar = (str) => str.length === 1 && exports.hasRegexChars(str);
    exports.escapeRegex = (str) => str.replace(REGEX_SPECIAL_CHARS_GLOBAL, "\\$1");
    exports.toPosixSlashes = (str) => str.replace(REGEX_BACKSLASH, "/");
    exports.isWindows = () => {
      if (typeof navigator !== "undefined" && navigator.platform) {
        const platform = navigator.platform.toLowerCase();
        return platform === "win32" || platform === "windows";
      }
      if (typeof process !== "undefined" && process.platform) {
        return process.platform === "win32";
      }
      return false;
    };
    exports.removeBackslashes = (str) => {
      return str.replace(REGEX_REMOVE_BACKSLASH, (match) => {
        return match === "\\" ? "" : match;
      });
    };
    exports.escapeLast = (input, char, lastIdx) => {
      const idx = input.lastIndexOf(char, lastIdx);
      if (idx === -1) return input;
      if (input[idx - 1] === "\\") return exports.escapeLast(input, char, idx - 1);
      return `${input.slice(0, idx)}\\${input.slice(idx)}`;
    };
    exports.removePrefix = (input, state = {}) => {
      let output = input;
      if (output.startsWith("./")) {
        output = output.slice(2);
        state.prefix = "./";
      }
      return output;
    };
    exports.wrapOutput = (input, state = {}, options = {}) => {
      const prepend = options.contains ? "" : "^";
      const append = options.contains ? "" : "$";
      let output = `${prepend}(?:${input})${append}`;
      if (state.negated === true) {
        output = `(?:^(?!${output}).*$)`;
      }
      return output;
    };
    exports.basename = (path, { windows } = {}) => {
      const segs = path.split(windows ? /[\\/]/ : "/");
      const last = segs[segs.length - 1];
      if (last === "") {
        return segs[segs.length - 2];
      }
      return last;
    };
  }
});

// node_modules/picomatch/lib/scan.js
var require_scan = __commonJS({
  "node_modules/picomatch/lib/scan.js"(exports, module) {
    "use strict";
    var utils = require_utils();
    var {
      CHAR_ASTERISK,
      /* * */
      CHAR_AT,
      /* @ */
      CHAR_BACKWARD_SLASH,
      /* \ */
      CHAR_COMMA,
      /* , */
      CHAR_DOT,
      /* . */
      CHAR_EXCLAMATION_MARK,
      /* ! */
      CHAR_FORWARD_SLASH,
      /* / */
      CHAR_LEFT_CURLY_BRACE,
      /* { */
      CHAR_LEFT_PARENTHESES,
      /* ( */
      CHAR_LEFT_SQUARE_BRACKET,
      /* [ */
      CHAR_PLUS,
      /* + */
      CHAR_QUESTION_MARK,
      /* ? */
      CHAR_RIGHT_CURLY_BRACE,
      /* } */
      CHAR_RIGHT_PARENTHESES,
      /* ) */
      CHAR_RIGHT_SQUARE_BRACKET
      /* ] */
    } = require_constants();
    var isPathSeparator = (code) => {
      return code === CHAR_FORWARD_SLASH || code === CHAR_BACKWARD_SLASH;
    };
    var depth = (token) => {
      if (token.isPrefix !== true) {
        token.depth = token.isGlobstar ? Infinity : 1;
      }
    };
    var scan = (input, options) => {
      const opts = options || {};
      const length = input.length - 1;
      const scanToEnd = opts.parts === true || opts.tokens === true || opts.scanToEnd === true;
      const slashes = [];
      const tokens = [];
      const parts = [];
      let str = input;
      let index = -1;
      let start = 0;
      let lastIndex = 0;
      let isBrace = false;
      let isBracket = false;
      let isGlob = false;
      let isExtglob = false;
      let isGlobstar = false;
      let braceEscaped = false;
      let backslashes = false;
      let negated = false;
      let negatedExtglob = false;
      let finished = false;
      let braces = 0;
      let prev;
      let code;
      let token = { value: "", depth: 0, isGlob: false };
      const eos = () => index >= length;
      const peek = () => str.charCodeAt(index + 1);
      const advance = () => {
        prev = code;
        return str.charCodeAt(++index);
      };
      while (index < length) {
        code = advance();
        let next;
        if (code === CHAR_BACKWARD_SLASH) {
          backslashes = token.backslashes = true;
          code = advance();
          if (code === CHAR_LEFT_CURLY_BRACE) {
            braceEscaped = true;
          }
          continue;
        }
        if (braceEscaped === true || code === CHAR_LEFT_CURLY_BRACE) {
          braces++;
          while (eos() !== true && (code = advance())) {
            if (code === CHAR_BACKWARD_SLASH) {
              backslashes = token.backslashes = true;
              advance();
              continue;
            }
            if (code === CHAR_LEFT_CURLY_BRACE) {
              braces++;
              continue;
            }
            if (braceEscaped !== true && code === CHAR_DOT && (code = advance()) === CHAR_DOT) {
              isBrace = token.isBrace = true;
              isGlob = token.isGlob = true;
              finished = true;
              if (scanToEnd === true) {
                continue;
              }
              break;
            }
            if (braceEscaped !== true && code === CHAR_COMMA) {
              isBrace = token.isBrace = true;
              isGlob = token.isGlob = true;
              finished = true;
              if (scanToEnd === true) {
                continue;
              }
              break;
            }
            if (code === CHAR_RIGHT_CURLY_BRACE) {
              braces--;
              if (braces === 0) {
                braceEscaped = false;
                isBrace = token.isBrace = true;
                finished = true;
                break;
              }
            }
          }
          if (scanToEnd === true) {
            continue;
          }
          break;
        }
        if (code === CHAR_FORWARD_SLASH) {
          slashes.push(index);
          tokens.push(token);
          token = { value: "", depth: 0, isGlob: false };
          if (finished === true) continue;
          if (prev === CHAR_DOT && index === start + 1) {
            start += 2;
            continue;
          }
          lastIndex = index + 1;
          continue;
        }
        if (opts.noext !== true) {
          const isExtglobChar = code === CHAR_PLUS || code === CHAR_AT || code === CHAR_ASTERISK || code === CHAR_QUESTION_MARK || code === CHAR_EXCLAMATION_MARK;
          if (isExtglobChar === true && peek() === CHAR_LEFT_PARENTHESES) {
            isGlob = token.isGlob = true;
            isExtglob = token.isExtglob = true;
            finished = true;
            if (code === CHAR_EXCLAMATION_MARK && index === start) {
              negatedExtglob = true;
            }
            if (scanToEnd === true) {
              let parens = 0;
              while (eos() !== true && (code = advance())) {
                if (code === CHAR_BACKWARD_SLASH) {
                  backslashes = token.backslashes = true;
                  advance();
                  continue;
                }
                if (code === CHAR_LEFT_PARENTHESES) {
                  parens++;
                  continue;
                }
                if (code === CHAR_RIGHT_PARENTHESES && --parens === 0) {
                  finished = true;
                  break;
                }
              }
              continue;
            }
            break;
          }
        }
        if (code === CHAR_ASTERISK) {
          if (prev === CHAR_ASTERISK) isGlobstar = token.isGlobstar = true;
          isGlob = token.isGlob = true;
          finished = true;
          if (scanToEnd === true) {
            continue;
          }
          break;
        }
        if (code === CHAR_QUESTION_MARK) {
          isGlob = token.isGlob = true;
          finished = true;
          if (scanToEnd === true) {
            continue;
          }
          break;
        }
        if (code === CHAR_LEFT_SQUARE_BRACKET) {
          while (eos() !== true && (next = advance())) {
            if (next === CHAR_BACKWARD_SLASH) {
              backslashes = token.backslashes = true;
              advance();
              continue;
            }
            if (next === CHAR_RIGHT_SQUARE_BRACKET) {
              isBracket = token.isBracket = true;
              isGlob = token.isGlob = true;
              finished = true;
              break;
            }
          }
          if (scanToEnd === true) {
            continue;
          }
          break;
        }
        if (opts.nonegate !== true && code === CHAR_EXCLAMATION_MARK && index === start) {
          negated = token.negated = true;
          start++;
          continue;
        }
        if (opts.noparen !== true && code === CHAR_LEFT_PARENTHESES) {
          isGlob = token.isGlob = true;
          if (scanToEnd === true) {
            let parens = 1;
            while (eos() !== true && (code = advance())) {
              if (code === CHAR_BACKWARD_SLASH) {
                backslashes = token.backslashes = true;
                advance();
                continue;
              }
              if (code === CHAR_LEFT_PARENTHESES) {
                parens++;
                continue;
              }
              if (code === CHAR_RIGHT_PARENTHESES && --parens === 0) {
                finished = true;
                break;
              }
            }
            continue;
          }
          break;
        }
        if (isGlob === true) {
          finished = true;
          if (scanToEnd === true) {
            continue;
          }
          break;
        }
      }
      if (opts.noext === true) {
        isExtglob = false;
        isGlob = false;
      }
      let base = str;
      let prefix = "";
      let glob = "";
      if (start > 0) {
        prefix = str.slice(0, start);
        str = str.slice(start);
        lastIndex -= start;
      }
      if (base && isGlob === true && lastIndex > 0) {
        base = str.slice(0, lastIndex);
        glob = str.slice(lastIndex);
      } else if (isGlob === true) {
        base = "";
        glob = str;
      } else {
        base = str;
      }
      if (base && base !== "" && base !== "/" && base !== str) {
        if (isPathSeparator(base.charCodeAt(base.length - 1))) {
          base = base.slice(0, -1);
        }
      }
      if (opts.unescape === true) {
        if (glob) glob = utils.removeBackslashes(glob);
        if (base && backslashes === true) {
          base = utils.removeBackslashes(base);
        }
      }
      const state = {
        prefix,
        input,
        start,
        base,
        glob,
        isBrace,
        isBracket,
        isGlob,
        isExtglob,
        isGlobstar,
        negated,
        negatedExtglob
      };
      if (opts.tokens === true) {
        state.maxDepth = 0;
        if (!isPathSeparator(code)) {
          tokens.push(token);
        }
        state.tokens = tokens;
      }
      if (opts.parts === true || opts.tokens === true) {
        let prevIndex;
        for (let idx = 0; idx < slashes.length; idx++) {
          const n2 = prevIndex !== void 0 ? prevIndex + 1 : start;
          const i = slashes[idx];
          const value2 = input.slice(n2, i);
          if (opts.tokens) {
            if (idx === 0 && start !== 0) {
              tokens[idx].isPrefix = true;
              tokens[idx].value = prefix;
            } else {
              tokens[idx].value = value2;
            }
            depth(tokens[idx]);
            state.maxDepth += tokens[idx].depth;
          }
          if (i >= start) {
            parts.push(value2);
            prevIndex = i;
          }
        }
        const n = prevIndex !== void 0 ? prevIndex + 1 : start;
        const value = input.slice(n);
        parts.push(value);
        if (opts.tokens && prevIndex && prevIndex + 1 < input.length) {
          tokens[tokens.length - 1].value = value;
          depth(tokens[tokens.length - 1]);
          state.maxDepth += tokens[tokens.length - 1].depth;
        }
        state.slashes = slashes;
        state.parts = parts;
      }
      return state;
    };
    module.exports = scan;
  }
});

// node_modules/picomatch/lib/parse.js
var require_parse = __commonJS({
  "node_modules/picomatch/lib/parse.js"(exports, module) {
    "use strict";
    var constants = require_constants();
    var utils = require_utils();
    var {
      MAX_LENGTH,
      POSIX_REGEX_SOURCE,
      REGEX_NON_SPECIAL_CHARS,
      REGEX_SPECIAL_CHARS_BACKREF,
      REPLACEMENTS
    } = constants;
    var expandRange = (args, options) => {
      if (typeof options.expandRange === "function") {
        return options.expandRange(...args, options);
      }
      args.sort();
      const value = `[${args.join("-")}]`;
      try {
        new RegExp(value);
      } catch (ex) {
        return args.map((v) => utils.escapeRegex(v)).join("..");
      }
      return value;
    };
    var syntaxError = (type, char) => {
      return `Missing ${type}: "${char}" - use "\\\\${char}" to match literal characters`;
    };
    var splitTopLevel = (input) => {
      const parts = [];
      let bracket = 0;
      let paren = 0;
      let quote = 0;
      let value = "";
      let escaped = false;
      for (const ch of input) {
        if (escaped === true) {
          value += ch;
          escaped = false;
          continue;
        }
        if (ch === "\\") {
          value += ch;
          escaped = true;
          continue;
        }
        if (ch === '"') {
          quote = quote === 1 ? 0 : 1;
          value += ch;
          continue;
        }
        if (quote === 0) {
          if (ch === "[") {
            bracket++;
          } else if (ch === "]" && bracket > 0) {
            bracket--;
          } else if (bracket === 0) {
            if (ch === "(") {
              paren++;
            } else if (ch === ")" && paren > 0) {
              paren--;
            } else if (ch === "|" && paren === 0) {
              parts.push(value);
              value = "";
              continue;
            }
          }
        }
        value += ch;
      }
      parts.push(value);
      return parts;
    };
    var isPlainBranch = (branch) => {
      let escaped = false;
      for (const ch of branch) {
        if (escaped === true) {
          escaped = false;
          continue;
        }
        if (ch === "\\") {
          escaped = true;
          continue;
        }
        if (/[?*+@!()[\]{}]/.test(ch)) {
          return false;
        }
      }
      return true;
    };
    var normalizeSimpleBranch = (branch) => {
      let value = branch.trim();
      let changed = true;
      while (changed === true) {
        changed = false;
        if (/^@\([^\\()[\]{}|]+\)$/.test(value)) {
          value = value.slice(2, -1);
          changed = true;
        }
      }
      if (!isPlainBranch(value)) {
        return;
      }
      return value.replace(/\\(.)/g, "$1");
    };
    var hasRepeatedCharPrefixOverlap = (branches) => {
      const values = branches.map(normalizeSimpleBranch).filter(Boolean);
      for (let i = 0; i < values.length; i++) {
        for (let j = i + 1; j < values.length; j++) {
          const a = values[i];
          const b = values[j];
          const char = a[0];
          if (!char || a !== char.repeat(a.length) || b !== char.repeat(b.length)) {
            continue;
          }
          if (a === b || a.startsWith(b) || b.startsWith(a)) {
            return true;
          }
        }
      }
      return false;
    };
    var parseRepeatedExtglob = (pattern, requireEnd = true) => {
      if (pattern[0] !== "+" && pattern[0] !== "*" || pattern[1] !== "(") {
        return;
      }
      let bracket = 0;
      let paren = 0;
      let quote = 0;
      let escaped = false;
      for (let i = 1; i < pattern.length; i++) {
        const ch = pattern[i];
        if (escaped === true) {
          escaped = false;
          continue;
        }
        if (ch === "\\") {
          escaped = true;
          continue;
        }
        if (ch === '"') {
          quote = quote === 1 ? 0 : 1;
          continue;
        }
        if (quote === 1) {
          continue;
        }
        if (ch === "[") {
          bracket++;
          continue;
        }
        if (ch === "]" && bracket > 0) {
          bracket--;
          continue;
        }
        if (bracket > 0) {
          continue;
        }
        if (ch === "(") {
          paren++;
          continue;
        }
        if (ch === ")") {
          paren--;
          if (paren === 0) {
            if (requireEnd === true && i !== pattern.length - 1) {
              return;
            }
            return {
              type: pattern[0],
              body: pattern.slice(2, i),
              end: i
            };
          }
        }
      }
    };
    var buildCharClassStar = (chars) => {
      const source = chars.length === 1 ? utils.escapeRegex(chars[0]) : `[${chars.map((ch) => utils.escapeRegex(ch)).join("")}]`;
      return `${source}*`;
    };
    var getStarExtglobSequenceChars = (pattern) => {
      let index = 0;
      const chars = [];
      while (index < pattern.length) {
        const match = parseRepeatedExtglob(pattern.slice(index), false);
        if (!match || match.type !== "*") {
          return;
        }
        const branches = splitTopLevel(match.body).map((branch2) => branch2.trim());
        if (branches.length !== 1) {
          return;
        }
        const branch = normalizeSimpleBranch(branches[0]);
        if (!branch || branch.length !== 1) {
          return;
        }
        chars.push(branch);
        index += match.end + 1;
      }
      if (chars.length < 1) {
        return;
      }
      return chars;
    };
    var repeatedExtglobRecursion = (pattern) => {
      let depth = 0;
      let value = pattern.trim();
      let match = parseRepeatedExtglob(value);
      while (match) {
        depth++;
        value = match.body.trim();
        match = parseRepeatedExtglob(value);
      }
      return depth;
    };
    var analyzeRepeatedExtglob = (body, options) => {
      if (options.maxExtglobRecursion === false) {
        return { risky: false };
      }
      const max = typeof options.maxExtglobRecursion === "number" ? options.maxExtglobRecursion : constants.DEFAULT_MAX_EXTGLOB_RECURSION;
      const branches = splitTopLevel(body).map((branch) => branch.trim());
      if (branches.length > 1) {
        if (branches.some((branch) => branch === "") || branches.some((branch) => /^[*?]+$/.test(branch)) || hasRepeatedCharPrefixOverlap(branches)) {
          return { risky: true };
        }
      }
      const safeChars = [];
      let sawStarSequence = false;
      let combinable = true;
      for (const branch of branches) {
        const chars = getStarExtglobSequenceChars(branch);
        if (chars) {
          sawStarSequence = true;
          safeChars.push(...chars);
          continue;
        }
        const literal = normalizeSimpleBranch(branch);
        if (literal && literal.length === 1) {
          safeChars.push(literal);
          continue;
        }
        combinable = false;
        if (repeatedExtglobRecursion(branch) > max) {
          return { risky: true };
        }
      }
      if (sawStarSequence) {
        return combinable ? { risky: true, safeOutput: buildCharClassStar([...new Set(safeChars)]) } : { risky: true };
      }
      return { risky: false };
    };
    var parse = (input, options) => {
      if (typeof input !== "string") {
        throw new TypeError("Expected a string");
      }
      input = REPLACEMENTS[input] || input;
      const opts = { ...options };
      const max = typeof opts.maxLength === "number" ? Math.min(MAX_LENGTH, opts.maxLength) : MAX_LENGTH;
      let len = input.length;
      if (len > max) {
        throw new SyntaxError(`Input length: ${len}, exceeds maximum allowed length: ${max}`);
      }
      const bos = { type: "bos", value: "", output: opts.prepend || "" };
      const tokens = [bos];
      const capture = opts.capture ? "" : "?:";
      const PLATFORM_CHARS = constants.globChars(opts.windows);
      const EXTGLOB_CHARS = constants.extglobChars(PLATFORM_CHARS);
      const {
        DOT_LITERAL,
        PLUS_LITERAL,
        SLASH_LITERAL,
        ONE_CHAR,
        DOTS_SLASH,
        NO_DOT,
        NO_DOT_SLASH,
        NO_DOTS_SLASH,
        QMARK,
        QMARK_NO_DOT,
        STAR,
        START_ANCHOR
      } = PLATFORM_CHARS;
      const globstar = (opts2) => {
        return `(${capture}(?:(?!${START_ANCHOR}${opts2.dot ? DOTS_SLASH : DOT_LITERAL}).)*?)`;
      };
      const nodot = opts.dot ? "" : NO_DOT;
      const qmarkNoDot = opts.dot ? QMARK : QMARK_NO_DOT;
      let star = opts.bash === true ? globstar(opts) : STAR;
      if (opts.capture) {
        star = `(${star})`;
      }
      if (typeof opts.noext === "boolean") {
        opts.noextglob = opts.noext;
      }
      const state = {
        input,
        index: -1,
        start: 0,
        dot: opts.dot === true,
        consumed: "",
        output: "",
        prefix: "",
        backtrack: false,
        negated: false,
        brackets: 0,
        braces: 0,
        parens: 0,
        quotes: 0,
        globstar: false,
        tokens
      };
      input = utils.removePrefix(input, state);
      len = input.length;
      const extglobs = [];
      const braces = [];
      const stack = [];
      let prev = bos;
      let value;
      const eos = () => state.index === len - 1;
      const peek = state.peek = (n = 1) => input[state.index + n];
      const advance = state.advance = () => input[++state.index] || "";
      const remaining = () => input.slice(state.index + 1);
      const consume = (value2 = "", num2 = 0) => {
        state.consumed += value2;
        state.index += num2;
      };
      const append = (token) => {
        state.output += token.output != null ? token.output : token.value;
        consume(token.value);
      };
      const negate = () => {
        let count = 1;
        while (peek() === "!" && (peek(2) !== "(" || peek(3) === "?")) {
          advance();
          state.start++;
          count++;
        }
        if (count % 2 === 0) {
          return false;
        }
        state.negated = true;
        state.start++;
        return true;
      };
      const increment = (type) => {
        state[type]++;
        stack.push(type);
      };
      const decrement = (type) => {
        state[type]--;
        stack.pop();
      };
      const push = (tok) => {
        if (prev.type === "globstar") {
          const isBrace = state.braces > 0 && (tok.type === "comma" || tok.type === "brace");
          const isExtglob = tok.extglob === true || extglobs.length && (tok.type === "pipe" || tok.type === "paren");
          if (tok.type !== "slash" && tok.type !== "paren" && !isBrace && !isExtglob) {
            state.output = state.output.slice(0, -prev.output.length);
            prev.type = "star";
            prev.value = "*";
            prev.output = star;
            state.output += prev.output;
          }
        }
        if (extglobs.length && tok.type !== "paren") {
          extglobs[extglobs.length - 1].inner += tok.value;
        }
        if (tok.value || tok.output) append(tok);
        if (prev && prev.type === "text" && tok.type === "text") {
          prev.output = (prev.output || prev.value) + tok.value;
          prev.value += tok.value;
          return;
        }
        tok.prev = prev;
        tokens.push(tok);
        prev = tok;
      };
      const extglobOpen = (type, value2) => {
        const token = { ...EXTGLOB_CHARS[value2], conditions: 1, inner: "" };
        token.prev = prev;
        token.parens = state.parens;
        token.output = state.output;
        token.startIndex = state.index;
        token.tokensIndex = tokens.length;
        const output = (opts.capture ? "(" : "") + token.open;
        increment("parens");
        push({ type, value: value2, output: state.output ? "" : ONE_CHAR });
        push({ type: "paren", extglob: true, value: advance(), output });
        extglobs.push(token);
      };
      const extglobClose = (token) => {
        const literal = input.slice(token.startIndex, state.index + 1);
        const body = input.slice(token.startIndex + 2, state.index);
        const analysis = analyzeRepeatedExtglob(body, opts);
        if ((token.type === "plus" || token.type === "star") && analysis.risky) {
          const safeOutput = analysis.safeOutput ? (token.output ? "" : ONE_CHAR) + (opts.capture ? `(${analysis.safeOutput})` : analysis.safeOutput) : void 0;
          const open = tokens[token.tokensIndex];
          open.type = "text";
          open.value = literal;
          open.output = safeOutput || utils.escapeRegex(literal);
          for (let i = token.tokensIndex + 1; i < tokens.length; i++) {
            tokens[i].value = "";
            tokens[i].output = "";
            delete tokens[i].suffix;
          }
          state.output = token.output + open.output;
          state.backtrack = true;
          push({ type: "paren", extglob: true, value, output: "" });
          decrement("parens");
          return;
        }
        let output = token.close + (opts.capture ? ")" : "");
        let rest;
        if (token.type === "negate") {
          let extglobStar = star;
          if (token.inner && token.inner.length > 1 && token.inner.includes("/")) {
            extglobStar = globstar(opts);
          }
          if (extglobStar !== star || eos() || /^\)+$/.test(remaining())) {
            output = token.close = `)$))${extglobStar}`;
          }
          if (token.inner.includes("*") && (rest = remaining()) && /^\.[^\\/.]+$/.test(rest)) {
            const expression = parse(rest, { ...options, fastpaths: false }).output;
            output = token.close = `)${expression})${extglobStar})`;
          }
          if (token.prev.type === "bos") {
            state.negatedExtglob = true;
          }
        }
        push({ type: "paren", extglob: true, value, output });
        decrement("parens");
      };
      if (opts.fastpaths !== false && !/(^[*!]|[/()[\]{}"])/.test(input)) {
        let backslashes = false;
        let output = input.replace(REGEX_SPECIAL_CHARS_BACKREF, (m, esc, chars, first, rest, index) => {
          if (first === "\\") {
            backslashes = true;
            return m;
          }
          if (first === "?") {
            if (esc) {
              return esc + first + (rest ? QMARK.repeat(rest.length) : "");
            }
            if (index === 0) {
              return qmarkNoDot + (rest ? QMARK.repeat(rest.length) : "");
            }
            return QMARK.repeat(chars.length);
          }
          if (first === ".") {
            return DOT_LITERAL.repeat(chars.length);
          }
          if (first === "*") {
            if (esc) {
              return esc + first + (rest ? star : "");
            }
            return star;
          }
          return esc ? m : `\\${m}`;
        });
        if (backslashes === true) {
          if (opts.unescape === true) {
            output = output.replace(/\\/g, "");
          } else {
            output = output.replace(/\\+/g, (m) => {
              return m.length % 2 === 0 ? "\\\\" : m ? "\\" : "";
            });
          }
        }
        if (output === input && opts.contains === true) {
          state.output = input;
          return state;
        }
        state.output = utils.wrapOutput(output, state, options);
        return state;
      }
      while (!eos()) {
        value = advance();
        if (value === "\0") {
          continue;
        }
        if (value === "\\") {
          const next = peek();
          if (next === "/" && opts.bash !== true) {
            continue;
          }
          if (next === "." || next === ";") {
            continue;
          }
          if (!next) {
            value += "\\";
            push({ type: "text", value });
            continue;
          }
          const match = /^\\+/.exec(remaining());
          let slashes = 0;
          if (match && match[0].length > 2) {
            slashes = match[0].length;
            state.index += slashes;
            if (slashes % 2 !== 0) {
              value += "\\";
            }
          }
          if (opts.unescape === true) {
            value = advance();
          } else {
            value += advance();
          }
          if (state.brackets === 0) {
            push({ type: "text", value });
            continue;
          }
        }
        if (state.brackets > 0 && (value !== "]" || prev.value === "[" || prev.value === "[^")) {
          if (opts.posix !== false && value === ":") {
            const inner = prev.value.slice(1);
            if (inner.includes("[")) {
              prev.posix = true;
              if (inner.includes(":")) {
                const idx = prev.value.lastIndexOf("[");
                const pre = prev.value.slice(0, idx);
                const rest2 = prev.value.slice(idx + 2);
                const posix = POSIX_REGEX_SOURCE[rest2];
                if (posix) {
                  prev.value = pre + posix;
                  state.backtrack = true;
                  advance();
                  if (!bos.output && tokens.indexOf(prev) === 1) {
                    bos.output = ONE_CHAR;
                  }
                  continue;
                }
              }
            }
          }
          if (value === "[" && peek() !== ":" || value === "-" && peek() === "]") {
            value = `\\${value}`;
          }
          if (value === "]" && (prev.value === "[" || prev.value === "[^")) {
            value = `\\${value}`;
          }
          if (opts.posix === true && value === "!" && prev.value === "[") {
            value = "^";
          }
          prev.value += value;
          append({ value });
          continue;
        }
        if (state.quotes === 1 && value !== '"') {
          value = utils.escapeRegex(value);
          prev.value += value;
          append({ value });
          continue;
        }
        if (value === '"') {
          state.quotes = state.quotes === 1 ? 0 : 1;
          if (opts.keepQuotes === true) {
            push({ type: "text", value });
          }
          continue;
        }
        if (value === "(") {
          increment("parens");
          push({ type: "paren", value });
          continue;
        }
        if (value === ")") {
          if (state.parens === 0 && opts.strictBrackets === true) {
            throw new SyntaxError(syntaxError("opening", "("));
          }
          const extglob = extglobs[extglobs.length - 1];
          if (extglob && state.parens === extglob.parens + 1) {
            extglobClose(extglobs.pop());
            continue;
          }
          push({ type: "paren", value, output: state.parens ? ")" : "\\)" });
          decrement("parens");
          continue;
        }
        if (value === "[") {
          if (opts.nobracket === true || !remaining().includes("]")) {
            if (opts.nobracket !== true && opts.strictBrackets === true) {
              throw new SyntaxError(syntaxError("closing", "]"));
            }
            value = `\\${value}`;
          } else {
            increment("brackets");
          }
          push({ type: "bracket", value });
          continue;
        }
        if (value === "]") {
          if (opts.nobracket === true || prev && prev.type === "bracket" && prev.value.length === 1) {
            push({ type: "text", value, output: `\\${value}` });
            continue;
          }
          if (state.brackets === 0) {
            if (opts.strictBrackets === true) {
              throw new SyntaxError(syntaxError("opening", "["));
            }
            push({ type: "text", value, output: `\\${value}` });
            continue;
          }
          decrement("brackets");
          const prevValue = prev.value.slice(1);
          if (prev.posix !== true && prevValue[0] === "^" && !prevValue.includes("/")) {
            value = `/${value}`;
          }
          prev.value += value;
          append({ value });
          if (opts.literalBrackets === false || utils.hasRegexChars(prevValue)) {
            continue;
          }
          const escaped = utils.escapeRegex(prev.value);
          state.output = state.output.slice(0, -prev.value.length);
          if (opts.literalBrackets === true) {
            state.output += escaped;
            prev.value = escaped;
            continue;
          }
          prev.value = `(${capture}${escaped}|${prev.value})`;
          state.output += prev.value;
          continue;
        }
        if (value === "{" && opts.nobrace !== true) {
          increment("braces");
          const open = {
            type: "brace",
            value,
            output: "(",
            outputIndex: state.output.length,
            tokensIndex: state.tokens.length
          };
          braces.push(open);
          push(open);
          continue;
        }
        if (value === "}") {
          const brace = braces[braces.length - 1];
          if (opts.nobrace === true || !brace) {
            push({ type: "text", value, output: value });
            continue;
          }
          let output = ")";
          if (brace.dots === true) {
            const arr = tokens.slice();
            const range = [];
            for (let i = arr.length - 1; i >= 0; i--) {
              tokens.pop();
              if (arr[i].type === "brace") {
                break;
              }
              if (arr[i].type !== "dots") {
                range.unshift(arr[i].value);
              }
            }
            output = expandRange(range, opts);
            state.backtrack = true;
          }
          if (brace.comma !== true && brace.dots !== true) {
            const out = state.output.slice(0, brace.outputIndex);
            const toks = state.tokens.slice(brace.tokensIndex);
            brace.value = brace.output = "\\{";
            value = output = "\\}";
            state.output = out;
            for (const t of toks) {
              state.output += t.output || t.value;
            }
          }
          push({ type: "brace", value, output });
          decrement("braces");
          braces.pop();
          continue;
        }
        if (value === "|") {
          if (extglobs.length > 0) {
            extglobs[extglobs.length - 1].conditions++;
          }
          push({ type: "text", value });
          continue;
        }
        if (value === ",") {
          let output = value;
          const brace = braces[braces.length - 1];
          if (brace && stack[stack.length - 1] === "braces") {
            brace.comma = true;
            output = "|";
          }
          push({ type: "comma", value, output });
          continue;
        }
        if (value === "/") {
          if (prev.type === "dot" && state.index === state.start + 1) {
            state.start = state.index + 1;
            state.consumed = "";
            state.output = "";
            tokens.pop();
            prev = bos;
            continue;
          }
          push({ type: "slash", value, output: SLASH_LITERAL });
          continue;
        }
        if (value === ".") {
          if (state.braces > 0 && prev.type === "dot") {
            if (prev.value === ".") prev.output = DOT_LITERAL;
            const brace = braces[braces.length - 1];
            prev.type = "dots";
            prev.output += value;
            prev.value += value;
            brace.dots = true;
            continue;
          }
          if (state.braces + state.parens === 0 && prev.type !== "bos" && prev.type !== "slash") {
            push({ type: "text", value, output: DOT_LITERAL });
            continue;
          }
          push({ type: "dot", value, output: DOT_LITERAL });
          continue;
        }
        if (value === "?") {
          const isGroup = prev && prev.value === "(";
          if (!isGroup && opts.noextglob !== true && peek() === "(" && peek(2) !== "?") {
            extglobOpen("qmark", value);
            continue;
          }
          if (prev && prev.type === "paren") {
            const next = peek();
            let output = value;
            if (prev.value === "(" && !/[!=<:]/.test(next) || next === "<" && !/<([!=]|\w+>)/.test(remaining())) {
              output = `\\${value}`;
            }
            push({ type: "text", value, output });
            continue;
          }
          if (opts.dot !== true && (prev.type === "slash" || prev.type === "bos")) {
            push({ type: "qmark", value, output: QMARK_NO_DOT });
            continue;
          }
          push({ type: "qmark", value, output: QMARK });
          continue;
        }
        if (value === "!") {
          if (opts.noextglob !== true && peek() === "(") {
            if (peek(2) !== "?" || !/[!=<:]/.test(peek(3))) {
              extglobOpen("negate", value);
              continue;
            }
          }
          if (opts.nonegate !== true && state.index === 0) {
            negate();
            continue;
          }
        }
        if (value === "+") {
          if (opts.noextglob !== true && peek() === "(" && peek(2) !== "?") {
            extglobOpen("plus", value);
            continue;
          }
          if (prev && prev.value === "(" || opts.regex === false) {
            push({ type: "plus", value, output: PLUS_LITERAL });
            continue;
          }
          if (prev && (prev.type === "bracket" || prev.type === "paren" || prev.type === "brace") || state.parens > 0) {
            push({ type: "plus", value });
            continue;
          }
          push({ type: "plus", value: PLUS_LITERAL });
          continue;
        }
        if (value === "@") {
          if (opts.noextglob !== true && peek() === "(" && peek(2) !== "?") {
            push({ type: "at", extglob: true, value, output: "" });
            continue;
          }
          push({ type: "text", value });
          continue;
        }
        if (value !== "*") {
          if (value === "$" || value === "^") {
            value = `\\${value}`;
          }
          const match = REGEX_NON_SPECIAL_CHARS.exec(remaining());
          if (match) {
            value += match[0];
            state.index += match[0].length;
          }
          push({ type: "text", value });
          continue;
        }
        if (prev && (prev.type === "globstar" || prev.star === true)) {
          prev.type = "star";
          prev.star = true;
          prev.value += value;
          prev.output = star;
          state.backtrack = true;
          state.globstar = true;
          consume(value);
          continue;
        }
        let rest = remaining();
        if (opts.noextglob !== true && /^\([^?]/.test(rest)) {
          extglobOpen("star", value);
          continue;
        }
        if (prev.type === "star") {
          if (opts.noglobstar === true) {
            consume(value);
            continue;
          }
          const prior = prev.prev;
          const before = prior.prev;
          const isStart = prior.type === "slash" || prior.type === "bos";
          const afterStar = before && (before.type === "star" || before.type === "globstar");
          if (opts.bash === true && (!isStart || rest[0] && rest[0] !== "/")) {
            push({ type: "star", value, output: "" });
            continue;
          }
          const isBrace = state.braces > 0 && (prior.type === "comma" || prior.type === "brace");
          const isExtglob = extglobs.length && (prior.type === "pipe" || prior.type === "paren");
          if (!isStart && prior.type !== "paren" && !isBrace && !isExtglob) {
            push({ type: "star", value, output: "" });
            continue;
          }
          while (rest.slice(0, 3) === "/**") {
            const after = input[state.index + 4];
            if (after && after !== "/") {
              break;
            }
            rest = rest.slice(3);
            consume("/**", 3);
          }
          const isEnd = eos() || state.parens > 0 && rest === ")".repeat(state.parens) && !extglobs.some((extglob) => extglob.type === "negate");
          if (prior.type === "bos" && eos()) {
            prev.type = "globstar";
            prev.value += value;
            prev.output = globstar(opts);
            state.output = prev.output;
            state.globstar = true;
            consume(value);
            continue;
          }
          if (prior.type === "slash" && prior.prev.type !== "bos" && !afterStar && isEnd) {
            state.output = state.output.slice(0, -(prior.output + prev.output).length);
            prior.output = `(?:${prior.output}`;
            prev.type = "globstar";
            prev.output = globstar(opts) + (opts.strictSlashes ? ")" : "|$)");
            prev.value += value;
            state.globstar = true;
            state.output += prior.output + prev.output;
            consume(value);
            continue;
          }
          if (prior.type === "slash" && prior.prev.type !== "bos" && rest[0] === "/") {
            const end = rest[1] !== void 0 ? "|$" : "";
            state.output = state.output.slice(0, -(prior.output + prev.output).length);
            prior.output = `(?:${prior.output}`;
            prev.type = "globstar";
            prev.output = `${globstar(opts)}${SLASH_LITERAL}|${SLASH_LITERAL}${end})`;
            prev.value += value;
            state.output += prior.output + prev.output;
            state.globstar = true;
            consume(value + advance());
            push({ type: "slash", value: "/", output: "" });
            continue;
          }
          if (prior.type === "bos" && rest[0] === "/") {
            prev.type = "globstar";
            prev.value += value;
            prev.output = `(?:^|${SLASH_LITERAL}|${globstar(opts)}${SLASH_LITERAL})`;
            state.output = prev.output;
            state.globstar = true;
            consume(value + advance());
            push({ type: "slash", value: "/", output: "" });
            continue;
          }
          state.output = state.output.slice(0, -prev.output.length);
          prev.type = "globstar";
          prev.output = globstar(opts);
          prev.value += value;
          state.output += prev.output;
          state.globstar = true;
          consume(value);
          continue;
        }
        const token = { type: "star", value, output: star };
        if (opts.bash === true) {
          token.output = ".*?";
          if (prev.type === "bos" || prev.type === "slash") {
            token.output = nodot + token.output;
          }
          push(token);
          continue;
        }
        if (prev && (prev.type === "bracket" || prev.type === "paren") && opts.regex === true) {
          token.output = value;
          push(token);
          continue;
        }
        if (state.index === state.start || prev.type === "slash" || prev.type === "dot") {
          if (prev.type === "dot") {
            state.output += NO_DOT_SLASH;
            prev.output += NO_DOT_SLASH;
          } else if (opts.dot === true) {
            state.output += NO_DOTS_SLASH;
            prev.output += NO_DOTS_SLASH;
          } else {
            state.output += nodot;
            prev.output += nodot;
          }
          if (peek() !== "*") {
            state.output += ONE_CHAR;
            prev.output += ONE_CHAR;
          }
        }
        push(token);
      }
      while (state.brackets > 0) {
        if (opts.strictBrackets === true) throw new SyntaxError(syntaxError("closing", "]"));
        state.output = utils.escapeLast(state.output, "[");
        decrement("brackets");
      }
      while (state.parens > 0) {
        if (opts.strictBrackets === true) throw new SyntaxError(syntaxError("closing", ")"));
        state.output = utils.escapeLast(state.output, "(");
        decrement("parens");
      }
      while (state.braces > 0) {
        if (opts.strictBrackets === true) throw new SyntaxError(syntaxError("closing", "}"));
        state.output = utils.escapeLast(state.output, "{");
        decrement("braces");
      }
      if (opts.strictSlashes !== true && (prev.type === "star" || prev.type === "bracket")) {
        push({ type: "maybe_slash", value: "", output: `${SLASH_LITERAL}?` });
      }
      if (state.backtrack === true) {
        state.output = "";
        for (const token of state.tokens) {
          state.output += token.output != null ? token.output : token.value;
          if (token.suffix) {
            state.output += token.suffix;
          }
        }
      }
      return state;
    };
    parse.fastpaths = (input, options) => {
      const opts = { ...options };
      const max = typeof opts.maxLength === "number" ? Math.min(MAX_LENGTH, opts.maxLength) : MAX_LENGTH;
      const len = input.length;
      if (len > max) {
        throw new SyntaxError(`Input length: ${len}, exceeds maximum allowed length: ${max}`);
      }
      input = REPLACEMENTS[input] || input;
      const {
        DOT_LITERAL,
        SLASH_LITERAL,
        ONE_CHAR,
        DOTS_SLASH,
        NO_DOT,
        NO_DOTS,
        NO_DOTS_SLASH,
        STAR,
        START_ANCHOR
      } = constants.globChars(opts.windows);
      const nodot = opts.dot ? NO_DOTS : NO_DOT;
      const slashDot = opts.dot ? NO_DOTS_SLASH : NO_DOT;
      const capture = opts.capture ? "" : "?:";
      const state = { negated: false, prefix: "" };
      let star = opts.bash === true ? ".*?" : STAR;
      if (opts.capture) {
        star = `(${star})`;
      }
      const globstar = (opts2) => {
        if (opts2.noglobstar === true) return star;
        return `(${capture}(?:(?!${START_ANCHOR}${opts2.dot ? DOTS_SLASH : DOT_LITERAL}).)*?)`;
      };
      const create = (str) => {
        switch (str) {
          case "*":
            return `${nodot}${ONE_CHAR}${star}`;
          case ".*":
            return `${DOT_LITERAL}${ONE_CHAR}${star}`;
          case "*.*":
            return `${nodot}${star}${DOT_LITERAL}${ONE_CHAR}${star}`;
          case "*/*":
            return `${nodot}${star}${SLASH_LITERAL}${ONE_CHAR}${slashDot}${star}`;
          case "**":
            return nodot + globstar(opts);
          case "**/*":
            return `(?:${nodot}${globstar(opts)}${SLASH_LITERAL})?${slashDot}${ONE_CHAR}${star}`;
          case "**/*.*":
            return `(?:${nodot}${globstar(opts)}${SLASH_LITERAL})?${slashDot}${star}${DOT_LITERAL}${ONE_CHAR}${star}`;
          case "**/.*":
            return `(?:${nodot}${globstar(opts)}${SLASH_LITERAL})?${DOT_LITERAL}${ONE_CHAR}${star}`;
          default: {
            const match = /^(.*?)\.(\w+)$/.exec(str);
            if (!match) return;
            const source2 = create(match[1]);
            if (!source2) return;
            return source2 + DOT_LITERAL + match[2];
          }
        }
      };
      const output = utils.removePrefix(input, state);
      let source = create(output);
      if (source && opts.strictSlashes !== true) {
        source += `${SLASH_LITERAL}?`;
      }
      return source;
    };
    module.exports = parse;
  }
});

// node_modules/picomatch/lib/picomatch.js
var require_picomatch = __commonJS({
  "node_modules/picomatch/lib/picomatch.js"(exports, module) {
    "use strict";
    var scan = require_scan();
    var parse = require_parse();
    var utils = require_utils();
    var constants = require_constants();
    var isObject = (val) => val && typeof val === "object" && !Array.isArray(val);
    var picomatch2 = (glob, options, returnState = false) => {
      if (Array.isArray(glob)) {
        const fns = glob.map((input) => picomatch2(input, options, returnState));
        const arrayMatcher = (str) => {
          for (const isMatch of fns) {
            const state2 = isMatch(str);
            if (state2) return state2;
          }
          return false;
        };
        return arrayMatcher;
      }
      const isState = isObject(glob) && glob.tokens && glob.input;
      if (glob === "" || typeof glob !== "string" && !isState) {
        throw new TypeError("Expected pattern to be a non-empty string");
      }
      const opts = options || {};
      const posix = opts.windows;
      const regex = isState ? picomatch2.compileRe(glob, options) : picomatch2.makeRe(glob, options, false, true);
      const state = regex.state;
      delete regex.state;
      let isIgnored = () => false;
      if (opts.ignore) {
        const ignoreOpts = { ...options, ignore: null, onMatch: null, onResult: null };
        isIgnored = picomatch2(opts.ignore, ignoreOpts, returnState);
      }
      const matcher = (input, returnObject = false) => {
        const { isMatch, match, output } = picomatch2.test(input, regex, options, { glob, posix });
        const result = { glob, state, regex, posix, input, output, match, isMatch };
        if (typeof opts.onResult === "function") {
          opts.onResult(result);
        }
        if (isMatch === false) {
          result.isMatch = false;
          return returnObject ? result : false;
        }
        if (isIgnored(input)) {
          if (typeof opts.onIgnore === "function") {
            opts.onIgnore(result);
          }
          result.isMatch = false;
          return returnObject ? result : false;
        }
        if (typeof opts.onMatch === "function") {
          opts.onMatch(result);
        }
        return returnObject ? result : true;
      };
      if (returnState) {
        matcher.state = state;
      }
      return matcher;
    };
    picomatch2.test = (input, regex, options, { glob, posix } = {}) => {
      if (typeof input !== "string") {
        throw new TypeError("Expected input to be a string");
      }
      if (input === "") {
        return { isMatch: false, output: "" };
      }
      const opts = options || {};
      const format = opts.format || (posix ? utils.toPosixSlashes : null);
      let match = input === glob;
      let output = match && format ? format(input) : input;
      if (match === false) {
        output = format ? format(input) : input;
        match = output === glob;
      }
      if (match === false || opts.capture === true) {
        if (opts.matchBase === true || opts.basename === true) {
          match = picomatch2.matchBase(input, regex, options, posix);
        } else {
          match = regex.exec(output);
        }
      }
      return { isMatch: Boolean(match), match, output };
    };
    picomatch2.matchBase = (input, glob, options, posix = options && options.windows) => {
      const regex = glob instanceof RegExp ? glob : picomatch2.makeRe(glob, options);
      return regex.test(utils.basename(input, { windows: posix }));
    };
    picomatch2.isMatch = (str, patterns, options) => picomatch2(patterns, options)(str);
    picomatch2.parse = (pattern, options) => {
      if (Array.isArray(pattern)) return pattern.map((p) => picomatch2.parse(p, options));
      return parse(pattern, { ...options, fastpaths: false });
    };
    picomatch2.scan = (input, options) => scan(input, options);
    picomatch2.compileRe = (state, options, returnOutput = false, returnState = false) => {
      if (returnOutput === true) {
        return state.output;
      }
      const opts = options || {};
      const prepend = opts.contains ? "" : "^";
      const append = opts.contains ? "" : "$";
      let source = `${prepend}(?:${state.output})${append}`;
      if (state && state.negated === true) {
        source = `^(?!${source}).*$`;
      }
      const regex = picomatch2.toRegex(source, options);
      if (returnState === true) {
        regex.state = state;
      }
      return regex;
    };
    picomatch2.makeRe = (input, options = {}, returnOutput = false, returnState = false) => {
      if (!input || typeof input !== "string") {
        throw new TypeError("Expected a non-empty string");
      }
      let parsed = { negated: false, fastpaths: true };
      if (options.fastpaths !== false && (input[0] === "." || input[0] === "*")) {
        parsed.output = parse.fastpaths(input, options);
      }
      if (!parsed.output) {
        parsed = parse(input, options);
      }
      return picomatch2.compileRe(parsed, options, returnOutput, returnState);
    };
    picomatch2.toRegex = (source, options) => {
      try {
        const opts = options || {};
        return new RegExp(source, opts.flags || (opts.nocase ? "i" : ""));
      } catch (err) {
        if (options && options.debug === true) throw err;
        return /$^/;
      }
    };
    picomatch2.constants = constants;
    module.exports = picomatch2;
  }
});

// node_modules/picomatch/index.js
var require_picomatch2 = __commonJS({
  "node_modules/picomatch/index.js"(exports, module) {
    "use strict";
    var pico = require_picomatch();
    var utils = require_utils();
    function picomatch2(glob, options, returnState = false) {
      if (options && (options.windows === null || options.windows === void 0)) {
        options = { ...options, windows: utils.isWindows() };
      }
      return pico(glob, options, returnState);
    }
    Object.assign(picomatch2, pico);
    module.exports = picomatch2;
  }
});

// node_modules/ajv/dist/compile/codegen/code.js
var require_code = __commonJS({
  "node_modules/ajv/dist/compile/codegen/code.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.regexpCode = exports.getEsmExportName = exports.getProperty = exports.safeStringify = exports.stringify = exports.strConcat = exports.addCodeArg = exports.str = exports._ = exports.nil = exports._Code = exports.Name = exports.IDENTIFIER = exports._CodeOrName = void 0;
    var _CodeOrName = class {
    };
    exports._CodeOrName = _CodeOrName;
    exports.IDENTIFIER = /^[a-z$_][a-z$_0-9]*$/i;
    var Name = class extends _CodeOrName {
      constructor(s) {
        super();
        if (!exports.IDENTIFIER.test(s))
          throw new Error("CodeGen: name must be a valid identifier");
        this.str = s;
      }
      toString() {
        return this.str;
      }
      emptyStr() {
        return false;
      }
      get names() {
        return { [this.str]: 1 };
      }
    };
    exports.Name = Name;
    var _Code = class extends _CodeOrName {
      constructor(code) {
        super();
        this._items = typeof code === "string" ? [code] : code;
      }
      toString() {
        return this.str;
      }
      emptyStr() {
        if (this._items.length > 1)
          return false;
        const item = this._items[0];
        return item === "" || item === '""';
      }
      get str() {
        var _a;
        return (_a = this._str) !== null && _a !== void 0 ? _a : this._str = this._items.reduce((s, c) => `${s}${c}`, "");
      }
      get names() {
        var _a;
        return (_a = this._names) !== null && _a !== void 0 ? _a : this._names = this._items.reduce((names, c) => {
          if (c instanceof Name)
            names[c.str] = (names[c.str] || 0) + 1;
          return names;
        }, {});
      }
    };
    exports._Code = _Code;
    exports.nil = new _Code("");
    function _(strs, ...args) {
      const code = [strs[0]];
      let i = 0;
      while (i < args.length) {
        addCodeArg(code, args[i]);
        code.push(strs[++i]);
      }
      return new _Code(code);
    }
    exports._ = _;
    var plus = new _Code("+");
    function str(strs, ...args) {
      const expr = [safeStringify(strs[0])];
      let i = 0;
      while (i < args.length) {
        expr.push(plus);
        addCodeArg(expr, args[i]);
        expr.push(plus, safeStringify(strs[++i]));
      }
      optimize(expr);
      return new _Code(expr);
    }
    exports.str = str;
    function addCodeArg(code, arg) {
      if (arg instanceof _Code)
        code.push(...arg._items);
      else if (arg instanceof Name)
        code.push(arg);
      else
        code.push(interpolate(arg));
    }
    exports.addCodeArg = addCodeArg;
    function optimize(expr) {
      let i = 1;
      while (i < expr.length - 1) {
        if (expr[i] === plus) {
          const res = mergeExprItems(expr[i - 1], expr[i + 1]);
          if (res !== void 0) {
            expr.splice(i - 1, 3, res);
            continue;
          }
          expr[i++] = "+";
        }
        i++;
      }
    }
    function mergeExprItems(a, b) {
      if (b === '""')
        return a;
      if (a === '""')
        return b;
      if (typeof a == "string") {
        if (b instanceof Name || a[a.length - 1] !== '"')
          return;
        if (typeof b != "string")
          return `${a.slice(0, -1)}${b}"`;
        if (b[0] === '"')
          return a.slice(0, -1) + b.slice(1);
        return;
      }
      if (typeof b == "string" && b[0] === '"' && !(a instanceof Name))
        return `"${a}${b.slice(1)}`;
      return;
    }
    function strConcat(c1, c2) {
      return c2.emptyStr() ? c1 : c1.emptyStr() ? c2 : str`${c1}${c2}`;
    }
    exports.strConcat = strConcat;
    function interpolate(x) {
      return typeof x == "number" || typeof x == "boolean" || x === null ? x : safeStringify(Array.isArray(x) ? x.join(",") : x);
    }
    function stringify(x) {
      return new _Code(safeStringify(x));
    }
    exports.stringify = stringify;
    function safeStringify(x) {
      return JSON.stringify(x).replace(/\u2028/g, "\\u2028").replace(/\u2029/g, "\\u2029");
    }
    exports.safeStringify = safeStringify;
    function getProperty(key) {
      return typeof key == "string" && exports.IDENTIFIER.test(key) ? new _Code(`.${key}`) : _`[${key}]`;
    }
    exports.getProperty = getProperty;
    function getEsmExportName(key) {
      if (typeof key == "string" && exports.IDENTIFIER.test(key)) {
        return new _Code(`${key}`);
      }
      throw new Error(`CodeGen: invalid export name: ${key}, use explicit $id name mapping`);
    }
    exports.getEsmExportName = getEsmExportName;
    function regexpCode(rx) {
      return new _Code(rx.toString());
    }
    exports.regexpCode = regexpCode;
  }
});

// node_modules/ajv/dist/compile/codegen/scope.js
var require_scope = __commonJS({
  "node_modules/ajv/dist/compile/codegen/scope.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.ValueScope = exports.ValueScopeName = exports.Scope = exports.varKinds = exports.UsedValueState = void 0;
    var code_1 = require_code();
    var ValueError = class extends Error {
      constructor(name) {
        super(`CodeGen: "code" for ${name} not defined`);
        this.value = name.value;
      }
    };
    var UsedValueState;
    (function(UsedValueState2) {
      UsedValueState2[UsedValueState2["Started"] = 0] = "Started";
      UsedValueState2[UsedValueState2["Completed"] = 1] = "Completed";
    })(UsedValueState || (exports.UsedValueState = UsedValueState = {}));
    exports.varKinds = {
      const: new code_1.Name("const"),
      let: new code_1.Name("let"),
      var: new code_1.Name("var")
    };
    var Scope = class {
      constructor({ prefixes, parent } = {}) {
        this._names = {};
        this._prefixes = prefixes;
        this._parent = parent;
      }
      toName(nameOrPrefix) {
        return nameOrPrefix instanceof code_1.Name ? nameOrPrefix : this.name(nameOrPrefix);
      }
      name(prefix) {
        return new code_1.Name(this._newName(prefix));
      }
      _newName(prefix) {
        const ng = this._names[prefix] || this._nameGroup(prefix);
        return `${prefix}${ng.index++}`;
      }
      _nameGroup(prefix) {
        var _a, _b;
        if (((_b = (_a = this._parent) === null || _a === void 0 ? void 0 : _a._prefixes) === null || _b === void 0 ? void 0 : _b.has(prefix)) || this._prefixes && !this._prefixes.has(prefix)) {
          throw new Error(`CodeGen: prefix "${prefix}" is not allowed in this scope`);
        }
        return this._names[prefix] = { prefix, index: 0 };
      }
    };
    exports.Scope = Scope;
    var ValueScopeName = class extends code_1.Name {
      constructor(prefix, nameStr) {
        super(nameStr);
        this.prefix = prefix;
      }
      setValue(value, { property, itemIndex }) {
        this.value = value;
        this.scopePath = (0, code_1._)`.${new code_1.Name(property)}[${itemIndex}]`;
      }
    };
    exports.ValueScopeName = ValueScopeName;
    var line = (0, code_1._)`\n`;
    var ValueScope = class extends Scope {
      constructor(opts) {
        super(opts);
        this._values = {};
        this._scope = opts.scope;
        this.opts = { ...opts, _n: opts.lines ? line : code_1.nil };
      }
      get() {
        return this._scope;
      }
      name(prefix) {
        return new ValueScopeName(prefix, this._newName(prefix));
      }
      value(nameOrPrefix, value) {
        var _a;
        if (value.ref === void 0)
          throw new Error("CodeGen: ref must be passed in value");
        const name = this.toName(nameOrPrefix);
        const { prefix } = name;
        const valueKey = (_a = value.key) !== null && _a !== void 0 ? _a : value.ref;
        let vs = this._values[prefix];
        if (vs) {
          const _name = vs.get(valueKey);
          if (_name)
            return _name;
        } else {
          vs = this._values[prefix] = /* @__PURE__ */ new Map();
        }
        vs.set(valueKey, name);
        const s = this._scope[prefix] || (this._scope[prefix] = []);
        const itemIndex = s.length;
        s[itemIndex] = value.ref;
        name.setValue(value, { property: prefix, itemIndex });
        return name;
      }
      getValue(prefix, keyOrRef) {
        const vs = this._values[prefix];
        if (!vs)
          return;
        return vs.get(keyOrRef);
      }
      scopeRefs(scopeName, values = this._values) {
        return this._reduceValues(values, (name) => {
          if (name.scopePath === void 0)
            throw new Error(`CodeGen: name "${name}" has no value`);
          return (0, code_1._)`${scopeName}${name.scopePath}`;
        });
      }
      scopeCode(values = this._values, usedValues, getCode) {
        return this._reduceValues(values, (name) => {
          if (name.value === void 0)
            throw new Error(`CodeGen: name "${name}" has no value`);
          return name.value.code;
        }, usedValues, getCode);
      }
      _reduceValues(values, valueCode, usedValues = {}, getCode) {
        let code = code_1.nil;
        for (const prefix in values) {
          const vs = values[prefix];
          if (!vs)
            continue;
          const nameSet = usedValues[prefix] = usedValues[prefix] || /* @__PURE__ */ new Map();
          vs.forEach((name) => {
            if (nameSet.has(name))
              return;
            nameSet.set(name, UsedValueState.Started);
            let c = valueCode(name);
            if (c) {
              const def = this.opts.es5 ? exports.varKinds.var : exports.varKinds.const;
              code = (0, code_1._)`${code}${def} ${name} = ${c};${this.opts._n}`;
            } else if (c = getCode === null || getCode === void 0 ? void 0 : getCode(name)) {
              code = (0, code_1._)`${code}${c}${this.opts._n}`;
            } else {
              throw new ValueError(name);
            }
            nameSet.set(name, UsedValueState.Completed);
          });
        }
        return code;
      }
    };
    exports.ValueScope = ValueScope;
  }
});

// node_modules/ajv/dist/compile/codegen/index.js
var require_codegen = __commonJS({
  "node_modules/ajv/dist/compile/codegen/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.or = exports.and = exports.not = exports.CodeGen = exports.operators = exports.varKinds = exports.ValueScopeName = exports.ValueScope = exports.Scope = exports.Name = exports.regexpCode = exports.stringify = exports.getProperty = exports.nil = exports.strConcat = exports.str = exports._ = void 0;
    var code_1 = require_code();
    var scope_1 = require_scope();
    var code_2 = require_code();
    Object.defineProperty(exports, "_", { enumerable: true, get: function() {
      return code_2._;
    } });
    Object.defineProperty(exports, "str", { enumerable: true, get: function() {
      return code_2.str;
    } });
    Object.defineProperty(exports, "strConcat", { enumerable: true, get: function() {
      return code_2.strConcat;
    } });
    Object.defineProperty(exports, "nil", { enumerable: true, get: function() {
      return code_2.nil;
    } });
    Object.defineProperty(exports, "getProperty", { enumerable: true, get: function() {
      return code_2.getProperty;
    } });
    Object.defineProperty(exports, "stringify", { enumerable: true, get: function() {
      return code_2.stringify;
    } });
    Object.defineProperty(exports, "regexpCode", { enumerable: true, get: function() {
      return code_2.regexpCode;
    } });
    Object.defineProperty(exports, "Name", { enumerable: true, get: function() {
      return code_2.Name;
    } });
    var scope_2 = require_scope();
    Object.defineProperty(exports, "Scope", { enumerable: true, get: function() {
      return scope_2.Scope;
    } });
    Object.defineProperty(exports, "ValueScope", { enumerable: true, get: function() {
      return scope_2.ValueScope;
    } });
    Object.defineProperty(exports, "ValueScopeName", { enumerable: true, get: function() {
      return scope_2.ValueScopeName;
    } });
    Object.defineProperty(exports, "varKinds", { enumerable: true, get: function() {
      return scope_2.varKinds;
    } });
    exports.operators = {
      GT: new code_1._Code(">"),
      GTE: new code_1._Code(">="),
      LT: new code_1._Code("<"),
      LTE: new code_1._Code("<="),
      EQ: new code_1._Code("==="),
      NEQ: new code_1._Code("!=="),
      NOT: new code_1._Code("!"),
      OR: new code_1._Code("||"),
      AND: new code_1._Code("&&"),
      ADD: new code_1._Code("+")
    };
    var Node = class {
      optimizeNodes() {
        return this;
      }
      optimizeNames(_names, _constants) {
        return this;
      }
    };
    var Def = class extends Node {
      constructor(varKind, name, rhs) {
        super();
        this.varKind = varKind;
        this.name = name;
        this.rhs = rhs;
      }
      render({ es5, _n }) {
        const varKind = es5 ? scope_1.varKinds.var : this.varKind;
        const rhs = this.rhs === void 0 ? "" : ` = ${this.rhs}`;
        return `${varKind} ${this.name}${rhs};` + _n;
      }
      optimizeNames(names, constants) {
        if (!names[this.name.str])
          return;
        if (this.rhs)
          this.rhs = optimizeExpr(this.rhs, names, constants);
        return this;
      }
      get names() {
        return this.rhs instanceof code_1._CodeOrName ? this.rhs.names : {};
      }
    };
    var Assign = class extends Node {
      constructor(lhs, rhs, sideEffects) {
        super();
        this.lhs = lhs;
        this.rhs = rhs;
        this.sideEffects = sideEffects;
      }
      render({ _n }) {
        return `${this.lhs} = ${this.rhs};` + _n;
      }
      optimizeNames(names, constants) {
        if (this.lhs instanceof code_1.Name && !names[this.lhs.str] && !this.sideEffects)
          return;
        this.rhs = optimizeExpr(this.rhs, names, constants);
        return this;
      }
      get names() {
        const names = this.lhs instanceof code_1.Name ? {} : { ...this.lhs.names };
        return addExprNames(names, this.rhs);
      }
    };
    var AssignOp = class extends Assign {
      constructor(lhs, op, rhs, sideEffects) {
        super(lhs, rhs, sideEffects);
        this.op = op;
      }
      render({ _n }) {
        return `${this.lhs} ${this.op}= ${this.rhs};` + _n;
      }
    };
    var Label = class extends Node {
      constructor(label) {
        super();
        this.label = label;
        this.names = {};
      }
      render({ _n }) {
        return `${this.label}:` + _n;
      }
    };
    var Break = class extends Node {
      constructor(label) {
        super();
        this.label = label;
        this.names = {};
      }
      render({ _n }) {
        const label = this.label ? ` ${this.label}` : "";
        return `break${label};` + _n;
      }
    };
    var Throw = class extends Node {
      constructor(error) {
        super();
        this.error = error;
      }
      render({ _n }) {
        return `throw ${this.error};` + _n;
      }
      get names() {
        return this.error.names;
      }
    };
    var AnyCode = class extends Node {
      constructor(code) {
        super();
        this.code = code;
      }
      render({ _n }) {
        return `${this.code};` + _n;
      }
      optimizeNodes() {
        return `${this.code}` ? this : void 0;
      }
      optimizeNames(names, constants) {
        this.code = optimizeExpr(this.code, names, constants);
        return this;
      }
      get names() {
        return this.code instanceof code_1._CodeOrName ? this.code.names : {};
      }
    };
    var ParentNode = class extends Node {
      constructor(nodes = []) {
        super();
        this.nodes = nodes;
      }
      render(opts) {
        return this.nodes.reduce((code, n) => code + n.render(opts), "");
      }
      optimizeNodes() {
        const { nodes } = this;
        let i = nodes.length;
        while (i--) {
          const n = nodes[i].optimizeNodes();
          if (Array.isArray(n))
            nodes.splice(i, 1, ...n);
          else if (n)
            nodes[i] = n;
          else
            nodes.splice(i, 1);
        }
        return nodes.length > 0 ? this : void 0;
      }
      optimizeNames(names, constants) {
        const { nodes } = this;
        let i = nodes.length;
        while (i--) {
          const n = nodes[i];
          if (n.optimizeNames(names, constants))
            continue;
          subtractNames(names, n.names);
          nodes.splice(i, 1);
        }
        return nodes.length > 0 ? this : void 0;
      }
      get names() {
        return this.nodes.reduce((names, n) => addNames(names, n.names), {});
      }
    };
    var BlockNode = class extends ParentNode {
      render(opts) {
        return "{" + opts._n + super.render(opts) + "}" + opts._n;
      }
    };
    var Root = class extends ParentNode {
    };
    var Else = class extends BlockNode {
    };
    Else.kind = "else";
    var If = class _If extends BlockNode {
      constructor(condition, nodes) {
        super(nodes);
        this.condition = condition;
      }
      render(opts) {
        let code = `if(${this.condition})` + super.render(opts);
        if (this.else)
          code += "else " + this.else.render(opts);
        return code;
      }
      optimizeNodes() {
        super.optimizeNodes();
        const cond = this.condition;
        if (cond === true)
          return this.nodes;
        let e = this.else;
        if (e) {
          const ns = e.optimizeNodes();
          e = this.else = Array.isArray(ns) ? new Else(ns) : ns;
        }
        if (e) {
          if (cond === false)
            return e instanceof _If ? e : e.nodes;
          if (this.nodes.length)
            return this;
          return new _If(not(cond), e instanceof _If ? [e] : e.nodes);
        }
        if (cond === false || !this.nodes.length)
          return void 0;
        return this;
      }
      optimizeNames(names, constants) {
        var _a;
        this.else = (_a = this.else) === null || _a === void 0 ? void 0 : _a.optimizeNames(names, constants);
        if (!(super.optimizeNames(names, constants) || this.else))
          return;
        this.condition = optimizeExpr(this.condition, names, constants);
        return this;
      }
      get names() {
        const names = super.names;
        addExprNames(names, this.condition);
        if (this.else)
          addNames(names, this.else.names);
        return names;
      }
    };
    If.kind = "if";
    var For = class extends BlockNode {
    };
    For.kind = "for";
    var ForLoop = class extends For {
      constructor(iteration) {
        super();
        this.iteration = iteration;
      }
      render(opts) {
        return `for(${this.iteration})` + super.render(opts);
      }
      optimizeNames(names, constants) {
        if (!super.optimizeNames(names, constants))
          return;
        this.iteration = optimizeExpr(this.iteration, names, constants);
        return this;
      }
      get names() {
        return addNames(super.names, this.iteration.names);
      }
    };
    var ForRange = class extends For {
      constructor(varKind, name, from, to) {
        super();
        this.varKind = varKind;
        this.name = name;
        this.from = from;
        this.to = to;
      }
      render(opts) {
        const varKind = opts.es5 ? scope_1.varKinds.var : this.varKind;
        const { name, from, to } = this;
        return `for(${varKind} ${name}=${from}; ${name}<${to}; ${name}++)` + super.render(opts);
      }
      get names() {
        const names = addExprNames(super.names, this.from);
        return addExprNames(names, this.to);
      }
    };
    var ForIter = class extends For {
      constructor(loop, varKind, name, iterable) {
        super();
        this.loop = loop;
        this.varKind = varKind;
        this.name = name;
        this.iterable = iterable;
      }
      render(opts) {
        return `for(${this.varKind} ${this.name} ${this.loop} ${this.iterable})` + super.render(opts);
      }
      optimizeNames(names, constants) {
        if (!super.optimizeNames(names, constants))
          return;
        this.iterable = optimizeExpr(this.iterable, names, constants);
        return this;
      }
      get names() {
        return addNames(super.names, this.iterable.names);
      }
    };
    var Func = class extends BlockNode {
      constructor(name, args, async) {
        super();
        this.name = name;
        this.args = args;
        this.async = async;
      }
      render(opts) {
        const _async = this.async ? "async " : "";
        return `${_async}function ${this.name}(${this.args})` + super.render(opts);
      }
    };
    Func.kind = "func";
    var Return = class extends ParentNode {
      render(opts) {
        return "return " + super.render(opts);
      }
    };
    Return.kind = "return";
    var Try = class extends BlockNode {
      render(opts) {
        let code = "try" + super.render(opts);
        if (this.catch)
          code += this.catch.render(opts);
        if (this.finally)
          code += this.finally.render(opts);
        return code;
      }
      optimizeNodes() {
        var _a, _b;
        super.optimizeNodes();
        (_a = this.catch) === null || _a === void 0 ? void 0 : _a.optimizeNodes();
        (_b = this.finally) === null || _b === void 0 ? void 0 : _b.optimizeNodes();
        return this;
      }
      optimizeNames(names, constants) {
        var _a, _b;
        super.optimizeNames(names, constants);
        (_a = this.catch) === null || _a === void 0 ? void 0 : _a.optimizeNames(names, constants);
        (_b = this.finally) === null || _b === void 0 ? void 0 : _b.optimizeNames(names, constants);
        return this;
      }
      get names() {
        const names = super.names;
        if (this.catch)
          addNames(names, this.catch.names);
        if (this.finally)
          addNames(names, this.finally.names);
        return names;
      }
    };
    var Catch = class extends BlockNode {
      constructor(error) {
        super();
        this.error = error;
      }
      render(opts) {
        return `catch(${this.error})` + super.render(opts);
      }
    };
    Catch.kind = "catch";
    var Finally = class extends BlockNode {
      render(opts) {
        return "finally" + super.render(opts);
      }
    };
    Finally.kind = "finally";
    var CodeGen = class {
      constructor(extScope, opts = {}) {
        this._values = {};
        this._blockStarts = [];
        this._constants = {};
        this.opts = { ...opts, _n: opts.lines ? "\n" : "" };
        this._extScope = extScope;
        this._scope = new scope_1.Scope({ parent: extScope });
        this._nodes = [new Root()];
      }
      toString() {
        return this._root.render(this.opts);
      }
      // returns unique name in the internal scope
      name(prefix) {
        return this._scope.name(prefix);
      }
      // reserves unique name in the external scope
      scopeName(prefix) {
        return this._extScope.name(prefix);
      }
      // reserves unique name in the external scope and assigns value to it
      scopeValue(prefixOrName, value) {
        const name = this._extScope.value(prefixOrName, value);
        const vs = this._values[name.prefix] || (this._values[name.prefix] = /* @__PURE__ */ new Set());
        vs.add(name);
        return name;
      }
      getScopeValue(prefix, keyOrRef) {
        return this._extScope.getValue(prefix, keyOrRef);
      }
      // return code that assigns values in the external scope to the names that are used internally
      // (same names that were returned by gen.scopeName or gen.scopeValue)
      scopeRefs(scopeName) {
        return this._extScope.scopeRefs(scopeName, this._values);
      }
      scopeCode() {
        return this._extScope.scopeCode(this._values);
      }
      _def(varKind, nameOrPrefix, rhs, constant) {
        const name = this._scope.toName(nameOrPrefix);
        if (rhs !== void 0 && constant)
          this._constants[name.str] = rhs;
        this._leafNode(new Def(varKind, name, rhs));
        return name;
      }
      // `const` declaration (`var` in es5 mode)
      const(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.const, nameOrPrefix, rhs, _constant);
      }
      // `let` declaration with optional assignment (`var` in es5 mode)
      let(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.let, nameOrPrefix, rhs, _constant);
      }
      // `var` declaration with optional assignment
      var(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.var, nameOrPrefix, rhs, _constant);
      }
      // assignment code
      assign(lhs, rhs, sideEffects) {
        return this._leafNode(new Assign(lhs, rhs, sideEffects));
      }
      // `+=` code
      add(lhs, rhs) {
        return this._leafNode(new AssignOp(lhs, exports.operators.ADD, rhs));
      }
      // appends passed SafeExpr to code or executes Block
      code(c) {
        if (typeof c == "function")
          c();
        else if (c !== code_1.nil)
          this._leafNode(new AnyCode(c));
        return this;
      }
      // returns code for object literal for the passed argument list of key-value pairs
      object(...keyValues) {
        const code = ["{"];
        for (const [key, value] of keyValues) {
          if (code.length > 1)
            code.push(",");
          code.push(key);
          if (key !== value || this.opts.es5) {
            code.push(":");
            (0, code_1.addCodeArg)(code, value);
          }
        }
        code.push("}");
        return new code_1._Code(code);
      }
      // `if` clause (or statement if `thenBody` and, optionally, `elseBody` are passed)
      if(condition, thenBody, elseBody) {
        this._blockNode(new If(condition));
        if (thenBody && elseBody) {
          this.code(thenBody).else().code(elseBody).endIf();
        } else if (thenBody) {
          this.code(thenBody).endIf();
        } else if (elseBody) {
          throw new Error('CodeGen: "else" body without "then" body');
        }
        return this;
      }
      // `else if` clause - invalid without `if` or after `else` clauses
      elseIf(condition) {
        return this._elseNode(new If(condition));
      }
      // `else` clause - only valid after `if` or `else if` clauses
      else() {
        return this._elseNode(new Else());
      }
      // end `if` statement (needed if gen.if was used only with condition)
      endIf() {
        return this._endBlockNode(If, Else);
      }
      _for(node, forBody) {
        this._blockNode(node);
        if (forBody)
          this.code(forBody).endFor();
        return this;
      }
      // a generic `for` clause (or statement if `forBody` is passed)
      for(iteration, forBody) {
        return this._for(new ForLoop(iteration), forBody);
      }
      // `for` statement for a range of values
      forRange(nameOrPrefix, from, to, forBody, varKind = this.opts.es5 ? scope_1.varKinds.var : scope_1.varKinds.let) {
        const name = this._scope.toName(nameOrPrefix);
        return this._for(new ForRange(varKind, name, from, to), () => forBody(name));
      }
      // `for-of` statement (in es5 mode replace with a normal for loop)
      forOf(nameOrPrefix, iterable, forBody, varKind = scope_1.varKinds.const) {
        const name = this._scope.toName(nameOrPrefix);
        if (this.opts.es5) {
          const arr = iterable instanceof code_1.Name ? iterable : this.var("_arr", iterable);
          return this.forRange("_i", 0, (0, code_1._)`${arr}.length`, (i) => {
            this.var(name, (0, code_1._)`${arr}[${i}]`);
            forBody(name);
          });
        }
        return this._for(new ForIter("of", varKind, name, iterable), () => forBody(name));
      }
      // `for-in` statement.
      // With option `ownProperties` replaced with a `for-of` loop for object keys
      forIn(nameOrPrefix, obj, forBody, varKind = this.opts.es5 ? scope_1.varKinds.var : scope_1.varKinds.const) {
        if (this.opts.ownProperties) {
          return this.forOf(nameOrPrefix, (0, code_1._)`Object.keys(${obj})`, forBody);
        }
        const name = this._scope.toName(nameOrPrefix);
        return this._for(new ForIter("in", varKind, name, obj), () => forBody(name));
      }
      // end `for` loop
      endFor() {
        return this._endBlockNode(For);
      }
      // `label` statement
      label(label) {
        return this._leafNode(new Label(label));
      }
      // `break` statement
      break(label) {
        return this._leafNode(new Break(label));
      }
      // `return` statement
      return(value) {
        const node = new Return();
        this._blockNode(node);
        this.code(value);
        if (node.nodes.length !== 1)
          throw new Error('CodeGen: "return" should have one node');
        return this._endBlockNode(Return);
      }
      // `try` statement
      try(tryBody, catchCode, finallyCode) {
        if (!catchCode && !finallyCode)
          throw new Error('CodeGen: "try" without "catch" and "finally"');
        const node = new Try();
        this._blockNode(node);
        this.code(tryBody);
        if (catchCode) {
          const error = this.name("e");
          this._currNode = node.catch = new Catch(error);
          catchCode(error);
        }
        if (finallyCode) {
          this._currNode = node.finally = new Finally();
          this.code(finallyCode);
        }
        return this._endBlockNode(Catch, Finally);
      }
      // `throw` statement
      throw(error) {
        return this._leafNode(new Throw(error));
      }
      // start self-balancing block
      block(body, nodeCount) {
        this._blockStarts.push(this._nodes.length);
        if (body)
          this.code(body).endBlock(nodeCount);
        return this;
      }
      // end the current self-balancing block
      endBlock(nodeCount) {
        const len = this._blockStarts.pop();
        if (len === void 0)
          throw new Error("CodeGen: not in self-balancing block");
        const toClose = this._nodes.length - len;
        if (toClose < 0 || nodeCount !== void 0 && toClose !== nodeCount) {
          throw new Error(`CodeGen: wrong number of nodes: ${toClose} vs ${nodeCount} expected`);
        }
        this._nodes.length = len;
        return this;
      }
      // `function` heading (or definition if funcBody is passed)
      func(name, args = code_1.nil, async, funcBody) {
        this._blockNode(new Func(name, args, async));
        if (funcBody)
          this.code(funcBody).endFunc();
        return this;
      }
      // end function definition
      endFunc() {
        return this._endBlockNode(Func);
      }
      optimize(n = 1) {
        while (n-- > 0) {
          this._root.optimizeNodes();
          this._root.optimizeNames(this._root.names, this._constants);
        }
      }
      _leafNode(node) {
        this._currNode.nodes.push(node);
        return this;
      }
      _blockNode(node) {
        this._currNode.nodes.push(node);
        this._nodes.push(node);
      }
      _endBlockNode(N1, N2) {
        const n = this._currNode;
        if (n instanceof N1 || N2 && n instanceof N2) {
          this._nodes.pop();
          return this;
        }
        throw new Error(`CodeGen: not in block "${N2 ? `${N1.kind}/${N2.kind}` : N1.kind}"`);
      }
      _elseNode(node) {
        const n = this._currNode;
        if (!(n instanceof If)) {
          throw new Error('CodeGen: "else" without "if"');
        }
        this._currNode = n.else = node;
        return this;
      }
      get _root() {
        return this._nodes[0];
      }
      get _currNode() {
        const ns = this._nodes;
        return ns[ns.length - 1];
      }
      set _currNode(node) {
        const ns = this._nodes;
        ns[ns.length - 1] = node;
      }
    };
    exports.CodeGen = CodeGen;
    function addNames(names, from) {
      for (const n in from)
        names[n] = (names[n] || 0) + (from[n] || 0);
      return names;
    }
    function addExprNames(names, from) {
      return from instanceof code_1._CodeOrName ? addNames(names, from.names) : names;
    }
    function optimizeExpr(expr, names, constants) {
      if (expr instanceof code_1.Name)
        return replaceName(expr);
      if (!canOptimize(expr))
        return expr;
      return new code_1._Code(expr._items.reduce((items, c) => {
        if (c instanceof code_1.Name)
          c = replaceName(c);
        if (c instanceof code_1._Code)
          items.push(...c._items);
        else
          items.push(c);
        return items;
      }, []));
      function replaceName(n) {
        const c = constants[n.str];
        if (c === void 0 || names[n.str] !== 1)
          return n;
        delete names[n.str];
        return c;
      }
      function canOptimize(e) {
        return e instanceof code_1._Code && e._items.some((c) => c instanceof code_1.Name && names[c.str] === 1 && constants[c.str] !== void 0);
      }
    }
    function subtractNames(names, from) {
      for (const n in from)
        names[n] = (names[n] || 0) - (from[n] || 0);
    }
    function not(x) {
      return typeof x == "boolean" || typeof x == "number" || x === null ? !x : (0, code_1._)`!${par(x)}`;
    }
    exports.not = not;
    var andCode = mappend(exports.operators.AND);
    function and(...args) {
      return args.reduce(andCode);
    }
    exports.and = and;
    var orCode = mappend(exports.operators.OR);
    function or(...args) {
      return args.reduce(orCode);
    }
    exports.or = or;
    function mappend(op) {
      return (x, y) => x === code_1.nil ? y : y === code_1.nil ? x : (0, code_1._)`${par(x)} ${op} ${par(y)}`;
    }
    function par(x) {
      return x instanceof code_1.Name ? x : (0, code_1._)`(${x})`;
    }
  }
});

// node_modules/ajv/dist/compile/util.js
var require_util = __commonJS({
  "node_modules/ajv/dist/compile/util.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.checkStrictMode = exports.getErrorPath = exports.Type = exports.useFunc = exports.setEvaluated = exports.evaluatedPropsToName = exports.mergeEvaluated = exports.eachItem = exports.unescapeJsonPointer = exports.escapeJsonPointer = exports.escapeFragment = exports.unescapeFragment = exports.schemaRefOrVal = exports.schemaHasRulesButRef = exports.schemaHasRules = exports.checkUnknownRules = exports.alwaysValidSchema = exports.toHash = void 0;
    var codegen_1 = require_codegen();
    var code_1 = require_code();
    function toHash(arr) {
      const hash = {};
      for (const item of arr)
        hash[item] = true;
      return hash;
    }
    exports.toHash = toHash;
    function alwaysValidSchema(it, schema) {
      if (typeof schema == "boolean")
        return schema;
      if (Object.keys(schema).length === 0)
        return true;
      checkUnknownRules(it, schema);
      return !schemaHasRules(schema, it.self.RULES.all);
    }
    exports.alwaysValidSchema = alwaysValidSchema;
    function checkUnknownRules(it, schema = it.schema) {
      const { opts, self } = it;
      if (!opts.strictSchema)
        return;
      if (typeof schema === "boolean")
        return;
      const rules = self.RULES.keywords;
      for (const key in schema) {
        if (!rules[key])
          checkStrictMode(it, `unknown keyword: "${key}"`);
      }
    }
    exports.checkUnknownRules = checkUnknownRules;
    function schemaHasRules(schema, rules) {
      if (typeof schema == "boolean")
        return !schema;
      for (const key in schema)
        if (rules[key])
          return true;
      return false;
    }
    exports.schemaHasRules = schemaHasRules;
    function schemaHasRulesButRef(schema, RULES) {
      if (typeof schema == "boolean")
        return !schema;
      for (const key in schema)
        if (key !== "$ref" && RULES.all[key])
          return true;
      return false;
    }
    exports.schemaHasRulesButRef = schemaHasRulesButRef;
    function schemaRefOrVal({ topSchemaRef, schemaPath }, schema, keyword, $data) {
      if (!$data) {
        if (typeof schema == "number" || typeof schema == "boolean")
          return schema;
        if (typeof schema == "string")
          return (0, codegen_1._)`${schema}`;
      }
      return (0, codegen_1._)`${topSchemaRef}${schemaPath}${(0, codegen_1.getProperty)(keyword)}`;
    }
    exports.schemaRefOrVal = schemaRefOrVal;
    function unescapeFragment(str) {
      return unescapeJsonPointer(decodeURIComponent(str));
    }
    exports.unescapeFragment = unescapeFragment;
    function escapeFragment(str) {
      return encodeURIComponent(escapeJsonPointer(str));
    }
    exports.escapeFragment = escapeFragment;
    function escapeJsonPointer(str) {
      if (typeof str == "number")
        return `${str}`;
      return str.replace(/~/g, "~0").replace(/\//g, "~1");
    }
    exports.escapeJsonPointer = escapeJsonPointer;
    function unescapeJsonPointer(str) {
      return str.replace(/~1/g, "/").replace(/~0/g, "~");
    }
    exports.unescapeJsonPointer = unescapeJsonPointer;
    function eachItem(xs, f) {
      if (Array.isArray(xs)) {
        for (const x of xs)
          f(x);
      } else {
        f(xs);
      }
    }
    exports.eachItem = eachItem;
    function makeMergeEvaluated({ mergeNames, mergeToName, mergeValues, resultToName }) {
      return (gen, from, to, toName) => {
        const res = to === void 0 ? from : to instanceof codegen_1.Name ? (from instanceof codegen_1.Name ? mergeNames(gen, from, to) : mergeToName(gen, from, to), to) : from instanceof codegen_1.Name ? (mergeToName(gen, to, from), from) : mergeValues(from, to);
        return toName === codegen_1.Name && !(res instanceof codegen_1.Name) ? resultToName(gen, res) : res;
      };
    }
    exports.mergeEvaluated = {
      props: makeMergeEvaluated({
        mergeNames: (gen, from, to) => gen.if((0, codegen_1._)`${to} !== true && ${from} !== undefined`, () => {
          gen.if((0, codegen_1._)`${from} === true`, () => gen.assign(to, true), () => gen.assign(to, (0, codegen_1._)`${to} || {}`).code((0, codegen_1._)`Object.assign(${to}, ${from})`));
        }),
        mergeToName: (gen, from, to) => gen.if((0, codegen_1._)`${to} !== true`, () => {
          if (from === true) {
            gen.assign(to, true);
          } else {
            gen.assign(to, (0, codegen_1._)`${to} || {}`);
            setEvaluated(gen, to, from);
          }
        }),
        mergeValues: (from, to) => from === true ? true : { ...from, ...to },
        resultToName: evaluatedPropsToName
      }),
      items: makeMergeEvaluated({
        mergeNames: (gen, from, to) => gen.if((0, codegen_1._)`${to} !== true && ${from} !== undefined`, () => gen.assign(to, (0, codegen_1._)`${from} === true ? true : ${to} > ${from} ? ${to} : ${from}`)),
        mergeToName: (gen, from, to) => gen.if((0, codegen_1._)`${to} !== true`, () => gen.assign(to, from === true ? true : (0, codegen_1._)`${to} > ${from} ? ${to} : ${from}`)),
        mergeValues: (from, to) => from === true ? true : Math.max(from, to),
        resultToName: (gen, items) => gen.var("items", items)
      })
    };
    function evaluatedPropsToName(gen, ps) {
      if (ps === true)
        return gen.var("props", true);
      const props = gen.var("props", (0, codegen_1._)`{}`);
      if (ps !== void 0)
        setEvaluated(gen, props, ps);
      return props;
    }
    exports.evaluatedPropsToName = evaluatedPropsToName;
    function setEvaluated(gen, props, ps) {
      Object.keys(ps).forEach((p) => gen.assign((0, codegen_1._)`${props}${(0, codegen_1.getProperty)(p)}`, true));
    }
    exports.setEvaluated = setEvaluated;
    var snippets = {};
    function useFunc(gen, f) {
      return gen.scopeValue("func", {
        ref: f,
        code: snippets[f.code] || (snippets[f.code] = new code_1._Code(f.code))
      });
    }
    exports.useFunc = useFunc;
    var Type;
    (function(Type2) {
      Type2[Type2["Num"] = 0] = "Num";
      Type2[Type2["Str"] = 1] = "Str";
    })(Type || (exports.Type = Type = {}));
    function getErrorPath(dataProp, dataPropType, jsPropertySyntax) {
      if (dataProp instanceof codegen_1.Name) {
        const isNumber = dataPropType === Type.Num;
        return jsPropertySyntax ? isNumber ? (0, codegen_1._)`"[" + ${dataProp} + "]"` : (0, codegen_1._)`"['" + ${dataProp} + "']"` : isNumber ? (0, codegen_1._)`"/" + ${dataProp}` : (0, codegen_1._)`"/" + ${dataProp}.replace(/~/g, "~0").replace(/\\//g, "~1")`;
      }
      return jsPropertySyntax ? (0, codegen_1.getProperty)(dataProp).toString() : "/" + escapeJsonPointer(dataProp);
    }
    exports.getErrorPath = getErrorPath;
    function checkStrictMode(it, msg, mode = it.opts.strictSchema) {
      if (!mode)
        return;
      msg = `strict mode: ${msg}`;
      if (mode === true)
        throw new Error(msg);
      it.self.logger.warn(msg);
    }
    exports.checkStrictMode = checkStrictMode;
  }
});

// node_modules/ajv/dist/compile/names.js
var require_names = __commonJS({
  "node_modules/ajv/dist/compile/names.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var names = {
      // validation function arguments
      data: new codegen_1.Name("data"),
      // data passed to validation function
      // args passed from referencing schema
      valCxt: new codegen_1.Name("valCxt"),
      // validation/data context - should not be used directly, it is destructured to the names below
      instancePath: new codegen_1.Name("instancePath"),
      parentData: new codegen_1.Name("parentData"),
      parentDataProperty: new codegen_1.Name("parentDataProperty"),
      rootData: new codegen_1.Name("rootData"),
      // root data - same as the data passed to the first/top validation function
      dynamicAnchors: new codegen_1.Name("dynamicAnchors"),
      // used to support recursiveRef and dynamicRef
      // function scoped variables
      vErrors: new codegen_1.Name("vErrors"),
      // null or array of validation errors
      errors: new codegen_1.Name("errors"),
      // counter of validation errors
      this: new codegen_1.Name("this"),
      // "globals"
      self: new codegen_1.Name("self"),
      scope: new codegen_1.Name("scope"),
      // JTD serialize/parse name for JSON string and position
      json: new codegen_1.Name("json"),
      jsonPos: new codegen_1.Name("jsonPos"),
      jsonLen: new codegen_1.Name("jsonLen"),
      jsonPart: new codegen_1.Name("jsonPart")
    };
    exports.default = names;
  }
});

// node_modules/ajv/dist/compile/errors.js
var require_errors = __commonJS({
  "node_modules/ajv/dist/compile/errors.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.extendErrors = exports.resetErrorsCount = exports.reportExtraError = exports.reportError = exports.keyword$DataError = exports.keywordError = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var names_1 = require_names();
    exports.keywordError = {
      message: ({ keyword }) => (0, codegen_1.str)`must pass "${keyword}" keyword validation`
    };
    exports.keyword$DataError = {
      message: ({ keyword, schemaType }) => schemaType ? (0, codegen_1.str)`"${keyword}" keyword must be ${schemaType} ($data)` : (0, codegen_1.str)`"${keyword}" keyword is invalid ($data)`
    };
    function reportError(cxt, error = exports.keywordError, errorPaths, overrideAllErrors) {
      const { it } = cxt;
      const { gen, compositeRule, allErrors } = it;
      const errObj = errorObjectCode(cxt, error, errorPaths);
      if (overrideAllErrors !== null && overrideAllErrors !== void 0 ? overrideAllErrors : compositeRule || allErrors) {
        addError(gen, errObj);
      } else {
        returnErrors(it, (0, codegen_1._)`[${errObj}]`);
      }
    }
    exports.reportError = reportError;
    function reportExtraError(cxt, error = exports.keywordError, errorPaths) {
      const { it } = cxt;
      const { gen, compositeRule, allErrors } = it;
      const errObj = errorObjectCode(cxt, error, errorPaths);
      addError(gen, errObj);
      if (!(compositeRule || allErrors)) {
        returnErrors(it, names_1.default.vErrors);
      }
    }
    exports.reportExtraError = reportExtraError;
    function resetErrorsCount(gen, errsCount) {
      gen.assign(names_1.default.errors, errsCount);
      gen.if((0, codegen_1._)`${names_1.default.vErrors} !== null`, () => gen.if(errsCount, () => gen.assign((0, codegen_1._)`${names_1.default.vErrors}.length`, errsCount), () => gen.assign(names_1.default.vErrors, null)));
    }
    exports.resetErrorsCount = resetErrorsCount;
    function extendErrors({ gen, keyword, schemaValue, data, errsCount, it }) {
      if (errsCount === void 0)
        throw new Error("ajv implementation error");
      const err = gen.name("err");
      gen.forRange("i", errsCount, names_1.default.errors, (i) => {
        gen.const(err, (0, codegen_1._)`${names_1.default.vErrors}[${i}]`);
        gen.if((0, codegen_1._)`${err}.instancePath === undefined`, () => gen.assign((0, codegen_1._)`${err}.instancePath`, (0, codegen_1.strConcat)(names_1.default.instancePath, it.errorPath)));
        gen.assign((0, codegen_1._)`${err}.schemaPath`, (0, codegen_1.str)`${it.errSchemaPath}/${keyword}`);
        if (it.opts.verbose) {
          gen.assign((0, codegen_1._)`${err}.schema`, schemaValue);
          gen.assign((0, codegen_1._)`${err}.data`, data);
        }
      });
    }
    exports.extendErrors = extendErrors;
    function addError(gen, errObj) {
      const err = gen.const("err", errObj);
      gen.if((0, codegen_1._)`${names_1.default.vErrors} === null`, () => gen.assign(names_1.default.vErrors, (0, codegen_1._)`[${err}]`), (0, codegen_1._)`${names_1.default.vErrors}.push(${err})`);
      gen.code((0, codegen_1._)`${names_1.default.errors}++`);
    }
    function returnErrors(it, errs) {
      const { gen, validateName, schemaEnv } = it;
      if (schemaEnv.$async) {
        gen.throw((0, codegen_1._)`new ${it.ValidationError}(${errs})`);
      } else {
        gen.assign((0, codegen_1._)`${validateName}.errors`, errs);
        gen.return(false);
      }
    }
    var E = {
      keyword: new codegen_1.Name("keyword"),
      schemaPath: new codegen_1.Name("schemaPath"),
      // also used in JTD errors
      params: new codegen_1.Name("params"),
      propertyName: new codegen_1.Name("propertyName"),
      message: new codegen_1.Name("message"),
      schema: new codegen_1.Name("schema"),
      parentSchema: new codegen_1.Name("parentSchema")
    };
    function errorObjectCode(cxt, error, errorPaths) {
      const { createErrors } = cxt.it;
      if (createErrors === false)
        return (0, codegen_1._)`{}`;
      return errorObject(cxt, error, errorPaths);
    }
    function errorObject(cxt, error, errorPaths = {}) {
      const { gen, it } = cxt;
      const keyValues = [
        errorInstancePath(it, errorPaths),
        errorSchemaPath(cxt, errorPaths)
      ];
      extraErrorProps(cxt, error, keyValues);
      return gen.object(...keyValues);
    }
    function errorInstancePath({ errorPath }, { instancePath }) {
      const instPath = instancePath ? (0, codegen_1.str)`${errorPath}${(0, util_1.getErrorPath)(instancePath, util_1.Type.Str)}` : errorPath;
      return [names_1.default.instancePath, (0, codegen_1.strConcat)(names_1.default.instancePath, instPath)];
    }
    function errorSchemaPath({ keyword, it: { errSchemaPath } }, { schemaPath, parentSchema }) {
      let schPath = parentSchema ? errSchemaPath : (0, codegen_1.str)`${errSchemaPath}/${keyword}`;
      if (schemaPath) {
        schPath = (0, codegen_1.str)`${schPath}${(0, util_1.getErrorPath)(schemaPath, util_1.Type.Str)}`;
      }
      return [E.schemaPath, schPath];
    }
    function extraErrorProps(cxt, { params, message }, keyValues) {
      const { keyword, data, schemaValue, it } = cxt;
      const { opts, propertyName, topSchemaRef, schemaPath } = it;
      keyValues.push([E.keyword, keyword], [E.params, typeof params == "function" ? params(cxt) : params || (0, codegen_1._)`{}`]);
      if (opts.messages) {
        keyValues.push([E.message, typeof message == "function" ? message(cxt) : message]);
      }
      if (opts.verbose) {
        keyValues.push([E.schema, schemaValue], [E.parentSchema, (0, codegen_1._)`${topSchemaRef}${schemaPath}`], [names_1.default.data, data]);
      }
      if (propertyName)
        keyValues.push([E.propertyName, propertyName]);
    }
  }
});

// node_modules/ajv/dist/compile/validate/boolSchema.js
var require_boolSchema = __commonJS({
  "node_modules/ajv/dist/compile/validate/boolSchema.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.boolOrEmptySchema = exports.topBoolOrEmptySchema = void 0;
    var errors_1 = require_errors();
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var boolError = {
      message: "boolean schema is false"
    };
    function topBoolOrEmptySchema(it) {
      const { gen, schema, validateName } = it;
      if (schema === false) {
        falseSchemaError(it, false);
      } else if (typeof schema == "object" && schema.$async === true) {
        gen.return(names_1.default.data);
      } else {
        gen.assign((0, codegen_1._)`${validateName}.errors`, null);
        gen.return(true);
      }
    }
    exports.topBoolOrEmptySchema = topBoolOrEmptySchema;
    function boolOrEmptySchema(it, valid) {
      const { gen, schema } = it;
      if (schema === false) {
        gen.var(valid, false);
        falseSchemaError(it);
      } else {
        gen.var(valid, true);
      }
    }
    exports.boolOrEmptySchema = boolOrEmptySchema;
    function falseSchemaError(it, overrideAllErrors) {
      const { gen, data } = it;
      const cxt = {
        gen,
        keyword: "false schema",
        data,
        schema: false,
        schemaCode: false,
        schemaValue: false,
        params: {},
        it
      };
      (0, errors_1.reportError)(cxt, boolError, void 0, overrideAllErrors);
    }
  }
});

// node_modules/ajv/dist/compile/rules.js
var require_rules = __commonJS({
  "node_modules/ajv/dist/compile/rules.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.getRules = exports.isJSONType = void 0;
    var _jsonTypes = ["string", "number", "integer", "boolean", "null", "object", "array"];
    var jsonTypes = new Set(_jsonTypes);
    function isJSONType(x) {
      return typeof x == "string" && jsonTypes.has(x);
    }
    exports.isJSONType = isJSONType;
    function getRules() {
      const groups = {
        number: { type: "number", rules: [] },
        string: { type: "string", rules: [] },
        array: { type: "array", rules: [] },
        object: { type: "object", rules: [] }
      };
      return {
        types: { ...groups, integer: true, boolean: true, null: true },
        rules: [{ rules: [] }, groups.number, groups.string, groups.array, groups.object],
        post: { rules: [] },
        all: {},
        keywords: {}
      };
    }
    exports.getRules = getRules;
  }
});

// node_modules/ajv/dist/compile/validate/applicability.js
var require_applicability = __commonJS({
  "node_modules/ajv/dist/compile/validate/applicability.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.shouldUseRule = exports.shouldUseGroup = exports.schemaHasRulesForType = void 0;
    function schemaHasRulesForType({ schema, self }, type) {
      const group = self.RULES.types[type];
      return group && group !== true && shouldUseGroup(schema, group);
    }
    exports.schemaHasRulesForType = schemaHasRulesForType;
    function shouldUseGroup(schema, group) {
      return group.rules.some((rule) => shouldUseRule(schema, rule));
    }
    exports.shouldUseGroup = shouldUseGroup;
    function shouldUseRule(schema, rule) {
      var _a;
      return schema[rule.keyword] !== void 0 || ((_a = rule.definition.implements) === null || _a === void 0 ? void 0 : _a.some((kwd) => schema[kwd] !== void 0));
    }
    exports.shouldUseRule = shouldUseRule;
  }
});

// node_modules/ajv/dist/compile/validate/dataType.js
var require_dataType = __commonJS({
  "node_modules/ajv/dist/compile/validate/dataType.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.reportTypeError = exports.checkDataTypes = exports.checkDataType = exports.coerceAndCheckDataType = exports.getJSONTypes = exports.getSchemaTypes = exports.DataType = void 0;
    var rules_1 = require_rules();
    var applicability_1 = require_applicability();
    var errors_1 = require_errors();
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var DataType;
    (function(DataType2) {
      DataType2[DataType2["Correct"] = 0] = "Correct";
      DataType2[DataType2["Wrong"] = 1] = "Wrong";
    })(DataType || (exports.DataType = DataType = {}));
    function getSchemaTypes(schema) {
      const types = getJSONTypes(schema.type);
      const hasNull = types.includes("null");
      if (hasNull) {
        if (schema.nullable === false)
          throw new Error("type: null contradicts nullable: false");
      } else {
        if (!types.length && schema.nullable !== void 0) {
          throw new Error('"nullable" cannot be used without "type"');
        }
        if (schema.nullable === true)
          types.push("null");
      }
      return types;
    }
    exports.getSchemaTypes = getSchemaTypes;
    function getJSONTypes(ts) {
      const types = Array.isArray(ts) ? ts : ts ? [ts] : [];
      if (types.every(rules_1.isJSONType))
        return types;
      throw new Error("type must be JSONType or JSONType[]: " + types.join(","));
    }
    exports.getJSONTypes = getJSONTypes;
    function coerceAndCheckDataType(it, types) {
      const { gen, data, opts } = it;
      const coerceTo = coerceToTypes(types, opts.coerceTypes);
      const checkTypes = types.length > 0 && !(coerceTo.length === 0 && types.length === 1 && (0, applicability_1.schemaHasRulesForType)(it, types[0]));
      if (checkTypes) {
        const wrongType = checkDataTypes(types, data, opts.strictNumbers, DataType.Wrong);
        gen.if(wrongType, () => {
          if (coerceTo.length)
            coerceData(it, types, coerceTo);
          else
            reportTypeError(it);
        });
      }
      return checkTypes;
    }
    exports.coerceAndCheckDataType = coerceAndCheckDataType;
    var COERCIBLE = /* @__PURE__ */ new Set(["string", "number", "integer", "boolean", "null"]);
    function coerceToTypes(types, coerceTypes) {
      return coerceTypes ? types.filter((t) => COERCIBLE.has(t) || coerceTypes === "array" && t === "array") : [];
    }
    function coerceData(it, types, coerceTo) {
      const { gen, data, opts } = it;
      const dataType = gen.let("dataType", (0, codegen_1._)`typeof ${data}`);
      const coerced = gen.let("coerced", (0, codegen_1._)`undefined`);
      if (opts.coerceTypes === "array") {
        gen.if((0, codegen_1._)`${dataType} == 'object' && Array.isArray(${data}) && ${data}.length == 1`, () => gen.assign(data, (0, codegen_1._)`${data}[0]`).assign(dataType, (0, codegen_1._)`typeof ${data}`).if(checkDataTypes(types, data, opts.strictNumbers), () => gen.assign(coerced, data)));
      }
      gen.if((0, codegen_1._)`${coerced} !== undefined`);
      for (const t of coerceTo) {
        if (COERCIBLE.has(t) || t === "array" && opts.coerceTypes === "array") {
          coerceSpecificType(t);
        }
      }
      gen.else();
      reportTypeError(it);
      gen.endIf();
      gen.if((0, codegen_1._)`${coerced} !== undefined`, () => {
        gen.assign(data, coerced);
        assignParentData(it, coerced);
      });
      function coerceSpecificType(t) {
        switch (t) {
          case "string":
            gen.elseIf((0, codegen_1._)`${dataType} == "number" || ${dataType} == "boolean"`).assign(coerced, (0, codegen_1._)`"" + ${data}`).elseIf((0, codegen_1._)`${data} === null`).assign(coerced, (0, codegen_1._)`""`);
            return;
          case "number":
            gen.elseIf((0, codegen_1._)`${dataType} == "boolean" || ${data} === null
              || (${dataType} == "string" && ${data} && ${data} == +${data})`).assign(coerced, (0, codegen_1._)`+${data}`);
            return;
          case "integer":
            gen.elseIf((0, codegen_1._)`${dataType} === "boolean" || ${data} === null
              || (${dataType} === "string" && ${data} && ${data} == +${data} && !(${data} % 1))`).assign(coerced, (0, codegen_1._)`+${data}`);
            return;
          case "boolean":
            gen.elseIf((0, codegen_1._)`${data} === "false" || ${data} === 0 || ${data} === null`).assign(coerced, false).elseIf((0, codegen_1._)`${data} === "true" || ${data} === 1`).assign(coerced, true);
            return;
          case "null":
            gen.elseIf((0, codegen_1._)`${data} === "" || ${data} === 0 || ${data} === false`);
            gen.assign(coerced, null);
            return;
          case "array":
            gen.elseIf((0, codegen_1._)`${dataType} === "string" || ${dataType} === "number"
              || ${dataType} === "boolean" || ${data} === null`).assign(coerced, (0, codegen_1._)`[${data}]`);
        }
      }
    }
    function assignParentData({ gen, parentData, parentDataProperty }, expr) {
      gen.if((0, codegen_1._)`${parentData} !== undefined`, () => gen.assign((0, codegen_1._)`${parentData}[${parentDataProperty}]`, expr));
    }
    function checkDataType(dataType, data, strictNums, correct = DataType.Correct) {
      const EQ = correct === DataType.Correct ? codegen_1.operators.EQ : codegen_1.operators.NEQ;
      let cond;
      switch (dataType) {
        case "null":
          return (0, codegen_1._)`${data} ${EQ} null`;
        case "array":
          cond = (0, codegen_1._)`Array.isArray(${data})`;
          break;
        case "object":
          cond = (0, codegen_1._)`${data} && typeof ${data} == "object" && !Array.isArray(${data})`;
          break;
        case "integer":
          cond = numCond((0, codegen_1._)`!(${data} % 1) && !isNaN(${data})`);
          break;
        case "number":
          cond = numCond();
          break;
        default:
          return (0, codegen_1._)`typeof ${data} ${EQ} ${dataType}`;
      }
      return correct === DataType.Correct ? cond : (0, codegen_1.not)(cond);
      function numCond(_cond = codegen_1.nil) {
        return (0, codegen_1.and)((0, codegen_1._)`typeof ${data} == "number"`, _cond, strictNums ? (0, codegen_1._)`isFinite(${data})` : codegen_1.nil);
      }
    }
    exports.checkDataType = checkDataType;
    function checkDataTypes(dataTypes, data, strictNums, correct) {
      if (dataTypes.length === 1) {
        return checkDataType(dataTypes[0], data, strictNums, correct);
      }
      let cond;
      const types = (0, util_1.toHash)(dataTypes);
      if (types.array && types.object) {
        const notObj = (0, codegen_1._)`typeof ${data} != "object"`;
        cond = types.null ? notObj : (0, codegen_1._)`!${data} || ${notObj}`;
        delete types.null;
        delete types.array;
        delete types.object;
      } else {
        cond = codegen_1.nil;
      }
      if (types.number)
        delete types.integer;
      for (const t in types)
        cond = (0, codegen_1.and)(cond, checkDataType(t, data, strictNums, correct));
      return cond;
    }
    exports.checkDataTypes = checkDataTypes;
    var typeError = {
      message: ({ schema }) => `must be ${schema}`,
      params: ({ schema, schemaValue }) => typeof schema == "string" ? (0, codegen_1._)`{type: ${schema}}` : (0, codegen_1._)`{type: ${schemaValue}}`
    };
    function reportTypeError(it) {
      const cxt = getTypeErrorContext(it);
      (0, errors_1.reportError)(cxt, typeError);
    }
    exports.reportTypeError = reportTypeError;
    function getTypeErrorContext(it) {
      const { gen, data, schema } = it;
      const schemaCode = (0, util_1.schemaRefOrVal)(it, schema, "type");
      return {
        gen,
        keyword: "type",
        data,
        schema: schema.type,
        schemaCode,
        schemaValue: schemaCode,
        parentSchema: schema,
        params: {},
        it
      };
    }
  }
});

// node_modules/ajv/dist/compile/validate/defaults.js
var require_defaults = __commonJS({
  "node_modules/ajv/dist/compile/validate/defaults.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.assignDefaults = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    function assignDefaults(it, ty) {
      const { properties, items } = it.schema;
      if (ty === "object" && properties) {
        for (const key in properties) {
          assignDefault(it, key, properties[key].default);
        }
      } else if (ty === "array" && Array.isArray(items)) {
        items.forEach((sch, i) => assignDefault(it, i, sch.default));
      }
    }
    exports.assignDefaults = assignDefaults;
    function assignDefault(it, prop, defaultValue) {
      const { gen, compositeRule, data, opts } = it;
      if (defaultValue === void 0)
        return;
      const childData = (0, codegen_1._)`${data}${(0, codegen_1.getProperty)(prop)}`;
      if (compositeRule) {
        (0, util_1.checkStrictMode)(it, `default is ignored for: ${childData}`);
        return;
      }
      let condition = (0, codegen_1._)`${childData} === undefined`;
      if (opts.useDefaults === "empty") {
        condition = (0, codegen_1._)`${condition} || ${childData} === null || ${childData} === ""`;
      }
      gen.if(condition, (0, codegen_1._)`${childData} = ${(0, codegen_1.stringify)(defaultValue)}`);
    }
  }
});

// node_modules/ajv/dist/vocabularies/code.js
var require_code2 = __commonJS({
  "node_modules/ajv/dist/vocabularies/code.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateUnion = exports.validateArray = exports.usePattern = exports.callValidateCode = exports.schemaProperties = exports.allSchemaProperties = exports.noPropertyInData = exports.propertyInData = exports.isOwnProperty = exports.hasPropFunc = exports.reportMissingProp = exports.checkMissingProp = exports.checkReportMissingProp = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var names_1 = require_names();
    var util_2 = require_util();
    function checkReportMissingProp(cxt, prop) {
      const { gen, data, it } = cxt;
      gen.if(noPropertyInData(gen, data, prop, it.opts.ownProperties), () => {
        cxt.setParams({ missingProperty: (0, codegen_1._)`${prop}` }, true);
        cxt.error();
      });
    }
    exports.checkReportMissingProp = checkReportMissingProp;
    function checkMissingProp({ gen, data, it: { opts } }, properties, missing2) {
      return (0, codegen_1.or)(...properties.map((prop) => (0, codegen_1.and)(noPropertyInData(gen, data, prop, opts.ownProperties), (0, codegen_1._)`${missing2} = ${prop}`)));
    }
    exports.checkMissingProp = checkMissingProp;
    function reportMissingProp(cxt, missing2) {
      cxt.setParams({ missingProperty: missing2 }, true);
      cxt.error();
    }
    exports.reportMissingProp = reportMissingProp;
    function hasPropFunc(gen) {
      return gen.scopeValue("func", {
        // eslint-disable-next-line @typescript-eslint/unbound-method
        ref: Object.prototype.hasOwnProperty,
        code: (0, codegen_1._)`Object.prototype.hasOwnProperty`
      });
    }
    exports.hasPropFunc = hasPropFunc;
    function isOwnProperty(gen, data, property) {
      return (0, codegen_1._)`${hasPropFunc(gen)}.call(${data}, ${property})`;
    }
    exports.isOwnProperty = isOwnProperty;
    function propertyInData(gen, data, property, ownProperties) {
      const cond = (0, codegen_1._)`${data}${(0, codegen_1.getProperty)(property)} !== undefined`;
      return ownProperties ? (0, codegen_1._)`${cond} && ${isOwnProperty(gen, data, property)}` : cond;
    }
    exports.propertyInData = propertyInData;
    function noPropertyInData(gen, data, property, ownProperties) {
      const cond = (0, codegen_1._)`${data}${(0, codegen_1.getProperty)(property)} === undefined`;
      return ownProperties ? (0, codegen_1.or)(cond, (0, codegen_1.not)(isOwnProperty(gen, data, property))) : cond;
    }
    exports.noPropertyInData = noPropertyInData;
    function allSchemaProperties(schemaMap) {
      return schemaMap ? Object.keys(schemaMap).filter((p) => p !== "__proto__") : [];
    }
    exports.allSchemaProperties = allSchemaProperties;
    function schemaProperties(it, schemaMap) {
      return allSchemaProperties(schemaMap).filter((p) => !(0, util_1.alwaysValidSchema)(it, schemaMap[p]));
    }
    exports.schemaProperties = schemaProperties;
    function callValidateCode({ schemaCode, data, it: { gen, topSchemaRef, schemaPath, errorPath }, it }, func, context, passSchema) {
      const dataAndSchema = passSchema ? (0, codegen_1._)`${schemaCode}, ${data}, ${topSchemaRef}${schemaPath}` : data;
      const valCxt = [
        [names_1.default.instancePath, (0, codegen_1.strConcat)(names_1.default.instancePath, errorPath)],
        [names_1.default.parentData, it.parentData],
        [names_1.default.parentDataProperty, it.parentDataProperty],
        [names_1.default.rootData, names_1.default.rootData]
      ];
      if (it.opts.dynamicRef)
        valCxt.push([names_1.default.dynamicAnchors, names_1.default.dynamicAnchors]);
      const args = (0, codegen_1._)`${dataAndSchema}, ${gen.object(...valCxt)}`;
      return context !== codegen_1.nil ? (0, codegen_1._)`${func}.call(${context}, ${args})` : (0, codegen_1._)`${func}(${args})`;
    }
    exports.callValidateCode = callValidateCode;
    var newRegExp = (0, codegen_1._)`new RegExp`;
    function usePattern({ gen, it: { opts } }, pattern) {
      const u = opts.unicodeRegExp ? "u" : "";
      const { regExp } = opts.code;
      const rx = regExp(pattern, u);
      return gen.scopeValue("pattern", {
        key: rx.toString(),
        ref: rx,
        code: (0, codegen_1._)`${regExp.code === "new RegExp" ? newRegExp : (0, util_2.useFunc)(gen, regExp)}(${pattern}, ${u})`
      });
    }
    exports.usePattern = usePattern;
    function validateArray(cxt) {
      const { gen, data, keyword, it } = cxt;
      const valid = gen.name("valid");
      if (it.allErrors) {
        const validArr = gen.let("valid", true);
        validateItems(() => gen.assign(validArr, false));
        return validArr;
      }
      gen.var(valid, true);
      validateItems(() => gen.break());
      return valid;
      function validateItems(notValid) {
        const len = gen.const("len", (0, codegen_1._)`${data}.length`);
        gen.forRange("i", 0, len, (i) => {
          cxt.subschema({
            keyword,
            dataProp: i,
            dataPropType: util_1.Type.Num
          }, valid);
          gen.if((0, codegen_1.not)(valid), notValid);
        });
      }
    }
    exports.validateArray = validateArray;
    function validateUnion(cxt) {
      const { gen, schema, keyword, it } = cxt;
      if (!Array.isArray(schema))
        throw new Error("ajv implementation error");
      const alwaysValid = schema.some((sch) => (0, util_1.alwaysValidSchema)(it, sch));
      if (alwaysValid && !it.opts.unevaluated)
        return;
      const valid = gen.let("valid", false);
      const schValid = gen.name("_valid");
      gen.block(() => schema.forEach((_sch, i) => {
        const schCxt = cxt.subschema({
          keyword,
          schemaProp: i,
          compositeRule: true
        }, schValid);
        gen.assign(valid, (0, codegen_1._)`${valid} || ${schValid}`);
        const merged = cxt.mergeValidEvaluated(schCxt, schValid);
        if (!merged)
          gen.if((0, codegen_1.not)(valid));
      }));
      cxt.result(valid, () => cxt.reset(), () => cxt.error(true));
    }
    exports.validateUnion = validateUnion;
  }
});

// node_modules/ajv/dist/compile/validate/keyword.js
var require_keyword = __commonJS({
  "node_modules/ajv/dist/compile/validate/keyword.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateKeywordUsage = exports.validSchemaType = exports.funcKeywordCode = exports.macroKeywordCode = void 0;
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var code_1 = require_code2();
    var errors_1 = require_errors();
    function macroKeywordCode(cxt, def) {
      const { gen, keyword, schema, parentSchema, it } = cxt;
      const macroSchema = def.macro.call(it.self, schema, parentSchema, it);
      const schemaRef = useKeyword(gen, keyword, macroSchema);
      if (it.opts.validateSchema !== false)
        it.self.validateSchema(macroSchema, true);
      const valid = gen.name("valid");
      cxt.subschema({
        schema: macroSchema,
        schemaPath: codegen_1.nil,
        errSchemaPath: `${it.errSchemaPath}/${keyword}`,
        topSchemaRef: schemaRef,
        compositeRule: true
      }, valid);
      cxt.pass(valid, () => cxt.error(true));
    }
    exports.macroKeywordCode = macroKeywordCode;
    function funcKeywordCode(cxt, def) {
      var _a;
      const { gen, keyword, schema, parentSchema, $data, it } = cxt;
      checkAsyncKeyword(it, def);
      const validate3 = !$data && def.compile ? def.compile.call(it.self, schema, parentSchema, it) : def.validate;
      const validateRef = useKeyword(gen, keyword, validate3);
      const valid = gen.let("valid");
      cxt.block$data(valid, validateKeyword);
      cxt.ok((_a = def.valid) !== null && _a !== void 0 ? _a : valid);
      function validateKeyword() {
        if (def.errors === false) {
          assignValid();
          if (def.modifying)
            modifyData(cxt);
          reportErrs(() => cxt.error());
        } else {
          const ruleErrs = def.async ? validateAsync() : validateSync();
          if (def.modifying)
            modifyData(cxt);
          reportErrs(() => addErrs(cxt, ruleErrs));
        }
      }
      function validateAsync() {
        const ruleErrs = gen.let("ruleErrs", null);
        gen.try(() => assignValid((0, codegen_1._)`await `), (e) => gen.assign(valid, false).if((0, codegen_1._)`${e} instanceof ${it.ValidationError}`, () => gen.assign(ruleErrs, (0, codegen_1._)`${e}.errors`), () => gen.throw(e)));
        return ruleErrs;
      }
      function validateSync() {
        const validateErrs = (0, codegen_1._)`${validateRef}.errors`;
        gen.assign(validateErrs, null);
        assignValid(codegen_1.nil);
        return validateErrs;
      }
      function assignValid(_await = def.async ? (0, codegen_1._)`await ` : codegen_1.nil) {
        const passCxt = it.opts.passContext ? names_1.default.this : names_1.default.self;
        const passSchema = !("compile" in def && !$data || def.schema === false);
        gen.assign(valid, (0, codegen_1._)`${_await}${(0, code_1.callValidateCode)(cxt, validateRef, passCxt, passSchema)}`, def.modifying);
      }
      function reportErrs(errors) {
        var _a2;
        gen.if((0, codegen_1.not)((_a2 = def.valid) !== null && _a2 !== void 0 ? _a2 : valid), errors);
      }
    }
    exports.funcKeywordCode = funcKeywordCode;
    function modifyData(cxt) {
      const { gen, data, it } = cxt;
      gen.if(it.parentData, () => gen.assign(data, (0, codegen_1._)`${it.parentData}[${it.parentDataProperty}]`));
    }
    function addErrs(cxt, errs) {
      const { gen } = cxt;
      gen.if((0, codegen_1._)`Array.isArray(${errs})`, () => {
        gen.assign(names_1.default.vErrors, (0, codegen_1._)`${names_1.default.vErrors} === null ? ${errs} : ${names_1.default.vErrors}.concat(${errs})`).assign(names_1.default.errors, (0, codegen_1._)`${names_1.default.vErrors}.length`);
        (0, errors_1.extendErrors)(cxt);
      }, () => cxt.error());
    }
    function checkAsyncKeyword({ schemaEnv }, def) {
      if (def.async && !schemaEnv.$async)
        throw new Error("async keyword in sync schema");
    }
    function useKeyword(gen, keyword, result) {
      if (result === void 0)
        throw new Error(`keyword "${keyword}" failed to compile`);
      return gen.scopeValue("keyword", typeof result == "function" ? { ref: result } : { ref: result, code: (0, codegen_1.stringify)(result) });
    }
    function validSchemaType(schema, schemaType, allowUndefined = false) {
      return !schemaType.length || schemaType.some((st) => st === "array" ? Array.isArray(schema) : st === "object" ? schema && typeof schema == "object" && !Array.isArray(schema) : typeof schema == st || allowUndefined && typeof schema == "undefined");
    }
    exports.validSchemaType = validSchemaType;
    function validateKeywordUsage({ schema, opts, self, errSchemaPath }, def, keyword) {
      if (Array.isArray(def.keyword) ? !def.keyword.includes(keyword) : def.keyword !== keyword) {
        throw new Error("ajv implementation error");
      }
      const deps = def.dependencies;
      if (deps === null || deps === void 0 ? void 0 : deps.some((kwd) => !Object.prototype.hasOwnProperty.call(schema, kwd))) {
        throw new Error(`parent schema must have dependencies of ${keyword}: ${deps.join(",")}`);
      }
      if (def.validateSchema) {
        const valid = def.validateSchema(schema[keyword]);
        if (!valid) {
          const msg = `keyword "${keyword}" value is invalid at path "${errSchemaPath}": ` + self.errorsText(def.validateSchema.errors);
          if (opts.validateSchema === "log")
            self.logger.error(msg);
          else
            throw new Error(msg);
        }
      }
    }
    exports.validateKeywordUsage = validateKeywordUsage;
  }
});

// node_modules/ajv/dist/compile/validate/subschema.js
var require_subschema = __commonJS({
  "node_modules/ajv/dist/compile/validate/subschema.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.extendSubschemaMode = exports.extendSubschemaData = exports.getSubschema = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    function getSubschema(it, { keyword, schemaProp, schema, schemaPath, errSchemaPath, topSchemaRef }) {
      if (keyword !== void 0 && schema !== void 0) {
        throw new Error('both "keyword" and "schema" passed, only one allowed');
      }
      if (keyword !== void 0) {
        const sch = it.schema[keyword];
        return schemaProp === void 0 ? {
          schema: sch,
          schemaPath: (0, codegen_1._)`${it.schemaPath}${(0, codegen_1.getProperty)(keyword)}`,
          errSchemaPath: `${it.errSchemaPath}/${keyword}`
        } : {
          schema: sch[schemaProp],
          schemaPath: (0, codegen_1._)`${it.schemaPath}${(0, codegen_1.getProperty)(keyword)}${(0, codegen_1.getProperty)(schemaProp)}`,
          errSchemaPath: `${it.errSchemaPath}/${keyword}/${(0, util_1.escapeFragment)(schemaProp)}`
        };
      }
      if (schema !== void 0) {
        if (schemaPath === void 0 || errSchemaPath === void 0 || topSchemaRef === void 0) {
          throw new Error('"schemaPath", "errSchemaPath" and "topSchemaRef" are required with "schema"');
        }
        return {
          schema,
          schemaPath,
          topSchemaRef,
          errSchemaPath
        };
      }
      throw new Error('either "keyword" or "schema" must be passed');
    }
    exports.getSubschema = getSubschema;
    function extendSubschemaData(subschema, it, { dataProp, dataPropType: dpType, data, dataTypes, propertyName }) {
      if (data !== void 0 && dataProp !== void 0) {
        throw new Error('both "data" and "dataProp" passed, only one allowed');
      }
      const { gen } = it;
      if (dataProp !== void 0) {
        const { errorPath, dataPathArr, opts } = it;
        const nextData = gen.let("data", (0, codegen_1._)`${it.data}${(0, codegen_1.getProperty)(dataProp)}`, true);
        dataContextProps(nextData);
        subschema.errorPath = (0, codegen_1.str)`${errorPath}${(0, util_1.getErrorPath)(dataProp, dpType, opts.jsPropertySyntax)}`;
        subschema.parentDataProperty = (0, codegen_1._)`${dataProp}`;
        subschema.dataPathArr = [...dataPathArr, subschema.parentDataProperty];
      }
      if (data !== void 0) {
        const nextData = data instanceof codegen_1.Name ? data : gen.let("data", data, true);
        dataContextProps(nextData);
        if (propertyName !== void 0)
          subschema.propertyName = propertyName;
      }
      if (dataTypes)
        subschema.dataTypes = dataTypes;
      function dataContextProps(_nextData) {
        subschema.data = _nextData;
        subschema.dataLevel = it.dataLevel + 1;
        subschema.dataTypes = [];
        it.definedProperties = /* @__PURE__ */ new Set();
        subschema.parentData = it.data;
        subschema.dataNames = [...it.dataNames, _nextData];
      }
    }
    exports.extendSubschemaData = extendSubschemaData;
    function extendSubschemaMode(subschema, { jtdDiscriminator, jtdMetadata, compositeRule, createErrors, allErrors }) {
      if (compositeRule !== void 0)
        subschema.compositeRule = compositeRule;
      if (createErrors !== void 0)
        subschema.createErrors = createErrors;
      if (allErrors !== void 0)
        subschema.allErrors = allErrors;
      subschema.jtdDiscriminator = jtdDiscriminator;
      subschema.jtdMetadata = jtdMetadata;
    }
    exports.extendSubschemaMode = extendSubschemaMode;
  }
});

// node_modules/fast-deep-equal/index.js
var require_fast_deep_equal = __commonJS({
  "node_modules/fast-deep-equal/index.js"(exports, module) {
    "use strict";
    module.exports = function equal(a, b) {
      if (a === b) return true;
      if (a && b && typeof a == "object" && typeof b == "object") {
        if (a.constructor !== b.constructor) return false;
        var length, i, keys;
        if (Array.isArray(a)) {
          length = a.length;
          if (length != b.length) return false;
          for (i = length; i-- !== 0; )
            if (!equal(a[i], b[i])) return false;
          return true;
        }
        if (a.constructor === RegExp) return a.source === b.source && a.flags === b.flags;
        if (a.valueOf !== Object.prototype.valueOf) return a.valueOf() === b.valueOf();
        if (a.toString !== Object.prototype.toString) return a.toString() === b.toString();
        keys = Object.keys(a);
        length = keys.length;
        if (length !== Object.keys(b).length) return false;
        for (i = length; i-- !== 0; )
          if (!Object.prototype.hasOwnProperty.call(b, keys[i])) return false;
        for (i = length; i-- !== 0; ) {
          var key = keys[i];
          if (!equal(a[key], b[key])) return false;
        }
        return true;
      }
      return a !== a && b !== b;
    };
  }
});

// node_modules/json-schema-traverse/index.js
var require_json_schema_traverse = __commonJS({
  "node_modules/json-schema-traverse/index.js"(exports, module) {
    "use strict";
    var traverse = module.exports = function(schema, opts, cb) {
      if (typeof opts == "function") {
        cb = opts;
        opts = {};
      }
      cb = opts.cb || cb;
      var pre = typeof cb == "function" ? cb : cb.pre || function() {
      };
      var post = cb.post || function() {
      };
      _traverse(opts, pre, post, schema, "", schema);
    };
    traverse.keywords = {
      additionalItems: true,
      items: true,
      contains: true,
      additionalProperties: true,
      propertyNames: true,
      not: true,
      if: true,
      then: true,
      else: true
    };
    traverse.arrayKeywords = {
      items: true,
      allOf: true,
      anyOf: true,
      oneOf: true
    };
    traverse.propsKeywords = {
      $defs: true,
      definitions: true,
      properties: true,
      patternProperties: true,
      dependencies: true
    };
    traverse.skipKeywords = {
      default: true,
      enum: true,
      const: true,
      required: true,
      maximum: true,
      minimum: true,
      exclusiveMaximum: true,
      exclusiveMinimum: true,
      multipleOf: true,
      maxLength: true,
      minLength: true,
      pattern: true,
      format: true,
      maxItems: true,
      minItems: true,
      uniqueItems: true,
      maxProperties: true,
      minProperties: true
    };
    function _traverse(opts, pre, post, schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex) {
      if (schema && typeof schema == "object" && !Array.isArray(schema)) {
        pre(schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex);
        for (var key in schema) {
          var sch = schema[key];
          if (Array.isArray(sch)) {
            if (key in traverse.arrayKeywords) {
              for (var i = 0; i < sch.length; i++)
                _traverse(opts, pre, post, sch[i], jsonPtr + "/" + key + "/" + i, rootSchema, jsonPtr, key, schema, i);
            }
          } else if (key in traverse.propsKeywords) {
            if (sch && typeof sch == "object") {
              for (var prop in sch)
                _traverse(opts, pre, post, sch[prop], jsonPtr + "/" + key + "/" + escapeJsonPtr(prop), rootSchema, jsonPtr, key, schema, prop);
            }
          } else if (key in traverse.keywords || opts.allKeys && !(key in traverse.skipKeywords)) {
            _traverse(opts, pre, post, sch, jsonPtr + "/" + key, rootSchema, jsonPtr, key, schema);
          }
        }
        post(schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex);
      }
    }
    function escapeJsonPtr(str) {
      return str.replace(/~/g, "~0").replace(/\//g, "~1");
    }
  }
});

// node_modules/ajv/dist/compile/resolve.js
var require_resolve = __commonJS({
  "node_modules/ajv/dist/compile/resolve.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.getSchemaRefs = exports.resolveUrl = exports.normalizeId = exports._getFullPath = exports.getFullPath = exports.inlineRef = void 0;
    var util_1 = require_util();
    var equal = require_fast_deep_equal();
    var traverse = require_json_schema_traverse();
    var SIMPLE_INLINED = /* @__PURE__ */ new Set([
      "type",
      "format",
      "pattern",
      "maxLength",
      "minLength",
      "maxProperties",
      "minProperties",
      "maxItems",
      "minItems",
      "maximum",
      "minimum",
      "uniqueItems",
      "multipleOf",
      "required",
      "enum",
      "const"
    ]);
    function inlineRef(schema, limit = true) {
      if (typeof schema == "boolean")
        return true;
      if (limit === true)
        return !hasRef(schema);
      if (!limit)
        return false;
      return countKeys(schema) <= limit;
    }
    exports.inlineRef = inlineRef;
    var REF_KEYWORDS = /* @__PURE__ */ new Set([
      "$ref",
      "$recursiveRef",
      "$recursiveAnchor",
      "$dynamicRef",
      "$dynamicAnchor"
    ]);
    function hasRef(schema) {
      for (const key in schema) {
        if (REF_KEYWORDS.has(key))
          return true;
        const sch = schema[key];
        if (Array.isArray(sch) && sch.some(hasRef))
          return true;
        if (typeof sch == "object" && hasRef(sch))
          return true;
      }
      return false;
    }
    function countKeys(schema) {
      let count = 0;
      for (const key in schema) {
        if (key === "$ref")
          return Infinity;
        count++;
        if (SIMPLE_INLINED.has(key))
          continue;
        if (typeof schema[key] == "object") {
          (0, util_1.eachItem)(schema[key], (sch) => count += countKeys(sch));
        }
        if (count === Infinity)
          return Infinity;
      }
      return count;
    }
    function getFullPath(resolver, id = "", normalize) {
      if (normalize !== false)
        id = normalizeId(id);
      const p = resolver.parse(id);
      return _getFullPath(resolver, p);
    }
    exports.getFullPath = getFullPath;
    function _getFullPath(resolver, p) {
      const serialized = resolver.serialize(p);
      return serialized.split("#")[0] + "#";
    }
    exports._getFullPath = _getFullPath;
    var TRAILING_SLASH_HASH = /#\/?$/;
    function normalizeId(id) {
      return id ? id.replace(TRAILING_SLASH_HASH, "") : "";
    }
    exports.normalizeId = normalizeId;
    function resolveUrl(resolver, baseId, id) {
      id = normalizeId(id);
      return resolver.resolve(baseId, id);
    }
    exports.resolveUrl = resolveUrl;
    var ANCHOR = /^[a-z_][-a-z0-9._]*$/i;
    function getSchemaRefs(schema, baseId) {
      if (typeof schema == "boolean")
        return {};
      const { schemaId, uriResolver } = this.opts;
      const schId = normalizeId(schema[schemaId] || baseId);
      const baseIds = { "": schId };
      const pathPrefix = getFullPath(uriResolver, schId, false);
      const localRefs = {};
      const schemaRefs = /* @__PURE__ */ new Set();
      traverse(schema, { allKeys: true }, (sch, jsonPtr, _, parentJsonPtr) => {
        if (parentJsonPtr === void 0)
          return;
        const fullPath = pathPrefix + jsonPtr;
        let innerBaseId = baseIds[parentJsonPtr];
        if (typeof sch[schemaId] == "string")
          innerBaseId = addRef.call(this, sch[schemaId]);
        addAnchor.call(this, sch.$anchor);
        addAnchor.call(this, sch.$dynamicAnchor);
        baseIds[jsonPtr] = innerBaseId;
        function addRef(ref) {
          const _resolve = this.opts.uriResolver.resolve;
          ref = normalizeId(innerBaseId ? _resolve(innerBaseId, ref) : ref);
          if (schemaRefs.has(ref))
            throw ambiguos(ref);
          schemaRefs.add(ref);
          let schOrRef = this.refs[ref];
          if (typeof schOrRef == "string")
            schOrRef = this.refs[schOrRef];
          if (typeof schOrRef == "object") {
            checkAmbiguosRef(sch, schOrRef.schema, ref);
          } else if (ref !== normalizeId(fullPath)) {
            if (ref[0] === "#") {
              checkAmbiguosRef(sch, localRefs[ref], ref);
              localRefs[ref] = sch;
            } else {
              this.refs[ref] = fullPath;
            }
          }
          return ref;
        }
        function addAnchor(anchor) {
          if (typeof anchor == "string") {
            if (!ANCHOR.test(anchor))
              throw new Error(`invalid anchor "${anchor}"`);
            addRef.call(this, `#${anchor}`);
          }
        }
      });
      return localRefs;
      function checkAmbiguosRef(sch1, sch2, ref) {
        if (sch2 !== void 0 && !equal(sch1, sch2))
          throw ambiguos(ref);
      }
      function ambiguos(ref) {
        return new Error(`reference "${ref}" resolves to more than one schema`);
      }
    }
    exports.getSchemaRefs = getSchemaRefs;
  }
});

// node_modules/ajv/dist/compile/validate/index.js
var require_validate = __commonJS({
  "node_modules/ajv/dist/compile/validate/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.getData = exports.KeywordCxt = exports.validateFunctionCode = void 0;
    var boolSchema_1 = require_boolSchema();
    var dataType_1 = require_dataType();
    var applicability_1 = require_applicability();
    var dataType_2 = require_dataType();
    var defaults_1 = require_defaults();
    var keyword_1 = require_keyword();
    var subschema_1 = require_subschema();
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var resolve_1 = require_resolve();
    var util_1 = require_util();
    var errors_1 = require_errors();
    function validateFunctionCode(it) {
      if (isSchemaObj(it)) {
        checkKeywords(it);
        if (schemaCxtHasRules(it)) {
          topSchemaObjCode(it);
          return;
        }
      }
      validateFunction(it, () => (0, boolSchema_1.topBoolOrEmptySchema)(it));
    }
    exports.validateFunctionCode = validateFunctionCode;
    function validateFunction({ gen, validateName, schema, schemaEnv, opts }, body) {
      if (opts.code.es5) {
        gen.func(validateName, (0, codegen_1._)`${names_1.default.data}, ${names_1.default.valCxt}`, schemaEnv.$async, () => {
          gen.code((0, codegen_1._)`"use strict"; ${funcSourceUrl(schema, opts)}`);
          destructureValCxtES5(gen, opts);
          gen.code(body);
        });
      } else {
        gen.func(validateName, (0, codegen_1._)`${names_1.default.data}, ${destructureValCxt(opts)}`, schemaEnv.$async, () => gen.code(funcSourceUrl(schema, opts)).code(body));
      }
    }
    function destructureValCxt(opts) {
      return (0, codegen_1._)`{${names_1.default.instancePath}="", ${names_1.default.parentData}, ${names_1.default.parentDataProperty}, ${names_1.default.rootData}=${names_1.default.data}${opts.dynamicRef ? (0, codegen_1._)`, ${names_1.default.dynamicAnchors}={}` : codegen_1.nil}}={}`;
    }
    function destructureValCxtES5(gen, opts) {
      gen.if(names_1.default.valCxt, () => {
        gen.var(names_1.default.instancePath, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.instancePath}`);
        gen.var(names_1.default.parentData, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.parentData}`);
        gen.var(names_1.default.parentDataProperty, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.parentDataProperty}`);
        gen.var(names_1.default.rootData, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.rootData}`);
        if (opts.dynamicRef)
          gen.var(names_1.default.dynamicAnchors, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.dynamicAnchors}`);
      }, () => {
        gen.var(names_1.default.instancePath, (0, codegen_1._)`""`);
        gen.var(names_1.default.parentData, (0, codegen_1._)`undefined`);
        gen.var(names_1.default.parentDataProperty, (0, codegen_1._)`undefined`);
        gen.var(names_1.default.rootData, names_1.default.data);
        if (opts.dynamicRef)
          gen.var(names_1.default.dynamicAnchors, (0, codegen_1._)`{}`);
      });
    }
    function topSchemaObjCode(it) {
      const { schema, opts, gen } = it;
      validateFunction(it, () => {
        if (opts.$comment && schema.$comment)
          commentKeyword(it);
        checkNoDefault(it);
        gen.let(names_1.default.vErrors, null);
        gen.let(names_1.default.errors, 0);
        if (opts.unevaluated)
          resetEvaluated(it);
        typeAndKeywords(it);
        returnResults(it);
      });
      return;
    }
    function resetEvaluated(it) {
      const { gen, validateName } = it;
      it.evaluated = gen.const("evaluated", (0, codegen_1._)`${validateName}.evaluated`);
      gen.if((0, codegen_1._)`${it.evaluated}.dynamicProps`, () => gen.assign((0, codegen_1._)`${it.evaluated}.props`, (0, codegen_1._)`undefined`));
      gen.if((0, codegen_1._)`${it.evaluated}.dynamicItems`, () => gen.assign((0, codegen_1._)`${it.evaluated}.items`, (0, codegen_1._)`undefined`));
    }
    function funcSourceUrl(schema, opts) {
      const schId = typeof schema == "object" && schema[opts.schemaId];
      return schId && (opts.code.source || opts.code.process) ? (0, codegen_1._)`/*# sourceURL=${schId} */` : codegen_1.nil;
    }
    function subschemaCode(it, valid) {
      if (isSchemaObj(it)) {
        checkKeywords(it);
        if (schemaCxtHasRules(it)) {
          subSchemaObjCode(it, valid);
          return;
        }
      }
      (0, boolSchema_1.boolOrEmptySchema)(it, valid);
    }
    function schemaCxtHasRules({ schema, self }) {
      if (typeof schema == "boolean")
        return !schema;
      for (const key in schema)
        if (self.RULES.all[key])
          return true;
      return false;
    }
    function isSchemaObj(it) {
      return typeof it.schema != "boolean";
    }
    function subSchemaObjCode(it, valid) {
      const { schema, gen, opts } = it;
      if (opts.$comment && schema.$comment)
        commentKeyword(it);
      updateContext(it);
      checkAsyncSchema(it);
      const errsCount = gen.const("_errs", names_1.default.errors);
      typeAndKeywords(it, errsCount);
      gen.var(valid, (0, codegen_1._)`${errsCount} === ${names_1.default.errors}`);
    }
    function checkKeywords(it) {
      (0, util_1.checkUnknownRules)(it);
      checkRefsAndKeywords(it);
    }
    function typeAndKeywords(it, errsCount) {
      if (it.opts.jtd)
        return schemaKeywords(it, [], false, errsCount);
      const types = (0, dataType_1.getSchemaTypes)(it.schema);
      const checkedTypes = (0, dataType_1.coerceAndCheckDataType)(it, types);
      schemaKeywords(it, types, !checkedTypes, errsCount);
    }
    function checkRefsAndKeywords(it) {
      const { schema, errSchemaPath, opts, self } = it;
      if (schema.$ref && opts.ignoreKeywordsWithRef && (0, util_1.schemaHasRulesButRef)(schema, self.RULES)) {
        self.logger.warn(`$ref: keywords ignored in schema at path "${errSchemaPath}"`);
      }
    }
    function checkNoDefault(it) {
      const { schema, opts } = it;
      if (schema.default !== void 0 && opts.useDefaults && opts.strictSchema) {
        (0, util_1.checkStrictMode)(it, "default is ignored in the schema root");
      }
    }
    function updateContext(it) {
      const schId = it.schema[it.opts.schemaId];
      if (schId)
        it.baseId = (0, resolve_1.resolveUrl)(it.opts.uriResolver, it.baseId, schId);
    }
    function checkAsyncSchema(it) {
      if (it.schema.$async && !it.schemaEnv.$async)
        throw new Error("async schema in sync schema");
    }
    function commentKeyword({ gen, schemaEnv, schema, errSchemaPath, opts }) {
      const msg = schema.$comment;
      if (opts.$comment === true) {
        gen.code((0, codegen_1._)`${names_1.default.self}.logger.log(${msg})`);
      } else if (typeof opts.$comment == "function") {
        const schemaPath = (0, codegen_1.str)`${errSchemaPath}/$comment`;
        const rootName = gen.scopeValue("root", { ref: schemaEnv.root });
        gen.code((0, codegen_1._)`${names_1.default.self}.opts.$comment(${msg}, ${schemaPath}, ${rootName}.schema)`);
      }
    }
    function returnResults(it) {
      const { gen, schemaEnv, validateName, ValidationError, opts } = it;
      if (schemaEnv.$async) {
        gen.if((0, codegen_1._)`${names_1.default.errors} === 0`, () => gen.return(names_1.default.data), () => gen.throw((0, codegen_1._)`new ${ValidationError}(${names_1.default.vErrors})`));
      } else {
        gen.assign((0, codegen_1._)`${validateName}.errors`, names_1.default.vErrors);
        if (opts.unevaluated)
          assignEvaluated(it);
        gen.return((0, codegen_1._)`${names_1.default.errors} === 0`);
      }
    }
    function assignEvaluated({ gen, evaluated, props, items }) {
      if (props instanceof codegen_1.Name)
        gen.assign((0, codegen_1._)`${evaluated}.props`, props);
      if (items instanceof codegen_1.Name)
        gen.assign((0, codegen_1._)`${evaluated}.items`, items);
    }
    function schemaKeywords(it, types, typeErrors, errsCount) {
      const { gen, schema, data, allErrors, opts, self } = it;
      const { RULES } = self;
      if (schema.$ref && (opts.ignoreKeywordsWithRef || !(0, util_1.schemaHasRulesButRef)(schema, RULES))) {
        gen.block(() => keywordCode(it, "$ref", RULES.all.$ref.definition));
        return;
      }
      if (!opts.jtd)
        checkStrictTypes(it, types);
      gen.block(() => {
        for (const group of RULES.rules)
          groupKeywords(group);
        groupKeywords(RULES.post);
      });
      function groupKeywords(group) {
        if (!(0, applicability_1.shouldUseGroup)(schema, group))
          return;
        if (group.type) {
          gen.if((0, dataType_2.checkDataType)(group.type, data, opts.strictNumbers));
          iterateKeywords(it, group);
          if (types.length === 1 && types[0] === group.type && typeErrors) {
            gen.else();
            (0, dataType_2.reportTypeError)(it);
          }
          gen.endIf();
        } else {
          iterateKeywords(it, group);
        }
        if (!allErrors)
          gen.if((0, codegen_1._)`${names_1.default.errors} === ${errsCount || 0}`);
      }
    }
    function iterateKeywords(it, group) {
      const { gen, schema, opts: { useDefaults } } = it;
      if (useDefaults)
        (0, defaults_1.assignDefaults)(it, group.type);
      gen.block(() => {
        for (const rule of group.rules) {
          if ((0, applicability_1.shouldUseRule)(schema, rule)) {
            keywordCode(it, rule.keyword, rule.definition, group.type);
          }
        }
      });
    }
    function checkStrictTypes(it, types) {
      if (it.schemaEnv.meta || !it.opts.strictTypes)
        return;
      checkContextTypes(it, types);
      if (!it.opts.allowUnionTypes)
        checkMultipleTypes(it, types);
      checkKeywordTypes(it, it.dataTypes);
    }
    function checkContextTypes(it, types) {
      if (!types.length)
        return;
      if (!it.dataTypes.length) {
        it.dataTypes = types;
        return;
      }
      types.forEach((t) => {
        if (!includesType(it.dataTypes, t)) {
          strictTypesError(it, `type "${t}" not allowed by context "${it.dataTypes.join(",")}"`);
        }
      });
      narrowSchemaTypes(it, types);
    }
    function checkMultipleTypes(it, ts) {
      if (ts.length > 1 && !(ts.length === 2 && ts.includes("null"))) {
        strictTypesError(it, "use allowUnionTypes to allow union type keyword");
      }
    }
    function checkKeywordTypes(it, ts) {
      const rules = it.self.RULES.all;
      for (const keyword in rules) {
        const rule = rules[keyword];
        if (typeof rule == "object" && (0, applicability_1.shouldUseRule)(it.schema, rule)) {
          const { type } = rule.definition;
          if (type.length && !type.some((t) => hasApplicableType(ts, t))) {
            strictTypesError(it, `missing type "${type.join(",")}" for keyword "${keyword}"`);
          }
        }
      }
    }
    function hasApplicableType(schTs, kwdT) {
      return schTs.includes(kwdT) || kwdT === "number" && schTs.includes("integer");
    }
    function includesType(ts, t) {
      return ts.includes(t) || t === "integer" && ts.includes("number");
    }
    function narrowSchemaTypes(it, withTypes) {
      const ts = [];
      for (const t of it.dataTypes) {
        if (includesType(withTypes, t))
          ts.push(t);
        else if (withTypes.includes("integer") && t === "number")
          ts.push("integer");
      }
      it.dataTypes = ts;
    }
    function strictTypesError(it, msg) {
      const schemaPath = it.schemaEnv.baseId + it.errSchemaPath;
      msg += ` at "${schemaPath}" (strictTypes)`;
      (0, util_1.checkStrictMode)(it, msg, it.opts.strictTypes);
    }
    var KeywordCxt = class {
      constructor(it, def, keyword) {
        (0, keyword_1.validateKeywordUsage)(it, def, keyword);
        this.gen = it.gen;
        this.allErrors = it.allErrors;
        this.keyword = keyword;
        this.data = it.data;
        this.schema = it.schema[keyword];
        this.$data = def.$data && it.opts.$data && this.schema && this.schema.$data;
        this.schemaValue = (0, util_1.schemaRefOrVal)(it, this.schema, keyword, this.$data);
        this.schemaType = def.schemaType;
        this.parentSchema = it.schema;
        this.params = {};
        this.it = it;
        this.def = def;
        if (this.$data) {
          this.schemaCode = it.gen.const("vSchema", getData(this.$data, it));
        } else {
          this.schemaCode = this.schemaValue;
          if (!(0, keyword_1.validSchemaType)(this.schema, def.schemaType, def.allowUndefined)) {
            throw new Error(`${keyword} value must be ${JSON.stringify(def.schemaType)}`);
          }
        }
        if ("code" in def ? def.trackErrors : def.errors !== false) {
          this.errsCount = it.gen.const("_errs", names_1.default.errors);
        }
      }
      result(condition, successAction, failAction) {
        this.failResult((0, codegen_1.not)(condition), successAction, failAction);
      }
      failResult(condition, successAction, failAction) {
        this.gen.if(condition);
        if (failAction)
          failAction();
        else
          this.error();
        if (successAction) {
          this.gen.else();
          successAction();
          if (this.allErrors)
            this.gen.endIf();
        } else {
          if (this.allErrors)
            this.gen.endIf();
          else
            this.gen.else();
        }
      }
      pass(condition, failAction) {
        this.failResult((0, codegen_1.not)(condition), void 0, failAction);
      }
      fail(condition) {
        if (condition === void 0) {
          this.error();
          if (!this.allErrors)
            this.gen.if(false);
          return;
        }
        this.gen.if(condition);
        this.error();
        if (this.allErrors)
          this.gen.endIf();
        else
          this.gen.else();
      }
      fail$data(condition) {
        if (!this.$data)
          return this.fail(condition);
        const { schemaCode } = this;
        this.fail((0, codegen_1._)`${schemaCode} !== undefined && (${(0, codegen_1.or)(this.invalid$data(), condition)})`);
      }
      error(append, errorParams, errorPaths) {
        if (errorParams) {
          this.setParams(errorParams);
          this._error(append, errorPaths);
          this.setParams({});
          return;
        }
        this._error(append, errorPaths);
      }
      _error(append, errorPaths) {
        ;
        (append ? errors_1.reportExtraError : errors_1.reportError)(this, this.def.error, errorPaths);
      }
      $dataError() {
        (0, errors_1.reportError)(this, this.def.$dataError || errors_1.keyword$DataError);
      }
      reset() {
        if (this.errsCount === void 0)
          throw new Error('add "trackErrors" to keyword definition');
        (0, errors_1.resetErrorsCount)(this.gen, this.errsCount);
      }
      ok(cond) {
        if (!this.allErrors)
          this.gen.if(cond);
      }
      setParams(obj, assign) {
        if (assign)
          Object.assign(this.params, obj);
        else
          this.params = obj;
      }
      block$data(valid, codeBlock, $dataValid = codegen_1.nil) {
        this.gen.block(() => {
          this.check$data(valid, $dataValid);
          codeBlock();
        });
      }
      check$data(valid = codegen_1.nil, $dataValid = codegen_1.nil) {
        if (!this.$data)
          return;
        const { gen, schemaCode, schemaType, def } = this;
        gen.if((0, codegen_1.or)((0, codegen_1._)`${schemaCode} === undefined`, $dataValid));
        if (valid !== codegen_1.nil)
          gen.assign(valid, true);
        if (schemaType.length || def.validateSchema) {
          gen.elseIf(this.invalid$data());
          this.$dataError();
          if (valid !== codegen_1.nil)
            gen.assign(valid, false);
        }
        gen.else();
      }
      invalid$data() {
        const { gen, schemaCode, schemaType, def, it } = this;
        return (0, codegen_1.or)(wrong$DataType(), invalid$DataSchema());
        function wrong$DataType() {
          if (schemaType.length) {
            if (!(schemaCode instanceof codegen_1.Name))
              throw new Error("ajv implementation error");
            const st = Array.isArray(schemaType) ? schemaType : [schemaType];
            return (0, codegen_1._)`${(0, dataType_2.checkDataTypes)(st, schemaCode, it.opts.strictNumbers, dataType_2.DataType.Wrong)}`;
          }
          return codegen_1.nil;
        }
        function invalid$DataSchema() {
          if (def.validateSchema) {
            const validateSchemaRef = gen.scopeValue("validate$data", { ref: def.validateSchema });
            return (0, codegen_1._)`!${validateSchemaRef}(${schemaCode})`;
          }
          return codegen_1.nil;
        }
      }
      subschema(appl, valid) {
        const subschema = (0, subschema_1.getSubschema)(this.it, appl);
        (0, subschema_1.extendSubschemaData)(subschema, this.it, appl);
        (0, subschema_1.extendSubschemaMode)(subschema, appl);
        const nextContext = { ...this.it, ...subschema, items: void 0, props: void 0 };
        subschemaCode(nextContext, valid);
        return nextContext;
      }
      mergeEvaluated(schemaCxt, toName) {
        const { it, gen } = this;
        if (!it.opts.unevaluated)
          return;
        if (it.props !== true && schemaCxt.props !== void 0) {
          it.props = util_1.mergeEvaluated.props(gen, schemaCxt.props, it.props, toName);
        }
        if (it.items !== true && schemaCxt.items !== void 0) {
          it.items = util_1.mergeEvaluated.items(gen, schemaCxt.items, it.items, toName);
        }
      }
      mergeValidEvaluated(schemaCxt, valid) {
        const { it, gen } = this;
        if (it.opts.unevaluated && (it.props !== true || it.items !== true)) {
          gen.if(valid, () => this.mergeEvaluated(schemaCxt, codegen_1.Name));
          return true;
        }
      }
    };
    exports.KeywordCxt = KeywordCxt;
    function keywordCode(it, keyword, def, ruleType) {
      const cxt = new KeywordCxt(it, def, keyword);
      if ("code" in def) {
        def.code(cxt, ruleType);
      } else if (cxt.$data && def.validate) {
        (0, keyword_1.funcKeywordCode)(cxt, def);
      } else if ("macro" in def) {
        (0, keyword_1.macroKeywordCode)(cxt, def);
      } else if (def.compile || def.validate) {
        (0, keyword_1.funcKeywordCode)(cxt, def);
      }
    }
    var JSON_POINTER = /^\/(?:[^~]|~0|~1)*$/;
    var RELATIVE_JSON_POINTER = /^([0-9]+)(#|\/(?:[^~]|~0|~1)*)?$/;
    function getData($data, { dataLevel, dataNames, dataPathArr }) {
      let jsonPointer;
      let data;
      if ($data === "")
        return names_1.default.rootData;
      if ($data[0] === "/") {
        if (!JSON_POINTER.test($data))
          throw new Error(`Invalid JSON-pointer: ${$data}`);
        jsonPointer = $data;
        data = names_1.default.rootData;
      } else {
        const matches2 = RELATIVE_JSON_POINTER.exec($data);
        if (!matches2)
          throw new Error(`Invalid JSON-pointer: ${$data}`);
        const up = +matches2[1];
        jsonPointer = matches2[2];
        if (jsonPointer === "#") {
          if (up >= dataLevel)
            throw new Error(errorMsg("property/index", up));
          return dataPathArr[dataLevel - up];
        }
        if (up > dataLevel)
          throw new Error(errorMsg("data", up));
        data = dataNames[dataLevel - up];
        if (!jsonPointer)
          return data;
      }
      let expr = data;
      const segments = jsonPointer.split("/");
      for (const segment of segments) {
        if (segment) {
          data = (0, codegen_1._)`${data}${(0, codegen_1.getProperty)((0, util_1.unescapeJsonPointer)(segment))}`;
          expr = (0, codegen_1._)`${expr} && ${data}`;
        }
      }
      return expr;
      function errorMsg(pointerType, up) {
        return `Cannot access ${pointerType} ${up} levels up, current level is ${dataLevel}`;
      }
    }
    exports.getData = getData;
  }
});

// node_modules/ajv/dist/runtime/validation_error.js
var require_validation_error = __commonJS({
  "node_modules/ajv/dist/runtime/validation_error.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var ValidationError = class extends Error {
      constructor(errors) {
        super("validation failed");
        this.errors = errors;
        this.ajv = this.validation = true;
      }
    };
    exports.default = ValidationError;
  }
});

// node_modules/ajv/dist/compile/ref_error.js
var require_ref_error = __commonJS({
  "node_modules/ajv/dist/compile/ref_error.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var resolve_1 = require_resolve();
    var MissingRefError = class extends Error {
      constructor(resolver, baseId, ref, msg) {
        super(msg || `can't resolve reference ${ref} from id ${baseId}`);
        this.missingRef = (0, resolve_1.resolveUrl)(resolver, baseId, ref);
        this.missingSchema = (0, resolve_1.normalizeId)((0, resolve_1.getFullPath)(resolver, this.missingRef));
      }
    };
    exports.default = MissingRefError;
  }
});

// node_modules/ajv/dist/compile/index.js
var require_compile = __commonJS({
  "node_modules/ajv/dist/compile/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.resolveSchema = exports.getCompilingSchema = exports.resolveRef = exports.compileSchema = exports.SchemaEnv = void 0;
    var codegen_1 = require_codegen();
    var validation_error_1 = require_validation_error();
    var names_1 = require_names();
    var resolve_1 = require_resolve();
    var util_1 = require_util();
    var validate_1 = require_validate();
    var SchemaEnv = class {
      constructor(env) {
        var _a;
        this.refs = {};
        this.dynamicAnchors = {};
        let schema;
        if (typeof env.schema == "object")
          schema = env.schema;
        this.schema = env.schema;
        this.schemaId = env.schemaId;
        this.root = env.root || this;
        this.baseId = (_a = env.baseId) !== null && _a !== void 0 ? _a : (0, resolve_1.normalizeId)(schema === null || schema === void 0 ? void 0 : schema[env.schemaId || "$id"]);
        this.schemaPath = env.schemaPath;
        this.localRefs = env.localRefs;
        this.meta = env.meta;
        this.$async = schema === null || schema === void 0 ? void 0 : schema.$async;
        this.refs = {};
      }
    };
    exports.SchemaEnv = SchemaEnv;
    function compileSchema(sch) {
      const _sch = getCompilingSchema.call(this, sch);
      if (_sch)
        return _sch;
      const rootId = (0, resolve_1.getFullPath)(this.opts.uriResolver, sch.root.baseId);
      const { es5, lines } = this.opts.code;
      const { ownProperties } = this.opts;
      const gen = new codegen_1.CodeGen(this.scope, { es5, lines, ownProperties });
      let _ValidationError;
      if (sch.$async) {
        _ValidationError = gen.scopeValue("Error", {
          ref: validation_error_1.default,
          code: (0, codegen_1._)`require("ajv/dist/runtime/validation_error").default`
        });
      }
      const validateName = gen.scopeName("validate");
      sch.validateName = validateName;
      const schemaCxt = {
        gen,
        allErrors: this.opts.allErrors,
        data: names_1.default.data,
        parentData: names_1.default.parentData,
        parentDataProperty: names_1.default.parentDataProperty,
        dataNames: [names_1.default.data],
        dataPathArr: [codegen_1.nil],
        // TODO can its length be used as dataLevel if nil is removed?
        dataLevel: 0,
        dataTypes: [],
        definedProperties: /* @__PURE__ */ new Set(),
        topSchemaRef: gen.scopeValue("schema", this.opts.code.source === true ? { ref: sch.schema, code: (0, codegen_1.stringify)(sch.schema) } : { ref: sch.schema }),
        validateName,
        ValidationError: _ValidationError,
        schema: sch.schema,
        schemaEnv: sch,
        rootId,
        baseId: sch.baseId || rootId,
        schemaPath: codegen_1.nil,
        errSchemaPath: sch.schemaPath || (this.opts.jtd ? "" : "#"),
        errorPath: (0, codegen_1._)`""`,
        opts: this.opts,
        self: this
      };
      let sourceCode;
      try {
        this._compilations.add(sch);
        (0, validate_1.validateFunctionCode)(schemaCxt);
        gen.optimize(this.opts.code.optimize);
        const validateCode = gen.toString();
        sourceCode = `${gen.scopeRefs(names_1.default.scope)}return ${validateCode}`;
        if (this.opts.code.process)
          sourceCode = this.opts.code.process(sourceCode, sch);
        const makeValidate = new Function(`${names_1.default.self}`, `${names_1.default.scope}`, sourceCode);
        const validate3 = makeValidate(this, this.scope.get());
        this.scope.value(validateName, { ref: validate3 });
        validate3.errors = null;
        validate3.schema = sch.schema;
        validate3.schemaEnv = sch;
        if (sch.$async)
          validate3.$async = true;
        if (this.opts.code.source === true) {
          validate3.source = { validateName, validateCode, scopeValues: gen._values };
        }
        if (this.opts.unevaluated) {
          const { props, items } = schemaCxt;
          validate3.evaluated = {
            props: props instanceof codegen_1.Name ? void 0 : props,
            items: items instanceof codegen_1.Name ? void 0 : items,
            dynamicProps: props instanceof codegen_1.Name,
            dynamicItems: items instanceof codegen_1.Name
          };
          if (validate3.source)
            validate3.source.evaluated = (0, codegen_1.stringify)(validate3.evaluated);
        }
        sch.validate = validate3;
        return sch;
      } catch (e) {
        delete sch.validate;
        delete sch.validateName;
        if (sourceCode)
          this.logger.error("Error compiling schema, function code:", sourceCode);
        throw e;
      } finally {
        this._compilations.delete(sch);
      }
    }
    exports.compileSchema = compileSchema;
    function resolveRef(root, baseId, ref) {
      var _a;
      ref = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, ref);
      const schOrFunc = root.refs[ref];
      if (schOrFunc)
        return schOrFunc;
      let _sch = resolve.call(this, root, ref);
      if (_sch === void 0) {
        const schema = (_a = root.localRefs) === null || _a === void 0 ? void 0 : _a[ref];
        const { schemaId } = this.opts;
        if (schema)
          _sch = new SchemaEnv({ schema, schemaId, root, baseId });
      }
      if (_sch === void 0)
        return;
      return root.refs[ref] = inlineOrCompile.call(this, _sch);
    }
    exports.resolveRef = resolveRef;
    function inlineOrCompile(sch) {
      if ((0, resolve_1.inlineRef)(sch.schema, this.opts.inlineRefs))
        return sch.schema;
      return sch.validate ? sch : compileSchema.call(this, sch);
    }
    function getCompilingSchema(schEnv) {
      for (const sch of this._compilations) {
        if (sameSchemaEnv(sch, schEnv))
          return sch;
      }
    }
    exports.getCompilingSchema = getCompilingSchema;
    function sameSchemaEnv(s1, s2) {
      return s1.schema === s2.schema && s1.root === s2.root && s1.baseId === s2.baseId;
    }
    function resolve(root, ref) {
      let sch;
      while (typeof (sch = this.refs[ref]) == "string")
        ref = sch;
      return sch || this.schemas[ref] || resolveSchema.call(this, root, ref);
    }
    function resolveSchema(root, ref) {
      const p = this.opts.uriResolver.parse(ref);
      const refPath = (0, resolve_1._getFullPath)(this.opts.uriResolver, p);
      let baseId = (0, resolve_1.getFullPath)(this.opts.uriResolver, root.baseId, void 0);
      if (Object.keys(root.schema).length > 0 && refPath === baseId) {
        return getJsonPointer.call(this, p, root);
      }
      const id = (0, resolve_1.normalizeId)(refPath);
      const schOrRef = this.refs[id] || this.schemas[id];
      if (typeof schOrRef == "string") {
        const sch = resolveSchema.call(this, root, schOrRef);
        if (typeof (sch === null || sch === void 0 ? void 0 : sch.schema) !== "object")
          return;
        return getJsonPointer.call(this, p, sch);
      }
      if (typeof (schOrRef === null || schOrRef === void 0 ? void 0 : schOrRef.schema) !== "object")
        return;
      if (!schOrRef.validate)
        compileSchema.call(this, schOrRef);
      if (id === (0, resolve_1.normalizeId)(ref)) {
        const { schema } = schOrRef;
        const { schemaId } = this.opts;
        const schId = schema[schemaId];
        if (schId)
          baseId = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schId);
        return new SchemaEnv({ schema, schemaId, root, baseId });
      }
      return getJsonPointer.call(this, p, schOrRef);
    }
    exports.resolveSchema = resolveSchema;
    var PREVENT_SCOPE_CHANGE = /* @__PURE__ */ new Set([
      "properties",
      "patternProperties",
      "enum",
      "dependencies",
      "definitions"
    ]);
    function getJsonPointer(parsedRef, { baseId, schema, root }) {
      var _a;
      if (((_a = parsedRef.fragment) === null || _a === void 0 ? void 0 : _a[0]) !== "/")
        return;
      for (const part of parsedRef.fragment.slice(1).split("/")) {
        if (typeof schema === "boolean")
          return;
        const partSchema = schema[(0, util_1.unescapeFragment)(part)];
        if (partSchema === void 0)
          return;
        schema = partSchema;
        const schId = typeof schema === "object" && schema[this.opts.schemaId];
        if (!PREVENT_SCOPE_CHANGE.has(part) && schId) {
          baseId = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schId);
        }
      }
      let env;
      if (typeof schema != "boolean" && schema.$ref && !(0, util_1.schemaHasRulesButRef)(schema, this.RULES)) {
        const $ref = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schema.$ref);
        env = resolveSchema.call(this, root, $ref);
      }
      const { schemaId } = this.opts;
      env = env || new SchemaEnv({ schema, schemaId, root, baseId });
      if (env.schema !== env.root.schema)
        return env;
      return void 0;
    }
  }
});

// node_modules/ajv/dist/refs/data.json
var require_data = __commonJS({
  "node_modules/ajv/dist/refs/data.json"(exports, module) {
    module.exports = {
      $id: "https://raw.githubusercontent.com/ajv-validator/ajv/master/lib/refs/data.json#",
      description: "Meta-schema for $data reference (JSON AnySchema extension proposal)",
      type: "object",
      required: ["$data"],
      properties: {
        $data: {
          type: "string",
          anyOf: [{ format: "relative-json-pointer" }, { format: "json-pointer" }]
        }
      },
      additionalProperties: false
    };
  }
});

// node_modules/fast-uri/lib/utils.js
var require_utils2 = __commonJS({
  "node_modules/fast-uri/lib/utils.js"(exports, module) {
    "use strict";
    var isUUID = RegExp.prototype.test.bind(/^[\da-f]{8}-[\da-f]{4}-[\da-f]{4}-[\da-f]{4}-[\da-f]{12}$/iu);
    var isIPv4 = RegExp.prototype.test.bind(/^(?:(?:25[0-5]|2[0-4]\d|1\d{2}|[1-9]\d|\d)\.){3}(?:25[0-5]|2[0-4]\d|1\d{2}|[1-9]\d|\d)$/u);
    var isPort = RegExp.prototype.test.bind(/^\d*$/u);
    var isHexPair = RegExp.prototype.test.bind(/^[\da-f]{2}$/iu);
    var isUnreserved = RegExp.prototype.test.bind(/^[\da-z\-._~]$/iu);
    var isPathCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:@/]$/u);
    var isQueryFragmentCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:@/?]$/u);
    var isUserinfoCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:]$/u);
    var BYTE_HEX = new Array(256);
    {
      const HEX_DIGITS = "0123456789ABCDEF";
      for (let i = 0; i < 256; i++) {
        BYTE_HEX[i] = "%" + HEX_DIGITS[i >> 4] + HEX_DIGITS[i & 15];
      }
    }
    function percentEncodeNonAscii(cp) {
      if (cp < 2048) {
        return BYTE_HEX[192 | cp >> 6] + BYTE_HEX[128 | cp & 63];
      }
      if (cp < 65536) {
        return BYTE_HEX[224 | cp >> 12] + BYTE_HEX[128 | cp >> 6 & 63] + BYTE_HEX[128 | cp & 63];
      }
      return BYTE_HEX[240 | cp >> 18] + BYTE_HEX[128 | cp >> 12 & 63] + BYTE_HEX[128 | cp >> 6 & 63] + BYTE_HEX[128 | cp & 63];
    }
    function stringArrayToHexStripped(input) {
      let acc = "";
      let code = 0;
      let i = 0;
      for (i = 0; i < input.length; i++) {
        code = input[i].charCodeAt(0);
        if (code === 48) {
          continue;
        }
        if (!(code >= 48 && code <= 57 || code >= 65 && code <= 70 || code >= 97 && code <= 102)) {
          return "";
        }
        acc += input[i];
        break;
      }
      for (i += 1; i < input.length; i++) {
        code = input[i].charCodeAt(0);
        if (!(code >= 48 && code <= 57 || code >= 65 && code <= 70 || code >= 97 && code <= 102)) {
          return "";
        }
        acc += input[i];
      }
      return acc;
    }
    var isHextet = RegExp.prototype.test.bind(/^[\dA-Fa-f]{1,4}$/);
    var isIPvFuture = RegExp.prototype.test.bind(/^[vV][\dA-Fa-f]+\.[A-Za-z\d\-._~!$&'()*+,;=:]+$/);
    var isZoneCharacter = RegExp.prototype.test.bind(/^[A-Za-z\d\-._~]$/);
    var nonSimpleDomain = RegExp.prototype.test.bind(/[^!"$&'()*+,\-.;=_`a-z{}~]/u);
    function isZoneIdentifier(zone) {
      if (zone.length === 0) return false;
      for (let i = 0; i < zone.length; i++) {
        if (isZoneCharacter(zone[i])) continue;
        if (zone[i] === "%" && i + 2 < zone.length && isHexPair(zone.slice(i + 1, i + 3))) {
          i += 2;
          continue;
        }
        return false;
      }
      return true;
    }
    function compressIPv6ZeroRun(hextets) {
      let bestStart = -1;
      let bestLength = 0;
      let runStart = -1;
      let runLength = 0;
      for (let i = 0; i < hextets.length; i++) {
        if (hextets[i] === "0") {
          if (runStart === -1) runStart = i;
          runLength++;
          if (runLength > bestLength) {
            bestLength = runLength;
            bestStart = runStart;
          }
        } else {
          runStart = -1;
          runLength = 0;
        }
      }
      if (bestLength < 2) return hextets.join(":");
      const head = hextets.slice(0, bestStart).join(":");
      const tail = hextets.slice(bestStart + bestLength).join(":");
      return head + "::" + tail;
    }
    function normalizeIPv6Address(input) {
      const compression = input.indexOf("::");
      if (compression !== -1 && input.indexOf("::", compression + 1) !== -1) return void 0;
      const left = compression === -1 ? input.split(":") : input.slice(0, compression).split(":");
      const right = compression === -1 ? [] : input.slice(compression + 2).split(":");
      if (compression !== -1) {
        if (left.length === 1 && left[0] === "") left.length = 0;
        if (right.length === 1 && right[0] === "") right.length = 0;
      }
      const parts = left.concat(right);
      let hextetCount = 0;
      for (let i = 0; i < parts.length; i++) {
        const part = parts[i];
        if (part === "") return void 0;
        if (part.indexOf(".") !== -1) {
          if (i !== parts.length - 1 || compression !== -1 && right.length === 0 || !isIPv4(part)) return void 0;
          hextetCount += 2;
          continue;
        }
        if (!isHextet(part)) return void 0;
        parts[i] = parseInt(part, 16).toString(16);
        hextetCount++;
      }
      if (compression === -1) {
        if (hextetCount !== 8) return void 0;
        return compressIPv6ZeroRun(parts);
      }
      if (hextetCount >= 8) return void 0;
      const expanded = parts.slice(0, left.length);
      for (let i = hextetCount; i < 8; i++) expanded.push("0");
      for (let i = left.length; i < parts.length; i++) expanded.push(parts[i]);
      return compressIPv6ZeroRun(expanded);
    }
    function normalizeIPv6(host) {
      const bracketed = host[0] === "[" && host[host.length - 1] === "]";
      const hasBracket = host[0] === "[" || host[host.length - 1] === "]";
      if (hasBracket && !bracketed) return { host, isIPV6: false, error: true };
      let input = bracketed ? host.slice(1, -1) : host;
      if (bracketed && isIPvFuture(input)) {
        input = input.toLowerCase();
        return { host: `[${input}]`, escapedHost: input, isIPV6: false, isIPVFuture: true };
      }
      if (findToken(input, ":") < 2) {
        return { host, isIPV6: false, error: bracketed };
      }
      let zoneIdentifier = "";
      const zoneSeparator = input.indexOf("%");
      if (zoneSeparator !== -1) {
        const separatorLength = input.slice(zoneSeparator, zoneSeparator + 3).toLowerCase() === "%25" ? 3 : 1;
        zoneIdentifier = input.slice(zoneSeparator + separatorLength);
        if (!isZoneIdentifier(zoneIdentifier)) return { host, isIPV6: false, error: true };
        input = input.slice(0, zoneSeparator);
      }
      const address = normalizeIPv6Address(input);
      if (address === void 0) return { host, isIPV6: false, error: true };
      return {
        host: address + (zoneIdentifier ? "%" + zoneIdentifier : ""),
        escapedHost: address + (zoneIdentifier ? "%25" + zoneIdentifier : ""),
        isIPV6: true
      };
    }
    function findToken(str, token) {
      let ind = 0;
      for (let i = 0; i < str.length; i++) {
        if (str[i] === token) ind++;
      }
      return ind;
    }
    function removeDotSegments(path) {
      let input = path;
      const output = [];
      let nextSlash = -1;
      let len = 0;
      while (len = input.length) {
        if (len === 1) {
          if (input === ".") {
            break;
          } else if (input === "/") {
            output.push("/");
            break;
          } else {
            output.push(input);
            break;
          }
        } else if (len === 2) {
          if (input[0] === ".") {
            if (input[1] === ".") {
              break;
            } else if (input[1] === "/") {
              input = input.slice(2);
              continue;
            }
          } else if (input[0] === "/") {
            if (input[1] === "." || input[1] === "/") {
              output.push("/");
              break;
            }
          }
        } else if (len === 3) {
          if (input === "/..") {
            if (output.length !== 0) {
              output.pop();
            }
            output.push("/");
            break;
          }
        }
        if (input[0] === ".") {
          if (input[1] === ".") {
            if (input[2] === "/") {
              input = input.slice(3);
              continue;
            }
          } else if (input[1] === "/") {
            input = input.slice(2);
            continue;
          }
        } else if (input[0] === "/") {
          if (input[1] === ".") {
            if (input[2] === "/") {
              input = input.slice(2);
              continue;
            } else if (input[2] === ".") {
              if (input[3] === "/") {
                input = input.slice(3);
                if (output.length !== 0) {
                  output.pop();
                }
                continue;
              }
            }
          }
        }
        if ((nextSlash = input.indexOf("/", 1)) === -1) {
          output.push(input);
          break;
        } else {
          output.push(input.slice(0, nextSlash));
          input = input.slice(nextSlash);
        }
      }
      return output.join("");
    }
    function removeDotSegmentsRelative(path) {
      if (path === "" || path[0] === "/") {
        return removeDotSegments(path);
      }
      const segments = path.split("/");
      const last = segments.length - 1;
      const output = [];
      let trailingDirectory = false;
      for (let i = 0; i <= last; i++) {
        const segment = segments[i];
        if (segment === "." || segment === "..") {
          if (segment === "..") {
            if (output.length !== 0 && output[output.length - 1] !== "..") {
              output.pop();
            } else {
              output.push("..");
            }
          }
          trailingDirectory = i === last;
        } else {
          output.push(segment);
        }
      }
      if (trailingDirectory && output[output.length - 1] !== "..") {
        output.push("");
      }
      if (output.length === 0 || output[0] === "" || output[0].includes(":")) {
        output.unshift(".");
      }
      return output.join("/");
    }
    var HOST_DELIMS = { "@": "%40", "/": "%2F", "?": "%3F", "#": "%23", ":": "%3A" };
    var HOST_DELIM_RE = /[@/?#:]/g;
    var HOST_DELIM_NO_COLON_RE = /[@/?#]/g;
    function reescapeHostDelimiters(host, isIP) {
      const re = isIP ? HOST_DELIM_NO_COLON_RE : HOST_DELIM_RE;
      re.lastIndex = 0;
      return host.replace(re, (ch) => HOST_DELIMS[ch]);
    }
    function normalizePercentEncoding(input, decodeUnreserved = false) {
      if (input.indexOf("%") === -1) {
        return input;
      }
      let output = "";
      for (let i = 0; i < input.length; i++) {
        if (input[i] === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            const normalizedHex = hex.toUpperCase();
            const decoded = String.fromCharCode(parseInt(normalizedHex, 16));
            if (decodeUnreserved && isUnreserved(decoded)) {
              output += decoded;
            } else {
              output += "%" + normalizedHex;
            }
            i += 2;
            continue;
          }
        }
        output += input[i];
      }
      return output;
    }
    function normalizePathEncoding(input) {
      let output = "";
      for (let i = 0; i < input.length; i++) {
        const ch = input[i];
        if (ch === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            const normalizedHex = hex.toUpperCase();
            const decoded = String.fromCharCode(parseInt(normalizedHex, 16));
            if (decoded !== "." && isUnreserved(decoded)) {
              output += decoded;
            } else {
              output += "%" + normalizedHex;
            }
            i += 2;
            continue;
          }
        }
        if (isPathCharacter(ch)) {
          output += ch;
        } else {
          const code = input.charCodeAt(i);
          if (code < 128) {
            output += isEscapeSafe(code) ? ch : BYTE_HEX[code];
          } else if (code < 55296 || code > 57343) {
            output += percentEncodeNonAscii(code);
          } else if (code <= 56319 && i + 1 < input.length) {
            const low = input.charCodeAt(i + 1);
            if (low >= 56320 && low <= 57343) {
              output += percentEncodeNonAscii(65536 + (code - 55296 << 10) + (low - 56320));
              i++;
            } else {
              output += percentEncodeNonAscii(65533);
            }
          } else {
            output += percentEncodeNonAscii(65533);
          }
        }
      }
      return output;
    }
    function serializePathEncoding(input, pathNoScheme = false) {
      let output = "";
      let firstSegment = pathNoScheme && input[0] !== "/";
      for (let i = 0; i < input.length; i++) {
        const ch = input[i];
        if (ch === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            output += "%" + hex.toUpperCase();
            i += 2;
            continue;
          }
        }
        if (ch === "/") {
          firstSegment = false;
        }
        if (isPathCharacter(ch) && (ch !== ":" || !firstSegment)) {
          output += ch;
        } else {
          const code = input.charCodeAt(i);
          if (code < 128) {
            output += BYTE_HEX[code];
          } else if (code < 55296 || code > 57343) {
            output += percentEncodeNonAscii(code);
          } else if (code <= 56319 && i + 1 < input.length) {
            const low = input.charCodeAt(i + 1);
            if (low >= 56320 && low <= 57343) {
              output += percentEncodeNonAscii(65536 + (code - 55296 << 10) + (low - 56320));
              i++;
            } else {
              output += percentEncodeNonAscii(65533);
            }
          } else {
            output += percentEncodeNonAscii(65533);
          }
        }
      }
      return output;
    }
    function encodeComponent(input, isAllowed) {
      let output = "";
      for (let i = 0; i < input.length; i++) {
        const ch = input[i];
        if (ch === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            output += "%" + hex.toUpperCase();
            i += 2;
            continue;
          }
        }
        if (isAllowed(ch)) {
          output += ch;
        } else {
          const code = input.charCodeAt(i);
          if (code < 128) {
            output += BYTE_HEX[code];
          } else if (code < 55296 || code > 57343) {
            output += percentEncodeNonAscii(code);
          } else if (code <= 56319 && i + 1 < input.length) {
            const low = input.charCodeAt(i + 1);
            if (low >= 56320 && low <= 57343) {
              output += percentEncodeNonAscii(65536 + (code - 55296 << 10) + (low - 56320));
              i++;
            } else {
              output += percentEncodeNonAscii(65533);
            }
          } else {
            output += percentEncodeNonAscii(65533);
          }
        }
      }
      return output;
    }
    function encodeUserinfo(input) {
      return encodeComponent(input, isUserinfoCharacter);
    }
    function encodeQuery(input) {
      return encodeComponent(input, isQueryFragmentCharacter);
    }
    function encodeFragment(input) {
      return encodeComponent(input, isQueryFragmentCharacter);
    }
    function isEscapeSafe(cp) {
      return cp >= 48 && cp <= 57 || cp >= 65 && cp <= 90 || cp >= 97 && cp <= 122 || cp === 42 || cp === 43 || cp === 45 || cp === 46 || cp === 47 || cp === 64 || cp === 95;
    }
    function normalizeQueryFragmentEncoding(input) {
      let output = "";
      for (let i = 0; i < input.length; i++) {
        const ch = input[i];
        if (ch === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            const normalizedHex = hex.toUpperCase();
            const decoded = String.fromCharCode(parseInt(normalizedHex, 16));
            if (isUnreserved(decoded)) {
              output += decoded;
            } else {
              output += "%" + normalizedHex;
            }
            i += 2;
            continue;
          }
        }
        if (isQueryFragmentCharacter(ch)) {
          output += ch;
        } else {
          const code = input.charCodeAt(i);
          if (code < 128) {
            output += isEscapeSafe(code) ? ch : BYTE_HEX[code];
          } else if (code < 55296 || code > 57343) {
            output += percentEncodeNonAscii(code);
          } else if (code <= 56319 && i + 1 < input.length) {
            const low = input.charCodeAt(i + 1);
            if (low >= 56320 && low <= 57343) {
              output += percentEncodeNonAscii(65536 + (code - 55296 << 10) + (low - 56320));
              i++;
            } else {
              output += percentEncodeNonAscii(65533);
            }
          } else {
            output += percentEncodeNonAscii(65533);
          }
        }
      }
      return output;
    }
    function escapePreservingEscapes(input) {
      let output = "";
      for (let i = 0; i < input.length; i++) {
        if (input[i] === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            output += "%" + hex.toUpperCase();
            i += 2;
            continue;
          }
        }
        output += escape(input[i]);
      }
      return output;
    }
    function recomposeAuthority(component) {
      const uriTokens = [];
      if (component.userinfo !== void 0) {
        uriTokens.push(encodeUserinfo(component.userinfo));
        uriTokens.push("@");
      }
      if (component.host !== void 0) {
        let host = component.host;
        if (!isIPv4(host)) {
          let ipV6res = normalizeIPv6(host);
          if (ipV6res.isIPV6 !== true && ipV6res.isIPVFuture !== true) {
            host = normalizePercentEncoding(host, true);
            ipV6res = normalizeIPv6(host);
          }
          if (ipV6res.isIPV6 === true || ipV6res.isIPVFuture === true) {
            host = `[${ipV6res.escapedHost}]`;
          } else {
            host = reescapeHostDelimiters(host, false);
          }
        }
        uriTokens.push(host);
      }
      if (typeof component.port === "number" || typeof component.port === "string") {
        const port = String(component.port);
        if (!isPort(port)) {
          throw new TypeError("URI port is malformed.");
        }
        uriTokens.push(":");
        uriTokens.push(port);
      }
      return uriTokens.length ? uriTokens.join("") : void 0;
    }
    module.exports = {
      nonSimpleDomain,
      recomposeAuthority,
      reescapeHostDelimiters,
      normalizePercentEncoding,
      normalizePathEncoding,
      serializePathEncoding,
      normalizeQueryFragmentEncoding,
      encodeUserinfo,
      encodeQuery,
      encodeFragment,
      escapePreservingEscapes,
      removeDotSegments,
      removeDotSegmentsRelative,
      isIPv4,
      isUUID,
      normalizeIPv6,
      stringArrayToHexStripped
    };
  }
});

// node_modules/fast-uri/lib/schemes.js
var require_schemes = __commonJS({
  "node_modules/fast-uri/lib/schemes.js"(exports, module) {
    "use strict";
    var { isUUID } = require_utils2();
    var URN_REG = /^([\da-z][\d\-a-z]{0,31}):((?:[\w!$'()*+,\-./:;=@]|%[\da-f]{2})+)$/iu;
    var supportedSchemeNames = (
      /** @type {const} */
      [
        "http",
        "https",
        "ws",
        "wss",
        "urn",
        "urn:uuid"
      ]
    );
    function isValidSchemeName(name) {
      return supportedSchemeNames.indexOf(
        /** @type {*} */
        name
      ) !== -1;
    }
    function wsIsSecure(wsComponent) {
      if (wsComponent.secure === true) {
        return true;
      } else if (wsComponent.secure === false) {
        return false;
      } else if (wsComponent.scheme) {
        return wsComponent.scheme.length === 3 && (wsComponent.scheme[0] === "w" || wsComponent.scheme[0] === "W") && (wsComponent.scheme[1] === "s" || wsComponent.scheme[1] === "S") && (wsComponent.scheme[2] === "s" || wsComponent.scheme[2] === "S");
      } else {
        return false;
      }
    }
    function httpParse(component) {
      if (!component.host) {
        component.error = component.error || "HTTP URIs must have a host.";
      }
      return component;
    }
    function httpSerialize(component) {
      const secure = String(component.scheme).toLowerCase() === "https";
      if (component.port === (secure ? 443 : 80) || component.port === "") {
        component.port = void 0;
      }
      if (!component.path) {
        component.path = "/";
      }
      return component;
    }
    function wsParse(wsComponent) {
      wsComponent.secure = wsIsSecure(wsComponent);
      wsComponent.resourceName = (wsComponent.path || "/") + (wsComponent.query ? "?" + wsComponent.query : "");
      wsComponent.path = void 0;
      wsComponent.query = void 0;
      return wsComponent;
    }
    function wsSerialize(wsComponent) {
      if (wsComponent.port === (wsIsSecure(wsComponent) ? 443 : 80) || wsComponent.port === "") {
        wsComponent.port = void 0;
      }
      if (typeof wsComponent.secure === "boolean") {
        wsComponent.scheme = wsComponent.secure ? "wss" : "ws";
        wsComponent.secure = void 0;
      }
      if (wsComponent.resourceName) {
        const queryIndex = wsComponent.resourceName.indexOf("?");
        const path = queryIndex === -1 ? wsComponent.resourceName : wsComponent.resourceName.slice(0, queryIndex);
        wsComponent.path = path && path !== "/" ? path : void 0;
        wsComponent.query = queryIndex === -1 ? void 0 : wsComponent.resourceName.slice(queryIndex + 1);
        wsComponent.resourceName = void 0;
      }
      wsComponent.fragment = void 0;
      return wsComponent;
    }
    function urnParse(urnComponent, options) {
      if (!urnComponent.path) {
        urnComponent.error = "URN can not be parsed";
        return urnComponent;
      }
      const matches2 = urnComponent.path.match(URN_REG);
      if (matches2 && matches2[0] === urnComponent.path) {
        const scheme = options.scheme || urnComponent.scheme || "urn";
        urnComponent.nid = matches2[1].toLowerCase();
        urnComponent.nss = matches2[2];
        const urnScheme = `${scheme}:${options.nid || urnComponent.nid}`;
        const schemeHandler = getSchemeHandler(urnScheme);
        urnComponent.path = void 0;
        if (schemeHandler) {
          urnComponent = schemeHandler.parse(urnComponent, options);
        }
      } else {
        urnComponent.error = urnComponent.error || "URN can not be parsed.";
      }
      return urnComponent;
    }
    function urnSerialize(urnComponent, options) {
      if (urnComponent.nid === void 0) {
        throw new Error("URN without nid cannot be serialized");
      }
      const scheme = options.scheme || urnComponent.scheme || "urn";
      const nid = urnComponent.nid.toLowerCase();
      const urnScheme = `${scheme}:${options.nid || nid}`;
      const schemeHandler = getSchemeHandler(urnScheme);
      if (schemeHandler) {
        urnComponent = schemeHandler.serialize(urnComponent, options);
      }
      const uriComponent = urnComponent;
      const nss = urnComponent.nss;
      uriComponent.path = `${nid || options.nid}:${nss}`;
      options.skipEscape = true;
      return uriComponent;
    }
    function urnuuidParse(urnComponent, options) {
      const uuidComponent = urnComponent;
      uuidComponent.uuid = uuidComponent.nss;
      uuidComponent.nss = void 0;
      if (!options.tolerant && (!uuidComponent.uuid || !isUUID(uuidComponent.uuid))) {
        uuidComponent.error = uuidComponent.error || "UUID is not valid.";
      }
      return uuidComponent;
    }
    function urnuuidSerialize(uuidComponent) {
      const urnComponent = uuidComponent;
      urnComponent.nss = (uuidComponent.uuid || "").toLowerCase();
      return urnComponent;
    }
    var http = (
      /** @type {SchemeHandler} */
      {
        scheme: "http",
        domainHost: true,
        parse: httpParse,
        serialize: httpSerialize
      }
    );
    var https = (
      /** @type {SchemeHandler} */
      {
        scheme: "https",
        domainHost: http.domainHost,
        parse: httpParse,
        serialize: httpSerialize
      }
    );
    var ws = (
      /** @type {SchemeHandler} */
      {
        scheme: "ws",
        domainHost: true,
        parse: wsParse,
        serialize: wsSerialize
      }
    );
    var wss = (
      /** @type {SchemeHandler} */
      {
        scheme: "wss",
        domainHost: ws.domainHost,
        parse: ws.parse,
        serialize: ws.serialize
      }
    );
    var urn = (
      /** @type {SchemeHandler} */
      {
        scheme: "urn",
        parse: urnParse,
        serialize: urnSerialize,
        skipNormalize: true
      }
    );
    var urnuuid = (
      /** @type {SchemeHandler} */
      {
        scheme: "urn:uuid",
        parse: urnuuidParse,
        serialize: urnuuidSerialize,
        skipNormalize: true
      }
    );
    var SCHEMES = (
      /** @type {Record<SchemeName, SchemeHandler>} */
      {
        http,
        https,
        ws,
        wss,
        urn,
        "urn:uuid": urnuuid
      }
    );
    Object.setPrototypeOf(SCHEMES, null);
    function getSchemeHandler(scheme) {
      return scheme && (SCHEMES[
        /** @type {SchemeName} */
        scheme
      ] || SCHEMES[
        /** @type {SchemeName} */
        scheme.toLowerCase()
      ]) || void 0;
    }
    module.exports = {
      wsIsSecure,
      SCHEMES,
      isValidSchemeName,
      getSchemeHandler
    };
  }
});

// node_modules/fast-uri/index.js
var require_fast_uri = __commonJS({
  "node_modules/fast-uri/index.js"(exports, module) {
    "use strict";
    var { normalizeIPv6, removeDotSegments, removeDotSegmentsRelative, recomposeAuthority, normalizePercentEncoding, normalizePathEncoding, serializePathEncoding, normalizeQueryFragmentEncoding, encodeQuery, encodeFragment, reescapeHostDelimiters, isIPv4, nonSimpleDomain } = require_utils2();
    var { SCHEMES, getSchemeHandler } = require_schemes();
    var VALID_SCHEME = /^[A-Za-z][A-Za-z0-9+.-]*$/u;
    var MALFORMED_SCHEME_ERROR = "URI scheme is malformed.";
    var MALFORMED_HOST_ERROR = "URI host is malformed.";
    var FORBIDDEN_DOMAIN_HOST_CHARACTER = /[\0-\x20"#/:<>?@[\\\]^`{|}\x7F]/u;
    function validateScheme(scheme) {
      const stringScheme = String(scheme);
      if (!VALID_SCHEME.test(stringScheme)) {
        throw new TypeError(MALFORMED_SCHEME_ERROR);
      }
      return stringScheme;
    }
    function normalize(uri, options) {
      if (typeof uri === "string") {
        uri = /** @type {T} */
        normalizeString(uri, options);
      } else if (typeof uri === "object") {
        uri = /** @type {T} */
        parse(serialize(uri, options), options);
      }
      return uri;
    }
    function resolve(baseURI, relativeURI, options) {
      const schemelessOptions = options ? Object.assign({ scheme: "null" }, options) : { scheme: "null" };
      const {
        parsed: baseParsed,
        malformedAuthorityOrPort: baseMalformed,
        malformedPercentEncoding: baseMalformedPercentEncoding,
        malformedSchemeSpecific: baseMalformedSchemeSpecific,
        malformedHost: baseMalformedHost,
        malformedScheme: baseMalformedScheme
      } = parseWithStatus(baseURI, schemelessOptions);
      const {
        parsed: relativeParsed,
        malformedAuthorityOrPort: relativeMalformed,
        malformedPercentEncoding: relativeMalformedPercentEncoding,
        malformedSchemeSpecific: relativeMalformedSchemeSpecific,
        malformedHost: relativeMalformedHost,
        malformedScheme: relativeMalformedScheme
      } = parseWithStatus(relativeURI, schemelessOptions);
      if (baseMalformed || relativeMalformed || baseMalformedPercentEncoding || relativeMalformedPercentEncoding || baseMalformedSchemeSpecific || relativeMalformedSchemeSpecific || baseMalformedHost || relativeMalformedHost || baseMalformedScheme || relativeMalformedScheme) {
        throw new Error(baseParsed.error || relativeParsed.error || "URI is malformed.");
      }
      const resolved = resolveComponent(baseParsed, relativeParsed, schemelessOptions, true);
      const resolvedSchemeHandler = getSchemeHandler(options && options.scheme || resolved.scheme);
      const resolvedHost = resolved.host;
      const resolvedHostIsIP = resolvedHost !== void 0 && resolvedHost !== "" && (isIPv4(resolvedHost) || normalizeIPv6(resolvedHost).isIPV6);
      if (hasForbiddenDomainHost(resolved, options || {}, resolvedSchemeHandler, resolvedHostIsIP)) {
        throw new Error(MALFORMED_HOST_ERROR);
      }
      canonicalizeHost(resolved, options || {}, resolvedSchemeHandler, resolvedHostIsIP);
      const encodedASCIIHost = resolvedHost && resolvedHost.indexOf("%") !== -1 && !new RegExp("\\P{ASCII}", "u").test(resolvedHost);
      if (resolved.error && !encodedASCIIHost) {
        throw new Error(resolved.error);
      }
      schemelessOptions.skipEscape = true;
      return serialize(resolved, schemelessOptions);
    }
    function resolveComponent(base, relative, options, skipNormalization) {
      const target = {};
      if (!skipNormalization) {
        base = parse(serialize(base, options), options);
        relative = parse(serialize(relative, options), options);
      }
      options = options || {};
      if (!options.tolerant && relative.scheme) {
        target.scheme = relative.scheme;
        target.userinfo = relative.userinfo;
        target.host = relative.host;
        target.port = relative.port;
        target.path = removeDotSegments(relative.path || "");
        target.query = relative.query;
      } else {
        if (relative.userinfo !== void 0 || relative.host !== void 0 || relative.port !== void 0) {
          target.userinfo = relative.userinfo;
          target.host = relative.host;
          target.port = relative.port;
          target.path = removeDotSegments(relative.path || "");
          target.query = relative.query;
        } else {
          if (!relative.path) {
            target.path = base.path;
            if (relative.query !== void 0) {
              target.query = relative.query;
            } else {
              target.query = base.query;
            }
          } else {
            if (relative.path[0] === "/") {
              target.path = removeDotSegments(relative.path);
            } else {
              const baseHasAuthority = base.userinfo !== void 0 || base.host !== void 0 || base.port !== void 0;
              if (baseHasAuthority && !base.path) {
                target.path = "/" + relative.path;
              } else if (!base.path) {
                target.path = relative.path;
              } else {
                target.path = base.path.slice(0, base.path.lastIndexOf("/") + 1) + relative.path;
              }
              target.path = base.scheme === void 0 && !baseHasAuthority && target.path[0] !== "/" ? removeDotSegmentsRelative(target.path) : removeDotSegments(target.path);
            }
            target.query = relative.query;
          }
          target.userinfo = base.userinfo;
          target.host = base.host;
          target.port = base.port;
        }
        target.scheme = base.scheme;
      }
      target.fragment = relative.fragment;
      return target;
    }
    function equal(uriA, uriB, options) {
      const normalizedA = normalizeComparableURI(uriA, options);
      const normalizedB = normalizeComparableURI(uriB, options);
      return normalizedA !== void 0 && normalizedB !== void 0 && normalizedA === normalizedB;
    }
    function serialize(cmpts, opts) {
      const component = {
        host: cmpts.host,
        scheme: cmpts.scheme,
        userinfo: cmpts.userinfo,
        port: cmpts.port,
        path: cmpts.path,
        query: cmpts.query,
        nid: cmpts.nid,
        nss: cmpts.nss,
        uuid: cmpts.uuid,
        fragment: cmpts.fragment,
        reference: cmpts.reference,
        resourceName: cmpts.resourceName,
        secure: cmpts.secure,
        error: ""
      };
      const options = Object.assign({}, opts);
      const uriTokens = [];
      if (component.scheme) {
        component.scheme = validateScheme(component.scheme);
      }
      const schemeHandler = getSchemeHandler(options.scheme || component.scheme);
      if (schemeHandler && schemeHandler.serialize) schemeHandler.serialize(component, options);
      const hasAuthority = component.userinfo !== void 0 || component.host !== void 0 || component.port !== void 0;
      const schemelessReference = (component.scheme === void 0 || options.reference === "suffix") && !hasAuthority;
      const pathNoScheme = !options.skipEscape && schemelessReference;
      if (component.path !== void 0) {
        if (!options.skipEscape) {
          component.path = serializePathEncoding(component.path, pathNoScheme);
        } else {
          component.path = normalizePercentEncoding(component.path);
        }
      }
      if (options.reference !== "suffix" && component.scheme) {
        component.scheme = validateScheme(component.scheme);
        uriTokens.push(component.scheme, ":");
      }
      const authority = recomposeAuthority(component);
      if (authority !== void 0) {
        if (options.reference !== "suffix") {
          uriTokens.push("//");
        }
        uriTokens.push(authority);
        if (component.path && component.path[0] !== "/") {
          uriTokens.push("/");
        }
      }
      if (component.path !== void 0) {
        let s = component.path;
        if (!options.absolutePath && (!schemeHandler || !schemeHandler.absolutePath)) {
          s = schemelessReference && s[0] !== "/" ? removeDotSegmentsRelative(s) : removeDotSegments(s);
        }
        if (schemelessReference) {
          s = serializePathEncoding(s, true);
        }
        if (authority === void 0 && s[0] === "/" && s[1] === "/") {
          s = "/%2F" + s.slice(2);
        }
        uriTokens.push(s);
      }
      if (component.query !== void 0) {
        uriTokens.push("?", encodeQuery(component.query));
      }
      if (component.fragment !== void 0) {
        uriTokens.push("#", encodeFragment(component.fragment));
      }
      return uriTokens.join("");
    }
    var URI_PARSE = /^(?:([^#/:?]+):)?(?:\/\/((?:([^#/?@]*)@)?(\[[^#/?\]]+\]|[^#/:?]*)(?::(\d*))?))?([^#?]*)(?:\?([^#]*))?(?:#((?:.|[\n\r])*))?/u;
    var AUTHORITY_PREFIX = /^(?:[^#/:?]+:)?\/\/([^/?#]*)/;
    var AUTHORITY_INTRODUCER_REGION = /^(?:[^#/:?]+:)?([/\\\t\n\r]*)/;
    function getParseError(parsed, matches2) {
      if (matches2[2] !== void 0 && parsed.path && parsed.path[0] !== "/") {
        return 'URI path must start with "/" when authority is present.';
      }
      if (typeof parsed.port === "number" && (parsed.port < 0 || parsed.port > 65535)) {
        return "URI port is malformed.";
      }
      return void 0;
    }
    function hasMalformedPercentEncoding(component) {
      if (component === void 0) return false;
      let percent2 = component.indexOf("%");
      while (percent2 !== -1) {
        if (percent2 + 2 >= component.length || !/^[\da-f]{2}$/iu.test(component.slice(percent2 + 1, percent2 + 3))) {
          return true;
        }
        percent2 = component.indexOf("%", percent2 + 3);
      }
      return false;
    }
    function isIPLiteral(host) {
      return host[0] === "[" && host[host.length - 1] === "]";
    }
    function hasMalformedComponentPercentEncoding(matches2) {
      const host = matches2[4];
      return hasMalformedPercentEncoding(matches2[3]) || host !== void 0 && !isIPLiteral(host) && hasMalformedPercentEncoding(host) || hasMalformedPercentEncoding(matches2[6]) || hasMalformedPercentEncoding(matches2[7]) || hasMalformedPercentEncoding(matches2[8]);
    }
    function canonicalizeHost(parsed, options, schemeHandler, isIP) {
      if (hasForbiddenDomainHost(parsed, options, schemeHandler, isIP)) {
        parsed.error = parsed.error || MALFORMED_HOST_ERROR;
        return true;
      }
      if (!options.unicodeSupport && (!schemeHandler || !schemeHandler.unicodeSupport) && parsed.host && !isIPLiteral(parsed.host) && (options.domainHost || schemeHandler && schemeHandler.domainHost) && isIP === false && nonSimpleDomain(parsed.host)) {
        let url;
        try {
          url = new URL("http://" + parsed.host);
        } catch (e) {
          parsed.error = parsed.error || "Host's domain name can not be converted to ASCII: " + e;
          return true;
        }
        if (!isHostOnlyURL(url)) {
          parsed.error = parsed.error || MALFORMED_HOST_ERROR;
          return true;
        }
        parsed.host = url.hostname;
      }
      return false;
    }
    function hasForbiddenDomainHost(parsed, options, schemeHandler, isIP) {
      return Boolean(
        parsed.host && isIP === false && !isIPLiteral(parsed.host) && (options.domainHost || schemeHandler && schemeHandler.domainHost) && FORBIDDEN_DOMAIN_HOST_CHARACTER.test(parsed.host)
      );
    }
    function isHostOnlyURL(url) {
      return url.username === "" && url.password === "" && url.port === "" && url.pathname === "/" && url.search === "" && url.hash === "" && url.hostname !== "";
    }
    function parseWithStatus(uri, opts) {
      const options = Object.assign({}, opts);
      const parsed = {
        scheme: void 0,
        userinfo: void 0,
        host: "",
        port: void 0,
        path: "",
        query: void 0,
        fragment: void 0
      };
      let malformedAuthorityOrPort = false;
      let malformedPercentEncoding = false;
      let malformedSchemeSpecific = false;
      let malformedHost = false;
      let malformedIPLiteral = false;
      let malformedScheme = false;
      let isIP = false;
      if (options.reference === "suffix") {
        if (options.scheme) {
          uri = options.scheme + ":" + uri;
        } else {
          uri = "//" + uri;
        }
      }
      const authorityMatch = uri.match(AUTHORITY_PREFIX);
      if (authorityMatch !== null && authorityMatch[1].indexOf("\\") !== -1) {
        parsed.error = "URI authority must not contain a literal backslash.";
        malformedAuthorityOrPort = true;
      }
      const introducerMatch = uri.match(AUTHORITY_INTRODUCER_REGION);
      if (introducerMatch !== null) {
        const region = introducerMatch[1];
        const normalizedRegion = region.replace(/[\t\n\r]/g, "");
        if (normalizedRegion.length >= 2) {
          if (normalizedRegion.slice(0, 2) !== "//") {
            parsed.error = parsed.error || "URI authority must not contain a literal backslash.";
            malformedAuthorityOrPort = true;
          } else if (region.length !== normalizedRegion.length) {
            parsed.error = parsed.error || "URI authority introducer must not contain whitespace.";
            malformedAuthorityOrPort = true;
          }
        }
      }
      const matches2 = uri.match(URI_PARSE);
      if (matches2) {
        parsed.scheme = matches2[1];
        parsed.userinfo = matches2[3];
        parsed.host = matches2[4];
        parsed.port = parseInt(matches2[5], 10);
        parsed.path = matches2[6] || "";
        parsed.query = matches2[7];
        parsed.fragment = matches2[8];
        if (parsed.scheme !== void 0) {
          if (VALID_SCHEME.test(parsed.scheme)) {
            parsed.scheme = parsed.scheme.toLowerCase();
          } else {
            parsed.error = parsed.error || MALFORMED_SCHEME_ERROR;
            malformedScheme = true;
          }
        }
        malformedPercentEncoding = hasMalformedComponentPercentEncoding(matches2);
        if (malformedPercentEncoding) {
          parsed.error = parsed.error || "URI contains malformed percent-encoding.";
        }
        if (isNaN(parsed.port)) {
          parsed.port = matches2[5];
        }
        const parseError = getParseError(parsed, matches2);
        if (parseError !== void 0) {
          parsed.error = parsed.error || parseError;
          malformedAuthorityOrPort = true;
        }
        if (parsed.host) {
          const ipv4result = isIPv4(parsed.host);
          if (ipv4result === false) {
            const bracketedIPLiteral = isIPLiteral(parsed.host);
            const hasIPLiteralBracket = parsed.host.indexOf("[") !== -1 || parsed.host.indexOf("]") !== -1;
            const ipv6result = normalizeIPv6(parsed.host);
            isIP = ipv6result.isIPV6 || ipv6result.isIPVFuture === true;
            malformedIPLiteral = hasIPLiteralBracket && (!bracketedIPLiteral || ipv6result.error === true);
            parsed.host = isIP ? ipv6result.host : ipv6result.host.toLowerCase();
            if (malformedIPLiteral) {
              parsed.error = parsed.error || MALFORMED_HOST_ERROR;
              malformedAuthorityOrPort = true;
            }
          } else {
            isIP = true;
          }
        }
        if (parsed.scheme === void 0 && parsed.userinfo === void 0 && parsed.host === void 0 && parsed.port === void 0 && parsed.query === void 0 && !parsed.path) {
          parsed.reference = "same-document";
        } else if (parsed.scheme === void 0) {
          parsed.reference = "relative";
        } else if (parsed.fragment === void 0) {
          parsed.reference = "absolute";
        } else {
          parsed.reference = "uri";
        }
        if (options.reference && options.reference !== "suffix" && options.reference !== parsed.reference) {
          parsed.error = parsed.error || "URI is not a " + options.reference + " reference.";
        }
        const schemeHandler = getSchemeHandler(options.scheme || parsed.scheme);
        if (!malformedIPLiteral) {
          malformedHost = canonicalizeHost(parsed, options, schemeHandler, isIP);
        }
        if (uri.indexOf("%") !== -1 && parsed.host !== void 0 && !malformedIPLiteral) {
          let host = isIP ? parsed.host : normalizePercentEncoding(parsed.host, true);
          if (!isIP) {
            host = normalizePercentEncoding(host.toLowerCase());
          }
          parsed.host = isIP || options.scheme !== "null" ? reescapeHostDelimiters(host, isIP) : host;
        }
        if (!schemeHandler || schemeHandler && !schemeHandler.skipNormalize) {
          if (parsed.path) {
            parsed.path = normalizePathEncoding(parsed.path);
          }
          if (parsed.query) {
            parsed.query = normalizeQueryFragmentEncoding(parsed.query);
          }
          if (parsed.fragment) {
            parsed.fragment = normalizeQueryFragmentEncoding(parsed.fragment);
          }
        }
        if (schemeHandler && schemeHandler.parse) {
          schemeHandler.parse(parsed, options);
          if (schemeHandler === SCHEMES.urn && parsed.nid === void 0) {
            malformedSchemeSpecific = true;
          }
        }
      } else {
        parsed.error = parsed.error || "URI can not be parsed.";
      }
      return { parsed, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme };
    }
    function parse(uri, opts) {
      return parseWithStatus(uri, opts).parsed;
    }
    function normalizeString(uri, opts) {
      return normalizeStringWithStatus(uri, opts).normalized;
    }
    function normalizeStringWithStatus(uri, opts) {
      const { parsed, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme } = parseWithStatus(uri, opts);
      return {
        normalized: malformedAuthorityOrPort || malformedPercentEncoding || malformedSchemeSpecific || malformedHost || malformedScheme ? uri : serialize(parsed, opts),
        malformedAuthorityOrPort,
        malformedPercentEncoding,
        malformedSchemeSpecific,
        malformedHost,
        malformedScheme
      };
    }
    function normalizeComparableURI(uri, opts) {
      if (typeof uri !== "string" && typeof uri !== "object") {
        return void 0;
      }
      let value;
      try {
        value = typeof uri === "string" ? uri : serialize(uri, opts);
      } catch {
        return void 0;
      }
      const { normalized, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme } = normalizeStringWithStatus(value, opts);
      return malformedAuthorityOrPort || malformedPercentEncoding || malformedSchemeSpecific || malformedHost || malformedScheme ? void 0 : normalized;
    }
    var fastUri = {
      SCHEMES,
      normalize,
      resolve,
      resolveComponent,
      equal,
      serialize,
      parse
    };
    module.exports = fastUri;
    module.exports.default = fastUri;
    module.exports.fastUri = fastUri;
  }
});

// node_modules/ajv/dist/runtime/uri.js
var require_uri = __commonJS({
  "node_modules/ajv/dist/runtime/uri.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var uri = require_fast_uri();
    uri.code = 'require("ajv/dist/runtime/uri").default';
    exports.default = uri;
  }
});

// node_modules/ajv/dist/core.js
var require_core = __commonJS({
  "node_modules/ajv/dist/core.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = void 0;
    var validate_1 = require_validate();
    Object.defineProperty(exports, "KeywordCxt", { enumerable: true, get: function() {
      return validate_1.KeywordCxt;
    } });
    var codegen_1 = require_codegen();
    Object.defineProperty(exports, "_", { enumerable: true, get: function() {
      return codegen_1._;
    } });
    Object.defineProperty(exports, "str", { enumerable: true, get: function() {
      return codegen_1.str;
    } });
    Object.defineProperty(exports, "stringify", { enumerable: true, get: function() {
      return codegen_1.stringify;
    } });
    Object.defineProperty(exports, "nil", { enumerable: true, get: function() {
      return codegen_1.nil;
    } });
    Object.defineProperty(exports, "Name", { enumerable: true, get: function() {
      return codegen_1.Name;
    } });
    Object.defineProperty(exports, "CodeGen", { enumerable: true, get: function() {
      return codegen_1.CodeGen;
    } });
    var validation_error_1 = require_validation_error();
    var ref_error_1 = require_ref_error();
    var rules_1 = require_rules();
    var compile_1 = require_compile();
    var codegen_2 = require_codegen();
    var resolve_1 = require_resolve();
    var dataType_1 = require_dataType();
    var util_1 = require_util();
    var $dataRefSchema = require_data();
    var uri_1 = require_uri();
    var defaultRegExp = (str, flags) => new RegExp(str, flags);
    defaultRegExp.code = "new RegExp";
    var META_IGNORE_OPTIONS = ["removeAdditional", "useDefaults", "coerceTypes"];
    var EXT_SCOPE_NAMES = /* @__PURE__ */ new Set([
      "validate",
      "serialize",
      "parse",
      "wrapper",
      "root",
      "schema",
      "keyword",
      "pattern",
      "formats",
      "validate$data",
      "func",
      "obj",
      "Error"
    ]);
    var removedOptions = {
      errorDataPath: "",
      format: "`validateFormats: false` can be used instead.",
      nullable: '"nullable" keyword is supported by default.',
      jsonPointers: "Deprecated jsPropertySyntax can be used instead.",
      extendRefs: "Deprecated ignoreKeywordsWithRef can be used instead.",
      missingRefs: "Pass empty schema with $id that should be ignored to ajv.addSchema.",
      processCode: "Use option `code: {process: (code, schemaEnv: object) => string}`",
      sourceCode: "Use option `code: {source: true}`",
      strictDefaults: "It is default now, see option `strict`.",
      strictKeywords: "It is default now, see option `strict`.",
      uniqueItems: '"uniqueItems" keyword is always validated.',
      unknownFormats: "Disable strict mode or pass `true` to `ajv.addFormat` (or `formats` option).",
      cache: "Map is used as cache, schema object as key.",
      serialize: "Map is used as cache, schema object as key.",
      ajvErrors: "It is default now."
    };
    var deprecatedOptions = {
      ignoreKeywordsWithRef: "",
      jsPropertySyntax: "",
      unicode: '"minLength"/"maxLength" account for unicode characters by default.'
    };
    var MAX_EXPRESSION = 200;
    function requiredOptions(o) {
      var _a, _b, _c, _d, _e, _f, _g, _h, _j, _k, _l, _m, _o, _p, _q, _r, _s, _t, _u, _v, _w, _x, _y, _z, _0;
      const s = o.strict;
      const _optz = (_a = o.code) === null || _a === void 0 ? void 0 : _a.optimize;
      const optimize = _optz === true || _optz === void 0 ? 1 : _optz || 0;
      const regExp = (_c = (_b = o.code) === null || _b === void 0 ? void 0 : _b.regExp) !== null && _c !== void 0 ? _c : defaultRegExp;
      const uriResolver = (_d = o.uriResolver) !== null && _d !== void 0 ? _d : uri_1.default;
      return {
        strictSchema: (_f = (_e = o.strictSchema) !== null && _e !== void 0 ? _e : s) !== null && _f !== void 0 ? _f : true,
        strictNumbers: (_h = (_g = o.strictNumbers) !== null && _g !== void 0 ? _g : s) !== null && _h !== void 0 ? _h : true,
        strictTypes: (_k = (_j = o.strictTypes) !== null && _j !== void 0 ? _j : s) !== null && _k !== void 0 ? _k : "log",
        strictTuples: (_m = (_l = o.strictTuples) !== null && _l !== void 0 ? _l : s) !== null && _m !== void 0 ? _m : "log",
        strictRequired: (_p = (_o = o.strictRequired) !== null && _o !== void 0 ? _o : s) !== null && _p !== void 0 ? _p : false,
        code: o.code ? { ...o.code, optimize, regExp } : { optimize, regExp },
        loopRequired: (_q = o.loopRequired) !== null && _q !== void 0 ? _q : MAX_EXPRESSION,
        loopEnum: (_r = o.loopEnum) !== null && _r !== void 0 ? _r : MAX_EXPRESSION,
        meta: (_s = o.meta) !== null && _s !== void 0 ? _s : true,
        messages: (_t = o.messages) !== null && _t !== void 0 ? _t : true,
        inlineRefs: (_u = o.inlineRefs) !== null && _u !== void 0 ? _u : true,
        schemaId: (_v = o.schemaId) !== null && _v !== void 0 ? _v : "$id",
        addUsedSchema: (_w = o.addUsedSchema) !== null && _w !== void 0 ? _w : true,
        validateSchema: (_x = o.validateSchema) !== null && _x !== void 0 ? _x : true,
        validateFormats: (_y = o.validateFormats) !== null && _y !== void 0 ? _y : true,
        unicodeRegExp: (_z = o.unicodeRegExp) !== null && _z !== void 0 ? _z : true,
        int32range: (_0 = o.int32range) !== null && _0 !== void 0 ? _0 : true,
        uriResolver
      };
    }
    var Ajv3 = class {
      constructor(opts = {}) {
        this.schemas = {};
        this.refs = {};
        this.formats = /* @__PURE__ */ Object.create(null);
        this._compilations = /* @__PURE__ */ new Set();
        this._loading = {};
        this._cache = /* @__PURE__ */ new Map();
        opts = this.opts = { ...opts, ...requiredOptions(opts) };
        const { es5, lines } = this.opts.code;
        this.scope = new codegen_2.ValueScope({ scope: {}, prefixes: EXT_SCOPE_NAMES, es5, lines });
        this.logger = getLogger(opts.logger);
        const formatOpt = opts.validateFormats;
        opts.validateFormats = false;
        this.RULES = (0, rules_1.getRules)();
        checkOptions.call(this, removedOptions, opts, "NOT SUPPORTED");
        checkOptions.call(this, deprecatedOptions, opts, "DEPRECATED", "warn");
        this._metaOpts = getMetaSchemaOptions.call(this);
        if (opts.formats)
          addInitialFormats.call(this);
        this._addVocabularies();
        this._addDefaultMetaSchema();
        if (opts.keywords)
          addInitialKeywords.call(this, opts.keywords);
        if (typeof opts.meta == "object")
          this.addMetaSchema(opts.meta);
        addInitialSchemas.call(this);
        opts.validateFormats = formatOpt;
      }
      _addVocabularies() {
        this.addKeyword("$async");
      }
      _addDefaultMetaSchema() {
        const { $data, meta, schemaId } = this.opts;
        let _dataRefSchema = $dataRefSchema;
        if (schemaId === "id") {
          _dataRefSchema = { ...$dataRefSchema };
          _dataRefSchema.id = _dataRefSchema.$id;
          delete _dataRefSchema.$id;
        }
        if (meta && $data)
          this.addMetaSchema(_dataRefSchema, _dataRefSchema[schemaId], false);
      }
      defaultMeta() {
        const { meta, schemaId } = this.opts;
        return this.opts.defaultMeta = typeof meta == "object" ? meta[schemaId] || meta : void 0;
      }
      validate(schemaKeyRef, data) {
        let v;
        if (typeof schemaKeyRef == "string") {
          v = this.getSchema(schemaKeyRef);
          if (!v)
            throw new Error(`no schema with key or ref "${schemaKeyRef}"`);
        } else {
          v = this.compile(schemaKeyRef);
        }
        const valid = v(data);
        if (!("$async" in v))
          this.errors = v.errors;
        return valid;
      }
      compile(schema, _meta) {
        const sch = this._addSchema(schema, _meta);
        return sch.validate || this._compileSchemaEnv(sch);
      }
      compileAsync(schema, meta) {
        if (typeof this.opts.loadSchema != "function") {
          throw new Error("options.loadSchema should be a function");
        }
        const { loadSchema } = this.opts;
        return runCompileAsync.call(this, schema, meta);
        async function runCompileAsync(_schema, _meta) {
          await loadMetaSchema.call(this, _schema.$schema);
          const sch = this._addSchema(_schema, _meta);
          return sch.validate || _compileAsync.call(this, sch);
        }
        async function loadMetaSchema($ref) {
          if ($ref && !this.getSchema($ref)) {
            await runCompileAsync.call(this, { $ref }, true);
          }
        }
        async function _compileAsync(sch) {
          try {
            return this._compileSchemaEnv(sch);
          } catch (e) {
            if (!(e instanceof ref_error_1.default))
              throw e;
            checkLoaded.call(this, e);
            await loadMissingSchema.call(this, e.missingSchema);
            return _compileAsync.call(this, sch);
          }
        }
        function checkLoaded({ missingSchema: ref, missingRef }) {
          if (this.refs[ref]) {
            throw new Error(`AnySchema ${ref} is loaded but ${missingRef} cannot be resolved`);
          }
        }
        async function loadMissingSchema(ref) {
          const _schema = await _loadSchema.call(this, ref);
          if (!this.refs[ref])
            await loadMetaSchema.call(this, _schema.$schema);
          if (!this.refs[ref])
            this.addSchema(_schema, ref, meta);
        }
        async function _loadSchema(ref) {
          const p = this._loading[ref];
          if (p)
            return p;
          try {
            return await (this._loading[ref] = loadSchema(ref));
          } finally {
            delete this._loading[ref];
          }
        }
      }
      // Adds schema to the instance
      addSchema(schema, key, _meta, _validateSchema = this.opts.validateSchema) {
        if (Array.isArray(schema)) {
          for (const sch of schema)
            this.addSchema(sch, void 0, _meta, _validateSchema);
          return this;
        }
        let id;
        if (typeof schema === "object") {
          const { schemaId } = this.opts;
          id = schema[schemaId];
          if (id !== void 0 && typeof id != "string") {
            throw new Error(`schema ${schemaId} must be string`);
          }
        }
        key = (0, resolve_1.normalizeId)(key || id);
        this._checkUnique(key);
        this.schemas[key] = this._addSchema(schema, _meta, key, _validateSchema, true);
        return this;
      }
      // Add schema that will be used to validate other schemas
      // options in META_IGNORE_OPTIONS are alway set to false
      addMetaSchema(schema, key, _validateSchema = this.opts.validateSchema) {
        this.addSchema(schema, key, true, _validateSchema);
        return this;
      }
      //  Validate schema against its meta-schema
      validateSchema(schema, throwOrLogError) {
        if (typeof schema == "boolean")
          return true;
        let $schema;
        $schema = schema.$schema;
        if ($schema !== void 0 && typeof $schema != "string") {
          throw new Error("$schema must be a string");
        }
        $schema = $schema || this.opts.defaultMeta || this.defaultMeta();
        if (!$schema) {
          this.logger.warn("meta-schema not available");
          this.errors = null;
          return true;
        }
        const valid = this.validate($schema, schema);
        if (!valid && throwOrLogError) {
          const message = "schema is invalid: " + this.errorsText();
          if (this.opts.validateSchema === "log")
            this.logger.error(message);
          else
            throw new Error(message);
        }
        return valid;
      }
      // Get compiled schema by `key` or `ref`.
      // (`key` that was passed to `addSchema` or full schema reference - `schema.$id` or resolved id)
      getSchema(keyRef) {
        let sch;
        while (typeof (sch = getSchEnv.call(this, keyRef)) == "string")
          keyRef = sch;
        if (sch === void 0) {
          const { schemaId } = this.opts;
          const root = new compile_1.SchemaEnv({ schema: {}, schemaId });
          sch = compile_1.resolveSchema.call(this, root, keyRef);
          if (!sch)
            return;
          this.refs[keyRef] = sch;
        }
        return sch.validate || this._compileSchemaEnv(sch);
      }
      // Remove cached schema(s).
      // If no parameter is passed all schemas but meta-schemas are removed.
      // If RegExp is passed all schemas with key/id matching pattern but meta-schemas are removed.
      // Even if schema is referenced by other schemas it still can be removed as other schemas have local references.
      removeSchema(schemaKeyRef) {
        if (schemaKeyRef instanceof RegExp) {
          this._removeAllSchemas(this.schemas, schemaKeyRef);
          this._removeAllSchemas(this.refs, schemaKeyRef);
          return this;
        }
        switch (typeof schemaKeyRef) {
          case "undefined":
            this._removeAllSchemas(this.schemas);
            this._removeAllSchemas(this.refs);
            this._cache.clear();
            return this;
          case "string": {
            const sch = getSchEnv.call(this, schemaKeyRef);
            if (typeof sch == "object")
              this._cache.delete(sch.schema);
            delete this.schemas[schemaKeyRef];
            delete this.refs[schemaKeyRef];
            return this;
          }
          case "object": {
            const cacheKey = schemaKeyRef;
            this._cache.delete(cacheKey);
            let id = schemaKeyRef[this.opts.schemaId];
            if (id) {
              id = (0, resolve_1.normalizeId)(id);
              delete this.schemas[id];
              delete this.refs[id];
            }
            return this;
          }
          default:
            throw new Error("ajv.removeSchema: invalid parameter");
        }
      }
      // add "vocabulary" - a collection of keywords
      addVocabulary(definitions) {
        for (const def of definitions)
          this.addKeyword(def);
        return this;
      }
      addKeyword(kwdOrDef, def) {
        let keyword;
        if (typeof kwdOrDef == "string") {
          keyword = kwdOrDef;
          if (typeof def == "object") {
            this.logger.warn("these parameters are deprecated, see docs for addKeyword");
            def.keyword = keyword;
          }
        } else if (typeof kwdOrDef == "object" && def === void 0) {
          def = kwdOrDef;
          keyword = def.keyword;
          if (Array.isArray(keyword) && !keyword.length) {
            throw new Error("addKeywords: keyword must be string or non-empty array");
          }
        } else {
          throw new Error("invalid addKeywords parameters");
        }
        checkKeyword.call(this, keyword, def);
        if (!def) {
          (0, util_1.eachItem)(keyword, (kwd) => addRule.call(this, kwd));
          return this;
        }
        keywordMetaschema.call(this, def);
        const definition = {
          ...def,
          type: (0, dataType_1.getJSONTypes)(def.type),
          schemaType: (0, dataType_1.getJSONTypes)(def.schemaType)
        };
        (0, util_1.eachItem)(keyword, definition.type.length === 0 ? (k) => addRule.call(this, k, definition) : (k) => definition.type.forEach((t) => addRule.call(this, k, definition, t)));
        return this;
      }
      getKeyword(keyword) {
        const rule = this.RULES.all[keyword];
        return typeof rule == "object" ? rule.definition : !!rule;
      }
      // Remove keyword
      removeKeyword(keyword) {
        const { RULES } = this;
        delete RULES.keywords[keyword];
        delete RULES.all[keyword];
        for (const group of RULES.rules) {
          const i = group.rules.findIndex((rule) => rule.keyword === keyword);
          if (i >= 0)
            group.rules.splice(i, 1);
        }
        return this;
      }
      // Add format
      addFormat(name, format) {
        if (typeof format == "string")
          format = new RegExp(format);
        this.formats[name] = format;
        return this;
      }
      errorsText(errors = this.errors, { separator = ", ", dataVar = "data" } = {}) {
        if (!errors || errors.length === 0)
          return "No errors";
        return errors.map((e) => `${dataVar}${e.instancePath} ${e.message}`).reduce((text2, msg) => text2 + separator + msg);
      }
      $dataMetaSchema(metaSchema, keywordsJsonPointers) {
        const rules = this.RULES.all;
        metaSchema = JSON.parse(JSON.stringify(metaSchema));
        for (const jsonPointer of keywordsJsonPointers) {
          const segments = jsonPointer.split("/").slice(1);
          let keywords = metaSchema;
          for (const seg of segments)
            keywords = keywords[seg];
          for (const key in rules) {
            const rule = rules[key];
            if (typeof rule != "object")
              continue;
            const { $data } = rule.definition;
            const schema = keywords[key];
            if ($data && schema)
              keywords[key] = schemaOrData(schema);
          }
        }
        return metaSchema;
      }
      _removeAllSchemas(schemas, regex) {
        for (const keyRef in schemas) {
          const sch = schemas[keyRef];
          if (!regex || regex.test(keyRef)) {
            if (typeof sch == "string") {
              delete schemas[keyRef];
            } else if (sch && !sch.meta) {
              this._cache.delete(sch.schema);
              delete schemas[keyRef];
            }
          }
        }
      }
      _addSchema(schema, meta, baseId, validateSchema = this.opts.validateSchema, addSchema = this.opts.addUsedSchema) {
        let id;
        const { schemaId } = this.opts;
        if (typeof schema == "object") {
          id = schema[schemaId];
        } else {
          if (this.opts.jtd)
            throw new Error("schema must be object");
          else if (typeof schema != "boolean")
            throw new Error("schema must be object or boolean");
        }
        let sch = this._cache.get(schema);
        if (sch !== void 0)
          return sch;
        baseId = (0, resolve_1.normalizeId)(id || baseId);
        const localRefs = resolve_1.getSchemaRefs.call(this, schema, baseId);
        sch = new compile_1.SchemaEnv({ schema, schemaId, meta, baseId, localRefs });
        this._cache.set(sch.schema, sch);
        if (addSchema && !baseId.startsWith("#")) {
          if (baseId)
            this._checkUnique(baseId);
          this.refs[baseId] = sch;
        }
        if (validateSchema)
          this.validateSchema(schema, true);
        return sch;
      }
      _checkUnique(id) {
        if (this.schemas[id] || this.refs[id]) {
          throw new Error(`schema with key or id "${id}" already exists`);
        }
      }
      _compileSchemaEnv(sch) {
        if (sch.meta)
          this._compileMetaSchema(sch);
        else
          compile_1.compileSchema.call(this, sch);
        if (!sch.validate)
          throw new Error("ajv implementation error");
        return sch.validate;
      }
      _compileMetaSchema(sch) {
        const currentOpts = this.opts;
        this.opts = this._metaOpts;
        try {
          compile_1.compileSchema.call(this, sch);
        } finally {
          this.opts = currentOpts;
        }
      }
    };
    Ajv3.ValidationError = validation_error_1.default;
    Ajv3.MissingRefError = ref_error_1.default;
    exports.default = Ajv3;
    function checkOptions(checkOpts, options, msg, log = "error") {
      for (const key in checkOpts) {
        const opt = key;
        if (opt in options)
          this.logger[log](`${msg}: option ${key}. ${checkOpts[opt]}`);
      }
    }
    function getSchEnv(keyRef) {
      keyRef = (0, resolve_1.normalizeId)(keyRef);
      return this.schemas[keyRef] || this.refs[keyRef];
    }
    function addInitialSchemas() {
      const optsSchemas = this.opts.schemas;
      if (!optsSchemas)
        return;
      if (Array.isArray(optsSchemas))
        this.addSchema(optsSchemas);
      else
        for (const key in optsSchemas)
          this.addSchema(optsSchemas[key], key);
    }
    function addInitialFormats() {
      for (const name in this.opts.formats) {
        const format = this.opts.formats[name];
        if (format)
          this.addFormat(name, format);
      }
    }
    function addInitialKeywords(defs) {
      if (Array.isArray(defs)) {
        this.addVocabulary(defs);
        return;
      }
      this.logger.warn("keywords option as map is deprecated, pass array");
      for (const keyword in defs) {
        const def = defs[keyword];
        if (!def.keyword)
          def.keyword = keyword;
        this.addKeyword(def);
      }
    }
    function getMetaSchemaOptions() {
      const metaOpts = { ...this.opts };
      for (const opt of META_IGNORE_OPTIONS)
        delete metaOpts[opt];
      return metaOpts;
    }
    var noLogs = { log() {
    }, warn() {
    }, error() {
    } };
    function getLogger(logger) {
      if (logger === false)
        return noLogs;
      if (logger === void 0)
        return console;
      if (logger.log && logger.warn && logger.error)
        return logger;
      throw new Error("logger must implement log, warn and error methods");
    }
    var KEYWORD_NAME = /^[a-z_$][a-z0-9_$:-]*$/i;
    function checkKeyword(keyword, def) {
      const { RULES } = this;
      (0, util_1.eachItem)(keyword, (kwd) => {
        if (RULES.keywords[kwd])
          throw new Error(`Keyword ${kwd} is already defined`);
        if (!KEYWORD_NAME.test(kwd))
          throw new Error(`Keyword ${kwd} has invalid name`);
      });
      if (!def)
        return;
      if (def.$data && !("code" in def || "validate" in def)) {
        throw new Error('$data keyword must have "code" or "validate" function');
      }
    }
    function addRule(keyword, definition, dataType) {
      var _a;
      const post = definition === null || definition === void 0 ? void 0 : definition.post;
      if (dataType && post)
        throw new Error('keyword with "post" flag cannot have "type"');
      const { RULES } = this;
      let ruleGroup = post ? RULES.post : RULES.rules.find(({ type: t }) => t === dataType);
      if (!ruleGroup) {
        ruleGroup = { type: dataType, rules: [] };
        RULES.rules.push(ruleGroup);
      }
      RULES.keywords[keyword] = true;
      if (!definition)
        return;
      const rule = {
        keyword,
        definition: {
          ...definition,
          type: (0, dataType_1.getJSONTypes)(definition.type),
          schemaType: (0, dataType_1.getJSONTypes)(definition.schemaType)
        }
      };
      if (definition.before)
        addBeforeRule.call(this, ruleGroup, rule, definition.before);
      else
        ruleGroup.rules.push(rule);
      RULES.all[keyword] = rule;
      (_a = definition.implements) === null || _a === void 0 ? void 0 : _a.forEach((kwd) => this.addKeyword(kwd));
    }
    function addBeforeRule(ruleGroup, rule, before) {
      const i = ruleGroup.rules.findIndex((_rule) => _rule.keyword === before);
      if (i >= 0) {
        ruleGroup.rules.splice(i, 0, rule);
      } else {
        ruleGroup.rules.push(rule);
        this.logger.warn(`rule ${before} is not defined`);
      }
    }
    function keywordMetaschema(def) {
      let { metaSchema } = def;
      if (metaSchema === void 0)
        return;
      if (def.$data && this.opts.$data)
        metaSchema = schemaOrData(metaSchema);
      def.validateSchema = this.compile(metaSchema, true);
    }
    var $dataRef = {
      $ref: "https://raw.githubusercontent.com/ajv-validator/ajv/master/lib/refs/data.json#"
    };
    function schemaOrData(schema) {
      return { anyOf: [schema, $dataRef] };
    }
  }
});

// node_modules/ajv/dist/vocabularies/core/id.js
var require_id = __commonJS({
  "node_modules/ajv/dist/vocabularies/core/id.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var def = {
      keyword: "id",
      code() {
        throw new Error('NOT SUPPORTED: keyword "id", use "$id" for schema ID');
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/core/ref.js
var require_ref = __commonJS({
  "node_modules/ajv/dist/vocabularies/core/ref.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.callRef = exports.getValidate = void 0;
    var ref_error_1 = require_ref_error();
    var code_1 = require_code2();
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var compile_1 = require_compile();
    var util_1 = require_util();
    var def = {
      keyword: "$ref",
      schemaType: "string",
      code(cxt) {
        const { gen, schema: $ref, it } = cxt;
        const { baseId, schemaEnv: env, validateName, opts, self } = it;
        const { root } = env;
        if (($ref === "#" || $ref === "#/") && baseId === root.baseId)
          return callRootRef();
        const schOrEnv = compile_1.resolveRef.call(self, root, baseId, $ref);
        if (schOrEnv === void 0)
          throw new ref_error_1.default(it.opts.uriResolver, baseId, $ref);
        if (schOrEnv instanceof compile_1.SchemaEnv)
          return callValidate(schOrEnv);
        return inlineRefSchema(schOrEnv);
        function callRootRef() {
          if (env === root)
            return callRef(cxt, validateName, env, env.$async);
          const rootName = gen.scopeValue("root", { ref: root });
          return callRef(cxt, (0, codegen_1._)`${rootName}.validate`, root, root.$async);
        }
        function callValidate(sch) {
          const v = getValidate(cxt, sch);
          callRef(cxt, v, sch, sch.$async);
        }
        function inlineRefSchema(sch) {
          const schName = gen.scopeValue("schema", opts.code.source === true ? { ref: sch, code: (0, codegen_1.stringify)(sch) } : { ref: sch });
          const valid = gen.name("valid");
          const schCxt = cxt.subschema({
            schema: sch,
            dataTypes: [],
            schemaPath: codegen_1.nil,
            topSchemaRef: schName,
            errSchemaPath: $ref
          }, valid);
          cxt.mergeEvaluated(schCxt);
          cxt.ok(valid);
        }
      }
    };
    function getValidate(cxt, sch) {
      const { gen } = cxt;
      return sch.validate ? gen.scopeValue("validate", { ref: sch.validate }) : (0, codegen_1._)`${gen.scopeValue("wrapper", { ref: sch })}.validate`;
    }
    exports.getValidate = getValidate;
    function callRef(cxt, v, sch, $async) {
      const { gen, it } = cxt;
      const { allErrors, schemaEnv: env, opts } = it;
      const passCxt = opts.passContext ? names_1.default.this : codegen_1.nil;
      if ($async)
        callAsyncRef();
      else
        callSyncRef();
      function callAsyncRef() {
        if (!env.$async)
          throw new Error("async schema referenced by sync schema");
        const valid = gen.let("valid");
        gen.try(() => {
          gen.code((0, codegen_1._)`await ${(0, code_1.callValidateCode)(cxt, v, passCxt)}`);
          addEvaluatedFrom(v);
          if (!allErrors)
            gen.assign(valid, true);
        }, (e) => {
          gen.if((0, codegen_1._)`!(${e} instanceof ${it.ValidationError})`, () => gen.throw(e));
          addErrorsFrom(e);
          if (!allErrors)
            gen.assign(valid, false);
        });
        cxt.ok(valid);
      }
      function callSyncRef() {
        cxt.result((0, code_1.callValidateCode)(cxt, v, passCxt), () => addEvaluatedFrom(v), () => addErrorsFrom(v));
      }
      function addErrorsFrom(source) {
        const errs = (0, codegen_1._)`${source}.errors`;
        gen.assign(names_1.default.vErrors, (0, codegen_1._)`${names_1.default.vErrors} === null ? ${errs} : ${names_1.default.vErrors}.concat(${errs})`);
        gen.assign(names_1.default.errors, (0, codegen_1._)`${names_1.default.vErrors}.length`);
      }
      function addEvaluatedFrom(source) {
        var _a;
        if (!it.opts.unevaluated)
          return;
        const schEvaluated = (_a = sch === null || sch === void 0 ? void 0 : sch.validate) === null || _a === void 0 ? void 0 : _a.evaluated;
        if (it.props !== true) {
          if (schEvaluated && !schEvaluated.dynamicProps) {
            if (schEvaluated.props !== void 0) {
              it.props = util_1.mergeEvaluated.props(gen, schEvaluated.props, it.props);
            }
          } else {
            const props = gen.var("props", (0, codegen_1._)`${source}.evaluated.props`);
            it.props = util_1.mergeEvaluated.props(gen, props, it.props, codegen_1.Name);
          }
        }
        if (it.items !== true) {
          if (schEvaluated && !schEvaluated.dynamicItems) {
            if (schEvaluated.items !== void 0) {
              it.items = util_1.mergeEvaluated.items(gen, schEvaluated.items, it.items);
            }
          } else {
            const items = gen.var("items", (0, codegen_1._)`${source}.evaluated.items`);
            it.items = util_1.mergeEvaluated.items(gen, items, it.items, codegen_1.Name);
          }
        }
      }
    }
    exports.callRef = callRef;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/core/index.js
var require_core2 = __commonJS({
  "node_modules/ajv/dist/vocabularies/core/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var id_1 = require_id();
    var ref_1 = require_ref();
    var core = [
      "$schema",
      "$id",
      "$defs",
      "$vocabulary",
      { keyword: "$comment" },
      "definitions",
      id_1.default,
      ref_1.default
    ];
    exports.default = core;
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitNumber.js
var require_limitNumber = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitNumber.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var ops = codegen_1.operators;
    var KWDs = {
      maximum: { okStr: "<=", ok: ops.LTE, fail: ops.GT },
      minimum: { okStr: ">=", ok: ops.GTE, fail: ops.LT },
      exclusiveMaximum: { okStr: "<", ok: ops.LT, fail: ops.GTE },
      exclusiveMinimum: { okStr: ">", ok: ops.GT, fail: ops.LTE }
    };
    var error = {
      message: ({ keyword, schemaCode }) => (0, codegen_1.str)`must be ${KWDs[keyword].okStr} ${schemaCode}`,
      params: ({ keyword, schemaCode }) => (0, codegen_1._)`{comparison: ${KWDs[keyword].okStr}, limit: ${schemaCode}}`
    };
    var def = {
      keyword: Object.keys(KWDs),
      type: "number",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        cxt.fail$data((0, codegen_1._)`${data} ${KWDs[keyword].fail} ${schemaCode} || isNaN(${data})`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/multipleOf.js
var require_multipleOf = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/multipleOf.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var error = {
      message: ({ schemaCode }) => (0, codegen_1.str)`must be multiple of ${schemaCode}`,
      params: ({ schemaCode }) => (0, codegen_1._)`{multipleOf: ${schemaCode}}`
    };
    var def = {
      keyword: "multipleOf",
      type: "number",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, schemaCode, it } = cxt;
        const prec = it.opts.multipleOfPrecision;
        const res = gen.let("res");
        const invalid = prec ? (0, codegen_1._)`Math.abs(Math.round(${res}) - ${res}) > 1e-${prec}` : (0, codegen_1._)`${res} !== parseInt(${res})`;
        cxt.fail$data((0, codegen_1._)`(${schemaCode} === 0 || (${res} = ${data}/${schemaCode}, ${invalid}))`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/runtime/ucs2length.js
var require_ucs2length = __commonJS({
  "node_modules/ajv/dist/runtime/ucs2length.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    function ucs2length(str) {
      const len = str.length;
      let length = 0;
      let pos = 0;
      let value;
      while (pos < len) {
        length++;
        value = str.charCodeAt(pos++);
        if (value >= 55296 && value <= 56319 && pos < len) {
          value = str.charCodeAt(pos);
          if ((value & 64512) === 56320)
            pos++;
        }
      }
      return length;
    }
    exports.default = ucs2length;
    ucs2length.code = 'require("ajv/dist/runtime/ucs2length").default';
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitLength.js
var require_limitLength = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitLength.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var ucs2length_1 = require_ucs2length();
    var error = {
      message({ keyword, schemaCode }) {
        const comp = keyword === "maxLength" ? "more" : "fewer";
        return (0, codegen_1.str)`must NOT have ${comp} than ${schemaCode} characters`;
      },
      params: ({ schemaCode }) => (0, codegen_1._)`{limit: ${schemaCode}}`
    };
    var def = {
      keyword: ["maxLength", "minLength"],
      type: "string",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { keyword, data, schemaCode, it } = cxt;
        const op = keyword === "maxLength" ? codegen_1.operators.GT : codegen_1.operators.LT;
        const len = it.opts.unicode === false ? (0, codegen_1._)`${data}.length` : (0, codegen_1._)`${(0, util_1.useFunc)(cxt.gen, ucs2length_1.default)}(${data})`;
        cxt.fail$data((0, codegen_1._)`${len} ${op} ${schemaCode}`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/pattern.js
var require_pattern = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/pattern.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var util_1 = require_util();
    var codegen_1 = require_codegen();
    var error = {
      message: ({ schemaCode }) => (0, codegen_1.str)`must match pattern "${schemaCode}"`,
      params: ({ schemaCode }) => (0, codegen_1._)`{pattern: ${schemaCode}}`
    };
    var def = {
      keyword: "pattern",
      type: "string",
      schemaType: "string",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        const u = it.opts.unicodeRegExp ? "u" : "";
        if ($data) {
          const { regExp } = it.opts.code;
          const regExpCode = regExp.code === "new RegExp" ? (0, codegen_1._)`new RegExp` : (0, util_1.useFunc)(gen, regExp);
          const valid = gen.let("valid");
          gen.try(() => gen.assign(valid, (0, codegen_1._)`${regExpCode}(${schemaCode}, ${u}).test(${data})`), () => gen.assign(valid, false));
          cxt.fail$data((0, codegen_1._)`!${valid}`);
        } else {
          const regExp = (0, code_1.usePattern)(cxt, schema);
          cxt.fail$data((0, codegen_1._)`!${regExp}.test(${data})`);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitProperties.js
var require_limitProperties = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitProperties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var error = {
      message({ keyword, schemaCode }) {
        const comp = keyword === "maxProperties" ? "more" : "fewer";
        return (0, codegen_1.str)`must NOT have ${comp} than ${schemaCode} properties`;
      },
      params: ({ schemaCode }) => (0, codegen_1._)`{limit: ${schemaCode}}`
    };
    var def = {
      keyword: ["maxProperties", "minProperties"],
      type: "object",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        const op = keyword === "maxProperties" ? codegen_1.operators.GT : codegen_1.operators.LT;
        cxt.fail$data((0, codegen_1._)`Object.keys(${data}).length ${op} ${schemaCode}`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/required.js
var require_required = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/required.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params: { missingProperty } }) => (0, codegen_1.str)`must have required property '${missingProperty}'`,
      params: ({ params: { missingProperty } }) => (0, codegen_1._)`{missingProperty: ${missingProperty}}`
    };
    var def = {
      keyword: "required",
      type: "object",
      schemaType: "array",
      $data: true,
      error,
      code(cxt) {
        const { gen, schema, schemaCode, data, $data, it } = cxt;
        const { opts } = it;
        if (!$data && schema.length === 0)
          return;
        const useLoop = schema.length >= opts.loopRequired;
        if (it.allErrors)
          allErrorsMode();
        else
          exitOnErrorMode();
        if (opts.strictRequired) {
          const props = cxt.parentSchema.properties;
          const { definedProperties } = cxt.it;
          for (const requiredKey of schema) {
            if ((props === null || props === void 0 ? void 0 : props[requiredKey]) === void 0 && !definedProperties.has(requiredKey)) {
              const schemaPath = it.schemaEnv.baseId + it.errSchemaPath;
              const msg = `required property "${requiredKey}" is not defined at "${schemaPath}" (strictRequired)`;
              (0, util_1.checkStrictMode)(it, msg, it.opts.strictRequired);
            }
          }
        }
        function allErrorsMode() {
          if (useLoop || $data) {
            cxt.block$data(codegen_1.nil, loopAllRequired);
          } else {
            for (const prop of schema) {
              (0, code_1.checkReportMissingProp)(cxt, prop);
            }
          }
        }
        function exitOnErrorMode() {
          const missing2 = gen.let("missing");
          if (useLoop || $data) {
            const valid = gen.let("valid", true);
            cxt.block$data(valid, () => loopUntilMissing(missing2, valid));
            cxt.ok(valid);
          } else {
            gen.if((0, code_1.checkMissingProp)(cxt, schema, missing2));
            (0, code_1.reportMissingProp)(cxt, missing2);
            gen.else();
          }
        }
        function loopAllRequired() {
          gen.forOf("prop", schemaCode, (prop) => {
            cxt.setParams({ missingProperty: prop });
            gen.if((0, code_1.noPropertyInData)(gen, data, prop, opts.ownProperties), () => cxt.error());
          });
        }
        function loopUntilMissing(missing2, valid) {
          cxt.setParams({ missingProperty: missing2 });
          gen.forOf(missing2, schemaCode, () => {
            gen.assign(valid, (0, code_1.propertyInData)(gen, data, missing2, opts.ownProperties));
            gen.if((0, codegen_1.not)(valid), () => {
              cxt.error();
              gen.break();
            });
          }, codegen_1.nil);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitItems.js
var require_limitItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var error = {
      message({ keyword, schemaCode }) {
        const comp = keyword === "maxItems" ? "more" : "fewer";
        return (0, codegen_1.str)`must NOT have ${comp} than ${schemaCode} items`;
      },
      params: ({ schemaCode }) => (0, codegen_1._)`{limit: ${schemaCode}}`
    };
    var def = {
      keyword: ["maxItems", "minItems"],
      type: "array",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        const op = keyword === "maxItems" ? codegen_1.operators.GT : codegen_1.operators.LT;
        cxt.fail$data((0, codegen_1._)`${data}.length ${op} ${schemaCode}`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/runtime/equal.js
var require_equal = __commonJS({
  "node_modules/ajv/dist/runtime/equal.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var equal = require_fast_deep_equal();
    equal.code = 'require("ajv/dist/runtime/equal").default';
    exports.default = equal;
  }
});

// node_modules/ajv/dist/vocabularies/validation/uniqueItems.js
var require_uniqueItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/uniqueItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var dataType_1 = require_dataType();
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var equal_1 = require_equal();
    var error = {
      message: ({ params: { i, j } }) => (0, codegen_1.str)`must NOT have duplicate items (items ## ${j} and ${i} are identical)`,
      params: ({ params: { i, j } }) => (0, codegen_1._)`{i: ${i}, j: ${j}}`
    };
    var def = {
      keyword: "uniqueItems",
      type: "array",
      schemaType: "boolean",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, $data, schema, parentSchema, schemaCode, it } = cxt;
        if (!$data && !schema)
          return;
        const valid = gen.let("valid");
        const itemTypes = parentSchema.items ? (0, dataType_1.getSchemaTypes)(parentSchema.items) : [];
        cxt.block$data(valid, validateUniqueItems, (0, codegen_1._)`${schemaCode} === false`);
        cxt.ok(valid);
        function validateUniqueItems() {
          const i = gen.let("i", (0, codegen_1._)`${data}.length`);
          const j = gen.let("j");
          cxt.setParams({ i, j });
          gen.assign(valid, true);
          gen.if((0, codegen_1._)`${i} > 1`, () => (canOptimize() ? loopN : loopN2)(i, j));
        }
        function canOptimize() {
          return itemTypes.length > 0 && !itemTypes.some((t) => t === "object" || t === "array");
        }
        function loopN(i, j) {
          const item = gen.name("item");
          const wrongType = (0, dataType_1.checkDataTypes)(itemTypes, item, it.opts.strictNumbers, dataType_1.DataType.Wrong);
          const indices = gen.const("indices", (0, codegen_1._)`{}`);
          gen.for((0, codegen_1._)`;${i}--;`, () => {
            gen.let(item, (0, codegen_1._)`${data}[${i}]`);
            gen.if(wrongType, (0, codegen_1._)`continue`);
            if (itemTypes.length > 1)
              gen.if((0, codegen_1._)`typeof ${item} == "string"`, (0, codegen_1._)`${item} += "_"`);
            gen.if((0, codegen_1._)`typeof ${indices}[${item}] == "number"`, () => {
              gen.assign(j, (0, codegen_1._)`${indices}[${item}]`);
              cxt.error();
              gen.assign(valid, false).break();
            }).code((0, codegen_1._)`${indices}[${item}] = ${i}`);
          });
        }
        function loopN2(i, j) {
          const eql = (0, util_1.useFunc)(gen, equal_1.default);
          const outer = gen.name("outer");
          gen.label(outer).for((0, codegen_1._)`;${i}--;`, () => gen.for((0, codegen_1._)`${j} = ${i}; ${j}--;`, () => gen.if((0, codegen_1._)`${eql}(${data}[${i}], ${data}[${j}])`, () => {
            cxt.error();
            gen.assign(valid, false).break(outer);
          })));
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/const.js
var require_const = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/const.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var equal_1 = require_equal();
    var error = {
      message: "must be equal to constant",
      params: ({ schemaCode }) => (0, codegen_1._)`{allowedValue: ${schemaCode}}`
    };
    var def = {
      keyword: "const",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, $data, schemaCode, schema } = cxt;
        if ($data || schema && typeof schema == "object") {
          cxt.fail$data((0, codegen_1._)`!${(0, util_1.useFunc)(gen, equal_1.default)}(${data}, ${schemaCode})`);
        } else {
          cxt.fail((0, codegen_1._)`${schema} !== ${data}`);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/enum.js
var require_enum = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/enum.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var equal_1 = require_equal();
    var error = {
      message: "must be equal to one of the allowed values",
      params: ({ schemaCode }) => (0, codegen_1._)`{allowedValues: ${schemaCode}}`
    };
    var def = {
      keyword: "enum",
      schemaType: "array",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        if (!$data && schema.length === 0)
          throw new Error("enum must have non-empty array");
        const useLoop = schema.length >= it.opts.loopEnum;
        let eql;
        const getEql = () => eql !== null && eql !== void 0 ? eql : eql = (0, util_1.useFunc)(gen, equal_1.default);
        let valid;
        if (useLoop || $data) {
          valid = gen.let("valid");
          cxt.block$data(valid, loopEnum);
        } else {
          if (!Array.isArray(schema))
            throw new Error("ajv implementation error");
          const vSchema = gen.const("vSchema", schemaCode);
          valid = (0, codegen_1.or)(...schema.map((_x, i) => equalCode(vSchema, i)));
        }
        cxt.pass(valid);
        function loopEnum() {
          gen.assign(valid, false);
          gen.forOf("v", schemaCode, (v) => gen.if((0, codegen_1._)`${getEql()}(${data}, ${v})`, () => gen.assign(valid, true).break()));
        }
        function equalCode(vSchema, i) {
          const sch = schema[i];
          return typeof sch === "object" && sch !== null ? (0, codegen_1._)`${getEql()}(${data}, ${vSchema}[${i}])` : (0, codegen_1._)`${data} === ${sch}`;
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/index.js
var require_validation = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var limitNumber_1 = require_limitNumber();
    var multipleOf_1 = require_multipleOf();
    var limitLength_1 = require_limitLength();
    var pattern_1 = require_pattern();
    var limitProperties_1 = require_limitProperties();
    var required_1 = require_required();
    var limitItems_1 = require_limitItems();
    var uniqueItems_1 = require_uniqueItems();
    var const_1 = require_const();
    var enum_1 = require_enum();
    var validation = [
      // number
      limitNumber_1.default,
      multipleOf_1.default,
      // string
      limitLength_1.default,
      pattern_1.default,
      // object
      limitProperties_1.default,
      required_1.default,
      // array
      limitItems_1.default,
      uniqueItems_1.default,
      // any
      { keyword: "type", schemaType: ["string", "array"] },
      { keyword: "nullable", schemaType: "boolean" },
      const_1.default,
      enum_1.default
    ];
    exports.default = validation;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/additionalItems.js
var require_additionalItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/additionalItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateAdditionalItems = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params: { len } }) => (0, codegen_1.str)`must NOT have more than ${len} items`,
      params: ({ params: { len } }) => (0, codegen_1._)`{limit: ${len}}`
    };
    var def = {
      keyword: "additionalItems",
      type: "array",
      schemaType: ["boolean", "object"],
      before: "uniqueItems",
      error,
      code(cxt) {
        const { parentSchema, it } = cxt;
        const { items } = parentSchema;
        if (!Array.isArray(items)) {
          (0, util_1.checkStrictMode)(it, '"additionalItems" is ignored when "items" is not an array of schemas');
          return;
        }
        validateAdditionalItems(cxt, items);
      }
    };
    function validateAdditionalItems(cxt, items) {
      const { gen, schema, data, keyword, it } = cxt;
      it.items = true;
      const len = gen.const("len", (0, codegen_1._)`${data}.length`);
      if (schema === false) {
        cxt.setParams({ len: items.length });
        cxt.pass((0, codegen_1._)`${len} <= ${items.length}`);
      } else if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
        const valid = gen.var("valid", (0, codegen_1._)`${len} <= ${items.length}`);
        gen.if((0, codegen_1.not)(valid), () => validateItems(valid));
        cxt.ok(valid);
      }
      function validateItems(valid) {
        gen.forRange("i", items.length, len, (i) => {
          cxt.subschema({ keyword, dataProp: i, dataPropType: util_1.Type.Num }, valid);
          if (!it.allErrors)
            gen.if((0, codegen_1.not)(valid), () => gen.break());
        });
      }
    }
    exports.validateAdditionalItems = validateAdditionalItems;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/items.js
var require_items = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/items.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateTuple = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var code_1 = require_code2();
    var def = {
      keyword: "items",
      type: "array",
      schemaType: ["object", "array", "boolean"],
      before: "uniqueItems",
      code(cxt) {
        const { schema, it } = cxt;
        if (Array.isArray(schema))
          return validateTuple(cxt, "additionalItems", schema);
        it.items = true;
        if ((0, util_1.alwaysValidSchema)(it, schema))
          return;
        cxt.ok((0, code_1.validateArray)(cxt));
      }
    };
    function validateTuple(cxt, extraItems, schArr = cxt.schema) {
      const { gen, parentSchema, data, keyword, it } = cxt;
      checkStrictTuple(parentSchema);
      if (it.opts.unevaluated && schArr.length && it.items !== true) {
        it.items = util_1.mergeEvaluated.items(gen, schArr.length, it.items);
      }
      const valid = gen.name("valid");
      const len = gen.const("len", (0, codegen_1._)`${data}.length`);
      schArr.forEach((sch, i) => {
        if ((0, util_1.alwaysValidSchema)(it, sch))
          return;
        gen.if((0, codegen_1._)`${len} > ${i}`, () => cxt.subschema({
          keyword,
          schemaProp: i,
          dataProp: i
        }, valid));
        cxt.ok(valid);
      });
      function checkStrictTuple(sch) {
        const { opts, errSchemaPath } = it;
        const l = schArr.length;
        const fullTuple = l === sch.minItems && (l === sch.maxItems || sch[extraItems] === false);
        if (opts.strictTuples && !fullTuple) {
          const msg = `"${keyword}" is ${l}-tuple, but minItems or maxItems/${extraItems} are not specified or different at path "${errSchemaPath}"`;
          (0, util_1.checkStrictMode)(it, msg, opts.strictTuples);
        }
      }
    }
    exports.validateTuple = validateTuple;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/prefixItems.js
var require_prefixItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/prefixItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var items_1 = require_items();
    var def = {
      keyword: "prefixItems",
      type: "array",
      schemaType: ["array"],
      before: "uniqueItems",
      code: (cxt) => (0, items_1.validateTuple)(cxt, "items")
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/items2020.js
var require_items2020 = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/items2020.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var code_1 = require_code2();
    var additionalItems_1 = require_additionalItems();
    var error = {
      message: ({ params: { len } }) => (0, codegen_1.str)`must NOT have more than ${len} items`,
      params: ({ params: { len } }) => (0, codegen_1._)`{limit: ${len}}`
    };
    var def = {
      keyword: "items",
      type: "array",
      schemaType: ["object", "boolean"],
      before: "uniqueItems",
      error,
      code(cxt) {
        const { schema, parentSchema, it } = cxt;
        const { prefixItems } = parentSchema;
        it.items = true;
        if ((0, util_1.alwaysValidSchema)(it, schema))
          return;
        if (prefixItems)
          (0, additionalItems_1.validateAdditionalItems)(cxt, prefixItems);
        else
          cxt.ok((0, code_1.validateArray)(cxt));
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/contains.js
var require_contains = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/contains.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params: { min, max } }) => max === void 0 ? (0, codegen_1.str)`must contain at least ${min} valid item(s)` : (0, codegen_1.str)`must contain at least ${min} and no more than ${max} valid item(s)`,
      params: ({ params: { min, max } }) => max === void 0 ? (0, codegen_1._)`{minContains: ${min}}` : (0, codegen_1._)`{minContains: ${min}, maxContains: ${max}}`
    };
    var def = {
      keyword: "contains",
      type: "array",
      schemaType: ["object", "boolean"],
      before: "uniqueItems",
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, schema, parentSchema, data, it } = cxt;
        let min;
        let max;
        const { minContains, maxContains } = parentSchema;
        if (it.opts.next) {
          min = minContains === void 0 ? 1 : minContains;
          max = maxContains;
        } else {
          min = 1;
        }
        const len = gen.const("len", (0, codegen_1._)`${data}.length`);
        cxt.setParams({ min, max });
        if (max === void 0 && min === 0) {
          (0, util_1.checkStrictMode)(it, `"minContains" == 0 without "maxContains": "contains" keyword ignored`);
          return;
        }
        if (max !== void 0 && min > max) {
          (0, util_1.checkStrictMode)(it, `"minContains" > "maxContains" is always invalid`);
          cxt.fail();
          return;
        }
        if ((0, util_1.alwaysValidSchema)(it, schema)) {
          let cond = (0, codegen_1._)`${len} >= ${min}`;
          if (max !== void 0)
            cond = (0, codegen_1._)`${cond} && ${len} <= ${max}`;
          cxt.pass(cond);
          return;
        }
        it.items = true;
        const valid = gen.name("valid");
        if (max === void 0 && min === 1) {
          validateItems(valid, () => gen.if(valid, () => gen.break()));
        } else if (min === 0) {
          gen.let(valid, true);
          if (max !== void 0)
            gen.if((0, codegen_1._)`${data}.length > 0`, validateItemsWithCount);
        } else {
          gen.let(valid, false);
          validateItemsWithCount();
        }
        cxt.result(valid, () => cxt.reset());
        function validateItemsWithCount() {
          const schValid = gen.name("_valid");
          const count = gen.let("count", 0);
          validateItems(schValid, () => gen.if(schValid, () => checkLimits(count)));
        }
        function validateItems(_valid, block) {
          gen.forRange("i", 0, len, (i) => {
            cxt.subschema({
              keyword: "contains",
              dataProp: i,
              dataPropType: util_1.Type.Num,
              compositeRule: true
            }, _valid);
            block();
          });
        }
        function checkLimits(count) {
          gen.code((0, codegen_1._)`${count}++`);
          if (max === void 0) {
            gen.if((0, codegen_1._)`${count} >= ${min}`, () => gen.assign(valid, true).break());
          } else {
            gen.if((0, codegen_1._)`${count} > ${max}`, () => gen.assign(valid, false).break());
            if (min === 1)
              gen.assign(valid, true);
            else
              gen.if((0, codegen_1._)`${count} >= ${min}`, () => gen.assign(valid, true));
          }
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/dependencies.js
var require_dependencies = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/dependencies.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateSchemaDeps = exports.validatePropertyDeps = exports.error = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var code_1 = require_code2();
    exports.error = {
      message: ({ params: { property, depsCount, deps } }) => {
        const property_ies = depsCount === 1 ? "property" : "properties";
        return (0, codegen_1.str)`must have ${property_ies} ${deps} when property ${property} is present`;
      },
      params: ({ params: { property, depsCount, deps, missingProperty } }) => (0, codegen_1._)`{property: ${property},
    missingProperty: ${missingProperty},
    depsCount: ${depsCount},
    deps: ${deps}}`
      // TODO change to reference
    };
    var def = {
      keyword: "dependencies",
      type: "object",
      schemaType: "object",
      error: exports.error,
      code(cxt) {
        const [propDeps, schDeps] = splitDependencies(cxt);
        validatePropertyDeps(cxt, propDeps);
        validateSchemaDeps(cxt, schDeps);
      }
    };
    function splitDependencies({ schema }) {
      const propertyDeps = {};
      const schemaDeps = {};
      for (const key in schema) {
        if (key === "__proto__")
          continue;
        const deps = Array.isArray(schema[key]) ? propertyDeps : schemaDeps;
        deps[key] = schema[key];
      }
      return [propertyDeps, schemaDeps];
    }
    function validatePropertyDeps(cxt, propertyDeps = cxt.schema) {
      const { gen, data, it } = cxt;
      if (Object.keys(propertyDeps).length === 0)
        return;
      const missing2 = gen.let("missing");
      for (const prop in propertyDeps) {
        const deps = propertyDeps[prop];
        if (deps.length === 0)
          continue;
        const hasProperty = (0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties);
        cxt.setParams({
          property: prop,
          depsCount: deps.length,
          deps: deps.join(", ")
        });
        if (it.allErrors) {
          gen.if(hasProperty, () => {
            for (const depProp of deps) {
              (0, code_1.checkReportMissingProp)(cxt, depProp);
            }
          });
        } else {
          gen.if((0, codegen_1._)`${hasProperty} && (${(0, code_1.checkMissingProp)(cxt, deps, missing2)})`);
          (0, code_1.reportMissingProp)(cxt, missing2);
          gen.else();
        }
      }
    }
    exports.validatePropertyDeps = validatePropertyDeps;
    function validateSchemaDeps(cxt, schemaDeps = cxt.schema) {
      const { gen, data, keyword, it } = cxt;
      const valid = gen.name("valid");
      for (const prop in schemaDeps) {
        if ((0, util_1.alwaysValidSchema)(it, schemaDeps[prop]))
          continue;
        gen.if(
          (0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties),
          () => {
            const schCxt = cxt.subschema({ keyword, schemaProp: prop }, valid);
            cxt.mergeValidEvaluated(schCxt, valid);
          },
          () => gen.var(valid, true)
          // TODO var
        );
        cxt.ok(valid);
      }
    }
    exports.validateSchemaDeps = validateSchemaDeps;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/propertyNames.js
var require_propertyNames = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/propertyNames.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: "property name must be valid",
      params: ({ params }) => (0, codegen_1._)`{propertyName: ${params.propertyName}}`
    };
    var def = {
      keyword: "propertyNames",
      type: "object",
      schemaType: ["object", "boolean"],
      error,
      code(cxt) {
        const { gen, schema, data, it } = cxt;
        if ((0, util_1.alwaysValidSchema)(it, schema))
          return;
        const valid = gen.name("valid");
        gen.forIn("key", data, (key) => {
          cxt.setParams({ propertyName: key });
          cxt.subschema({
            keyword: "propertyNames",
            data: key,
            dataTypes: ["string"],
            propertyName: key,
            compositeRule: true
          }, valid);
          gen.if((0, codegen_1.not)(valid), () => {
            cxt.error(true);
            if (!it.allErrors)
              gen.break();
          });
        });
        cxt.ok(valid);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/additionalProperties.js
var require_additionalProperties = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/additionalProperties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var util_1 = require_util();
    var error = {
      message: "must NOT have additional properties",
      params: ({ params }) => (0, codegen_1._)`{additionalProperty: ${params.additionalProperty}}`
    };
    var def = {
      keyword: "additionalProperties",
      type: ["object"],
      schemaType: ["boolean", "object"],
      allowUndefined: true,
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, schema, parentSchema, data, errsCount, it } = cxt;
        if (!errsCount)
          throw new Error("ajv implementation error");
        const { allErrors, opts } = it;
        it.props = true;
        if (opts.removeAdditional !== "all" && (0, util_1.alwaysValidSchema)(it, schema))
          return;
        const props = (0, code_1.allSchemaProperties)(parentSchema.properties);
        const patProps = (0, code_1.allSchemaProperties)(parentSchema.patternProperties);
        checkAdditionalProperties();
        cxt.ok((0, codegen_1._)`${errsCount} === ${names_1.default.errors}`);
        function checkAdditionalProperties() {
          gen.forIn("key", data, (key) => {
            if (!props.length && !patProps.length)
              additionalPropertyCode(key);
            else
              gen.if(isAdditional(key), () => additionalPropertyCode(key));
          });
        }
        function isAdditional(key) {
          let definedProp;
          if (props.length > 8) {
            const propsSchema = (0, util_1.schemaRefOrVal)(it, parentSchema.properties, "properties");
            definedProp = (0, code_1.isOwnProperty)(gen, propsSchema, key);
          } else if (props.length) {
            definedProp = (0, codegen_1.or)(...props.map((p) => (0, codegen_1._)`${key} === ${p}`));
          } else {
            definedProp = codegen_1.nil;
          }
          if (patProps.length) {
            definedProp = (0, codegen_1.or)(definedProp, ...patProps.map((p) => (0, codegen_1._)`${(0, code_1.usePattern)(cxt, p)}.test(${key})`));
          }
          return (0, codegen_1.not)(definedProp);
        }
        function deleteAdditional(key) {
          gen.code((0, codegen_1._)`delete ${data}[${key}]`);
        }
        function additionalPropertyCode(key) {
          if (opts.removeAdditional === "all" || opts.removeAdditional && schema === false) {
            deleteAdditional(key);
            return;
          }
          if (schema === false) {
            cxt.setParams({ additionalProperty: key });
            cxt.error();
            if (!allErrors)
              gen.break();
            return;
          }
          if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
            const valid = gen.name("valid");
            if (opts.removeAdditional === "failing") {
              applyAdditionalSchema(key, valid, false);
              gen.if((0, codegen_1.not)(valid), () => {
                cxt.reset();
                deleteAdditional(key);
              });
            } else {
              applyAdditionalSchema(key, valid);
              if (!allErrors)
                gen.if((0, codegen_1.not)(valid), () => gen.break());
            }
          }
        }
        function applyAdditionalSchema(key, valid, errors) {
          const subschema = {
            keyword: "additionalProperties",
            dataProp: key,
            dataPropType: util_1.Type.Str
          };
          if (errors === false) {
            Object.assign(subschema, {
              compositeRule: true,
              createErrors: false,
              allErrors: false
            });
          }
          cxt.subschema(subschema, valid);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/properties.js
var require_properties = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/properties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var validate_1 = require_validate();
    var code_1 = require_code2();
    var util_1 = require_util();
    var additionalProperties_1 = require_additionalProperties();
    var def = {
      keyword: "properties",
      type: "object",
      schemaType: "object",
      code(cxt) {
        const { gen, schema, parentSchema, data, it } = cxt;
        if (it.opts.removeAdditional === "all" && parentSchema.additionalProperties === void 0) {
          additionalProperties_1.default.code(new validate_1.KeywordCxt(it, additionalProperties_1.default, "additionalProperties"));
        }
        const allProps = (0, code_1.allSchemaProperties)(schema);
        for (const prop of allProps) {
          it.definedProperties.add(prop);
        }
        if (it.opts.unevaluated && allProps.length && it.props !== true) {
          it.props = util_1.mergeEvaluated.props(gen, (0, util_1.toHash)(allProps), it.props);
        }
        const properties = allProps.filter((p) => !(0, util_1.alwaysValidSchema)(it, schema[p]));
        if (properties.length === 0)
          return;
        const valid = gen.name("valid");
        for (const prop of properties) {
          if (hasDefault(prop)) {
            applyPropertySchema(prop);
          } else {
            gen.if((0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties));
            applyPropertySchema(prop);
            if (!it.allErrors)
              gen.else().var(valid, true);
            gen.endIf();
          }
          cxt.it.definedProperties.add(prop);
          cxt.ok(valid);
        }
        function hasDefault(prop) {
          return it.opts.useDefaults && !it.compositeRule && schema[prop].default !== void 0;
        }
        function applyPropertySchema(prop) {
          cxt.subschema({
            keyword: "properties",
            schemaProp: prop,
            dataProp: prop
          }, valid);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/patternProperties.js
var require_patternProperties = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/patternProperties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var util_2 = require_util();
    var def = {
      keyword: "patternProperties",
      type: "object",
      schemaType: "object",
      code(cxt) {
        const { gen, schema, data, parentSchema, it } = cxt;
        const { opts } = it;
        const patterns = (0, code_1.allSchemaProperties)(schema);
        const alwaysValidPatterns = patterns.filter((p) => (0, util_1.alwaysValidSchema)(it, schema[p]));
        if (patterns.length === 0 || alwaysValidPatterns.length === patterns.length && (!it.opts.unevaluated || it.props === true)) {
          return;
        }
        const checkProperties = opts.strictSchema && !opts.allowMatchingProperties && parentSchema.properties;
        const valid = gen.name("valid");
        if (it.props !== true && !(it.props instanceof codegen_1.Name)) {
          it.props = (0, util_2.evaluatedPropsToName)(gen, it.props);
        }
        const { props } = it;
        validatePatternProperties();
        function validatePatternProperties() {
          for (const pat of patterns) {
            if (checkProperties)
              checkMatchingProperties(pat);
            if (it.allErrors) {
              validateProperties(pat);
            } else {
              gen.var(valid, true);
              validateProperties(pat);
              gen.if(valid);
            }
          }
        }
        function checkMatchingProperties(pat) {
          for (const prop in checkProperties) {
            if (new RegExp(pat).test(prop)) {
              (0, util_1.checkStrictMode)(it, `property ${prop} matches pattern ${pat} (use allowMatchingProperties)`);
            }
          }
        }
        function validateProperties(pat) {
          gen.forIn("key", data, (key) => {
            gen.if((0, codegen_1._)`${(0, code_1.usePattern)(cxt, pat)}.test(${key})`, () => {
              const alwaysValid = alwaysValidPatterns.includes(pat);
              if (!alwaysValid) {
                cxt.subschema({
                  keyword: "patternProperties",
                  schemaProp: pat,
                  dataProp: key,
                  dataPropType: util_2.Type.Str
                }, valid);
              }
              if (it.opts.unevaluated && props !== true) {
                gen.assign((0, codegen_1._)`${props}[${key}]`, true);
              } else if (!alwaysValid && !it.allErrors) {
                gen.if((0, codegen_1.not)(valid), () => gen.break());
              }
            });
          });
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/not.js
var require_not = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/not.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var util_1 = require_util();
    var def = {
      keyword: "not",
      schemaType: ["object", "boolean"],
      trackErrors: true,
      code(cxt) {
        const { gen, schema, it } = cxt;
        if ((0, util_1.alwaysValidSchema)(it, schema)) {
          cxt.fail();
          return;
        }
        const valid = gen.name("valid");
        cxt.subschema({
          keyword: "not",
          compositeRule: true,
          createErrors: false,
          allErrors: false
        }, valid);
        cxt.failResult(valid, () => cxt.reset(), () => cxt.error());
      },
      error: { message: "must NOT be valid" }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/anyOf.js
var require_anyOf = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/anyOf.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var def = {
      keyword: "anyOf",
      schemaType: "array",
      trackErrors: true,
      code: code_1.validateUnion,
      error: { message: "must match a schema in anyOf" }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/oneOf.js
var require_oneOf = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/oneOf.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: "must match exactly one schema in oneOf",
      params: ({ params }) => (0, codegen_1._)`{passingSchemas: ${params.passing}}`
    };
    var def = {
      keyword: "oneOf",
      schemaType: "array",
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, schema, parentSchema, it } = cxt;
        if (!Array.isArray(schema))
          throw new Error("ajv implementation error");
        if (it.opts.discriminator && parentSchema.discriminator)
          return;
        const schArr = schema;
        const valid = gen.let("valid", false);
        const passing = gen.let("passing", null);
        const schValid = gen.name("_valid");
        cxt.setParams({ passing });
        gen.block(validateOneOf);
        cxt.result(valid, () => cxt.reset(), () => cxt.error(true));
        function validateOneOf() {
          schArr.forEach((sch, i) => {
            let schCxt;
            if ((0, util_1.alwaysValidSchema)(it, sch)) {
              gen.var(schValid, true);
            } else {
              schCxt = cxt.subschema({
                keyword: "oneOf",
                schemaProp: i,
                compositeRule: true
              }, schValid);
            }
            if (i > 0) {
              gen.if((0, codegen_1._)`${schValid} && ${valid}`).assign(valid, false).assign(passing, (0, codegen_1._)`[${passing}, ${i}]`).else();
            }
            gen.if(schValid, () => {
              gen.assign(valid, true);
              gen.assign(passing, i);
              if (schCxt)
                cxt.mergeEvaluated(schCxt, codegen_1.Name);
            });
          });
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/allOf.js
var require_allOf = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/allOf.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var util_1 = require_util();
    var def = {
      keyword: "allOf",
      schemaType: "array",
      code(cxt) {
        const { gen, schema, it } = cxt;
        if (!Array.isArray(schema))
          throw new Error("ajv implementation error");
        const valid = gen.name("valid");
        schema.forEach((sch, i) => {
          if ((0, util_1.alwaysValidSchema)(it, sch))
            return;
          const schCxt = cxt.subschema({ keyword: "allOf", schemaProp: i }, valid);
          cxt.ok(valid);
          cxt.mergeEvaluated(schCxt);
        });
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/if.js
var require_if = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/if.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params }) => (0, codegen_1.str)`must match "${params.ifClause}" schema`,
      params: ({ params }) => (0, codegen_1._)`{failingKeyword: ${params.ifClause}}`
    };
    var def = {
      keyword: "if",
      schemaType: ["object", "boolean"],
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, parentSchema, it } = cxt;
        if (parentSchema.then === void 0 && parentSchema.else === void 0) {
          (0, util_1.checkStrictMode)(it, '"if" without "then" and "else" is ignored');
        }
        const hasThen = hasSchema(it, "then");
        const hasElse = hasSchema(it, "else");
        if (!hasThen && !hasElse)
          return;
        const valid = gen.let("valid", true);
        const schValid = gen.name("_valid");
        validateIf();
        cxt.reset();
        if (hasThen && hasElse) {
          const ifClause = gen.let("ifClause");
          cxt.setParams({ ifClause });
          gen.if(schValid, validateClause("then", ifClause), validateClause("else", ifClause));
        } else if (hasThen) {
          gen.if(schValid, validateClause("then"));
        } else {
          gen.if((0, codegen_1.not)(schValid), validateClause("else"));
        }
        cxt.pass(valid, () => cxt.error(true));
        function validateIf() {
          const schCxt = cxt.subschema({
            keyword: "if",
            compositeRule: true,
            createErrors: false,
            allErrors: false
          }, schValid);
          cxt.mergeEvaluated(schCxt);
        }
        function validateClause(keyword, ifClause) {
          return () => {
            const schCxt = cxt.subschema({ keyword }, schValid);
            gen.assign(valid, schValid);
            cxt.mergeValidEvaluated(schCxt, valid);
            if (ifClause)
              gen.assign(ifClause, (0, codegen_1._)`${keyword}`);
            else
              cxt.setParams({ ifClause: keyword });
          };
        }
      }
    };
    function hasSchema(it, keyword) {
      const schema = it.schema[keyword];
      return schema !== void 0 && !(0, util_1.alwaysValidSchema)(it, schema);
    }
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/thenElse.js
var require_thenElse = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/thenElse.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var util_1 = require_util();
    var def = {
      keyword: ["then", "else"],
      schemaType: ["object", "boolean"],
      code({ keyword, parentSchema, it }) {
        if (parentSchema.if === void 0)
          (0, util_1.checkStrictMode)(it, `"${keyword}" without "if" is ignored`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/index.js
var require_applicator = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var additionalItems_1 = require_additionalItems();
    var prefixItems_1 = require_prefixItems();
    var items_1 = require_items();
    var items2020_1 = require_items2020();
    var contains_1 = require_contains();
    var dependencies_1 = require_dependencies();
    var propertyNames_1 = require_propertyNames();
    var additionalProperties_1 = require_additionalProperties();
    var properties_1 = require_properties();
    var patternProperties_1 = require_patternProperties();
    var not_1 = require_not();
    var anyOf_1 = require_anyOf();
    var oneOf_1 = require_oneOf();
    var allOf_1 = require_allOf();
    var if_1 = require_if();
    var thenElse_1 = require_thenElse();
    function getApplicator(draft2020 = false) {
      const applicator = [
        // any
        not_1.default,
        anyOf_1.default,
        oneOf_1.default,
        allOf_1.default,
        if_1.default,
        thenElse_1.default,
        // object
        propertyNames_1.default,
        additionalProperties_1.default,
        dependencies_1.default,
        properties_1.default,
        patternProperties_1.default
      ];
      if (draft2020)
        applicator.push(prefixItems_1.default, items2020_1.default);
      else
        applicator.push(additionalItems_1.default, items_1.default);
      applicator.push(contains_1.default);
      return applicator;
    }
    exports.default = getApplicator;
  }
});

// node_modules/ajv/dist/vocabularies/format/format.js
var require_format = __commonJS({
  "node_modules/ajv/dist/vocabularies/format/format.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var error = {
      message: ({ schemaCode }) => (0, codegen_1.str)`must match format "${schemaCode}"`,
      params: ({ schemaCode }) => (0, codegen_1._)`{format: ${schemaCode}}`
    };
    var def = {
      keyword: "format",
      type: ["number", "string"],
      schemaType: "string",
      $data: true,
      error,
      code(cxt, ruleType) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        const { opts, errSchemaPath, schemaEnv, self } = it;
        if (!opts.validateFormats)
          return;
        if ($data)
          validate$DataFormat();
        else
          validateFormat();
        function validate$DataFormat() {
          const fmts = gen.scopeValue("formats", {
            ref: self.formats,
            code: opts.code.formats
          });
          const fDef = gen.const("fDef", (0, codegen_1._)`${fmts}[${schemaCode}]`);
          const fType = gen.let("fType");
          const format = gen.let("format");
          gen.if((0, codegen_1._)`typeof ${fDef} == "object" && !(${fDef} instanceof RegExp)`, () => gen.assign(fType, (0, codegen_1._)`${fDef}.type || "string"`).assign(format, (0, codegen_1._)`${fDef}.validate`), () => gen.assign(fType, (0, codegen_1._)`"string"`).assign(format, fDef));
          cxt.fail$data((0, codegen_1.or)(unknownFmt(), invalidFmt()));
          function unknownFmt() {
            if (opts.strictSchema === false)
              return codegen_1.nil;
            return (0, codegen_1._)`${schemaCode} && !${format}`;
          }
          function invalidFmt() {
            const callFormat = schemaEnv.$async ? (0, codegen_1._)`(${fDef}.async ? await ${format}(${data}) : ${format}(${data}))` : (0, codegen_1._)`${format}(${data})`;
            const validData = (0, codegen_1._)`(typeof ${format} == "function" ? ${callFormat} : ${format}.test(${data}))`;
            return (0, codegen_1._)`${format} && ${format} !== true && ${fType} === ${ruleType} && !${validData}`;
          }
        }
        function validateFormat() {
          const formatDef = self.formats[schema];
          if (!formatDef) {
            unknownFormat();
            return;
          }
          if (formatDef === true)
            return;
          const [fmtType, format, fmtRef] = getFormat(formatDef);
          if (fmtType === ruleType)
            cxt.pass(validCondition());
          function unknownFormat() {
            if (opts.strictSchema === false) {
              self.logger.warn(unknownMsg());
              return;
            }
            throw new Error(unknownMsg());
            function unknownMsg() {
              return `unknown format "${schema}" ignored in schema at path "${errSchemaPath}"`;
            }
          }
          function getFormat(fmtDef) {
            const code = fmtDef instanceof RegExp ? (0, codegen_1.regexpCode)(fmtDef) : opts.code.formats ? (0, codegen_1._)`${opts.code.formats}${(0, codegen_1.getProperty)(schema)}` : void 0;
            const fmt = gen.scopeValue("formats", { key: schema, ref: fmtDef, code });
            if (typeof fmtDef == "object" && !(fmtDef instanceof RegExp)) {
              return [fmtDef.type || "string", fmtDef.validate, (0, codegen_1._)`${fmt}.validate`];
            }
            return ["string", fmtDef, fmt];
          }
          function validCondition() {
            if (typeof formatDef == "object" && !(formatDef instanceof RegExp) && formatDef.async) {
              if (!schemaEnv.$async)
                throw new Error("async format in sync schema");
              return (0, codegen_1._)`await ${fmtRef}(${data})`;
            }
            return typeof format == "function" ? (0, codegen_1._)`${fmtRef}(${data})` : (0, codegen_1._)`${fmtRef}.test(${data})`;
          }
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/format/index.js
var require_format2 = __commonJS({
  "node_modules/ajv/dist/vocabularies/format/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var format_1 = require_format();
    var format = [format_1.default];
    exports.default = format;
  }
});

// node_modules/ajv/dist/vocabularies/metadata.js
var require_metadata = __commonJS({
  "node_modules/ajv/dist/vocabularies/metadata.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.contentVocabulary = exports.metadataVocabulary = void 0;
    exports.metadataVocabulary = [
      "title",
      "description",
      "default",
      "deprecated",
      "readOnly",
      "writeOnly",
      "examples"
    ];
    exports.contentVocabulary = [
      "contentMediaType",
      "contentEncoding",
      "contentSchema"
    ];
  }
});

// node_modules/ajv/dist/vocabularies/draft7.js
var require_draft7 = __commonJS({
  "node_modules/ajv/dist/vocabularies/draft7.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var core_1 = require_core2();
    var validation_1 = require_validation();
    var applicator_1 = require_applicator();
    var format_1 = require_format2();
    var metadata_1 = require_metadata();
    var draft7Vocabularies = [
      core_1.default,
      validation_1.default,
      (0, applicator_1.default)(),
      format_1.default,
      metadata_1.metadataVocabulary,
      metadata_1.contentVocabulary
    ];
    exports.default = draft7Vocabularies;
  }
});

// node_modules/ajv/dist/vocabularies/discriminator/types.js
var require_types = __commonJS({
  "node_modules/ajv/dist/vocabularies/discriminator/types.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.DiscrError = void 0;
    var DiscrError;
    (function(DiscrError2) {
      DiscrError2["Tag"] = "tag";
      DiscrError2["Mapping"] = "mapping";
    })(DiscrError || (exports.DiscrError = DiscrError = {}));
  }
});

// node_modules/ajv/dist/vocabularies/discriminator/index.js
var require_discriminator = __commonJS({
  "node_modules/ajv/dist/vocabularies/discriminator/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var types_1 = require_types();
    var compile_1 = require_compile();
    var ref_error_1 = require_ref_error();
    var util_1 = require_util();
    var error = {
      message: ({ params: { discrError, tagName } }) => discrError === types_1.DiscrError.Tag ? `tag "${tagName}" must be string` : `value of tag "${tagName}" must be in oneOf`,
      params: ({ params: { discrError, tag, tagName } }) => (0, codegen_1._)`{error: ${discrError}, tag: ${tagName}, tagValue: ${tag}}`
    };
    var def = {
      keyword: "discriminator",
      type: "object",
      schemaType: "object",
      error,
      code(cxt) {
        const { gen, data, schema, parentSchema, it } = cxt;
        const { oneOf } = parentSchema;
        if (!it.opts.discriminator) {
          throw new Error("discriminator: requires discriminator option");
        }
        const tagName = schema.propertyName;
        if (typeof tagName != "string")
          throw new Error("discriminator: requires propertyName");
        if (schema.mapping)
          throw new Error("discriminator: mapping is not supported");
        if (!oneOf)
          throw new Error("discriminator: requires oneOf keyword");
        const valid = gen.let("valid", false);
        const tag = gen.const("tag", (0, codegen_1._)`${data}${(0, codegen_1.getProperty)(tagName)}`);
        gen.if((0, codegen_1._)`typeof ${tag} == "string"`, () => validateMapping(), () => cxt.error(false, { discrError: types_1.DiscrError.Tag, tag, tagName }));
        cxt.ok(valid);
        function validateMapping() {
          const mapping = getMapping();
          gen.if(false);
          for (const tagValue in mapping) {
            gen.elseIf((0, codegen_1._)`${tag} === ${tagValue}`);
            gen.assign(valid, applyTagSchema(mapping[tagValue]));
          }
          gen.else();
          cxt.error(false, { discrError: types_1.DiscrError.Mapping, tag, tagName });
          gen.endIf();
        }
        function applyTagSchema(schemaProp) {
          const _valid = gen.name("valid");
          const schCxt = cxt.subschema({ keyword: "oneOf", schemaProp }, _valid);
          cxt.mergeEvaluated(schCxt, codegen_1.Name);
          return _valid;
        }
        function getMapping() {
          var _a;
          const oneOfMapping = {};
          const topRequired = hasRequired(parentSchema);
          let tagRequired = true;
          for (let i = 0; i < oneOf.length; i++) {
            let sch = oneOf[i];
            if ((sch === null || sch === void 0 ? void 0 : sch.$ref) && !(0, util_1.schemaHasRulesButRef)(sch, it.self.RULES)) {
              const ref = sch.$ref;
              sch = compile_1.resolveRef.call(it.self, it.schemaEnv.root, it.baseId, ref);
              if (sch instanceof compile_1.SchemaEnv)
                sch = sch.schema;
              if (sch === void 0)
                throw new ref_error_1.default(it.opts.uriResolver, it.baseId, ref);
            }
            const propSch = (_a = sch === null || sch === void 0 ? void 0 : sch.properties) === null || _a === void 0 ? void 0 : _a[tagName];
            if (typeof propSch != "object") {
              throw new Error(`discriminator: oneOf subschemas (or referenced schemas) must have "properties/${tagName}"`);
            }
            tagRequired = tagRequired && (topRequired || hasRequired(sch));
            addMappings(propSch, i);
          }
          if (!tagRequired)
            throw new Error(`discriminator: "${tagName}" must be required`);
          return oneOfMapping;
          function hasRequired({ required }) {
            return Array.isArray(required) && required.includes(tagName);
          }
          function addMappings(sch, i) {
            if (sch.const) {
              addMapping(sch.const, i);
            } else if (sch.enum) {
              for (const tagValue of sch.enum) {
                addMapping(tagValue, i);
              }
            } else {
              throw new Error(`discriminator: "properties/${tagName}" must have "const" or "enum"`);
            }
          }
          function addMapping(tagValue, i) {
            if (typeof tagValue != "string" || tagValue in oneOfMapping) {
              throw new Error(`discriminator: "${tagName}" values must be unique strings`);
            }
            oneOfMapping[tagValue] = i;
          }
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/refs/json-schema-draft-07.json
var require_json_schema_draft_07 = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-draft-07.json"(exports, module) {
    module.exports = {
      $schema: "http://json-schema.org/draft-07/schema#",
      $id: "http://json-schema.org/draft-07/schema#",
      title: "Core schema meta-schema",
      definitions: {
        schemaArray: {
          type: "array",
          minItems: 1,
          items: { $ref: "#" }
        },
        nonNegativeInteger: {
          type: "integer",
          minimum: 0
        },
        nonNegativeIntegerDefault0: {
          allOf: [{ $ref: "#/definitions/nonNegativeInteger" }, { default: 0 }]
        },
        simpleTypes: {
          enum: ["array", "boolean", "integer", "null", "number", "object", "string"]
        },
        stringArray: {
          type: "array",
          items: { type: "string" },
          uniqueItems: true,
          default: []
        }
      },
      type: ["object", "boolean"],
      properties: {
        $id: {
          type: "string",
          format: "uri-reference"
        },
        $schema: {
          type: "string",
          format: "uri"
        },
        $ref: {
          type: "string",
          format: "uri-reference"
        },
        $comment: {
          type: "string"
        },
        title: {
          type: "string"
        },
        description: {
          type: "string"
        },
        default: true,
        readOnly: {
          type: "boolean",
          default: false
        },
        examples: {
          type: "array",
          items: true
        },
        multipleOf: {
          type: "number",
          exclusiveMinimum: 0
        },
        maximum: {
          type: "number"
        },
        exclusiveMaximum: {
          type: "number"
        },
        minimum: {
          type: "number"
        },
        exclusiveMinimum: {
          type: "number"
        },
        maxLength: { $ref: "#/definitions/nonNegativeInteger" },
        minLength: { $ref: "#/definitions/nonNegativeIntegerDefault0" },
        pattern: {
          type: "string",
          format: "regex"
        },
        additionalItems: { $ref: "#" },
        items: {
          anyOf: [{ $ref: "#" }, { $ref: "#/definitions/schemaArray" }],
          default: true
        },
        maxItems: { $ref: "#/definitions/nonNegativeInteger" },
        minItems: { $ref: "#/definitions/nonNegativeIntegerDefault0" },
        uniqueItems: {
          type: "boolean",
          default: false
        },
        contains: { $ref: "#" },
        maxProperties: { $ref: "#/definitions/nonNegativeInteger" },
        minProperties: { $ref: "#/definitions/nonNegativeIntegerDefault0" },
        required: { $ref: "#/definitions/stringArray" },
        additionalProperties: { $ref: "#" },
        definitions: {
          type: "object",
          additionalProperties: { $ref: "#" },
          default: {}
        },
        properties: {
          type: "object",
          additionalProperties: { $ref: "#" },
          default: {}
        },
        patternProperties: {
          type: "object",
          additionalProperties: { $ref: "#" },
          propertyNames: { format: "regex" },
          default: {}
        },
        dependencies: {
          type: "object",
          additionalProperties: {
            anyOf: [{ $ref: "#" }, { $ref: "#/definitions/stringArray" }]
          }
        },
        propertyNames: { $ref: "#" },
        const: true,
        enum: {
          type: "array",
          items: true,
          minItems: 1,
          uniqueItems: true
        },
        type: {
          anyOf: [
            { $ref: "#/definitions/simpleTypes" },
            {
              type: "array",
              items: { $ref: "#/definitions/simpleTypes" },
              minItems: 1,
              uniqueItems: true
            }
          ]
        },
        format: { type: "string" },
        contentMediaType: { type: "string" },
        contentEncoding: { type: "string" },
        if: { $ref: "#" },
        then: { $ref: "#" },
        else: { $ref: "#" },
        allOf: { $ref: "#/definitions/schemaArray" },
        anyOf: { $ref: "#/definitions/schemaArray" },
        oneOf: { $ref: "#/definitions/schemaArray" },
        not: { $ref: "#" }
      },
      default: true
    };
  }
});

// node_modules/ajv/dist/ajv.js
var require_ajv = __commonJS({
  "node_modules/ajv/dist/ajv.js"(exports, module) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.MissingRefError = exports.ValidationError = exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = exports.Ajv = void 0;
    var core_1 = require_core();
    var draft7_1 = require_draft7();
    var discriminator_1 = require_discriminator();
    var draft7MetaSchema = require_json_schema_draft_07();
    var META_SUPPORT_DATA = ["/properties"];
    var META_SCHEMA_ID = "http://json-schema.org/draft-07/schema";
    var Ajv3 = class extends core_1.default {
      _addVocabularies() {
        super._addVocabularies();
        draft7_1.default.forEach((v) => this.addVocabulary(v));
        if (this.opts.discriminator)
          this.addKeyword(discriminator_1.default);
      }
      _addDefaultMetaSchema() {
        super._addDefaultMetaSchema();
        if (!this.opts.meta)
          return;
        const metaSchema = this.opts.$data ? this.$dataMetaSchema(draft7MetaSchema, META_SUPPORT_DATA) : draft7MetaSchema;
        this.addMetaSchema(metaSchema, META_SCHEMA_ID, false);
        this.refs["http://json-schema.org/schema"] = META_SCHEMA_ID;
      }
      defaultMeta() {
        return this.opts.defaultMeta = super.defaultMeta() || (this.getSchema(META_SCHEMA_ID) ? META_SCHEMA_ID : void 0);
      }
    };
    exports.Ajv = Ajv3;
    module.exports = exports = Ajv3;
    module.exports.Ajv = Ajv3;
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.default = Ajv3;
    var validate_1 = require_validate();
    Object.defineProperty(exports, "KeywordCxt", { enumerable: true, get: function() {
      return validate_1.KeywordCxt;
    } });
    var codegen_1 = require_codegen();
    Object.defineProperty(exports, "_", { enumerable: true, get: function() {
      return codegen_1._;
    } });
    Object.defineProperty(exports, "str", { enumerable: true, get: function() {
      return codegen_1.str;
    } });
    Object.defineProperty(exports, "stringify", { enumerable: true, get: function() {
      return codegen_1.stringify;
    } });
    Object.defineProperty(exports, "nil", { enumerable: true, get: function() {
      return codegen_1.nil;
    } });
    Object.defineProperty(exports, "Name", { enumerable: true, get: function() {
      return codegen_1.Name;
    } });
    Object.defineProperty(exports, "CodeGen", { enumerable: true, get: function() {
      return codegen_1.CodeGen;
    } });
    var validation_error_1 = require_validation_error();
    Object.defineProperty(exports, "ValidationError", { enumerable: true, get: function() {
      return validation_error_1.default;
    } });
    var ref_error_1 = require_ref_error();
    Object.defineProperty(exports, "MissingRefError", { enumerable: true, get: function() {
      return ref_error_1.default;
    } });
  }
});

// node_modules/yaml/dist/nodes/identity.js
var require_identity = __commonJS({
  "node_modules/yaml/dist/nodes/identity.js"(exports) {
    "use strict";
    var ALIAS = /* @__PURE__ */ Symbol.for("yaml.alias");
    var DOC = /* @__PURE__ */ Symbol.for("yaml.document");
    var MAP = /* @__PURE__ */ Symbol.for("yaml.map");
    var PAIR = /* @__PURE__ */ Symbol.for("yaml.pair");
    var SCALAR2 = /* @__PURE__ */ Symbol.for("yaml.scalar");
    var SEQ = /* @__PURE__ */ Symbol.for("yaml.seq");
    var NODE_TYPE = /* @__PURE__ */ Symbol.for("yaml.node.type");
    var isAlias3 = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === ALIAS;
    var isDocument = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === DOC;
    var isMap3 = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === MAP;
    var isPair2 = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === PAIR;
    var isScalar3 = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === SCALAR2;
    var isSeq2 = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === SEQ;
    function isCollection2(node) {
      if (node && typeof node === "object")
        switch (node[NODE_TYPE]) {
          case MAP:
          case SEQ:
            return true;
        }
      return false;
    }
    function isNode(node) {
      if (node && typeof node === "object")
        switch (node[NODE_TYPE]) {
          case ALIAS:
          case MAP:
          case SCALAR2:
          case SEQ:
            return true;
        }
      return false;
    }
    var hasAnchor = (node) => (isScalar3(node) || isCollection2(node)) && !!node.anchor;
    exports.ALIAS = ALIAS;
    exports.DOC = DOC;
    exports.MAP = MAP;
    exports.NODE_TYPE = NODE_TYPE;
    exports.PAIR = PAIR;
    exports.SCALAR = SCALAR2;
    exports.SEQ = SEQ;
    exports.hasAnchor = hasAnchor;
    exports.isAlias = isAlias3;
    exports.isCollection = isCollection2;
    exports.isDocument = isDocument;
    exports.isMap = isMap3;
    exports.isNode = isNode;
    exports.isPair = isPair2;
    exports.isScalar = isScalar3;
    exports.isSeq = isSeq2;
  }
});

// node_modules/yaml/dist/visit.js
var require_visit = __commonJS({
  "node_modules/yaml/dist/visit.js"(exports) {
    "use strict";
    var identity = require_identity();
    var BREAK = /* @__PURE__ */ Symbol("break visit");
    var SKIP = /* @__PURE__ */ Symbol("skip children");
    var REMOVE = /* @__PURE__ */ Symbol("remove node");
    function visit2(node, visitor) {
      const visitor_ = initVisitor(visitor);
      if (identity.isDocument(node)) {
        const cd = visit_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
          node.contents = null;
      } else
        visit_(null, node, visitor_, Object.freeze([]));
    }
    visit2.BREAK = BREAK;
    visit2.SKIP = SKIP;
    visit2.REMOVE = REMOVE;
    function visit_(key, node, visitor, path) {
      const ctrl = callVisitor(key, node, visitor, path);
      if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visit_(key, ctrl, visitor, path);
      }
      if (typeof ctrl !== "symbol") {
        if (identity.isCollection(node)) {
          path = Object.freeze(path.concat(node));
          for (let i = 0; i < node.items.length; ++i) {
            const ci = visit_(i, node.items[i], visitor, path);
            if (typeof ci === "number")
              i = ci - 1;
            else if (ci === BREAK)
              return BREAK;
            else if (ci === REMOVE) {
              node.items.splice(i, 1);
              i -= 1;
            }
          }
        } else if (identity.isPair(node)) {
          path = Object.freeze(path.concat(node));
          const ck = visit_("key", node.key, visitor, path);
          if (ck === BREAK)
            return BREAK;
          else if (ck === REMOVE)
            node.key = null;
          const cv = visit_("value", node.value, visitor, path);
          if (cv === BREAK)
            return BREAK;
          else if (cv === REMOVE)
            node.value = null;
        }
      }
      return ctrl;
    }
    async function visitAsync(node, visitor) {
      const visitor_ = initVisitor(visitor);
      if (identity.isDocument(node)) {
        const cd = await visitAsync_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
          node.contents = null;
      } else
        await visitAsync_(null, node, visitor_, Object.freeze([]));
    }
    visitAsync.BREAK = BREAK;
    visitAsync.SKIP = SKIP;
    visitAsync.REMOVE = REMOVE;
    async function visitAsync_(key, node, visitor, path) {
      const ctrl = await callVisitor(key, node, visitor, path);
      if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visitAsync_(key, ctrl, visitor, path);
      }
      if (typeof ctrl !== "symbol") {
        if (identity.isCollection(node)) {
          path = Object.freeze(path.concat(node));
          for (let i = 0; i < node.items.length; ++i) {
            const ci = await visitAsync_(i, node.items[i], visitor, path);
            if (typeof ci === "number")
              i = ci - 1;
            else if (ci === BREAK)
              return BREAK;
            else if (ci === REMOVE) {
              node.items.splice(i, 1);
              i -= 1;
            }
          }
        } else if (identity.isPair(node)) {
          path = Object.freeze(path.concat(node));
          const ck = await visitAsync_("key", node.key, visitor, path);
          if (ck === BREAK)
            return BREAK;
          else if (ck === REMOVE)
            node.key = null;
          const cv = await visitAsync_("value", node.value, visitor, path);
          if (cv === BREAK)
            return BREAK;
          else if (cv === REMOVE)
            node.value = null;
        }
      }
      return ctrl;
    }
    function initVisitor(visitor) {
      if (typeof visitor === "object" && (visitor.Collection || visitor.Node || visitor.Value)) {
        return Object.assign({
          Alias: visitor.Node,
          Map: visitor.Node,
          Scalar: visitor.Node,
          Seq: visitor.Node
        }, visitor.Value && {
          Map: visitor.Value,
          Scalar: visitor.Value,
          Seq: visitor.Value
        }, visitor.Collection && {
          Map: visitor.Collection,
          Seq: visitor.Collection
        }, visitor);
      }
      return visitor;
    }
    function callVisitor(key, node, visitor, path) {
      if (typeof visitor === "function")
        return visitor(key, node, path);
      if (identity.isMap(node))
        return visitor.Map?.(key, node, path);
      if (identity.isSeq(node))
        return visitor.Seq?.(key, node, path);
      if (identity.isPair(node))
        return visitor.Pair?.(key, node, path);
      if (identity.isScalar(node))
        return visitor.Scalar?.(key, node, path);
      if (identity.isAlias(node))
        return visitor.Alias?.(key, node, path);
      return void 0;
    }
    function replaceNode(key, path, node) {
      const parent = path[path.length - 1];
      if (identity.isCollection(parent)) {
        parent.items[key] = node;
      } else if (identity.isPair(parent)) {
        if (key === "key")
          parent.key = node;
        else
          parent.value = node;
      } else if (identity.isDocument(parent)) {
        parent.contents = node;
      } else {
        const pt = identity.isAlias(parent) ? "alias" : "scalar";
        throw new Error(`Cannot replace node with ${pt} parent`);
      }
    }
    exports.visit = visit2;
    exports.visitAsync = visitAsync;
  }
});

// node_modules/yaml/dist/doc/directives.js
var require_directives = __commonJS({
  "node_modules/yaml/dist/doc/directives.js"(exports) {
    "use strict";
    var identity = require_identity();
    var visit2 = require_visit();
    var escapeChars = {
      "!": "%21",
      ",": "%2C",
      "[": "%5B",
      "]": "%5D",
      "{": "%7B",
      "}": "%7D"
    };
    var escapeTagName = (tn) => tn.replace(/[!,[\]{}]/g, (ch) => escapeChars[ch]);
    var Directives = class _Directives {
      constructor(yaml, tags) {
        this.docStart = null;
        this.docEnd = false;
        this.yaml = Object.assign({}, _Directives.defaultYaml, yaml);
        this.tags = Object.assign({}, _Directives.defaultTags, tags);
      }
      clone() {
        const copy = new _Directives(this.yaml, this.tags);
        copy.docStart = this.docStart;
        return copy;
      }
      /**
       * During parsing, get a Directives instance for the current document and
       * update the stream state according to the current version's spec.
       */
      atDocument() {
        const res = new _Directives(this.yaml, this.tags);
        switch (this.yaml.version) {
          case "1.1":
            this.atNextDocument = true;
            break;
          case "1.2":
            this.atNextDocument = false;
            this.yaml = {
              explicit: _Directives.defaultYaml.explicit,
              version: "1.2"
            };
            this.tags = Object.assign({}, _Directives.defaultTags);
            break;
        }
        return res;
      }
      /**
       * @param onError - May be called even if the action was successful
       * @returns `true` on success
       */
      add(line, onError) {
        if (this.atNextDocument) {
          this.yaml = { explicit: _Directives.defaultYaml.explicit, version: "1.1" };
          this.tags = Object.assign({}, _Directives.defaultTags);
          this.atNextDocument = false;
        }
        const parts = line.trim().split(/[ \t]+/);
        const name = parts.shift();
        switch (name) {
          case "%TAG": {
            if (parts.length !== 2) {
              onError(0, "%TAG directive should contain exactly two parts");
              if (parts.length < 2)
                return false;
            }
            const [handle, prefix] = parts;
            this.tags[handle] = prefix;
            return true;
          }
          case "%YAML": {
            this.yaml.explicit = true;
            if (parts.length !== 1) {
              onError(0, "%YAML directive should contain exactly one part");
              return false;
            }
            const [version] = parts;
            if (version === "1.1" || version === "1.2") {
              this.yaml.version = version;
              return true;
            } else {
              const isValid = /^\d+\.\d+$/.test(version);
              onError(6, `Unsupported YAML version ${version}`, isValid);
              return false;
            }
          }
          default:
            onError(0, `Unknown directive ${name}`, true);
            return false;
        }
      }
      /**
       * Resolves a tag, matching handles to those defined in %TAG directives.
       *
       * @returns Resolved tag, which may also be the non-specific tag `'!'` or a
       *   `'!local'` tag, or `null` if unresolvable.
       */
      tagName(source, onError) {
        if (source === "!")
          return "!";
        if (source[0] !== "!") {
          onError(`Not a valid tag: ${source}`);
          return null;
        }
        if (source[1] === "<") {
          const verbatim = source.slice(2, -1);
          if (verbatim === "!" || verbatim === "!!") {
            onError(`Verbatim tags aren't resolved, so ${source} is invalid.`);
            return null;
          }
          if (source[source.length - 1] !== ">")
            onError("Verbatim tags must end with a >");
          return verbatim;
        }
        const [, handle, suffix] = source.match(/^(.*!)([^!]*)$/s);
        if (!suffix)
          onError(`The ${source} tag has no suffix`);
        const prefix = this.tags[handle];
        if (prefix) {
          try {
            return prefix + decodeURIComponent(suffix);
          } catch (error) {
            onError(String(error));
            return null;
          }
        }
        if (handle === "!")
          return source;
        onError(`Could not resolve tag: ${source}`);
        return null;
      }
      /**
       * Given a fully resolved tag, returns its printable string form,
       * taking into account current tag prefixes and defaults.
       */
      tagString(tag) {
        for (const [handle, prefix] of Object.entries(this.tags)) {
          if (tag.startsWith(prefix))
            return handle + escapeTagName(tag.substring(prefix.length));
        }
        return tag[0] === "!" ? tag : `!<${tag}>`;
      }
      toString(doc) {
        const lines = this.yaml.explicit ? [`%YAML ${this.yaml.version || "1.2"}`] : [];
        const tagEntries = Object.entries(this.tags);
        let tagNames;
        if (doc && tagEntries.length > 0 && identity.isNode(doc.contents)) {
          const tags = {};
          visit2.visit(doc.contents, (_key, node) => {
            if (identity.isNode(node) && node.tag)
              tags[node.tag] = true;
          });
          tagNames = Object.keys(tags);
        } else
          tagNames = [];
        for (const [handle, prefix] of tagEntries) {
          if (handle === "!!" && prefix === "tag:yaml.org,2002:")
            continue;
          if (!doc || tagNames.some((tn) => tn.startsWith(prefix)))
            lines.push(`%TAG ${handle} ${prefix}`);
        }
        return lines.join("\n");
      }
    };
    Directives.defaultYaml = { explicit: false, version: "1.2" };
    Directives.defaultTags = { "!!": "tag:yaml.org,2002:" };
    exports.Directives = Directives;
  }
});

// node_modules/yaml/dist/doc/anchors.js
var require_anchors = __commonJS({
  "node_modules/yaml/dist/doc/anchors.js"(exports) {
    "use strict";
    var identity = require_identity();
    var visit2 = require_visit();
    function anchorIsValid(anchor) {
      if (/[\x00-\x19\s,[\]{}]/.test(anchor)) {
        const sa = JSON.stringify(anchor);
        const msg = `Anchor must not contain whitespace or control characters: ${sa}`;
        throw new Error(msg);
      }
      return true;
    }
    function anchorNames(root) {
      const anchors = /* @__PURE__ */ new Set();
      visit2.visit(root, {
        Value(_key, node) {
          if (node.anchor)
            anchors.add(node.anchor);
        }
      });
      return anchors;
    }
    function findNewAnchor(prefix, exclude) {
      for (let i = 1; true; ++i) {
        const name = `${prefix}${i}`;
        if (!exclude.has(name))
          return name;
      }
    }
    function createNodeAnchors(doc, prefix) {
      const aliasObjects = [];
      const sourceObjects = /* @__PURE__ */ new Map();
      let prevAnchors = null;
      return {
        onAnchor: (source) => {
          aliasObjects.push(source);
          prevAnchors ?? (prevAnchors = anchorNames(doc));
          const anchor = findNewAnchor(prefix, prevAnchors);
          prevAnchors.add(anchor);
          return anchor;
        },
        /**
         * With circular references, the source node is only resolved after all
         * of its child nodes are. This is why anchors are set only after all of
         * the nodes have been created.
         */
        setAnchors: () => {
          for (const source of aliasObjects) {
            const ref = sourceObjects.get(source);
            if (typeof ref === "object" && ref.anchor && (identity.isScalar(ref.node) || identity.isCollection(ref.node))) {
              ref.node.anchor = ref.anchor;
            } else {
              const error = new Error("Failed to resolve repeated object (this should not happen)");
              error.source = source;
              throw error;
            }
          }
        },
        sourceObjects
      };
    }
    exports.anchorIsValid = anchorIsValid;
    exports.anchorNames = anchorNames;
    exports.createNodeAnchors = createNodeAnchors;
    exports.findNewAnchor = findNewAnchor;
  }
});

// node_modules/yaml/dist/doc/applyReviver.js
var require_applyReviver = __commonJS({
  "node_modules/yaml/dist/doc/applyReviver.js"(exports) {
    "use strict";
    function applyReviver(reviver, obj, key, val) {
      if (val && typeof val === "object") {
        if (Array.isArray(val)) {
          for (let i = 0, len = val.length; i < len; ++i) {
            const v0 = val[i];
            const v1 = applyReviver(reviver, val, String(i), v0);
            if (v1 === void 0)
              delete val[i];
            else if (v1 !== v0)
              val[i] = v1;
          }
        } else if (val instanceof Map) {
          for (const k of Array.from(val.keys())) {
            const v0 = val.get(k);
            const v1 = applyReviver(reviver, val, k, v0);
            if (v1 === void 0)
              val.delete(k);
            else if (v1 !== v0)
              val.set(k, v1);
          }
        } else if (val instanceof Set) {
          for (const v0 of Array.from(val)) {
            const v1 = applyReviver(reviver, val, v0, v0);
            if (v1 === void 0)
              val.delete(v0);
            else if (v1 !== v0) {
              val.delete(v0);
              val.add(v1);
            }
          }
        } else {
          for (const [k, v0] of Object.entries(val)) {
            const v1 = applyReviver(reviver, val, k, v0);
            if (v1 === void 0)
              delete val[k];
            else if (v1 !== v0)
              val[k] = v1;
          }
        }
      }
      return reviver.call(obj, key, val);
    }
    exports.applyReviver = applyReviver;
  }
});

// node_modules/yaml/dist/nodes/toJS.js
var require_toJS = __commonJS({
  "node_modules/yaml/dist/nodes/toJS.js"(exports) {
    "use strict";
    var identity = require_identity();
    function toJS(value, arg, ctx) {
      if (Array.isArray(value))
        return value.map((v, i) => toJS(v, String(i), ctx));
      if (value && typeof value.toJSON === "function") {
        if (!ctx || !identity.hasAnchor(value))
          return value.toJSON(arg, ctx);
        const data = { aliasCount: 0, count: 1, res: void 0 };
        ctx.anchors.set(value, data);
        ctx.onCreate = (res2) => {
          data.res = res2;
          delete ctx.onCreate;
        };
        const res = value.toJSON(arg, ctx);
        if (ctx.onCreate)
          ctx.onCreate(res);
        return res;
      }
      if (typeof value === "bigint" && !ctx?.keep)
        return Number(value);
      return value;
    }
    exports.toJS = toJS;
  }
});

// node_modules/yaml/dist/nodes/Node.js
var require_Node = __commonJS({
  "node_modules/yaml/dist/nodes/Node.js"(exports) {
    "use strict";
    var applyReviver = require_applyReviver();
    var identity = require_identity();
    var toJS = require_toJS();
    var NodeBase = class {
      constructor(type) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: type });
      }
      /** Create a copy of this node.  */
      clone() {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (this.range)
          copy.range = this.range.slice();
        return copy;
      }
      /** A plain JavaScript representation of this node. */
      toJS(doc, { mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        if (!identity.isDocument(doc))
          throw new TypeError("A document argument is required");
        const ctx = {
          anchors: /* @__PURE__ */ new Map(),
          doc,
          keep: true,
          mapAsMap: mapAsMap === true,
          mapKeyWarned: false,
          maxAliasCount: typeof maxAliasCount === "number" ? maxAliasCount : 100
        };
        const res = toJS.toJS(this, "", ctx);
        if (typeof onAnchor === "function")
          for (const { count, res: res2 } of ctx.anchors.values())
            onAnchor(res2, count);
        return typeof reviver === "function" ? applyReviver.applyReviver(reviver, { "": res }, "", res) : res;
      }
    };
    exports.NodeBase = NodeBase;
  }
});

// node_modules/yaml/dist/nodes/Alias.js
var require_Alias = __commonJS({
  "node_modules/yaml/dist/nodes/Alias.js"(exports) {
    "use strict";
    var anchors = require_anchors();
    var visit2 = require_visit();
    var identity = require_identity();
    var Node = require_Node();
    var toJS = require_toJS();
    var Alias = class extends Node.NodeBase {
      constructor(source) {
        super(identity.ALIAS);
        this.source = source;
        Object.defineProperty(this, "tag", {
          set() {
            throw new Error("Alias nodes cannot have tags");
          }
        });
      }
      /**
       * Resolve the value of this alias within `doc`, finding the last
       * instance of the `source` anchor before this node.
       */
      resolve(doc, ctx) {
        if (ctx?.maxAliasCount === 0)
          throw new ReferenceError("Alias resolution is disabled");
        let nodes;
        if (ctx?.aliasResolveCache) {
          nodes = ctx.aliasResolveCache;
        } else {
          nodes = [];
          visit2.visit(doc, {
            Node: (_key, node) => {
              if (identity.isAlias(node) || identity.hasAnchor(node))
                nodes.push(node);
            }
          });
          if (ctx)
            ctx.aliasResolveCache = nodes;
        }
        let found = void 0;
        for (const node of nodes) {
          if (node === this)
            break;
          if (node.anchor === this.source)
            found = node;
        }
        if (found && ctx) {
          const { anchors: anchors2, doc: doc2, maxAliasCount } = ctx;
          let data = anchors2.get(found);
          if (!data) {
            toJS.toJS(found, null, ctx);
            data = anchors2.get(found);
          }
          if (data?.res === void 0) {
            const msg = "This should not happen: Alias anchor was not resolved?";
            throw new ReferenceError(msg);
          }
          if (maxAliasCount >= 0) {
            data.count += 1;
            if (data.aliasCount === 0)
              data.aliasCount = getAliasCount(doc2, found, anchors2);
            if (data.count * data.aliasCount > maxAliasCount) {
              const msg = "Excessive alias count indicates a resource exhaustion attack";
              throw new ReferenceError(msg);
            }
          }
        }
        return found;
      }
      toJSON(_arg, ctx) {
        if (!ctx)
          return { source: this.source };
        const source = this.resolve(ctx.doc, ctx);
        if (!source) {
          const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
          throw new ReferenceError(msg);
        }
        return ctx.anchors.get(source).res;
      }
      toString(ctx, _onComment, _onChompKeep) {
        const src = `*${this.source}`;
        if (ctx) {
          anchors.anchorIsValid(this.source);
          if (ctx.options.verifyAliasOrder && !ctx.anchors.has(this.source)) {
            const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
            throw new Error(msg);
          }
          if (ctx.implicitKey)
            return `${src} `;
        }
        return src;
      }
    };
    function getAliasCount(doc, node, anchors2) {
      if (identity.isAlias(node)) {
        const source = node.resolve(doc);
        const anchor = anchors2 && source && anchors2.get(source);
        return anchor ? anchor.count * anchor.aliasCount : 0;
      } else if (identity.isCollection(node)) {
        let count = 0;
        for (const item of node.items) {
          const c = getAliasCount(doc, item, anchors2);
          if (c > count)
            count = c;
        }
        return count;
      } else if (identity.isPair(node)) {
        const kc = getAliasCount(doc, node.key, anchors2);
        const vc = getAliasCount(doc, node.value, anchors2);
        return Math.max(kc, vc);
      }
      return 1;
    }
    exports.Alias = Alias;
  }
});

// node_modules/yaml/dist/nodes/Scalar.js
var require_Scalar = __commonJS({
  "node_modules/yaml/dist/nodes/Scalar.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Node = require_Node();
    var toJS = require_toJS();
    var isScalarValue = (value) => !value || typeof value !== "function" && typeof value !== "object";
    var Scalar = class extends Node.NodeBase {
      constructor(value) {
        super(identity.SCALAR);
        this.value = value;
      }
      toJSON(arg, ctx) {
        return ctx?.keep ? this.value : toJS.toJS(this.value, arg, ctx);
      }
      toString() {
        return String(this.value);
      }
    };
    Scalar.BLOCK_FOLDED = "BLOCK_FOLDED";
    Scalar.BLOCK_LITERAL = "BLOCK_LITERAL";
    Scalar.PLAIN = "PLAIN";
    Scalar.QUOTE_DOUBLE = "QUOTE_DOUBLE";
    Scalar.QUOTE_SINGLE = "QUOTE_SINGLE";
    exports.Scalar = Scalar;
    exports.isScalarValue = isScalarValue;
  }
});

// node_modules/yaml/dist/doc/createNode.js
var require_createNode = __commonJS({
  "node_modules/yaml/dist/doc/createNode.js"(exports) {
    "use strict";
    var Alias = require_Alias();
    var identity = require_identity();
    var Scalar = require_Scalar();
    var defaultTagPrefix = "tag:yaml.org,2002:";
    function findTagObject(value, tagName, tags) {
      if (tagName) {
        const match = tags.filter((t) => t.tag === tagName);
        const tagObj = match.find((t) => !t.format) ?? match[0];
        if (!tagObj)
          throw new Error(`Tag ${tagName} not found`);
        return tagObj;
      }
      return tags.find((t) => t.identify?.(value) && !t.format);
    }
    function createNode(value, tagName, ctx) {
      if (identity.isDocument(value))
        value = value.contents;
      if (identity.isNode(value))
        return value;
      if (identity.isPair(value)) {
        const map = ctx.schema[identity.MAP].createNode?.(ctx.schema, null, ctx);
        map.items.push(value);
        return map;
      }
      if (value instanceof String || value instanceof Number || value instanceof Boolean || typeof BigInt !== "undefined" && value instanceof BigInt) {
        value = value.valueOf();
      }
      const { aliasDuplicateObjects, onAnchor, onTagObj, schema, sourceObjects } = ctx;
      let ref = void 0;
      if (aliasDuplicateObjects && value && typeof value === "object") {
        ref = sourceObjects.get(value);
        if (ref) {
          ref.anchor ?? (ref.anchor = onAnchor(value));
          return new Alias.Alias(ref.anchor);
        } else {
          ref = { anchor: null, node: null };
          sourceObjects.set(value, ref);
        }
      }
      if (tagName?.startsWith("!!"))
        tagName = defaultTagPrefix + tagName.slice(2);
      let tagObj = findTagObject(value, tagName, schema.tags);
      if (!tagObj) {
        if (value && typeof value.toJSON === "function") {
          value = value.toJSON();
        }
        if (!value || typeof value !== "object") {
          const node2 = new Scalar.Scalar(value);
          if (ref)
            ref.node = node2;
          return node2;
        }
        tagObj = value instanceof Map ? schema[identity.MAP] : Symbol.iterator in Object(value) ? schema[identity.SEQ] : schema[identity.MAP];
      }
      if (onTagObj) {
        onTagObj(tagObj);
        delete ctx.onTagObj;
      }
      const node = tagObj?.createNode ? tagObj.createNode(ctx.schema, value, ctx) : typeof tagObj?.nodeClass?.from === "function" ? tagObj.nodeClass.from(ctx.schema, value, ctx) : new Scalar.Scalar(value);
      if (tagName)
        node.tag = tagName;
      else if (!tagObj.default)
        node.tag = tagObj.tag;
      if (ref)
        ref.node = node;
      return node;
    }
    exports.createNode = createNode;
  }
});

// node_modules/yaml/dist/nodes/Collection.js
var require_Collection = __commonJS({
  "node_modules/yaml/dist/nodes/Collection.js"(exports) {
    "use strict";
    var createNode = require_createNode();
    var identity = require_identity();
    var Node = require_Node();
    function collectionFromPath(schema, path, value) {
      let v = value;
      for (let i = path.length - 1; i >= 0; --i) {
        const k = path[i];
        if (typeof k === "number" && Number.isInteger(k) && k >= 0) {
          const a = [];
          a[k] = v;
          v = a;
        } else {
          v = /* @__PURE__ */ new Map([[k, v]]);
        }
      }
      return createNode.createNode(v, void 0, {
        aliasDuplicateObjects: false,
        keepUndefined: false,
        onAnchor: () => {
          throw new Error("This should not happen, please report a bug.");
        },
        schema,
        sourceObjects: /* @__PURE__ */ new Map()
      });
    }
    var isEmptyPath = (path) => path == null || typeof path === "object" && !!path[Symbol.iterator]().next().done;
    var Collection = class extends Node.NodeBase {
      constructor(type, schema) {
        super(type);
        Object.defineProperty(this, "schema", {
          value: schema,
          configurable: true,
          enumerable: false,
          writable: true
        });
      }
      /**
       * Create a copy of this collection.
       *
       * @param schema - If defined, overwrites the original's schema
       */
      clone(schema) {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (schema)
          copy.schema = schema;
        copy.items = copy.items.map((it) => identity.isNode(it) || identity.isPair(it) ? it.clone(schema) : it);
        if (this.range)
          copy.range = this.range.slice();
        return copy;
      }
      /**
       * Adds a value to the collection. For `!!map` and `!!omap` the value must
       * be a Pair instance or a `{ key, value }` object, which may not have a key
       * that already exists in the map.
       */
      addIn(path, value) {
        if (isEmptyPath(path))
          this.add(value);
        else {
          const [key, ...rest] = path;
          const node = this.get(key, true);
          if (identity.isCollection(node))
            node.addIn(rest, value);
          else if (node === void 0 && this.schema)
            this.set(key, collectionFromPath(this.schema, rest, value));
          else
            throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
      }
      /**
       * Removes a value from the collection.
       * @returns `true` if the item was found and removed.
       */
      deleteIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
          return this.delete(key);
        const node = this.get(key, true);
        if (identity.isCollection(node))
          return node.deleteIn(rest);
        else
          throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
      }
      /**
       * Returns item at `key`, or `undefined` if not found. By default unwraps
       * scalar values from their surrounding node; to disable set `keepScalar` to
       * `true` (collections are always returned intact).
       */
      getIn(path, keepScalar) {
        const [key, ...rest] = path;
        const node = this.get(key, true);
        if (rest.length === 0)
          return !keepScalar && identity.isScalar(node) ? node.value : node;
        else
          return identity.isCollection(node) ? node.getIn(rest, keepScalar) : void 0;
      }
      hasAllNullValues(allowScalar) {
        return this.items.every((node) => {
          if (!identity.isPair(node))
            return false;
          const n = node.value;
          return n == null || allowScalar && identity.isScalar(n) && n.value == null && !n.commentBefore && !n.comment && !n.tag;
        });
      }
      /**
       * Checks if the collection includes a value with the key `key`.
       */
      hasIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
          return this.has(key);
        const node = this.get(key, true);
        return identity.isCollection(node) ? node.hasIn(rest) : false;
      }
      /**
       * Sets a value in this collection. For `!!set`, `value` needs to be a
       * boolean to add/remove the item from the set.
       */
      setIn(path, value) {
        const [key, ...rest] = path;
        if (rest.length === 0) {
          this.set(key, value);
        } else {
          const node = this.get(key, true);
          if (identity.isCollection(node))
            node.setIn(rest, value);
          else if (node === void 0 && this.schema)
            this.set(key, collectionFromPath(this.schema, rest, value));
          else
            throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
      }
    };
    exports.Collection = Collection;
    exports.collectionFromPath = collectionFromPath;
    exports.isEmptyPath = isEmptyPath;
  }
});

// node_modules/yaml/dist/stringify/stringifyComment.js
var require_stringifyComment = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyComment.js"(exports) {
    "use strict";
    var stringifyComment = (str) => str.replace(/^(?!$)(?: $)?/gm, "#");
    function indentComment(comment, indent) {
      if (/^\n+$/.test(comment))
        return comment.substring(1);
      return indent ? comment.replace(/^(?! *$)/gm, indent) : comment;
    }
    var lineComment = (str, indent, comment) => str.endsWith("\n") ? indentComment(comment, indent) : comment.includes("\n") ? "\n" + indentComment(comment, indent) : (str.endsWith(" ") ? "" : " ") + comment;
    exports.indentComment = indentComment;
    exports.lineComment = lineComment;
    exports.stringifyComment = stringifyComment;
  }
});

// node_modules/yaml/dist/stringify/foldFlowLines.js
var require_foldFlowLines = __commonJS({
  "node_modules/yaml/dist/stringify/foldFlowLines.js"(exports) {
    "use strict";
    var FOLD_FLOW = "flow";
    var FOLD_BLOCK = "block";
    var FOLD_QUOTED = "quoted";
    function foldFlowLines(text2, indent, mode = "flow", { indentAtStart, lineWidth = 80, minContentWidth = 20, onFold, onOverflow } = {}) {
      if (!lineWidth || lineWidth < 0)
        return text2;
      if (lineWidth < minContentWidth)
        minContentWidth = 0;
      const endStep = Math.max(1 + minContentWidth, 1 + lineWidth - indent.length);
      if (text2.length <= endStep)
        return text2;
      const folds = [];
      const escapedFolds = {};
      let end = lineWidth - indent.length;
      if (typeof indentAtStart === "number") {
        if (indentAtStart > lineWidth - Math.max(2, minContentWidth))
          folds.push(0);
        else
          end = lineWidth - indentAtStart;
      }
      let split = void 0;
      let prev = void 0;
      let overflow = false;
      let i = -1;
      let escStart = -1;
      let escEnd = -1;
      if (mode === FOLD_BLOCK) {
        i = consumeMoreIndentedLines(text2, i, indent.length);
        if (i !== -1)
          end = i + endStep;
      }
      for (let ch; ch = text2[i += 1]; ) {
        if (mode === FOLD_QUOTED && ch === "\\") {
          escStart = i;
          switch (text2[i + 1]) {
            case "x":
              i += 3;
              break;
            case "u":
              i += 5;
              break;
            case "U":
              i += 9;
              break;
            default:
              i += 1;
          }
          escEnd = i;
        }
        if (ch === "\n") {
          if (mode === FOLD_BLOCK)
            i = consumeMoreIndentedLines(text2, i, indent.length);
          end = i + indent.length + endStep;
          split = void 0;
        } else {
          if (ch === " " && prev && prev !== " " && prev !== "\n" && prev !== "	") {
            const next = text2[i + 1];
            if (next && next !== " " && next !== "\n" && next !== "	")
              split = i;
          }
          if (i >= end) {
            if (split) {
              folds.push(split);
              end = split + endStep;
              split = void 0;
            } else if (mode === FOLD_QUOTED) {
              while (prev === " " || prev === "	") {
                prev = ch;
                ch = text2[i += 1];
                overflow = true;
              }
              const j = i > escEnd + 1 ? i - 2 : escStart - 1;
              if (escapedFolds[j])
                return text2;
              folds.push(j);
              escapedFolds[j] = true;
              end = j + endStep;
              split = void 0;
            } else {
              overflow = true;
            }
          }
        }
        prev = ch;
      }
      if (overflow && onOverflow)
        onOverflow();
      if (folds.length === 0)
        return text2;
      if (onFold)
        onFold();
      let res = text2.slice(0, folds[0]);
      for (let i2 = 0; i2 < folds.length; ++i2) {
        const fold = folds[i2];
        const end2 = folds[i2 + 1] || text2.length;
        if (fold === 0)
          res = `
${indent}${text2.slice(0, end2)}`;
        else {
          if (mode === FOLD_QUOTED && escapedFolds[fold])
            res += `${text2[fold]}\\`;
          res += `
${indent}${text2.slice(fold + 1, end2)}`;
        }
      }
      return res;
    }
    function consumeMoreIndentedLines(text2, i, indent) {
      let end = i;
      let start = i + 1;
      let ch = text2[start];
      while (ch === " " || ch === "	") {
        if (i < start + indent) {
          ch = text2[++i];
        } else {
          do {
            ch = text2[++i];
          } while (ch && ch !== "\n");
          end = i;
          start = i + 1;
          ch = text2[start];
        }
      }
      return end;
    }
    exports.FOLD_BLOCK = FOLD_BLOCK;
    exports.FOLD_FLOW = FOLD_FLOW;
    exports.FOLD_QUOTED = FOLD_QUOTED;
    exports.foldFlowLines = foldFlowLines;
  }
});

// node_modules/yaml/dist/stringify/stringifyString.js
var require_stringifyString = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyString.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var foldFlowLines = require_foldFlowLines();
    var getFoldOptions = (ctx, isBlock) => ({
      indentAtStart: isBlock ? ctx.indent.length : ctx.indentAtStart,
      lineWidth: ctx.options.lineWidth,
      minContentWidth: ctx.options.minContentWidth
    });
    var containsDocumentMarker = (str) => /^(%|---|\.\.\.)/m.test(str);
    function lineLengthOverLimit(str, lineWidth, indentLength) {
      if (!lineWidth || lineWidth < 0)
        return false;
      const limit = lineWidth - indentLength;
      const strLen = str.length;
      if (strLen <= limit)
        return false;
      for (let i = 0, start = 0; i < strLen; ++i) {
        if (str[i] === "\n") {
          if (i - start > limit)
            return true;
          start = i + 1;
          if (strLen - start <= limit)
            return false;
        }
      }
      return true;
    }
    function doubleQuotedString(value, ctx) {
      const json = JSON.stringify(value);
      if (ctx.options.doubleQuotedAsJSON)
        return json;
      const { implicitKey } = ctx;
      const minMultiLineLength = ctx.options.doubleQuotedMinMultiLineLength;
      const indent = ctx.indent || (containsDocumentMarker(value) ? "  " : "");
      let str = "";
      let start = 0;
      for (let i = 0, ch = json[i]; ch; ch = json[++i]) {
        if (ch === " " && json[i + 1] === "\\" && json[i + 2] === "n") {
          str += json.slice(start, i) + "\\ ";
          i += 1;
          start = i;
          ch = "\\";
        }
        if (ch === "\\")
          switch (json[i + 1]) {
            case "u":
              {
                str += json.slice(start, i);
                const code = json.substr(i + 2, 4);
                switch (code) {
                  case "0000":
                    str += "\\0";
                    break;
                  case "0007":
                    str += "\\a";
                    break;
                  case "000b":
                    str += "\\v";
                    break;
                  case "001b":
                    str += "\\e";
                    break;
                  case "0085":
                    str += "\\N";
                    break;
                  case "00a0":
                    str += "\\_";
                    break;
                  case "2028":
                    str += "\\L";
                    break;
                  case "2029":
                    str += "\\P";
                    break;
                  default:
                    if (code.substr(0, 2) === "00")
                      str += "\\x" + code.substr(2);
                    else
                      str += json.substr(i, 6);
                }
                i += 5;
                start = i + 1;
              }
              break;
            case "n":
              if (implicitKey || json[i + 2] === '"' || json.length < minMultiLineLength) {
                i += 1;
              } else {
                str += json.slice(start, i) + "\n\n";
                while (json[i + 2] === "\\" && json[i + 3] === "n" && json[i + 4] !== '"') {
                  str += "\n";
                  i += 2;
                }
                str += indent;
                if (json[i + 2] === " ")
                  str += "\\";
                i += 1;
                start = i + 1;
              }
              break;
            default:
              i += 1;
          }
      }
      str = start ? str + json.slice(start) : json;
      return implicitKey ? str : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_QUOTED, getFoldOptions(ctx, false));
    }
    function singleQuotedString(value, ctx) {
      if (ctx.options.singleQuote === false || ctx.implicitKey && value.includes("\n") || /[ \t]\n|\n[ \t]/.test(value))
        return doubleQuotedString(value, ctx);
      const indent = ctx.indent || (containsDocumentMarker(value) ? "  " : "");
      const res = "'" + value.replace(/'/g, "''").replace(/\n+/g, `$&
${indent}`) + "'";
      return ctx.implicitKey ? res : foldFlowLines.foldFlowLines(res, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
    }
    function quotedString(value, ctx) {
      const { singleQuote } = ctx.options;
      let qs;
      if (singleQuote === false)
        qs = doubleQuotedString;
      else {
        const hasDouble = value.includes('"');
        const hasSingle = value.includes("'");
        if (hasDouble && !hasSingle)
          qs = singleQuotedString;
        else if (hasSingle && !hasDouble)
          qs = doubleQuotedString;
        else
          qs = singleQuote ? singleQuotedString : doubleQuotedString;
      }
      return qs(value, ctx);
    }
    var blockEndNewlines;
    try {
      blockEndNewlines = new RegExp("(^|(?<!\n))\n+(?!\n|$)", "g");
    } catch {
      blockEndNewlines = /\n+(?!\n|$)/g;
    }
    function blockString({ comment, type, value }, ctx, onComment, onChompKeep) {
      const { blockQuote, commentString, lineWidth } = ctx.options;
      if (!blockQuote || /\n[\t ]+$/.test(value)) {
        return quotedString(value, ctx);
      }
      const indent = ctx.indent || (ctx.forceBlockIndent || containsDocumentMarker(value) ? "  " : "");
      const literal = blockQuote === "literal" ? true : blockQuote === "folded" || type === Scalar.Scalar.BLOCK_FOLDED ? false : type === Scalar.Scalar.BLOCK_LITERAL ? true : !lineLengthOverLimit(value, lineWidth, indent.length);
      if (!value)
        return literal ? "|\n" : ">\n";
      let chomp;
      let endStart;
      for (endStart = value.length; endStart > 0; --endStart) {
        const ch = value[endStart - 1];
        if (ch !== "\n" && ch !== "	" && ch !== " ")
          break;
      }
      let end = value.substring(endStart);
      const endNlPos = end.indexOf("\n");
      if (endNlPos === -1) {
        chomp = "-";
      } else if (value === end || endNlPos !== end.length - 1) {
        chomp = "+";
        if (onChompKeep)
          onChompKeep();
      } else {
        chomp = "";
      }
      if (end) {
        value = value.slice(0, -end.length);
        if (end[end.length - 1] === "\n")
          end = end.slice(0, -1);
        end = end.replace(blockEndNewlines, `$&${indent}`);
      }
      let startWithSpace = false;
      let startEnd;
      let startNlPos = -1;
      for (startEnd = 0; startEnd < value.length; ++startEnd) {
        const ch = value[startEnd];
        if (ch === " ")
          startWithSpace = true;
        else if (ch === "\n")
          startNlPos = startEnd;
        else
          break;
      }
      let start = value.substring(0, startNlPos < startEnd ? startNlPos + 1 : startEnd);
      if (start) {
        value = value.substring(start.length);
        start = start.replace(/\n+/g, `$&${indent}`);
      }
      const indentSize = indent ? "2" : "1";
      let header = (startWithSpace ? indentSize : "") + chomp;
      if (comment) {
        header += " " + commentString(comment.replace(/ ?[\r\n]+/g, " "));
        if (onComment)
          onComment();
      }
      if (!literal) {
        const foldedValue = value.replace(/\n+/g, "\n$&").replace(/(?:^|\n)([\t ].*)(?:([\n\t ]*)\n(?![\n\t ]))?/g, "$1$2").replace(/\n+/g, `$&${indent}`);
        let literalFallback = false;
        const foldOptions = getFoldOptions(ctx, true);
        if (blockQuote !== "folded" && type !== Scalar.Scalar.BLOCK_FOLDED) {
          foldOptions.onOverflow = () => {
            literalFallback = true;
          };
        }
        const body = foldFlowLines.foldFlowLines(`${start}${foldedValue}${end}`, indent, foldFlowLines.FOLD_BLOCK, foldOptions);
        if (!literalFallback)
          return `>${header}
${indent}${body}`;
      }
      value = value.replace(/\n+/g, `$&${indent}`);
      return `|${header}
${indent}${start}${value}${end}`;
    }
    function plainString(item, ctx, onComment, onChompKeep) {
      const { type, value } = item;
      const { actualString, implicitKey, indent, indentStep, inFlow } = ctx;
      if (implicitKey && value.includes("\n") || inFlow && /[[\]{},]/.test(value)) {
        return quotedString(value, ctx);
      }
      if (/^[\n\t ,[\]{}#&*!|>'"%@`]|^[?-]$|^[?-][ \t]|[\n:][ \t]|[ \t]\n|[\n\t ]#|[\n\t :]$/.test(value)) {
        return implicitKey || inFlow || !value.includes("\n") ? quotedString(value, ctx) : blockString(item, ctx, onComment, onChompKeep);
      }
      if (!implicitKey && !inFlow && type !== Scalar.Scalar.PLAIN && value.includes("\n")) {
        return blockString(item, ctx, onComment, onChompKeep);
      }
      if (containsDocumentMarker(value)) {
        if (indent === "") {
          ctx.forceBlockIndent = true;
          return blockString(item, ctx, onComment, onChompKeep);
        } else if (implicitKey && indent === indentStep) {
          return quotedString(value, ctx);
        }
      }
      const str = value.replace(/\n+/g, `$&
${indent}`);
      if (actualString) {
        const test = (tag) => tag.default && tag.tag !== "tag:yaml.org,2002:str" && tag.test?.test(str);
        const { compat, tags } = ctx.doc.schema;
        if (tags.some(test) || compat?.some(test))
          return quotedString(value, ctx);
      }
      return implicitKey ? str : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
    }
    function stringifyString(item, ctx, onComment, onChompKeep) {
      const { implicitKey, inFlow } = ctx;
      const ss = typeof item.value === "string" ? item : Object.assign({}, item, { value: String(item.value) });
      let { type } = item;
      if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
        if (/[\x00-\x08\x0b-\x1f\x7f-\x9f\u{D800}-\u{DFFF}]/u.test(ss.value))
          type = Scalar.Scalar.QUOTE_DOUBLE;
      }
      const _stringify = (_type) => {
        switch (_type) {
          case Scalar.Scalar.BLOCK_FOLDED:
          case Scalar.Scalar.BLOCK_LITERAL:
            return implicitKey || inFlow ? quotedString(ss.value, ctx) : blockString(ss, ctx, onComment, onChompKeep);
          case Scalar.Scalar.QUOTE_DOUBLE:
            return doubleQuotedString(ss.value, ctx);
          case Scalar.Scalar.QUOTE_SINGLE:
            return singleQuotedString(ss.value, ctx);
          case Scalar.Scalar.PLAIN:
            return plainString(ss, ctx, onComment, onChompKeep);
          default:
            return null;
        }
      };
      let res = _stringify(type);
      if (res === null) {
        const { defaultKeyType, defaultStringType } = ctx.options;
        const t = implicitKey && defaultKeyType || defaultStringType;
        res = _stringify(t);
        if (res === null)
          throw new Error(`Unsupported default string type ${t}`);
      }
      return res;
    }
    exports.stringifyString = stringifyString;
  }
});

// node_modules/yaml/dist/stringify/stringify.js
var require_stringify = __commonJS({
  "node_modules/yaml/dist/stringify/stringify.js"(exports) {
    "use strict";
    var anchors = require_anchors();
    var identity = require_identity();
    var stringifyComment = require_stringifyComment();
    var stringifyString = require_stringifyString();
    function createStringifyContext(doc, options) {
      const opt = Object.assign({
        blockQuote: true,
        commentString: stringifyComment.stringifyComment,
        defaultKeyType: null,
        defaultStringType: "PLAIN",
        directives: null,
        doubleQuotedAsJSON: false,
        doubleQuotedMinMultiLineLength: 40,
        falseStr: "false",
        flowCollectionPadding: true,
        indentSeq: true,
        lineWidth: 80,
        minContentWidth: 20,
        nullStr: "null",
        simpleKeys: false,
        singleQuote: null,
        trailingComma: false,
        trueStr: "true",
        verifyAliasOrder: true
      }, doc.schema.toStringOptions, options);
      let inFlow;
      switch (opt.collectionStyle) {
        case "block":
          inFlow = false;
          break;
        case "flow":
          inFlow = true;
          break;
        default:
          inFlow = null;
      }
      return {
        anchors: /* @__PURE__ */ new Set(),
        doc,
        flowCollectionPadding: opt.flowCollectionPadding ? " " : "",
        indent: "",
        indentStep: typeof opt.indent === "number" ? " ".repeat(opt.indent) : "  ",
        inFlow,
        options: opt
      };
    }
    function getTagObject(tags, item) {
      if (item.tag) {
        const match = tags.filter((t) => t.tag === item.tag);
        if (match.length > 0)
          return match.find((t) => t.format === item.format) ?? match[0];
      }
      let tagObj = void 0;
      let obj;
      if (identity.isScalar(item)) {
        obj = item.value;
        let match = tags.filter((t) => t.identify?.(obj));
        if (match.length > 1) {
          const testMatch = match.filter((t) => t.test);
          if (testMatch.length > 0)
            match = testMatch;
        }
        tagObj = match.find((t) => t.format === item.format) ?? match.find((t) => !t.format);
      } else {
        obj = item;
        tagObj = tags.find((t) => t.nodeClass && obj instanceof t.nodeClass);
      }
      if (!tagObj) {
        const name = obj?.constructor?.name ?? (obj === null ? "null" : typeof obj);
        throw new Error(`Tag not resolved for ${name} value`);
      }
      return tagObj;
    }
    function stringifyProps(node, tagObj, { anchors: anchors$1, doc }) {
      if (!doc.directives)
        return "";
      const props = [];
      const anchor = (identity.isScalar(node) || identity.isCollection(node)) && node.anchor;
      if (anchor && anchors.anchorIsValid(anchor)) {
        anchors$1.add(anchor);
        props.push(`&${anchor}`);
      }
      const tag = node.tag ?? (tagObj.default ? null : tagObj.tag);
      if (tag)
        props.push(doc.directives.tagString(tag));
      return props.join(" ");
    }
    function stringify(item, ctx, onComment, onChompKeep) {
      if (identity.isPair(item))
        return item.toString(ctx, onComment, onChompKeep);
      if (identity.isAlias(item)) {
        if (ctx.doc.directives)
          return item.toString(ctx);
        if (ctx.resolvedAliases?.has(item)) {
          throw new TypeError(`Cannot stringify circular structure without alias nodes`);
        } else {
          if (ctx.resolvedAliases)
            ctx.resolvedAliases.add(item);
          else
            ctx.resolvedAliases = /* @__PURE__ */ new Set([item]);
          item = item.resolve(ctx.doc);
        }
      }
      let tagObj = void 0;
      const node = identity.isNode(item) ? item : ctx.doc.createNode(item, { onTagObj: (o) => tagObj = o });
      tagObj ?? (tagObj = getTagObject(ctx.doc.schema.tags, node));
      const props = stringifyProps(node, tagObj, ctx);
      if (props.length > 0)
        ctx.indentAtStart = (ctx.indentAtStart ?? 0) + props.length + 1;
      const str = typeof tagObj.stringify === "function" ? tagObj.stringify(node, ctx, onComment, onChompKeep) : identity.isScalar(node) ? stringifyString.stringifyString(node, ctx, onComment, onChompKeep) : node.toString(ctx, onComment, onChompKeep);
      if (!props)
        return str;
      return identity.isScalar(node) || str[0] === "{" || str[0] === "[" ? `${props} ${str}` : `${props}
${ctx.indent}${str}`;
    }
    exports.createStringifyContext = createStringifyContext;
    exports.stringify = stringify;
  }
});

// node_modules/yaml/dist/stringify/stringifyPair.js
var require_stringifyPair = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyPair.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Scalar = require_Scalar();
    var stringify = require_stringify();
    var stringifyComment = require_stringifyComment();
    function stringifyPair({ key, value }, ctx, onComment, onChompKeep) {
      const { allNullValues, doc, indent, indentStep, options: { commentString, indentSeq, simpleKeys } } = ctx;
      let keyComment = identity.isNode(key) && key.comment || null;
      if (simpleKeys) {
        if (keyComment) {
          throw new Error("With simple keys, key nodes cannot have comments");
        }
        if (identity.isCollection(key) || !identity.isNode(key) && typeof key === "object") {
          const msg = "With simple keys, collection cannot be used as a key value";
          throw new Error(msg);
        }
      }
      let explicitKey = !simpleKeys && (!key || keyComment && value == null && !ctx.inFlow || identity.isCollection(key) || (identity.isScalar(key) ? key.type === Scalar.Scalar.BLOCK_FOLDED || key.type === Scalar.Scalar.BLOCK_LITERAL : typeof key === "object"));
      ctx = Object.assign({}, ctx, {
        allNullValues: false,
        implicitKey: !explicitKey && (simpleKeys || !allNullValues),
        indent: indent + indentStep
      });
      let keyCommentDone = false;
      let chompKeep = false;
      let str = stringify.stringify(key, ctx, () => keyCommentDone = true, () => chompKeep = true);
      if (!explicitKey && !ctx.inFlow && str.length > 1024) {
        if (simpleKeys)
          throw new Error("With simple keys, single line scalar must not span more than 1024 characters");
        explicitKey = true;
      }
      if (ctx.inFlow) {
        if (allNullValues || value == null) {
          if (keyCommentDone && onComment)
            onComment();
          return str === "" ? "?" : explicitKey ? `? ${str}` : str;
        }
      } else if (allNullValues && !simpleKeys || value == null && explicitKey) {
        str = `? ${str}`;
        if (keyComment && !keyCommentDone) {
          str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        } else if (chompKeep && onChompKeep)
          onChompKeep();
        return str;
      }
      if (keyCommentDone)
        keyComment = null;
      if (explicitKey) {
        if (keyComment)
          str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        str = `? ${str}
${indent}:`;
      } else {
        str = `${str}:`;
        if (keyComment)
          str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
      }
      let vsb, vcb, valueComment;
      if (identity.isNode(value)) {
        vsb = !!value.spaceBefore;
        vcb = value.commentBefore;
        valueComment = value.comment;
      } else {
        vsb = false;
        vcb = null;
        valueComment = null;
        if (value && typeof value === "object")
          value = doc.createNode(value);
      }
      ctx.implicitKey = false;
      if (!explicitKey && !keyComment && identity.isScalar(value))
        ctx.indentAtStart = str.length + 1;
      chompKeep = false;
      if (!indentSeq && indentStep.length >= 2 && !ctx.inFlow && !explicitKey && identity.isSeq(value) && !value.flow && !value.tag && !value.anchor) {
        ctx.indent = ctx.indent.substring(2);
      }
      let valueCommentDone = false;
      const valueStr = stringify.stringify(value, ctx, () => valueCommentDone = true, () => chompKeep = true);
      let ws = " ";
      if (keyComment || vsb || vcb) {
        ws = vsb ? "\n" : "";
        if (vcb) {
          const cs = commentString(vcb);
          ws += `
${stringifyComment.indentComment(cs, ctx.indent)}`;
        }
        if (valueStr === "" && !ctx.inFlow) {
          if (ws === "\n" && valueComment)
            ws = "\n\n";
        } else {
          ws += `
${ctx.indent}`;
        }
      } else if (!explicitKey && identity.isCollection(value)) {
        const vs0 = valueStr[0];
        const nl0 = valueStr.indexOf("\n");
        const hasNewline = nl0 !== -1;
        const flow = ctx.inFlow ?? value.flow ?? value.items.length === 0;
        if (hasNewline || !flow) {
          let hasPropsLine = false;
          if (hasNewline && (vs0 === "&" || vs0 === "!")) {
            let sp0 = valueStr.indexOf(" ");
            if (vs0 === "&" && sp0 !== -1 && sp0 < nl0 && valueStr[sp0 + 1] === "!") {
              sp0 = valueStr.indexOf(" ", sp0 + 1);
            }
            if (sp0 === -1 || nl0 < sp0)
              hasPropsLine = true;
          }
          if (!hasPropsLine)
            ws = `
${ctx.indent}`;
        }
      } else if (valueStr === "" || valueStr[0] === "\n") {
        ws = "";
      }
      str += ws + valueStr;
      if (ctx.inFlow) {
        if (valueCommentDone && onComment)
          onComment();
      } else if (valueComment && !valueCommentDone) {
        str += stringifyComment.lineComment(str, ctx.indent, commentString(valueComment));
      } else if (chompKeep && onChompKeep) {
        onChompKeep();
      }
      return str;
    }
    exports.stringifyPair = stringifyPair;
  }
});

// node_modules/yaml/dist/log.js
var require_log = __commonJS({
  "node_modules/yaml/dist/log.js"(exports) {
    "use strict";
    var node_process = __require("process");
    function debug(logLevel, ...messages) {
      if (logLevel === "debug")
        console.log(...messages);
    }
    function warn(logLevel, warning) {
      if (logLevel === "debug" || logLevel === "warn") {
        if (typeof node_process.emitWarning === "function")
          node_process.emitWarning(warning);
        else
          console.warn(warning);
      }
    }
    exports.debug = debug;
    exports.warn = warn;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/merge.js
var require_merge = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/merge.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Scalar = require_Scalar();
    var MERGE_KEY = "<<";
    var merge = {
      identify: (value) => value === MERGE_KEY || typeof value === "symbol" && value.description === MERGE_KEY,
      default: "key",
      tag: "tag:yaml.org,2002:merge",
      test: /^<<$/,
      resolve: () => Object.assign(new Scalar.Scalar(Symbol(MERGE_KEY)), {
        addToJSMap: addMergeToJSMap
      }),
      stringify: () => MERGE_KEY
    };
    var isMergeKey = (ctx, key) => (merge.identify(key) || identity.isScalar(key) && (!key.type || key.type === Scalar.Scalar.PLAIN) && merge.identify(key.value)) && ctx?.doc.schema.tags.some((tag) => tag.tag === merge.tag && tag.default);
    function addMergeToJSMap(ctx, map, value) {
      const source = resolveAliasValue(ctx, value);
      if (identity.isSeq(source))
        for (const it of source.items)
          mergeValue(ctx, map, it);
      else if (Array.isArray(source))
        for (const it of source)
          mergeValue(ctx, map, it);
      else
        mergeValue(ctx, map, source);
    }
    function mergeValue(ctx, map, value) {
      const source = resolveAliasValue(ctx, value);
      if (!identity.isMap(source))
        throw new Error("Merge sources must be maps or map aliases");
      const srcMap = source.toJSON(null, ctx, Map);
      for (const [key, value2] of srcMap) {
        if (map instanceof Map) {
          if (!map.has(key))
            map.set(key, value2);
        } else if (map instanceof Set) {
          map.add(key);
        } else if (!Object.prototype.hasOwnProperty.call(map, key)) {
          Object.defineProperty(map, key, {
            value: value2,
            writable: true,
            enumerable: true,
            configurable: true
          });
        }
      }
      return map;
    }
    function resolveAliasValue(ctx, value) {
      return ctx && identity.isAlias(value) ? value.resolve(ctx.doc, ctx) : value;
    }
    exports.addMergeToJSMap = addMergeToJSMap;
    exports.isMergeKey = isMergeKey;
    exports.merge = merge;
  }
});

// node_modules/yaml/dist/nodes/addPairToJSMap.js
var require_addPairToJSMap = __commonJS({
  "node_modules/yaml/dist/nodes/addPairToJSMap.js"(exports) {
    "use strict";
    var log = require_log();
    var merge = require_merge();
    var stringify = require_stringify();
    var identity = require_identity();
    var toJS = require_toJS();
    function addPairToJSMap(ctx, map, { key, value }) {
      if (identity.isNode(key) && key.addToJSMap)
        key.addToJSMap(ctx, map, value);
      else if (merge.isMergeKey(ctx, key))
        merge.addMergeToJSMap(ctx, map, value);
      else {
        const jsKey = toJS.toJS(key, "", ctx);
        if (map instanceof Map) {
          map.set(jsKey, toJS.toJS(value, jsKey, ctx));
        } else if (map instanceof Set) {
          map.add(jsKey);
        } else {
          const stringKey = stringifyKey(key, jsKey, ctx);
          const jsValue = toJS.toJS(value, stringKey, ctx);
          if (stringKey in map)
            Object.defineProperty(map, stringKey, {
              value: jsValue,
              writable: true,
              enumerable: true,
              configurable: true
            });
          else
            map[stringKey] = jsValue;
        }
      }
      return map;
    }
    function stringifyKey(key, jsKey, ctx) {
      if (jsKey === null)
        return "";
      if (typeof jsKey !== "object")
        return String(jsKey);
      if (identity.isNode(key) && ctx?.doc) {
        const strCtx = stringify.createStringifyContext(ctx.doc, {});
        strCtx.anchors = /* @__PURE__ */ new Set();
        for (const node of ctx.anchors.keys())
          strCtx.anchors.add(node.anchor);
        strCtx.inFlow = true;
        strCtx.inStringifyKey = true;
        const strKey = key.toString(strCtx);
        if (!ctx.mapKeyWarned) {
          let jsonStr = JSON.stringify(strKey);
          if (jsonStr.length > 40)
            jsonStr = jsonStr.substring(0, 36) + '..."';
          log.warn(ctx.doc.options.logLevel, `Keys with collection values will be stringified due to JS Object restrictions: ${jsonStr}. Set mapAsMap: true to use object keys.`);
          ctx.mapKeyWarned = true;
        }
        return strKey;
      }
      return JSON.stringify(jsKey);
    }
    exports.addPairToJSMap = addPairToJSMap;
  }
});

// node_modules/yaml/dist/nodes/Pair.js
var require_Pair = __commonJS({
  "node_modules/yaml/dist/nodes/Pair.js"(exports) {
    "use strict";
    var createNode = require_createNode();
    var stringifyPair = require_stringifyPair();
    var addPairToJSMap = require_addPairToJSMap();
    var identity = require_identity();
    function createPair(key, value, ctx) {
      const k = createNode.createNode(key, void 0, ctx);
      const v = createNode.createNode(value, void 0, ctx);
      return new Pair(k, v);
    }
    var Pair = class _Pair {
      constructor(key, value = null) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.PAIR });
        this.key = key;
        this.value = value;
      }
      clone(schema) {
        let { key, value } = this;
        if (identity.isNode(key))
          key = key.clone(schema);
        if (identity.isNode(value))
          value = value.clone(schema);
        return new _Pair(key, value);
      }
      toJSON(_, ctx) {
        const pair = ctx?.mapAsMap ? /* @__PURE__ */ new Map() : {};
        return addPairToJSMap.addPairToJSMap(ctx, pair, this);
      }
      toString(ctx, onComment, onChompKeep) {
        return ctx?.doc ? stringifyPair.stringifyPair(this, ctx, onComment, onChompKeep) : JSON.stringify(this);
      }
    };
    exports.Pair = Pair;
    exports.createPair = createPair;
  }
});

// node_modules/yaml/dist/stringify/stringifyCollection.js
var require_stringifyCollection = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyCollection.js"(exports) {
    "use strict";
    var identity = require_identity();
    var stringify = require_stringify();
    var stringifyComment = require_stringifyComment();
    function stringifyCollection(collection, ctx, options) {
      const flow = ctx.inFlow ?? collection.flow;
      const stringify2 = flow ? stringifyFlowCollection : stringifyBlockCollection;
      return stringify2(collection, ctx, options);
    }
    function stringifyBlockCollection({ comment, items }, ctx, { blockItemPrefix, flowChars, itemIndent, onChompKeep, onComment }) {
      const { indent, options: { commentString } } = ctx;
      const itemCtx = Object.assign({}, ctx, { indent: itemIndent, type: null });
      let chompKeep = false;
      const lines = [];
      for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment2 = null;
        if (identity.isNode(item)) {
          if (!chompKeep && item.spaceBefore)
            lines.push("");
          addCommentBefore(ctx, lines, item.commentBefore, chompKeep);
          if (item.comment)
            comment2 = item.comment;
        } else if (identity.isPair(item)) {
          const ik = identity.isNode(item.key) ? item.key : null;
          if (ik) {
            if (!chompKeep && ik.spaceBefore)
              lines.push("");
            addCommentBefore(ctx, lines, ik.commentBefore, chompKeep);
          }
        }
        chompKeep = false;
        let str2 = stringify.stringify(item, itemCtx, () => comment2 = null, () => chompKeep = true);
        if (comment2)
          str2 += stringifyComment.lineComment(str2, itemIndent, commentString(comment2));
        if (chompKeep && comment2)
          chompKeep = false;
        lines.push(blockItemPrefix + str2);
      }
      let str;
      if (lines.length === 0) {
        str = flowChars.start + flowChars.end;
      } else {
        str = lines[0];
        for (let i = 1; i < lines.length; ++i) {
          const line = lines[i];
          str += line ? `
${indent}${line}` : "\n";
        }
      }
      if (comment) {
        str += "\n" + stringifyComment.indentComment(commentString(comment), indent);
        if (onComment)
          onComment();
      } else if (chompKeep && onChompKeep)
        onChompKeep();
      return str;
    }
    function stringifyFlowCollection({ items }, ctx, { flowChars, itemIndent }) {
      const { indent, indentStep, flowCollectionPadding: fcPadding, options: { commentString } } = ctx;
      itemIndent += indentStep;
      const itemCtx = Object.assign({}, ctx, {
        indent: itemIndent,
        inFlow: true,
        type: null
      });
      let reqNewline = false;
      let linesAtValue = 0;
      const lines = [];
      for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment = null;
        if (identity.isNode(item)) {
          if (item.spaceBefore)
            lines.push("");
          addCommentBefore(ctx, lines, item.commentBefore, false);
          if (item.comment)
            comment = item.comment;
        } else if (identity.isPair(item)) {
          const ik = identity.isNode(item.key) ? item.key : null;
          if (ik) {
            if (ik.spaceBefore)
              lines.push("");
            addCommentBefore(ctx, lines, ik.commentBefore, false);
            if (ik.comment)
              reqNewline = true;
          }
          const iv = identity.isNode(item.value) ? item.value : null;
          if (iv) {
            if (iv.comment)
              comment = iv.comment;
            if (iv.commentBefore)
              reqNewline = true;
          } else if (item.value == null && ik?.comment) {
            comment = ik.comment;
          }
        }
        if (comment)
          reqNewline = true;
        let str = stringify.stringify(item, itemCtx, () => comment = null);
        reqNewline || (reqNewline = lines.length > linesAtValue || str.includes("\n"));
        if (i < items.length - 1) {
          str += ",";
        } else if (ctx.options.trailingComma) {
          if (ctx.options.lineWidth > 0) {
            reqNewline || (reqNewline = lines.reduce((sum, line) => sum + line.length + 2, 2) + (str.length + 2) > ctx.options.lineWidth);
          }
          if (reqNewline) {
            str += ",";
          }
        }
        if (comment)
          str += stringifyComment.lineComment(str, itemIndent, commentString(comment));
        lines.push(str);
        linesAtValue = lines.length;
      }
      const { start, end } = flowChars;
      if (lines.length === 0) {
        return start + end;
      } else {
        if (!reqNewline) {
          const len = lines.reduce((sum, line) => sum + line.length + 2, 2);
          reqNewline = ctx.options.lineWidth > 0 && len > ctx.options.lineWidth;
        }
        if (reqNewline) {
          let str = start;
          for (const line of lines)
            str += line ? `
${indentStep}${indent}${line}` : "\n";
          return `${str}
${indent}${end}`;
        } else {
          return `${start}${fcPadding}${lines.join(" ")}${fcPadding}${end}`;
        }
      }
    }
    function addCommentBefore({ indent, options: { commentString } }, lines, comment, chompKeep) {
      if (comment && chompKeep)
        comment = comment.replace(/^\n+/, "");
      if (comment) {
        const ic = stringifyComment.indentComment(commentString(comment), indent);
        lines.push(ic.trimStart());
      }
    }
    exports.stringifyCollection = stringifyCollection;
  }
});

// node_modules/yaml/dist/nodes/YAMLMap.js
var require_YAMLMap = __commonJS({
  "node_modules/yaml/dist/nodes/YAMLMap.js"(exports) {
    "use strict";
    var stringifyCollection = require_stringifyCollection();
    var addPairToJSMap = require_addPairToJSMap();
    var Collection = require_Collection();
    var identity = require_identity();
    var Pair = require_Pair();
    var Scalar = require_Scalar();
    function findPair(items, key) {
      const k = identity.isScalar(key) ? key.value : key;
      for (const it of items) {
        if (identity.isPair(it)) {
          if (it.key === key || it.key === k)
            return it;
          if (identity.isScalar(it.key) && it.key.value === k)
            return it;
        }
      }
      return void 0;
    }
    var YAMLMap = class extends Collection.Collection {
      static get tagName() {
        return "tag:yaml.org,2002:map";
      }
      constructor(schema) {
        super(identity.MAP, schema);
        this.items = [];
      }
      /**
       * A generic collection parsing method that can be extended
       * to other node classes that inherit from YAMLMap
       */
      static from(schema, obj, ctx) {
        const { keepUndefined, replacer } = ctx;
        const map = new this(schema);
        const add = (key, value) => {
          if (typeof replacer === "function")
            value = replacer.call(obj, key, value);
          else if (Array.isArray(replacer) && !replacer.includes(key))
            return;
          if (value !== void 0 || keepUndefined)
            map.items.push(Pair.createPair(key, value, ctx));
        };
        if (obj instanceof Map) {
          for (const [key, value] of obj)
            add(key, value);
        } else if (obj && typeof obj === "object") {
          for (const key of Object.keys(obj))
            add(key, obj[key]);
        }
        if (typeof schema.sortMapEntries === "function") {
          map.items.sort(schema.sortMapEntries);
        }
        return map;
      }
      /**
       * Adds a value to the collection.
       *
       * @param overwrite - If not set `true`, using a key that is already in the
       *   collection will throw. Otherwise, overwrites the previous value.
       */
      add(pair, overwrite) {
        let _pair;
        if (identity.isPair(pair))
          _pair = pair;
        else if (!pair || typeof pair !== "object" || !("key" in pair)) {
          _pair = new Pair.Pair(pair, pair?.value);
        } else
          _pair = new Pair.Pair(pair.key, pair.value);
        const prev = findPair(this.items, _pair.key);
        const sortEntries = this.schema?.sortMapEntries;
        if (prev) {
          if (!overwrite)
            throw new Error(`Key ${_pair.key} already set`);
          if (identity.isScalar(prev.value) && Scalar.isScalarValue(_pair.value))
            prev.value.value = _pair.value;
          else
            prev.value = _pair.value;
        } else if (sortEntries) {
          const i = this.items.findIndex((item) => sortEntries(_pair, item) < 0);
          if (i === -1)
            this.items.push(_pair);
          else
            this.items.splice(i, 0, _pair);
        } else {
          this.items.push(_pair);
        }
      }
      delete(key) {
        const it = findPair(this.items, key);
        if (!it)
          return false;
        const del = this.items.splice(this.items.indexOf(it), 1);
        return del.length > 0;
      }
      get(key, keepScalar) {
        const it = findPair(this.items, key);
        const node = it?.value;
        return (!keepScalar && identity.isScalar(node) ? node.value : node) ?? void 0;
      }
      has(key) {
        return !!findPair(this.items, key);
      }
      set(key, value) {
        this.add(new Pair.Pair(key, value), true);
      }
      /**
       * @param ctx - Conversion context, originally set in Document#toJS()
       * @param {Class} Type - If set, forces the returned collection type
       * @returns Instance of Type, Map, or Object
       */
      toJSON(_, ctx, Type) {
        const map = Type ? new Type() : ctx?.mapAsMap ? /* @__PURE__ */ new Map() : {};
        if (ctx?.onCreate)
          ctx.onCreate(map);
        for (const item of this.items)
          addPairToJSMap.addPairToJSMap(ctx, map, item);
        return map;
      }
      toString(ctx, onComment, onChompKeep) {
        if (!ctx)
          return JSON.stringify(this);
        for (const item of this.items) {
          if (!identity.isPair(item))
            throw new Error(`Map items must all be pairs; found ${JSON.stringify(item)} instead`);
        }
        if (!ctx.allNullValues && this.hasAllNullValues(false))
          ctx = Object.assign({}, ctx, { allNullValues: true });
        return stringifyCollection.stringifyCollection(this, ctx, {
          blockItemPrefix: "",
          flowChars: { start: "{", end: "}" },
          itemIndent: ctx.indent || "",
          onChompKeep,
          onComment
        });
      }
    };
    exports.YAMLMap = YAMLMap;
    exports.findPair = findPair;
  }
});

// node_modules/yaml/dist/schema/common/map.js
var require_map = __commonJS({
  "node_modules/yaml/dist/schema/common/map.js"(exports) {
    "use strict";
    var identity = require_identity();
    var YAMLMap = require_YAMLMap();
    var map = {
      collection: "map",
      default: true,
      nodeClass: YAMLMap.YAMLMap,
      tag: "tag:yaml.org,2002:map",
      resolve(map2, onError) {
        if (!identity.isMap(map2))
          onError("Expected a mapping for this tag");
        return map2;
      },
      createNode: (schema, obj, ctx) => YAMLMap.YAMLMap.from(schema, obj, ctx)
    };
    exports.map = map;
  }
});

// node_modules/yaml/dist/nodes/YAMLSeq.js
var require_YAMLSeq = __commonJS({
  "node_modules/yaml/dist/nodes/YAMLSeq.js"(exports) {
    "use strict";
    var createNode = require_createNode();
    var stringifyCollection = require_stringifyCollection();
    var Collection = require_Collection();
    var identity = require_identity();
    var Scalar = require_Scalar();
    var toJS = require_toJS();
    var YAMLSeq = class extends Collection.Collection {
      static get tagName() {
        return "tag:yaml.org,2002:seq";
      }
      constructor(schema) {
        super(identity.SEQ, schema);
        this.items = [];
      }
      add(value) {
        this.items.push(value);
      }
      /**
       * Removes a value from the collection.
       *
       * `key` must contain a representation of an integer for this to succeed.
       * It may be wrapped in a `Scalar`.
       *
       * @returns `true` if the item was found and removed.
       */
      delete(key) {
        const idx = asItemIndex(key);
        if (typeof idx !== "number")
          return false;
        const del = this.items.splice(idx, 1);
        return del.length > 0;
      }
      get(key, keepScalar) {
        const idx = asItemIndex(key);
        if (typeof idx !== "number")
          return void 0;
        const it = this.items[idx];
        return !keepScalar && identity.isScalar(it) ? it.value : it;
      }
      /**
       * Checks if the collection includes a value with the key `key`.
       *
       * `key` must contain a representation of an integer for this to succeed.
       * It may be wrapped in a `Scalar`.
       */
      has(key) {
        const idx = asItemIndex(key);
        return typeof idx === "number" && idx < this.items.length;
      }
      /**
       * Sets a value in this collection. For `!!set`, `value` needs to be a
       * boolean to add/remove the item from the set.
       *
       * If `key` does not contain a representation of an integer, this will throw.
       * It may be wrapped in a `Scalar`.
       */
      set(key, value) {
        const idx = asItemIndex(key);
        if (typeof idx !== "number")
          throw new Error(`Expected a valid index, not ${key}.`);
        const prev = this.items[idx];
        if (identity.isScalar(prev) && Scalar.isScalarValue(value))
          prev.value = value;
        else
          this.items[idx] = value;
      }
      toJSON(_, ctx) {
        const seq = [];
        if (ctx?.onCreate)
          ctx.onCreate(seq);
        let i = 0;
        for (const item of this.items)
          seq.push(toJS.toJS(item, String(i++), ctx));
        return seq;
      }
      toString(ctx, onComment, onChompKeep) {
        if (!ctx)
          return JSON.stringify(this);
        return stringifyCollection.stringifyCollection(this, ctx, {
          blockItemPrefix: "- ",
          flowChars: { start: "[", end: "]" },
          itemIndent: (ctx.indent || "") + "  ",
          onChompKeep,
          onComment
        });
      }
      static from(schema, obj, ctx) {
        const { replacer } = ctx;
        const seq = new this(schema);
        if (obj && Symbol.iterator in Object(obj)) {
          let i = 0;
          for (let it of obj) {
            if (typeof replacer === "function") {
              const key = obj instanceof Set ? it : String(i++);
              it = replacer.call(obj, key, it);
            }
            seq.items.push(createNode.createNode(it, void 0, ctx));
          }
        }
        return seq;
      }
    };
    function asItemIndex(key) {
      let idx = identity.isScalar(key) ? key.value : key;
      if (idx && typeof idx === "string")
        idx = Number(idx);
      return typeof idx === "number" && Number.isInteger(idx) && idx >= 0 ? idx : null;
    }
    exports.YAMLSeq = YAMLSeq;
  }
});

// node_modules/yaml/dist/schema/common/seq.js
var require_seq = __commonJS({
  "node_modules/yaml/dist/schema/common/seq.js"(exports) {
    "use strict";
    var identity = require_identity();
    var YAMLSeq = require_YAMLSeq();
    var seq = {
      collection: "seq",
      default: true,
      nodeClass: YAMLSeq.YAMLSeq,
      tag: "tag:yaml.org,2002:seq",
      resolve(seq2, onError) {
        if (!identity.isSeq(seq2))
          onError("Expected a sequence for this tag");
        return seq2;
      },
      createNode: (schema, obj, ctx) => YAMLSeq.YAMLSeq.from(schema, obj, ctx)
    };
    exports.seq = seq;
  }
});

// node_modules/yaml/dist/schema/common/string.js
var require_string = __commonJS({
  "node_modules/yaml/dist/schema/common/string.js"(exports) {
    "use strict";
    var stringifyString = require_stringifyString();
    var string = {
      identify: (value) => typeof value === "string",
      default: true,
      tag: "tag:yaml.org,2002:str",
      resolve: (str) => str,
      stringify(item, ctx, onComment, onChompKeep) {
        ctx = Object.assign({ actualString: true }, ctx);
        return stringifyString.stringifyString(item, ctx, onComment, onChompKeep);
      }
    };
    exports.string = string;
  }
});

// node_modules/yaml/dist/schema/common/null.js
var require_null = __commonJS({
  "node_modules/yaml/dist/schema/common/null.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var nullTag = {
      identify: (value) => value == null,
      createNode: () => new Scalar.Scalar(null),
      default: true,
      tag: "tag:yaml.org,2002:null",
      test: /^(?:~|[Nn]ull|NULL)?$/,
      resolve: () => new Scalar.Scalar(null),
      stringify: ({ source }, ctx) => typeof source === "string" && nullTag.test.test(source) ? source : ctx.options.nullStr
    };
    exports.nullTag = nullTag;
  }
});

// node_modules/yaml/dist/schema/core/bool.js
var require_bool = __commonJS({
  "node_modules/yaml/dist/schema/core/bool.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var boolTag = {
      identify: (value) => typeof value === "boolean",
      default: true,
      tag: "tag:yaml.org,2002:bool",
      test: /^(?:[Tt]rue|TRUE|[Ff]alse|FALSE)$/,
      resolve: (str) => new Scalar.Scalar(str[0] === "t" || str[0] === "T"),
      stringify({ source, value }, ctx) {
        if (source && boolTag.test.test(source)) {
          const sv = source[0] === "t" || source[0] === "T";
          if (value === sv)
            return source;
        }
        return value ? ctx.options.trueStr : ctx.options.falseStr;
      }
    };
    exports.boolTag = boolTag;
  }
});

// node_modules/yaml/dist/stringify/stringifyNumber.js
var require_stringifyNumber = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyNumber.js"(exports) {
    "use strict";
    function stringifyNumber({ format, minFractionDigits, tag, value }) {
      if (typeof value === "bigint")
        return String(value);
      const num2 = typeof value === "number" ? value : Number(value);
      if (!isFinite(num2))
        return isNaN(num2) ? ".nan" : num2 < 0 ? "-.inf" : ".inf";
      let n = Object.is(value, -0) ? "-0" : JSON.stringify(value);
      if (!format && minFractionDigits && (!tag || tag === "tag:yaml.org,2002:float") && /^-?\d/.test(n) && !n.includes("e")) {
        let i = n.indexOf(".");
        if (i < 0) {
          i = n.length;
          n += ".";
        }
        let d = minFractionDigits - (n.length - i - 1);
        while (d-- > 0)
          n += "0";
      }
      return n;
    }
    exports.stringifyNumber = stringifyNumber;
  }
});

// node_modules/yaml/dist/schema/core/float.js
var require_float = __commonJS({
  "node_modules/yaml/dist/schema/core/float.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var stringifyNumber = require_stringifyNumber();
    var floatNaN = {
      identify: (value) => typeof value === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
      resolve: (str) => str.slice(-3).toLowerCase() === "nan" ? NaN : str[0] === "-" ? Number.NEGATIVE_INFINITY : Number.POSITIVE_INFINITY,
      stringify: stringifyNumber.stringifyNumber
    };
    var floatExp = {
      identify: (value) => typeof value === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      format: "EXP",
      test: /^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/,
      resolve: (str) => parseFloat(str),
      stringify(node) {
        const num2 = Number(node.value);
        return isFinite(num2) ? num2.toExponential() : stringifyNumber.stringifyNumber(node);
      }
    };
    var float = {
      identify: (value) => typeof value === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      test: /^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/,
      resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str));
        const dot2 = str.indexOf(".");
        if (dot2 !== -1 && str[str.length - 1] === "0")
          node.minFractionDigits = str.length - dot2 - 1;
        return node;
      },
      stringify: stringifyNumber.stringifyNumber
    };
    exports.float = float;
    exports.floatExp = floatExp;
    exports.floatNaN = floatNaN;
  }
});

// node_modules/yaml/dist/schema/core/int.js
var require_int = __commonJS({
  "node_modules/yaml/dist/schema/core/int.js"(exports) {
    "use strict";
    var stringifyNumber = require_stringifyNumber();
    var intIdentify = (value) => typeof value === "bigint" || Number.isInteger(value);
    var intResolve = (str, offset, radix, { intAsBigInt }) => intAsBigInt ? BigInt(str) : parseInt(str.substring(offset), radix);
    function intStringify(node, radix, prefix) {
      const { value } = node;
      if (intIdentify(value) && value >= 0)
        return prefix + value.toString(radix);
      return stringifyNumber.stringifyNumber(node);
    }
    var intOct = {
      identify: (value) => intIdentify(value) && value >= 0,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "OCT",
      test: /^0o[0-7]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 2, 8, opt),
      stringify: (node) => intStringify(node, 8, "0o")
    };
    var int = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      test: /^[-+]?[0-9]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
      stringify: stringifyNumber.stringifyNumber
    };
    var intHex = {
      identify: (value) => intIdentify(value) && value >= 0,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "HEX",
      test: /^0x[0-9a-fA-F]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
      stringify: (node) => intStringify(node, 16, "0x")
    };
    exports.int = int;
    exports.intHex = intHex;
    exports.intOct = intOct;
  }
});

// node_modules/yaml/dist/schema/core/schema.js
var require_schema = __commonJS({
  "node_modules/yaml/dist/schema/core/schema.js"(exports) {
    "use strict";
    var map = require_map();
    var _null = require_null();
    var seq = require_seq();
    var string = require_string();
    var bool = require_bool();
    var float = require_float();
    var int = require_int();
    var schema = [
      map.map,
      seq.seq,
      string.string,
      _null.nullTag,
      bool.boolTag,
      int.intOct,
      int.int,
      int.intHex,
      float.floatNaN,
      float.floatExp,
      float.float
    ];
    exports.schema = schema;
  }
});

// node_modules/yaml/dist/schema/json/schema.js
var require_schema2 = __commonJS({
  "node_modules/yaml/dist/schema/json/schema.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var map = require_map();
    var seq = require_seq();
    function intIdentify(value) {
      return typeof value === "bigint" || Number.isInteger(value);
    }
    var stringifyJSON = ({ value }) => JSON.stringify(value);
    var jsonScalars = [
      {
        identify: (value) => typeof value === "string",
        default: true,
        tag: "tag:yaml.org,2002:str",
        resolve: (str) => str,
        stringify: stringifyJSON
      },
      {
        identify: (value) => value == null,
        createNode: () => new Scalar.Scalar(null),
        default: true,
        tag: "tag:yaml.org,2002:null",
        test: /^null$/,
        resolve: () => null,
        stringify: stringifyJSON
      },
      {
        identify: (value) => typeof value === "boolean",
        default: true,
        tag: "tag:yaml.org,2002:bool",
        test: /^true$|^false$/,
        resolve: (str) => str === "true",
        stringify: stringifyJSON
      },
      {
        identify: intIdentify,
        default: true,
        tag: "tag:yaml.org,2002:int",
        test: /^-?(?:0|[1-9][0-9]*)$/,
        resolve: (str, _onError, { intAsBigInt }) => intAsBigInt ? BigInt(str) : parseInt(str, 10),
        stringify: ({ value }) => intIdentify(value) ? value.toString() : JSON.stringify(value)
      },
      {
        identify: (value) => typeof value === "number",
        default: true,
        tag: "tag:yaml.org,2002:float",
        test: /^-?(?:0|[1-9][0-9]*)(?:\.[0-9]*)?(?:[eE][-+]?[0-9]+)?$/,
        resolve: (str) => parseFloat(str),
        stringify: stringifyJSON
      }
    ];
    var jsonError = {
      default: true,
      tag: "",
      test: /^/,
      resolve(str, onError) {
        onError(`Unresolved plain scalar ${JSON.stringify(str)}`);
        return str;
      }
    };
    var schema = [map.map, seq.seq].concat(jsonScalars, jsonError);
    exports.schema = schema;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/binary.js
var require_binary = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/binary.js"(exports) {
    "use strict";
    var node_buffer = __require("buffer");
    var Scalar = require_Scalar();
    var stringifyString = require_stringifyString();
    var binary = {
      identify: (value) => value instanceof Uint8Array,
      // Buffer inherits from Uint8Array
      default: false,
      tag: "tag:yaml.org,2002:binary",
      /**
       * Returns a Buffer in node and an Uint8Array in browsers
       *
       * To use the resulting buffer as an image, you'll want to do something like:
       *
       *   const blob = new Blob([buffer], { type: 'image/jpeg' })
       *   document.querySelector('#photo').src = URL.createObjectURL(blob)
       */
      resolve(src, onError) {
        if (typeof node_buffer.Buffer === "function") {
          return node_buffer.Buffer.from(src, "base64");
        } else if (typeof atob === "function") {
          const str = atob(src.replace(/[\n\r]/g, ""));
          const buffer = new Uint8Array(str.length);
          for (let i = 0; i < str.length; ++i)
            buffer[i] = str.charCodeAt(i);
          return buffer;
        } else {
          onError("This environment does not support reading binary tags; either Buffer or atob is required");
          return src;
        }
      },
      stringify({ comment, type, value }, ctx, onComment, onChompKeep) {
        if (!value)
          return "";
        const buf = value;
        let str;
        if (typeof node_buffer.Buffer === "function") {
          str = buf instanceof node_buffer.Buffer ? buf.toString("base64") : node_buffer.Buffer.from(buf.buffer).toString("base64");
        } else if (typeof btoa === "function") {
          let s = "";
          for (let i = 0; i < buf.length; ++i)
            s += String.fromCharCode(buf[i]);
          str = btoa(s);
        } else {
          throw new Error("This environment does not support writing binary tags; either Buffer or btoa is required");
        }
        type ?? (type = Scalar.Scalar.BLOCK_LITERAL);
        if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
          const lineWidth = Math.max(ctx.options.lineWidth - ctx.indent.length, ctx.options.minContentWidth);
          const n = Math.ceil(str.length / lineWidth);
          const lines = new Array(n);
          for (let i = 0, o = 0; i < n; ++i, o += lineWidth) {
            lines[i] = str.substr(o, lineWidth);
          }
          str = lines.join(type === Scalar.Scalar.BLOCK_LITERAL ? "\n" : " ");
        }
        return stringifyString.stringifyString({ comment, type, value: str }, ctx, onComment, onChompKeep);
      }
    };
    exports.binary = binary;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/pairs.js
var require_pairs = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/pairs.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Pair = require_Pair();
    var Scalar = require_Scalar();
    var YAMLSeq = require_YAMLSeq();
    function resolvePairs(seq, onError) {
      if (identity.isSeq(seq)) {
        for (let i = 0; i < seq.items.length; ++i) {
          let item = seq.items[i];
          if (identity.isPair(item))
            continue;
          else if (identity.isMap(item)) {
            if (item.items.length > 1)
              onError("Each pair must have its own sequence indicator");
            const pair = item.items[0] || new Pair.Pair(new Scalar.Scalar(null));
            if (item.commentBefore)
              pair.key.commentBefore = pair.key.commentBefore ? `${item.commentBefore}
${pair.key.commentBefore}` : item.commentBefore;
            if (item.comment) {
              const cn = pair.value ?? pair.key;
              cn.comment = cn.comment ? `${item.comment}
${cn.comment}` : item.comment;
            }
            item = pair;
          }
          seq.items[i] = identity.isPair(item) ? item : new Pair.Pair(item);
        }
      } else
        onError("Expected a sequence for this tag");
      return seq;
    }
    function createPairs(schema, iterable, ctx) {
      const { replacer } = ctx;
      const pairs2 = new YAMLSeq.YAMLSeq(schema);
      pairs2.tag = "tag:yaml.org,2002:pairs";
      let i = 0;
      if (iterable && Symbol.iterator in Object(iterable))
        for (let it of iterable) {
          if (typeof replacer === "function")
            it = replacer.call(iterable, String(i++), it);
          let key, value;
          if (Array.isArray(it)) {
            if (it.length === 2) {
              key = it[0];
              value = it[1];
            } else
              throw new TypeError(`Expected [key, value] tuple: ${it}`);
          } else if (it && it instanceof Object) {
            const keys = Object.keys(it);
            if (keys.length === 1) {
              key = keys[0];
              value = it[key];
            } else {
              throw new TypeError(`Expected tuple with one key, not ${keys.length} keys`);
            }
          } else {
            key = it;
          }
          pairs2.items.push(Pair.createPair(key, value, ctx));
        }
      return pairs2;
    }
    var pairs = {
      collection: "seq",
      default: false,
      tag: "tag:yaml.org,2002:pairs",
      resolve: resolvePairs,
      createNode: createPairs
    };
    exports.createPairs = createPairs;
    exports.pairs = pairs;
    exports.resolvePairs = resolvePairs;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/omap.js
var require_omap = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/omap.js"(exports) {
    "use strict";
    var identity = require_identity();
    var toJS = require_toJS();
    var YAMLMap = require_YAMLMap();
    var YAMLSeq = require_YAMLSeq();
    var pairs = require_pairs();
    var YAMLOMap = class _YAMLOMap extends YAMLSeq.YAMLSeq {
      constructor() {
        super();
        this.add = YAMLMap.YAMLMap.prototype.add.bind(this);
        this.delete = YAMLMap.YAMLMap.prototype.delete.bind(this);
        this.get = YAMLMap.YAMLMap.prototype.get.bind(this);
        this.has = YAMLMap.YAMLMap.prototype.has.bind(this);
        this.set = YAMLMap.YAMLMap.prototype.set.bind(this);
        this.tag = _YAMLOMap.tag;
      }
      /**
       * If `ctx` is given, the return type is actually `Map<unknown, unknown>`,
       * but TypeScript won't allow widening the signature of a child method.
       */
      toJSON(_, ctx) {
        if (!ctx)
          return super.toJSON(_);
        const map = /* @__PURE__ */ new Map();
        if (ctx?.onCreate)
          ctx.onCreate(map);
        for (const pair of this.items) {
          let key, value;
          if (identity.isPair(pair)) {
            key = toJS.toJS(pair.key, "", ctx);
            value = toJS.toJS(pair.value, key, ctx);
          } else {
            key = toJS.toJS(pair, "", ctx);
          }
          if (map.has(key))
            throw new Error("Ordered maps must not include duplicate keys");
          map.set(key, value);
        }
        return map;
      }
      static from(schema, iterable, ctx) {
        const pairs$1 = pairs.createPairs(schema, iterable, ctx);
        const omap2 = new this();
        omap2.items = pairs$1.items;
        return omap2;
      }
    };
    YAMLOMap.tag = "tag:yaml.org,2002:omap";
    var omap = {
      collection: "seq",
      identify: (value) => value instanceof Map,
      nodeClass: YAMLOMap,
      default: false,
      tag: "tag:yaml.org,2002:omap",
      resolve(seq, onError) {
        const pairs$1 = pairs.resolvePairs(seq, onError);
        const seenKeys = [];
        for (const { key } of pairs$1.items) {
          if (identity.isScalar(key)) {
            if (seenKeys.includes(key.value)) {
              onError(`Ordered maps must not include duplicate keys: ${key.value}`);
            } else {
              seenKeys.push(key.value);
            }
          }
        }
        return Object.assign(new YAMLOMap(), pairs$1);
      },
      createNode: (schema, iterable, ctx) => YAMLOMap.from(schema, iterable, ctx)
    };
    exports.YAMLOMap = YAMLOMap;
    exports.omap = omap;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/bool.js
var require_bool2 = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/bool.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    function boolStringify({ value, source }, ctx) {
      const boolObj = value ? trueTag : falseTag;
      if (source && boolObj.test.test(source))
        return source;
      return value ? ctx.options.trueStr : ctx.options.falseStr;
    }
    var trueTag = {
      identify: (value) => value === true,
      default: true,
      tag: "tag:yaml.org,2002:bool",
      test: /^(?:Y|y|[Yy]es|YES|[Tt]rue|TRUE|[Oo]n|ON)$/,
      resolve: () => new Scalar.Scalar(true),
      stringify: boolStringify
    };
    var falseTag = {
      identify: (value) => value === false,
      default: true,
      tag: "tag:yaml.org,2002:bool",
      test: /^(?:N|n|[Nn]o|NO|[Ff]alse|FALSE|[Oo]ff|OFF)$/,
      resolve: () => new Scalar.Scalar(false),
      stringify: boolStringify
    };
    exports.falseTag = falseTag;
    exports.trueTag = trueTag;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/float.js
var require_float2 = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/float.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var stringifyNumber = require_stringifyNumber();
    var floatNaN = {
      identify: (value) => typeof value === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
      resolve: (str) => str.slice(-3).toLowerCase() === "nan" ? NaN : str[0] === "-" ? Number.NEGATIVE_INFINITY : Number.POSITIVE_INFINITY,
      stringify: stringifyNumber.stringifyNumber
    };
    var floatExp = {
      identify: (value) => typeof value === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      format: "EXP",
      test: /^[-+]?(?:[0-9][0-9_]*)?(?:\.[0-9_]*)?[eE][-+]?[0-9]+$/,
      resolve: (str) => parseFloat(str.replace(/_/g, "")),
      stringify(node) {
        const num2 = Number(node.value);
        return isFinite(num2) ? num2.toExponential() : stringifyNumber.stringifyNumber(node);
      }
    };
    var float = {
      identify: (value) => typeof value === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      test: /^[-+]?(?:[0-9][0-9_]*)?\.[0-9_]*$/,
      resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str.replace(/_/g, "")));
        const dot2 = str.indexOf(".");
        if (dot2 !== -1) {
          const f = str.substring(dot2 + 1).replace(/_/g, "");
          if (f[f.length - 1] === "0")
            node.minFractionDigits = f.length;
        }
        return node;
      },
      stringify: stringifyNumber.stringifyNumber
    };
    exports.float = float;
    exports.floatExp = floatExp;
    exports.floatNaN = floatNaN;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/int.js
var require_int2 = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/int.js"(exports) {
    "use strict";
    var stringifyNumber = require_stringifyNumber();
    var intIdentify = (value) => typeof value === "bigint" || Number.isInteger(value);
    function intResolve(str, offset, radix, { intAsBigInt }) {
      const sign2 = str[0];
      if (sign2 === "-" || sign2 === "+")
        offset += 1;
      str = str.substring(offset).replace(/_/g, "");
      if (intAsBigInt) {
        switch (radix) {
          case 2:
            str = `0b${str}`;
            break;
          case 8:
            str = `0o${str}`;
            break;
          case 16:
            str = `0x${str}`;
            break;
        }
        const n2 = BigInt(str);
        return sign2 === "-" ? BigInt(-1) * n2 : n2;
      }
      const n = parseInt(str, radix);
      return sign2 === "-" ? -1 * n : n;
    }
    function intStringify(node, radix, prefix) {
      const { value } = node;
      if (intIdentify(value)) {
        const str = value.toString(radix);
        return value < 0 ? "-" + prefix + str.substr(1) : prefix + str;
      }
      return stringifyNumber.stringifyNumber(node);
    }
    var intBin = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "BIN",
      test: /^[-+]?0b[0-1_]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 2, 2, opt),
      stringify: (node) => intStringify(node, 2, "0b")
    };
    var intOct = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "OCT",
      test: /^[-+]?0[0-7_]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 1, 8, opt),
      stringify: (node) => intStringify(node, 8, "0")
    };
    var int = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      test: /^[-+]?[0-9][0-9_]*$/,
      resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
      stringify: stringifyNumber.stringifyNumber
    };
    var intHex = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "HEX",
      test: /^[-+]?0x[0-9a-fA-F_]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
      stringify: (node) => intStringify(node, 16, "0x")
    };
    exports.int = int;
    exports.intBin = intBin;
    exports.intHex = intHex;
    exports.intOct = intOct;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/set.js
var require_set = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/set.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Pair = require_Pair();
    var YAMLMap = require_YAMLMap();
    var YAMLSet = class _YAMLSet extends YAMLMap.YAMLMap {
      constructor(schema) {
        super(schema);
        this.tag = _YAMLSet.tag;
      }
      add(key) {
        let pair;
        if (identity.isPair(key))
          pair = key;
        else if (key && typeof key === "object" && "key" in key && "value" in key && key.value === null)
          pair = new Pair.Pair(key.key, null);
        else
          pair = new Pair.Pair(key, null);
        const prev = YAMLMap.findPair(this.items, pair.key);
        if (!prev)
          this.items.push(pair);
      }
      /**
       * If `keepPair` is `true`, returns the Pair matching `key`.
       * Otherwise, returns the value of that Pair's key.
       */
      get(key, keepPair) {
        const pair = YAMLMap.findPair(this.items, key);
        return !keepPair && identity.isPair(pair) ? identity.isScalar(pair.key) ? pair.key.value : pair.key : pair;
      }
      set(key, value) {
        if (typeof value !== "boolean")
          throw new Error(`Expected boolean value for set(key, value) in a YAML set, not ${typeof value}`);
        const prev = YAMLMap.findPair(this.items, key);
        if (prev && !value) {
          this.items.splice(this.items.indexOf(prev), 1);
        } else if (!prev && value) {
          this.items.push(new Pair.Pair(key));
        }
      }
      toJSON(_, ctx) {
        return super.toJSON(_, ctx, Set);
      }
      toString(ctx, onComment, onChompKeep) {
        if (!ctx)
          return JSON.stringify(this);
        if (this.hasAllNullValues(true))
          return super.toString(Object.assign({}, ctx, { allNullValues: true }), onComment, onChompKeep);
        else
          throw new Error("Set items must all have null values");
      }
      static from(schema, iterable, ctx) {
        const { replacer } = ctx;
        const set2 = new this(schema);
        if (iterable && Symbol.iterator in Object(iterable))
          for (let value of iterable) {
            if (typeof replacer === "function")
              value = replacer.call(iterable, value, value);
            set2.items.push(Pair.createPair(value, null, ctx));
          }
        return set2;
      }
    };
    YAMLSet.tag = "tag:yaml.org,2002:set";
    var set = {
      collection: "map",
      identify: (value) => value instanceof Set,
      nodeClass: YAMLSet,
      default: false,
      tag: "tag:yaml.org,2002:set",
      createNode: (schema, iterable, ctx) => YAMLSet.from(schema, iterable, ctx),
      resolve(map, onError) {
        if (identity.isMap(map)) {
          if (map.hasAllNullValues(true))
            return Object.assign(new YAMLSet(), map);
          else
            onError("Set items must all have null values");
        } else
          onError("Expected a mapping for this tag");
        return map;
      }
    };
    exports.YAMLSet = YAMLSet;
    exports.set = set;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/timestamp.js
var require_timestamp = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/timestamp.js"(exports) {
    "use strict";
    var stringifyNumber = require_stringifyNumber();
    function parseSexagesimal(str, asBigInt) {
      const sign2 = str[0];
      const parts = sign2 === "-" || sign2 === "+" ? str.substring(1) : str;
      const num2 = (n) => asBigInt ? BigInt(n) : Number(n);
      const res = parts.replace(/_/g, "").split(":").reduce((res2, p) => res2 * num2(60) + num2(p), num2(0));
      return sign2 === "-" ? num2(-1) * res : res;
    }
    function stringifySexagesimal(node) {
      let { value } = node;
      let num2 = (n) => n;
      if (typeof value === "bigint")
        num2 = (n) => BigInt(n);
      else if (isNaN(value) || !isFinite(value))
        return stringifyNumber.stringifyNumber(node);
      let sign2 = "";
      if (value < 0) {
        sign2 = "-";
        value *= num2(-1);
      }
      const _60 = num2(60);
      const parts = [value % _60];
      if (value < 60) {
        parts.unshift(0);
      } else {
        value = (value - parts[0]) / _60;
        parts.unshift(value % _60);
        if (value >= 60) {
          value = (value - parts[0]) / _60;
          parts.unshift(value);
        }
      }
      return sign2 + parts.map((n) => String(n).padStart(2, "0")).join(":").replace(/000000\d*$/, "");
    }
    var intTime = {
      identify: (value) => typeof value === "bigint" || Number.isInteger(value),
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "TIME",
      test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+$/,
      resolve: (str, _onError, { intAsBigInt }) => parseSexagesimal(str, intAsBigInt),
      stringify: stringifySexagesimal
    };
    var floatTime = {
      identify: (value) => typeof value === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      format: "TIME",
      test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+\.[0-9_]*$/,
      resolve: (str) => parseSexagesimal(str, false),
      stringify: stringifySexagesimal
    };
    var timestamp = {
      identify: (value) => value instanceof Date,
      default: true,
      tag: "tag:yaml.org,2002:timestamp",
      // If the time zone is omitted, the timestamp is assumed to be specified in UTC. The time part
      // may be omitted altogether, resulting in a date format. In such a case, the time part is
      // assumed to be 00:00:00Z (start of day, UTC).
      test: RegExp("^([0-9]{4})-([0-9]{1,2})-([0-9]{1,2})(?:(?:t|T|[ \\t]+)([0-9]{1,2}):([0-9]{1,2}):([0-9]{1,2}(\\.[0-9]+)?)(?:[ \\t]*(Z|[-+][012]?[0-9](?::[0-9]{2})?))?)?$"),
      resolve(str) {
        const match = str.match(timestamp.test);
        if (!match)
          throw new Error("!!timestamp expects a date, starting with yyyy-mm-dd");
        const [, year, month, day, hour, minute, second] = match.map(Number);
        const millisec = match[7] ? Number((match[7] + "00").substr(1, 3)) : 0;
        let date = Date.UTC(year, month - 1, day, hour || 0, minute || 0, second || 0, millisec);
        const tz = match[8];
        if (tz && tz !== "Z") {
          let d = parseSexagesimal(tz, false);
          if (Math.abs(d) < 30)
            d *= 60;
          date -= 6e4 * d;
        }
        return new Date(date);
      },
      stringify: ({ value }) => value?.toISOString().replace(/(T00:00:00)?\.000Z$/, "") ?? ""
    };
    exports.floatTime = floatTime;
    exports.intTime = intTime;
    exports.timestamp = timestamp;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/schema.js
var require_schema3 = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/schema.js"(exports) {
    "use strict";
    var map = require_map();
    var _null = require_null();
    var seq = require_seq();
    var string = require_string();
    var binary = require_binary();
    var bool = require_bool2();
    var float = require_float2();
    var int = require_int2();
    var merge = require_merge();
    var omap = require_omap();
    var pairs = require_pairs();
    var set = require_set();
    var timestamp = require_timestamp();
    var schema = [
      map.map,
      seq.seq,
      string.string,
      _null.nullTag,
      bool.trueTag,
      bool.falseTag,
      int.intBin,
      int.intOct,
      int.int,
      int.intHex,
      float.floatNaN,
      float.floatExp,
      float.float,
      binary.binary,
      merge.merge,
      omap.omap,
      pairs.pairs,
      set.set,
      timestamp.intTime,
      timestamp.floatTime,
      timestamp.timestamp
    ];
    exports.schema = schema;
  }
});

// node_modules/yaml/dist/schema/tags.js
var require_tags = __commonJS({
  "node_modules/yaml/dist/schema/tags.js"(exports) {
    "use strict";
    var map = require_map();
    var _null = require_null();
    var seq = require_seq();
    var string = require_string();
    var bool = require_bool();
    var float = require_float();
    var int = require_int();
    var schema = require_schema();
    var schema$1 = require_schema2();
    var binary = require_binary();
    var merge = require_merge();
    var omap = require_omap();
    var pairs = require_pairs();
    var schema$2 = require_schema3();
    var set = require_set();
    var timestamp = require_timestamp();
    var schemas = /* @__PURE__ */ new Map([
      ["core", schema.schema],
      ["failsafe", [map.map, seq.seq, string.string]],
      ["json", schema$1.schema],
      ["yaml11", schema$2.schema],
      ["yaml-1.1", schema$2.schema]
    ]);
    var tagsByName = {
      binary: binary.binary,
      bool: bool.boolTag,
      float: float.float,
      floatExp: float.floatExp,
      floatNaN: float.floatNaN,
      floatTime: timestamp.floatTime,
      int: int.int,
      intHex: int.intHex,
      intOct: int.intOct,
      intTime: timestamp.intTime,
      map: map.map,
      merge: merge.merge,
      null: _null.nullTag,
      omap: omap.omap,
      pairs: pairs.pairs,
      seq: seq.seq,
      set: set.set,
      timestamp: timestamp.timestamp
    };
    var coreKnownTags = {
      "tag:yaml.org,2002:binary": binary.binary,
      "tag:yaml.org,2002:merge": merge.merge,
      "tag:yaml.org,2002:omap": omap.omap,
      "tag:yaml.org,2002:pairs": pairs.pairs,
      "tag:yaml.org,2002:set": set.set,
      "tag:yaml.org,2002:timestamp": timestamp.timestamp
    };
    function getTags(customTags, schemaName, addMergeTag) {
      const schemaTags = schemas.get(schemaName);
      if (schemaTags && !customTags) {
        return addMergeTag && !schemaTags.includes(merge.merge) ? schemaTags.concat(merge.merge) : schemaTags.slice();
      }
      let tags = schemaTags;
      if (!tags) {
        if (Array.isArray(customTags))
          tags = [];
        else {
          const keys = Array.from(schemas.keys()).filter((key) => key !== "yaml11").map((key) => JSON.stringify(key)).join(", ");
          throw new Error(`Unknown schema "${schemaName}"; use one of ${keys} or define customTags array`);
        }
      }
      if (Array.isArray(customTags)) {
        for (const tag of customTags)
          tags = tags.concat(tag);
      } else if (typeof customTags === "function") {
        tags = customTags(tags.slice());
      }
      if (addMergeTag)
        tags = tags.concat(merge.merge);
      return tags.reduce((tags2, tag) => {
        const tagObj = typeof tag === "string" ? tagsByName[tag] : tag;
        if (!tagObj) {
          const tagName = JSON.stringify(tag);
          const keys = Object.keys(tagsByName).map((key) => JSON.stringify(key)).join(", ");
          throw new Error(`Unknown custom tag ${tagName}; use one of ${keys}`);
        }
        if (!tags2.includes(tagObj))
          tags2.push(tagObj);
        return tags2;
      }, []);
    }
    exports.coreKnownTags = coreKnownTags;
    exports.getTags = getTags;
  }
});

// node_modules/yaml/dist/schema/Schema.js
var require_Schema = __commonJS({
  "node_modules/yaml/dist/schema/Schema.js"(exports) {
    "use strict";
    var identity = require_identity();
    var map = require_map();
    var seq = require_seq();
    var string = require_string();
    var tags = require_tags();
    var sortMapEntriesByKey = (a, b) => a.key < b.key ? -1 : a.key > b.key ? 1 : 0;
    var Schema = class _Schema {
      constructor({ compat, customTags, merge, resolveKnownTags, schema, sortMapEntries, toStringDefaults }) {
        this.compat = Array.isArray(compat) ? tags.getTags(compat, "compat") : compat ? tags.getTags(null, compat) : null;
        this.name = typeof schema === "string" && schema || "core";
        this.knownTags = resolveKnownTags ? tags.coreKnownTags : {};
        this.tags = tags.getTags(customTags, this.name, merge);
        this.toStringOptions = toStringDefaults ?? null;
        Object.defineProperty(this, identity.MAP, { value: map.map });
        Object.defineProperty(this, identity.SCALAR, { value: string.string });
        Object.defineProperty(this, identity.SEQ, { value: seq.seq });
        this.sortMapEntries = typeof sortMapEntries === "function" ? sortMapEntries : sortMapEntries === true ? sortMapEntriesByKey : null;
      }
      clone() {
        const copy = Object.create(_Schema.prototype, Object.getOwnPropertyDescriptors(this));
        copy.tags = this.tags.slice();
        return copy;
      }
    };
    exports.Schema = Schema;
  }
});

// node_modules/yaml/dist/stringify/stringifyDocument.js
var require_stringifyDocument = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyDocument.js"(exports) {
    "use strict";
    var identity = require_identity();
    var stringify = require_stringify();
    var stringifyComment = require_stringifyComment();
    function stringifyDocument(doc, options) {
      const lines = [];
      let hasDirectives = options.directives === true;
      if (options.directives !== false && doc.directives) {
        const dir = doc.directives.toString(doc);
        if (dir) {
          lines.push(dir);
          hasDirectives = true;
        } else if (doc.directives.docStart)
          hasDirectives = true;
      }
      if (hasDirectives)
        lines.push("---");
      const ctx = stringify.createStringifyContext(doc, options);
      const { commentString } = ctx.options;
      if (doc.commentBefore) {
        if (lines.length !== 1)
          lines.unshift("");
        const cs = commentString(doc.commentBefore);
        lines.unshift(stringifyComment.indentComment(cs, ""));
      }
      let chompKeep = false;
      let contentComment = null;
      if (doc.contents) {
        if (identity.isNode(doc.contents)) {
          if (doc.contents.spaceBefore && hasDirectives)
            lines.push("");
          if (doc.contents.commentBefore) {
            const cs = commentString(doc.contents.commentBefore);
            lines.push(stringifyComment.indentComment(cs, ""));
          }
          ctx.forceBlockIndent = !!doc.comment;
          contentComment = doc.contents.comment;
        }
        const onChompKeep = contentComment ? void 0 : () => chompKeep = true;
        let body = stringify.stringify(doc.contents, ctx, () => contentComment = null, onChompKeep);
        if (contentComment)
          body += stringifyComment.lineComment(body, "", commentString(contentComment));
        if ((body[0] === "|" || body[0] === ">") && lines[lines.length - 1] === "---") {
          lines[lines.length - 1] = `--- ${body}`;
        } else
          lines.push(body);
      } else {
        lines.push(stringify.stringify(doc.contents, ctx));
      }
      if (doc.directives?.docEnd) {
        if (doc.comment) {
          const cs = commentString(doc.comment);
          if (cs.includes("\n")) {
            lines.push("...");
            lines.push(stringifyComment.indentComment(cs, ""));
          } else {
            lines.push(`... ${cs}`);
          }
        } else {
          lines.push("...");
        }
      } else {
        let dc = doc.comment;
        if (dc && chompKeep)
          dc = dc.replace(/^\n+/, "");
        if (dc) {
          if ((!chompKeep || contentComment) && lines[lines.length - 1] !== "")
            lines.push("");
          lines.push(stringifyComment.indentComment(commentString(dc), ""));
        }
      }
      return lines.join("\n") + "\n";
    }
    exports.stringifyDocument = stringifyDocument;
  }
});

// node_modules/yaml/dist/doc/Document.js
var require_Document = __commonJS({
  "node_modules/yaml/dist/doc/Document.js"(exports) {
    "use strict";
    var Alias = require_Alias();
    var Collection = require_Collection();
    var identity = require_identity();
    var Pair = require_Pair();
    var toJS = require_toJS();
    var Schema = require_Schema();
    var stringifyDocument = require_stringifyDocument();
    var anchors = require_anchors();
    var applyReviver = require_applyReviver();
    var createNode = require_createNode();
    var directives = require_directives();
    var Document = class _Document {
      constructor(value, replacer, options) {
        this.commentBefore = null;
        this.comment = null;
        this.errors = [];
        this.warnings = [];
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.DOC });
        let _replacer = null;
        if (typeof replacer === "function" || Array.isArray(replacer)) {
          _replacer = replacer;
        } else if (options === void 0 && replacer) {
          options = replacer;
          replacer = void 0;
        }
        const opt = Object.assign({
          intAsBigInt: false,
          keepSourceTokens: false,
          logLevel: "warn",
          prettyErrors: true,
          strict: true,
          stringKeys: false,
          uniqueKeys: true,
          version: "1.2"
        }, options);
        this.options = opt;
        let { version } = opt;
        if (options?._directives) {
          this.directives = options._directives.atDocument();
          if (this.directives.yaml.explicit)
            version = this.directives.yaml.version;
        } else
          this.directives = new directives.Directives({ version });
        this.setSchema(version, options);
        this.contents = value === void 0 ? null : this.createNode(value, _replacer, options);
      }
      /**
       * Create a deep copy of this Document and its contents.
       *
       * Custom Node values that inherit from `Object` still refer to their original instances.
       */
      clone() {
        const copy = Object.create(_Document.prototype, {
          [identity.NODE_TYPE]: { value: identity.DOC }
        });
        copy.commentBefore = this.commentBefore;
        copy.comment = this.comment;
        copy.errors = this.errors.slice();
        copy.warnings = this.warnings.slice();
        copy.options = Object.assign({}, this.options);
        if (this.directives)
          copy.directives = this.directives.clone();
        copy.schema = this.schema.clone();
        copy.contents = identity.isNode(this.contents) ? this.contents.clone(copy.schema) : this.contents;
        if (this.range)
          copy.range = this.range.slice();
        return copy;
      }
      /** Adds a value to the document. */
      add(value) {
        if (assertCollection(this.contents))
          this.contents.add(value);
      }
      /** Adds a value to the document. */
      addIn(path, value) {
        if (assertCollection(this.contents))
          this.contents.addIn(path, value);
      }
      /**
       * Create a new `Alias` node, ensuring that the target `node` has the required anchor.
       *
       * If `node` already has an anchor, `name` is ignored.
       * Otherwise, the `node.anchor` value will be set to `name`,
       * or if an anchor with that name is already present in the document,
       * `name` will be used as a prefix for a new unique anchor.
       * If `name` is undefined, the generated anchor will use 'a' as a prefix.
       */
      createAlias(node, name) {
        if (!node.anchor) {
          const prev = anchors.anchorNames(this);
          node.anchor = // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
          !name || prev.has(name) ? anchors.findNewAnchor(name || "a", prev) : name;
        }
        return new Alias.Alias(node.anchor);
      }
      createNode(value, replacer, options) {
        let _replacer = void 0;
        if (typeof replacer === "function") {
          value = replacer.call({ "": value }, "", value);
          _replacer = replacer;
        } else if (Array.isArray(replacer)) {
          const keyToStr = (v) => typeof v === "number" || v instanceof String || v instanceof Number;
          const asStr = replacer.filter(keyToStr).map(String);
          if (asStr.length > 0)
            replacer = replacer.concat(asStr);
          _replacer = replacer;
        } else if (options === void 0 && replacer) {
          options = replacer;
          replacer = void 0;
        }
        const { aliasDuplicateObjects, anchorPrefix, flow, keepUndefined, onTagObj, tag } = options ?? {};
        const { onAnchor, setAnchors, sourceObjects } = anchors.createNodeAnchors(
          this,
          // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
          anchorPrefix || "a"
        );
        const ctx = {
          aliasDuplicateObjects: aliasDuplicateObjects ?? true,
          keepUndefined: keepUndefined ?? false,
          onAnchor,
          onTagObj,
          replacer: _replacer,
          schema: this.schema,
          sourceObjects
        };
        const node = createNode.createNode(value, tag, ctx);
        if (flow && identity.isCollection(node))
          node.flow = true;
        setAnchors();
        return node;
      }
      /**
       * Convert a key and a value into a `Pair` using the current schema,
       * recursively wrapping all values as `Scalar` or `Collection` nodes.
       */
      createPair(key, value, options = {}) {
        const k = this.createNode(key, null, options);
        const v = this.createNode(value, null, options);
        return new Pair.Pair(k, v);
      }
      /**
       * Removes a value from the document.
       * @returns `true` if the item was found and removed.
       */
      delete(key) {
        return assertCollection(this.contents) ? this.contents.delete(key) : false;
      }
      /**
       * Removes a value from the document.
       * @returns `true` if the item was found and removed.
       */
      deleteIn(path) {
        if (Collection.isEmptyPath(path)) {
          if (this.contents == null)
            return false;
          this.contents = null;
          return true;
        }
        return assertCollection(this.contents) ? this.contents.deleteIn(path) : false;
      }
      /**
       * Returns item at `key`, or `undefined` if not found. By default unwraps
       * scalar values from their surrounding node; to disable set `keepScalar` to
       * `true` (collections are always returned intact).
       */
      get(key, keepScalar) {
        return identity.isCollection(this.contents) ? this.contents.get(key, keepScalar) : void 0;
      }
      /**
       * Returns item at `path`, or `undefined` if not found. By default unwraps
       * scalar values from their surrounding node; to disable set `keepScalar` to
       * `true` (collections are always returned intact).
       */
      getIn(path, keepScalar) {
        if (Collection.isEmptyPath(path))
          return !keepScalar && identity.isScalar(this.contents) ? this.contents.value : this.contents;
        return identity.isCollection(this.contents) ? this.contents.getIn(path, keepScalar) : void 0;
      }
      /**
       * Checks if the document includes a value with the key `key`.
       */
      has(key) {
        return identity.isCollection(this.contents) ? this.contents.has(key) : false;
      }
      /**
       * Checks if the document includes a value at `path`.
       */
      hasIn(path) {
        if (Collection.isEmptyPath(path))
          return this.contents !== void 0;
        return identity.isCollection(this.contents) ? this.contents.hasIn(path) : false;
      }
      /**
       * Sets a value in this document. For `!!set`, `value` needs to be a
       * boolean to add/remove the item from the set.
       */
      set(key, value) {
        if (this.contents == null) {
          this.contents = Collection.collectionFromPath(this.schema, [key], value);
        } else if (assertCollection(this.contents)) {
          this.contents.set(key, value);
        }
      }
      /**
       * Sets a value in this document. For `!!set`, `value` needs to be a
       * boolean to add/remove the item from the set.
       */
      setIn(path, value) {
        if (Collection.isEmptyPath(path)) {
          this.contents = value;
        } else if (this.contents == null) {
          this.contents = Collection.collectionFromPath(this.schema, Array.from(path), value);
        } else if (assertCollection(this.contents)) {
          this.contents.setIn(path, value);
        }
      }
      /**
       * Change the YAML version and schema used by the document.
       * A `null` version disables support for directives, explicit tags, anchors, and aliases.
       * It also requires the `schema` option to be given as a `Schema` instance value.
       *
       * Overrides all previously set schema options.
       */
      setSchema(version, options = {}) {
        if (typeof version === "number")
          version = String(version);
        let opt;
        switch (version) {
          case "1.1":
            if (this.directives)
              this.directives.yaml.version = "1.1";
            else
              this.directives = new directives.Directives({ version: "1.1" });
            opt = { resolveKnownTags: false, schema: "yaml-1.1" };
            break;
          case "1.2":
          case "next":
            if (this.directives)
              this.directives.yaml.version = version;
            else
              this.directives = new directives.Directives({ version });
            opt = { resolveKnownTags: true, schema: "core" };
            break;
          case null:
            if (this.directives)
              delete this.directives;
            opt = null;
            break;
          default: {
            const sv = JSON.stringify(version);
            throw new Error(`Expected '1.1', '1.2' or null as first argument, but found: ${sv}`);
          }
        }
        if (options.schema instanceof Object)
          this.schema = options.schema;
        else if (opt)
          this.schema = new Schema.Schema(Object.assign(opt, options));
        else
          throw new Error(`With a null YAML version, the { schema: Schema } option is required`);
      }
      // json & jsonArg are only used from toJSON()
      toJS({ json, jsonArg, mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        const ctx = {
          anchors: /* @__PURE__ */ new Map(),
          doc: this,
          keep: !json,
          mapAsMap: mapAsMap === true,
          mapKeyWarned: false,
          maxAliasCount: typeof maxAliasCount === "number" ? maxAliasCount : 100
        };
        const res = toJS.toJS(this.contents, jsonArg ?? "", ctx);
        if (typeof onAnchor === "function")
          for (const { count, res: res2 } of ctx.anchors.values())
            onAnchor(res2, count);
        return typeof reviver === "function" ? applyReviver.applyReviver(reviver, { "": res }, "", res) : res;
      }
      /**
       * A JSON representation of the document `contents`.
       *
       * @param jsonArg Used by `JSON.stringify` to indicate the array index or
       *   property name.
       */
      toJSON(jsonArg, onAnchor) {
        return this.toJS({ json: true, jsonArg, mapAsMap: false, onAnchor });
      }
      /** A YAML representation of the document. */
      toString(options = {}) {
        if (this.errors.length > 0)
          throw new Error("Document with errors cannot be stringified");
        if ("indent" in options && (!Number.isInteger(options.indent) || Number(options.indent) <= 0)) {
          const s = JSON.stringify(options.indent);
          throw new Error(`"indent" option must be a positive integer, not ${s}`);
        }
        return stringifyDocument.stringifyDocument(this, options);
      }
    };
    function assertCollection(contents) {
      if (identity.isCollection(contents))
        return true;
      throw new Error("Expected a YAML collection as document contents");
    }
    exports.Document = Document;
  }
});

// node_modules/yaml/dist/errors.js
var require_errors2 = __commonJS({
  "node_modules/yaml/dist/errors.js"(exports) {
    "use strict";
    var YAMLError = class extends Error {
      constructor(name, pos, code, message) {
        super();
        this.name = name;
        this.code = code;
        this.message = message;
        this.pos = pos;
      }
    };
    var YAMLParseError = class extends YAMLError {
      constructor(pos, code, message) {
        super("YAMLParseError", pos, code, message);
      }
    };
    var YAMLWarning = class extends YAMLError {
      constructor(pos, code, message) {
        super("YAMLWarning", pos, code, message);
      }
    };
    var prettifyError = (src, lc) => (error) => {
      if (error.pos[0] === -1)
        return;
      error.linePos = error.pos.map((pos) => lc.linePos(pos));
      const { line, col } = error.linePos[0];
      error.message += ` at line ${line}, column ${col}`;
      let ci = col - 1;
      let lineStr = src.substring(lc.lineStarts[line - 1], lc.lineStarts[line]).replace(/[\n\r]+$/, "");
      if (ci >= 60 && lineStr.length > 80) {
        const trimStart = Math.min(ci - 39, lineStr.length - 79);
        lineStr = "…" + lineStr.substring(trimStart);
        ci -= trimStart - 1;
      }
      if (lineStr.length > 80)
        lineStr = lineStr.substring(0, 79) + "…";
      if (line > 1 && /^ *$/.test(lineStr.substring(0, ci))) {
        let prev = src.substring(lc.lineStarts[line - 2], lc.lineStarts[line - 1]);
        if (prev.length > 80)
          prev = prev.substring(0, 79) + "…\n";
        lineStr = prev + lineStr;
      }
      if (/[^ ]/.test(lineStr)) {
        let count = 1;
        const end = error.linePos[1];
        if (end?.line === line && end.col > col) {
          count = Math.max(1, Math.min(end.col - col, 80 - ci));
        }
        const pointer = " ".repeat(ci) + "^".repeat(count);
        error.message += `:

${lineStr}
${pointer}
`;
      }
    };
    exports.YAMLError = YAMLError;
    exports.YAMLParseError = YAMLParseError;
    exports.YAMLWarning = YAMLWarning;
    exports.prettifyError = prettifyError;
  }
});

// node_modules/yaml/dist/compose/resolve-props.js
var require_resolve_props = __commonJS({
  "node_modules/yaml/dist/compose/resolve-props.js"(exports) {
    "use strict";
    function resolveProps(tokens, { flow, indicator, next, offset, onError, parentIndent, startOnNewline }) {
      let spaceBefore = false;
      let atNewline = startOnNewline;
      let hasSpace = startOnNewline;
      let comment = "";
      let commentSep = "";
      let hasNewline = false;
      let reqSpace = false;
      let tab = null;
      let anchor = null;
      let tag = null;
      let newlineAfterProp = null;
      let comma = null;
      let found = null;
      let start = null;
      for (const token of tokens) {
        if (reqSpace) {
          if (token.type !== "space" && token.type !== "newline" && token.type !== "comma")
            onError(token.offset, "MISSING_CHAR", "Tags and anchors must be separated from the next token by white space");
          reqSpace = false;
        }
        if (tab) {
          if (atNewline && token.type !== "comment" && token.type !== "newline") {
            onError(tab, "TAB_AS_INDENT", "Tabs are not allowed as indentation");
          }
          tab = null;
        }
        switch (token.type) {
          case "space":
            if (!flow && (indicator !== "doc-start" || next?.type !== "flow-collection") && token.source.includes("	")) {
              tab = token;
            }
            hasSpace = true;
            break;
          case "comment": {
            if (!hasSpace)
              onError(token, "MISSING_CHAR", "Comments must be separated from other tokens by white space characters");
            const cb = token.source.substring(1) || " ";
            if (!comment)
              comment = cb;
            else
              comment += commentSep + cb;
            commentSep = "";
            atNewline = false;
            break;
          }
          case "newline":
            if (atNewline) {
              if (comment)
                comment += token.source;
              else if (!found || indicator !== "seq-item-ind")
                spaceBefore = true;
            } else
              commentSep += token.source;
            atNewline = true;
            hasNewline = true;
            if (anchor || tag)
              newlineAfterProp = token;
            hasSpace = true;
            break;
          case "anchor":
            if (anchor)
              onError(token, "MULTIPLE_ANCHORS", "A node can have at most one anchor");
            if (token.source.endsWith(":"))
              onError(token.offset + token.source.length - 1, "BAD_ALIAS", "Anchor ending in : is ambiguous", true);
            anchor = token;
            start ?? (start = token.offset);
            atNewline = false;
            hasSpace = false;
            reqSpace = true;
            break;
          case "tag": {
            if (tag)
              onError(token, "MULTIPLE_TAGS", "A node can have at most one tag");
            tag = token;
            start ?? (start = token.offset);
            atNewline = false;
            hasSpace = false;
            reqSpace = true;
            break;
          }
          case indicator:
            if (anchor || tag)
              onError(token, "BAD_PROP_ORDER", `Anchors and tags must be after the ${token.source} indicator`);
            if (found)
              onError(token, "UNEXPECTED_TOKEN", `Unexpected ${token.source} in ${flow ?? "collection"}`);
            found = token;
            atNewline = indicator === "seq-item-ind" || indicator === "explicit-key-ind";
            hasSpace = false;
            break;
          case "comma":
            if (flow) {
              if (comma)
                onError(token, "UNEXPECTED_TOKEN", `Unexpected , in ${flow}`);
              comma = token;
              atNewline = false;
              hasSpace = false;
              break;
            }
          // else fallthrough
          default:
            onError(token, "UNEXPECTED_TOKEN", `Unexpected ${token.type} token`);
            atNewline = false;
            hasSpace = false;
        }
      }
      const last = tokens[tokens.length - 1];
      const end = last ? last.offset + last.source.length : offset;
      if (reqSpace && next && next.type !== "space" && next.type !== "newline" && next.type !== "comma" && (next.type !== "scalar" || next.source !== "")) {
        onError(next.offset, "MISSING_CHAR", "Tags and anchors must be separated from the next token by white space");
      }
      if (tab && (atNewline && tab.indent <= parentIndent || next?.type === "block-map" || next?.type === "block-seq"))
        onError(tab, "TAB_AS_INDENT", "Tabs are not allowed as indentation");
      return {
        comma,
        found,
        spaceBefore,
        comment,
        hasNewline,
        anchor,
        tag,
        newlineAfterProp,
        end,
        start: start ?? end
      };
    }
    exports.resolveProps = resolveProps;
  }
});

// node_modules/yaml/dist/compose/util-contains-newline.js
var require_util_contains_newline = __commonJS({
  "node_modules/yaml/dist/compose/util-contains-newline.js"(exports) {
    "use strict";
    function containsNewline(key) {
      if (!key)
        return null;
      switch (key.type) {
        case "alias":
        case "scalar":
        case "double-quoted-scalar":
        case "single-quoted-scalar":
          if (key.source.includes("\n"))
            return true;
          if (key.end) {
            for (const st of key.end)
              if (st.type === "newline")
                return true;
          }
          return false;
        case "flow-collection":
          for (const it of key.items) {
            for (const st of it.start)
              if (st.type === "newline")
                return true;
            if (it.sep) {
              for (const st of it.sep)
                if (st.type === "newline")
                  return true;
            }
            if (containsNewline(it.key) || containsNewline(it.value))
              return true;
          }
          return false;
        default:
          return true;
      }
    }
    exports.containsNewline = containsNewline;
  }
});

// node_modules/yaml/dist/compose/util-flow-indent-check.js
var require_util_flow_indent_check = __commonJS({
  "node_modules/yaml/dist/compose/util-flow-indent-check.js"(exports) {
    "use strict";
    var utilContainsNewline = require_util_contains_newline();
    function flowIndentCheck(indent, fc, onError) {
      if (fc?.type === "flow-collection") {
        const end = fc.end[0];
        if (end.indent === indent && (end.source === "]" || end.source === "}") && utilContainsNewline.containsNewline(fc)) {
          const msg = "Flow end indicator should be more indented than parent";
          onError(end, "BAD_INDENT", msg, true);
        }
      }
    }
    exports.flowIndentCheck = flowIndentCheck;
  }
});

// node_modules/yaml/dist/compose/util-map-includes.js
var require_util_map_includes = __commonJS({
  "node_modules/yaml/dist/compose/util-map-includes.js"(exports) {
    "use strict";
    var identity = require_identity();
    function mapIncludes(ctx, items, search) {
      const { uniqueKeys } = ctx.options;
      if (uniqueKeys === false)
        return false;
      const isEqual = typeof uniqueKeys === "function" ? uniqueKeys : (a, b) => a === b || identity.isScalar(a) && identity.isScalar(b) && a.value === b.value;
      return items.some((pair) => isEqual(pair.key, search));
    }
    exports.mapIncludes = mapIncludes;
  }
});

// node_modules/yaml/dist/compose/resolve-block-map.js
var require_resolve_block_map = __commonJS({
  "node_modules/yaml/dist/compose/resolve-block-map.js"(exports) {
    "use strict";
    var Pair = require_Pair();
    var YAMLMap = require_YAMLMap();
    var resolveProps = require_resolve_props();
    var utilContainsNewline = require_util_contains_newline();
    var utilFlowIndentCheck = require_util_flow_indent_check();
    var utilMapIncludes = require_util_map_includes();
    var startColMsg = "All mapping items must start at the same column";
    function resolveBlockMap({ composeNode, composeEmptyNode }, ctx, bm, onError, tag) {
      const NodeClass = tag?.nodeClass ?? YAMLMap.YAMLMap;
      const map = new NodeClass(ctx.schema);
      if (ctx.atRoot)
        ctx.atRoot = false;
      let offset = bm.offset;
      let commentEnd = null;
      for (const collItem of bm.items) {
        const { start, key, sep, value } = collItem;
        const keyProps = resolveProps.resolveProps(start, {
          indicator: "explicit-key-ind",
          next: key ?? sep?.[0],
          offset,
          onError,
          parentIndent: bm.indent,
          startOnNewline: true
        });
        const implicitKey = !keyProps.found;
        if (implicitKey) {
          if (key) {
            if (key.type === "block-seq")
              onError(offset, "BLOCK_AS_IMPLICIT_KEY", "A block sequence may not be used as an implicit map key");
            else if ("indent" in key && key.indent !== bm.indent)
              onError(offset, "BAD_INDENT", startColMsg);
          }
          if (!keyProps.anchor && !keyProps.tag && !sep) {
            commentEnd = keyProps.end;
            if (keyProps.comment) {
              if (map.comment)
                map.comment += "\n" + keyProps.comment;
              else
                map.comment = keyProps.comment;
            }
            continue;
          }
          if (keyProps.newlineAfterProp || utilContainsNewline.containsNewline(key)) {
            onError(key ?? start[start.length - 1], "MULTILINE_IMPLICIT_KEY", "Implicit keys need to be on a single line");
          }
        } else if (keyProps.found?.indent !== bm.indent) {
          onError(offset, "BAD_INDENT", startColMsg);
        }
        ctx.atKey = true;
        const keyStart = keyProps.end;
        const keyNode = key ? composeNode(ctx, key, keyProps, onError) : composeEmptyNode(ctx, keyStart, start, null, keyProps, onError);
        if (ctx.schema.compat)
          utilFlowIndentCheck.flowIndentCheck(bm.indent, key, onError);
        ctx.atKey = false;
        if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
          onError(keyStart, "DUPLICATE_KEY", "Map keys must be unique");
        const valueProps = resolveProps.resolveProps(sep ?? [], {
          indicator: "map-value-ind",
          next: value,
          offset: keyNode.range[2],
          onError,
          parentIndent: bm.indent,
          startOnNewline: !key || key.type === "block-scalar"
        });
        offset = valueProps.end;
        if (valueProps.found) {
          if (implicitKey) {
            if (value?.type === "block-map" && !valueProps.hasNewline)
              onError(offset, "BLOCK_AS_IMPLICIT_KEY", "Nested mappings are not allowed in compact mappings");
            if (ctx.options.strict && keyProps.start < valueProps.found.offset - 1024)
              onError(keyNode.range, "KEY_OVER_1024_CHARS", "The : indicator must be at most 1024 chars after the start of an implicit block mapping key");
          }
          const valueNode = value ? composeNode(ctx, value, valueProps, onError) : composeEmptyNode(ctx, offset, sep, null, valueProps, onError);
          if (ctx.schema.compat)
            utilFlowIndentCheck.flowIndentCheck(bm.indent, value, onError);
          offset = valueNode.range[2];
          const pair = new Pair.Pair(keyNode, valueNode);
          if (ctx.options.keepSourceTokens)
            pair.srcToken = collItem;
          map.items.push(pair);
        } else {
          if (implicitKey)
            onError(keyNode.range, "MISSING_CHAR", "Implicit map keys need to be followed by map values");
          if (valueProps.comment) {
            if (keyNode.comment)
              keyNode.comment += "\n" + valueProps.comment;
            else
              keyNode.comment = valueProps.comment;
          }
          const pair = new Pair.Pair(keyNode);
          if (ctx.options.keepSourceTokens)
            pair.srcToken = collItem;
          map.items.push(pair);
        }
      }
      if (commentEnd && commentEnd < offset)
        onError(commentEnd, "IMPOSSIBLE", "Map comment with trailing content");
      map.range = [bm.offset, offset, commentEnd ?? offset];
      return map;
    }
    exports.resolveBlockMap = resolveBlockMap;
  }
});

// node_modules/yaml/dist/compose/resolve-block-seq.js
var require_resolve_block_seq = __commonJS({
  "node_modules/yaml/dist/compose/resolve-block-seq.js"(exports) {
    "use strict";
    var YAMLSeq = require_YAMLSeq();
    var resolveProps = require_resolve_props();
    var utilFlowIndentCheck = require_util_flow_indent_check();
    function resolveBlockSeq({ composeNode, composeEmptyNode }, ctx, bs, onError, tag) {
      const NodeClass = tag?.nodeClass ?? YAMLSeq.YAMLSeq;
      const seq = new NodeClass(ctx.schema);
      if (ctx.atRoot)
        ctx.atRoot = false;
      if (ctx.atKey)
        ctx.atKey = false;
      let offset = bs.offset;
      let commentEnd = null;
      for (const { start, value } of bs.items) {
        const props = resolveProps.resolveProps(start, {
          indicator: "seq-item-ind",
          next: value,
          offset,
          onError,
          parentIndent: bs.indent,
          startOnNewline: true
        });
        if (!props.found) {
          if (props.anchor || props.tag || value) {
            if (value?.type === "block-seq")
              onError(props.end, "BAD_INDENT", "All sequence items must start at the same column");
            else
              onError(offset, "MISSING_CHAR", "Sequence item without - indicator");
          } else {
            commentEnd = props.end;
            if (props.comment)
              seq.comment = props.comment;
            continue;
          }
        }
        const node = value ? composeNode(ctx, value, props, onError) : composeEmptyNode(ctx, props.end, start, null, props, onError);
        if (ctx.schema.compat)
          utilFlowIndentCheck.flowIndentCheck(bs.indent, value, onError);
        offset = node.range[2];
        seq.items.push(node);
      }
      seq.range = [bs.offset, offset, commentEnd ?? offset];
      return seq;
    }
    exports.resolveBlockSeq = resolveBlockSeq;
  }
});

// node_modules/yaml/dist/compose/resolve-end.js
var require_resolve_end = __commonJS({
  "node_modules/yaml/dist/compose/resolve-end.js"(exports) {
    "use strict";
    function resolveEnd(end, offset, reqSpace, onError) {
      let comment = "";
      if (end) {
        let hasSpace = false;
        let sep = "";
        for (const token of end) {
          const { source, type } = token;
          switch (type) {
            case "space":
              hasSpace = true;
              break;
            case "comment": {
              if (reqSpace && !hasSpace)
                onError(token, "MISSING_CHAR", "Comments must be separated from other tokens by white space characters");
              const cb = source.substring(1) || " ";
              if (!comment)
                comment = cb;
              else
                comment += sep + cb;
              sep = "";
              break;
            }
            case "newline":
              if (comment)
                sep += source;
              hasSpace = true;
              break;
            default:
              onError(token, "UNEXPECTED_TOKEN", `Unexpected ${type} at node end`);
          }
          offset += source.length;
        }
      }
      return { comment, offset };
    }
    exports.resolveEnd = resolveEnd;
  }
});

// node_modules/yaml/dist/compose/resolve-flow-collection.js
var require_resolve_flow_collection = __commonJS({
  "node_modules/yaml/dist/compose/resolve-flow-collection.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Pair = require_Pair();
    var YAMLMap = require_YAMLMap();
    var YAMLSeq = require_YAMLSeq();
    var resolveEnd = require_resolve_end();
    var resolveProps = require_resolve_props();
    var utilContainsNewline = require_util_contains_newline();
    var utilMapIncludes = require_util_map_includes();
    var blockMsg = "Block collections are not allowed within flow collections";
    var isBlock = (token) => token && (token.type === "block-map" || token.type === "block-seq");
    function resolveFlowCollection({ composeNode, composeEmptyNode }, ctx, fc, onError, tag) {
      const isMap3 = fc.start.source === "{";
      const fcName = isMap3 ? "flow map" : "flow sequence";
      const NodeClass = tag?.nodeClass ?? (isMap3 ? YAMLMap.YAMLMap : YAMLSeq.YAMLSeq);
      const coll = new NodeClass(ctx.schema);
      coll.flow = true;
      const atRoot = ctx.atRoot;
      if (atRoot)
        ctx.atRoot = false;
      if (ctx.atKey)
        ctx.atKey = false;
      let offset = fc.offset + fc.start.source.length;
      for (let i = 0; i < fc.items.length; ++i) {
        const collItem = fc.items[i];
        const { start, key, sep, value } = collItem;
        const props = resolveProps.resolveProps(start, {
          flow: fcName,
          indicator: "explicit-key-ind",
          next: key ?? sep?.[0],
          offset,
          onError,
          parentIndent: fc.indent,
          startOnNewline: false
        });
        if (!props.found) {
          if (!props.anchor && !props.tag && !sep && !value) {
            if (i === 0 && props.comma)
              onError(props.comma, "UNEXPECTED_TOKEN", `Unexpected , in ${fcName}`);
            else if (i < fc.items.length - 1)
              onError(props.start, "UNEXPECTED_TOKEN", `Unexpected empty item in ${fcName}`);
            if (props.comment) {
              if (coll.comment)
                coll.comment += "\n" + props.comment;
              else
                coll.comment = props.comment;
            }
            offset = props.end;
            continue;
          }
          if (!isMap3 && ctx.options.strict && utilContainsNewline.containsNewline(key))
            onError(
              key,
              // checked by containsNewline()
              "MULTILINE_IMPLICIT_KEY",
              "Implicit keys of flow sequence pairs need to be on a single line"
            );
        }
        if (i === 0) {
          if (props.comma)
            onError(props.comma, "UNEXPECTED_TOKEN", `Unexpected , in ${fcName}`);
        } else {
          if (!props.comma)
            onError(props.start, "MISSING_CHAR", `Missing , between ${fcName} items`);
          if (props.comment) {
            let prevItemComment = "";
            loop: for (const st of start) {
              switch (st.type) {
                case "comma":
                case "space":
                  break;
                case "comment":
                  prevItemComment = st.source.substring(1);
                  break loop;
                default:
                  break loop;
              }
            }
            if (prevItemComment) {
              let prev = coll.items[coll.items.length - 1];
              if (identity.isPair(prev))
                prev = prev.value ?? prev.key;
              if (prev.comment)
                prev.comment += "\n" + prevItemComment;
              else
                prev.comment = prevItemComment;
              props.comment = props.comment.substring(prevItemComment.length + 1);
            }
          }
        }
        if (!isMap3 && !sep && !props.found) {
          const valueNode = value ? composeNode(ctx, value, props, onError) : composeEmptyNode(ctx, props.end, sep, null, props, onError);
          coll.items.push(valueNode);
          offset = valueNode.range[2];
          if (isBlock(value))
            onError(valueNode.range, "BLOCK_IN_FLOW", blockMsg);
        } else {
          ctx.atKey = true;
          const keyStart = props.end;
          const keyNode = key ? composeNode(ctx, key, props, onError) : composeEmptyNode(ctx, keyStart, start, null, props, onError);
          if (isBlock(key))
            onError(keyNode.range, "BLOCK_IN_FLOW", blockMsg);
          ctx.atKey = false;
          const valueProps = resolveProps.resolveProps(sep ?? [], {
            flow: fcName,
            indicator: "map-value-ind",
            next: value,
            offset: keyNode.range[2],
            onError,
            parentIndent: fc.indent,
            startOnNewline: false
          });
          if (valueProps.found) {
            if (!isMap3 && !props.found && ctx.options.strict) {
              if (sep)
                for (const st of sep) {
                  if (st === valueProps.found)
                    break;
                  if (st.type === "newline") {
                    onError(st, "MULTILINE_IMPLICIT_KEY", "Implicit keys of flow sequence pairs need to be on a single line");
                    break;
                  }
                }
              if (props.start < valueProps.found.offset - 1024)
                onError(valueProps.found, "KEY_OVER_1024_CHARS", "The : indicator must be at most 1024 chars after the start of an implicit flow sequence key");
            }
          } else if (value) {
            if ("source" in value && value.source?.[0] === ":")
              onError(value, "MISSING_CHAR", `Missing space after : in ${fcName}`);
            else
              onError(valueProps.start, "MISSING_CHAR", `Missing , or : between ${fcName} items`);
          }
          const valueNode = value ? composeNode(ctx, value, valueProps, onError) : valueProps.found ? composeEmptyNode(ctx, valueProps.end, sep, null, valueProps, onError) : null;
          if (valueNode) {
            if (isBlock(value))
              onError(valueNode.range, "BLOCK_IN_FLOW", blockMsg);
          } else if (valueProps.comment) {
            if (keyNode.comment)
              keyNode.comment += "\n" + valueProps.comment;
            else
              keyNode.comment = valueProps.comment;
          }
          const pair = new Pair.Pair(keyNode, valueNode);
          if (ctx.options.keepSourceTokens)
            pair.srcToken = collItem;
          if (isMap3) {
            const map = coll;
            if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
              onError(keyStart, "DUPLICATE_KEY", "Map keys must be unique");
            map.items.push(pair);
          } else {
            const map = new YAMLMap.YAMLMap(ctx.schema);
            map.flow = true;
            map.items.push(pair);
            const endRange = (valueNode ?? keyNode).range;
            map.range = [keyNode.range[0], endRange[1], endRange[2]];
            coll.items.push(map);
          }
          offset = valueNode ? valueNode.range[2] : valueProps.end;
        }
      }
      const expectedEnd = isMap3 ? "}" : "]";
      const [ce, ...ee] = fc.end;
      let cePos = offset;
      if (ce?.source === expectedEnd)
        cePos = ce.offset + ce.source.length;
      else {
        const name = fcName[0].toUpperCase() + fcName.substring(1);
        const msg = atRoot ? `${name} must end with a ${expectedEnd}` : `${name} in block collection must be sufficiently indented and end with a ${expectedEnd}`;
        onError(offset, atRoot ? "MISSING_CHAR" : "BAD_INDENT", msg);
        if (ce && ce.source.length !== 1)
          ee.unshift(ce);
      }
      if (ee.length > 0) {
        const end = resolveEnd.resolveEnd(ee, cePos, ctx.options.strict, onError);
        if (end.comment) {
          if (coll.comment)
            coll.comment += "\n" + end.comment;
          else
            coll.comment = end.comment;
        }
        coll.range = [fc.offset, cePos, end.offset];
      } else {
        coll.range = [fc.offset, cePos, cePos];
      }
      return coll;
    }
    exports.resolveFlowCollection = resolveFlowCollection;
  }
});

// node_modules/yaml/dist/compose/compose-collection.js
var require_compose_collection = __commonJS({
  "node_modules/yaml/dist/compose/compose-collection.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Scalar = require_Scalar();
    var YAMLMap = require_YAMLMap();
    var YAMLSeq = require_YAMLSeq();
    var resolveBlockMap = require_resolve_block_map();
    var resolveBlockSeq = require_resolve_block_seq();
    var resolveFlowCollection = require_resolve_flow_collection();
    function resolveCollection(CN, ctx, token, onError, tagName, tag) {
      const coll = token.type === "block-map" ? resolveBlockMap.resolveBlockMap(CN, ctx, token, onError, tag) : token.type === "block-seq" ? resolveBlockSeq.resolveBlockSeq(CN, ctx, token, onError, tag) : resolveFlowCollection.resolveFlowCollection(CN, ctx, token, onError, tag);
      const Coll = coll.constructor;
      if (tagName === "!" || tagName === Coll.tagName) {
        coll.tag = Coll.tagName;
        return coll;
      }
      if (tagName)
        coll.tag = tagName;
      return coll;
    }
    function composeCollection(CN, ctx, token, props, onError) {
      const tagToken = props.tag;
      const tagName = !tagToken ? null : ctx.directives.tagName(tagToken.source, (msg) => onError(tagToken, "TAG_RESOLVE_FAILED", msg));
      if (token.type === "block-seq") {
        const { anchor, newlineAfterProp: nl } = props;
        const lastProp = anchor && tagToken ? anchor.offset > tagToken.offset ? anchor : tagToken : anchor ?? tagToken;
        if (lastProp && (!nl || nl.offset < lastProp.offset)) {
          const message = "Missing newline after block sequence props";
          onError(lastProp, "MISSING_CHAR", message);
        }
      }
      const expType = token.type === "block-map" ? "map" : token.type === "block-seq" ? "seq" : token.start.source === "{" ? "map" : "seq";
      if (!tagToken || !tagName || tagName === "!" || tagName === YAMLMap.YAMLMap.tagName && expType === "map" || tagName === YAMLSeq.YAMLSeq.tagName && expType === "seq") {
        return resolveCollection(CN, ctx, token, onError, tagName);
      }
      let tag = ctx.schema.tags.find((t) => t.tag === tagName && t.collection === expType);
      if (!tag) {
        const kt = ctx.schema.knownTags[tagName];
        if (kt?.collection === expType) {
          ctx.schema.tags.push(Object.assign({}, kt, { default: false }));
          tag = kt;
        } else {
          if (kt) {
            onError(tagToken, "BAD_COLLECTION_TYPE", `${kt.tag} used for ${expType} collection, but expects ${kt.collection ?? "scalar"}`, true);
          } else {
            onError(tagToken, "TAG_RESOLVE_FAILED", `Unresolved tag: ${tagName}`, true);
          }
          return resolveCollection(CN, ctx, token, onError, tagName);
        }
      }
      const coll = resolveCollection(CN, ctx, token, onError, tagName, tag);
      const res = tag.resolve?.(coll, (msg) => onError(tagToken, "TAG_RESOLVE_FAILED", msg), ctx.options) ?? coll;
      const node = identity.isNode(res) ? res : new Scalar.Scalar(res);
      node.range = coll.range;
      node.tag = tagName;
      if (tag?.format)
        node.format = tag.format;
      return node;
    }
    exports.composeCollection = composeCollection;
  }
});

// node_modules/yaml/dist/compose/resolve-block-scalar.js
var require_resolve_block_scalar = __commonJS({
  "node_modules/yaml/dist/compose/resolve-block-scalar.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    function resolveBlockScalar(ctx, scalar, onError) {
      const start = scalar.offset;
      const header = parseBlockScalarHeader(scalar, ctx.options.strict, onError);
      if (!header)
        return { value: "", type: null, comment: "", range: [start, start, start] };
      const type = header.mode === ">" ? Scalar.Scalar.BLOCK_FOLDED : Scalar.Scalar.BLOCK_LITERAL;
      const lines = scalar.source ? splitLines(scalar.source) : [];
      let chompStart = lines.length;
      for (let i = lines.length - 1; i >= 0; --i) {
        const content = lines[i][1];
        if (content === "" || content === "\r")
          chompStart = i;
        else
          break;
      }
      if (chompStart === 0) {
        const value2 = header.chomp === "+" && lines.length > 0 ? "\n".repeat(Math.max(1, lines.length - 1)) : "";
        let end2 = start + header.length;
        if (scalar.source)
          end2 += scalar.source.length;
        return { value: value2, type, comment: header.comment, range: [start, end2, end2] };
      }
      let trimIndent = scalar.indent + header.indent;
      let offset = scalar.offset + header.length;
      let contentStart = 0;
      for (let i = 0; i < chompStart; ++i) {
        const [indent, content] = lines[i];
        if (content === "" || content === "\r") {
          if (header.indent === 0 && indent.length > trimIndent)
            trimIndent = indent.length;
        } else {
          if (indent.length < trimIndent) {
            const message = "Block scalars with more-indented leading empty lines must use an explicit indentation indicator";
            onError(offset + indent.length, "MISSING_CHAR", message);
          }
          if (header.indent === 0)
            trimIndent = indent.length;
          contentStart = i;
          if (trimIndent === 0 && !ctx.atRoot) {
            const message = "Block scalar values in collections must be indented";
            onError(offset, "BAD_INDENT", message);
          }
          break;
        }
        offset += indent.length + content.length + 1;
      }
      for (let i = lines.length - 1; i >= chompStart; --i) {
        if (lines[i][0].length > trimIndent)
          chompStart = i + 1;
      }
      let value = "";
      let sep = "";
      let prevMoreIndented = false;
      for (let i = 0; i < contentStart; ++i)
        value += lines[i][0].slice(trimIndent) + "\n";
      for (let i = contentStart; i < chompStart; ++i) {
        let [indent, content] = lines[i];
        offset += indent.length + content.length + 1;
        const crlf = content[content.length - 1] === "\r";
        if (crlf)
          content = content.slice(0, -1);
        if (content && indent.length < trimIndent) {
          const src = header.indent ? "explicit indentation indicator" : "first line";
          const message = `Block scalar lines must not be less indented than their ${src}`;
          onError(offset - content.length - (crlf ? 2 : 1), "BAD_INDENT", message);
          indent = "";
        }
        if (type === Scalar.Scalar.BLOCK_LITERAL) {
          value += sep + indent.slice(trimIndent) + content;
          sep = "\n";
        } else if (indent.length > trimIndent || content[0] === "	") {
          if (sep === " ")
            sep = "\n";
          else if (!prevMoreIndented && sep === "\n")
            sep = "\n\n";
          value += sep + indent.slice(trimIndent) + content;
          sep = "\n";
          prevMoreIndented = true;
        } else if (content === "") {
          if (sep === "\n")
            value += "\n";
          else
            sep = "\n";
        } else {
          value += sep + content;
          sep = " ";
          prevMoreIndented = false;
        }
      }
      switch (header.chomp) {
        case "-":
          break;
        case "+":
          for (let i = chompStart; i < lines.length; ++i)
            value += "\n" + lines[i][0].slice(trimIndent);
          if (value[value.length - 1] !== "\n")
            value += "\n";
          break;
        default:
          value += "\n";
      }
      const end = start + header.length + scalar.source.length;
      return { value, type, comment: header.comment, range: [start, end, end] };
    }
    function parseBlockScalarHeader({ offset, props }, strict, onError) {
      if (props[0].type !== "block-scalar-header") {
        onError(props[0], "IMPOSSIBLE", "Block scalar header not found");
        return null;
      }
      const { source } = props[0];
      const mode = source[0];
      let indent = 0;
      let chomp = "";
      let error = -1;
      for (let i = 1; i < source.length; ++i) {
        const ch = source[i];
        if (!chomp && (ch === "-" || ch === "+"))
          chomp = ch;
        else {
          const n = Number(ch);
          if (!indent && n)
            indent = n;
          else if (error === -1)
            error = offset + i;
        }
      }
      if (error !== -1)
        onError(error, "UNEXPECTED_TOKEN", `Block scalar header includes extra characters: ${source}`);
      let hasSpace = false;
      let comment = "";
      let length = source.length;
      for (let i = 1; i < props.length; ++i) {
        const token = props[i];
        switch (token.type) {
          case "space":
            hasSpace = true;
          // fallthrough
          case "newline":
            length += token.source.length;
            break;
          case "comment":
            if (strict && !hasSpace) {
              const message = "Comments must be separated from other tokens by white space characters";
              onError(token, "MISSING_CHAR", message);
            }
            length += token.source.length;
            comment = token.source.substring(1);
            break;
          case "error":
            onError(token, "UNEXPECTED_TOKEN", token.message);
            length += token.source.length;
            break;
          /* istanbul ignore next should not happen */
          default: {
            const message = `Unexpected token in block scalar header: ${token.type}`;
            onError(token, "UNEXPECTED_TOKEN", message);
            const ts = token.source;
            if (ts && typeof ts === "string")
              length += ts.length;
          }
        }
      }
      return { mode, indent, chomp, comment, length };
    }
    function splitLines(source) {
      const split = source.split(/\n( *)/);
      const first = split[0];
      const m = first.match(/^( *)/);
      const line0 = m?.[1] ? [m[1], first.slice(m[1].length)] : ["", first];
      const lines = [line0];
      for (let i = 1; i < split.length; i += 2)
        lines.push([split[i], split[i + 1]]);
      return lines;
    }
    exports.resolveBlockScalar = resolveBlockScalar;
  }
});

// node_modules/yaml/dist/compose/resolve-flow-scalar.js
var require_resolve_flow_scalar = __commonJS({
  "node_modules/yaml/dist/compose/resolve-flow-scalar.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var resolveEnd = require_resolve_end();
    function resolveFlowScalar(scalar, strict, onError) {
      const { offset, type, source, end } = scalar;
      let _type;
      let value;
      const _onError = (rel, code, msg) => onError(offset + rel, code, msg);
      switch (type) {
        case "scalar":
          _type = Scalar.Scalar.PLAIN;
          value = plainValue(source, _onError);
          break;
        case "single-quoted-scalar":
          _type = Scalar.Scalar.QUOTE_SINGLE;
          value = singleQuotedValue(source, _onError);
          break;
        case "double-quoted-scalar":
          _type = Scalar.Scalar.QUOTE_DOUBLE;
          value = doubleQuotedValue(source, _onError);
          break;
        /* istanbul ignore next should not happen */
        default:
          onError(scalar, "UNEXPECTED_TOKEN", `Expected a flow scalar value, but found: ${type}`);
          return {
            value: "",
            type: null,
            comment: "",
            range: [offset, offset + source.length, offset + source.length]
          };
      }
      const valueEnd = offset + source.length;
      const re = resolveEnd.resolveEnd(end, valueEnd, strict, onError);
      return {
        value,
        type: _type,
        comment: re.comment,
        range: [offset, valueEnd, re.offset]
      };
    }
    function plainValue(source, onError) {
      let badChar = "";
      switch (source[0]) {
        /* istanbul ignore next should not happen */
        case "	":
          badChar = "a tab character";
          break;
        case ",":
          badChar = "flow indicator character ,";
          break;
        case "%":
          badChar = "directive indicator character %";
          break;
        case "|":
        case ">": {
          badChar = `block scalar indicator ${source[0]}`;
          break;
        }
        case "@":
        case "`": {
          badChar = `reserved character ${source[0]}`;
          break;
        }
      }
      if (badChar)
        onError(0, "BAD_SCALAR_START", `Plain value cannot start with ${badChar}`);
      return unfoldLines(source);
    }
    function singleQuotedValue(source, onError) {
      if (source[source.length - 1] !== "'" || source.length === 1)
        onError(source.length, "MISSING_CHAR", "Missing closing 'quote");
      return unfoldLines(source.slice(1, -1)).replace(/''/g, "'");
    }
    function unfoldLines(source) {
      const line = /(.*?)\r?\n/sy;
      let match = line.exec(source);
      if (!match)
        return source;
      let trimEnd, trimBoth;
      try {
        trimEnd = new RegExp("(?<![ 	])[ 	]+$");
        trimBoth = new RegExp("^[ 	]+|(?<![ 	])[ 	]+$", "g");
      } catch {
        trimEnd = /[ \t]+$/;
        trimBoth = /^[ \t]+|[ \t]+$/g;
      }
      let res = match[1].replace(trimEnd, "");
      let sep = " ";
      let pos = line.lastIndex;
      while (match = line.exec(source)) {
        const lm = match[1].replace(trimBoth, "");
        if (lm === "") {
          if (sep === "\n")
            res += sep;
          else
            sep = "\n";
        } else {
          res += sep + lm;
          sep = " ";
        }
        pos = line.lastIndex;
      }
      const last = /[ \t]*(.*)/sy;
      last.lastIndex = pos;
      match = last.exec(source);
      return res + sep + (match?.[1] ?? "");
    }
    function doubleQuotedValue(source, onError) {
      let res = "";
      for (let i = 1; i < source.length - 1; ++i) {
        const ch = source[i];
        if (ch === "\r" && source[i + 1] === "\n")
          continue;
        if (ch === "\n") {
          const { fold, offset } = foldNewline(source, i);
          res += fold;
          i = offset;
        } else if (ch === "\\") {
          let next = source[++i];
          const cc = escapeCodes[next];
          if (cc)
            res += cc;
          else if (next === "\n") {
            next = source[i + 1];
            while (next === " " || next === "	")
              next = source[++i + 1];
          } else if (next === "\r" && source[i + 1] === "\n") {
            next = source[++i + 1];
            while (next === " " || next === "	")
              next = source[++i + 1];
          } else if (next === "x" || next === "u" || next === "U") {
            const length = next === "x" ? 2 : next === "u" ? 4 : 8;
            res += parseCharCode(source, i + 1, length, onError);
            i += length;
          } else {
            const raw = source.substr(i - 1, 2);
            onError(i - 1, "BAD_DQ_ESCAPE", `Invalid escape sequence ${raw}`);
            res += raw;
          }
        } else if (ch === " " || ch === "	") {
          const wsStart = i;
          let next = source[i + 1];
          while (next === " " || next === "	")
            next = source[++i + 1];
          if (next !== "\n" && !(next === "\r" && source[i + 2] === "\n"))
            res += i > wsStart ? source.slice(wsStart, i + 1) : ch;
        } else {
          res += ch;
        }
      }
      if (source[source.length - 1] !== '"' || source.length === 1)
        onError(source.length, "MISSING_CHAR", 'Missing closing "quote');
      return res;
    }
    function foldNewline(source, offset) {
      let fold = "";
      let ch = source[offset + 1];
      while (ch === " " || ch === "	" || ch === "\n" || ch === "\r") {
        if (ch === "\r" && source[offset + 2] !== "\n")
          break;
        if (ch === "\n")
          fold += "\n";
        offset += 1;
        ch = source[offset + 1];
      }
      if (!fold)
        fold = " ";
      return { fold, offset };
    }
    var escapeCodes = {
      "0": "\0",
      // null character
      a: "\x07",
      // bell character
      b: "\b",
      // backspace
      e: "\x1B",
      // escape character
      f: "\f",
      // form feed
      n: "\n",
      // line feed
      r: "\r",
      // carriage return
      t: "	",
      // horizontal tab
      v: "\v",
      // vertical tab
      N: "",
      // Unicode next line
      _: " ",
      // Unicode non-breaking space
      L: "\u2028",
      // Unicode line separator
      P: "\u2029",
      // Unicode paragraph separator
      " ": " ",
      '"': '"',
      "/": "/",
      "\\": "\\",
      "	": "	"
    };
    function parseCharCode(source, offset, length, onError) {
      const cc = source.substr(offset, length);
      const ok = cc.length === length && /^[0-9a-fA-F]+$/.test(cc);
      const code = ok ? parseInt(cc, 16) : NaN;
      try {
        return String.fromCodePoint(code);
      } catch {
        const raw = source.substr(offset - 2, length + 2);
        onError(offset - 2, "BAD_DQ_ESCAPE", `Invalid escape sequence ${raw}`);
        return raw;
      }
    }
    exports.resolveFlowScalar = resolveFlowScalar;
  }
});

// node_modules/yaml/dist/compose/compose-scalar.js
var require_compose_scalar = __commonJS({
  "node_modules/yaml/dist/compose/compose-scalar.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Scalar = require_Scalar();
    var resolveBlockScalar = require_resolve_block_scalar();
    var resolveFlowScalar = require_resolve_flow_scalar();
    function composeScalar(ctx, token, tagToken, onError) {
      const { value, type, comment, range } = token.type === "block-scalar" ? resolveBlockScalar.resolveBlockScalar(ctx, token, onError) : resolveFlowScalar.resolveFlowScalar(token, ctx.options.strict, onError);
      const tagName = tagToken ? ctx.directives.tagName(tagToken.source, (msg) => onError(tagToken, "TAG_RESOLVE_FAILED", msg)) : null;
      let tag;
      if (ctx.options.stringKeys && ctx.atKey) {
        tag = ctx.schema[identity.SCALAR];
      } else if (tagName)
        tag = findScalarTagByName(ctx.schema, value, tagName, tagToken, onError);
      else if (token.type === "scalar")
        tag = findScalarTagByTest(ctx, value, token, onError);
      else
        tag = ctx.schema[identity.SCALAR];
      let scalar;
      try {
        const res = tag.resolve(value, (msg) => onError(tagToken ?? token, "TAG_RESOLVE_FAILED", msg), ctx.options);
        scalar = identity.isScalar(res) ? res : new Scalar.Scalar(res);
      } catch (error) {
        const msg = error instanceof Error ? error.message : String(error);
        onError(tagToken ?? token, "TAG_RESOLVE_FAILED", msg);
        scalar = new Scalar.Scalar(value);
      }
      scalar.range = range;
      scalar.source = value;
      if (type)
        scalar.type = type;
      if (tagName)
        scalar.tag = tagName;
      if (tag.format)
        scalar.format = tag.format;
      if (comment)
        scalar.comment = comment;
      return scalar;
    }
    function findScalarTagByName(schema, value, tagName, tagToken, onError) {
      if (tagName === "!")
        return schema[identity.SCALAR];
      const matchWithTest = [];
      for (const tag of schema.tags) {
        if (!tag.collection && tag.tag === tagName) {
          if (tag.default && tag.test)
            matchWithTest.push(tag);
          else
            return tag;
        }
      }
      for (const tag of matchWithTest)
        if (tag.test?.test(value))
          return tag;
      const kt = schema.knownTags[tagName];
      if (kt && !kt.collection) {
        schema.tags.push(Object.assign({}, kt, { default: false, test: void 0 }));
        return kt;
      }
      onError(tagToken, "TAG_RESOLVE_FAILED", `Unresolved tag: ${tagName}`, tagName !== "tag:yaml.org,2002:str");
      return schema[identity.SCALAR];
    }
    function findScalarTagByTest({ atKey, directives, schema }, value, token, onError) {
      const tag = schema.tags.find((tag2) => (tag2.default === true || atKey && tag2.default === "key") && tag2.test?.test(value)) || schema[identity.SCALAR];
      if (schema.compat) {
        const compat = schema.compat.find((tag2) => tag2.default && tag2.test?.test(value)) ?? schema[identity.SCALAR];
        if (tag.tag !== compat.tag) {
          const ts = directives.tagString(tag.tag);
          const cs = directives.tagString(compat.tag);
          const msg = `Value may be parsed as either ${ts} or ${cs}`;
          onError(token, "TAG_RESOLVE_FAILED", msg, true);
        }
      }
      return tag;
    }
    exports.composeScalar = composeScalar;
  }
});

// node_modules/yaml/dist/compose/util-empty-scalar-position.js
var require_util_empty_scalar_position = __commonJS({
  "node_modules/yaml/dist/compose/util-empty-scalar-position.js"(exports) {
    "use strict";
    function emptyScalarPosition(offset, before, pos) {
      if (before) {
        pos ?? (pos = before.length);
        for (let i = pos - 1; i >= 0; --i) {
          let st = before[i];
          switch (st.type) {
            case "space":
            case "comment":
            case "newline":
              offset -= st.source.length;
              continue;
          }
          st = before[++i];
          while (st?.type === "space") {
            offset += st.source.length;
            st = before[++i];
          }
          break;
        }
      }
      return offset;
    }
    exports.emptyScalarPosition = emptyScalarPosition;
  }
});

// node_modules/yaml/dist/compose/compose-node.js
var require_compose_node = __commonJS({
  "node_modules/yaml/dist/compose/compose-node.js"(exports) {
    "use strict";
    var Alias = require_Alias();
    var identity = require_identity();
    var composeCollection = require_compose_collection();
    var composeScalar = require_compose_scalar();
    var resolveEnd = require_resolve_end();
    var utilEmptyScalarPosition = require_util_empty_scalar_position();
    var CN = { composeNode, composeEmptyNode };
    function composeNode(ctx, token, props, onError) {
      const atKey = ctx.atKey;
      const { spaceBefore, comment, anchor, tag } = props;
      let node;
      let isSrcToken = true;
      switch (token.type) {
        case "alias":
          node = composeAlias(ctx, token, onError);
          if (anchor || tag)
            onError(token, "ALIAS_PROPS", "An alias node must not specify any properties");
          break;
        case "scalar":
        case "single-quoted-scalar":
        case "double-quoted-scalar":
        case "block-scalar":
          node = composeScalar.composeScalar(ctx, token, tag, onError);
          if (anchor)
            node.anchor = anchor.source.substring(1);
          break;
        case "block-map":
        case "block-seq":
        case "flow-collection":
          try {
            node = composeCollection.composeCollection(CN, ctx, token, props, onError);
            if (anchor)
              node.anchor = anchor.source.substring(1);
          } catch (error) {
            const message = error instanceof Error ? error.message : String(error);
            onError(token, "RESOURCE_EXHAUSTION", message);
          }
          break;
        default: {
          const message = token.type === "error" ? token.message : `Unsupported token (type: ${token.type})`;
          onError(token, "UNEXPECTED_TOKEN", message);
          isSrcToken = false;
        }
      }
      node ?? (node = composeEmptyNode(ctx, token.offset, void 0, null, props, onError));
      if (anchor && node.anchor === "")
        onError(anchor, "BAD_ALIAS", "Anchor cannot be an empty string");
      if (atKey && ctx.options.stringKeys && (!identity.isScalar(node) || typeof node.value !== "string" || node.tag && node.tag !== "tag:yaml.org,2002:str")) {
        const msg = "With stringKeys, all keys must be strings";
        onError(tag ?? token, "NON_STRING_KEY", msg);
      }
      if (spaceBefore)
        node.spaceBefore = true;
      if (comment) {
        if (token.type === "scalar" && token.source === "")
          node.comment = comment;
        else
          node.commentBefore = comment;
      }
      if (ctx.options.keepSourceTokens && isSrcToken)
        node.srcToken = token;
      return node;
    }
    function composeEmptyNode(ctx, offset, before, pos, { spaceBefore, comment, anchor, tag, end }, onError) {
      const token = {
        type: "scalar",
        offset: utilEmptyScalarPosition.emptyScalarPosition(offset, before, pos),
        indent: -1,
        source: ""
      };
      const node = composeScalar.composeScalar(ctx, token, tag, onError);
      if (anchor) {
        node.anchor = anchor.source.substring(1);
        if (node.anchor === "")
          onError(anchor, "BAD_ALIAS", "Anchor cannot be an empty string");
      }
      if (spaceBefore)
        node.spaceBefore = true;
      if (comment) {
        node.comment = comment;
        node.range[2] = end;
      }
      return node;
    }
    function composeAlias({ options }, { offset, source, end }, onError) {
      const alias = new Alias.Alias(source.substring(1));
      if (alias.source === "")
        onError(offset, "BAD_ALIAS", "Alias cannot be an empty string");
      if (alias.source.endsWith(":"))
        onError(offset + source.length - 1, "BAD_ALIAS", "Alias ending in : is ambiguous", true);
      const valueEnd = offset + source.length;
      const re = resolveEnd.resolveEnd(end, valueEnd, options.strict, onError);
      alias.range = [offset, valueEnd, re.offset];
      if (re.comment)
        alias.comment = re.comment;
      return alias;
    }
    exports.composeEmptyNode = composeEmptyNode;
    exports.composeNode = composeNode;
  }
});

// node_modules/yaml/dist/compose/compose-doc.js
var require_compose_doc = __commonJS({
  "node_modules/yaml/dist/compose/compose-doc.js"(exports) {
    "use strict";
    var Document = require_Document();
    var composeNode = require_compose_node();
    var resolveEnd = require_resolve_end();
    var resolveProps = require_resolve_props();
    function composeDoc(options, directives, { offset, start, value, end }, onError) {
      const opts = Object.assign({ _directives: directives }, options);
      const doc = new Document.Document(void 0, opts);
      const ctx = {
        atKey: false,
        atRoot: true,
        directives: doc.directives,
        options: doc.options,
        schema: doc.schema
      };
      const props = resolveProps.resolveProps(start, {
        indicator: "doc-start",
        next: value ?? end?.[0],
        offset,
        onError,
        parentIndent: 0,
        startOnNewline: true
      });
      if (props.found) {
        doc.directives.docStart = true;
        if (value && (value.type === "block-map" || value.type === "block-seq") && !props.hasNewline)
          onError(props.end, "MISSING_CHAR", "Block collection cannot start on same line with directives-end marker");
      }
      doc.contents = value ? composeNode.composeNode(ctx, value, props, onError) : composeNode.composeEmptyNode(ctx, props.end, start, null, props, onError);
      const contentEnd = doc.contents.range[2];
      const re = resolveEnd.resolveEnd(end, contentEnd, false, onError);
      if (re.comment)
        doc.comment = re.comment;
      doc.range = [offset, contentEnd, re.offset];
      return doc;
    }
    exports.composeDoc = composeDoc;
  }
});

// node_modules/yaml/dist/compose/composer.js
var require_composer = __commonJS({
  "node_modules/yaml/dist/compose/composer.js"(exports) {
    "use strict";
    var node_process = __require("process");
    var directives = require_directives();
    var Document = require_Document();
    var errors = require_errors2();
    var identity = require_identity();
    var composeDoc = require_compose_doc();
    var resolveEnd = require_resolve_end();
    function getErrorPos(src) {
      if (typeof src === "number")
        return [src, src + 1];
      if (Array.isArray(src))
        return src.length === 2 ? src : [src[0], src[1]];
      const { offset, source } = src;
      return [offset, offset + (typeof source === "string" ? source.length : 1)];
    }
    function parsePrelude(prelude) {
      let comment = "";
      let atComment = false;
      let afterEmptyLine = false;
      for (let i = 0; i < prelude.length; ++i) {
        const source = prelude[i];
        switch (source[0]) {
          case "#":
            comment += (comment === "" ? "" : afterEmptyLine ? "\n\n" : "\n") + (source.substring(1) || " ");
            atComment = true;
            afterEmptyLine = false;
            break;
          case "%":
            if (prelude[i + 1]?.[0] !== "#")
              i += 1;
            atComment = false;
            break;
          default:
            if (!atComment)
              afterEmptyLine = true;
            atComment = false;
        }
      }
      return { comment, afterEmptyLine };
    }
    var Composer = class {
      constructor(options = {}) {
        this.doc = null;
        this.atDirectives = false;
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
        this.onError = (source, code, message, warning) => {
          const pos = getErrorPos(source);
          if (warning)
            this.warnings.push(new errors.YAMLWarning(pos, code, message));
          else
            this.errors.push(new errors.YAMLParseError(pos, code, message));
        };
        this.directives = new directives.Directives({ version: options.version || "1.2" });
        this.options = options;
      }
      decorate(doc, afterDoc) {
        const { comment, afterEmptyLine } = parsePrelude(this.prelude);
        if (comment) {
          const dc = doc.contents;
          if (afterDoc) {
            doc.comment = doc.comment ? `${doc.comment}
${comment}` : comment;
          } else if (afterEmptyLine || doc.directives.docStart || !dc) {
            doc.commentBefore = comment;
          } else if (identity.isCollection(dc) && !dc.flow && dc.items.length > 0) {
            let it = dc.items[0];
            if (identity.isPair(it))
              it = it.key;
            const cb = it.commentBefore;
            it.commentBefore = cb ? `${comment}
${cb}` : comment;
          } else {
            const cb = dc.commentBefore;
            dc.commentBefore = cb ? `${comment}
${cb}` : comment;
          }
        }
        if (afterDoc) {
          for (let i = 0; i < this.errors.length; ++i)
            doc.errors.push(this.errors[i]);
          for (let i = 0; i < this.warnings.length; ++i)
            doc.warnings.push(this.warnings[i]);
        } else {
          doc.errors = this.errors;
          doc.warnings = this.warnings;
        }
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
      }
      /**
       * Current stream status information.
       *
       * Mostly useful at the end of input for an empty stream.
       */
      streamInfo() {
        return {
          comment: parsePrelude(this.prelude).comment,
          directives: this.directives,
          errors: this.errors,
          warnings: this.warnings
        };
      }
      /**
       * Compose tokens into documents.
       *
       * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
       * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
       */
      *compose(tokens, forceDoc = false, endOffset = -1) {
        for (const token of tokens)
          yield* this.next(token);
        yield* this.end(forceDoc, endOffset);
      }
      /** Advance the composer by one CST token. */
      *next(token) {
        if (node_process.env.LOG_STREAM)
          console.dir(token, { depth: null });
        switch (token.type) {
          case "directive":
            this.directives.add(token.source, (offset, message, warning) => {
              const pos = getErrorPos(token);
              pos[0] += offset;
              this.onError(pos, "BAD_DIRECTIVE", message, warning);
            });
            this.prelude.push(token.source);
            this.atDirectives = true;
            break;
          case "document": {
            const doc = composeDoc.composeDoc(this.options, this.directives, token, this.onError);
            if (this.atDirectives && !doc.directives.docStart)
              this.onError(token, "MISSING_CHAR", "Missing directives-end/doc-start indicator line");
            this.decorate(doc, false);
            if (this.doc)
              yield this.doc;
            this.doc = doc;
            this.atDirectives = false;
            break;
          }
          case "byte-order-mark":
          case "space":
            break;
          case "comment":
          case "newline":
            this.prelude.push(token.source);
            break;
          case "error": {
            const msg = token.source ? `${token.message}: ${JSON.stringify(token.source)}` : token.message;
            const error = new errors.YAMLParseError(getErrorPos(token), "UNEXPECTED_TOKEN", msg);
            if (this.atDirectives || !this.doc)
              this.errors.push(error);
            else
              this.doc.errors.push(error);
            break;
          }
          case "doc-end": {
            if (!this.doc) {
              const msg = "Unexpected doc-end without preceding document";
              this.errors.push(new errors.YAMLParseError(getErrorPos(token), "UNEXPECTED_TOKEN", msg));
              break;
            }
            this.doc.directives.docEnd = true;
            const end = resolveEnd.resolveEnd(token.end, token.offset + token.source.length, this.doc.options.strict, this.onError);
            this.decorate(this.doc, true);
            if (end.comment) {
              const dc = this.doc.comment;
              this.doc.comment = dc ? `${dc}
${end.comment}` : end.comment;
            }
            this.doc.range[2] = end.offset;
            break;
          }
          default:
            this.errors.push(new errors.YAMLParseError(getErrorPos(token), "UNEXPECTED_TOKEN", `Unsupported token ${token.type}`));
        }
      }
      /**
       * Call at end of input to yield any remaining document.
       *
       * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
       * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
       */
      *end(forceDoc = false, endOffset = -1) {
        if (this.doc) {
          this.decorate(this.doc, true);
          yield this.doc;
          this.doc = null;
        } else if (forceDoc) {
          const opts = Object.assign({ _directives: this.directives }, this.options);
          const doc = new Document.Document(void 0, opts);
          if (this.atDirectives)
            this.onError(endOffset, "MISSING_CHAR", "Missing directives-end indicator line");
          doc.range = [0, endOffset, endOffset];
          this.decorate(doc, false);
          yield doc;
        }
      }
    };
    exports.Composer = Composer;
  }
});

// node_modules/yaml/dist/parse/cst-scalar.js
var require_cst_scalar = __commonJS({
  "node_modules/yaml/dist/parse/cst-scalar.js"(exports) {
    "use strict";
    var resolveBlockScalar = require_resolve_block_scalar();
    var resolveFlowScalar = require_resolve_flow_scalar();
    var errors = require_errors2();
    var stringifyString = require_stringifyString();
    function resolveAsScalar(token, strict = true, onError) {
      if (token) {
        const _onError = (pos, code, message) => {
          const offset = typeof pos === "number" ? pos : Array.isArray(pos) ? pos[0] : pos.offset;
          if (onError)
            onError(offset, code, message);
          else
            throw new errors.YAMLParseError([offset, offset + 1], code, message);
        };
        switch (token.type) {
          case "scalar":
          case "single-quoted-scalar":
          case "double-quoted-scalar":
            return resolveFlowScalar.resolveFlowScalar(token, strict, _onError);
          case "block-scalar":
            return resolveBlockScalar.resolveBlockScalar({ options: { strict } }, token, _onError);
        }
      }
      return null;
    }
    function createScalarToken(value, context) {
      const { implicitKey = false, indent, inFlow = false, offset = -1, type = "PLAIN" } = context;
      const source = stringifyString.stringifyString({ type, value }, {
        implicitKey,
        indent: indent > 0 ? " ".repeat(indent) : "",
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
      });
      const end = context.end ?? [
        { type: "newline", offset: -1, indent, source: "\n" }
      ];
      switch (source[0]) {
        case "|":
        case ">": {
          const he = source.indexOf("\n");
          const head = source.substring(0, he);
          const body = source.substring(he + 1) + "\n";
          const props = [
            { type: "block-scalar-header", offset, indent, source: head }
          ];
          if (!addEndtoBlockProps(props, end))
            props.push({ type: "newline", offset: -1, indent, source: "\n" });
          return { type: "block-scalar", offset, indent, props, source: body };
        }
        case '"':
          return { type: "double-quoted-scalar", offset, indent, source, end };
        case "'":
          return { type: "single-quoted-scalar", offset, indent, source, end };
        default:
          return { type: "scalar", offset, indent, source, end };
      }
    }
    function setScalarValue(token, value, context = {}) {
      let { afterKey = false, implicitKey = false, inFlow = false, type } = context;
      let indent = "indent" in token ? token.indent : null;
      if (afterKey && typeof indent === "number")
        indent += 2;
      if (!type)
        switch (token.type) {
          case "single-quoted-scalar":
            type = "QUOTE_SINGLE";
            break;
          case "double-quoted-scalar":
            type = "QUOTE_DOUBLE";
            break;
          case "block-scalar": {
            const header = token.props[0];
            if (header.type !== "block-scalar-header")
              throw new Error("Invalid block scalar header");
            type = header.source[0] === ">" ? "BLOCK_FOLDED" : "BLOCK_LITERAL";
            break;
          }
          default:
            type = "PLAIN";
        }
      const source = stringifyString.stringifyString({ type, value }, {
        implicitKey: implicitKey || indent === null,
        indent: indent !== null && indent > 0 ? " ".repeat(indent) : "",
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
      });
      switch (source[0]) {
        case "|":
        case ">":
          setBlockScalarValue(token, source);
          break;
        case '"':
          setFlowScalarValue(token, source, "double-quoted-scalar");
          break;
        case "'":
          setFlowScalarValue(token, source, "single-quoted-scalar");
          break;
        default:
          setFlowScalarValue(token, source, "scalar");
      }
    }
    function setBlockScalarValue(token, source) {
      const he = source.indexOf("\n");
      const head = source.substring(0, he);
      const body = source.substring(he + 1) + "\n";
      if (token.type === "block-scalar") {
        const header = token.props[0];
        if (header.type !== "block-scalar-header")
          throw new Error("Invalid block scalar header");
        header.source = head;
        token.source = body;
      } else {
        const { offset } = token;
        const indent = "indent" in token ? token.indent : -1;
        const props = [
          { type: "block-scalar-header", offset, indent, source: head }
        ];
        if (!addEndtoBlockProps(props, "end" in token ? token.end : void 0))
          props.push({ type: "newline", offset: -1, indent, source: "\n" });
        for (const key of Object.keys(token))
          if (key !== "type" && key !== "offset")
            delete token[key];
        Object.assign(token, { type: "block-scalar", indent, props, source: body });
      }
    }
    function addEndtoBlockProps(props, end) {
      if (end)
        for (const st of end)
          switch (st.type) {
            case "space":
            case "comment":
              props.push(st);
              break;
            case "newline":
              props.push(st);
              return true;
          }
      return false;
    }
    function setFlowScalarValue(token, source, type) {
      switch (token.type) {
        case "scalar":
        case "double-quoted-scalar":
        case "single-quoted-scalar":
          token.type = type;
          token.source = source;
          break;
        case "block-scalar": {
          const end = token.props.slice(1);
          let oa = source.length;
          if (token.props[0].type === "block-scalar-header")
            oa -= token.props[0].source.length;
          for (const tok of end)
            tok.offset += oa;
          delete token.props;
          Object.assign(token, { type, source, end });
          break;
        }
        case "block-map":
        case "block-seq": {
          const offset = token.offset + source.length;
          const nl = { type: "newline", offset, indent: token.indent, source: "\n" };
          delete token.items;
          Object.assign(token, { type, source, end: [nl] });
          break;
        }
        default: {
          const indent = "indent" in token ? token.indent : -1;
          const end = "end" in token && Array.isArray(token.end) ? token.end.filter((st) => st.type === "space" || st.type === "comment" || st.type === "newline") : [];
          for (const key of Object.keys(token))
            if (key !== "type" && key !== "offset")
              delete token[key];
          Object.assign(token, { type, indent, source, end });
        }
      }
    }
    exports.createScalarToken = createScalarToken;
    exports.resolveAsScalar = resolveAsScalar;
    exports.setScalarValue = setScalarValue;
  }
});

// node_modules/yaml/dist/parse/cst-stringify.js
var require_cst_stringify = __commonJS({
  "node_modules/yaml/dist/parse/cst-stringify.js"(exports) {
    "use strict";
    var stringify = (cst) => "type" in cst ? stringifyToken(cst) : stringifyItem(cst);
    function stringifyToken(token) {
      switch (token.type) {
        case "block-scalar": {
          let res = "";
          for (const tok of token.props)
            res += stringifyToken(tok);
          return res + token.source;
        }
        case "block-map":
        case "block-seq": {
          let res = "";
          for (const item of token.items)
            res += stringifyItem(item);
          return res;
        }
        case "flow-collection": {
          let res = token.start.source;
          for (const item of token.items)
            res += stringifyItem(item);
          for (const st of token.end)
            res += st.source;
          return res;
        }
        case "document": {
          let res = stringifyItem(token);
          if (token.end)
            for (const st of token.end)
              res += st.source;
          return res;
        }
        default: {
          let res = token.source;
          if ("end" in token && token.end)
            for (const st of token.end)
              res += st.source;
          return res;
        }
      }
    }
    function stringifyItem({ start, key, sep, value }) {
      let res = "";
      for (const st of start)
        res += st.source;
      if (key)
        res += stringifyToken(key);
      if (sep)
        for (const st of sep)
          res += st.source;
      if (value)
        res += stringifyToken(value);
      return res;
    }
    exports.stringify = stringify;
  }
});

// node_modules/yaml/dist/parse/cst-visit.js
var require_cst_visit = __commonJS({
  "node_modules/yaml/dist/parse/cst-visit.js"(exports) {
    "use strict";
    var BREAK = /* @__PURE__ */ Symbol("break visit");
    var SKIP = /* @__PURE__ */ Symbol("skip children");
    var REMOVE = /* @__PURE__ */ Symbol("remove item");
    function visit2(cst, visitor) {
      if ("type" in cst && cst.type === "document")
        cst = { start: cst.start, value: cst.value };
      _visit(Object.freeze([]), cst, visitor);
    }
    visit2.BREAK = BREAK;
    visit2.SKIP = SKIP;
    visit2.REMOVE = REMOVE;
    visit2.itemAtPath = (cst, path) => {
      let item = cst;
      for (const [field, index] of path) {
        const tok = item?.[field];
        if (tok && "items" in tok) {
          item = tok.items[index];
        } else
          return void 0;
      }
      return item;
    };
    visit2.parentCollection = (cst, path) => {
      const parent = visit2.itemAtPath(cst, path.slice(0, -1));
      const field = path[path.length - 1][0];
      const coll = parent?.[field];
      if (coll && "items" in coll)
        return coll;
      throw new Error("Parent collection not found");
    };
    function _visit(path, item, visitor) {
      let ctrl = visitor(item, path);
      if (typeof ctrl === "symbol")
        return ctrl;
      for (const field of ["key", "value"]) {
        const token = item[field];
        if (token && "items" in token) {
          for (let i = 0; i < token.items.length; ++i) {
            const ci = _visit(Object.freeze(path.concat([[field, i]])), token.items[i], visitor);
            if (typeof ci === "number")
              i = ci - 1;
            else if (ci === BREAK)
              return BREAK;
            else if (ci === REMOVE) {
              token.items.splice(i, 1);
              i -= 1;
            }
          }
          if (typeof ctrl === "function" && field === "key")
            ctrl = ctrl(item, path);
        }
      }
      return typeof ctrl === "function" ? ctrl(item, path) : ctrl;
    }
    exports.visit = visit2;
  }
});

// node_modules/yaml/dist/parse/cst.js
var require_cst = __commonJS({
  "node_modules/yaml/dist/parse/cst.js"(exports) {
    "use strict";
    var cstScalar = require_cst_scalar();
    var cstStringify = require_cst_stringify();
    var cstVisit = require_cst_visit();
    var BOM = "\uFEFF";
    var DOCUMENT2 = "";
    var FLOW_END2 = "";
    var SCALAR2 = "";
    var isCollection2 = (token) => !!token && "items" in token;
    var isScalar3 = (token) => !!token && (token.type === "scalar" || token.type === "single-quoted-scalar" || token.type === "double-quoted-scalar" || token.type === "block-scalar");
    function prettyToken(token) {
      switch (token) {
        case BOM:
          return "<BOM>";
        case DOCUMENT2:
          return "<DOC>";
        case FLOW_END2:
          return "<FLOW_END>";
        case SCALAR2:
          return "<SCALAR>";
        default:
          return JSON.stringify(token);
      }
    }
    function tokenType(source) {
      switch (source) {
        case BOM:
          return "byte-order-mark";
        case DOCUMENT2:
          return "doc-mode";
        case FLOW_END2:
          return "flow-error-end";
        case SCALAR2:
          return "scalar";
        case "---":
          return "doc-start";
        case "...":
          return "doc-end";
        case "":
        case "\n":
        case "\r\n":
          return "newline";
        case "-":
          return "seq-item-ind";
        case "?":
          return "explicit-key-ind";
        case ":":
          return "map-value-ind";
        case "{":
          return "flow-map-start";
        case "}":
          return "flow-map-end";
        case "[":
          return "flow-seq-start";
        case "]":
          return "flow-seq-end";
        case ",":
          return "comma";
      }
      switch (source[0]) {
        case " ":
        case "	":
          return "space";
        case "#":
          return "comment";
        case "%":
          return "directive-line";
        case "*":
          return "alias";
        case "&":
          return "anchor";
        case "!":
          return "tag";
        case "'":
          return "single-quoted-scalar";
        case '"':
          return "double-quoted-scalar";
        case "|":
        case ">":
          return "block-scalar-header";
      }
      return null;
    }
    exports.createScalarToken = cstScalar.createScalarToken;
    exports.resolveAsScalar = cstScalar.resolveAsScalar;
    exports.setScalarValue = cstScalar.setScalarValue;
    exports.stringify = cstStringify.stringify;
    exports.visit = cstVisit.visit;
    exports.BOM = BOM;
    exports.DOCUMENT = DOCUMENT2;
    exports.FLOW_END = FLOW_END2;
    exports.SCALAR = SCALAR2;
    exports.isCollection = isCollection2;
    exports.isScalar = isScalar3;
    exports.prettyToken = prettyToken;
    exports.tokenType = tokenType;
  }
});

// node_modules/yaml/dist/parse/lexer.js
var require_lexer = __commonJS({
  "node_modules/yaml/dist/parse/lexer.js"(exports) {
    "use strict";
    var cst = require_cst();
    function isEmpty(ch) {
      switch (ch) {
        case void 0:
        case " ":
        case "\n":
        case "\r":
        case "	":
          return true;
        default:
          return false;
      }
    }
    var hexDigits = new Set("0123456789ABCDEFabcdef");
    var tagChars = new Set("0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz-#;/?:@&=+$_.!~*'()");
    var flowIndicatorChars = new Set(",[]{}");
    var invalidAnchorChars = new Set(" ,[]{}\n\r	");
    var isNotAnchorChar = (ch) => !ch || invalidAnchorChars.has(ch);
    var Lexer2 = class {
      constructor() {
        this.atEnd = false;
        this.blockScalarIndent = -1;
        this.blockScalarKeep = false;
        this.buffer = "";
        this.flowKey = false;
        this.flowLevel = 0;
        this.indentNext = 0;
        this.indentValue = 0;
        this.lineEndPos = null;
        this.next = null;
        this.pos = 0;
      }
      /**
       * Generate YAML tokens from the `source` string. If `incomplete`,
       * a part of the last line may be left as a buffer for the next call.
       *
       * @returns A generator of lexical tokens
       */
      *lex(source, incomplete = false) {
        if (source) {
          if (typeof source !== "string")
            throw TypeError("source is not a string");
          this.buffer = this.buffer ? this.buffer + source : source;
          this.lineEndPos = null;
        }
        this.atEnd = !incomplete;
        let next = this.next ?? "stream";
        while (next && (incomplete || this.hasChars(1)))
          next = yield* this.parseNext(next);
      }
      atLineEnd() {
        let i = this.pos;
        let ch = this.buffer[i];
        while (ch === " " || ch === "	")
          ch = this.buffer[++i];
        if (!ch || ch === "#" || ch === "\n")
          return true;
        if (ch === "\r")
          return this.buffer[i + 1] === "\n";
        return false;
      }
      charAt(n) {
        return this.buffer[this.pos + n];
      }
      continueScalar(offset) {
        let ch = this.buffer[offset];
        if (this.indentNext > 0) {
          let indent = 0;
          while (ch === " ")
            ch = this.buffer[++indent + offset];
          if (ch === "\r") {
            const next = this.buffer[indent + offset + 1];
            if (next === "\n" || !next && !this.atEnd)
              return offset + indent + 1;
          }
          return ch === "\n" || indent >= this.indentNext || !ch && !this.atEnd ? offset + indent : -1;
        }
        if (ch === "-" || ch === ".") {
          const dt = this.buffer.substr(offset, 3);
          if ((dt === "---" || dt === "...") && isEmpty(this.buffer[offset + 3]))
            return -1;
        }
        return offset;
      }
      getLine() {
        let end = this.lineEndPos;
        if (typeof end !== "number" || end !== -1 && end < this.pos) {
          end = this.buffer.indexOf("\n", this.pos);
          this.lineEndPos = end;
        }
        if (end === -1)
          return this.atEnd ? this.buffer.substring(this.pos) : null;
        if (this.buffer[end - 1] === "\r")
          end -= 1;
        return this.buffer.substring(this.pos, end);
      }
      hasChars(n) {
        return this.pos + n <= this.buffer.length;
      }
      setNext(state) {
        this.buffer = this.buffer.substring(this.pos);
        this.pos = 0;
        this.lineEndPos = null;
        this.next = state;
        return null;
      }
      peek(n) {
        return this.buffer.substr(this.pos, n);
      }
      *parseNext(next) {
        switch (next) {
          case "stream":
            return yield* this.parseStream();
          case "line-start":
            return yield* this.parseLineStart();
          case "block-start":
            return yield* this.parseBlockStart();
          case "doc":
            return yield* this.parseDocument();
          case "flow":
            return yield* this.parseFlowCollection();
          case "quoted-scalar":
            return yield* this.parseQuotedScalar();
          case "block-scalar":
            return yield* this.parseBlockScalar();
          case "plain-scalar":
            return yield* this.parsePlainScalar();
        }
      }
      *parseStream() {
        let line = this.getLine();
        if (line === null)
          return this.setNext("stream");
        if (line[0] === cst.BOM) {
          yield* this.pushCount(1);
          line = line.substring(1);
        }
        if (line[0] === "%") {
          let dirEnd = line.length;
          let cs = line.indexOf("#");
          while (cs !== -1) {
            const ch = line[cs - 1];
            if (ch === " " || ch === "	") {
              dirEnd = cs - 1;
              break;
            } else {
              cs = line.indexOf("#", cs + 1);
            }
          }
          while (true) {
            const ch = line[dirEnd - 1];
            if (ch === " " || ch === "	")
              dirEnd -= 1;
            else
              break;
          }
          const n = (yield* this.pushCount(dirEnd)) + (yield* this.pushSpaces(true));
          yield* this.pushCount(line.length - n);
          this.pushNewline();
          return "stream";
        }
        if (this.atLineEnd()) {
          const sp = yield* this.pushSpaces(true);
          yield* this.pushCount(line.length - sp);
          yield* this.pushNewline();
          return "stream";
        }
        yield cst.DOCUMENT;
        return yield* this.parseLineStart();
      }
      *parseLineStart() {
        const ch = this.charAt(0);
        if (!ch && !this.atEnd)
          return this.setNext("line-start");
        if (ch === "-" || ch === ".") {
          if (!this.atEnd && !this.hasChars(4))
            return this.setNext("line-start");
          const s = this.peek(3);
          if ((s === "---" || s === "...") && isEmpty(this.charAt(3))) {
            yield* this.pushCount(3);
            this.indentValue = 0;
            this.indentNext = 0;
            return s === "---" ? "doc" : "stream";
          }
        }
        this.indentValue = yield* this.pushSpaces(false);
        if (this.indentNext > this.indentValue && !isEmpty(this.charAt(1)))
          this.indentNext = this.indentValue;
        return yield* this.parseBlockStart();
      }
      *parseBlockStart() {
        const [ch0, ch1] = this.peek(2);
        if (!ch1 && !this.atEnd)
          return this.setNext("block-start");
        if ((ch0 === "-" || ch0 === "?" || ch0 === ":") && isEmpty(ch1)) {
          const n = (yield* this.pushCount(1)) + (yield* this.pushSpaces(true));
          this.indentNext = this.indentValue + 1;
          this.indentValue += n;
          return "block-start";
        }
        return "doc";
      }
      *parseDocument() {
        yield* this.pushSpaces(true);
        const line = this.getLine();
        if (line === null)
          return this.setNext("doc");
        let n = yield* this.pushIndicators();
        switch (line[n]) {
          case "#":
            yield* this.pushCount(line.length - n);
          // fallthrough
          case void 0:
            yield* this.pushNewline();
            return yield* this.parseLineStart();
          case "{":
          case "[":
            yield* this.pushCount(1);
            this.flowKey = false;
            this.flowLevel = 1;
            return "flow";
          case "}":
          case "]":
            yield* this.pushCount(1);
            return "doc";
          case "*":
            yield* this.pushUntil(isNotAnchorChar);
            return "doc";
          case '"':
          case "'":
            return yield* this.parseQuotedScalar();
          case "|":
          case ">":
            n += yield* this.parseBlockScalarHeader();
            n += yield* this.pushSpaces(true);
            yield* this.pushCount(line.length - n);
            yield* this.pushNewline();
            return yield* this.parseBlockScalar();
          default:
            return yield* this.parsePlainScalar();
        }
      }
      *parseFlowCollection() {
        let nl, sp;
        let indent = -1;
        do {
          nl = yield* this.pushNewline();
          if (nl > 0) {
            sp = yield* this.pushSpaces(false);
            this.indentValue = indent = sp;
          } else {
            sp = 0;
          }
          sp += yield* this.pushSpaces(true);
        } while (nl + sp > 0);
        const line = this.getLine();
        if (line === null)
          return this.setNext("flow");
        if (indent !== -1 && indent < this.indentNext && line[0] !== "#" || indent === 0 && (line.startsWith("---") || line.startsWith("...")) && isEmpty(line[3])) {
          const atFlowEndMarker = indent === this.indentNext - 1 && this.flowLevel === 1 && (line[0] === "]" || line[0] === "}");
          if (!atFlowEndMarker) {
            this.flowLevel = 0;
            yield cst.FLOW_END;
            return yield* this.parseLineStart();
          }
        }
        let n = 0;
        while (line[n] === ",") {
          n += yield* this.pushCount(1);
          n += yield* this.pushSpaces(true);
          this.flowKey = false;
        }
        n += yield* this.pushIndicators();
        switch (line[n]) {
          case void 0:
            return "flow";
          case "#":
            yield* this.pushCount(line.length - n);
            return "flow";
          case "{":
          case "[":
            yield* this.pushCount(1);
            this.flowKey = false;
            this.flowLevel += 1;
            return "flow";
          case "}":
          case "]":
            yield* this.pushCount(1);
            this.flowKey = true;
            this.flowLevel -= 1;
            return this.flowLevel ? "flow" : "doc";
          case "*":
            yield* this.pushUntil(isNotAnchorChar);
            return "flow";
          case '"':
          case "'":
            this.flowKey = true;
            return yield* this.parseQuotedScalar();
          case ":": {
            const next = this.charAt(1);
            if (this.flowKey || isEmpty(next) || next === ",") {
              this.flowKey = false;
              yield* this.pushCount(1);
              yield* this.pushSpaces(true);
              return "flow";
            }
          }
          // fallthrough
          default:
            this.flowKey = false;
            return yield* this.parsePlainScalar();
        }
      }
      *parseQuotedScalar() {
        const quote = this.charAt(0);
        let end = this.buffer.indexOf(quote, this.pos + 1);
        if (quote === "'") {
          while (end !== -1 && this.buffer[end + 1] === "'")
            end = this.buffer.indexOf("'", end + 2);
        } else {
          while (end !== -1) {
            let n = 0;
            while (this.buffer[end - 1 - n] === "\\")
              n += 1;
            if (n % 2 === 0)
              break;
            end = this.buffer.indexOf('"', end + 1);
          }
        }
        const qb = this.buffer.substring(0, end);
        let nl = qb.indexOf("\n", this.pos);
        if (nl !== -1) {
          while (nl !== -1) {
            const cs = this.continueScalar(nl + 1);
            if (cs === -1)
              break;
            nl = qb.indexOf("\n", cs);
          }
          if (nl !== -1) {
            end = nl - (qb[nl - 1] === "\r" ? 2 : 1);
          }
        }
        if (end === -1) {
          if (!this.atEnd)
            return this.setNext("quoted-scalar");
          end = this.buffer.length;
        }
        yield* this.pushToIndex(end + 1, false);
        return this.flowLevel ? "flow" : "doc";
      }
      *parseBlockScalarHeader() {
        this.blockScalarIndent = -1;
        this.blockScalarKeep = false;
        let i = this.pos;
        while (true) {
          const ch = this.buffer[++i];
          if (ch === "+")
            this.blockScalarKeep = true;
          else if (ch > "0" && ch <= "9")
            this.blockScalarIndent = Number(ch) - 1;
          else if (ch !== "-")
            break;
        }
        return yield* this.pushUntil((ch) => isEmpty(ch) || ch === "#");
      }
      *parseBlockScalar() {
        let nl = this.pos - 1;
        let indent = 0;
        let ch;
        loop: for (let i2 = this.pos; ch = this.buffer[i2]; ++i2) {
          switch (ch) {
            case " ":
              indent += 1;
              break;
            case "\n":
              nl = i2;
              indent = 0;
              break;
            case "\r": {
              const next = this.buffer[i2 + 1];
              if (!next && !this.atEnd)
                return this.setNext("block-scalar");
              if (next === "\n")
                break;
            }
            // fallthrough
            default:
              break loop;
          }
        }
        if (!ch && !this.atEnd)
          return this.setNext("block-scalar");
        if (indent >= this.indentNext) {
          if (this.blockScalarIndent === -1)
            this.indentNext = indent;
          else {
            this.indentNext = this.blockScalarIndent + (this.indentNext === 0 ? 1 : this.indentNext);
          }
          do {
            const cs = this.continueScalar(nl + 1);
            if (cs === -1)
              break;
            nl = this.buffer.indexOf("\n", cs);
          } while (nl !== -1);
          if (nl === -1) {
            if (!this.atEnd)
              return this.setNext("block-scalar");
            nl = this.buffer.length;
          }
        }
        let i = nl + 1;
        ch = this.buffer[i];
        while (ch === " ")
          ch = this.buffer[++i];
        if (ch === "	") {
          while (ch === "	" || ch === " " || ch === "\r" || ch === "\n")
            ch = this.buffer[++i];
          nl = i - 1;
        } else if (!this.blockScalarKeep) {
          do {
            let i2 = nl - 1;
            let ch2 = this.buffer[i2];
            if (ch2 === "\r")
              ch2 = this.buffer[--i2];
            const lastChar = i2;
            while (ch2 === " ")
              ch2 = this.buffer[--i2];
            if (ch2 === "\n" && i2 >= this.pos && i2 + 1 + indent > lastChar)
              nl = i2;
            else
              break;
          } while (true);
        }
        yield cst.SCALAR;
        yield* this.pushToIndex(nl + 1, true);
        return yield* this.parseLineStart();
      }
      *parsePlainScalar() {
        const inFlow = this.flowLevel > 0;
        let end = this.pos - 1;
        let i = this.pos - 1;
        let ch;
        while (ch = this.buffer[++i]) {
          if (ch === ":") {
            const next = this.buffer[i + 1];
            if (isEmpty(next) || inFlow && flowIndicatorChars.has(next))
              break;
            end = i;
          } else if (isEmpty(ch)) {
            let next = this.buffer[i + 1];
            if (ch === "\r") {
              if (next === "\n") {
                i += 1;
                ch = "\n";
                next = this.buffer[i + 1];
              } else
                end = i;
            }
            if (next === "#" || inFlow && flowIndicatorChars.has(next))
              break;
            if (ch === "\n") {
              const cs = this.continueScalar(i + 1);
              if (cs === -1)
                break;
              i = Math.max(i, cs - 2);
            }
          } else {
            if (inFlow && flowIndicatorChars.has(ch))
              break;
            end = i;
          }
        }
        if (!ch && !this.atEnd)
          return this.setNext("plain-scalar");
        yield cst.SCALAR;
        yield* this.pushToIndex(end + 1, true);
        return inFlow ? "flow" : "doc";
      }
      *pushCount(n) {
        if (n > 0) {
          yield this.buffer.substr(this.pos, n);
          this.pos += n;
          return n;
        }
        return 0;
      }
      *pushToIndex(i, allowEmpty) {
        const s = this.buffer.slice(this.pos, i);
        if (s) {
          yield s;
          this.pos += s.length;
          return s.length;
        } else if (allowEmpty)
          yield "";
        return 0;
      }
      *pushIndicators() {
        let n = 0;
        loop: while (true) {
          switch (this.charAt(0)) {
            case "!":
              n += yield* this.pushTag();
              n += yield* this.pushSpaces(true);
              continue loop;
            case "&":
              n += yield* this.pushUntil(isNotAnchorChar);
              n += yield* this.pushSpaces(true);
              continue loop;
            case "-":
            // this is an error
            case "?":
            // this is an error outside flow collections
            case ":": {
              const inFlow = this.flowLevel > 0;
              const ch1 = this.charAt(1);
              if (isEmpty(ch1) || inFlow && flowIndicatorChars.has(ch1)) {
                if (!inFlow)
                  this.indentNext = this.indentValue + 1;
                else if (this.flowKey)
                  this.flowKey = false;
                n += yield* this.pushCount(1);
                n += yield* this.pushSpaces(true);
                continue loop;
              }
            }
          }
          break loop;
        }
        return n;
      }
      *pushTag() {
        if (this.charAt(1) === "<") {
          let i = this.pos + 2;
          let ch = this.buffer[i];
          while (!isEmpty(ch) && ch !== ">")
            ch = this.buffer[++i];
          return yield* this.pushToIndex(ch === ">" ? i + 1 : i, false);
        } else {
          let i = this.pos + 1;
          let ch = this.buffer[i];
          while (ch) {
            if (tagChars.has(ch))
              ch = this.buffer[++i];
            else if (ch === "%" && hexDigits.has(this.buffer[i + 1]) && hexDigits.has(this.buffer[i + 2])) {
              ch = this.buffer[i += 3];
            } else
              break;
          }
          return yield* this.pushToIndex(i, false);
        }
      }
      *pushNewline() {
        const ch = this.buffer[this.pos];
        if (ch === "\n")
          return yield* this.pushCount(1);
        else if (ch === "\r" && this.charAt(1) === "\n")
          return yield* this.pushCount(2);
        else
          return 0;
      }
      *pushSpaces(allowTabs) {
        let i = this.pos - 1;
        let ch;
        do {
          ch = this.buffer[++i];
        } while (ch === " " || allowTabs && ch === "	");
        const n = i - this.pos;
        if (n > 0) {
          yield this.buffer.substr(this.pos, n);
          this.pos = i;
        }
        return n;
      }
      *pushUntil(test) {
        let i = this.pos;
        let ch = this.buffer[i];
        while (!test(ch))
          ch = this.buffer[++i];
        return yield* this.pushToIndex(i, false);
      }
    };
    exports.Lexer = Lexer2;
  }
});

// node_modules/yaml/dist/parse/line-counter.js
var require_line_counter = __commonJS({
  "node_modules/yaml/dist/parse/line-counter.js"(exports) {
    "use strict";
    var LineCounter3 = class {
      constructor() {
        this.lineStarts = [];
        this.addNewLine = (offset) => this.lineStarts.push(offset);
        this.linePos = (offset) => {
          let low = 0;
          let high = this.lineStarts.length;
          while (low < high) {
            const mid = low + high >> 1;
            if (this.lineStarts[mid] < offset)
              low = mid + 1;
            else
              high = mid;
          }
          if (this.lineStarts[low] === offset)
            return { line: low + 1, col: 1 };
          if (low === 0)
            return { line: 0, col: offset };
          const start = this.lineStarts[low - 1];
          return { line: low, col: offset - start + 1 };
        };
      }
    };
    exports.LineCounter = LineCounter3;
  }
});

// node_modules/yaml/dist/parse/parser.js
var require_parser = __commonJS({
  "node_modules/yaml/dist/parse/parser.js"(exports) {
    "use strict";
    var node_process = __require("process");
    var cst = require_cst();
    var lexer = require_lexer();
    function includesToken(list, type) {
      for (let i = 0; i < list.length; ++i)
        if (list[i].type === type)
          return true;
      return false;
    }
    function findNonEmptyIndex(list) {
      for (let i = 0; i < list.length; ++i) {
        switch (list[i].type) {
          case "space":
          case "comment":
          case "newline":
            break;
          default:
            return i;
        }
      }
      return -1;
    }
    function isFlowToken(token) {
      switch (token?.type) {
        case "alias":
        case "scalar":
        case "single-quoted-scalar":
        case "double-quoted-scalar":
        case "flow-collection":
          return true;
        default:
          return false;
      }
    }
    function getPrevProps(parent) {
      switch (parent.type) {
        case "document":
          return parent.start;
        case "block-map": {
          const it = parent.items[parent.items.length - 1];
          return it.sep ?? it.start;
        }
        case "block-seq":
          return parent.items[parent.items.length - 1].start;
        /* istanbul ignore next should not happen */
        default:
          return [];
      }
    }
    function getFirstKeyStartProps(prev) {
      if (prev.length === 0)
        return [];
      let i = prev.length;
      loop: while (--i >= 0) {
        switch (prev[i].type) {
          case "doc-start":
          case "explicit-key-ind":
          case "map-value-ind":
          case "seq-item-ind":
          case "newline":
            break loop;
        }
      }
      while (prev[++i]?.type === "space") {
      }
      return prev.splice(i, prev.length);
    }
    function arrayPushArray(target, source) {
      if (source.length < 1e5)
        Array.prototype.push.apply(target, source);
      else
        for (let i = 0; i < source.length; ++i)
          target.push(source[i]);
    }
    function fixFlowSeqItems(fc) {
      if (fc.start.type === "flow-seq-start") {
        for (const it of fc.items) {
          if (it.sep && !it.value && !includesToken(it.start, "explicit-key-ind") && !includesToken(it.sep, "map-value-ind")) {
            if (it.key)
              it.value = it.key;
            delete it.key;
            if (isFlowToken(it.value)) {
              if (it.value.end)
                arrayPushArray(it.value.end, it.sep);
              else
                it.value.end = it.sep;
            } else
              arrayPushArray(it.start, it.sep);
            delete it.sep;
          }
        }
      }
    }
    var Parser = class {
      /**
       * @param onNewLine - If defined, called separately with the start position of
       *   each new line (in `parse()`, including the start of input).
       */
      constructor(onNewLine) {
        this.atNewLine = true;
        this.atScalar = false;
        this.indent = 0;
        this.offset = 0;
        this.onKeyLine = false;
        this.stack = [];
        this.source = "";
        this.type = "";
        this.lexer = new lexer.Lexer();
        this.onNewLine = onNewLine;
      }
      /**
       * Parse `source` as a YAML stream.
       * If `incomplete`, a part of the last line may be left as a buffer for the next call.
       *
       * Errors are not thrown, but yielded as `{ type: 'error', message }` tokens.
       *
       * @returns A generator of tokens representing each directive, document, and other structure.
       */
      *parse(source, incomplete = false) {
        if (this.onNewLine && this.offset === 0)
          this.onNewLine(0);
        for (const lexeme of this.lexer.lex(source, incomplete))
          yield* this.next(lexeme);
        if (!incomplete)
          yield* this.end();
      }
      /**
       * Advance the parser by the `source` of one lexical token.
       */
      *next(source) {
        this.source = source;
        if (node_process.env.LOG_TOKENS)
          console.log("|", cst.prettyToken(source));
        if (this.atScalar) {
          this.atScalar = false;
          yield* this.step();
          this.offset += source.length;
          return;
        }
        const type = cst.tokenType(source);
        if (!type) {
          const message = `Not a YAML token: ${source}`;
          yield* this.pop({ type: "error", offset: this.offset, message, source });
          this.offset += source.length;
        } else if (type === "scalar") {
          this.atNewLine = false;
          this.atScalar = true;
          this.type = "scalar";
        } else {
          this.type = type;
          yield* this.step();
          switch (type) {
            case "newline":
              this.atNewLine = true;
              this.indent = 0;
              if (this.onNewLine)
                this.onNewLine(this.offset + source.length);
              break;
            case "space":
              if (this.atNewLine && source[0] === " ")
                this.indent += source.length;
              break;
            case "explicit-key-ind":
            case "map-value-ind":
            case "seq-item-ind":
              if (this.atNewLine)
                this.indent += source.length;
              break;
            case "doc-mode":
            case "flow-error-end":
              return;
            default:
              this.atNewLine = false;
          }
          this.offset += source.length;
        }
      }
      /** Call at end of input to push out any remaining constructions */
      *end() {
        while (this.stack.length > 0)
          yield* this.pop();
      }
      get sourceToken() {
        const st = {
          type: this.type,
          offset: this.offset,
          indent: this.indent,
          source: this.source
        };
        return st;
      }
      *step() {
        const top = this.peek(1);
        if (this.type === "doc-end" && top?.type !== "doc-end") {
          while (this.stack.length > 0)
            yield* this.pop();
          this.stack.push({
            type: "doc-end",
            offset: this.offset,
            source: this.source
          });
          return;
        }
        if (!top)
          return yield* this.stream();
        switch (top.type) {
          case "document":
            return yield* this.document(top);
          case "alias":
          case "scalar":
          case "single-quoted-scalar":
          case "double-quoted-scalar":
            return yield* this.scalar(top);
          case "block-scalar":
            return yield* this.blockScalar(top);
          case "block-map":
            return yield* this.blockMap(top);
          case "block-seq":
            return yield* this.blockSequence(top);
          case "flow-collection":
            return yield* this.flowCollection(top);
          case "doc-end":
            return yield* this.documentEnd(top);
        }
        yield* this.pop();
      }
      peek(n) {
        return this.stack[this.stack.length - n];
      }
      *pop(error) {
        const token = error ?? this.stack.pop();
        if (!token) {
          const message = "Tried to pop an empty stack";
          yield { type: "error", offset: this.offset, source: "", message };
        } else if (this.stack.length === 0) {
          yield token;
        } else {
          const top = this.peek(1);
          if (token.type === "block-scalar") {
            token.indent = "indent" in top ? top.indent : 0;
          } else if (token.type === "flow-collection" && top.type === "document") {
            token.indent = 0;
          }
          if (token.type === "flow-collection")
            fixFlowSeqItems(token);
          switch (top.type) {
            case "document":
              top.value = token;
              break;
            case "block-scalar":
              top.props.push(token);
              break;
            case "block-map": {
              const it = top.items[top.items.length - 1];
              if (it.value) {
                top.items.push({ start: [], key: token, sep: [] });
                this.onKeyLine = true;
                return;
              } else if (it.sep) {
                it.value = token;
              } else {
                Object.assign(it, { key: token, sep: [] });
                this.onKeyLine = !it.explicitKey;
                return;
              }
              break;
            }
            case "block-seq": {
              const it = top.items[top.items.length - 1];
              if (it.value)
                top.items.push({ start: [], value: token });
              else
                it.value = token;
              break;
            }
            case "flow-collection": {
              const it = top.items[top.items.length - 1];
              if (!it || it.value)
                top.items.push({ start: [], key: token, sep: [] });
              else if (it.sep)
                it.value = token;
              else
                Object.assign(it, { key: token, sep: [] });
              return;
            }
            /* istanbul ignore next should not happen */
            default:
              yield* this.pop();
              yield* this.pop(token);
          }
          if ((top.type === "document" || top.type === "block-map" || top.type === "block-seq") && (token.type === "block-map" || token.type === "block-seq")) {
            const last = token.items[token.items.length - 1];
            if (last && !last.sep && !last.value && last.start.length > 0 && findNonEmptyIndex(last.start) === -1 && (token.indent === 0 || last.start.every((st) => st.type !== "comment" || st.indent < token.indent))) {
              if (top.type === "document")
                top.end = last.start;
              else
                top.items.push({ start: last.start });
              token.items.splice(-1, 1);
            }
          }
        }
      }
      *stream() {
        switch (this.type) {
          case "directive-line":
            yield { type: "directive", offset: this.offset, source: this.source };
            return;
          case "byte-order-mark":
          case "space":
          case "comment":
          case "newline":
            yield this.sourceToken;
            return;
          case "doc-mode":
          case "doc-start": {
            const doc = {
              type: "document",
              offset: this.offset,
              start: []
            };
            if (this.type === "doc-start")
              doc.start.push(this.sourceToken);
            this.stack.push(doc);
            return;
          }
        }
        yield {
          type: "error",
          offset: this.offset,
          message: `Unexpected ${this.type} token in YAML stream`,
          source: this.source
        };
      }
      *document(doc) {
        if (doc.value)
          return yield* this.lineEnd(doc);
        switch (this.type) {
          case "doc-start": {
            if (findNonEmptyIndex(doc.start) !== -1) {
              yield* this.pop();
              yield* this.step();
            } else
              doc.start.push(this.sourceToken);
            return;
          }
          case "anchor":
          case "tag":
          case "space":
          case "comment":
          case "newline":
            doc.start.push(this.sourceToken);
            return;
        }
        const bv = this.startBlockValue(doc);
        if (bv)
          this.stack.push(bv);
        else {
          yield {
            type: "error",
            offset: this.offset,
            message: `Unexpected ${this.type} token in YAML document`,
            source: this.source
          };
        }
      }
      *scalar(scalar) {
        if (this.type === "map-value-ind") {
          const prev = getPrevProps(this.peek(2));
          const start = getFirstKeyStartProps(prev);
          let sep;
          if (scalar.end) {
            sep = scalar.end;
            sep.push(this.sourceToken);
            delete scalar.end;
          } else
            sep = [this.sourceToken];
          const map = {
            type: "block-map",
            offset: scalar.offset,
            indent: scalar.indent,
            items: [{ start, key: scalar, sep }]
          };
          this.onKeyLine = true;
          this.stack[this.stack.length - 1] = map;
        } else
          yield* this.lineEnd(scalar);
      }
      *blockScalar(scalar) {
        switch (this.type) {
          case "space":
          case "comment":
          case "newline":
            scalar.props.push(this.sourceToken);
            return;
          case "scalar":
            scalar.source = this.source;
            this.atNewLine = true;
            this.indent = 0;
            if (this.onNewLine) {
              let nl = this.source.indexOf("\n") + 1;
              while (nl !== 0) {
                this.onNewLine(this.offset + nl);
                nl = this.source.indexOf("\n", nl) + 1;
              }
            }
            yield* this.pop();
            break;
          /* istanbul ignore next should not happen */
          default:
            yield* this.pop();
            yield* this.step();
        }
      }
      *blockMap(map) {
        const it = map.items[map.items.length - 1];
        switch (this.type) {
          case "newline":
            this.onKeyLine = false;
            if (it.value) {
              const end = "end" in it.value ? it.value.end : void 0;
              const last = Array.isArray(end) ? end[end.length - 1] : void 0;
              if (last?.type === "comment")
                end?.push(this.sourceToken);
              else
                map.items.push({ start: [this.sourceToken] });
            } else if (it.sep) {
              it.sep.push(this.sourceToken);
            } else {
              it.start.push(this.sourceToken);
            }
            return;
          case "space":
          case "comment":
            if (it.value) {
              map.items.push({ start: [this.sourceToken] });
            } else if (it.sep) {
              it.sep.push(this.sourceToken);
            } else {
              if (this.atIndentedComment(it.start, map.indent)) {
                const prev = map.items[map.items.length - 2];
                const end = prev?.value?.end;
                if (Array.isArray(end)) {
                  arrayPushArray(end, it.start);
                  end.push(this.sourceToken);
                  map.items.pop();
                  return;
                }
              }
              it.start.push(this.sourceToken);
            }
            return;
        }
        if (this.indent >= map.indent) {
          const atMapIndent = !this.onKeyLine && this.indent === map.indent;
          const atNextItem = atMapIndent && (it.sep || it.explicitKey) && this.type !== "seq-item-ind";
          let start = [];
          if (atNextItem && it.sep && !it.value) {
            const nl = [];
            for (let i = 0; i < it.sep.length; ++i) {
              const st = it.sep[i];
              switch (st.type) {
                case "newline":
                  nl.push(i);
                  break;
                case "space":
                  break;
                case "comment":
                  if (st.indent > map.indent)
                    nl.length = 0;
                  break;
                default:
                  nl.length = 0;
              }
            }
            if (nl.length >= 2)
              start = it.sep.splice(nl[1]);
          }
          switch (this.type) {
            case "anchor":
            case "tag":
              if (atNextItem || it.value) {
                start.push(this.sourceToken);
                map.items.push({ start });
                this.onKeyLine = true;
              } else if (it.sep) {
                it.sep.push(this.sourceToken);
              } else {
                it.start.push(this.sourceToken);
              }
              return;
            case "explicit-key-ind":
              if (!it.sep && !it.explicitKey) {
                it.start.push(this.sourceToken);
                it.explicitKey = true;
              } else if (atNextItem || it.value) {
                start.push(this.sourceToken);
                map.items.push({ start, explicitKey: true });
              } else {
                this.stack.push({
                  type: "block-map",
                  offset: this.offset,
                  indent: this.indent,
                  items: [{ start: [this.sourceToken], explicitKey: true }]
                });
              }
              this.onKeyLine = true;
              return;
            case "map-value-ind":
              if (it.explicitKey) {
                if (!it.sep) {
                  if (includesToken(it.start, "newline")) {
                    Object.assign(it, { key: null, sep: [this.sourceToken] });
                  } else {
                    const start2 = getFirstKeyStartProps(it.start);
                    this.stack.push({
                      type: "block-map",
                      offset: this.offset,
                      indent: this.indent,
                      items: [{ start: start2, key: null, sep: [this.sourceToken] }]
                    });
                  }
                } else if (it.value) {
                  map.items.push({ start: [], key: null, sep: [this.sourceToken] });
                } else if (includesToken(it.sep, "map-value-ind")) {
                  this.stack.push({
                    type: "block-map",
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start, key: null, sep: [this.sourceToken] }]
                  });
                } else if (isFlowToken(it.key) && !includesToken(it.sep, "newline")) {
                  const start2 = getFirstKeyStartProps(it.start);
                  const key = it.key;
                  const sep = it.sep;
                  sep.push(this.sourceToken);
                  delete it.key;
                  delete it.sep;
                  this.stack.push({
                    type: "block-map",
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start: start2, key, sep }]
                  });
                } else if (start.length > 0) {
                  it.sep = it.sep.concat(start, this.sourceToken);
                } else {
                  it.sep.push(this.sourceToken);
                }
              } else {
                if (!it.sep) {
                  Object.assign(it, { key: null, sep: [this.sourceToken] });
                } else if (it.value || atNextItem) {
                  map.items.push({ start, key: null, sep: [this.sourceToken] });
                } else if (includesToken(it.sep, "map-value-ind")) {
                  this.stack.push({
                    type: "block-map",
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start: [], key: null, sep: [this.sourceToken] }]
                  });
                } else {
                  it.sep.push(this.sourceToken);
                }
              }
              this.onKeyLine = true;
              return;
            case "alias":
            case "scalar":
            case "single-quoted-scalar":
            case "double-quoted-scalar": {
              const fs = this.flowScalar(this.type);
              if (atNextItem || it.value) {
                map.items.push({ start, key: fs, sep: [] });
                this.onKeyLine = true;
              } else if (it.sep) {
                this.stack.push(fs);
              } else {
                Object.assign(it, { key: fs, sep: [] });
                this.onKeyLine = true;
              }
              return;
            }
            default: {
              const bv = this.startBlockValue(map);
              if (bv) {
                if (bv.type === "block-seq") {
                  if (!it.explicitKey && it.sep && !includesToken(it.sep, "newline")) {
                    yield* this.pop({
                      type: "error",
                      offset: this.offset,
                      message: "Unexpected block-seq-ind on same line with key",
                      source: this.source
                    });
                    return;
                  }
                } else if (atMapIndent) {
                  map.items.push({ start });
                }
                this.stack.push(bv);
                return;
              }
            }
          }
        }
        yield* this.pop();
        yield* this.step();
      }
      *blockSequence(seq) {
        const it = seq.items[seq.items.length - 1];
        switch (this.type) {
          case "newline":
            if (it.value) {
              const end = "end" in it.value ? it.value.end : void 0;
              const last = Array.isArray(end) ? end[end.length - 1] : void 0;
              if (last?.type === "comment")
                end?.push(this.sourceToken);
              else
                seq.items.push({ start: [this.sourceToken] });
            } else
              it.start.push(this.sourceToken);
            return;
          case "space":
          case "comment":
            if (it.value)
              seq.items.push({ start: [this.sourceToken] });
            else {
              if (this.atIndentedComment(it.start, seq.indent)) {
                const prev = seq.items[seq.items.length - 2];
                const end = prev?.value?.end;
                if (Array.isArray(end)) {
                  arrayPushArray(end, it.start);
                  end.push(this.sourceToken);
                  seq.items.pop();
                  return;
                }
              }
              it.start.push(this.sourceToken);
            }
            return;
          case "anchor":
          case "tag":
            if (it.value || this.indent <= seq.indent)
              break;
            it.start.push(this.sourceToken);
            return;
          case "seq-item-ind":
            if (this.indent !== seq.indent)
              break;
            if (it.value || includesToken(it.start, "seq-item-ind"))
              seq.items.push({ start: [this.sourceToken] });
            else
              it.start.push(this.sourceToken);
            return;
        }
        if (this.indent > seq.indent) {
          const bv = this.startBlockValue(seq);
          if (bv) {
            this.stack.push(bv);
            return;
          }
        }
        yield* this.pop();
        yield* this.step();
      }
      *flowCollection(fc) {
        const it = fc.items[fc.items.length - 1];
        if (this.type === "flow-error-end") {
          let top;
          do {
            yield* this.pop();
            top = this.peek(1);
          } while (top?.type === "flow-collection");
        } else if (fc.end.length === 0) {
          switch (this.type) {
            case "comma":
            case "explicit-key-ind":
              if (!it || it.sep)
                fc.items.push({ start: [this.sourceToken] });
              else
                it.start.push(this.sourceToken);
              return;
            case "map-value-ind":
              if (!it || it.value)
                fc.items.push({ start: [], key: null, sep: [this.sourceToken] });
              else if (it.sep)
                it.sep.push(this.sourceToken);
              else
                Object.assign(it, { key: null, sep: [this.sourceToken] });
              return;
            case "space":
            case "comment":
            case "newline":
            case "anchor":
            case "tag":
              if (!it || it.value)
                fc.items.push({ start: [this.sourceToken] });
              else if (it.sep)
                it.sep.push(this.sourceToken);
              else
                it.start.push(this.sourceToken);
              return;
            case "alias":
            case "scalar":
            case "single-quoted-scalar":
            case "double-quoted-scalar": {
              const fs = this.flowScalar(this.type);
              if (!it || it.value)
                fc.items.push({ start: [], key: fs, sep: [] });
              else if (it.sep)
                this.stack.push(fs);
              else
                Object.assign(it, { key: fs, sep: [] });
              return;
            }
            case "flow-map-end":
            case "flow-seq-end":
              fc.end.push(this.sourceToken);
              return;
          }
          const bv = this.startBlockValue(fc);
          if (bv)
            this.stack.push(bv);
          else {
            yield* this.pop();
            yield* this.step();
          }
        } else {
          const parent = this.peek(2);
          if (parent.type === "block-map" && (this.type === "map-value-ind" && parent.indent === fc.indent || this.type === "newline" && !parent.items[parent.items.length - 1].sep)) {
            yield* this.pop();
            yield* this.step();
          } else if (this.type === "map-value-ind" && parent.type !== "flow-collection") {
            const prev = getPrevProps(parent);
            const start = getFirstKeyStartProps(prev);
            fixFlowSeqItems(fc);
            const sep = fc.end.splice(1, fc.end.length);
            sep.push(this.sourceToken);
            const map = {
              type: "block-map",
              offset: fc.offset,
              indent: fc.indent,
              items: [{ start, key: fc, sep }]
            };
            this.onKeyLine = true;
            this.stack[this.stack.length - 1] = map;
          } else {
            yield* this.lineEnd(fc);
          }
        }
      }
      flowScalar(type) {
        if (this.onNewLine) {
          let nl = this.source.indexOf("\n") + 1;
          while (nl !== 0) {
            this.onNewLine(this.offset + nl);
            nl = this.source.indexOf("\n", nl) + 1;
          }
        }
        return {
          type,
          offset: this.offset,
          indent: this.indent,
          source: this.source
        };
      }
      startBlockValue(parent) {
        switch (this.type) {
          case "alias":
          case "scalar":
          case "single-quoted-scalar":
          case "double-quoted-scalar":
            return this.flowScalar(this.type);
          case "block-scalar-header":
            return {
              type: "block-scalar",
              offset: this.offset,
              indent: this.indent,
              props: [this.sourceToken],
              source: ""
            };
          case "flow-map-start":
          case "flow-seq-start":
            return {
              type: "flow-collection",
              offset: this.offset,
              indent: this.indent,
              start: this.sourceToken,
              items: [],
              end: []
            };
          case "seq-item-ind":
            return {
              type: "block-seq",
              offset: this.offset,
              indent: this.indent,
              items: [{ start: [this.sourceToken] }]
            };
          case "explicit-key-ind": {
            this.onKeyLine = true;
            const prev = getPrevProps(parent);
            const start = getFirstKeyStartProps(prev);
            start.push(this.sourceToken);
            return {
              type: "block-map",
              offset: this.offset,
              indent: this.indent,
              items: [{ start, explicitKey: true }]
            };
          }
          case "map-value-ind": {
            this.onKeyLine = true;
            const prev = getPrevProps(parent);
            const start = getFirstKeyStartProps(prev);
            return {
              type: "block-map",
              offset: this.offset,
              indent: this.indent,
              items: [{ start, key: null, sep: [this.sourceToken] }]
            };
          }
        }
        return null;
      }
      atIndentedComment(start, indent) {
        if (this.type !== "comment")
          return false;
        if (this.indent <= indent)
          return false;
        return start.every((st) => st.type === "newline" || st.type === "space");
      }
      *documentEnd(docEnd) {
        if (this.type !== "doc-mode") {
          if (docEnd.end)
            docEnd.end.push(this.sourceToken);
          else
            docEnd.end = [this.sourceToken];
          if (this.type === "newline")
            yield* this.pop();
        }
      }
      *lineEnd(token) {
        switch (this.type) {
          case "comma":
          case "doc-start":
          case "doc-end":
          case "flow-seq-end":
          case "flow-map-end":
          case "map-value-ind":
            yield* this.pop();
            yield* this.step();
            break;
          case "newline":
            this.onKeyLine = false;
          // fallthrough
          case "space":
          case "comment":
          default:
            if (token.end)
              token.end.push(this.sourceToken);
            else
              token.end = [this.sourceToken];
            if (this.type === "newline")
              yield* this.pop();
        }
      }
    };
    exports.Parser = Parser;
  }
});

// node_modules/yaml/dist/public-api.js
var require_public_api = __commonJS({
  "node_modules/yaml/dist/public-api.js"(exports) {
    "use strict";
    var composer = require_composer();
    var Document = require_Document();
    var errors = require_errors2();
    var log = require_log();
    var identity = require_identity();
    var lineCounter = require_line_counter();
    var parser = require_parser();
    function parseOptions(options) {
      const prettyErrors = options.prettyErrors !== false;
      const lineCounter$1 = options.lineCounter || prettyErrors && new lineCounter.LineCounter() || null;
      return { lineCounter: lineCounter$1, prettyErrors };
    }
    function parseAllDocuments(source, options = {}) {
      const { lineCounter: lineCounter2, prettyErrors } = parseOptions(options);
      const parser$1 = new parser.Parser(lineCounter2?.addNewLine);
      const composer$1 = new composer.Composer(options);
      const docs = Array.from(composer$1.compose(parser$1.parse(source)));
      if (prettyErrors && lineCounter2)
        for (const doc of docs) {
          doc.errors.forEach(errors.prettifyError(source, lineCounter2));
          doc.warnings.forEach(errors.prettifyError(source, lineCounter2));
        }
      if (docs.length > 0)
        return docs;
      return Object.assign([], { empty: true }, composer$1.streamInfo());
    }
    function parseDocument3(source, options = {}) {
      const { lineCounter: lineCounter2, prettyErrors } = parseOptions(options);
      const parser$1 = new parser.Parser(lineCounter2?.addNewLine);
      const composer$1 = new composer.Composer(options);
      let doc = null;
      for (const _doc of composer$1.compose(parser$1.parse(source), true, source.length)) {
        if (!doc)
          doc = _doc;
        else if (doc.options.logLevel !== "silent") {
          doc.errors.push(new errors.YAMLParseError(_doc.range.slice(0, 2), "MULTIPLE_DOCS", "Source contains multiple documents; please use YAML.parseAllDocuments()"));
          break;
        }
      }
      if (prettyErrors && lineCounter2) {
        doc.errors.forEach(errors.prettifyError(source, lineCounter2));
        doc.warnings.forEach(errors.prettifyError(source, lineCounter2));
      }
      return doc;
    }
    function parse(src, reviver, options) {
      let _reviver = void 0;
      if (typeof reviver === "function") {
        _reviver = reviver;
      } else if (options === void 0 && reviver && typeof reviver === "object") {
        options = reviver;
      }
      const doc = parseDocument3(src, options);
      if (!doc)
        return null;
      doc.warnings.forEach((warning) => log.warn(doc.options.logLevel, warning));
      if (doc.errors.length > 0) {
        if (doc.options.logLevel !== "silent")
          throw doc.errors[0];
        else
          doc.errors = [];
      }
      return doc.toJS(Object.assign({ reviver: _reviver }, options));
    }
    function stringify(value, replacer, options) {
      let _replacer = null;
      if (typeof replacer === "function" || Array.isArray(replacer)) {
        _replacer = replacer;
      } else if (options === void 0 && replacer) {
        options = replacer;
      }
      if (typeof options === "string")
        options = options.length;
      if (typeof options === "number") {
        const indent = Math.round(options);
        options = indent < 1 ? void 0 : indent > 8 ? { indent: 8 } : { indent };
      }
      if (value === void 0) {
        const { keepUndefined } = options ?? replacer ?? {};
        if (!keepUndefined)
          return void 0;
      }
      if (identity.isDocument(value) && !_replacer)
        return value.toString(options);
      return new Document.Document(value, _replacer, options).toString(options);
    }
    exports.parse = parse;
    exports.parseAllDocuments = parseAllDocuments;
    exports.parseDocument = parseDocument3;
    exports.stringify = stringify;
  }
});

// node_modules/yaml/dist/index.js
var require_dist = __commonJS({
  "node_modules/yaml/dist/index.js"(exports) {
    "use strict";
    var composer = require_composer();
    var Document = require_Document();
    var Schema = require_Schema();
    var errors = require_errors2();
    var Alias = require_Alias();
    var identity = require_identity();
    var Pair = require_Pair();
    var Scalar = require_Scalar();
    var YAMLMap = require_YAMLMap();
    var YAMLSeq = require_YAMLSeq();
    var cst = require_cst();
    var lexer = require_lexer();
    var lineCounter = require_line_counter();
    var parser = require_parser();
    var publicApi = require_public_api();
    var visit2 = require_visit();
    exports.Composer = composer.Composer;
    exports.Document = Document.Document;
    exports.Schema = Schema.Schema;
    exports.YAMLError = errors.YAMLError;
    exports.YAMLParseError = errors.YAMLParseError;
    exports.YAMLWarning = errors.YAMLWarning;
    exports.Alias = Alias.Alias;
    exports.isAlias = identity.isAlias;
    exports.isCollection = identity.isCollection;
    exports.isDocument = identity.isDocument;
    exports.isMap = identity.isMap;
    exports.isNode = identity.isNode;
    exports.isPair = identity.isPair;
    exports.isScalar = identity.isScalar;
    exports.isSeq = identity.isSeq;
    exports.Pair = Pair.Pair;
    exports.Scalar = Scalar.Scalar;
    exports.YAMLMap = YAMLMap.YAMLMap;
    exports.YAMLSeq = YAMLSeq.YAMLSeq;
    exports.CST = cst;
    exports.Lexer = lexer.Lexer;
    exports.LineCounter = lineCounter.LineCounter;
    exports.Parser = parser.Parser;
    exports.parse = publicApi.parse;
    exports.parseAllDocuments = publicApi.parseAllDocuments;
    exports.parseDocument = publicApi.parseDocument;
    exports.stringify = publicApi.stringify;
    exports.visit = visit2.visit;
    exports.visitAsync = visit2.visitAsync;
  }
});

// node_modules/xmlchars/xml/1.0/ed5.js
var require_ed5 = __commonJS({
  "node_modules/xmlchars/xml/1.0/ed5.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.CHAR = "	\n\r -퟿-�𐀀-􏿿";
    exports.S = " 	\r\n";
    exports.NAME_START_CHAR = ":A-Z_a-zÀ-ÖØ-öø-˿Ͱ-ͽͿ-῿‌‍⁰-↏Ⰰ-⿯、-퟿豈-﷏ﷰ-�𐀀-󯿿";
    exports.NAME_CHAR = "-" + exports.NAME_START_CHAR + ".0-9·̀-ͯ‿-⁀";
    exports.CHAR_RE = new RegExp("^[" + exports.CHAR + "]$", "u");
    exports.S_RE = new RegExp("^[" + exports.S + "]+$", "u");
    exports.NAME_START_CHAR_RE = new RegExp("^[" + exports.NAME_START_CHAR + "]$", "u");
    exports.NAME_CHAR_RE = new RegExp("^[" + exports.NAME_CHAR + "]$", "u");
    exports.NAME_RE = new RegExp("^[" + exports.NAME_START_CHAR + "][" + exports.NAME_CHAR + "]*$", "u");
    exports.NMTOKEN_RE = new RegExp("^[" + exports.NAME_CHAR + "]+$", "u");
    var TAB = 9;
    var NL = 10;
    var CR = 13;
    var SPACE = 32;
    exports.S_LIST = [SPACE, NL, CR, TAB];
    function isChar(c) {
      return c >= SPACE && c <= 55295 || c === NL || c === CR || c === TAB || c >= 57344 && c <= 65533 || c >= 65536 && c <= 1114111;
    }
    exports.isChar = isChar;
    function isS(c) {
      return c === SPACE || c === NL || c === CR || c === TAB;
    }
    exports.isS = isS;
    function isNameStartChar(c) {
      return c >= 65 && c <= 90 || c >= 97 && c <= 122 || c === 58 || c === 95 || c === 8204 || c === 8205 || c >= 192 && c <= 214 || c >= 216 && c <= 246 || c >= 248 && c <= 767 || c >= 880 && c <= 893 || c >= 895 && c <= 8191 || c >= 8304 && c <= 8591 || c >= 11264 && c <= 12271 || c >= 12289 && c <= 55295 || c >= 63744 && c <= 64975 || c >= 65008 && c <= 65533 || c >= 65536 && c <= 983039;
    }
    exports.isNameStartChar = isNameStartChar;
    function isNameChar(c) {
      return isNameStartChar(c) || c >= 48 && c <= 57 || c === 45 || c === 46 || c === 183 || c >= 768 && c <= 879 || c >= 8255 && c <= 8256;
    }
    exports.isNameChar = isNameChar;
  }
});

// node_modules/xmlchars/xml/1.1/ed2.js
var require_ed2 = __commonJS({
  "node_modules/xmlchars/xml/1.1/ed2.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.CHAR = "-퟿-�𐀀-􏿿";
    exports.RESTRICTED_CHAR = "-\b\v\f---";
    exports.S = " 	\r\n";
    exports.NAME_START_CHAR = ":A-Z_a-zÀ-ÖØ-öø-˿Ͱ-ͽͿ-῿‌‍⁰-↏Ⰰ-⿯、-퟿豈-﷏ﷰ-�𐀀-󯿿";
    exports.NAME_CHAR = "-" + exports.NAME_START_CHAR + ".0-9·̀-ͯ‿-⁀";
    exports.CHAR_RE = new RegExp("^[" + exports.CHAR + "]$", "u");
    exports.RESTRICTED_CHAR_RE = new RegExp("^[" + exports.RESTRICTED_CHAR + "]$", "u");
    exports.S_RE = new RegExp("^[" + exports.S + "]+$", "u");
    exports.NAME_START_CHAR_RE = new RegExp("^[" + exports.NAME_START_CHAR + "]$", "u");
    exports.NAME_CHAR_RE = new RegExp("^[" + exports.NAME_CHAR + "]$", "u");
    exports.NAME_RE = new RegExp("^[" + exports.NAME_START_CHAR + "][" + exports.NAME_CHAR + "]*$", "u");
    exports.NMTOKEN_RE = new RegExp("^[" + exports.NAME_CHAR + "]+$", "u");
    var TAB = 9;
    var NL = 10;
    var CR = 13;
    var SPACE = 32;
    exports.S_LIST = [SPACE, NL, CR, TAB];
    function isChar(c) {
      return c >= 1 && c <= 55295 || c >= 57344 && c <= 65533 || c >= 65536 && c <= 1114111;
    }
    exports.isChar = isChar;
    function isRestrictedChar(c) {
      return c >= 1 && c <= 8 || c === 11 || c === 12 || c >= 14 && c <= 31 || c >= 127 && c <= 132 || c >= 134 && c <= 159;
    }
    exports.isRestrictedChar = isRestrictedChar;
    function isCharAndNotRestricted(c) {
      return c === 9 || c === 10 || c === 13 || c > 31 && c < 127 || c === 133 || c > 159 && c <= 55295 || c >= 57344 && c <= 65533 || c >= 65536 && c <= 1114111;
    }
    exports.isCharAndNotRestricted = isCharAndNotRestricted;
    function isS(c) {
      return c === SPACE || c === NL || c === CR || c === TAB;
    }
    exports.isS = isS;
    function isNameStartChar(c) {
      return c >= 65 && c <= 90 || c >= 97 && c <= 122 || c === 58 || c === 95 || c === 8204 || c === 8205 || c >= 192 && c <= 214 || c >= 216 && c <= 246 || c >= 248 && c <= 767 || c >= 880 && c <= 893 || c >= 895 && c <= 8191 || c >= 8304 && c <= 8591 || c >= 11264 && c <= 12271 || c >= 12289 && c <= 55295 || c >= 63744 && c <= 64975 || c >= 65008 && c <= 65533 || c >= 65536 && c <= 983039;
    }
    exports.isNameStartChar = isNameStartChar;
    function isNameChar(c) {
      return isNameStartChar(c) || c >= 48 && c <= 57 || c === 45 || c === 46 || c === 183 || c >= 768 && c <= 879 || c >= 8255 && c <= 8256;
    }
    exports.isNameChar = isNameChar;
  }
});

// node_modules/xmlchars/xmlns/1.0/ed3.js
var require_ed3 = __commonJS({
  "node_modules/xmlchars/xmlns/1.0/ed3.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.NC_NAME_START_CHAR = "A-Z_a-zÀ-ÖØ-öø-˿Ͱ-ͽͿ-῿‌-‍⁰-↏Ⰰ-⿯、-퟿豈-﷏ﷰ-�𐀀-󯿿";
    exports.NC_NAME_CHAR = "-" + exports.NC_NAME_START_CHAR + ".0-9·̀-ͯ‿-⁀";
    exports.NC_NAME_START_CHAR_RE = new RegExp("^[" + exports.NC_NAME_START_CHAR + "]$", "u");
    exports.NC_NAME_CHAR_RE = new RegExp("^[" + exports.NC_NAME_CHAR + "]$", "u");
    exports.NC_NAME_RE = new RegExp("^[" + exports.NC_NAME_START_CHAR + "][" + exports.NC_NAME_CHAR + "]*$", "u");
    function isNCNameStartChar(c) {
      return c >= 65 && c <= 90 || c === 95 || c >= 97 && c <= 122 || c >= 192 && c <= 214 || c >= 216 && c <= 246 || c >= 248 && c <= 767 || c >= 880 && c <= 893 || c >= 895 && c <= 8191 || c >= 8204 && c <= 8205 || c >= 8304 && c <= 8591 || c >= 11264 && c <= 12271 || c >= 12289 && c <= 55295 || c >= 63744 && c <= 64975 || c >= 65008 && c <= 65533 || c >= 65536 && c <= 983039;
    }
    exports.isNCNameStartChar = isNCNameStartChar;
    function isNCNameChar(c) {
      return isNCNameStartChar(c) || (c === 45 || c === 46 || c >= 48 && c <= 57 || c === 183 || c >= 768 && c <= 879 || c >= 8255 && c <= 8256);
    }
    exports.isNCNameChar = isNCNameChar;
  }
});

// node_modules/saxes/saxes.js
var require_saxes = __commonJS({
  "node_modules/saxes/saxes.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.SaxesParser = exports.EVENTS = void 0;
    var ed5 = require_ed5();
    var ed2 = require_ed2();
    var NSed3 = require_ed3();
    var isS = ed5.isS;
    var isChar10 = ed5.isChar;
    var isNameStartChar = ed5.isNameStartChar;
    var isNameChar = ed5.isNameChar;
    var S_LIST = ed5.S_LIST;
    var NAME_RE = ed5.NAME_RE;
    var isChar11 = ed2.isChar;
    var isNCNameStartChar = NSed3.isNCNameStartChar;
    var isNCNameChar = NSed3.isNCNameChar;
    var NC_NAME_RE = NSed3.NC_NAME_RE;
    var XML_NAMESPACE = "http://www.w3.org/XML/1998/namespace";
    var XMLNS_NAMESPACE = "http://www.w3.org/2000/xmlns/";
    var rootNS = {
      // eslint-disable-next-line @typescript-eslint/no-explicit-any, @typescript-eslint/no-unsafe-assignment
      __proto__: null,
      xml: XML_NAMESPACE,
      xmlns: XMLNS_NAMESPACE
    };
    var XML_ENTITIES = {
      // eslint-disable-next-line @typescript-eslint/no-explicit-any, @typescript-eslint/no-unsafe-assignment
      __proto__: null,
      amp: "&",
      gt: ">",
      lt: "<",
      quot: '"',
      apos: "'"
    };
    var EOC = -1;
    var NL_LIKE = -2;
    var S_BEGIN = 0;
    var S_BEGIN_WHITESPACE = 1;
    var S_DOCTYPE = 2;
    var S_DOCTYPE_QUOTE = 3;
    var S_DTD = 4;
    var S_DTD_QUOTED = 5;
    var S_DTD_OPEN_WAKA = 6;
    var S_DTD_OPEN_WAKA_BANG = 7;
    var S_DTD_COMMENT = 8;
    var S_DTD_COMMENT_ENDING = 9;
    var S_DTD_COMMENT_ENDED = 10;
    var S_DTD_PI = 11;
    var S_DTD_PI_ENDING = 12;
    var S_TEXT = 13;
    var S_ENTITY = 14;
    var S_OPEN_WAKA = 15;
    var S_OPEN_WAKA_BANG = 16;
    var S_COMMENT = 17;
    var S_COMMENT_ENDING = 18;
    var S_COMMENT_ENDED = 19;
    var S_CDATA = 20;
    var S_CDATA_ENDING = 21;
    var S_CDATA_ENDING_2 = 22;
    var S_PI_FIRST_CHAR = 23;
    var S_PI_REST = 24;
    var S_PI_BODY = 25;
    var S_PI_ENDING = 26;
    var S_XML_DECL_NAME_START = 27;
    var S_XML_DECL_NAME = 28;
    var S_XML_DECL_EQ = 29;
    var S_XML_DECL_VALUE_START = 30;
    var S_XML_DECL_VALUE = 31;
    var S_XML_DECL_SEPARATOR = 32;
    var S_XML_DECL_ENDING = 33;
    var S_OPEN_TAG = 34;
    var S_OPEN_TAG_SLASH = 35;
    var S_ATTRIB = 36;
    var S_ATTRIB_NAME = 37;
    var S_ATTRIB_NAME_SAW_WHITE = 38;
    var S_ATTRIB_VALUE = 39;
    var S_ATTRIB_VALUE_QUOTED = 40;
    var S_ATTRIB_VALUE_CLOSED = 41;
    var S_ATTRIB_VALUE_UNQUOTED = 42;
    var S_CLOSE_TAG = 43;
    var S_CLOSE_TAG_SAW_WHITE = 44;
    var TAB = 9;
    var NL = 10;
    var CR = 13;
    var SPACE = 32;
    var BANG = 33;
    var DQUOTE = 34;
    var AMP = 38;
    var SQUOTE = 39;
    var MINUS = 45;
    var FORWARD_SLASH = 47;
    var SEMICOLON = 59;
    var LESS = 60;
    var EQUAL = 61;
    var GREATER = 62;
    var QUESTION = 63;
    var OPEN_BRACKET = 91;
    var CLOSE_BRACKET = 93;
    var NEL = 133;
    var LS = 8232;
    var isQuote = (c) => c === DQUOTE || c === SQUOTE;
    var QUOTES = [DQUOTE, SQUOTE];
    var DOCTYPE_TERMINATOR = [...QUOTES, OPEN_BRACKET, GREATER];
    var DTD_TERMINATOR = [...QUOTES, LESS, CLOSE_BRACKET];
    var XML_DECL_NAME_TERMINATOR = [EQUAL, QUESTION, ...S_LIST];
    var ATTRIB_VALUE_UNQUOTED_TERMINATOR = [...S_LIST, GREATER, AMP, LESS];
    function nsPairCheck(parser, prefix, uri) {
      switch (prefix) {
        case "xml":
          if (uri !== XML_NAMESPACE) {
            parser.fail(`xml prefix must be bound to ${XML_NAMESPACE}.`);
          }
          break;
        case "xmlns":
          if (uri !== XMLNS_NAMESPACE) {
            parser.fail(`xmlns prefix must be bound to ${XMLNS_NAMESPACE}.`);
          }
          break;
        default:
      }
      switch (uri) {
        case XMLNS_NAMESPACE:
          parser.fail(prefix === "" ? `the default namespace may not be set to ${uri}.` : `may not assign a prefix (even "xmlns") to the URI ${XMLNS_NAMESPACE}.`);
          break;
        case XML_NAMESPACE:
          switch (prefix) {
            case "xml":
              break;
            case "":
              parser.fail(`the default namespace may not be set to ${uri}.`);
              break;
            default:
              parser.fail("may not assign the xml namespace to another prefix.");
          }
          break;
        default:
      }
    }
    function nsMappingCheck(parser, mapping) {
      for (const local of Object.keys(mapping)) {
        nsPairCheck(parser, local, mapping[local]);
      }
    }
    var isNCName = (name) => NC_NAME_RE.test(name);
    var isName = (name) => NAME_RE.test(name);
    var FORBIDDEN_START = 0;
    var FORBIDDEN_BRACKET = 1;
    var FORBIDDEN_BRACKET_BRACKET = 2;
    exports.EVENTS = [
      "xmldecl",
      "text",
      "processinginstruction",
      "doctype",
      "comment",
      "opentagstart",
      "attribute",
      "opentag",
      "closetag",
      "cdata",
      "error",
      "end",
      "ready"
    ];
    var EVENT_NAME_TO_HANDLER_NAME = {
      xmldecl: "xmldeclHandler",
      text: "textHandler",
      processinginstruction: "piHandler",
      doctype: "doctypeHandler",
      comment: "commentHandler",
      opentagstart: "openTagStartHandler",
      attribute: "attributeHandler",
      opentag: "openTagHandler",
      closetag: "closeTagHandler",
      cdata: "cdataHandler",
      error: "errorHandler",
      end: "endHandler",
      ready: "readyHandler"
    };
    var SaxesParser2 = class {
      /**
       * @param opt The parser options.
       */
      constructor(opt) {
        this.opt = opt !== null && opt !== void 0 ? opt : {};
        this.fragmentOpt = !!this.opt.fragment;
        const xmlnsOpt = this.xmlnsOpt = !!this.opt.xmlns;
        this.trackPosition = this.opt.position !== false;
        this.fileName = this.opt.fileName;
        if (xmlnsOpt) {
          this.nameStartCheck = isNCNameStartChar;
          this.nameCheck = isNCNameChar;
          this.isName = isNCName;
          this.processAttribs = this.processAttribsNS;
          this.pushAttrib = this.pushAttribNS;
          this.ns = Object.assign({ __proto__: null }, rootNS);
          const additional = this.opt.additionalNamespaces;
          if (additional != null) {
            nsMappingCheck(this, additional);
            Object.assign(this.ns, additional);
          }
        } else {
          this.nameStartCheck = isNameStartChar;
          this.nameCheck = isNameChar;
          this.isName = isName;
          this.processAttribs = this.processAttribsPlain;
          this.pushAttrib = this.pushAttribPlain;
        }
        this.stateTable = [
          /* eslint-disable @typescript-eslint/unbound-method */
          this.sBegin,
          this.sBeginWhitespace,
          this.sDoctype,
          this.sDoctypeQuote,
          this.sDTD,
          this.sDTDQuoted,
          this.sDTDOpenWaka,
          this.sDTDOpenWakaBang,
          this.sDTDComment,
          this.sDTDCommentEnding,
          this.sDTDCommentEnded,
          this.sDTDPI,
          this.sDTDPIEnding,
          this.sText,
          this.sEntity,
          this.sOpenWaka,
          this.sOpenWakaBang,
          this.sComment,
          this.sCommentEnding,
          this.sCommentEnded,
          this.sCData,
          this.sCDataEnding,
          this.sCDataEnding2,
          this.sPIFirstChar,
          this.sPIRest,
          this.sPIBody,
          this.sPIEnding,
          this.sXMLDeclNameStart,
          this.sXMLDeclName,
          this.sXMLDeclEq,
          this.sXMLDeclValueStart,
          this.sXMLDeclValue,
          this.sXMLDeclSeparator,
          this.sXMLDeclEnding,
          this.sOpenTag,
          this.sOpenTagSlash,
          this.sAttrib,
          this.sAttribName,
          this.sAttribNameSawWhite,
          this.sAttribValue,
          this.sAttribValueQuoted,
          this.sAttribValueClosed,
          this.sAttribValueUnquoted,
          this.sCloseTag,
          this.sCloseTagSawWhite
          /* eslint-enable @typescript-eslint/unbound-method */
        ];
        this._init();
      }
      /**
       * Indicates whether or not the parser is closed. If ``true``, wait for
       * the ``ready`` event to write again.
       */
      get closed() {
        return this._closed;
      }
      _init() {
        var _a;
        this.openWakaBang = "";
        this.text = "";
        this.name = "";
        this.piTarget = "";
        this.entity = "";
        this.q = null;
        this.tags = [];
        this.tag = null;
        this.topNS = null;
        this.chunk = "";
        this.chunkPosition = 0;
        this.i = 0;
        this.prevI = 0;
        this.carriedFromPrevious = void 0;
        this.forbiddenState = FORBIDDEN_START;
        this.attribList = [];
        const { fragmentOpt } = this;
        this.state = fragmentOpt ? S_TEXT : S_BEGIN;
        this.reportedTextBeforeRoot = this.reportedTextAfterRoot = this.closedRoot = this.sawRoot = fragmentOpt;
        this.xmlDeclPossible = !fragmentOpt;
        this.xmlDeclExpects = ["version"];
        this.entityReturnState = void 0;
        let { defaultXMLVersion } = this.opt;
        if (defaultXMLVersion === void 0) {
          if (this.opt.forceXMLVersion === true) {
            throw new Error("forceXMLVersion set but defaultXMLVersion is not set");
          }
          defaultXMLVersion = "1.0";
        }
        this.setXMLVersion(defaultXMLVersion);
        this.positionAtNewLine = 0;
        this.doctype = false;
        this._closed = false;
        this.xmlDecl = {
          version: void 0,
          encoding: void 0,
          standalone: void 0
        };
        this.line = 1;
        this.column = 0;
        this.ENTITIES = Object.create(XML_ENTITIES);
        (_a = this.readyHandler) === null || _a === void 0 ? void 0 : _a.call(this);
      }
      /**
       * The stream position the parser is currently looking at. This field is
       * zero-based.
       *
       * This field is not based on counting Unicode characters but is to be
       * interpreted as a plain index into a JavaScript string.
       */
      get position() {
        return this.chunkPosition + this.i;
      }
      /**
       * The column number of the next character to be read by the parser.  *
       * This field is zero-based. (The first column in a line is 0.)
       *
       * This field reports the index at which the next character would be in the
       * line if the line were represented as a JavaScript string.  Note that this
       * *can* be different to a count based on the number of *Unicode characters*
       * due to how JavaScript handles astral plane characters.
       *
       * See [[column]] for a number that corresponds to a count of Unicode
       * characters.
       */
      get columnIndex() {
        return this.position - this.positionAtNewLine;
      }
      /**
       * Set an event listener on an event. The parser supports one handler per
       * event type. If you try to set an event handler over an existing handler,
       * the old handler is silently overwritten.
       *
       * @param name The event to listen to.
       *
       * @param handler The handler to set.
       */
      on(name, handler) {
        this[EVENT_NAME_TO_HANDLER_NAME[name]] = handler;
      }
      /**
       * Unset an event handler.
       *
       * @parma name The event to stop listening to.
       */
      off(name) {
        this[EVENT_NAME_TO_HANDLER_NAME[name]] = void 0;
      }
      /**
       * Make an error object. The error object will have a message that contains
       * the ``fileName`` option passed at the creation of the parser. If position
       * tracking was turned on, it will also have line and column number
       * information.
       *
       * @param message The message describing the error to report.
       *
       * @returns An error object with a properly formatted message.
       */
      makeError(message) {
        var _a;
        let msg = (_a = this.fileName) !== null && _a !== void 0 ? _a : "";
        if (this.trackPosition) {
          if (msg.length > 0) {
            msg += ":";
          }
          msg += `${this.line}:${this.column}`;
        }
        if (msg.length > 0) {
          msg += ": ";
        }
        return new Error(msg + message);
      }
      /**
       * Report a parsing error. This method is made public so that client code may
       * check for issues that are outside the scope of this project and can report
       * errors.
       *
       * @param message The error to report.
       *
       * @returns this
       */
      fail(message) {
        const err = this.makeError(message);
        const handler = this.errorHandler;
        if (handler === void 0) {
          throw err;
        } else {
          handler(err);
        }
        return this;
      }
      /**
       * Write a XML data to the parser.
       *
       * @param chunk The XML data to write.
       *
       * @returns this
       */
      // We do need object for the type here. Yes, it often causes problems
      // but not in this case.
      write(chunk) {
        if (this.closed) {
          return this.fail("cannot write after close; assign an onready handler.");
        }
        let end = false;
        if (chunk === null) {
          end = true;
          chunk = "";
        } else if (typeof chunk === "object") {
          chunk = chunk.toString();
        }
        if (this.carriedFromPrevious !== void 0) {
          chunk = `${this.carriedFromPrevious}${chunk}`;
          this.carriedFromPrevious = void 0;
        }
        let limit = chunk.length;
        const lastCode = chunk.charCodeAt(limit - 1);
        if (!end && // A trailing CR or surrogate must be carried over to the next
        // chunk.
        (lastCode === CR || lastCode >= 55296 && lastCode <= 56319)) {
          this.carriedFromPrevious = chunk[limit - 1];
          limit--;
          chunk = chunk.slice(0, limit);
        }
        const { stateTable } = this;
        this.chunk = chunk;
        this.i = 0;
        while (this.i < limit) {
          stateTable[this.state].call(this);
        }
        this.chunkPosition += limit;
        return end ? this.end() : this;
      }
      /**
       * Close the current stream. Perform final well-formedness checks and reset
       * the parser tstate.
       *
       * @returns this
       */
      close() {
        return this.write(null);
      }
      /**
       * Get a single code point out of the current chunk. This updates the current
       * position if we do position tracking.
       *
       * This is the algorithm to use for XML 1.0.
       *
       * @returns The character read.
       */
      getCode10() {
        const { chunk, i } = this;
        this.prevI = i;
        this.i = i + 1;
        if (i >= chunk.length) {
          return EOC;
        }
        const code = chunk.charCodeAt(i);
        this.column++;
        if (code < 55296) {
          if (code >= SPACE || code === TAB) {
            return code;
          }
          switch (code) {
            case NL:
              this.line++;
              this.column = 0;
              this.positionAtNewLine = this.position;
              return NL;
            case CR:
              if (chunk.charCodeAt(i + 1) === NL) {
                this.i = i + 2;
              }
              this.line++;
              this.column = 0;
              this.positionAtNewLine = this.position;
              return NL_LIKE;
            default:
              this.fail("disallowed character.");
              return code;
          }
        }
        if (code > 56319) {
          if (!(code >= 57344 && code <= 65533)) {
            this.fail("disallowed character.");
          }
          return code;
        }
        const final = 65536 + (code - 55296) * 1024 + (chunk.charCodeAt(i + 1) - 56320);
        this.i = i + 2;
        if (final > 1114111) {
          this.fail("disallowed character.");
        }
        return final;
      }
      /**
       * Get a single code point out of the current chunk. This updates the current
       * position if we do position tracking.
       *
       * This is the algorithm to use for XML 1.1.
       *
       * @returns {number} The character read.
       */
      getCode11() {
        const { chunk, i } = this;
        this.prevI = i;
        this.i = i + 1;
        if (i >= chunk.length) {
          return EOC;
        }
        const code = chunk.charCodeAt(i);
        this.column++;
        if (code < 55296) {
          if (code > 31 && code < 127 || code > 159 && code !== LS || code === TAB) {
            return code;
          }
          switch (code) {
            case NL:
              this.line++;
              this.column = 0;
              this.positionAtNewLine = this.position;
              return NL;
            case CR: {
              const next = chunk.charCodeAt(i + 1);
              if (next === NL || next === NEL) {
                this.i = i + 2;
              }
            }
            /* yes, fall through */
            case NEL:
            // 0x85
            case LS:
              this.line++;
              this.column = 0;
              this.positionAtNewLine = this.position;
              return NL_LIKE;
            default:
              this.fail("disallowed character.");
              return code;
          }
        }
        if (code > 56319) {
          if (!(code >= 57344 && code <= 65533)) {
            this.fail("disallowed character.");
          }
          return code;
        }
        const final = 65536 + (code - 55296) * 1024 + (chunk.charCodeAt(i + 1) - 56320);
        this.i = i + 2;
        if (final > 1114111) {
          this.fail("disallowed character.");
        }
        return final;
      }
      /**
       * Like ``getCode`` but with the return value normalized so that ``NL`` is
       * returned for ``NL_LIKE``.
       */
      getCodeNorm() {
        const c = this.getCode();
        return c === NL_LIKE ? NL : c;
      }
      unget() {
        this.i = this.prevI;
        this.column--;
      }
      /**
       * Capture characters into a buffer until encountering one of a set of
       * characters.
       *
       * @param chars An array of codepoints. Encountering a character in the array
       * ends the capture. (``chars`` may safely contain ``NL``.)
       *
       * @return The character code that made the capture end, or ``EOC`` if we hit
       * the end of the chunk. The return value cannot be NL_LIKE: NL is returned
       * instead.
       */
      captureTo(chars) {
        let { i: start } = this;
        const { chunk } = this;
        while (true) {
          const c = this.getCode();
          const isNLLike = c === NL_LIKE;
          const final = isNLLike ? NL : c;
          if (final === EOC || chars.includes(final)) {
            this.text += chunk.slice(start, this.prevI);
            return final;
          }
          if (isNLLike) {
            this.text += `${chunk.slice(start, this.prevI)}
`;
            start = this.i;
          }
        }
      }
      /**
       * Capture characters into a buffer until encountering a character.
       *
       * @param char The codepoint that ends the capture. **NOTE ``char`` MAY NOT
       * CONTAIN ``NL``.** Passing ``NL`` will result in buggy behavior.
       *
       * @return ``true`` if we ran into the character. Otherwise, we ran into the
       * end of the current chunk.
       */
      captureToChar(char) {
        let { i: start } = this;
        const { chunk } = this;
        while (true) {
          let c = this.getCode();
          switch (c) {
            case NL_LIKE:
              this.text += `${chunk.slice(start, this.prevI)}
`;
              start = this.i;
              c = NL;
              break;
            case EOC:
              this.text += chunk.slice(start);
              return false;
            default:
          }
          if (c === char) {
            this.text += chunk.slice(start, this.prevI);
            return true;
          }
        }
      }
      /**
       * Capture characters that satisfy ``isNameChar`` into the ``name`` field of
       * this parser.
       *
       * @return The character code that made the test fail, or ``EOC`` if we hit
       * the end of the chunk. The return value cannot be NL_LIKE: NL is returned
       * instead.
       */
      captureNameChars() {
        const { chunk, i: start } = this;
        while (true) {
          const c = this.getCode();
          if (c === EOC) {
            this.name += chunk.slice(start);
            return EOC;
          }
          if (!isNameChar(c)) {
            this.name += chunk.slice(start, this.prevI);
            return c === NL_LIKE ? NL : c;
          }
        }
      }
      /**
       * Skip white spaces.
       *
       * @return The character that ended the skip, or ``EOC`` if we hit
       * the end of the chunk. The return value cannot be NL_LIKE: NL is returned
       * instead.
       */
      skipSpaces() {
        while (true) {
          const c = this.getCodeNorm();
          if (c === EOC || !isS(c)) {
            return c;
          }
        }
      }
      setXMLVersion(version) {
        this.currentXMLVersion = version;
        if (version === "1.0") {
          this.isChar = isChar10;
          this.getCode = this.getCode10;
        } else {
          this.isChar = isChar11;
          this.getCode = this.getCode11;
        }
      }
      // STATE ENGINE METHODS
      // This needs to be a state separate from S_BEGIN_WHITESPACE because we want
      // to be sure never to come back to this state later.
      sBegin() {
        if (this.chunk.charCodeAt(0) === 65279) {
          this.i++;
          this.column++;
        }
        this.state = S_BEGIN_WHITESPACE;
      }
      sBeginWhitespace() {
        const iBefore = this.i;
        const c = this.skipSpaces();
        if (this.prevI !== iBefore) {
          this.xmlDeclPossible = false;
        }
        switch (c) {
          case LESS:
            this.state = S_OPEN_WAKA;
            if (this.text.length !== 0) {
              throw new Error("no-empty text at start");
            }
            break;
          case EOC:
            break;
          default:
            this.unget();
            this.state = S_TEXT;
            this.xmlDeclPossible = false;
        }
      }
      sDoctype() {
        var _a;
        const c = this.captureTo(DOCTYPE_TERMINATOR);
        switch (c) {
          case GREATER: {
            (_a = this.doctypeHandler) === null || _a === void 0 ? void 0 : _a.call(this, this.text);
            this.text = "";
            this.state = S_TEXT;
            this.doctype = true;
            break;
          }
          case EOC:
            break;
          default:
            this.text += String.fromCodePoint(c);
            if (c === OPEN_BRACKET) {
              this.state = S_DTD;
            } else if (isQuote(c)) {
              this.state = S_DOCTYPE_QUOTE;
              this.q = c;
            }
        }
      }
      sDoctypeQuote() {
        const q = this.q;
        if (this.captureToChar(q)) {
          this.text += String.fromCodePoint(q);
          this.q = null;
          this.state = S_DOCTYPE;
        }
      }
      sDTD() {
        const c = this.captureTo(DTD_TERMINATOR);
        if (c === EOC) {
          return;
        }
        this.text += String.fromCodePoint(c);
        if (c === CLOSE_BRACKET) {
          this.state = S_DOCTYPE;
        } else if (c === LESS) {
          this.state = S_DTD_OPEN_WAKA;
        } else if (isQuote(c)) {
          this.state = S_DTD_QUOTED;
          this.q = c;
        }
      }
      sDTDQuoted() {
        const q = this.q;
        if (this.captureToChar(q)) {
          this.text += String.fromCodePoint(q);
          this.state = S_DTD;
          this.q = null;
        }
      }
      sDTDOpenWaka() {
        const c = this.getCodeNorm();
        this.text += String.fromCodePoint(c);
        switch (c) {
          case BANG:
            this.state = S_DTD_OPEN_WAKA_BANG;
            this.openWakaBang = "";
            break;
          case QUESTION:
            this.state = S_DTD_PI;
            break;
          default:
            this.state = S_DTD;
        }
      }
      sDTDOpenWakaBang() {
        const char = String.fromCodePoint(this.getCodeNorm());
        const owb = this.openWakaBang += char;
        this.text += char;
        if (owb !== "-") {
          this.state = owb === "--" ? S_DTD_COMMENT : S_DTD;
          this.openWakaBang = "";
        }
      }
      sDTDComment() {
        if (this.captureToChar(MINUS)) {
          this.text += "-";
          this.state = S_DTD_COMMENT_ENDING;
        }
      }
      sDTDCommentEnding() {
        const c = this.getCodeNorm();
        this.text += String.fromCodePoint(c);
        this.state = c === MINUS ? S_DTD_COMMENT_ENDED : S_DTD_COMMENT;
      }
      sDTDCommentEnded() {
        const c = this.getCodeNorm();
        this.text += String.fromCodePoint(c);
        if (c === GREATER) {
          this.state = S_DTD;
        } else {
          this.fail("malformed comment.");
          this.state = S_DTD_COMMENT;
        }
      }
      sDTDPI() {
        if (this.captureToChar(QUESTION)) {
          this.text += "?";
          this.state = S_DTD_PI_ENDING;
        }
      }
      sDTDPIEnding() {
        const c = this.getCodeNorm();
        this.text += String.fromCodePoint(c);
        if (c === GREATER) {
          this.state = S_DTD;
        }
      }
      sText() {
        if (this.tags.length !== 0) {
          this.handleTextInRoot();
        } else {
          this.handleTextOutsideRoot();
        }
      }
      sEntity() {
        let { i: start } = this;
        const { chunk } = this;
        loop:
          while (true) {
            switch (this.getCode()) {
              case NL_LIKE:
                this.entity += `${chunk.slice(start, this.prevI)}
`;
                start = this.i;
                break;
              case SEMICOLON: {
                const { entityReturnState } = this;
                const entity = this.entity + chunk.slice(start, this.prevI);
                this.state = entityReturnState;
                let parsed;
                if (entity === "") {
                  this.fail("empty entity name.");
                  parsed = "&;";
                } else {
                  parsed = this.parseEntity(entity);
                  this.entity = "";
                }
                if (entityReturnState !== S_TEXT || this.textHandler !== void 0) {
                  this.text += parsed;
                }
                break loop;
              }
              case EOC:
                this.entity += chunk.slice(start);
                break loop;
              default:
            }
          }
      }
      sOpenWaka() {
        const c = this.getCode();
        if (isNameStartChar(c)) {
          this.state = S_OPEN_TAG;
          this.unget();
          this.xmlDeclPossible = false;
        } else {
          switch (c) {
            case FORWARD_SLASH:
              this.state = S_CLOSE_TAG;
              this.xmlDeclPossible = false;
              break;
            case BANG:
              this.state = S_OPEN_WAKA_BANG;
              this.openWakaBang = "";
              this.xmlDeclPossible = false;
              break;
            case QUESTION:
              this.state = S_PI_FIRST_CHAR;
              break;
            default:
              this.fail("disallowed character in tag name");
              this.state = S_TEXT;
              this.xmlDeclPossible = false;
          }
        }
      }
      sOpenWakaBang() {
        this.openWakaBang += String.fromCodePoint(this.getCodeNorm());
        switch (this.openWakaBang) {
          case "[CDATA[":
            if (!this.sawRoot && !this.reportedTextBeforeRoot) {
              this.fail("text data outside of root node.");
              this.reportedTextBeforeRoot = true;
            }
            if (this.closedRoot && !this.reportedTextAfterRoot) {
              this.fail("text data outside of root node.");
              this.reportedTextAfterRoot = true;
            }
            this.state = S_CDATA;
            this.openWakaBang = "";
            break;
          case "--":
            this.state = S_COMMENT;
            this.openWakaBang = "";
            break;
          case "DOCTYPE":
            this.state = S_DOCTYPE;
            if (this.doctype || this.sawRoot) {
              this.fail("inappropriately located doctype declaration.");
            }
            this.openWakaBang = "";
            break;
          default:
            if (this.openWakaBang.length >= 7) {
              this.fail("incorrect syntax.");
            }
        }
      }
      sComment() {
        if (this.captureToChar(MINUS)) {
          this.state = S_COMMENT_ENDING;
        }
      }
      sCommentEnding() {
        var _a;
        const c = this.getCodeNorm();
        if (c === MINUS) {
          this.state = S_COMMENT_ENDED;
          (_a = this.commentHandler) === null || _a === void 0 ? void 0 : _a.call(this, this.text);
          this.text = "";
        } else {
          this.text += `-${String.fromCodePoint(c)}`;
          this.state = S_COMMENT;
        }
      }
      sCommentEnded() {
        const c = this.getCodeNorm();
        if (c !== GREATER) {
          this.fail("malformed comment.");
          this.text += `--${String.fromCodePoint(c)}`;
          this.state = S_COMMENT;
        } else {
          this.state = S_TEXT;
        }
      }
      sCData() {
        if (this.captureToChar(CLOSE_BRACKET)) {
          this.state = S_CDATA_ENDING;
        }
      }
      sCDataEnding() {
        const c = this.getCodeNorm();
        if (c === CLOSE_BRACKET) {
          this.state = S_CDATA_ENDING_2;
        } else {
          this.text += `]${String.fromCodePoint(c)}`;
          this.state = S_CDATA;
        }
      }
      sCDataEnding2() {
        var _a;
        const c = this.getCodeNorm();
        switch (c) {
          case GREATER: {
            (_a = this.cdataHandler) === null || _a === void 0 ? void 0 : _a.call(this, this.text);
            this.text = "";
            this.state = S_TEXT;
            break;
          }
          case CLOSE_BRACKET:
            this.text += "]";
            break;
          default:
            this.text += `]]${String.fromCodePoint(c)}`;
            this.state = S_CDATA;
        }
      }
      // We need this separate state to check the first character fo the pi target
      // with this.nameStartCheck which allows less characters than this.nameCheck.
      sPIFirstChar() {
        const c = this.getCodeNorm();
        if (this.nameStartCheck(c)) {
          this.piTarget += String.fromCodePoint(c);
          this.state = S_PI_REST;
        } else if (c === QUESTION || isS(c)) {
          this.fail("processing instruction without a target.");
          this.state = c === QUESTION ? S_PI_ENDING : S_PI_BODY;
        } else {
          this.fail("disallowed character in processing instruction name.");
          this.piTarget += String.fromCodePoint(c);
          this.state = S_PI_REST;
        }
      }
      sPIRest() {
        const { chunk, i: start } = this;
        while (true) {
          const c = this.getCodeNorm();
          if (c === EOC) {
            this.piTarget += chunk.slice(start);
            return;
          }
          if (!this.nameCheck(c)) {
            this.piTarget += chunk.slice(start, this.prevI);
            const isQuestion = c === QUESTION;
            if (isQuestion || isS(c)) {
              if (this.piTarget === "xml") {
                if (!this.xmlDeclPossible) {
                  this.fail("an XML declaration must be at the start of the document.");
                }
                this.state = isQuestion ? S_XML_DECL_ENDING : S_XML_DECL_NAME_START;
              } else {
                this.state = isQuestion ? S_PI_ENDING : S_PI_BODY;
              }
            } else {
              this.fail("disallowed character in processing instruction name.");
              this.piTarget += String.fromCodePoint(c);
            }
            break;
          }
        }
      }
      sPIBody() {
        if (this.text.length === 0) {
          const c = this.getCodeNorm();
          if (c === QUESTION) {
            this.state = S_PI_ENDING;
          } else if (!isS(c)) {
            this.text = String.fromCodePoint(c);
          }
        } else if (this.captureToChar(QUESTION)) {
          this.state = S_PI_ENDING;
        }
      }
      sPIEnding() {
        var _a;
        const c = this.getCodeNorm();
        if (c === GREATER) {
          const { piTarget } = this;
          if (piTarget.toLowerCase() === "xml") {
            this.fail("the XML declaration must appear at the start of the document.");
          }
          (_a = this.piHandler) === null || _a === void 0 ? void 0 : _a.call(this, {
            target: piTarget,
            body: this.text
          });
          this.piTarget = this.text = "";
          this.state = S_TEXT;
        } else if (c === QUESTION) {
          this.text += "?";
        } else {
          this.text += `?${String.fromCodePoint(c)}`;
          this.state = S_PI_BODY;
        }
        this.xmlDeclPossible = false;
      }
      sXMLDeclNameStart() {
        const c = this.skipSpaces();
        if (c === QUESTION) {
          this.state = S_XML_DECL_ENDING;
          return;
        }
        if (c !== EOC) {
          this.state = S_XML_DECL_NAME;
          this.name = String.fromCodePoint(c);
        }
      }
      sXMLDeclName() {
        const c = this.captureTo(XML_DECL_NAME_TERMINATOR);
        if (c === QUESTION) {
          this.state = S_XML_DECL_ENDING;
          this.name += this.text;
          this.text = "";
          this.fail("XML declaration is incomplete.");
          return;
        }
        if (!(isS(c) || c === EQUAL)) {
          return;
        }
        this.name += this.text;
        this.text = "";
        if (!this.xmlDeclExpects.includes(this.name)) {
          switch (this.name.length) {
            case 0:
              this.fail("did not expect any more name/value pairs.");
              break;
            case 1:
              this.fail(`expected the name ${this.xmlDeclExpects[0]}.`);
              break;
            default:
              this.fail(`expected one of ${this.xmlDeclExpects.join(", ")}`);
          }
        }
        this.state = c === EQUAL ? S_XML_DECL_VALUE_START : S_XML_DECL_EQ;
      }
      sXMLDeclEq() {
        const c = this.getCodeNorm();
        if (c === QUESTION) {
          this.state = S_XML_DECL_ENDING;
          this.fail("XML declaration is incomplete.");
          return;
        }
        if (isS(c)) {
          return;
        }
        if (c !== EQUAL) {
          this.fail("value required.");
        }
        this.state = S_XML_DECL_VALUE_START;
      }
      sXMLDeclValueStart() {
        const c = this.getCodeNorm();
        if (c === QUESTION) {
          this.state = S_XML_DECL_ENDING;
          this.fail("XML declaration is incomplete.");
          return;
        }
        if (isS(c)) {
          return;
        }
        if (!isQuote(c)) {
          this.fail("value must be quoted.");
          this.q = SPACE;
        } else {
          this.q = c;
        }
        this.state = S_XML_DECL_VALUE;
      }
      sXMLDeclValue() {
        const c = this.captureTo([this.q, QUESTION]);
        if (c === QUESTION) {
          this.state = S_XML_DECL_ENDING;
          this.text = "";
          this.fail("XML declaration is incomplete.");
          return;
        }
        if (c === EOC) {
          return;
        }
        const value = this.text;
        this.text = "";
        switch (this.name) {
          case "version": {
            this.xmlDeclExpects = ["encoding", "standalone"];
            const version = value;
            this.xmlDecl.version = version;
            if (!/^1\.[0-9]+$/.test(version)) {
              this.fail("version number must match /^1\\.[0-9]+$/.");
            } else if (!this.opt.forceXMLVersion) {
              this.setXMLVersion(version);
            }
            break;
          }
          case "encoding":
            if (!/^[A-Za-z][A-Za-z0-9._-]*$/.test(value)) {
              this.fail("encoding value must match /^[A-Za-z0-9][A-Za-z0-9._-]*$/.");
            }
            this.xmlDeclExpects = ["standalone"];
            this.xmlDecl.encoding = value;
            break;
          case "standalone":
            if (value !== "yes" && value !== "no") {
              this.fail('standalone value must match "yes" or "no".');
            }
            this.xmlDeclExpects = [];
            this.xmlDecl.standalone = value;
            break;
          default:
        }
        this.name = "";
        this.state = S_XML_DECL_SEPARATOR;
      }
      sXMLDeclSeparator() {
        const c = this.getCodeNorm();
        if (c === QUESTION) {
          this.state = S_XML_DECL_ENDING;
          return;
        }
        if (!isS(c)) {
          this.fail("whitespace required.");
          this.unget();
        }
        this.state = S_XML_DECL_NAME_START;
      }
      sXMLDeclEnding() {
        var _a;
        const c = this.getCodeNorm();
        if (c === GREATER) {
          if (this.piTarget !== "xml") {
            this.fail("processing instructions are not allowed before root.");
          } else if (this.name !== "version" && this.xmlDeclExpects.includes("version")) {
            this.fail("XML declaration must contain a version.");
          }
          (_a = this.xmldeclHandler) === null || _a === void 0 ? void 0 : _a.call(this, this.xmlDecl);
          this.name = "";
          this.piTarget = this.text = "";
          this.state = S_TEXT;
        } else {
          this.fail("The character ? is disallowed anywhere in XML declarations.");
        }
        this.xmlDeclPossible = false;
      }
      sOpenTag() {
        var _a;
        const c = this.captureNameChars();
        if (c === EOC) {
          return;
        }
        const tag = this.tag = {
          name: this.name,
          attributes: /* @__PURE__ */ Object.create(null)
        };
        this.name = "";
        if (this.xmlnsOpt) {
          this.topNS = tag.ns = /* @__PURE__ */ Object.create(null);
        }
        (_a = this.openTagStartHandler) === null || _a === void 0 ? void 0 : _a.call(this, tag);
        this.sawRoot = true;
        if (!this.fragmentOpt && this.closedRoot) {
          this.fail("documents may contain only one root.");
        }
        switch (c) {
          case GREATER:
            this.openTag();
            break;
          case FORWARD_SLASH:
            this.state = S_OPEN_TAG_SLASH;
            break;
          default:
            if (!isS(c)) {
              this.fail("disallowed character in tag name.");
            }
            this.state = S_ATTRIB;
        }
      }
      sOpenTagSlash() {
        if (this.getCode() === GREATER) {
          this.openSelfClosingTag();
        } else {
          this.fail("forward-slash in opening tag not followed by >.");
          this.state = S_ATTRIB;
        }
      }
      sAttrib() {
        const c = this.skipSpaces();
        if (c === EOC) {
          return;
        }
        if (isNameStartChar(c)) {
          this.unget();
          this.state = S_ATTRIB_NAME;
        } else if (c === GREATER) {
          this.openTag();
        } else if (c === FORWARD_SLASH) {
          this.state = S_OPEN_TAG_SLASH;
        } else {
          this.fail("disallowed character in attribute name.");
        }
      }
      sAttribName() {
        const c = this.captureNameChars();
        if (c === EQUAL) {
          this.state = S_ATTRIB_VALUE;
        } else if (isS(c)) {
          this.state = S_ATTRIB_NAME_SAW_WHITE;
        } else if (c === GREATER) {
          this.fail("attribute without value.");
          this.pushAttrib(this.name, this.name);
          this.name = this.text = "";
          this.openTag();
        } else if (c !== EOC) {
          this.fail("disallowed character in attribute name.");
        }
      }
      sAttribNameSawWhite() {
        const c = this.skipSpaces();
        switch (c) {
          case EOC:
            return;
          case EQUAL:
            this.state = S_ATTRIB_VALUE;
            break;
          default:
            this.fail("attribute without value.");
            this.text = "";
            this.name = "";
            if (c === GREATER) {
              this.openTag();
            } else if (isNameStartChar(c)) {
              this.unget();
              this.state = S_ATTRIB_NAME;
            } else {
              this.fail("disallowed character in attribute name.");
              this.state = S_ATTRIB;
            }
        }
      }
      sAttribValue() {
        const c = this.getCodeNorm();
        if (isQuote(c)) {
          this.q = c;
          this.state = S_ATTRIB_VALUE_QUOTED;
        } else if (!isS(c)) {
          this.fail("unquoted attribute value.");
          this.state = S_ATTRIB_VALUE_UNQUOTED;
          this.unget();
        }
      }
      sAttribValueQuoted() {
        const { q, chunk } = this;
        let { i: start } = this;
        while (true) {
          switch (this.getCode()) {
            case q:
              this.pushAttrib(this.name, this.text + chunk.slice(start, this.prevI));
              this.name = this.text = "";
              this.q = null;
              this.state = S_ATTRIB_VALUE_CLOSED;
              return;
            case AMP:
              this.text += chunk.slice(start, this.prevI);
              this.state = S_ENTITY;
              this.entityReturnState = S_ATTRIB_VALUE_QUOTED;
              return;
            case NL:
            case NL_LIKE:
            case TAB:
              this.text += `${chunk.slice(start, this.prevI)} `;
              start = this.i;
              break;
            case LESS:
              this.text += chunk.slice(start, this.prevI);
              this.fail("disallowed character.");
              return;
            case EOC:
              this.text += chunk.slice(start);
              return;
            default:
          }
        }
      }
      sAttribValueClosed() {
        const c = this.getCodeNorm();
        if (isS(c)) {
          this.state = S_ATTRIB;
        } else if (c === GREATER) {
          this.openTag();
        } else if (c === FORWARD_SLASH) {
          this.state = S_OPEN_TAG_SLASH;
        } else if (isNameStartChar(c)) {
          this.fail("no whitespace between attributes.");
          this.unget();
          this.state = S_ATTRIB_NAME;
        } else {
          this.fail("disallowed character in attribute name.");
        }
      }
      sAttribValueUnquoted() {
        const c = this.captureTo(ATTRIB_VALUE_UNQUOTED_TERMINATOR);
        switch (c) {
          case AMP:
            this.state = S_ENTITY;
            this.entityReturnState = S_ATTRIB_VALUE_UNQUOTED;
            break;
          case LESS:
            this.fail("disallowed character.");
            break;
          case EOC:
            break;
          default:
            if (this.text.includes("]]>")) {
              this.fail('the string "]]>" is disallowed in char data.');
            }
            this.pushAttrib(this.name, this.text);
            this.name = this.text = "";
            if (c === GREATER) {
              this.openTag();
            } else {
              this.state = S_ATTRIB;
            }
        }
      }
      sCloseTag() {
        const c = this.captureNameChars();
        if (c === GREATER) {
          this.closeTag();
        } else if (isS(c)) {
          this.state = S_CLOSE_TAG_SAW_WHITE;
        } else if (c !== EOC) {
          this.fail("disallowed character in closing tag.");
        }
      }
      sCloseTagSawWhite() {
        switch (this.skipSpaces()) {
          case GREATER:
            this.closeTag();
            break;
          case EOC:
            break;
          default:
            this.fail("disallowed character in closing tag.");
        }
      }
      // END OF STATE ENGINE METHODS
      handleTextInRoot() {
        let { i: start, forbiddenState } = this;
        const { chunk, textHandler: handler } = this;
        scanLoop:
          while (true) {
            switch (this.getCode()) {
              case LESS: {
                this.state = S_OPEN_WAKA;
                if (handler !== void 0) {
                  const { text: text2 } = this;
                  const slice = chunk.slice(start, this.prevI);
                  if (text2.length !== 0) {
                    handler(text2 + slice);
                    this.text = "";
                  } else if (slice.length !== 0) {
                    handler(slice);
                  }
                }
                forbiddenState = FORBIDDEN_START;
                break scanLoop;
              }
              case AMP:
                this.state = S_ENTITY;
                this.entityReturnState = S_TEXT;
                if (handler !== void 0) {
                  this.text += chunk.slice(start, this.prevI);
                }
                forbiddenState = FORBIDDEN_START;
                break scanLoop;
              case CLOSE_BRACKET:
                switch (forbiddenState) {
                  case FORBIDDEN_START:
                    forbiddenState = FORBIDDEN_BRACKET;
                    break;
                  case FORBIDDEN_BRACKET:
                    forbiddenState = FORBIDDEN_BRACKET_BRACKET;
                    break;
                  case FORBIDDEN_BRACKET_BRACKET:
                    break;
                  default:
                    throw new Error("impossible state");
                }
                break;
              case GREATER:
                if (forbiddenState === FORBIDDEN_BRACKET_BRACKET) {
                  this.fail('the string "]]>" is disallowed in char data.');
                }
                forbiddenState = FORBIDDEN_START;
                break;
              case NL_LIKE:
                if (handler !== void 0) {
                  this.text += `${chunk.slice(start, this.prevI)}
`;
                }
                start = this.i;
                forbiddenState = FORBIDDEN_START;
                break;
              case EOC:
                if (handler !== void 0) {
                  this.text += chunk.slice(start);
                }
                break scanLoop;
              default:
                forbiddenState = FORBIDDEN_START;
            }
          }
        this.forbiddenState = forbiddenState;
      }
      handleTextOutsideRoot() {
        let { i: start } = this;
        const { chunk, textHandler: handler } = this;
        let nonSpace = false;
        outRootLoop:
          while (true) {
            const code = this.getCode();
            switch (code) {
              case LESS: {
                this.state = S_OPEN_WAKA;
                if (handler !== void 0) {
                  const { text: text2 } = this;
                  const slice = chunk.slice(start, this.prevI);
                  if (text2.length !== 0) {
                    handler(text2 + slice);
                    this.text = "";
                  } else if (slice.length !== 0) {
                    handler(slice);
                  }
                }
                break outRootLoop;
              }
              case AMP:
                this.state = S_ENTITY;
                this.entityReturnState = S_TEXT;
                if (handler !== void 0) {
                  this.text += chunk.slice(start, this.prevI);
                }
                nonSpace = true;
                break outRootLoop;
              case NL_LIKE:
                if (handler !== void 0) {
                  this.text += `${chunk.slice(start, this.prevI)}
`;
                }
                start = this.i;
                break;
              case EOC:
                if (handler !== void 0) {
                  this.text += chunk.slice(start);
                }
                break outRootLoop;
              default:
                if (!isS(code)) {
                  nonSpace = true;
                }
            }
          }
        if (!nonSpace) {
          return;
        }
        if (!this.sawRoot && !this.reportedTextBeforeRoot) {
          this.fail("text data outside of root node.");
          this.reportedTextBeforeRoot = true;
        }
        if (this.closedRoot && !this.reportedTextAfterRoot) {
          this.fail("text data outside of root node.");
          this.reportedTextAfterRoot = true;
        }
      }
      pushAttribNS(name, value) {
        var _a;
        const { prefix, local } = this.qname(name);
        const attr = { name, prefix, local, value };
        this.attribList.push(attr);
        (_a = this.attributeHandler) === null || _a === void 0 ? void 0 : _a.call(this, attr);
        if (prefix === "xmlns") {
          const trimmed = value.trim();
          if (this.currentXMLVersion === "1.0" && trimmed === "") {
            this.fail("invalid attempt to undefine prefix in XML 1.0");
          }
          this.topNS[local] = trimmed;
          nsPairCheck(this, local, trimmed);
        } else if (name === "xmlns") {
          const trimmed = value.trim();
          this.topNS[""] = trimmed;
          nsPairCheck(this, "", trimmed);
        }
      }
      pushAttribPlain(name, value) {
        var _a;
        const attr = { name, value };
        this.attribList.push(attr);
        (_a = this.attributeHandler) === null || _a === void 0 ? void 0 : _a.call(this, attr);
      }
      /**
       * End parsing. This performs final well-formedness checks and resets the
       * parser to a clean state.
       *
       * @returns this
       */
      end() {
        var _a, _b;
        if (!this.sawRoot) {
          this.fail("document must contain a root element.");
        }
        const { tags } = this;
        while (tags.length > 0) {
          const tag = tags.pop();
          this.fail(`unclosed tag: ${tag.name}`);
        }
        if (this.state !== S_BEGIN && this.state !== S_TEXT) {
          this.fail("unexpected end.");
        }
        const { text: text2 } = this;
        if (text2.length !== 0) {
          (_a = this.textHandler) === null || _a === void 0 ? void 0 : _a.call(this, text2);
          this.text = "";
        }
        this._closed = true;
        (_b = this.endHandler) === null || _b === void 0 ? void 0 : _b.call(this);
        this._init();
        return this;
      }
      /**
       * Resolve a namespace prefix.
       *
       * @param prefix The prefix to resolve.
       *
       * @returns The namespace URI or ``undefined`` if the prefix is not defined.
       */
      resolve(prefix) {
        var _a, _b;
        let uri = this.topNS[prefix];
        if (uri !== void 0) {
          return uri;
        }
        const { tags } = this;
        for (let index = tags.length - 1; index >= 0; index--) {
          uri = tags[index].ns[prefix];
          if (uri !== void 0) {
            return uri;
          }
        }
        uri = this.ns[prefix];
        if (uri !== void 0) {
          return uri;
        }
        return (_b = (_a = this.opt).resolvePrefix) === null || _b === void 0 ? void 0 : _b.call(_a, prefix);
      }
      /**
       * Parse a qname into its prefix and local name parts.
       *
       * @param name The name to parse
       *
       * @returns
       */
      qname(name) {
        const colon = name.indexOf(":");
        if (colon === -1) {
          return { prefix: "", local: name };
        }
        const local = name.slice(colon + 1);
        const prefix = name.slice(0, colon);
        if (prefix === "" || local === "" || local.includes(":")) {
          this.fail(`malformed name: ${name}.`);
        }
        return { prefix, local };
      }
      processAttribsNS() {
        var _a;
        const { attribList } = this;
        const tag = this.tag;
        {
          const { prefix, local } = this.qname(tag.name);
          tag.prefix = prefix;
          tag.local = local;
          const uri = tag.uri = (_a = this.resolve(prefix)) !== null && _a !== void 0 ? _a : "";
          if (prefix !== "") {
            if (prefix === "xmlns") {
              this.fail('tags may not have "xmlns" as prefix.');
            }
            if (uri === "") {
              this.fail(`unbound namespace prefix: ${JSON.stringify(prefix)}.`);
              tag.uri = prefix;
            }
          }
        }
        if (attribList.length === 0) {
          return;
        }
        const { attributes } = tag;
        const seen = /* @__PURE__ */ new Set();
        for (const attr of attribList) {
          const { name, prefix, local } = attr;
          let uri;
          let eqname;
          if (prefix === "") {
            uri = name === "xmlns" ? XMLNS_NAMESPACE : "";
            eqname = name;
          } else {
            uri = this.resolve(prefix);
            if (uri === void 0) {
              this.fail(`unbound namespace prefix: ${JSON.stringify(prefix)}.`);
              uri = prefix;
            }
            eqname = `{${uri}}${local}`;
          }
          if (seen.has(eqname)) {
            this.fail(`duplicate attribute: ${eqname}.`);
          }
          seen.add(eqname);
          attr.uri = uri;
          attributes[name] = attr;
        }
        this.attribList = [];
      }
      processAttribsPlain() {
        const { attribList } = this;
        const attributes = this.tag.attributes;
        for (const { name, value } of attribList) {
          if (attributes[name] !== void 0) {
            this.fail(`duplicate attribute: ${name}.`);
          }
          attributes[name] = value;
        }
        this.attribList = [];
      }
      /**
       * Handle a complete open tag. This parser code calls this once it has seen
       * the whole tag. This method checks for well-formeness and then emits
       * ``onopentag``.
       */
      openTag() {
        var _a;
        this.processAttribs();
        const { tags } = this;
        const tag = this.tag;
        tag.isSelfClosing = false;
        (_a = this.openTagHandler) === null || _a === void 0 ? void 0 : _a.call(this, tag);
        tags.push(tag);
        this.state = S_TEXT;
        this.name = "";
      }
      /**
       * Handle a complete self-closing tag. This parser code calls this once it has
       * seen the whole tag. This method checks for well-formeness and then emits
       * ``onopentag`` and ``onclosetag``.
       */
      openSelfClosingTag() {
        var _a, _b, _c;
        this.processAttribs();
        const { tags } = this;
        const tag = this.tag;
        tag.isSelfClosing = true;
        (_a = this.openTagHandler) === null || _a === void 0 ? void 0 : _a.call(this, tag);
        (_b = this.closeTagHandler) === null || _b === void 0 ? void 0 : _b.call(this, tag);
        const top = this.tag = (_c = tags[tags.length - 1]) !== null && _c !== void 0 ? _c : null;
        if (top === null) {
          this.closedRoot = true;
        }
        this.state = S_TEXT;
        this.name = "";
      }
      /**
       * Handle a complete close tag. This parser code calls this once it has seen
       * the whole tag. This method checks for well-formeness and then emits
       * ``onclosetag``.
       */
      closeTag() {
        const { tags, name } = this;
        this.state = S_TEXT;
        this.name = "";
        if (name === "") {
          this.fail("weird empty close tag.");
          this.text += "</>";
          return;
        }
        const handler = this.closeTagHandler;
        let l = tags.length;
        while (l-- > 0) {
          const tag = this.tag = tags.pop();
          this.topNS = tag.ns;
          handler === null || handler === void 0 ? void 0 : handler(tag);
          if (tag.name === name) {
            break;
          }
          this.fail("unexpected close tag.");
        }
        if (l === 0) {
          this.closedRoot = true;
        } else if (l < 0) {
          this.fail(`unmatched closing tag: ${name}.`);
          this.text += `</${name}>`;
        }
      }
      /**
       * Resolves an entity. Makes any necessary well-formedness checks.
       *
       * @param entity The entity to resolve.
       *
       * @returns The parsed entity.
       */
      parseEntity(entity) {
        if (entity[0] !== "#") {
          const defined = this.ENTITIES[entity];
          if (defined !== void 0) {
            return defined;
          }
          this.fail(this.isName(entity) ? "undefined entity." : "disallowed character in entity name.");
          return `&${entity};`;
        }
        let num2 = NaN;
        if (entity[1] === "x" && /^#x[0-9a-f]+$/i.test(entity)) {
          num2 = parseInt(entity.slice(2), 16);
        } else if (/^#[0-9]+$/.test(entity)) {
          num2 = parseInt(entity.slice(1), 10);
        }
        if (!this.isChar(num2)) {
          this.fail("malformed character entity.");
          return `&${entity};`;
        }
        return String.fromCodePoint(num2);
      }
    };
    exports.SaxesParser = SaxesParser2;
  }
});

// src/policy/defaults.ts
var DEFAULT_POLICY_PATH = ".netbrace.yaml";
var BUILTIN_POLICY_NAME = "<built-in policy>";
var REGIONAL_UNTIL_KM = 50;
var DEFAULT_ERROR_MULTIPLE = 2;
var STARTER_POLICY = `# netbrace policy: what a network design must satisfy before a change to it merges.
# Every key is optional; a key left out takes the value of the built-in policy, which is
# exactly this file. Editors can check it against policy.schema.json (shipped in dist/).
#
# netbrace informs engineering judgement; it does not replace engineering studies.
# Local codes, regulators' standards and licensed practice decide for real infrastructure.
version: 1

# Which files are designs (globs from the repository root; "format" forces a format).
designs:
  - paths: ["**/*.graphml", "**/*.gml", "**/*.net.yaml", "**/*.net.yml", "**/*.net.json"]
# exclude: ["archive/**"]

# Seed of every random challenge: the same inputs and seed give the same report.
seed: 1

# R, the robustness value: normalized metrics (each in [0, 1]) combined into one number.
r-value:
  metrics:
    pair_connectivity: 1   # share of node pairs that can still reach each other
    efficiency: 1          # mean inverse hop distance
  combine: mean            # mean (weighted) or min

# Challenges, each under a name of your choosing (requirements refer to it).
#   remove:   nodes | links | risk-groups | region
#   order:    random (a Monte Carlo envelope) | degree | betweenness | eigenvector |
#             closeness (targeted attacks, highest score first) | worst-first (risk groups)
#   adaptive: true recomputes the attack's scores after every removal
challenges:
  node-failures:
    remove: nodes
    order: random
    until: 0.2             # up to 20 % of the nodes fail
    points: 5              # grid 0, 0.05, 0.1, 0.15, 0.2
    realizations: 200
    band: [0.1, 0.9]       # the envelope's lower and upper quantile
  link-failures:
    remove: links
    order: random
    until: 0.2
    points: 5
    realizations: 200
    band: [0.1, 0.9]
  degree-attack:
    remove: nodes
    order: degree
    adaptive: true
    until: 0.2

# Requirements; severity is fail (the gate fails), warn or notice.
requirements:
  # A change may not add a bridge or a cut node that the base did not have.
  - kind: no-new-spof
    severity: fail
  # Areas under the envelopes, tracked for weakening (no floor of their own).
  - kind: area-floor
    challenge: node-failures
  - kind: area-floor
    challenge: link-failures
  - kind: area-floor
    challenge: degree-attack
  # Floors to set for your network, for example:
  # - kind: r-threshold      # the 10 % quantile of R with 10 % of nodes failed
  #   challenge: node-failures
  #   at: 0.1
  #   statistic: quantile
  #   q: 0.1
  #   min: 0.6
  # - kind: n-1              # no single link failure drops R below 0.8
  #   element: link
  #   min: 0.8

# How far a requirement's value may drop from the base to the head.
weakening:
  allowed-drop: 0.02       # in units of R
  error-multiple: 2        # a drop below 2 × its Monte Carlo error never fails
  severity: fail

# A deleted design file: fail | warn | notice | ignore.
removed-designs: notice

# Work each evaluation of a design may take (head and base each). Beyond it the engine runs
# fewer realizations or N-1 cases and the report marks the result as reduced; what the reduced
# work cannot settle is "uncertain", never a pass. Seconds are converted to work at a fixed
# rate (5e7 element visits per second), so a report never depends on the machine's speed.
budget:
  seconds: 60              # about a minute for a 1,000-node design under this policy
  # work: 3e9              # the same in element visits; with both, the smaller applies

# Rules for some files only; they may add or tighten requirements, never loosen them
# (and raise the budget, never lower it).
# scopes:
#   - paths: "core/**"
#     requirements:
#       - kind: n-1
#         element: node
#         min: 0.7
`;

// src/errors.ts
var NetbraceError = class extends Error {
  name = "NetbraceError";
  kind;
  file;
  line;
  column;
  hint;
  /** Further locations that belong to the same problem (e.g. the floor a scope loosens). */
  related;
  constructor(kind, message, where = {}, hint = "", related2 = []) {
    super(message);
    this.kind = kind;
    this.file = where.file ?? "";
    this.line = where.line ?? 0;
    this.column = where.column ?? 0;
    this.hint = hint;
    this.related = related2;
  }
  /** `file:line:col: message — hint`, the one format every shell prints. */
  format() {
    return formatDiagnostic(this);
  }
};
var DesignError = class extends NetbraceError {
  name = "DesignError";
  constructor(message, where, hint = "") {
    super("design", message, where, hint);
  }
};
var PolicyError = class extends NetbraceError {
  name = "PolicyError";
  constructor(message, where, hint = "", related2 = []) {
    super("policy", message, where, hint, related2);
  }
};
var UsageError = class extends NetbraceError {
  name = "UsageError";
  constructor(message, hint = "") {
    super("usage", message, {}, hint);
  }
};
var LimitError = class extends NetbraceError {
  name = "LimitError";
  constructor(message, where, hint = "") {
    super("limit", message, where, hint);
  }
};
function formatDiagnostic(d) {
  const where = d.file ? `${d.file}:${d.line || 1}:${d.column || 1}: ` : "";
  let text2 = `${where}${d.message}${d.hint ? ` — ${d.hint}` : ""}`;
  for (const r of d.related ?? []) text2 += `
  ${r.file}:${r.line || 1}:${r.column || 1}: ${r.message}`;
  return text2;
}
function isNetbraceError(e) {
  return e instanceof NetbraceError;
}

// src/graph/mask.ts
function createMask(g) {
  return { node: new Uint8Array(g.n), link: new Uint8Array(g.m) };
}
function copyMask(from, to) {
  to.node.set(from.node);
  to.link.set(from.link);
}
function isLinkAlive(g, mask, e) {
  return mask.link[e] === 0 && mask.node[g.linkSource[e]] === 0 && mask.node[g.linkTarget[e]] === 0;
}

// src/graph/structure.ts
function findComponents(g, mask = createMask(g)) {
  const label = new Int32Array(g.n).fill(-1);
  const sizes = [];
  const queue = new Int32Array(g.n);
  for (let s = 0; s < g.n; s++) {
    if (mask.node[s] || label[s] !== -1) continue;
    const c = sizes.length;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    label[s] = c;
    while (head < tail) {
      const v = queue[head++];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (label[w] !== -1 || mask.node[w] || mask.link[g.linkOf[p]]) continue;
        label[w] = c;
        queue[tail++] = w;
      }
    }
    sizes.push(tail);
  }
  let largest = -1;
  for (let c = 0; c < sizes.length; c++) if (largest < 0 || sizes[c] > sizes[largest]) largest = c;
  return { label, sizes, largest };
}
function findCutElements(g, mask = createMask(g)) {
  const n = g.n;
  const disc = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const parentLink = new Int32Array(n).fill(-1);
  const cursor = new Int32Array(n);
  const stack = new Int32Array(n);
  const isCut = new Uint8Array(n);
  const bridges2 = [];
  let time = 0;
  for (let root = 0; root < n; root++) {
    if (mask.node[root] || disc[root] !== -1) continue;
    let top = 0;
    stack[top++] = root;
    disc[root] = low[root] = time++;
    cursor[root] = g.offsets[root];
    let rootChildren = 0;
    while (top > 0) {
      const v = stack[top - 1];
      if (cursor[v] < g.offsets[v + 1]) {
        const p = cursor[v]++;
        const e = g.linkOf[p];
        if (e === parentLink[v] || !isLinkAlive(g, mask, e)) continue;
        const w = g.neighbors[p];
        if (disc[w] === -1) {
          parentLink[w] = e;
          disc[w] = low[w] = time++;
          cursor[w] = g.offsets[w];
          stack[top++] = w;
          if (v === root) rootChildren++;
        } else if (disc[w] < low[v]) {
          low[v] = disc[w];
        }
      } else {
        top--;
        if (top === 0) break;
        const parent = stack[top - 1];
        if (low[v] < low[parent]) low[parent] = low[v];
        if (low[v] > disc[parent]) bridges2.push(parentLink[v]);
        if (parent !== root && low[v] >= disc[parent]) isCut[parent] = 1;
      }
    }
    if (rootChildren > 1) isCut[root] = 1;
  }
  bridges2.sort((a, b) => a - b);
  const cutNodes2 = [];
  for (let v = 0; v < n; v++) if (isCut[v]) cutNodes2.push(v);
  return { bridges: bridges2, cutNodes: cutNodes2 };
}

// src/challenges/rank.ts
var QUANTUM = 2 ** 32;
function quantizeScores(score, eligible) {
  let max = 0;
  for (let i = 0; i < score.length; i++) if (eligible[i] && score[i] > max) max = score[i];
  const q = new Float64Array(score.length);
  if (max > 0) for (let i = 0; i < score.length; i++) q[i] = Math.round(score[i] / max * QUANTUM);
  return q;
}
function rankDescending(score, eligible, steps) {
  const idx = [];
  for (let i = 0; i < eligible.length; i++) if (eligible[i]) idx.push(i);
  idx.sort((a, b) => score[b] - score[a] || a - b);
  return Int32Array.from(idx.slice(0, Math.max(0, steps)));
}
function rankScores(score, eligible, steps) {
  return rankDescending(quantizeScores(score, eligible), eligible, steps);
}
function argmaxTied(score, candidate) {
  let max = -Infinity;
  let first = -1;
  for (let i = 0; i < score.length; i++) {
    if (!candidate[i]) continue;
    if (first < 0) first = i;
    if (score[i] > max) max = score[i];
  }
  if (first < 0 || !(max > 0)) return first;
  for (let i = first; i < score.length; i++) {
    if (candidate[i] && Math.round(score[i] / max * QUANTUM) === QUANTUM) return i;
  }
  return first;
}

// src/challenges/units.ts
function unitCount(g, kind) {
  return kind === "node" ? g.n : kind === "link" ? g.m : g.groupIds.length;
}
function unitIds(g, kind) {
  return kind === "node" ? g.nodeIds : kind === "link" ? g.linkIds : g.groupIds;
}
function unitKeys(g, kind) {
  return kind === "node" ? g.nodeIds : kind === "link" ? g.linkKeys : g.groupIds;
}
function eligibleUnits(g, kind) {
  const count = unitCount(g, kind);
  const out = new Uint8Array(count);
  for (let u = 0; u < count; u++) out[u] = isEligible(g, kind, u) ? 1 : 0;
  return out;
}
function isEligible(g, kind, u) {
  if (kind === "node") return g.nodeHardened[u] === 0;
  if (kind === "link") return g.linkHardened[u] === 0;
  for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) if (g.linkHardened[g.groupLinks[p]] === 0) return true;
  return false;
}
function removeUnit(g, mask, kind, u) {
  if (kind === "node") mask.node[u] = 1;
  else if (kind === "link") mask.link[u] = 1;
  else {
    for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
      const e = g.groupLinks[p];
      if (g.linkHardened[e] === 0) mask.link[e] = 1;
    }
  }
}
function stepsAt(x, count, eligible) {
  return Math.min(Math.round(x * count), eligible);
}
function countOnes(a) {
  let c = 0;
  for (let i = 0; i < a.length; i++) c += a[i];
  return c;
}

// src/challenges/brandes.ts
function createBrandesWorkspace(g) {
  return {
    dist: new Int32Array(g.n).fill(-1),
    sigma: new Float64Array(g.n),
    delta: new Float64Array(g.n),
    order: new Int32Array(g.n)
  };
}
function accumulateBetweenness(g, mask, sources, nodeScore, linkScore, ws = createBrandesWorkspace(g)) {
  const { dist, sigma, delta, order } = ws;
  const { offsets, neighbors, linkOf } = g;
  const nodeGone = mask.node;
  const linkGone = mask.link;
  for (let si = 0; si < sources.length; si++) {
    const s = sources[si];
    if (nodeGone[s]) continue;
    let head = 0;
    let tail = 0;
    order[tail++] = s;
    dist[s] = 0;
    sigma[s] = 1;
    while (head < tail) {
      const v = order[head++];
      const dv = dist[v] + 1;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (nodeGone[w] || linkGone[linkOf[p]]) continue;
        if (dist[w] < 0) {
          dist[w] = dv;
          sigma[w] = 0;
          order[tail++] = w;
        }
        if (dist[w] === dv) sigma[w] += sigma[v];
      }
    }
    for (let i = 0; i < tail; i++) delta[order[i]] = 0;
    for (let i = tail - 1; i > 0; i--) {
      const w = order[i];
      const dw = dist[w] - 1;
      const coeff = (1 + delta[w]) / sigma[w];
      for (let p = offsets[w]; p < offsets[w + 1]; p++) {
        const v = neighbors[p];
        if (dist[v] !== dw || nodeGone[v] || linkGone[linkOf[p]]) continue;
        const c = sigma[v] * coeff;
        delta[v] += c;
        if (linkScore !== null) linkScore[linkOf[p]] += c;
      }
      if (nodeScore !== null) nodeScore[w] += delta[w];
    }
    for (let i = 0; i < tail; i++) dist[order[i]] = -1;
  }
}
function componentOf(g, mask, start, seen, out) {
  let head = 0;
  let tail = 0;
  out[tail++] = start;
  seen[start] = 1;
  while (head < tail) {
    const v = out[head++];
    for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
      const w = g.neighbors[p];
      if (seen[w] || mask.node[w] || mask.link[g.linkOf[p]]) continue;
      seen[w] = 1;
      out[tail++] = w;
    }
  }
  for (let i = 0; i < tail; i++) seen[out[i]] = 0;
  return tail;
}
function allNodes(g) {
  const a = new Int32Array(g.n);
  for (let v = 0; v < g.n; v++) a[v] = v;
  return a;
}
function adaptiveBetweenness(g, kind, steps) {
  const mask = createMask(g);
  const ws = createBrandesWorkspace(g);
  const nodes = kind === "node";
  const score = new Float64Array(nodes ? g.n : g.m);
  accumulateBetweenness(g, mask, allNodes(g), nodes ? score : null, nodes ? null : score, ws);
  const candidate = eligibleUnits(g, kind);
  const seen = new Uint8Array(g.n);
  const comp = new Int32Array(g.n);
  const out = [];
  while (out.length < steps) {
    const u = argmaxTied(score, candidate);
    if (u < 0) break;
    out.push(u);
    candidate[u] = 0;
    const size = componentOf(g, mask, nodes ? u : g.linkSource[u], seen, comp);
    if (nodes) {
      mask.node[u] = 1;
      score[u] = 0;
      for (let i = 0; i < size; i++) score[comp[i]] = 0;
      if (size <= 3) continue;
    } else {
      mask.link[u] = 1;
      for (let i = 0; i < size; i++) {
        const v = comp[i];
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) score[g.linkOf[p]] = 0;
      }
    }
    accumulateBetweenness(g, mask, comp.subarray(0, size), nodes ? score : null, nodes ? null : score, ws);
  }
  return Int32Array.from(out);
}

// src/challenges/betweenness.ts
function nodeBetweenness(g) {
  const score = new Float64Array(g.n);
  accumulateBetweenness(g, createMask(g), allNodes(g), score, null);
  return score;
}
function staticBetweennessOrder(g, steps) {
  return rankScores(nodeBetweenness(g), eligibleUnits(g, "node"), steps);
}
function adaptiveBetweennessOrder(g, steps) {
  return adaptiveBetweenness(g, "node", steps);
}
var betweenness = {
  name: "betweenness",
  type: "attack",
  kind: "node",
  summary: "targeted attack: nodes by shortest-path betweenness on the intact design, highest first",
  sequence: (g, steps) => staticBetweennessOrder(g, steps)
};
var betweennessAdaptive = {
  name: "betweenness-adaptive",
  type: "attack",
  kind: "node",
  summary: "targeted attack: the node with the highest current betweenness, recomputed after every removal",
  sequence: (g, steps) => adaptiveBetweennessOrder(g, steps)
};

// src/challenges/closeness.ts
function closenessCentrality(g) {
  const n = g.n;
  const dist = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  const out = new Float64Array(n);
  for (let s = 0; s < n; s++) {
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    dist[s] = 0;
    let total = 0;
    while (head < tail) {
      const v = queue[head++];
      total += dist[v];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (dist[w] < 0) {
          dist[w] = dist[v] + 1;
          queue[tail++] = w;
        }
      }
    }
    out[s] = total > 0 && n > 1 ? (tail - 1) / total * ((tail - 1) / (n - 1)) : 0;
    for (let i = 0; i < tail; i++) dist[queue[i]] = -1;
  }
  return out;
}
var closeness = {
  name: "closeness",
  type: "attack",
  kind: "node",
  summary: "targeted attack: nodes by closeness centrality on the intact design, highest first",
  sequence: (g, steps) => rankScores(closenessCentrality(g), eligibleUnits(g, "node"), steps)
};

// src/challenges/contingency.ts
var nMinus1 = {
  name: "n-1",
  type: "contingency",
  order: 1,
  summary: "N−1: every single node (or link, with element: link) removed in turn; worst cases reported"
};
var nMinus2 = {
  name: "n-2",
  type: "contingency",
  order: 2,
  summary: "N−2: every pair of nodes (or links) removed, exhaustively within the work budget"
};

// src/challenges/degree.ts
function nodeDegrees(g) {
  const deg = new Int32Array(g.n);
  for (let v = 0; v < g.n; v++) deg[v] = g.offsets[v + 1] - g.offsets[v];
  return deg;
}
function staticDegreeOrder(g, steps) {
  return rankDescending(nodeDegrees(g), eligibleUnits(g, "node"), steps);
}
function adaptiveDegreeOrder(g, steps) {
  const deg = nodeDegrees(g);
  const eligible = eligibleUnits(g, "node");
  const removed = new Uint8Array(g.n);
  let maxDeg = 0;
  for (let v = 0; v < g.n; v++) if (eligible[v] && deg[v] > maxDeg) maxDeg = deg[v];
  const buckets = Array.from({ length: maxDeg + 1 }, () => []);
  for (let v = 0; v < g.n; v++) if (eligible[v]) buckets[deg[v]].push(v);
  const out = [];
  let top = maxDeg;
  while (out.length < steps && top >= 0) {
    const heap = buckets[top];
    if (heap.length === 0) {
      top--;
      continue;
    }
    const v = heapPop(heap);
    if (removed[v] || deg[v] !== top) continue;
    removed[v] = 1;
    out.push(v);
    for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
      const w = g.neighbors[p];
      if (removed[w]) continue;
      deg[w]--;
      if (eligible[w]) heapPush(buckets[deg[w]], w);
    }
  }
  return Int32Array.from(out);
}
function heapPush(h, v) {
  let i = h.length;
  h.push(v);
  while (i > 0) {
    const parent = i - 1 >> 1;
    if (h[parent] <= v) break;
    h[i] = h[parent];
    i = parent;
  }
  h[i] = v;
}
function heapPop(h) {
  const top = h[0];
  const last = h.pop();
  if (h.length > 0) {
    let i = 0;
    for (; ; ) {
      const l = 2 * i + 1;
      if (l >= h.length) break;
      const r = l + 1;
      const c = r < h.length && h[r] < h[l] ? r : l;
      if (h[c] >= last) break;
      h[i] = h[c];
      i = c;
    }
    h[i] = last;
  }
  return top;
}
var degree = {
  name: "degree",
  type: "attack",
  kind: "node",
  summary: "targeted attack: nodes by degree on the intact design, highest first",
  sequence: (g, steps) => staticDegreeOrder(g, steps)
};
var degreeAdaptive = {
  name: "degree-adaptive",
  type: "attack",
  kind: "node",
  summary: "targeted attack: the node with the highest current degree, re-ranked after every removal",
  sequence: (g, steps) => adaptiveDegreeOrder(g, steps)
};

// src/challenges/eigenvector.ts
function eigenvectorCentrality(g, tolerance = 1e-13, maxRounds = 1e5) {
  const n = g.n;
  let x = new Float64Array(n).fill(n > 0 ? 1 / Math.sqrt(n) : 0);
  let y = new Float64Array(n);
  for (let round = 0; round < maxRounds; round++) {
    let norm2 = 0;
    for (let v = 0; v < n; v++) {
      let s = x[v];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) s += x[g.neighbors[p]];
      y[v] = s;
      norm2 += s * s;
    }
    norm2 = Math.sqrt(norm2);
    if (norm2 === 0) break;
    let change = 0;
    for (let v = 0; v < n; v++) {
      y[v] /= norm2;
      const d = Math.abs(y[v] - x[v]);
      if (d > change) change = d;
    }
    const t = x;
    x = y;
    y = t;
    if (change < tolerance) break;
  }
  return x;
}
var eigenvector = {
  name: "eigenvector",
  type: "attack",
  kind: "node",
  summary: "targeted attack: nodes by eigenvector centrality on the intact design, highest first",
  sequence: (g, steps) => rankScores(eigenvectorCentrality(g), eligibleUnits(g, "node"), steps)
};

// src/challenges/link-betweenness.ts
function linkBetweenness(g) {
  const score = new Float64Array(g.m);
  accumulateBetweenness(g, createMask(g), allNodes(g), null, score);
  return score;
}
function staticLinkBetweennessOrder(g, steps) {
  return rankScores(linkBetweenness(g), eligibleUnits(g, "link"), steps);
}
function adaptiveLinkBetweennessOrder(g, steps) {
  return adaptiveBetweenness(g, "link", steps);
}
var linkBetweennessStatic = {
  name: "link-betweenness",
  type: "attack",
  kind: "link",
  summary: "targeted attack: links by link betweenness on the intact design, highest first",
  sequence: (g, steps) => staticLinkBetweennessOrder(g, steps)
};
var linkBetweennessAdaptive = {
  name: "link-betweenness-adaptive",
  type: "attack",
  kind: "link",
  summary: "targeted attack: the link with the highest current link betweenness, recomputed after every cut",
  sequence: (g, steps) => adaptiveLinkBetweennessOrder(g, steps)
};

// src/metrics/kernels/hash-noise.ts
function mix32(h) {
  h ^= h >>> 16;
  h = Math.imul(h, 2246822507);
  h ^= h >>> 13;
  h = Math.imul(h, 3266489909);
  h ^= h >>> 16;
  return h >>> 0;
}
function hash32(a, b) {
  return mix32(Math.imul(a ^ 2654435769, 2246822507) ^ Math.imul(b + 1663821227, 3266489909));
}
function noise(a, b) {
  return hash32(a, b) / 2147483648 - 1;
}
function sign(a, b) {
  return hash32(a, b) & 1 ? 1 : -1;
}

// src/envelope/rng.ts
function hashString(s, seed) {
  let h = seed >>> 0;
  for (let i = 0; i < s.length; i++) {
    let k = Math.imul(s.charCodeAt(i), 3432918353);
    k = k << 15 | k >>> 17;
    h ^= Math.imul(k, 461845907);
    h = h << 13 | h >>> 19;
    h = Math.imul(h, 5) + 3864292196 | 0;
  }
  return mix32(h ^ s.length);
}
function seedWord(seed) {
  if (!Number.isSafeInteger(seed) || seed < 0) throw new RangeError(`seed must be a non-negative integer, got ${seed}`);
  const lo = seed >>> 0;
  const hi = Math.floor(seed / 4294967296) >>> 0;
  return mix32(lo ^ mix32(hi ^ 2654435769));
}
function hashIds(ids) {
  const out = new Uint32Array(ids.length);
  for (let i = 0; i < ids.length; i++) out[i] = hashString(ids[i], 1851945571);
  return out;
}
function realizationWord(seedW, realization) {
  return mix32((Math.imul(realization + 1, 2654435769) ^ seedW) >>> 0);
}
function keyOf(r, idHash) {
  return mix32((idHash ^ r) + Math.imul(r, 668265261) + 374761393);
}
function createOrderWorkspace(capacity) {
  return {
    keys: new Uint32Array(capacity),
    keys2: new Uint32Array(capacity),
    idx2: new Int32Array(capacity),
    counts: new Uint32Array(2048)
  };
}
function randomOrder(idHash, eligible, seedW, realization, out, ws = createOrderWorkspace(idHash.length)) {
  const n = idHash.length;
  let { keys, keys2, idx2 } = ws;
  const counts = ws.counts;
  let idx = out;
  let count = 0;
  const r = realizationWord(seedW, realization);
  for (let i = 0; i < n; i++) {
    if (eligible !== null && eligible[i] === 0) continue;
    keys[count] = keyOf(r, idHash[i]);
    idx[count++] = i;
  }
  for (let shift = 0; shift < 32; shift += 11) {
    const bits = shift === 22 ? 10 : 11;
    const mask = (1 << bits) - 1;
    counts.fill(0, 0, mask + 1);
    for (let j = 0; j < count; j++) counts[keys[j] >>> shift & mask]++;
    let sum = 0;
    for (let b = 0; b <= mask; b++) {
      const c = counts[b];
      counts[b] = sum;
      sum += c;
    }
    for (let j = 0; j < count; j++) {
      const pos = counts[keys[j] >>> shift & mask]++;
      keys2[pos] = keys[j];
      idx2[pos] = idx[j];
    }
    [keys, keys2] = [keys2, keys];
    [idx, idx2] = [idx2, idx];
  }
  if (idx !== out) out.set(idx.subarray(0, count));
  return count;
}
var Xoshiro128 = class {
  a;
  b;
  c;
  d;
  constructor(seed, stream = 0) {
    const s = seedWord(seed);
    const t = mix32((Math.imul(stream + 1, 2654435769) ^ s) >>> 0);
    this.a = mix32(s ^ 608135816) | 1;
    this.b = mix32(t ^ 2242054355);
    this.c = mix32(s + t ^ 320440878);
    this.d = mix32(t - s ^ 57701188);
  }
  /** Next uniform 32-bit unsigned integer. */
  nextUint32() {
    const result = Math.imul(rotl(Math.imul(this.b, 5), 7), 9) >>> 0;
    const t = this.b << 9;
    this.c ^= this.a;
    this.d ^= this.b;
    this.b ^= this.c;
    this.a ^= this.d;
    this.c ^= t;
    this.d = rotl(this.d, 11);
    return result;
  }
  /** Uniform in [0, 1) with 32 random bits. */
  nextFloat() {
    return this.nextUint32() / 4294967296;
  }
  /** Uniform integer in [0, n), unbiased (rejection of the short tail). */
  nextInt(n) {
    const limit = 4294967296 - 4294967296 % n;
    for (; ; ) {
      const u = this.nextUint32();
      if (u < limit) return u % n;
    }
  }
};
function rotl(x, k) {
  return x << k | x >>> 32 - k;
}

// src/challenges/grid.ts
function makeGrid(until, points, at = []) {
  if (!(until >= 0) || !Number.isFinite(until)) throw new RangeError(`until must be a finite number ≥ 0, got ${until}`);
  if (!Number.isInteger(points) || points < 2) throw new RangeError(`points must be an integer ≥ 2, got ${points}`);
  const values = /* @__PURE__ */ new Set();
  for (let j = 0; j < points; j++) values.add(round12(until * j / (points - 1)));
  for (const x of at) {
    if (!(x >= 0) || !Number.isFinite(x)) throw new RangeError(`grid point must be a finite number ≥ 0, got ${x}`);
    values.add(round12(x));
  }
  return [...values].sort((a, b) => a - b);
}
function round12(x) {
  return Number(x.toFixed(12));
}

// src/challenges/random-nodes.ts
function randomOrderPlan(g, kind, params) {
  const x = makeGrid(params.until, params.points, params.at);
  const count = unitCount(g, kind);
  const eligible = eligibleUnits(g, kind);
  const available = countOnes(eligible);
  const stepTable = Int32Array.from(x, (xi) => stepsAt(xi, count, available));
  const maxUnits = stepTable.length ? stepTable[stepTable.length - 1] : 0;
  const idHash = hashIds(unitKeys(g, kind));
  const seedW = seedWord(params.seed);
  const full = new Int32Array(count);
  const ws = createOrderWorkspace(count);
  return {
    kind,
    xUnit: "fraction",
    x,
    realizations: params.realizations,
    maxUnits,
    realize(r, order, steps) {
      randomOrder(idHash, eligible, seedW, r, full, ws);
      order.set(full.subarray(0, maxUnits));
      steps.set(stepTable);
      return maxUnits;
    }
  };
}
var randomNodes = {
  name: "random-nodes",
  type: "band",
  summary: "random node failures: nodes fail in a seeded random order; band over realizations",
  plan: (g, params) => randomOrderPlan(g, "node", params)
};

// src/challenges/random-links.ts
var randomLinks = {
  name: "random-links",
  type: "band",
  summary: "random link failures: links fail in a seeded random order; band over realizations",
  plan: (g, params) => randomOrderPlan(g, "link", params)
};

// src/challenges/regional.ts
var EARTH_RADIUS_KM = 6371.0088;
function haversineKm(lat1, lon1, lat2, lon2) {
  const rad = Math.PI / 180;
  const dLat = (lat2 - lat1) * rad;
  const dLon = (lon2 - lon1) * rad;
  const a = Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(a)));
}
function sitesWithCoordinates(g) {
  const sites = [];
  if (g.lat === null || g.lon === null) return sites;
  for (let v = 0; v < g.n; v++) if (Number.isFinite(g.lat[v]) && Number.isFinite(g.lon[v])) sites.push(v);
  return sites;
}
function defaultRegionalUntil(g) {
  const sites = sitesWithCoordinates(g);
  let max = 0;
  for (let i = 0; i < sites.length; i++) {
    for (let j = i + 1; j < sites.length; j++) {
      const d = haversineKm(g.lat[sites[i]], g.lon[sites[i]], g.lat[sites[j]], g.lon[sites[j]]);
      if (d > max) max = d;
    }
  }
  return max > 0 ? Number((max / 4).toPrecision(2)) : 0;
}
var regional = {
  name: "regional",
  type: "band",
  summary: "regional disasters: all sites within radius x km of an epicentre fail; band over epicentres at every site",
  plan(g, params) {
    const x = makeGrid(params.until, params.points, params.at);
    const all = sitesWithCoordinates(g);
    const cap = params.epicentres ?? all.length;
    const sites = cap >= all.length ? all : Array.from({ length: cap }, (_, r) => all[Math.floor(r * all.length / cap)]);
    const removable = all.filter((v) => g.nodeHardened[v] === 0);
    const dist = new Float64Array(removable.length);
    const idx = removable.map((_, i) => i);
    return {
      kind: "node",
      xUnit: "km",
      x,
      realizations: sites.length,
      maxUnits: removable.length,
      label: (r) => g.nodeIds[sites[r]],
      realize(r, order, steps) {
        const c = sites[r];
        for (let i = 0; i < removable.length; i++) {
          dist[i] = haversineKm(g.lat[c], g.lon[c], g.lat[removable[i]], g.lon[removable[i]]);
        }
        idx.sort((a, b) => dist[a] - dist[b] || a - b);
        let k = 0;
        for (let j = 0; j < x.length; j++) {
          while (k < idx.length && dist[idx[k]] < x[j]) k++;
          steps[j] = k;
        }
        const len = steps[x.length - 1];
        for (let i = 0; i < len; i++) order[i] = removable[idx[i]];
        return len;
      }
    };
  }
};

// src/challenges/risk-groups.ts
var riskGroups = {
  name: "risk-groups",
  type: "band",
  summary: "shared-risk link groups fail together, groups in seeded random order; band over realizations",
  plan: (g, params) => randomOrderPlan(g, "group", params)
};
var riskGroupsWorst = {
  name: "risk-groups-worst",
  type: "attack",
  kind: "group",
  summary: "shared-risk link groups, worst first: each step takes the group whose loss leaves the lowest R",
  sequence(g, steps, ctx) {
    const candidate = eligibleUnits(g, "group");
    const mask = createMask(g);
    const trial = createMask(g);
    const out = [];
    while (out.length < steps) {
      let best = -1;
      let bestR = Infinity;
      for (let u = 0; u < candidate.length; u++) {
        if (!candidate[u]) continue;
        copyMask(mask, trial);
        removeUnit(g, trial, "group", u);
        const r = ctx.rvalue(trial);
        if (r < bestR) {
          bestR = r;
          best = u;
        }
      }
      if (best < 0) break;
      out.push(best);
      candidate[best] = 0;
      removeUnit(g, mask, "group", best);
    }
    return Int32Array.from(out);
  }
};

// src/challenges/registry.ts
var challenges = [
  randomNodes,
  randomLinks,
  degree,
  degreeAdaptive,
  betweenness,
  betweennessAdaptive,
  eigenvector,
  closeness,
  linkBetweennessStatic,
  linkBetweennessAdaptive,
  riskGroups,
  riskGroupsWorst,
  regional,
  nMinus1,
  nMinus2
];
var byName = new Map(challenges.map((c) => [c.name, c]));
function getChallenge(name) {
  const c = byName.get(name);
  if (!c) throw new RangeError(`unknown challenge "${name}"`);
  return c;
}
var DEFAULTS = {
  until: 0.5,
  points: 11,
  realizations: 200,
  band: [0.1, 0.9],
  worstCase: 0,
  element: "node"
};
function resolveParams(g, p, seed) {
  const until = p.until ?? (p.challenge === "regional" ? defaultRegionalUntil(g) : DEFAULTS.until);
  const fraction = p.challenge !== "regional";
  if (!Number.isFinite(until) || until < 0 || fraction && until > 1) {
    throw new RangeError(`${p.challenge}: until must be ${fraction ? "a fraction in [0, 1]" : "a radius ≥ 0 km"}, got ${until}`);
  }
  const points = p.points ?? DEFAULTS.points;
  if (!Number.isInteger(points) || points < 2) throw new RangeError(`${p.challenge}: points must be an integer ≥ 2, got ${points}`);
  const realizations = p.realizations ?? DEFAULTS.realizations;
  if (!Number.isInteger(realizations) || realizations < 1) {
    throw new RangeError(`${p.challenge}: realizations must be an integer ≥ 1, got ${realizations}`);
  }
  const band = p.band ?? DEFAULTS.band;
  if (!(band[0] > 0 && band[0] < band[1] && band[1] < 1)) {
    throw new RangeError(`${p.challenge}: band must be two quantiles 0 < lo < hi < 1, got ${band.join(",")}`);
  }
  const worstCase = p.worstCase ?? DEFAULTS.worstCase;
  if (!Number.isInteger(worstCase) || worstCase < 0) throw new RangeError(`${p.challenge}: worstCase must be an integer ≥ 0`);
  if (p.beam !== void 0 && (!Number.isInteger(p.beam) || p.beam < 1)) throw new RangeError(`${p.challenge}: beam must be an integer ≥ 1`);
  const at = p.at ?? [];
  for (const x of at) {
    if (!Number.isFinite(x) || x < 0 || fraction && x > 1) throw new RangeError(`${p.challenge}: grid point ${x} is out of range`);
  }
  return {
    challenge: p.challenge,
    until,
    points,
    realizations,
    band: [band[0], band[1]],
    seed: p.seed ?? seed,
    worstCase,
    element: p.element ?? DEFAULTS.element,
    at,
    beam: p.beam ?? 1
  };
}

// src/metrics/kernels/operators.ts
function maxDegree(g) {
  let dmax = 0;
  for (let i = 0; i < g.n; i++) dmax = Math.max(dmax, g.offsets[i + 1] - g.offsets[i]);
  return dmax;
}
function createLaplacianOperator() {
  let g = null;
  const op = {
    n: 0,
    normBound: 0,
    bind(graph) {
      g = graph;
      op.n = graph.n;
      op.normBound = 2 * maxDegree(graph);
    },
    apply(x, y) {
      const { offsets, neighbors, n } = g;
      for (let i = 0; i < n; i++) {
        const a = offsets[i];
        const b = offsets[i + 1];
        let s = (b - a) * x[i];
        for (let p = a; p < b; p++) s -= x[neighbors[p]];
        y[i] = s;
      }
    }
  };
  return op;
}
function createAdjacencyOperator() {
  let g = null;
  const op = {
    n: 0,
    normBound: 0,
    bind(graph) {
      g = graph;
      op.n = graph.n;
      op.normBound = maxDegree(graph);
    },
    apply(x, y) {
      const { offsets, neighbors, n } = g;
      for (let i = 0; i < n; i++) {
        let s = 0;
        for (let p = offsets[i]; p < offsets[i + 1]; p++) s += x[neighbors[p]];
        y[i] = s;
      }
    }
  };
  return op;
}
function denseMatrix(g, laplacian, out) {
  const n = g.n;
  out.fill(0, 0, n * n);
  for (let i = 0; i < n; i++) {
    const a = g.offsets[i];
    const b = g.offsets[i + 1];
    if (laplacian) out[i * n + i] = b - a;
    for (let p = a; p < b; p++) out[i * n + g.neighbors[p]] = laplacian ? -1 : 1;
  }
}

// src/metrics/kernels/symmetric-eigen.ts
var EPS = 2 ** -52;
function symmetricEigenvalues(a, n, d, e) {
  if (n === 0) return;
  householderValues(a, n, d, e);
  implicitQL(d, e, n, null, 0);
  sortAscending(d, n, null, 0);
}
function symmetricEigen(a, n, d, e) {
  if (n === 0) return;
  householder(a, n, d, e, true);
  implicitQL(d, e, n, a, n);
  sortAscending(d, n, a, n);
}
function tridiagonalEigen(diag, off, k, d, e, z, firstRowOnly = false) {
  for (let i = 0; i < k; i++) {
    d[i] = diag[i];
    e[i] = i > 0 ? off[i - 1] : 0;
  }
  const rows = firstRowOnly ? 1 : k;
  if (z) {
    z.fill(0, 0, rows * k);
    for (let i = 0; i < rows; i++) z[i * k + i] = 1;
  }
  implicitQL(d, e, k, z, k, rows);
  sortAscending(d, k, z, k, rows);
}
function householder(V, n, d, e, vectors) {
  for (let j = 0; j < n; j++) d[j] = V[(n - 1) * n + j];
  for (let i = n - 1; i > 0; i--) {
    let scale = 0;
    let h = 0;
    for (let k = 0; k < i; k++) scale += Math.abs(d[k]);
    if (scale === 0) {
      e[i] = d[i - 1];
      for (let j = 0; j < i; j++) {
        d[j] = V[(i - 1) * n + j];
        V[i * n + j] = 0;
        V[j * n + i] = 0;
      }
    } else {
      for (let k = 0; k < i; k++) {
        d[k] /= scale;
        h += d[k] * d[k];
      }
      let f = d[i - 1];
      let g = Math.sqrt(h);
      if (f > 0) g = -g;
      e[i] = scale * g;
      h -= f * g;
      d[i - 1] = f - g;
      for (let j = 0; j < i; j++) e[j] = 0;
      for (let j = 0; j < i; j++) {
        f = d[j];
        V[j * n + i] = f;
        g = e[j] + V[j * n + j] * f;
        for (let k = j + 1; k <= i - 1; k++) {
          const vkj = V[k * n + j];
          g += vkj * d[k];
          e[k] += vkj * f;
        }
        e[j] = g;
      }
      f = 0;
      for (let j = 0; j < i; j++) {
        e[j] /= h;
        f += e[j] * d[j];
      }
      const hh = f / (h + h);
      for (let j = 0; j < i; j++) e[j] -= hh * d[j];
      for (let j = 0; j < i; j++) {
        f = d[j];
        g = e[j];
        for (let k = j; k <= i - 1; k++) V[k * n + j] -= f * e[k] + g * d[k];
        d[j] = V[(i - 1) * n + j];
        V[i * n + j] = 0;
      }
    }
    d[i] = h;
  }
  if (!vectors) {
    for (let i = 0; i < n; i++) d[i] = V[i * n + i];
    e[0] = 0;
    return;
  }
  for (let i = 0; i < n - 1; i++) {
    V[(n - 1) * n + i] = V[i * n + i];
    V[i * n + i] = 1;
    const h = d[i + 1];
    if (h !== 0) {
      for (let k = 0; k <= i; k++) d[k] = V[k * n + i + 1] / h;
      for (let j = 0; j <= i; j++) {
        let g = 0;
        for (let k = 0; k <= i; k++) g += V[k * n + i + 1] * V[k * n + j];
        for (let k = 0; k <= i; k++) V[k * n + j] -= g * d[k];
      }
    }
    for (let k = 0; k <= i; k++) V[k * n + i + 1] = 0;
  }
  for (let j = 0; j < n; j++) {
    d[j] = V[(n - 1) * n + j];
    V[(n - 1) * n + j] = 0;
  }
  V[(n - 1) * n + n - 1] = 1;
  e[0] = 0;
}
function householderValues(V, n, d, e) {
  for (let j = 0; j < n; j++) d[j] = V[j * n + n - 1];
  for (let i = n - 1; i > 0; i--) {
    let scale = 0;
    let h = 0;
    for (let k = 0; k < i; k++) scale += Math.abs(d[k]);
    if (scale === 0) {
      e[i] = d[i - 1];
      for (let j = 0; j < i; j++) {
        d[j] = V[j * n + i - 1];
        V[j * n + i] = 0;
      }
    } else {
      for (let k = 0; k < i; k++) {
        d[k] /= scale;
        h += d[k] * d[k];
      }
      let f = d[i - 1];
      let g = Math.sqrt(h);
      if (f > 0) g = -g;
      e[i] = scale * g;
      h -= f * g;
      d[i - 1] = f - g;
      for (let j = 0; j < i; j++) e[j] = 0;
      for (let j = 0; j < i; j++) {
        f = d[j];
        const row = j * n;
        g = e[j] + V[row + j] * f;
        for (let k = j + 1; k <= i - 1; k++) {
          const vkj = V[row + k];
          g += vkj * d[k];
          e[k] += vkj * f;
        }
        e[j] = g;
      }
      f = 0;
      for (let j = 0; j < i; j++) {
        e[j] /= h;
        f += e[j] * d[j];
      }
      const hh = f / (h + h);
      for (let j = 0; j < i; j++) e[j] -= hh * d[j];
      for (let j = 0; j < i; j++) {
        f = d[j];
        g = e[j];
        const row = j * n;
        for (let k = j; k <= i - 1; k++) V[row + k] -= f * e[k] + g * d[k];
        d[j] = V[row + i - 1];
      }
    }
    d[i] = h;
  }
  for (let i = 0; i < n; i++) d[i] = V[i * n + i];
  e[0] = 0;
}
function implicitQL(d, e, n, z, stride, rows = n) {
  for (let i = 1; i < n; i++) e[i - 1] = e[i];
  e[n - 1] = 0;
  let f = 0;
  let tst1 = 0;
  for (let l = 0; l < n; l++) {
    tst1 = Math.max(tst1, Math.abs(d[l]) + Math.abs(e[l]));
    let m = l;
    while (m < n) {
      if (Math.abs(e[m]) <= EPS * tst1) break;
      m++;
    }
    if (m > l) {
      let iter = 0;
      do {
        if (++iter > 60) throw new Error("symmetric eigen-solver did not converge");
        let g = d[l];
        let p = (d[l + 1] - g) / (2 * e[l]);
        let r = Math.hypot(p, 1);
        if (p < 0) r = -r;
        d[l] = e[l] / (p + r);
        d[l + 1] = e[l] * (p + r);
        const dl1 = d[l + 1];
        let h = g - d[l];
        for (let i = l + 2; i < n; i++) d[i] -= h;
        f += h;
        p = d[m];
        let c = 1;
        let c2 = c;
        let c3 = c;
        const el1 = e[l + 1];
        let s = 0;
        let s2 = 0;
        for (let i = m - 1; i >= l; i--) {
          c3 = c2;
          c2 = c;
          s2 = s;
          g = c * e[i];
          h = c * p;
          r = Math.hypot(p, e[i]);
          e[i + 1] = s * r;
          s = e[i] / r;
          c = p / r;
          p = c * d[i] - s * g;
          d[i + 1] = h + s * (c * g + s * d[i]);
          if (z) {
            for (let k = 0; k < rows; k++) {
              const zk = k * stride;
              const hh = z[zk + i + 1];
              z[zk + i + 1] = s * z[zk + i] + c * hh;
              z[zk + i] = c * z[zk + i] - s * hh;
            }
          }
        }
        p = -s * s2 * c3 * el1 * e[l] / dl1;
        e[l] = s * p;
        d[l] = c * p;
      } while (Math.abs(e[l]) > EPS * tst1);
    }
    d[l] += f;
    e[l] = 0;
  }
}
function sortAscending(d, n, z, stride, rows = n) {
  for (let i = 0; i < n - 1; i++) {
    let k = i;
    let p = d[i];
    for (let j = i + 1; j < n; j++) {
      if (d[j] < p) {
        k = j;
        p = d[j];
      }
    }
    if (k !== i) {
      d[k] = d[i];
      d[i] = p;
      if (z) {
        for (let r = 0; r < rows; r++) {
          const t = z[r * stride + i];
          z[r * stride + i] = z[r * stride + k];
          z[r * stride + k] = t;
        }
      }
    }
  }
}

// src/metrics/kernels/dense-spectrum.ts
function createDenseSpectrum(limit) {
  const size = Math.max(1, limit);
  const a = new Float64Array(size * size);
  const d = new Float64Array(size);
  const e = new Float64Array(size);
  const run = (g, laplacian) => {
    if (g.n > size) throw new RangeError(`dense spectrum limited to ${size} nodes, got ${g.n}`);
    denseMatrix(g, laplacian, a);
    symmetricEigenvalues(a, g.n, d, e);
    return d;
  };
  return {
    /** Laplacian eigenvalues, ascending, in the first g.n entries (shared buffer). */
    laplacian: (g) => run(g, true),
    /** Adjacency eigenvalues, ascending, in the first g.n entries (shared buffer). */
    adjacency: (g) => run(g, false)
  };
}

// src/metrics/kernels/lanczos.ts
function dot(a, ao, b, bo, n) {
  let s = 0;
  for (let i = 0; i < n; i++) s += a[ao + i] * b[bo + i];
  return s;
}
function axpy(w, c, V, off, n) {
  for (let i = 0; i < n; i++) w[i] -= c * V[off + i];
}
function norm(w, n) {
  return Math.sqrt(dot(w, 0, w, 0, n));
}
function orthogonalize(w, V, stride, n, upTo, defl, dc, coeff, ref = norm(w, n)) {
  for (let pass = 0; pass < 2; pass++) {
    if (pass === 1 && norm(w, n) > 0.7071 * ref) break;
    for (let k = 0; k < dc; k++) {
      const c = dot(defl, k * n, w, 0, n);
      axpy(w, c, defl, k * n, n);
    }
    let l = 0;
    for (; l + 4 <= upTo; l += 4) {
      const o0 = l * stride;
      const o1 = o0 + stride;
      const o2 = o1 + stride;
      const o3 = o2 + stride;
      let c0 = 0;
      let c1 = 0;
      let c2 = 0;
      let c3 = 0;
      for (let i = 0; i < n; i++) {
        const x = w[i];
        c0 += V[o0 + i] * x;
        c1 += V[o1 + i] * x;
        c2 += V[o2 + i] * x;
        c3 += V[o3 + i] * x;
      }
      for (let i = 0; i < n; i++) w[i] -= c0 * V[o0 + i] + c1 * V[o1 + i] + c2 * V[o2 + i] + c3 * V[o3 + i];
      if (coeff) {
        coeff[l] += c0;
        coeff[l + 1] += c1;
        coeff[l + 2] += c2;
        coeff[l + 3] += c3;
      }
    }
    for (; l < upTo; l++) {
      const c = dot(V, l * stride, w, 0, n);
      if (coeff) coeff[l] += c;
      axpy(w, c, V, l * stride, n);
    }
  }
}
function createLanczos(capacity, maxCount, basis = 24) {
  const m0 = Math.max(basis, 2 * maxCount + 8);
  const stride = Math.max(1, capacity);
  const V = new Float64Array(m0 * stride);
  const w = new Float64Array(stride);
  const tmp = new Float64Array(m0 * stride);
  const H = new Float64Array(m0 * m0);
  const Y = new Float64Array(m0 * m0);
  const theta = new Float64Array(m0);
  const scratch = new Float64Array(m0);
  const h = new Float64Array(m0);
  const views = Array.from({ length: m0 }, (_, i) => V.subarray(i * stride, (i + 1) * stride));
  const result = {
    values: new Float64Array(maxCount),
    vectors: new Float64Array(maxCount * stride),
    stride,
    found: 0,
    applications: 0,
    converged: false
  };
  return {
    result,
    solve(op, req) {
      const n = op.n;
      const dc = req.deflationCount ?? 0;
      const defl = req.deflation;
      const space = n - dc;
      const count = Math.min(req.count, Math.max(0, space), maxCount);
      const tol = req.tol ?? 1e-10;
      const floor = 1e-14 * Math.max(op.normBound, 1e-300);
      const maxApps = req.maxApplications ?? Math.max(2e3, 60 * n);
      result.found = 0;
      result.applications = 0;
      result.converged = true;
      if (count <= 0) return result;
      const m = Math.min(m0, space);
      const keep = Math.min(m - 1, Math.max(count + 2, m >> 1));
      const largest = req.which === "largest";
      let salt = 1;
      const keys = req.keys ?? null;
      if (req.start) for (let i = 0; i < n; i++) w[i] = req.start[i];
      else for (let i = 0; i < n; i++) w[i] = noise(keys ? keys[i] : i, 24301);
      orthogonalize(w, V, stride, n, 0, defl, dc, null);
      let beta = norm(w, n);
      if (!(beta > 1e-8)) {
        for (let i = 0; i < n; i++) w[i] = noise(keys ? keys[i] : i, 24301 + salt++);
        orthogonalize(w, V, stride, n, 0, defl, dc, null);
        beta = norm(w, n);
      }
      for (let i = 0; i < n; i++) V[i] = w[i] / beta;
      H.fill(0, 0, m * m);
      let j = 0;
      let apps = 0;
      let betaPrev = 0;
      for (; ; ) {
        let residual = 0;
        for (let i = j; i < m; i++) {
          op.apply(views[i], w);
          apps++;
          h.fill(0, 0, i + 1);
          if (i === j && j > 0) {
            for (let k = 0; k < j; k++) {
              const c = H[k * m + j];
              h[k] = c;
              if (c !== 0) axpy(w, c, V, k * stride, n);
            }
          } else if (i > 0 && betaPrev !== 0) {
            h[i - 1] = betaPrev;
            axpy(w, betaPrev, V, (i - 1) * stride, n);
          }
          const alpha = dot(V, i * stride, w, 0, n);
          h[i] += alpha;
          axpy(w, alpha, V, i * stride, n);
          orthogonalize(w, V, stride, n, i + 1, defl, dc, h);
          for (let l = 0; l <= i; l++) {
            H[l * m + i] = h[l];
            H[i * m + l] = h[l];
          }
          beta = norm(w, n);
          residual = beta;
          betaPrev = beta;
          if (i + 1 < m) {
            if (beta <= 1e-10 * Math.max(op.normBound, 1)) {
              for (let t = 0; t < n; t++) w[t] = noise(keys ? keys[t] : t, 24301 + salt++);
              orthogonalize(w, V, stride, n, i + 1, defl, dc, null);
              beta = norm(w, n);
              betaPrev = 0;
              H[(i + 1) * m + i] = 0;
              H[i * m + i + 1] = 0;
            }
            const off2 = (i + 1) * stride;
            const inv = 1 / beta;
            for (let t = 0; t < n; t++) V[off2 + t] = w[t] * inv;
          }
        }
        Y.set(H.subarray(0, m * m));
        symmetricEigen(Y, m, theta, scratch);
        const exact = m === space;
        let allConverged = true;
        for (let k = 0; k < count; k++) {
          const col = largest ? m - 1 - k : k;
          const bound = Math.max(tol * Math.abs(theta[col]), floor);
          if (!exact && residual * Math.abs(Y[(m - 1) * m + col]) > bound) allConverged = false;
        }
        if (allConverged || apps >= maxApps) {
          result.converged = allConverged;
          for (let k = 0; k < count; k++) {
            const col = largest ? m - 1 - k : k;
            result.values[k] = theta[col];
            const out = k * stride;
            result.vectors.fill(0, out, out + n);
            for (let l = 0; l < m; l++) {
              const y = Y[l * m + col];
              const off2 = l * stride;
              for (let t = 0; t < n; t++) result.vectors[out + t] += y * V[off2 + t];
            }
          }
          result.found = count;
          result.applications = apps;
          return result;
        }
        for (let k = 0; k < keep; k++) {
          const col = largest ? m - 1 - k : k;
          const out = k * stride;
          tmp.fill(0, out, out + n);
          for (let l = 0; l < m; l++) {
            const y = Y[l * m + col];
            if (y === 0) continue;
            const off2 = l * stride;
            for (let t = 0; t < n; t++) tmp[out + t] += y * V[off2 + t];
          }
        }
        V.set(tmp.subarray(0, keep * stride));
        H.fill(0, 0, m * m);
        for (let k = 0; k < keep; k++) {
          const col = largest ? m - 1 - k : k;
          H[k * m + k] = theta[col];
          const c = residual * Y[(m - 1) * m + col];
          H[k * m + keep] = c;
          H[keep * m + k] = c;
        }
        orthogonalize(w, V, stride, n, keep, defl, dc, null);
        beta = norm(w, n);
        if (!(beta > 1e-300)) {
          for (let t = 0; t < n; t++) w[t] = noise(keys ? keys[t] : t, 24301 + salt++);
          orthogonalize(w, V, stride, n, keep, defl, dc, null);
          beta = norm(w, n);
        }
        const off = keep * stride;
        for (let t = 0; t < n; t++) V[off + t] = w[t] / beta;
        j = keep;
      }
    }
  };
}

// src/metrics/kernels/extremal-eigen.ts
function createExtremalSolver(g, kind, denseLimit, warmStart) {
  const limit = Math.min(g.n, denseLimit);
  const fiedler = kind === "fiedler";
  const dense = createDenseSpectrum(limit);
  const lanczos = createLanczos(g.n, 1);
  const op = fiedler ? createLaplacianOperator() : createAdjacencyOperator();
  const one = new Float64Array(fiedler ? g.n : 0);
  const previous = new Float64Array(warmStart ? g.n : 0);
  const start = new Float64Array(warmStart ? g.n : 0);
  let hasPrevious = false;
  return (part, keys) => {
    const n = part.n;
    if (n <= limit) {
      const d = fiedler ? dense.laplacian(part) : dense.adjacency(part);
      return fiedler ? d[1] : d[n - 1];
    }
    op.bind(part);
    if (fiedler) one.fill(1 / Math.sqrt(n), 0, n);
    const warm = warmStart && hasPrevious;
    if (warm) for (let i = 0; i < n; i++) start[i] = previous[part.toOriginal[i]];
    const r = lanczos.solve(op, {
      which: fiedler ? "smallest" : "largest",
      count: 1,
      deflation: fiedler ? one : void 0,
      deflationCount: fiedler ? 1 : 0,
      start: warm ? start : null,
      keys
    });
    if (warmStart) {
      previous.fill(0);
      for (let i = 0; i < n; i++) previous[part.toOriginal[i]] = r.vectors[i];
      hasPrevious = true;
    }
    return r.values[0];
  };
}

// src/metrics/kernels/subgraph.ts
function allocateLocalGraph(nodeCapacity, entryCapacity) {
  return {
    n: 0,
    entries: 0,
    offsets: new Int32Array(nodeCapacity + 1),
    neighbors: new Int32Array(entryCapacity),
    linkOf: new Int32Array(entryCapacity),
    toOriginal: new Int32Array(nodeCapacity),
    toLocal: new Int32Array(nodeCapacity).fill(-1)
  };
}
function createSurvivorBuilder(g, simple) {
  const out = allocateLocalGraph(g.n, 2 * g.m);
  const stamp = new Int32Array(g.n).fill(-1);
  const { offsets, neighbors, linkOf } = g;
  return (mask) => {
    const node = mask.node;
    const link = mask.link;
    const toLocal = out.toLocal;
    let n = 0;
    for (let v = 0; v < g.n; v++) {
      if (node[v]) {
        toLocal[v] = -1;
      } else {
        toLocal[v] = n;
        out.toOriginal[n++] = v;
      }
    }
    stamp.fill(-1);
    let k = 0;
    for (let i = 0; i < n; i++) {
      const v = out.toOriginal[i];
      out.offsets[i] = k;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (w === v || node[w] || link[linkOf[p]]) continue;
        if (simple) {
          if (stamp[w] === v) continue;
          stamp[w] = v;
        }
        out.neighbors[k] = toLocal[w];
        out.linkOf[k++] = linkOf[p];
      }
    }
    out.offsets[n] = k;
    out.n = n;
    out.entries = k;
    return out;
  };
}
function inducedSubgraph(src, nodes, from, count, out) {
  const position = out.toLocal;
  for (let i = 0; i < out.n; i++) position[out.toOriginal[i]] = -1;
  for (let i = 0; i < count; i++) {
    const original = src.toOriginal[nodes[from + i]];
    out.toOriginal[i] = original;
    position[original] = i;
  }
  let k = 0;
  for (let i = 0; i < count; i++) {
    const v = nodes[from + i];
    out.offsets[i] = k;
    for (let p = src.offsets[v]; p < src.offsets[v + 1]; p++) {
      const local = position[src.toOriginal[src.neighbors[p]]];
      if (local < 0) continue;
      out.neighbors[k] = local;
      out.linkOf[k++] = src.linkOf[p];
    }
  }
  out.offsets[count] = k;
  out.n = count;
  out.entries = k;
  return out;
}

// src/metrics/kernels/spectral-survivors.ts
var EXTREMAL_DENSE_LIMIT = 48;
var TRACE_DENSE_LIMIT = 300;
function createSpectralSurvivors(g) {
  const build = createSurvivorBuilder(g, true);
  const order = new Int32Array(g.n);
  const start = new Int32Array(g.n + 1);
  const seen = new Uint8Array(g.n);
  const list = { count: 0, order, start };
  const part = allocateLocalGraph(g.n, 2 * g.m);
  const idKey = new Int32Array(g.n);
  for (let i = 0; i < g.n; i++) idKey[i] = fnv1a(g.nodeIds[i] ?? String(i));
  const keys = new Int32Array(g.n);
  return {
    survivors(mask) {
      return build(mask);
    },
    /** Components of a local graph by breadth-first search. */
    components(local) {
      const n = local.n;
      seen.fill(0, 0, n);
      let tail = 0;
      let c = 0;
      for (let s = 0; s < n; s++) {
        if (seen[s]) continue;
        start[c++] = tail;
        seen[s] = 1;
        let head = tail;
        order[tail++] = s;
        while (head < tail) {
          const v = order[head++];
          for (let p = local.offsets[v]; p < local.offsets[v + 1]; p++) {
            const w = local.neighbors[p];
            if (!seen[w]) {
              seen[w] = 1;
              order[tail++] = w;
            }
          }
        }
      }
      start[c] = tail;
      list.count = c;
      return list;
    },
    /** Per-node keys of a local graph for start and probe vectors (shared buffer). */
    keysOf(graph) {
      for (let i = 0; i < graph.n; i++) keys[i] = idKey[graph.toOriginal[i]];
      return keys;
    },
    /** Component c of `local` as its own local graph (valid until the next call). */
    component(local, comps, c) {
      if (comps.count === 1) return local;
      return inducedSubgraph(local, comps.order, comps.start[c], comps.start[c + 1] - comps.start[c], part);
    }
  };
}
function fnv1a(s) {
  let h = 2166136261;
  for (let i = 0; i < s.length; i++) {
    h ^= s.charCodeAt(i);
    h = Math.imul(h, 16777619);
  }
  return h | 0;
}

// src/metrics/algebraic-connectivity.ts
var algebraicConnectivity = {
  id: "algebraic_connectivity",
  description: "Fiedler value: second-smallest Laplacian eigenvalue of the surviving graph (0 if disconnected).",
  normalization: "a / N0 (a = N only for the complete graph); 0 when the survivors are disconnected.",
  cost: "spectral",
  appliesTo: () => true,
  create(g, options = {}) {
    const spectral = createSpectralSurvivors(g);
    const solve = createExtremalSolver(g, "fiedler", options.denseLimit ?? EXTREMAL_DENSE_LIMIT, options.warmStart ?? false);
    return (mask) => {
      const local = spectral.survivors(mask);
      if (local.n < 2 || spectral.components(local).count > 1) return { raw: 0, normalized: 0 };
      const a = Math.max(0, solve(local, spectral.keysOf(local)));
      return { raw: a, normalized: Math.min(1, a / g.n) };
    };
  }
};

// src/metrics/kernels/bit-bfs.ts
function popcount32(x) {
  x -= x >>> 1 & 1431655765;
  x = (x & 858993459) + (x >>> 2 & 858993459);
  x = x + (x >>> 4) & 252645135;
  return Math.imul(x, 16843009) >>> 24;
}
var LONG_GRAPH_ECCENTRICITY = 12;
function wordsFor(sources) {
  return Math.max(1, Math.min(8, Math.ceil(sources / 32)));
}
function createHopHistogram(capacity) {
  const maxWords = wordsFor(capacity);
  const size = Math.max(1, capacity * maxWords);
  const seen = new Uint32Array(size);
  let frontier = new Uint32Array(size);
  let next = new Uint32Array(size);
  const done = new Uint8Array(Math.max(1, capacity));
  const listed = new Uint8Array(Math.max(1, capacity));
  let active = new Int32Array(Math.max(1, capacity));
  let nextActive = new Int32Array(Math.max(1, capacity));
  const full = new Uint32Array(maxWords);
  const acc = new Uint32Array(maxWords);
  const result = { hist: new Float64Array(capacity + 1), maxDistance: 0 };
  const dist = new Int32Array(Math.max(1, capacity));
  const queue = new Int32Array(Math.max(1, capacity));
  function single(graph, s) {
    const { offsets, neighbors } = graph;
    dist.fill(-1, 0, graph.n);
    dist[s] = 0;
    queue[0] = s;
    let head = 0;
    let tail = 1;
    let ecc = 0;
    const hist = result.hist;
    while (head < tail) {
      const v = queue[head++];
      const dv = dist[v] + 1;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (dist[w] >= 0) continue;
        dist[w] = dv;
        queue[tail++] = w;
        hist[dv]++;
        if (dv > ecc) ecc = dv;
      }
    }
    if (ecc > result.maxDistance) result.maxDistance = ecc;
    return ecc;
  }
  return {
    run(graph, sources, count) {
      const n = graph.n;
      const { offsets, neighbors } = graph;
      const hist = result.hist;
      hist.fill(0, 0, result.maxDistance + 1);
      result.maxDistance = 0;
      if (count === 0) return result;
      const ecc = single(graph, sources[0]);
      if (ecc >= LONG_GRAPH_ECCENTRICITY) {
        for (let i = 1; i < count; i++) single(graph, sources[i]);
        return result;
      }
      hist.fill(0, 0, result.maxDistance + 1);
      result.maxDistance = 0;
      const W = wordsFor(count);
      const batch = 32 * W;
      const sweepWork = n + offsets[n];
      for (let start = 0; start < count; start += batch) {
        const width = Math.min(batch, count - start);
        const used = n * W;
        seen.fill(0, 0, used);
        frontier.fill(0, 0, used);
        next.fill(0, 0, used);
        done.fill(0, 0, n);
        for (let w = 0; w < W; w++) {
          const bits = width - 32 * w;
          full[w] = bits >= 32 ? 4294967295 : bits <= 0 ? 0 : (1 << bits) - 1 >>> 0;
        }
        let activeCount = 0;
        for (let i = 0; i < width; i++) {
          const s = sources[start + i];
          const at = s * W + (i >>> 5);
          const bit = 1 << (i & 31);
          seen[at] |= bit;
          frontier[at] |= bit;
          if (!listed[s]) {
            listed[s] = 1;
            active[activeCount++] = s;
          }
        }
        for (let i = 0; i < activeCount; i++) listed[active[i]] = 0;
        for (let d = 1; activeCount > 0; d++) {
          let frontierWork = 0;
          for (let i = 0; i < activeCount; i++) frontierWork += offsets[active[i] + 1] - offsets[active[i]];
          let reached = 0;
          let nextCount = 0;
          if (4 * frontierWork < sweepWork) {
            for (let i = 0; i < activeCount; i++) {
              const v = active[i];
              const vb = v * W;
              for (let p = offsets[v]; p < offsets[v + 1]; p++) {
                const u = neighbors[p];
                if (done[u]) continue;
                const ub = u * W;
                let any = 0;
                for (let w = 0; w < W; w++) {
                  const x = frontier[vb + w] & ~seen[ub + w];
                  next[ub + w] |= x;
                  any |= x;
                }
                if (any !== 0 && !listed[u]) {
                  listed[u] = 1;
                  nextActive[nextCount++] = u;
                }
              }
            }
            for (let i = 0; i < nextCount; i++) {
              const u = nextActive[i];
              listed[u] = 0;
              const ub = u * W;
              let complete2 = true;
              for (let w = 0; w < W; w++) {
                const x = next[ub + w];
                reached += popcount32(x);
                const t = (seen[ub + w] | x) >>> 0;
                seen[ub + w] = t;
                if (t !== full[w]) complete2 = false;
              }
              if (complete2) done[u] = 1;
            }
          } else {
            for (let v = 0; v < n; v++) {
              if (done[v]) continue;
              const base = v * W;
              for (let w = 0; w < W; w++) acc[w] = 0;
              for (let p = offsets[v]; p < offsets[v + 1]; p++) {
                const ub = neighbors[p] * W;
                for (let w = 0; w < W; w++) acc[w] |= frontier[ub + w];
              }
              let any = 0;
              let complete2 = true;
              for (let w = 0; w < W; w++) {
                const s = seen[base + w];
                const x = acc[w] & ~s;
                next[base + w] = x;
                any |= x;
                const t = (s | x) >>> 0;
                seen[base + w] = t;
                if (t !== full[w]) complete2 = false;
                if (x !== 0) reached += popcount32(x);
              }
              if (any !== 0) nextActive[nextCount++] = v;
              if (complete2) done[v] = 1;
            }
          }
          if (reached > 0) {
            hist[d] += reached;
            if (d > result.maxDistance) result.maxDistance = d;
          }
          for (let i = 0; i < activeCount; i++) {
            const vb = active[i] * W;
            for (let w = 0; w < W; w++) frontier[vb + w] = 0;
          }
          const f = frontier;
          frontier = next;
          next = f;
          const a = active;
          active = nextActive;
          nextActive = a;
          activeCount = nextCount;
        }
      }
      return result;
    }
  };
}

// src/metrics/kernels/union-find.ts
function findRoot(parent, i) {
  while (parent[i] !== i) {
    const up = parent[parent[i]];
    parent[i] = up;
    i = up;
  }
  return i;
}
function unite(parent, size, a, b) {
  let ra = findRoot(parent, a);
  let rb = findRoot(parent, b);
  if (ra === rb) return false;
  if (size[ra] < size[rb]) {
    const t = ra;
    ra = rb;
    rb = t;
  }
  parent[rb] = ra;
  size[ra] += size[rb];
  return true;
}
function createComponentCounter(g) {
  const parent = new Int32Array(g.n);
  const size = new Int32Array(g.n);
  const uf = { parent, size, find: (i) => findRoot(parent, i) };
  const summary = { alive: 0, count: 0, largest: 0, largestRoot: -1, connectedPairs: 0 };
  const { linkSource, linkTarget } = g;
  return {
    uf,
    summary,
    run(mask) {
      const node = mask.node;
      const link = mask.link;
      const n = g.n;
      let alive = 0;
      for (let v = 0; v < n; v++) {
        parent[v] = v;
        size[v] = 1;
        alive += node[v] ^ 1;
      }
      let count = alive;
      for (let e = 0; e < g.m; e++) {
        if (link[e]) continue;
        const a = linkSource[e];
        const b = linkTarget[e];
        if (node[a] || node[b]) continue;
        if (unite(parent, size, a, b)) count--;
      }
      let largest = 0;
      let largestRoot = -1;
      let pairs = 0;
      for (let v = 0; v < n; v++) {
        if (node[v] || parent[v] !== v) continue;
        const s = size[v];
        pairs += s * (s - 1) / 2;
        if (s > largest) {
          largest = s;
          largestRoot = v;
        }
      }
      summary.alive = alive;
      summary.count = count;
      summary.largest = largest;
      summary.largestRoot = largestRoot;
      summary.connectedPairs = pairs;
      return summary;
    }
  };
}

// src/metrics/kernels/lcc-sources.ts
function createLargestComponentSources(g) {
  const counter = createComponentCounter(g);
  const sources = new Int32Array(g.n);
  const out = { sources, count: 0 };
  return (mask, local) => {
    const s = counter.run(mask);
    out.count = 0;
    if (s.largestRoot < 0) return out;
    const root = s.largestRoot;
    const parent = counter.uf.parent;
    for (let i = 0; i < local.n; i++) if (findRoot(parent, local.toOriginal[i]) === root) sources[out.count++] = i;
    return out;
  };
}
function createLargestComponentHops(g) {
  const survivors = createSurvivorBuilder(g, true);
  const lcc = createLargestComponentSources(g);
  const bfs = createHopHistogram(g.n);
  const out = { hops: { hist: new Float64Array(1), maxDistance: 0 }, count: 0 };
  return (mask) => {
    const local = survivors(mask);
    const { sources, count } = lcc(mask, local);
    out.count = count;
    if (count >= 2) out.hops = bfs.run(local, sources, count);
    return out;
  };
}

// src/metrics/average-hop.ts
var averageHop = {
  id: "average_hop",
  description: "Mean hop count between the node pairs of the largest component.",
  normalization: "1 / H (1 for a complete graph); taken on the largest component; 0 when it has under two nodes.",
  cost: "all-pairs",
  appliesTo: () => true,
  create(g) {
    const hops = createLargestComponentHops(g);
    return (mask) => {
      const { hops: h, count } = hops(mask);
      if (count < 2) return { raw: Number.NaN, normalized: 0 };
      let sum = 0;
      for (let d = 1; d <= h.maxDistance; d++) sum += h.hist[d] * d;
      const mean = sum / (count * (count - 1));
      return { raw: mean, normalized: 1 / mean };
    };
  }
};

// src/metrics/kernels/cut-elements.ts
function createCutFinder(nodeCapacity) {
  const disc = new Int32Array(nodeCapacity);
  const low = new Int32Array(nodeCapacity);
  const parentLink = new Int32Array(nodeCapacity);
  const cursor = new Int32Array(nodeCapacity);
  const stack = new Int32Array(nodeCapacity);
  const blockStack = new Int32Array(nodeCapacity);
  const edgeStack = new Int32Array(nodeCapacity);
  const isCut = new Uint8Array(nodeCapacity);
  const out = { bridges: 0, cutNodes: 0, blockPairs: 0, twoEdgePairs: 0 };
  return (g) => {
    const n = g.n;
    const { offsets, neighbors, linkOf } = g;
    disc.fill(-1, 0, n);
    isCut.fill(0, 0, n);
    let time = 0;
    let bridges2 = 0;
    let blockPairs = 0;
    let twoEdgePairs = 0;
    for (let root = 0; root < n; root++) {
      if (disc[root] !== -1) continue;
      let top = 0;
      let bTop = 0;
      let eTop = 0;
      stack[top++] = root;
      blockStack[bTop++] = root;
      edgeStack[eTop++] = root;
      parentLink[root] = -1;
      disc[root] = low[root] = time++;
      cursor[root] = offsets[root];
      let rootChildren = 0;
      while (top > 0) {
        const v = stack[top - 1];
        if (cursor[v] < offsets[v + 1]) {
          const p = cursor[v]++;
          const e = linkOf[p];
          if (e === parentLink[v]) continue;
          const w = neighbors[p];
          if (disc[w] === -1) {
            parentLink[w] = e;
            disc[w] = low[w] = time++;
            cursor[w] = offsets[w];
            stack[top++] = w;
            blockStack[bTop++] = w;
            edgeStack[eTop++] = w;
            if (v === root) rootChildren++;
          } else if (disc[w] < low[v]) {
            low[v] = disc[w];
          }
        } else {
          top--;
          if (top === 0) break;
          const parent = stack[top - 1];
          if (low[v] < low[parent]) low[parent] = low[v];
          if (low[v] >= disc[parent]) {
            let size = 1;
            while (blockStack[--bTop] !== v) size++;
            size++;
            blockPairs += size * (size - 1) / 2;
            if (parent !== root) isCut[parent] = 1;
          }
          if (low[v] > disc[parent]) {
            bridges2++;
            let size = 1;
            while (edgeStack[--eTop] !== v) size++;
            twoEdgePairs += size * (size - 1) / 2;
          }
        }
      }
      if (rootChildren > 1) isCut[root] = 1;
      twoEdgePairs += eTop * (eTop - 1) / 2;
    }
    let cutNodes2 = 0;
    for (let v = 0; v < n; v++) cutNodes2 += isCut[v];
    out.bridges = bridges2;
    out.cutNodes = cutNodes2;
    out.blockPairs = blockPairs;
    out.twoEdgePairs = twoEdgePairs;
    return out;
  };
}

// src/metrics/kernels/cut-metric.ts
function cutMetric(id, description, normalization, pick) {
  return {
    id,
    description,
    normalization,
    cost: "linear",
    appliesTo: () => true,
    create(g) {
      const survivors = createSurvivorBuilder(g, false);
      const find = createCutFinder(g.n);
      const allPairs = g.n * (g.n - 1) / 2;
      return (mask) => {
        const { count, protectedPairs } = pick(find(survivors(mask)));
        return { raw: count, normalized: allPairs > 0 ? protectedPairs / allPairs : 0 };
      };
    }
  };
}

// src/metrics/bridges.ts
var bridges = cutMetric(
  "bridges",
  "Bridges: links whose single failure disconnects the surviving graph.",
  "Share of the original node pairs still connected after any single link failure (Σ C(|C|,2) over 2-link-connected pieces / C(N0,2)).",
  (s) => ({ count: s.bridges, protectedPairs: s.twoEdgePairs })
);

// src/metrics/cut-nodes.ts
var cutNodes = cutMetric(
  "cut_nodes",
  "Cut nodes: nodes whose single failure disconnects the surviving graph.",
  "Share of the original node pairs that no single third-node failure separates (Σ C(|B|,2) over blocks / C(N0,2)).",
  (s) => ({ count: s.cutNodes, protectedPairs: s.blockPairs })
);

// src/metrics/kernels/dijkstra.ts
function siftUp(heap, pos, dist, i) {
  const v = heap[i];
  const d = dist[v];
  while (i > 0) {
    const parent = i - 1 >> 1;
    const u = heap[parent];
    if (dist[u] <= d) break;
    heap[i] = u;
    pos[u] = i;
    i = parent;
  }
  heap[i] = v;
  pos[v] = i;
}
function siftDown(heap, pos, dist, size, i) {
  const v = heap[i];
  const d = dist[v];
  for (; ; ) {
    let child = 2 * i + 1;
    if (child >= size) break;
    if (child + 1 < size && dist[heap[child + 1]] < dist[heap[child]]) child++;
    const u = heap[child];
    if (dist[u] >= d) break;
    heap[i] = u;
    pos[u] = i;
    i = child;
  }
  heap[i] = v;
  pos[v] = i;
}
function shortestPaths(g, cost, source, dist, heap, pos, visit2) {
  const n = g.n;
  const { offsets, neighbors, linkOf } = g;
  dist.fill(Infinity, 0, n);
  pos.fill(-1, 0, n);
  let size = 0;
  dist[source] = 0;
  heap[size++] = source;
  pos[source] = 0;
  while (size > 0) {
    const v = heap[0];
    const dv = dist[v];
    pos[v] = -2;
    const last = heap[--size];
    if (size > 0) {
      heap[0] = last;
      pos[last] = 0;
      siftDown(heap, pos, dist, size, 0);
    }
    if (visit2 !== void 0 && visit2(v, dv)) return;
    for (let p = offsets[v]; p < offsets[v + 1]; p++) {
      const w = neighbors[p];
      const at = pos[w];
      if (at === -2) continue;
      const nd = dv + cost[linkOf[p]];
      if (nd < dist[w]) {
        dist[w] = nd;
        if (at === -1) {
          heap[size] = w;
          pos[w] = size++;
          siftUp(heap, pos, dist, size - 1);
        } else {
          siftUp(heap, pos, dist, at);
        }
      }
    }
  }
}
function createDijkstra(capacity) {
  const dist = new Float64Array(capacity);
  const heap = new Int32Array(capacity);
  const pos = new Int32Array(capacity);
  return {
    dist,
    /** See shortestPaths; results in `dist`. */
    run(g, cost, source, visit2) {
      shortestPaths(g, cost, source, dist, heap, pos, visit2);
    }
  };
}

// src/metrics/kernels/link-cost.ts
function complete(values) {
  if (!values || values.length === 0) return false;
  for (let e = 0; e < values.length; e++) if (!(values[e] > 0 && Number.isFinite(values[e]))) return false;
  return true;
}
function chooseLinkCost(g) {
  const pick = (kind, unit, values) => {
    if (!complete(values)) return null;
    let min = Infinity;
    for (let e = 0; e < values.length; e++) min = Math.min(min, values[e]);
    return { kind, unit, values, min };
  };
  return pick("latency", "ms", g.latency) ?? pick("length", "km", g.length) ?? pick("weight", "", g.weight);
}
function greatCircleKm(lat1, lon1, lat2, lon2) {
  const rad = Math.PI / 180;
  const dLat = (lat2 - lat1) * rad;
  const dLon = (lon2 - lon1) * rad;
  const a = Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * 6371.0088 * Math.asin(Math.min(1, Math.sqrt(a)));
}
var FIBRE_MS_PER_KM = 49e-4;

// src/metrics/demand-served.ts
function totalVolume(g) {
  let total = 0;
  for (let k = 0; k < g.demandVolume.length; k++) {
    if (g.demandSource[k] >= 0 && g.demandTarget[k] >= 0 && g.demandVolume[k] > 0) total += g.demandVolume[k];
  }
  return total;
}
var demandServed = {
  id: "demand_served",
  description: "Share of traffic demand volume whose ends are still connected (within the latency budget, if one is set).",
  normalization: "served volume / total demand volume; raw = served volume.",
  cost: "linear",
  appliesTo: (g) => totalVolume(g) > 0,
  create(g, options = {}) {
    const total = totalVolume(g);
    const budget = options.latencyBudget ?? g.latencyBudget;
    const k = g.demandVolume.length;
    const { demandSource: src, demandTarget: dst, demandVolume: vol } = g;
    if (budget === void 0) {
      const counter = createComponentCounter(g);
      return (mask) => {
        if (total <= 0) return { raw: 0, normalized: 0 };
        counter.run(mask);
        const parent = counter.uf.parent;
        let served = 0;
        for (let d = 0; d < k; d++) {
          const s = src[d];
          const t = dst[d];
          if (s < 0 || t < 0 || !(vol[d] > 0) || mask.node[s] || mask.node[t]) continue;
          if (s === t || findRoot(parent, s) === findRoot(parent, t)) served += vol[d];
        }
        return { raw: served, normalized: served / total };
      };
    }
    if (!(budget > 0)) throw new RangeError(`latency budget must be positive, got ${budget}`);
    const chosen = chooseLinkCost(g);
    const cost = chosen ? chosen.values : new Float64Array(g.m).fill(1);
    const first = new Int32Array(g.n + 1);
    for (let d = 0; d < k; d++) if (src[d] >= 0 && dst[d] >= 0 && vol[d] > 0) first[src[d] + 1]++;
    for (let v = 0; v < g.n; v++) first[v + 1] += first[v];
    const bySource = new Int32Array(first[g.n]);
    const fill = first.slice(0, g.n);
    for (let d = 0; d < k; d++) if (src[d] >= 0 && dst[d] >= 0 && vol[d] > 0) bySource[fill[src[d]]++] = d;
    const survivors = createSurvivorBuilder(g, false);
    const dijkstra = createDijkstra(g.n);
    const allowed = new Float64Array(k).fill(-1);
    {
      const local = survivors(createMask(g));
      for (let s = 0; s < g.n; s++) {
        if (first[s] === first[s + 1]) continue;
        dijkstra.run(local, cost, s);
        for (let i = first[s]; i < first[s + 1]; i++) {
          const d = bySource[i];
          const c = dijkstra.dist[dst[d]];
          if (c < Infinity) allowed[d] = c * budget * (1 + 1e-12);
        }
      }
    }
    let reach = 0;
    const stopWhenBeyond = (_v, dist) => dist > reach;
    return (mask) => {
      if (total <= 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      let served = 0;
      for (let s = 0; s < g.n; s++) {
        if (first[s] === first[s + 1] || mask.node[s]) continue;
        reach = 0;
        for (let i = first[s]; i < first[s + 1]; i++) reach = Math.max(reach, allowed[bySource[i]]);
        if (reach < 0) continue;
        dijkstra.run(local, cost, local.toLocal[s], stopWhenBeyond);
        for (let i = first[s]; i < first[s + 1]; i++) {
          const d = bySource[i];
          const t = dst[d];
          if (allowed[d] < 0 || mask.node[t]) continue;
          if (dijkstra.dist[local.toLocal[t]] <= allowed[d]) served += vol[d];
        }
      }
      return { raw: served, normalized: served / total };
    };
  }
};

// src/metrics/diameter.ts
var diameter = {
  id: "diameter",
  description: "Longest shortest path (hops) within the largest component.",
  normalization: "1 / D (1 for a complete graph); taken on the largest component; 0 when it has under two nodes.",
  cost: "all-pairs",
  appliesTo: () => true,
  create(g) {
    const hops = createLargestComponentHops(g);
    return (mask) => {
      const { hops: h, count } = hops(mask);
      if (count < 2) return { raw: Number.NaN, normalized: 0 };
      return { raw: h.maxDistance, normalized: 1 / h.maxDistance };
    };
  }
};

// src/metrics/kernels/banded-resistance.ts
function createBandedResistance(capacity) {
  const perm = new Int32Array(capacity);
  const place = new Int32Array(capacity);
  const queue = new Int32Array(capacity);
  const seen = new Uint8Array(capacity);
  const order = new Int32Array(capacity);
  const d = new Float64Array(capacity);
  const x = new Float64Array(capacity);
  let band = new Float64Array(0);
  let inverse2 = new Float64Array(0);
  function cuthillMcKee(g, start) {
    seen.fill(0, 0, g.n);
    let head = 0;
    let tail = 0;
    queue[tail++] = start;
    seen[start] = 1;
    let lastLevelStart = start;
    let levelEnd = 1;
    while (head < tail) {
      if (head === levelEnd) {
        lastLevelStart = queue[head];
        levelEnd = tail;
      }
      const v = queue[head++];
      const from = tail;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (seen[w]) continue;
        seen[w] = 1;
        const dw = g.offsets[w + 1] - g.offsets[w];
        let k = tail++;
        while (k > from && g.offsets[queue[k - 1] + 1] - g.offsets[queue[k - 1]] > dw) {
          queue[k] = queue[k - 1];
          k--;
        }
        queue[k] = w;
      }
    }
    return lastLevelStart;
  }
  return {
    /**
     * The band width the ordering gives for `g` (connected, n ≥ 2), leaving the ordering in
     * place for `resistance`. The ground is the last node of the ordering.
     */
    prepare(g) {
      const n = g.n;
      let start = 0;
      for (let v = 1; v < n; v++) if (g.offsets[v + 1] - g.offsets[v] < g.offsets[start + 1] - g.offsets[start]) start = v;
      start = cuthillMcKee(g, start);
      cuthillMcKee(g, start);
      for (let i = 0; i < n; i++) order[i] = queue[n - 1 - i];
      for (let i = 0; i < n; i++) {
        perm[i] = order[i];
        place[order[i]] = i;
      }
      let b = 0;
      for (let v = 0; v < n; v++) {
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
          const gap = Math.abs(place[v] - place[g.neighbors[p]]);
          if (gap > b) b = gap;
        }
      }
      return b;
    },
    /** R_G of the connected graph `g` after `prepare(g)` returned `b`. */
    resistance(g, b) {
      const n = g.n;
      const m = n - 1;
      const w = b + 1;
      if (band.length < m * w) {
        band = new Float64Array(m * w);
        inverse2 = new Float64Array(m * w);
      }
      band.fill(0, 0, m * w);
      for (let i = 0; i < m; i++) {
        const v = perm[i];
        band[i * w] = g.offsets[v + 1] - g.offsets[v];
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
          const j = place[g.neighbors[p]];
          if (j < i) band[i * w + (i - j)] -= 1;
        }
      }
      for (let i = 0; i < m; i++) {
        const lo = Math.max(0, i - b);
        const ri = i * w;
        for (let j = lo; j < i; j++) {
          const rj = j * w;
          let s2 = band[ri + (i - j)];
          const k0 = Math.max(lo, j - b);
          for (let k = k0; k < j; k++) s2 -= band[ri + (i - k)] * d[k] * band[rj + (j - k)];
          band[ri + (i - j)] = s2 / d[j];
        }
        let s = band[ri];
        for (let k = lo; k < i; k++) {
          const l = band[ri + (i - k)];
          s -= l * l * d[k];
        }
        d[i] = s;
      }
      let trace = 0;
      for (let i = m - 1; i >= 0; i--) {
        const hi = Math.min(m - 1, i + b);
        for (let j = hi; j > i; j--) {
          let s2 = 0;
          for (let k = i + 1; k <= hi; k++) {
            const lki = band[k * w + (k - i)];
            if (lki === 0) continue;
            s2 -= lki * (k <= j ? inverse2[j * w + (j - k)] : inverse2[k * w + (k - j)]);
          }
          inverse2[j * w + (j - i)] = s2;
        }
        let s = 1 / d[i];
        for (let k = i + 1; k <= hi; k++) s -= band[k * w + (k - i)] * inverse2[k * w + (k - i)];
        inverse2[i * w] = s;
        trace += s;
      }
      for (let i = 0; i < m; i++) {
        let s = 1;
        for (let k = Math.max(0, i - b); k < i; k++) s -= band[i * w + (i - k)] * x[k];
        x[i] = s;
      }
      for (let i = 0; i < m; i++) x[i] /= d[i];
      for (let i = m - 1; i >= 0; i--) {
        let s = x[i];
        for (let k = i + 1; k <= Math.min(m - 1, i + b); k++) s -= band[k * w + (k - i)] * x[k];
        x[i] = s;
      }
      let total = 0;
      for (let i = 0; i < m; i++) total += x[i];
      return n * trace - total;
    }
  };
}

// src/metrics/kernels/slq.ts
function createTraceEstimator(capacity, maxSteps) {
  const stride = Math.max(1, capacity);
  const q = new Float64Array(stride);
  const qPrev = new Float64Array(stride);
  const w = new Float64Array(stride);
  const diag = new Float64Array(maxSteps);
  const off = new Float64Array(maxSteps);
  const d = new Float64Array(maxSteps);
  const e = new Float64Array(maxSteps);
  const z = new Float64Array(maxSteps);
  function deflate(v, n, defl, dc) {
    for (let k = 0; k < dc; k++) {
      let c = 0;
      const o = k * n;
      for (let i = 0; i < n; i++) c += defl[o + i] * v[i];
      for (let i = 0; i < n; i++) v[i] -= c * defl[o + i];
    }
  }
  function quadrature(k, f) {
    tridiagonalEigen(diag, off, k, d, e, z, true);
    let s = 0;
    for (let j = 0; j < k; j++) s += z[j] * z[j] * f(d[j]);
    return s;
  }
  return {
    /**
     * Estimate Σ f(λ) over the eigenvalues of `op` whose eigenvectors are orthogonal to
     * the `dc` orthonormal vectors in `defl` (packed with stride op.n).
     */
    estimate(op, f, keys, defl, dc, opts) {
      const n = op.n;
      if (n - dc <= 0) return 0;
      const steps = Math.min(opts.steps, maxSteps, n - dc);
      let total = 0;
      for (let p = 0; p < opts.probes; p++) {
        for (let i = 0; i < n; i++) q[i] = sign(keys[i], 20903 + p);
        deflate(q, n, defl, dc);
        let nz2 = 0;
        for (let i = 0; i < n; i++) nz2 += q[i] * q[i];
        if (nz2 === 0) continue;
        const inv = 1 / Math.sqrt(nz2);
        for (let i = 0; i < n; i++) {
          q[i] *= inv;
          qPrev[i] = 0;
        }
        let betaPrev = 0;
        let estimate2 = 0;
        let last = Number.NaN;
        for (let j = 0; j < steps; j++) {
          op.apply(q, w);
          deflate(w, n, defl, dc);
          let alpha = 0;
          for (let i = 0; i < n; i++) alpha += q[i] * w[i];
          let beta2 = 0;
          for (let i = 0; i < n; i++) {
            const v = w[i] - alpha * q[i] - betaPrev * qPrev[i];
            w[i] = v;
            beta2 += v * v;
          }
          const beta = Math.sqrt(beta2);
          diag[j] = alpha;
          off[j] = beta;
          const k = j + 1;
          const breakdown = beta <= 1e-12 * Math.max(op.normBound, 1);
          if (k === steps || breakdown || k % 4 === 0) {
            estimate2 = quadrature(k, f);
            if (breakdown || Math.abs(estimate2 - last) <= opts.tol * Math.abs(estimate2)) break;
            last = estimate2;
          }
          const invBeta = 1 / beta;
          for (let i = 0; i < n; i++) {
            qPrev[i] = q[i];
            q[i] = w[i] * invBeta;
          }
          betaPrev = beta;
        }
        total += nz2 * estimate2;
      }
      return total / opts.probes;
    }
  };
}

// src/metrics/effective-resistance.ts
var DEFAULT_EXACT_WORK = 5e7;
var PROBES = 32;
var STEPS = 120;
var inverse = (x) => 1 / x;
var effectiveResistance = {
  id: "effective_resistance",
  description: "Effective graph resistance (Kirchhoff index) of the surviving graph; ∞ if disconnected.",
  normalization: "(N' − 1) / R_G over the N' survivors (1 only for the complete graph); 0 when disconnected.",
  cost: "spectral",
  appliesTo: () => true,
  create(g, options = {}) {
    const limit = options.denseLimit ?? TRACE_DENSE_LIMIT;
    const maxWork = options.exactWork ?? DEFAULT_EXACT_WORK;
    const spectral = createSpectralSurvivors(g);
    const banded = createBandedResistance(g.n);
    let slq = null;
    const op = createLaplacianOperator();
    const deflation = new Float64Array(g.n);
    return (mask) => {
      const local = spectral.survivors(mask);
      const n = local.n;
      if (n < 2) return { raw: 0, normalized: 0 };
      if (spectral.components(local).count > 1) return { raw: Infinity, normalized: 0 };
      const b = banded.prepare(local);
      let resistance;
      if (n <= limit || n * b * b <= maxWork) {
        resistance = banded.resistance(local, b);
      } else {
        op.bind(local);
        deflation.fill(1 / Math.sqrt(n), 0, n);
        slq ??= createTraceEstimator(g.n, STEPS);
        const trace = slq.estimate(op, inverse, spectral.keysOf(local), deflation, 1, {
          probes: PROBES,
          steps: STEPS,
          tol: 1e-9
        });
        resistance = n * trace;
      }
      return { raw: resistance, normalized: Math.min(1, (n - 1) / resistance) };
    };
  }
};

// src/metrics/efficiency.ts
var efficiency = {
  id: "efficiency",
  description: "Global efficiency: mean inverse hop distance over all pairs of original nodes.",
  normalization: "Already in [0, 1] with N0 in the denominator; 1 only for a complete graph.",
  cost: "all-pairs",
  appliesTo: () => true,
  create(g) {
    const survivors = createSurvivorBuilder(g, true);
    const bfs = createHopHistogram(g.n);
    const sources = new Int32Array(g.n);
    for (let i = 0; i < g.n; i++) sources[i] = i;
    const pairs = g.n * (g.n - 1);
    return (mask) => {
      if (pairs === 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      const { hist, maxDistance } = bfs.run(local, sources, local.n);
      let sum = 0;
      for (let d = 1; d <= maxDistance; d++) sum += hist[d] / d;
      const e = sum / pairs;
      return { raw: e, normalized: e };
    };
  }
};

// src/metrics/largest-component.ts
var largestComponent = {
  id: "largest_component",
  description: "Share of the original nodes in the largest connected component.",
  normalization: "|largest component| / N0 (original node count); raw = nodes in the largest component.",
  cost: "linear",
  appliesTo: () => true,
  create(g) {
    const counter = createComponentCounter(g);
    return (mask) => {
      const s = counter.run(mask);
      return { raw: s.largest, normalized: g.n > 0 ? s.largest / g.n : 0 };
    };
  }
};

// src/metrics/kernels/max-flow.ts
function createFlowNetwork(nodeCapacity, entryCapacity) {
  const maxNodes = 2 * nodeCapacity;
  const maxArcs = 2 * entryCapacity + 2 * nodeCapacity;
  const start = new Int32Array(maxNodes + 1);
  const head = new Int32Array(maxArcs);
  const rev = new Int32Array(maxArcs);
  const cap0 = new Int8Array(maxArcs);
  const cap = new Int8Array(maxArcs);
  const fill = new Int32Array(maxNodes);
  const parentArc = new Int32Array(maxNodes);
  const queue = new Int32Array(maxNodes);
  let nodes = 0;
  let arcs = 0;
  let isSplit = false;
  function addPair(a, b, capAB, capBA) {
    const x = fill[a]++;
    const y = fill[b]++;
    head[x] = b;
    cap0[x] = capAB;
    rev[x] = y;
    head[y] = a;
    cap0[y] = capBA;
    rev[y] = x;
  }
  return {
    build(graph, split) {
      isSplit = split;
      const n = graph.n;
      nodes = split ? 2 * n : n;
      start.fill(0, 0, nodes + 1);
      for (let v = 0; v < n; v++) {
        const deg = graph.offsets[v + 1] - graph.offsets[v];
        if (split) {
          start[2 * v + 1] += 1 + deg;
          start[2 * v + 2] += 1 + deg;
        } else {
          start[v + 1] += deg;
        }
      }
      for (let i = 0; i < nodes; i++) start[i + 1] += start[i];
      arcs = start[nodes];
      for (let i = 0; i < nodes; i++) fill[i] = start[i];
      for (let v = 0; v < n; v++) {
        if (split) addPair(2 * v, 2 * v + 1, 1, 0);
        for (let p = graph.offsets[v]; p < graph.offsets[v + 1]; p++) {
          const w = graph.neighbors[p];
          if (split) addPair(2 * v + 1, 2 * w, 1, 0);
          else if (v < w) addPair(v, w, 1, 1);
        }
      }
    },
    flow(s, t, limit) {
      const source = isSplit ? 2 * s + 1 : s;
      const sink = isSplit ? 2 * t : t;
      if (source === sink) return limit;
      for (let a = 0; a < arcs; a++) cap[a] = cap0[a];
      let total = 0;
      while (total < limit) {
        parentArc.fill(-1, 0, nodes);
        let qh = 0;
        let qt = 0;
        queue[qt++] = source;
        parentArc[source] = -2;
        let found = false;
        while (qh < qt && !found) {
          const u = queue[qh++];
          for (let a = start[u]; a < fill[u]; a++) {
            if (cap[a] <= 0) continue;
            const v = head[a];
            if (parentArc[v] !== -1) continue;
            parentArc[v] = a;
            if (v === sink) {
              found = true;
              break;
            }
            queue[qt++] = v;
          }
        }
        if (!found) break;
        for (let v = sink; v !== source; ) {
          const a = parentArc[v];
          cap[a]--;
          cap[rev[a]]++;
          v = head[rev[a]];
        }
        total++;
      }
      return total;
    }
  };
}

// src/metrics/kernels/connectivity-counts.ts
function createConnectivityCounter(nodeCapacity, entryCapacity) {
  const network = createFlowNetwork(nodeCapacity, entryCapacity);
  const mark = new Int32Array(nodeCapacity).fill(-1);
  let stampCounter = 0;
  const domNodes = new Int32Array(nodeCapacity);
  const dominated = new Uint8Array(nodeCapacity);
  const dominating = { nodes: domNodes, count: 0 };
  function dominatingSet(g) {
    dominated.fill(0, 0, g.n);
    dominating.count = 0;
    for (let v = 0; v < g.n; v++) {
      if (dominated[v]) continue;
      domNodes[dominating.count++] = v;
      dominated[v] = 1;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) dominated[g.neighbors[p]] = 1;
    }
    return dominating;
  }
  function nextStamp() {
    if (stampCounter >= 1073741823) {
      mark.fill(-1);
      stampCounter = 0;
    }
    return ++stampCounter;
  }
  function hasParallel(g) {
    for (let v = 0; v < g.n; v++) {
      const stamp = nextStamp();
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (mark[w] === stamp) return true;
        mark[w] = stamp;
      }
    }
    return false;
  }
  function minDegree(g) {
    let node = 0;
    let degree2 = Infinity;
    for (let v = 0; v < g.n; v++) {
      const d = g.offsets[v + 1] - g.offsets[v];
      if (d < degree2) {
        degree2 = d;
        node = v;
      }
    }
    return { node, degree: degree2 };
  }
  return {
    /** λ of a connected multigraph (parallel links count) with at least two nodes. */
    linkConnectivity(g) {
      const { degree: degree2 } = minDegree(g);
      let best = degree2;
      network.build(g, false);
      const dominating2 = hasParallel(g) ? null : dominatingSet(g);
      const targets = dominating2 ? dominating2.count : g.n;
      const s = dominating2 ? dominating2.nodes[0] : 0;
      for (let k = 0; k < targets && best > 0; k++) {
        const t = dominating2 ? dominating2.nodes[k] : k;
        if (t === s) continue;
        const f = network.flow(s, t, best);
        if (f < best) best = f;
      }
      return best;
    },
    /** κ of a connected simple graph with at least two nodes. */
    nodeConnectivity(g) {
      const n = g.n;
      if (g.entries === n * (n - 1)) return n - 1;
      const { node: v, degree: degree2 } = minDegree(g);
      let best = degree2;
      network.build(g, true);
      const stamp = nextStamp();
      mark[v] = stamp;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) mark[g.neighbors[p]] = stamp;
      for (let w = 0; w < n && best > 0; w++) {
        if (mark[w] === stamp) continue;
        const f = network.flow(v, w, best);
        if (f < best) best = f;
      }
      for (let p = g.offsets[v]; p < g.offsets[v + 1] && best > 0; p++) {
        const x = g.neighbors[p];
        const sx = nextStamp();
        for (let r = g.offsets[x]; r < g.offsets[x + 1]; r++) mark[g.neighbors[r]] = sx;
        for (let q = p + 1; q < g.offsets[v + 1] && best > 0; q++) {
          const y = g.neighbors[q];
          if (mark[y] === sx || y === x) continue;
          const f = network.flow(x, y, best);
          if (f < best) best = f;
        }
      }
      return best;
    }
  };
}

// src/metrics/link-connectivity.ts
var linkConnectivity = {
  id: "link_connectivity",
  description: "Link connectivity λ: fewest link failures that disconnect the surviving graph (parallel links count).",
  normalization: "min(1, λ / (N0 − 1)); 0 when disconnected.",
  cost: "flow",
  appliesTo: () => true,
  create(g) {
    const survivors = createSurvivorBuilder(g, false);
    const components = createComponentCounter(g);
    const counter = createConnectivityCounter(g.n, 2 * g.m);
    return (mask) => {
      const s = components.run(mask);
      if (s.alive < 2 || s.count > 1) return { raw: 0, normalized: 0 };
      const l = counter.linkConnectivity(survivors(mask));
      return { raw: l, normalized: Math.min(1, l / (g.n - 1)) };
    };
  }
};

// src/metrics/natural-connectivity.ts
var DEFLATE = 8;
var PROBES2 = 32;
var STEPS2 = 40;
function naturalConnectivityOfComplete(n) {
  if (n <= 1) return 0;
  return n - 1 + Math.log1p((n - 1) * Math.exp(-n)) - Math.log(n);
}
function logAdd(a, b) {
  if (a === -Infinity) return b;
  if (b === -Infinity) return a;
  const hi = Math.max(a, b);
  return hi + Math.log1p(Math.exp(Math.min(a, b) - hi));
}
var naturalConnectivity = {
  id: "natural_connectivity",
  description: "Natural connectivity: log of the mean of e^λ over the adjacency spectrum of the surviving graph.",
  normalization: "λ̄ / λ̄(K_N0), the value of the complete graph on the original node count.",
  cost: "spectral",
  appliesTo: () => true,
  create(g, options = {}) {
    const limit = Math.min(g.n, options.denseLimit ?? TRACE_DENSE_LIMIT);
    const spectral = createSpectralSurvivors(g);
    const dense = createDenseSpectrum(limit);
    const big = g.n > limit;
    const lanczos = big ? createLanczos(g.n, DEFLATE) : null;
    const slq = big ? createTraceEstimator(g.n, STEPS2) : null;
    const op = createAdjacencyOperator();
    const deflation = big ? new Float64Array(DEFLATE * g.n) : new Float64Array(0);
    const best = naturalConnectivityOfComplete(g.n);
    return (mask) => {
      const local = spectral.survivors(mask);
      if (local.n === 0) return { raw: 0, normalized: 0 };
      const comps = spectral.components(local);
      let logTotal = -Infinity;
      let isolated = 0;
      for (let c = 0; c < comps.count; c++) {
        const size = comps.start[c + 1] - comps.start[c];
        if (size === 1) {
          isolated++;
          continue;
        }
        const part = spectral.component(local, comps, c);
        let logPart;
        if (size <= limit) {
          const d = dense.adjacency(part);
          const top = d[size - 1];
          let s = 0;
          for (let i = 0; i < size; i++) s += Math.exp(d[i] - top);
          logPart = top + Math.log(s);
        } else {
          op.bind(part);
          const k = Math.min(DEFLATE, size);
          const r = lanczos.solve(op, { which: "largest", count: k, keys: spectral.keysOf(part) });
          const top = r.values[0];
          let s = 0;
          for (let j = 0; j < r.found; j++) {
            s += Math.exp(r.values[j] - top);
            deflation.set(r.vectors.subarray(j * r.stride, j * r.stride + size), j * size);
          }
          s += slq.estimate(op, (x) => Math.exp(x - top), spectral.keysOf(part), deflation, r.found, {
            probes: PROBES2,
            steps: STEPS2,
            tol: 1e-10
          });
          logPart = top + Math.log(s);
        }
        logTotal = logAdd(logTotal, logPart);
      }
      if (isolated > 0) logTotal = logAdd(logTotal, Math.log(isolated));
      const lambda = Math.max(0, logTotal - Math.log(local.n));
      return { raw: lambda, normalized: best > 0 ? Math.min(1, lambda / best) : 0 };
    };
  }
};

// src/metrics/node-connectivity.ts
var nodeConnectivity = {
  id: "node_connectivity",
  description: "Node connectivity κ: fewest node failures that disconnect the surviving graph.",
  normalization: "κ / (N0 − 1) (1 only for the complete graph); 0 when disconnected.",
  cost: "flow",
  appliesTo: () => true,
  create(g) {
    const survivors = createSurvivorBuilder(g, true);
    const components = createComponentCounter(g);
    const counter = createConnectivityCounter(g.n, 2 * g.m);
    return (mask) => {
      const s = components.run(mask);
      if (s.alive < 2 || s.count > 1) return { raw: 0, normalized: 0 };
      const k = counter.nodeConnectivity(survivors(mask));
      return { raw: k, normalized: Math.min(1, k / (g.n - 1)) };
    };
  }
};

// src/metrics/pair-connectivity.ts
var pairConnectivity = {
  id: "pair_connectivity",
  description: "Fraction of the original node pairs that are still connected.",
  normalization: "connected pairs / C(N0, 2); raw = number of connected pairs.",
  cost: "linear",
  appliesTo: () => true,
  create(g) {
    const counter = createComponentCounter(g);
    const allPairs = g.n * (g.n - 1) / 2;
    return (mask) => {
      const s = counter.run(mask);
      return { raw: s.connectedPairs, normalized: allPairs > 0 ? s.connectedPairs / allPairs : 0 };
    };
  }
};

// src/metrics/spectral-radius.ts
var spectralRadius = {
  id: "spectral_radius",
  description: "Largest adjacency eigenvalue of the surviving graph.",
  normalization: "λ1 / (N0 − 1) (1 only for the complete graph).",
  cost: "spectral",
  appliesTo: () => true,
  create(g, options = {}) {
    const spectral = createSpectralSurvivors(g);
    const solve = createExtremalSolver(g, "radius", options.denseLimit ?? EXTREMAL_DENSE_LIMIT, options.warmStart ?? false);
    return (mask) => {
      const local = spectral.survivors(mask);
      const comps = spectral.components(local);
      let best = 0;
      for (let c = 0; c < comps.count; c++) {
        const size = comps.start[c + 1] - comps.start[c];
        if (size < 2 || size - 1 <= best) continue;
        const part = spectral.component(local, comps, c);
        if (maxDegree(part) <= best) continue;
        const rho = size === 2 ? 1 : solve(part, spectral.keysOf(part));
        if (rho > best) best = rho;
      }
      return { raw: best, normalized: g.n > 1 ? Math.min(1, best / (g.n - 1)) : 0 };
    };
  }
};

// src/metrics/weighted-efficiency.ts
function idealInverseSum(g, kind, lMin) {
  const n = g.n;
  const { lat, lon } = g;
  if (!lat || !lon || kind === "weight") return n * (n - 1) / lMin;
  const factor = kind === "latency" ? FIBRE_MS_PER_KM : 1;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      let delta = lMin;
      if (Number.isFinite(lat[i]) && Number.isFinite(lon[i]) && Number.isFinite(lat[j]) && Number.isFinite(lon[j])) {
        delta = Math.max(lMin, greatCircleKm(lat[i], lon[i], lat[j], lon[j]) * factor);
      }
      sum += 2 / delta;
    }
  }
  return sum;
}
var weightedEfficiency = {
  id: "weighted_efficiency",
  description: "Global efficiency by latency (else length, else weight): mean inverse cheapest-path cost over original pairs.",
  normalization: "E_w / E_ideal, ideal = every pair joined directly (great-circle distance, at least the cheapest link).",
  cost: "all-pairs",
  appliesTo: (g) => chooseLinkCost(g) !== null,
  create(g) {
    const cost = chooseLinkCost(g);
    if (!cost) throw new RangeError("weighted_efficiency needs latency, length or weight on every link");
    const survivors = createSurvivorBuilder(g, false);
    const dijkstra = createDijkstra(g.n);
    const pairs = g.n * (g.n - 1);
    const ideal = pairs > 0 ? idealInverseSum(g, cost.kind, cost.min) : 0;
    return (mask) => {
      if (pairs === 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      const dist = dijkstra.dist;
      let sum = 0;
      for (let s = 0; s < local.n; s++) {
        dijkstra.run(local, cost.values, s);
        let row = 0;
        for (let t = 0; t < local.n; t++) {
          const d = dist[t];
          if (t !== s && d < Infinity) row += 1 / d;
        }
        sum += row;
      }
      return { raw: sum / pairs, normalized: Math.min(1, sum / ideal) };
    };
  }
};

// src/metrics/registry.ts
var metrics = [
  efficiency,
  weightedEfficiency,
  largestComponent,
  pairConnectivity,
  averageHop,
  diameter,
  algebraicConnectivity,
  effectiveResistance,
  naturalConnectivity,
  spectralRadius,
  nodeConnectivity,
  linkConnectivity,
  bridges,
  cutNodes,
  demandServed
];
var byId = new Map(metrics.map((m) => [m.id, m]));
function isMetricId(s) {
  return byId.has(s);
}
function getMetric(id) {
  const m = byId.get(id);
  if (!m) throw new UsageError(`unknown metric "${id}"`, `known metrics: ${metrics.map((x) => x.id).join(", ")}`);
  return m;
}

// src/envelope/r-value.ts
function validateRSpec(spec) {
  if (spec.metrics.length === 0) throw new RangeError("the R-value needs at least one metric");
  for (const m of spec.metrics) {
    if (!(m.weight > 0) || !Number.isFinite(m.weight)) throw new RangeError(`metric ${m.id}: weight must be > 0, got ${m.weight}`);
  }
  if (spec.combine !== "mean" && spec.combine !== "min") throw new RangeError(`combine must be "mean" or "min"`);
}
function combineR(spec, values) {
  if (spec.combine === "min") {
    let r = Infinity;
    for (let i = 0; i < values.length; i++) if (values[i] < r) r = values[i];
    return r;
  }
  let sum = 0;
  let weight = 0;
  for (let i = 0; i < values.length; i++) {
    sum += spec.metrics[i].weight * values[i];
    weight += spec.metrics[i].weight;
  }
  return sum / weight;
}
function createRValue(g, spec, options) {
  validateRSpec(spec);
  const evaluators = spec.metrics.map((m) => getMetric(m.id).create(g, options));
  const values = new Float64Array(evaluators.length);
  return (mask) => {
    for (let i = 0; i < evaluators.length; i++) values[i] = evaluators[i](mask).normalized;
    return combineR(spec, values);
  };
}
var UNION_FIND_METRICS = /* @__PURE__ */ new Set(["largest_component", "pair_connectivity"]);
function unionFindR(g, spec) {
  if (!spec.metrics.every((m) => UNION_FIND_METRICS.has(m.id))) return null;
  const n = g.n;
  const allPairs = n * (n - 1) / 2;
  const values = new Float64Array(spec.metrics.length);
  const ids = spec.metrics.map((m) => m.id);
  return (curve, k) => {
    for (let i = 0; i < ids.length; i++) {
      values[i] = ids[i] === "largest_component" ? n > 0 ? curve.lcc[k] / n : 0 : allPairs > 0 ? curve.pairs[k] / allPairs : 0;
    }
    return combineR(spec, values);
  };
}
function rPasses(g, spec) {
  const passes = { linear: 1, "all-pairs": Math.max(1, g.n), spectral: 50, flow: Math.max(1, g.n) };
  let total = 0;
  for (const m of spec.metrics) total += passes[getMetric(m.id).cost];
  return total;
}

// src/envelope/union-find.ts
function createUnionFindWorkspace(g) {
  return {
    parent: new Int32Array(g.n),
    size: new Int32Array(g.n),
    nodeOn: new Uint8Array(g.n),
    linkOn: new Uint8Array(g.m),
    firstGroup: new Int32Array(g.m)
  };
}
function connectivityCurve(g, kind, order, count, ws = createUnionFindWorkspace(g), out = { lcc: new Float64Array(count + 1), pairs: new Float64Array(count + 1) }) {
  const { nodeOn, linkOn, firstGroup } = ws;
  nodeOn.fill(1);
  linkOn.fill(1);
  if (kind === "node") for (let i = 0; i < count; i++) nodeOn[order[i]] = 0;
  else if (kind === "link") for (let i = 0; i < count; i++) linkOn[order[i]] = 0;
  else {
    firstGroup.fill(-1);
    for (let i = 0; i < count; i++) {
      const u = order[i];
      for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
        const e = g.groupLinks[p];
        if (g.linkHardened[e] === 0 && linkOn[e] === 1) {
          linkOn[e] = 0;
          firstGroup[e] = i;
        }
      }
    }
  }
  const { parent, size } = ws;
  const st = { lcc: 0, pairs: 0 };
  const { offsets, neighbors, linkOf, linkSource, linkTarget } = g;
  const addNode = (v) => {
    nodeOn[v] = 1;
    if (st.lcc < 1) st.lcc = 1;
    for (let p = offsets[v]; p < offsets[v + 1]; p++) {
      const w = neighbors[p];
      if (nodeOn[w] === 1 && linkOn[linkOf[p]] === 1) join(st, parent, size, v, w);
    }
  };
  const addLink = (e) => {
    linkOn[e] = 1;
    const a = linkSource[e];
    const b = linkTarget[e];
    if (nodeOn[a] === 1 && nodeOn[b] === 1) join(st, parent, size, a, b);
  };
  for (let v = 0; v < g.n; v++) {
    parent[v] = v;
    size[v] = 1;
  }
  for (let v = 0; v < g.n; v++) if (nodeOn[v] === 1) st.lcc = 1;
  for (let e = 0; e < g.m; e++) {
    const a = linkSource[e];
    const b = linkTarget[e];
    if (linkOn[e] === 1 && nodeOn[a] === 1 && nodeOn[b] === 1) join(st, parent, size, a, b);
  }
  out.lcc[count] = st.lcc;
  out.pairs[count] = st.pairs;
  for (let i = count - 1; i >= 0; i--) {
    const u = order[i];
    if (kind === "node") addNode(u);
    else if (kind === "link") addLink(u);
    else {
      for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
        const e = g.groupLinks[p];
        if (firstGroup[e] === i) addLink(e);
      }
    }
    out.lcc[i] = st.lcc;
    out.pairs[i] = st.pairs;
  }
  return out;
}
function join(st, parent, size, a, b) {
  a = findRoot(parent, a);
  b = findRoot(parent, b);
  if (a === b) return;
  const sa = size[a];
  const sb = size[b];
  const s = sa + sb;
  st.pairs += sa * sb;
  if (sa < sb) {
    parent[a] = b;
    size[b] = s;
  } else {
    parent[b] = a;
    size[a] = s;
  }
  if (s > st.lcc) st.lcc = s;
}

// src/envelope/worst-case.ts
function subsets(e, k) {
  if (k <= 0) return 1;
  if (k === 1) return e;
  let c = 1;
  for (let i = 0; i < k; i++) c = c * (e - i) / (i + 1);
  return Math.max(0, Math.round(c));
}
function tryUnit(g, kind, mask, trial, u, rfn) {
  if (kind === "node" || kind === "link") {
    const bits = kind === "node" ? mask.node : mask.link;
    if (bits[u]) return rfn(mask);
    bits[u] = 1;
    const r = rfn(mask);
    bits[u] = 0;
    return r;
  }
  copyMask(mask, trial);
  removeUnit(g, trial, kind, u);
  return rfn(trial);
}
function searchWorstCase(g, kind, k, rfn, options) {
  const eligible = eligibleUnits(g, kind);
  const units = [];
  for (let u = 0; u < eligible.length; u++) if (eligible[u]) units.push(u);
  const steps = Math.min(k, units.length);
  const ids = unitIds(g, kind);
  const done = (seq, values, method) => ({
    kind,
    k: steps,
    method,
    elements: seq.map((u) => ids[u]),
    values
  });
  if (steps === 0) return done([], [], "exact");
  const mask = createMask(g);
  const trial = createMask(g);
  if (steps <= 2 && subsets(units.length, steps) <= options.exactLimit) {
    const single = units.map((u) => tryUnit(g, kind, mask, trial, u, rfn));
    if (steps === 1) {
      let best2 = 0;
      for (let i = 1; i < units.length; i++) if (single[i] < single[best2]) best2 = i;
      return done([units[best2]], [single[best2]], "exact");
    }
    let bestR = Infinity;
    let bi = -1;
    let bj = -1;
    for (let i = 0; i < units.length; i++) {
      removeUnit(g, mask, kind, units[i]);
      for (let j = i + 1; j < units.length; j++) {
        const r = tryUnit(g, kind, mask, trial, units[j], rfn);
        if (r < bestR) {
          bestR = r;
          bi = i;
          bj = j;
        }
      }
      mask.node.fill(0);
      mask.link.fill(0);
    }
    const [a, b] = single[bj] < single[bi] ? [bj, bi] : [bi, bj];
    return done([units[a], units[b]], [single[a], bestR], "exact");
  }
  const width = Math.max(1, Math.floor(options.beam));
  let beam = [{ seq: [], values: [], mask: createMask(g) }];
  for (let step = 0; step < steps; step++) {
    const candidates2 = [];
    for (const state of beam) {
      const used = new Set(state.seq);
      for (const u of units) {
        if (used.has(u)) continue;
        candidates2.push({ parent: state, u, r: tryUnit(g, kind, state.mask, trial, u, rfn), key: "" });
      }
    }
    if (candidates2.length === 0) break;
    for (const c of candidates2) c.key = [...c.parent.seq, c.u].sort((x, y) => x - y).join(",");
    candidates2.sort((x, y) => x.r - y.r || compareKeys(x.key, y.key) || compareSeq([...x.parent.seq, x.u], [...y.parent.seq, y.u]));
    const next = [];
    const seen = /* @__PURE__ */ new Set();
    for (const c of candidates2) {
      if (next.length >= width) break;
      if (seen.has(c.key)) continue;
      seen.add(c.key);
      const m = createMask(g);
      copyMask(c.parent.mask, m);
      removeUnit(g, m, kind, c.u);
      next.push({ seq: [...c.parent.seq, c.u], values: [...c.parent.values, c.r], mask: m });
    }
    beam = next;
  }
  const best = beam[0];
  return done(best.seq, best.values, width > 1 ? "beam" : "greedy");
}
function compareKeys(a, b) {
  return compareSeq(a.split(",").map(Number), b.split(",").map(Number));
}
function compareSeq(a, b) {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}

// src/envelope/contingency.ts
var WORST_KEPT = 10;
function contingencyTotal(g, kind, order) {
  let e = 0;
  const eligible = eligibleUnits(g, kind);
  for (let u = 0; u < eligible.length; u++) e += eligible[u];
  return subsets(e, order);
}
function evaluateContingency(g, kind, order, rfn, maxCases) {
  const eligible = eligibleUnits(g, kind);
  const units = [];
  for (let u = 0; u < eligible.length; u++) if (eligible[u]) units.push(u);
  const total = subsets(units.length, order);
  const mask = createMask(g);
  const bits = kind === "node" ? mask.node : mask.link;
  const worst = [];
  let evaluated = 0;
  let min = Infinity;
  const keep = (set, value) => {
    if (value < min) min = value;
    if (worst.length === WORST_KEPT && value >= worst[worst.length - 1].value) return;
    let i = worst.length;
    while (i > 0 && worst[i - 1].value > value) i--;
    worst.splice(i, 0, { set, value });
    if (worst.length > WORST_KEPT) worst.pop();
  };
  outer: for (let i = 0; i < units.length; i++) {
    bits[units[i]] = 1;
    if (order === 1) {
      if (evaluated >= maxCases) break;
      keep([units[i]], rfn(mask));
      evaluated++;
    } else {
      for (let j = i + 1; j < units.length; j++) {
        if (evaluated >= maxCases) {
          bits[units[i]] = 0;
          break outer;
        }
        bits[units[j]] = 1;
        keep([units[i], units[j]], rfn(mask));
        bits[units[j]] = 0;
        evaluated++;
      }
    }
    bits[units[i]] = 0;
  }
  const ids = unitIds(g, kind);
  return {
    challenge: order === 1 ? "n-1" : "n-2",
    kind,
    evaluated,
    total,
    worst: worst.map((w) => ({ elements: w.set.map((u) => ids[u]), value: w.value })),
    // Nothing removable: R stays at the intact value.
    min: evaluated > 0 ? min : rfn(createMask(g))
  };
}

// src/envelope/engine.ts
function chunkSize(realizations) {
  return Math.min(16, Math.max(1, Math.ceil(realizations / 32)));
}
function planTasks(plan, g) {
  const tasks = [];
  plan.items.forEach((it, item) => {
    if (it.type === "band") {
      const m = realizationCount(g, it);
      const chunk = chunkSize(m);
      for (let from = 0; from < m; from += chunk) tasks.push({ type: "band", item, from, to: Math.min(m, from + chunk) });
    } else if (it.type === "attack") tasks.push({ type: "attack", item });
    else tasks.push({ type: "contingency", item });
    if (it.params.worstCase > 0) tasks.push({ type: "worst", item });
  });
  return tasks;
}
function realizationCount(g, it) {
  return bandPlan(g, it.params).realizations;
}
var planCache = /* @__PURE__ */ new WeakMap();
function bandPlan(g, params) {
  let byParams = planCache.get(g);
  if (!byParams) planCache.set(g, byParams = /* @__PURE__ */ new Map());
  const key = JSON.stringify(params);
  const hit = byParams.get(key);
  if (hit) return hit;
  const c = getChallenge(params.challenge);
  if (c.type !== "band") throw new TypeError(`${params.challenge} is not a band challenge`);
  const plan = c.plan(g, params);
  if (byParams.size > 64) byParams.clear();
  byParams.set(key, plan);
  return plan;
}
function challengeKind(g, params) {
  const c = getChallenge(params.challenge);
  if (c.type === "band") return bandPlan(g, params).kind;
  if (c.type === "attack") return c.kind;
  return params.element;
}
function attackSteps(g, kind, until) {
  return stepsAt(until, unitCount(g, kind), countOnes(eligibleUnits(g, kind)));
}
var StepEvaluator = class {
  constructor(g, spec) {
    this.g = g;
    this.rfn = createRValue(g, spec, { warmStart: true });
    this.ufr = unionFindR(g, spec);
    this.ws = this.ufr ? createUnionFindWorkspace(g) : null;
    this.mask = createMask(g);
  }
  g;
  rfn;
  ufr;
  ws;
  mask;
  get r() {
    return this.rfn;
  }
  /** True when every step is free (union–find curve). */
  get stepsAreFree() {
    return this.ufr !== null;
  }
  /** R after steps[j] units of `order` are removed, for each j. */
  at(kind, order, len, steps, out) {
    if (this.ufr !== null) {
      const curve = connectivityCurve(this.g, kind, order, len, this.ws);
      for (let j = 0; j < steps.length; j++) out[j] = this.ufr(curve, steps[j]);
      return out;
    }
    const mask = this.mask;
    mask.node.fill(0);
    mask.link.fill(0);
    let applied = 0;
    for (let j = 0; j < steps.length; j++) {
      if (j > 0 && steps[j] === steps[j - 1]) {
        out[j] = out[j - 1];
        continue;
      }
      while (applied < steps[j]) removeUnit(this.g, mask, kind, order[applied++]);
      out[j] = this.rfn(mask);
    }
    return out;
  }
  /** R after every step k = 0..len. */
  everyStep(kind, order, len) {
    const steps = new Int32Array(len + 1);
    for (let k = 0; k <= len; k++) steps[k] = k;
    return this.at(kind, order, len, steps, new Float64Array(len + 1));
  }
};
function runTask(g, plan, task) {
  const it = plan.items[task.item];
  const params = it.params;
  const ev = new StepEvaluator(g, plan.r);
  switch (task.type) {
    case "band": {
      const bp = bandPlan(g, params);
      const order = new Int32Array(bp.maxUnits);
      const steps = new Int32Array(bp.x.length);
      const values = [];
      for (let r = task.from; r < task.to; r++) {
        const len = bp.realize(r, order, steps);
        values.push(ev.at(bp.kind, order, len, steps, new Float64Array(bp.x.length)));
      }
      return { type: "band", values };
    }
    case "attack": {
      const c = getChallenge(params.challenge);
      if (c.type !== "attack") throw new TypeError(`${params.challenge} is not an attack`);
      const sequence = c.sequence(g, attackSteps(g, c.kind, params.until), { rvalue: ev.r });
      return { type: "attack", sequence, values: ev.everyStep(c.kind, sequence, sequence.length) };
    }
    case "contingency": {
      const c = getChallenge(params.challenge);
      if (c.type !== "contingency") throw new TypeError(`${params.challenge} is not a contingency`);
      return { type: "contingency", result: evaluateContingency(g, params.element, c.order, ev.r, it.maxCases) };
    }
    case "worst": {
      const kind = challengeKind(g, params);
      const result = searchWorstCase(g, kind, params.worstCase, ev.r, { exactLimit: it.exactLimit, beam: it.beam });
      return { type: "worst", result };
    }
  }
}

// src/envelope/quantiles.ts
var DEFAULT_CONFIDENCE = 0.95;
function quantileSorted(sorted, p) {
  const n = sorted.length;
  if (n === 0) return Number.NaN;
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile must be in [0, 1], got ${p}`);
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const frac = h - lo;
  const a = sorted[lo];
  if (frac === 0 || lo + 1 >= n) return a;
  return a + frac * (sorted[lo + 1] - a);
}
var rankCache = /* @__PURE__ */ new Map();
function quantileRanks(n, p, confidence = DEFAULT_CONFIDENCE) {
  const cacheKey = `${n}:${p}:${confidence}`;
  const hit = rankCache.get(cacheKey);
  if (hit) return hit;
  const pmf = binomialPmf(n, p);
  const cover = (r2, s2) => {
    let sum = 0;
    for (let i = Math.max(r2, 0); i <= Math.min(s2 - 1, n); i++) sum += pmf[i];
    return Math.min(1, sum);
  };
  const z = normalQuantile(0.5 + confidence / 2);
  const sd = Math.sqrt(n * p * (1 - p));
  let r = Math.max(0, Math.min(n, Math.floor(n * p - z * sd)));
  let s = Math.max(1, Math.min(n + 1, Math.ceil(n * p + z * sd) + 1));
  let coverage = cover(r, s);
  while (coverage < confidence && (r > 0 || s < n + 1)) {
    const gainLow = r > 0 ? pmf[r - 1] : -1;
    const gainHigh = s <= n ? pmf[s] : -1;
    if (gainLow >= gainHigh) r--;
    else s++;
    coverage = cover(r, s);
  }
  const result = { r, s, coverage };
  if (rankCache.size > 4096) rankCache.clear();
  rankCache.set(cacheKey, result);
  return result;
}
function quantileEstimate(sorted, p, confidence = DEFAULT_CONFIDENCE, bounds = [0, 1]) {
  const n = sorted.length;
  if (n === 0) return { value: Number.NaN, lo: Number.NaN, hi: Number.NaN, se: Number.NaN };
  const { r, s } = quantileRanks(n, p, confidence);
  const lo = r === 0 ? Math.min(bounds[0], sorted[0]) : sorted[r - 1];
  const hi = s === n + 1 ? Math.max(bounds[1], sorted[n - 1]) : sorted[s - 1];
  const z = normalQuantile(0.5 + confidence / 2);
  return { value: quantileSorted(sorted, p), lo, hi, se: (hi - lo) / (2 * z) };
}
function binomialPmf(n, p) {
  const out = new Float64Array(n + 1);
  if (p <= 0) {
    out[0] = 1;
    return out;
  }
  if (p >= 1) {
    out[n] = 1;
    return out;
  }
  const lp = Math.log(p);
  const lq = Math.log1p(-p);
  const logFact = new Float64Array(n + 1);
  for (let i = 2; i <= n; i++) logFact[i] = logFact[i - 1] + Math.log(i);
  for (let i = 0; i <= n; i++) out[i] = Math.exp(logFact[n] - logFact[i] - logFact[n - i] + i * lp + (n - i) * lq);
  return out;
}
function normalQuantile(p) {
  if (!(p > 0 && p < 1)) throw new RangeError(`normal quantile needs p in (0, 1), got ${p}`);
  const a = [-39.69683028665376, 220.9460984245205, -275.9285104469687, 138.357751867269, -30.66479806614716, 2.506628277459239];
  const b = [-54.47609879822406, 161.5858368580409, -155.6989798598866, 66.80131188771972, -13.28068155288572];
  const c = [-0.007784894002430293, -0.3223964580411365, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
  const d = [0.007784695709041462, 0.3224671290700398, 2.445134137142996, 3.754408661907416];
  const plow = 0.02425;
  let x;
  if (p < plow) {
    const q = Math.sqrt(-2 * Math.log(p));
    x = (((((c[0] * q + c[1]) * q + c[2]) * q + c[3]) * q + c[4]) * q + c[5]) / ((((d[0] * q + d[1]) * q + d[2]) * q + d[3]) * q + 1);
  } else if (p <= 1 - plow) {
    const q = p - 0.5;
    const r = q * q;
    x = (((((a[0] * r + a[1]) * r + a[2]) * r + a[3]) * r + a[4]) * r + a[5]) * q / (((((b[0] * r + b[1]) * r + b[2]) * r + b[3]) * r + b[4]) * r + 1);
  } else {
    const q = Math.sqrt(-2 * Math.log1p(-p));
    x = -(((((c[0] * q + c[1]) * q + c[2]) * q + c[3]) * q + c[4]) * q + c[5]) / ((((d[0] * q + d[1]) * q + d[2]) * q + d[3]) * q + 1);
  }
  return x;
}

// src/envelope/summary.ts
function quantileKey(q) {
  return String(q);
}
function sortedColumn(samples, j, out = new Float64Array(samples.length)) {
  for (let i = 0; i < samples.length; i++) out[i] = samples[i][j];
  return out.sort();
}
function gridStats(samples, points, band) {
  const qs = [.../* @__PURE__ */ new Set([band[0], 0.5, band[1]])].sort((a, b) => a - b);
  const stats = { min: [], max: [], mean: [], median: [], quantiles: {} };
  for (const q of qs) stats.quantiles[quantileKey(q)] = { value: [], lo: [], hi: [], se: [] };
  const col = new Float64Array(samples.length);
  for (let j = 0; j < points; j++) {
    let sum = 0;
    for (let i = 0; i < samples.length; i++) sum += samples[i][j];
    sortedColumn(samples, j, col);
    stats.min.push(col[0]);
    stats.max.push(col[col.length - 1]);
    stats.mean.push(sum / samples.length);
    stats.median.push(quantileSorted(col, 0.5));
    for (const q of qs) {
      const e = quantileEstimate(col, q);
      const b = stats.quantiles[quantileKey(q)];
      b.value.push(e.value);
      b.lo.push(e.lo);
      b.hi.push(e.hi);
      b.se.push(e.se);
    }
  }
  return stats;
}
function gridMean(values) {
  if (values.length === 0) return Number.NaN;
  if (values.length === 1) return values[0];
  let sum = 0;
  for (let j = 1; j < values.length; j++) sum += values[j];
  return sum / (values.length - 1);
}
function area(median) {
  return gridMean(median);
}
function spread(lo, hi) {
  const w = new Float64Array(lo.length);
  for (let j = 0; j < lo.length; j++) w[j] = hi[j] - lo[j];
  return gridMean(w);
}
function attackGap(lo, attackAtGrid) {
  let sum = 0;
  let count = 0;
  for (let j = 1; j < lo.length; j++) {
    const a = attackAtGrid[j];
    if (a === null) continue;
    sum += lo[j] - a;
    count++;
  }
  return count > 0 ? sum / count : null;
}

// src/envelope/pairing.ts
var BOOTSTRAP_ROUNDS = 400;
function pairedStatistic(base, head, challenge, statistic, x) {
  const envB = base.evaluation.envelopes.find((e) => e.challenge === challenge);
  const envH = head.evaluation.envelopes.find((e) => e.challenge === challenge);
  if (envB && envH) return pairedBand(base, head, envB, envH, statistic, x);
  const atB = base.evaluation.attacks.find((a) => a.challenge === challenge);
  const atH = head.evaluation.attacks.find((a) => a.challenge === challenge);
  if (atB && atH) {
    const value = (a) => {
      if (statistic.kind === "area") return a.area;
      if (statistic.kind === "spread") return 0;
      if (x === void 0) throw new RangeError(`${challenge}: the ${statistic.kind} of an attack needs x`);
      const count = a.count ?? a.values.length - 1;
      const k = Math.round(x * count);
      if (k >= a.values.length) throw new RangeError(`${challenge}: the attack stops before x = ${x}`);
      return a.values[k];
    };
    return deterministic(value(atB), value(atH));
  }
  const cB = base.evaluation.contingencies.find((c) => c.challenge === challenge);
  const cH = head.evaluation.contingencies.find((c) => c.challenge === challenge);
  if (cB && cH) {
    if (statistic.kind !== "min") throw new RangeError(`${challenge}: only the min of a contingency can be compared`);
    return deterministic(cB.min, cH.min);
  }
  throw new RangeError(`challenge ${challenge} was not evaluated on both sides`);
}
function deterministic(base, head) {
  return { base, head, delta: head - base, se: 0 };
}
function gridIndex(env, x, what) {
  if (x === void 0) throw new RangeError(`${env.challenge}: the ${what} needs x`);
  const j = env.x.indexOf(round12(x));
  if (j < 0) throw new RangeError(`${env.challenge}: x = ${x} is not a grid point (grid: ${env.x.join(", ")}); add it to the challenge's "at"`);
  return j;
}
function pairedBand(base, head, envB, envH, statistic, x) {
  const sb = base.samples.get(envB.challenge);
  const sh = head.samples.get(envH.challenge);
  let jb = -1;
  let jh = -1;
  if (statistic.kind === "quantile" || statistic.kind === "mean" || statistic.kind === "min") {
    jb = gridIndex(envB, x, statistic.kind);
    jh = gridIndex(envH, x, statistic.kind);
  } else if (envB.x.join() !== envH.x.join()) {
    throw new RangeError(`${envB.challenge}: base and head grids differ; area and spread are not comparable`);
  }
  const band = envB.band;
  const stat = (s, j) => {
    switch (statistic.kind) {
      case "quantile":
        return quantileSorted(sortedColumn(s, j), statistic.q);
      case "mean": {
        let sum = 0;
        for (let i = 0; i < s.length; i++) sum += s[i][j];
        return sum / s.length;
      }
      case "min":
        return sortedColumn(s, j)[0];
      case "area":
      case "spread": {
        const points = s[0]?.length ?? 0;
        const curve = new Float64Array(points);
        for (let k = 0; k < points; k++) {
          const col = sortedColumn(s, k);
          curve[k] = statistic.kind === "area" ? quantileSorted(col, 0.5) : quantileSorted(col, band[1]) - quantileSorted(col, band[0]);
        }
        return gridMean(curve);
      }
    }
  };
  const b = stat(sb, jb);
  const h = stat(sh, jh);
  const pairs = [];
  const lb = base.labels.get(envB.challenge);
  const lh = head.labels.get(envH.challenge);
  if (lb && lh) {
    const where = new Map(lb.map((label, i) => [label, i]));
    lh.forEach((label, i) => {
      const k = where.get(label);
      if (k !== void 0) pairs.push([k, i]);
    });
  } else {
    for (let i = 0; i < Math.min(sb.length, sh.length); i++) pairs.push([i, i]);
  }
  const n = pairs.length;
  if (n < 2) return { base: b, head: h, delta: h - b, se: Number.NaN };
  if (statistic.kind === "mean") {
    const d = pairs.map(([i, k]) => sh[k][jh] - sb[i][jb]);
    const mean2 = d.reduce((s, v) => s + v, 0) / n;
    const variance = d.reduce((s, v) => s + (v - mean2) ** 2, 0) / (n - 1);
    return { base: b, head: h, delta: h - b, se: Math.sqrt(variance / n) };
  }
  const seedText = `${envB.challenge}|${JSON.stringify(statistic)}|${x ?? ""}`;
  const rng = new Xoshiro128(hashString(seedText, 721013), 0);
  const rb = new Array(n);
  const rh = new Array(n);
  let s1 = 0;
  let s2 = 0;
  for (let round = 0; round < BOOTSTRAP_ROUNDS; round++) {
    for (let i = 0; i < n; i++) {
      const [pb, ph] = pairs[rng.nextInt(n)];
      rb[i] = sb[pb];
      rh[i] = sh[ph];
    }
    const d = stat(rh, jh) - stat(rb, jb);
    s1 += d;
    s2 += d * d;
  }
  const mean = s1 / BOOTSTRAP_ROUNDS;
  const se = Math.sqrt(Math.max(0, s2 / BOOTSTRAP_ROUNDS - mean * mean) * (BOOTSTRAP_ROUNDS / (BOOTSTRAP_ROUNDS - 1)));
  return { base: b, head: h, delta: h - b, se };
}

// src/envelope/evaluate.ts
var DEFAULT_MAX_WORK = 1e10;
var MIN_REALIZATIONS = 10;
var EXACT_LIMIT = 1e6;
var WEAKEST_KEPT = 3;
var RANKING_PASSES = {
  degree: () => 1,
  "degree-adaptive": () => 2,
  betweenness: (n) => n,
  "betweenness-adaptive": (n, k) => n * Math.max(1, k),
  eigenvector: () => 200,
  closeness: (n) => n,
  "link-betweenness": (n) => n,
  "link-betweenness-adaptive": (n, k) => n * Math.max(1, k)
};
function planEvaluation(g, spec) {
  validateRSpec(spec.r);
  const degraded = [];
  const items = [];
  const seen = /* @__PURE__ */ new Set();
  for (const p of spec.challenges) {
    if (seen.has(p.challenge)) throw new RangeError(`challenge ${p.challenge} is listed twice`);
    seen.add(p.challenge);
    const params = resolveParams(g, p, spec.seed);
    const c = getChallenge(p.challenge);
    if (p.challenge === "regional" && sitesWithCoordinates(g).length === 0) {
      degraded.push("regional: skipped, no site has coordinates (lat/lon)");
      continue;
    }
    if ((p.challenge === "risk-groups" || p.challenge === "risk-groups-worst") && countOnes(eligibleUnits(g, "group")) === 0) {
      degraded.push(`${p.challenge}: skipped, the design has no shared-risk group that can fail`);
      continue;
    }
    if (c.type === "contingency") params.worstCase = 0;
    items.push({ params, type: c.type, maxCases: Infinity, exactLimit: EXACT_LIMIT, beam: params.beam });
  }
  const maxWork = spec.budget?.maxWork ?? DEFAULT_MAX_WORK;
  if (!(maxWork > 0)) throw new RangeError(`budget.maxWork must be > 0, got ${maxWork}`);
  const visits2 = g.n + g.m;
  const rp = rPasses(g, spec.r);
  const free = unionFindR(g, spec.r) !== null;
  const est = items.map((it) => estimate(g, it, rp, free));
  const total = () => est.reduce((s, e) => s + e.band + e.cases + e.fixed + e.worst, 0) * visits2;
  if (total() > maxWork) {
    items.forEach((it, i) => {
      if (est[i].worstExact && est[i].worst * visits2 > maxWork / 4) {
        it.exactLimit = 0;
        est[i] = estimate(g, it, rp, free);
        note(it, `worst-case search greedy instead of exact (work budget ${maxWork})`);
      }
    });
  }
  if (total() > maxWork) {
    const fixed = est.reduce((s, e) => s + e.fixed + e.worst, 0) * visits2;
    const reducible = est.reduce((s, e) => s + e.band + e.cases, 0) * visits2;
    const scale = Math.max(0, maxWork - fixed) / reducible;
    items.forEach((it, i) => {
      if (it.type === "band" && est[i].band > 0) {
        const m = est[i].realizations;
        const reduced = Math.max(Math.min(m, MIN_REALIZATIONS), Math.floor(m * scale));
        if (reduced < m) {
          if (it.params.challenge === "regional") it.params.epicentres = reduced;
          else it.params.realizations = reduced;
          note(it, `realizations reduced from ${m} to ${reduced} by the work budget (${maxWork} element visits)`);
        }
      } else if (it.type === "contingency") {
        const cases = est[i].totalCases;
        const reduced = Math.max(1, Math.floor(cases * scale));
        if (reduced < cases) {
          it.maxCases = reduced;
          note(it, `${reduced} of ${cases} cases evaluated within the work budget (${maxWork} element visits)`);
        }
      }
    });
  }
  for (const it of items) if (it.degraded) degraded.push(`${it.params.challenge}: ${it.degraded}`);
  const work = items.reduce((s, it) => {
    const e = estimate(g, it, rp, free);
    return s + e.band + e.cases + e.fixed + e.worst;
  }, 0);
  return { r: spec.r, items, degraded, work: work * visits2 };
}
function note(it, reason) {
  it.degraded = it.degraded ? `${it.degraded}; ${reason}` : reason;
}
function estimate(g, it, rp, free) {
  const p = it.params;
  const e = { band: 0, cases: 0, fixed: 0, worst: 0, worstExact: false, realizations: 0, totalCases: 0 };
  const kind = challengeKind(g, p);
  if (it.type === "band") {
    const m = p.challenge === "regional" ? p.epicentres ?? sitesWithCoordinates(g).length : p.realizations;
    const x = makeGrid(p.until, p.points, p.at);
    const count = unitCount(g, kind);
    const distinct = p.challenge === "regional" ? x.length : new Set(x.map((v) => Math.round(v * count))).size;
    e.realizations = m;
    e.band = m * (free ? 2 : distinct * rp + 1);
  } else if (it.type === "attack") {
    const k = attackSteps(g, kind, p.until);
    const groups = g.groupIds.length;
    const ranking = p.challenge === "risk-groups-worst" ? groups * (groups + 1) / 2 * rp : RANKING_PASSES[p.challenge](g.n, k);
    e.fixed = ranking + (free ? 1 : (k + 1) * rp);
  } else {
    const order = p.challenge === "n-2" ? 2 : 1;
    e.totalCases = contingencyTotal(g, p.element, order);
    e.cases = Math.min(e.totalCases, it.maxCases) * rp;
  }
  if (p.worstCase > 0) {
    const units = countOnes(eligibleUnits(g, kind));
    const k = Math.min(p.worstCase, units);
    const exactCases = subsets(units, k);
    e.worstExact = k <= 2 && exactCases <= it.exactLimit;
    e.worst = (e.worstExact ? exactCases + (k === 2 ? units : 0) : k * units * Math.max(1, it.beam)) * rp;
  }
  return e;
}
function evaluateDesign(g, spec) {
  const plan = planEvaluation(g, spec);
  const tasks = planTasks(plan, g);
  return assembleEvaluation(g, plan, tasks, tasks.map((t) => runTask(g, plan, t)));
}
function structureSummary(g) {
  const comps = findComponents(g);
  const cuts = findCutElements(g);
  return {
    nodes: g.n,
    links: g.m,
    components: comps.sizes.length,
    bridges: cuts.bridges.map((e) => ({ id: g.linkIds[e], kind: "link", line: g.linkLine[e] })),
    cutNodes: cuts.cutNodes.map((v) => ({ id: g.nodeIds[v], kind: "node", line: g.nodeLine[v] }))
  };
}
function assembleEvaluation(g, plan, tasks, results) {
  const samples = /* @__PURE__ */ new Map();
  const labels = /* @__PURE__ */ new Map();
  const evaluation = {
    r: plan.r,
    structure: structureSummary(g),
    envelopes: [],
    attacks: [],
    contingencies: [],
    degraded: [...plan.degraded]
  };
  const envelopeOf2 = /* @__PURE__ */ new Map();
  const attackOf2 = /* @__PURE__ */ new Map();
  const ev = new StepEvaluator(g, plan.r);
  plan.items.forEach((it, item) => {
    const p = it.params;
    const mine = tasks.map((t, i) => ({ t, res: results[i] })).filter(({ t }) => t.item === item);
    if (it.type === "band") {
      const values = mine.flatMap(({ res }) => res.type === "band" ? res.values : []);
      const bp = bandPlan(g, p);
      const env = buildEnvelope(g, it, bp, values, ev);
      samples.set(p.challenge, values);
      if (bp.label) labels.set(p.challenge, values.map((_, r) => bp.label(r)));
      envelopeOf2.set(item, env);
      evaluation.envelopes.push(env);
    } else if (it.type === "attack") {
      const res = mine.find(({ res: res2 }) => res2.type === "attack").res;
      const c = getChallenge(p.challenge);
      const kind = c.type === "attack" ? c.kind : "node";
      const count = unitCount(g, kind);
      const ids = unitIds(g, kind);
      const values = Array.from(res.values);
      const curve = {
        challenge: p.challenge,
        kind,
        x: values.map((_, k) => count > 0 ? k / count : 0),
        values,
        sequence: Array.from(res.sequence, (u) => ids[u]),
        count,
        area: gridMean(values)
      };
      attackOf2.set(item, curve);
      evaluation.attacks.push(curve);
    } else {
      const res = mine.find(({ res: res2 }) => res2.type === "contingency").res;
      evaluation.contingencies.push(res.result);
    }
    const worst = mine.find(({ res }) => res.type === "worst")?.res;
    if (worst) {
      const target = envelopeOf2.get(item) ?? attackOf2.get(item);
      if (target) target.worstCase = worst.result;
    }
  });
  for (const env of evaluation.envelopes) {
    if (env.xUnit !== "fraction") continue;
    const candidates2 = evaluation.attacks.filter((a) => a.kind === env.kind);
    if (candidates2.length === 0) continue;
    let worst = candidates2[0];
    for (const a of candidates2) if (a.area < worst.area) worst = a;
    const count = unitCount(g, env.kind);
    const eligible = countOnes(eligibleUnits(g, env.kind));
    const atGrid = env.x.map((x) => {
      const k = stepsAt(x, count, eligible);
      return k < worst.values.length ? worst.values[k] : null;
    });
    const lo = env.quantiles[quantileKey(env.band[0])].value;
    const gap = attackGap(lo, atGrid);
    if (gap !== null) env.attackGap = { value: gap, attack: worst.challenge };
  }
  return { evaluation, samples, labels };
}
function buildEnvelope(g, it, bp, values, ev) {
  const p = it.params;
  const stats = gridStats(values, bp.x.length, p.band);
  const lo = stats.quantiles[quantileKey(p.band[0])].value;
  const hi = stats.quantiles[quantileKey(p.band[1])].value;
  const env = {
    challenge: p.challenge,
    kind: bp.kind,
    xUnit: bp.xUnit,
    x: bp.x,
    realizations: values.length,
    seed: p.seed,
    band: p.band,
    min: stats.min,
    max: stats.max,
    mean: stats.mean,
    median: stats.median,
    quantiles: stats.quantiles,
    area: area(stats.median),
    spread: spread(lo, hi),
    weakest: weakestSequences(g, bp, values, ev)
  };
  if (it.degraded) env.degraded = it.degraded;
  return env;
}
function weakestSequences(g, bp, values, ev) {
  const score = values.map((v) => gridMean(v));
  const picks = values.map((_, r) => r).sort((a, b) => score[a] - score[b] || a - b).slice(0, WEAKEST_KEPT);
  const ids = unitIds(g, bp.kind);
  const order = new Int32Array(bp.maxUnits);
  const steps = new Int32Array(bp.x.length);
  return picks.map((r) => {
    const len = bp.realize(r, order, steps);
    const seq = { kind: bp.kind, elements: Array.from(order.subarray(0, len), (u) => ids[u]), values: [], realization: r };
    if (bp.label) seq.label = bp.label(r);
    if (ev.stepsAreFree) {
      seq.values = Array.from(ev.everyStep(bp.kind, order, len).subarray(1));
    } else {
      const at = [];
      const vals = [];
      for (let j = 0; j < steps.length; j++) {
        if (steps[j] === 0 || at.length > 0 && at[at.length - 1] === steps[j]) continue;
        at.push(steps[j]);
        vals.push(values[r][j]);
      }
      seq.values = vals;
      seq.steps = at;
    }
    return seq;
  });
}

// src/graph/compact.ts
function compileTopology(t) {
  const n = t.nodes.length;
  const m = t.links.length;
  const nodeIndex = /* @__PURE__ */ new Map();
  t.nodes.forEach((node, i) => nodeIndex.set(node.id, i));
  const linkIndex = /* @__PURE__ */ new Map();
  const linkSource = new Int32Array(m);
  const linkTarget = new Int32Array(m);
  const degree2 = new Int32Array(n);
  const linkLine = new Int32Array(m);
  const linkHardened = new Uint8Array(m);
  let hasLength = false;
  let hasLatency = false;
  let hasWeight = false;
  for (let e = 0; e < m; e++) {
    const link = t.links[e];
    const s = nodeIndex.get(link.source);
    const d = nodeIndex.get(link.target);
    if (s === void 0 || d === void 0) {
      throw new Error(`link ${link.id} refers to a node that is not in the design`);
    }
    linkSource[e] = s;
    linkTarget[e] = d;
    degree2[s]++;
    degree2[d]++;
    linkLine[e] = link.pos.line;
    linkHardened[e] = link.hardened ? 1 : 0;
    if (!linkIndex.has(link.id)) linkIndex.set(link.id, e);
    hasLength ||= link.length !== void 0;
    hasLatency ||= link.latency !== void 0;
    hasWeight ||= link.weight !== void 0;
  }
  const offsets = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) offsets[v + 1] = offsets[v] + degree2[v];
  const neighbors = new Int32Array(2 * m);
  const linkOf = new Int32Array(2 * m);
  const fill = offsets.slice(0, n);
  for (let e = 0; e < m; e++) {
    const s = linkSource[e];
    const d = linkTarget[e];
    neighbors[fill[s]] = d;
    linkOf[fill[s]++] = e;
    neighbors[fill[d]] = s;
    linkOf[fill[d]++] = e;
  }
  const column = (pick, present, count) => {
    if (!present) return null;
    const a = new Float64Array(count);
    for (let i = 0; i < count; i++) a[i] = pick(i) ?? Number.NaN;
    return a;
  };
  const hasCoords = t.nodes.some((v) => v.lat !== void 0 && v.lon !== void 0);
  const nodeHardened = new Uint8Array(n);
  const nodeLine = new Int32Array(n);
  t.nodes.forEach((v, i) => {
    nodeHardened[i] = v.hardened ? 1 : 0;
    nodeLine[i] = v.pos.line;
  });
  const groupIds = [];
  const groupLineList = [];
  const groupPos = /* @__PURE__ */ new Map();
  for (const g of t.riskGroups) {
    if (groupPos.has(g.id)) continue;
    groupPos.set(g.id, groupIds.length);
    groupIds.push(g.id);
    groupLineList.push(g.pos.line);
  }
  const members = groupIds.map(() => []);
  t.links.forEach((link, e) => {
    for (const gid of link.riskGroups) {
      let g = groupPos.get(gid);
      if (g === void 0) {
        g = groupIds.length;
        groupPos.set(gid, g);
        groupIds.push(gid);
        groupLineList.push(link.pos.line);
        members.push([]);
      }
      if (members[g][members[g].length - 1] !== e) members[g].push(e);
    }
  });
  const groupOffsets = new Int32Array(groupIds.length + 1);
  members.forEach((list, g) => groupOffsets[g + 1] = groupOffsets[g] + list.length);
  const groupLinks = new Int32Array(groupOffsets[groupIds.length]);
  members.forEach((list, g) => groupLinks.set(list, groupOffsets[g]));
  const k = t.demands.length;
  const demandSource = new Int32Array(k);
  const demandTarget = new Int32Array(k);
  const demandVolume = new Float64Array(k);
  t.demands.forEach((d, i) => {
    demandSource[i] = nodeIndex.get(d.source) ?? -1;
    demandTarget[i] = nodeIndex.get(d.target) ?? -1;
    demandVolume[i] = d.volume;
  });
  return {
    n,
    m,
    offsets,
    neighbors,
    linkOf,
    linkSource,
    linkTarget,
    length: column((e) => t.links[e].length, hasLength, m),
    latency: column((e) => t.links[e].latency, hasLatency, m),
    weight: column((e) => t.links[e].weight, hasWeight, m),
    nodeHardened,
    linkHardened,
    lat: column((i) => t.nodes[i].lat, hasCoords, n),
    lon: column((i) => t.nodes[i].lon, hasCoords, n),
    nodeIds: t.nodes.map((v) => v.id),
    linkIds: t.links.map((l) => l.id),
    linkKeys: t.links.map((l) => l.key),
    nodeIndex,
    linkIndex,
    nodeLine,
    linkLine,
    groupIds,
    groupLine: Int32Array.from(groupLineList),
    groupOffsets,
    groupLinks,
    demandSource,
    demandTarget,
    demandVolume,
    latencyBudget: t.latencyBudget
  };
}

// src/gate/budget.ts
var PAIRING_ROUNDS = 8;
function withBudget(spec, maxWork) {
  return { ...spec, challenges: spec.challenges.map((c) => ({ ...c })), budget: { maxWork } };
}
function shareBudget(specs, maxWork, graphs) {
  const need = specs.map((spec) => Math.max(...graphs.map((g) => planEvaluation(g, { ...spec, budget: { maxWork: Infinity } }).work)));
  const total = need.reduce((a, b) => a + b, 0);
  if (total <= maxWork) return specs.map(() => maxWork);
  return need.map((w) => Math.max(1, Math.floor(maxWork * w / total)));
}
function bandCounts(g, spec) {
  const out = /* @__PURE__ */ new Map();
  for (const it of planEvaluation(g, spec).items) {
    if (it.type === "band" && it.params.challenge !== "regional") out.set(it.params.challenge, it.params.realizations);
  }
  return out;
}
function budgetSpecs(specs, maxWork, head, base) {
  const shares = shareBudget(specs, maxWork, base ? [head, base] : [head]);
  const headSpecs = specs.map((s, i) => withBudget(s, shares[i]));
  if (!base) return { head: headSpecs, cuts: [] };
  const baseSpecs = specs.map((s, i) => withBudget(s, shares[i]));
  const cuts = [];
  specs.forEach((spec, i) => {
    const asked = bandCounts(head, { ...spec, budget: { maxWork: Infinity } });
    const lowered = /* @__PURE__ */ new Set();
    for (let round = 0; round < PAIRING_ROUNDS; round++) {
      const h = bandCounts(head, headSpecs[i]);
      const b = bandCounts(base, baseSpecs[i]);
      let changed = false;
      for (const [challenge, count] of h) {
        const other = b.get(challenge);
        if (other === void 0 || other === count) continue;
        const common = Math.min(count, other);
        for (const s of [headSpecs[i], baseSpecs[i]]) {
          const c = s.challenges.find((x) => x.challenge === challenge);
          c.realizations = common;
        }
        lowered.add(challenge);
        changed = true;
      }
      if (!changed) break;
    }
    const final = bandCounts(head, headSpecs[i]);
    for (const challenge of lowered) {
      const from = asked.get(challenge);
      const to = final.get(challenge);
      if (to < from) cuts.push({ spec: i, challenge, from, to, maxWork: shares[i] });
    }
  });
  return { head: headSpecs, base: baseSpecs, cuts };
}
function notePairedCuts(result, cuts, spec) {
  for (const cut of cuts) {
    if (cut.spec !== spec) continue;
    const env = result.evaluation.envelopes.find((e) => e.challenge === cut.challenge);
    if (!env || env.realizations >= cut.from) continue;
    const reason = `realizations reduced from ${cut.from} to ${env.realizations} by the work budget (${cut.maxWork} element visits), on base and head alike so that they stay paired`;
    const others = (env.degraded ?? "").split("; ").filter((part) => part !== "" && !part.startsWith("realizations reduced from"));
    env.degraded = [reason, ...others].join("; ");
    const prefix = `${cut.challenge}: `;
    const line = `${prefix}${env.degraded}`;
    const list = result.evaluation.degraded;
    const at = list.findIndex((d) => d.startsWith(prefix));
    if (at >= 0) list[at] = line;
    else list.push(line);
  }
}

// src/gate/describe.ts
var WHAT = { nodes: "nodes", links: "links", "risk-groups": "risk groups", region: "region" };
function formatR(x) {
  const s = x.toFixed(3);
  if (/^-0\.0+$/.test(s)) return s.slice(1);
  return s.replace(/^-/, "−");
}
function formatDelta(delta, se) {
  const sign2 = delta > 0 && formatR(delta) !== "0.000" ? "+" : "";
  return `${sign2}${formatR(delta)}${se !== null && se > 0 ? ` ± ${se.toFixed(3)}` : ""}`;
}
function percent(x) {
  return `${Number((x * 100).toFixed(6))} %`;
}
function xWords(c, x) {
  if (!c) return String(x);
  if (c.remove === "region") return `radius ${x} km`;
  return `${percent(x)} of ${WHAT[c.remove]} removed`;
}
function challengeWords(c, name) {
  if (!c) return `"${name}"`;
  const how = c.random ? "random" : `${c.adaptive ? "adaptive " : ""}${c.order}`;
  return `"${name}" (${how} ${WHAT[c.remove]})`;
}
function describeRequirement(r, challenges2) {
  const c = "challenge" in r ? challenges2.find((x) => x.name === r.challenge) : void 0;
  switch (r.kind) {
    case "r-threshold": {
      const on = challengeWords(c, r.challenge);
      const s = r.statistic;
      if (s.kind === "worst-case") return `R after the worst ${s.removals} removals found, ${on} ≥ ${r.min}`;
      const stat = s.kind === "quantile" ? `${percent(s.q)} quantile of R` : s.kind === "value" ? "R" : `${s.kind} of R`;
      return `${stat} at ${xWords(c, r.at ?? 0)}, ${on} ≥ ${r.min}`;
    }
    case "area-floor":
      return `area of ${challengeWords(c, r.challenge)}${r.min === void 0 ? " (tracked)" : ` ≥ ${r.min}`}`;
    case "spread-ceiling":
      return `spread of ${challengeWords(c, r.challenge)} ≤ ${r.max}`;
    case "n-1":
      return `R after any single ${r.element} removal ≥ ${r.min}`;
    case "no-new-spof": {
      const what = [r.bridges ? "bridges" : "", r.cutNodes ? "cut nodes" : ""].filter(Boolean).join(" or ");
      return `no new ${what}`;
    }
  }
}

// src/gate/measure.ts
var MAX_ELEMENTS = 10;
function locate(el, head, base) {
  for (const g of [head, base]) {
    if (!g) continue;
    if (el.kind === "node") {
      const i = g.nodeIndex.get(el.id);
      if (i !== void 0) return { id: el.id, kind: "node", line: g.nodeLine[i] };
    } else if (el.kind === "link") {
      const i = g.linkIndex.get(el.id);
      if (i !== void 0) return { id: el.id, kind: "link", line: g.linkLine[i] };
    } else {
      const i = g.groupIds.indexOf(el.id);
      if (i >= 0) return { id: el.id, kind: "group", line: g.groupLine[i] };
    }
  }
  return { id: el.id, kind: el.kind, line: 0 };
}
function envelopeOf(side, c) {
  return side.result.evaluation.envelopes.find((e) => e.challenge === c.engine);
}
function attackOf(side, c) {
  return side.result.evaluation.attacks.find((a) => a.challenge === c.engine);
}
function contingencyOf(side, element) {
  return side.result.evaluation.contingencies.find((x) => x.challenge === "n-1" && x.kind === element);
}
function removalsAt(g, kind, x) {
  return stepsAt(x, unitCount(g, kind), countOnes(eligibleUnits(g, kind)));
}
function sequenceElements(seq, count = MAX_ELEMENTS) {
  if (!seq) return [];
  return seq.elements.slice(0, Math.min(count, MAX_ELEMENTS)).map((id) => ({ id, kind: seq.kind }));
}
function gridIndex2(env, x) {
  return env.x.findIndex((v) => Math.abs(v - x) <= 1e-9 * Math.max(1, Math.abs(x)));
}
function statisticOf(req) {
  if (req.kind === "area-floor") return { kind: "area" };
  if (req.kind === "spread-ceiling") return { kind: "spread" };
  if (req.kind !== "r-threshold") return void 0;
  switch (req.statistic.kind) {
    case "quantile":
      return { kind: "quantile", q: req.statistic.q };
    case "median":
      return { kind: "quantile", q: 0.5 };
    case "mean":
      return { kind: "mean" };
    case "min":
      return { kind: "min" };
    default:
      return void 0;
  }
}
function realizationsOf(env, c, g) {
  const asked = c.engine === "regional" ? sitesWithCoordinates(g).length : c.params.realizations ?? DEFAULTS.realizations;
  return { ran: env.realizations, asked };
}
function reductionOf(c, head, env, base, baseEnv) {
  const h = realizationsOf(env, c, head.graph);
  const b = base && baseEnv ? realizationsOf(baseEnv, c, base.graph) : void 0;
  const headCut = h.ran < h.asked;
  const baseCut = b !== void 0 && b.ran < b.asked;
  if (!headCut && !baseCut) return {};
  const out = {};
  if (b === void 0) out.reduced = `the work budget left ${h.ran} of the ${h.asked} realizations`;
  else if (h.ran === b.ran && h.asked === b.asked) out.reduced = `the work budget left ${h.ran} of the ${h.asked} realizations on head and base`;
  else out.reduced = `the work budget left ${h.ran} of the ${h.asked} realizations on the head and ${b.ran} of ${b.asked} on the base`;
  if (b !== void 0 && base.result !== head.result) {
    const lh = head.result.labels.get(c.engine);
    const lb = base.result.labels.get(c.engine);
    const sameLabels = lh === void 0 || lb === void 0 || lh.length === lb.length && lh.every((l, i) => l === lb[i]);
    if (h.ran !== b.ran) out.unpaired = `the budget cut base and head to different numbers of realizations (${b.ran} and ${h.ran}), so they do not pair`;
    else if (!sameLabels) out.unpaired = "the budget cut base and head to different epicentres, so they do not pair";
  }
  return out;
}
function ownSe(head, env, stat, x) {
  const samples = head.samples.get(env.challenge) ?? [];
  const zero = {
    evaluation: { ...head.evaluation, envelopes: [env], attacks: [], contingencies: [] },
    samples: /* @__PURE__ */ new Map([[env.challenge, samples.map((s) => new Float64Array(s.length))]]),
    labels: head.labels
  };
  return pairedStatistic(zero, head, env.challenge, stat, x).se;
}
function missing(reason, higherIsBetter = true) {
  return { base: null, head: null, delta: null, se: null, higherIsBetter, elements: [], missing: reason };
}
function deterministic2(req, c, side) {
  if (req.kind === "n-1") {
    const cont = contingencyOf(side, req.element);
    if (!cont) return `the N−1 evaluation of ${req.element}s did not run`;
    if (cont.evaluated === 0) return `the design has no ${req.element} that can fail`;
    const worst = cont.worst[0];
    const out = { value: cont.min, elements: worst ? worst.elements.map((id) => ({ id, kind: cont.kind })) : [] };
    if (cont.evaluated < cont.total) out.incomplete = `only ${cont.evaluated} of ${cont.total} single ${req.element} losses were evaluated (work budget)`;
    return out;
  }
  if (!c) return "no challenge";
  if (req.kind === "r-threshold" && req.statistic.kind === "worst-case") {
    const env = envelopeOf(side, c);
    const wc = env?.worstCase;
    if (!wc) return `challenge "${c.name}" has no worst-case result`;
    const k2 = req.statistic.removals;
    const i = wc.steps ? wc.steps.indexOf(k2) : k2 - 1;
    if (i < 0 || i >= wc.values.length) return `the worst-case search of "${c.name}" stopped before ${k2} removals`;
    const out = { value: wc.values[i], elements: sequenceElements(wc, k2) };
    if (k2 <= 2 && wc.method !== "exact") out.incomplete = `the worst case was searched greedily, not exhaustively (work budget), so the true worst case may be lower`;
    return out;
  }
  const curve = attackOf(side, c);
  if (!curve) return `challenge "${c.name}" did not run on this design`;
  if (req.kind === "area-floor") return { value: curve.area, elements: sequenceElements({ kind: curve.kind, elements: curve.sequence, values: [] }) };
  const t = req;
  const k = removalsAt(side.graph, curve.kind, t.at ?? 0);
  if (k >= curve.values.length) return `the attack "${c.name}" ends before ${t.at}`;
  return { value: curve.values[k], elements: sequenceElements({ kind: curve.kind, elements: curve.sequence, values: [] }, k) };
}
function measure(req, challenges2, head, base) {
  const c = "challenge" in req ? challenges2.find((x) => x.name === req.challenge) : void 0;
  const higherIsBetter = req.kind !== "spread-ceiling";
  const stat = c?.random ? statisticOf(req) : void 0;
  if (c?.random && stat) {
    const env = envelopeOf(head, c);
    if (!env) return missing(`challenge "${c.name}" did not run on this design`, higherIsBetter);
    const x = req.kind === "r-threshold" ? req.at : void 0;
    const j = x === void 0 ? -1 : gridIndex2(env, x);
    if (x !== void 0 && j < 0) return missing(`${x} is not on the grid of "${c.name}"`, higherIsBetter);
    const baseEnv = base ? envelopeOf(base, c) : void 0;
    const same2 = base !== void 0 && base.result === head.result;
    const p = pairedStatistic(baseEnv ? base.result : head.result, head.result, c.engine, stat, x);
    const out = {
      base: baseEnv ? p.base : null,
      head: p.head,
      delta: baseEnv ? same2 ? 0 : p.delta : null,
      se: baseEnv ? same2 ? 0 : p.se : null,
      higherIsBetter,
      elements: sequenceElements(env.weakest[0], x === void 0 ? MAX_ELEMENTS : removalsAt(head.graph, env.kind, x))
    };
    if (stat.kind === "quantile" && j >= 0) {
      const band = env.quantiles[quantileKey(stat.q)];
      const ci = band ? { lo: band.lo[j], hi: band.hi[j] } : quantileEstimate(sortedColumn(head.result.samples.get(c.engine) ?? [], j), stat.q);
      out.lo = ci.lo;
      out.hi = ci.hi;
    }
    const reduction = reductionOf(c, head, env, baseEnv ? base : void 0, baseEnv);
    if (reduction.reduced !== void 0) {
      out.reduced = reduction.reduced;
      const h2 = realizationsOf(env, c, head.graph);
      if (h2.ran < h2.asked) out.headSe = ownSe(head.result, env, stat, x);
    }
    if (reduction.unpaired !== void 0) out.unpaired = reduction.unpaired;
    return out;
  }
  const h = deterministic2(req, c, head);
  if (typeof h === "string") return missing(h, higherIsBetter);
  const b = base ? deterministic2(req, c, base) : void 0;
  const bv = b !== void 0 && typeof b !== "string" ? b.value : null;
  const same = base !== void 0 && base.result === head.result;
  return {
    base: bv,
    head: h.value,
    delta: bv === null ? null : same ? 0 : h.value - bv,
    se: bv === null ? null : 0,
    higherIsBetter,
    elements: h.elements,
    ...h.incomplete !== void 0 ? { incomplete: h.incomplete } : {}
  };
}

// src/gate/compare.ts
function formatSe(se) {
  return Number.isFinite(se) ? se.toFixed(3) : "unknown";
}
var SAME = 1e-12;
var REDUCED_MARGIN_SE = 2;
function uncertainSeverity(severity) {
  return severity === "notice" ? "notice" : "warn";
}
var THRESHOLD_RULE = {
  "r-threshold": "r-threshold",
  "area-floor": "area-floor",
  "spread-ceiling": "spread-ceiling",
  "n-1": "n-1"
};
function elementsOf(list, head, base) {
  return list.map((e) => locate(e, head?.graph, base?.graph));
}
function finding(rule, severity, message, elements, extra = {}) {
  const line = extra.line ?? elements.find((e) => e.line > 0)?.line ?? 0;
  return { rule, severity, message, ...extra, elements, line };
}
function numbers(m) {
  return { base: m.base, head: m.head, delta: m.delta, se: m.se };
}
function floorOf(r) {
  if (r.kind === "spread-ceiling") return r.max;
  if (r.kind === "no-new-spof") return null;
  return r.min ?? null;
}
function judge(r, input, description) {
  const head = input.head;
  const comparing = !input.thresholdsOnly && input.base !== void 0;
  const m = measure(r, input.policy.challenges, head, comparing ? input.base : void 0);
  const threshold = floorOf(r);
  const row = {
    id: r.id,
    description,
    severity: r.severity,
    base: m.base,
    head: m.head,
    delta: m.delta,
    se: m.se,
    threshold,
    status: "met"
  };
  const findings = [];
  const elements = elementsOf(m.elements, head, input.base);
  const extra = { requirement: r.id, ...numbers(m) };
  if (m.missing !== void 0 || m.head === null) {
    row.status = "uncertain";
    findings.push(finding(THRESHOLD_RULE[r.kind], "warn", `${description}: could not be judged: ${m.missing}`, [], extra));
    return { row, findings };
  }
  const better = (a, b) => m.higherIsBetter ? a >= b : a <= b;
  const thresholdRule = THRESHOLD_RULE[r.kind];
  const margin = threshold === null ? 0 : m.higherIsBetter ? m.head - threshold : threshold - m.head;
  if (threshold !== null && !better(m.head, threshold)) {
    row.status = "missed";
    const relation = m.higherIsBetter ? "is below" : "is above";
    findings.push(
      finding(THRESHOLD_RULE[r.kind], r.severity, `${description}: ${formatR(m.head)} ${relation} ${threshold}`, elements, extra)
    );
  } else if (threshold !== null && m.incomplete !== void 0) {
    row.status = "uncertain";
    findings.push(
      finding(THRESHOLD_RULE[r.kind], "warn", `${description}: ${formatR(m.head)} meets it, but ${m.incomplete}`, elements, extra)
    );
  } else if (threshold !== null && m.lo !== void 0 && m.hi !== void 0 && !better(m.higherIsBetter ? m.lo : m.hi, threshold)) {
    row.status = "uncertain";
    const edge = m.higherIsBetter ? m.lo : m.hi;
    const cut = m.reduced !== void 0 ? `; ${m.reduced}` : "";
    findings.push(
      finding(
        thresholdRule,
        m.reduced !== void 0 ? uncertainSeverity(r.severity) : "notice",
        `${description}: ${formatR(m.head)} meets it, but its confidence interval reaches ${formatR(edge)}; more realizations would settle it${cut}`,
        elements,
        extra
      )
    );
  } else if (threshold !== null && m.headSe !== void 0 && r.kind === "r-threshold" && r.statistic.kind === "min") {
    row.status = "uncertain";
    findings.push(
      finding(
        thresholdRule,
        uncertainSeverity(r.severity),
        `${description}: ${formatR(m.head)} meets it, but ${m.reduced}, and the minimum of fewer realizations can only be higher than that of all of them`,
        elements,
        extra
      )
    );
  } else if (threshold !== null && m.headSe !== void 0 && !(margin > REDUCED_MARGIN_SE * m.headSe)) {
    row.status = "uncertain";
    findings.push(
      finding(
        thresholdRule,
        uncertainSeverity(r.severity),
        `${description}: ${formatR(m.head)} meets it, but ${m.reduced}, and it clears the ${m.higherIsBetter ? "floor" : "ceiling"} by ${formatR(margin)}, not by more than ${REDUCED_MARGIN_SE} standard errors (${REDUCED_MARGIN_SE} × ${formatSe(m.headSe)})`,
        elements,
        extra
      )
    );
  }
  if (m.base !== null && m.delta !== null && m.se !== null && m.unpaired !== void 0) {
    if (row.status === "met") row.status = "uncertain";
    const weakening = input.policy.weakening;
    findings.push(
      finding(
        "regression",
        uncertainSeverity(weakening.severity),
        `${description}: from ${formatR(m.base)} to ${formatR(m.head)}, but ${m.unpaired}; the change cannot be judged`,
        elements,
        extra
      )
    );
  } else if (m.base !== null && m.delta !== null && m.se !== null) {
    const drop = m.higherIsBetter ? -m.delta : m.delta;
    if (drop > SAME * Math.max(1, Math.abs(m.base))) {
      const rule = input.policy.weakening;
      const allowance = Math.max(rule.allowedDrop ?? 0, (rule.allowedRelativeDrop ?? 0) * Math.abs(m.base));
      const change = `from ${formatR(m.base)} to ${formatR(m.head)} (Δ ${formatDelta(m.delta, m.se)})`;
      const noise2 = rule.errorMultiple * m.se;
      const verb = m.higherIsBetter ? "dropped" : "rose";
      if (m.reduced !== void 0 && !(drop > allowance + noise2) && !(drop <= allowance - noise2)) {
        if (row.status === "met") row.status = "uncertain";
        findings.push(
          finding(
            "regression",
            uncertainSeverity(rule.severity),
            `${description}: ${verb} ${change}, within ${rule.errorMultiple} × its error of the allowed ${formatR(allowance)}, so it cannot be told whether it is beyond it: ${m.reduced}`,
            elements,
            extra
          )
        );
      } else if (m.reduced !== void 0 && drop <= allowance - noise2) {
        findings.push(
          finding("regression", "notice", `${description}: ${verb} ${change}, within the allowed ${formatR(allowance)} by more than ${rule.errorMultiple} × its error; ${m.reduced}`, elements, extra)
        );
      } else if (m.reduced !== void 0) {
        if (row.status !== "missed") row.status = "regressed";
        findings.push(
          finding(
            "regression",
            rule.severity,
            `${description}: ${verb} ${change}, more than the allowed ${formatR(allowance)} by more than ${rule.errorMultiple} × its error; ${m.reduced}`,
            elements,
            extra
          )
        );
      } else if (drop < noise2) {
        if (row.status === "met") row.status = "within-noise";
        findings.push(
          finding(
            "regression",
            "notice",
            `${description}: ${m.higherIsBetter ? "dropped" : "rose"} ${change}, less than ${rule.errorMultiple} × its Monte Carlo error: within noise, not a failure`,
            elements,
            extra
          )
        );
      } else if (drop <= allowance) {
        findings.push(
          finding("regression", "notice", `${description}: ${m.higherIsBetter ? "dropped" : "rose"} ${change}, within the allowed ${formatR(allowance)}`, elements, extra)
        );
      } else {
        if (row.status !== "missed") row.status = "regressed";
        findings.push(
          finding(
            "regression",
            rule.severity,
            `${description}: ${m.higherIsBetter ? "dropped" : "rose"} ${change}, more than the allowed ${formatR(allowance)}`,
            elements,
            extra
          )
        );
      }
    }
  }
  const reducedWork = m.reduced ?? m.incomplete;
  if (reducedWork !== void 0 && !findings.some((f) => f.message.includes(reducedWork))) {
    findings.push(finding(thresholdRule, "notice", `${description}: judged on reduced work, ${reducedWork}`, [], { requirement: r.id, line: 0 }));
  }
  return { row, findings };
}
function spofs(side) {
  const g = side.graph;
  const cuts = findCutElements(g);
  const bridges2 = /* @__PURE__ */ new Map();
  for (const e of cuts.bridges) if (!g.linkHardened[e]) bridges2.set(g.linkKeys[e], e);
  const cutNodes2 = /* @__PURE__ */ new Map();
  for (const v of cuts.cutNodes) if (!g.nodeHardened[v]) cutNodes2.set(g.nodeIds[v], v);
  return { bridges: bridges2, cutNodes: cutNodes2 };
}
function judgeSpof(r, input, description) {
  const g = input.head.graph;
  const head = spofs(input.head);
  const comparing = !input.thresholdsOnly && input.base !== void 0;
  const base = comparing ? spofs(input.base) : void 0;
  const count = (s) => (r.bridges ? s.bridges.size : 0) + (r.cutNodes ? s.cutNodes.size : 0);
  const row = {
    id: r.id,
    description,
    severity: r.severity,
    base: base ? count(base) : null,
    head: count(head),
    delta: base ? count(head) - count(base) : null,
    se: base ? 0 : null,
    threshold: null,
    status: "met"
  };
  const findings = [];
  if (!base) return { row, findings };
  if (r.bridges) {
    for (const [key, e] of head.bridges) {
      if (base.bridges.has(key)) continue;
      const el = { id: g.linkIds[e], kind: "link", line: g.linkLine[e] };
      const ends = `${g.nodeIds[g.linkSource[e]]}–${g.nodeIds[g.linkTarget[e]]}`;
      findings.push(
        finding("new-bridge", r.severity, `link ${el.id} (${ends}) is a new bridge: losing it splits the design, which the base did not`, [el], {
          requirement: r.id
        })
      );
    }
  }
  if (r.cutNodes) {
    for (const [id, v] of head.cutNodes) {
      if (base.cutNodes.has(id)) continue;
      const el = { id, kind: "node", line: g.nodeLine[v] };
      findings.push(
        finding("new-cut-node", r.severity, `node ${id} is a new cut node: losing it splits the design, which the base did not`, [el], {
          requirement: r.id
        })
      );
    }
  }
  if (findings.length > 0) row.status = "regressed";
  return { row, findings };
}
function elementChanges(base, head) {
  const diff = (from, to) => {
    const a = from.graph;
    const b = to.graph;
    const out = [];
    a.nodeIds.forEach((id, v) => {
      if (!b.nodeIndex.has(id)) out.push({ id, kind: "node", line: a.nodeLine[v] });
    });
    const keys = new Set(b.linkKeys);
    a.linkKeys.forEach((key, e) => {
      if (!keys.has(key)) out.push({ id: a.linkIds[e], kind: "link", line: a.linkLine[e] });
    });
    return out;
  };
  return { added: diff(head, base), removed: diff(base, head) };
}
function fileStatus(change, findings) {
  const failing = findings.filter((f) => f.severity === "fail");
  if (failing.some((f) => f.rule === "parse-error")) return "error";
  const thresholdRules = new Set(Object.values(THRESHOLD_RULE));
  if (failing.some((f) => thresholdRules.has(f.rule))) return "below-threshold";
  if (failing.some((f) => f.rule === "regression" || f.rule === "new-bridge" || f.rule === "new-cut-node")) return "regressed";
  if (change === "added") return "new";
  if (change === "renamed") return "renamed";
  return "pass";
}
function compareDesign(input) {
  const report = { path: input.path, status: "pass", findings: [], requirements: [] };
  if (input.previousPath !== void 0) report.previousPath = input.previousPath;
  if (input.format !== void 0) report.format = input.format;
  if (input.change === "deleted") {
    report.status = "removed";
    const severity = input.policy.removedDesigns;
    if (severity !== "ignore") {
      report.findings.push(finding("removed-design", severity, "the design file was deleted by this change", [], { line: 0 }));
    }
    return report;
  }
  if (input.headError || !input.head) {
    const e = input.headError ?? { message: "the design could not be read", line: 0, column: 0 };
    report.status = "error";
    report.error = { message: e.message, line: e.line, column: e.column };
    report.findings.push(finding("parse-error", "fail", e.message, [], { line: e.line, column: e.column }));
    return report;
  }
  const effective = input.baseError ? { ...input, base: void 0, thresholdsOnly: true } : input;
  if (input.baseError) {
    report.findings.push(
      finding("parse-error", "notice", `the base version could not be read (${input.baseError.message}); judged on thresholds only`, [], {
        line: 0
      })
    );
  }
  for (const r of input.policy.requirements) {
    const description = describeRequirement(r, input.policy.challenges);
    const { row, findings } = r.kind === "no-new-spof" ? judgeSpof(r, effective, description) : judge(r, effective, description);
    report.requirements.push(row);
    report.findings.push(...findings);
  }
  for (const reason of input.head.result.evaluation.degraded) {
    report.findings.push(finding("degraded", "notice", `head evaluation reduced: ${reason}`, [], { line: 0 }));
  }
  if (effective.base && !effective.thresholdsOnly && effective.base.result !== input.head.result) {
    for (const reason of effective.base.result.evaluation.degraded) {
      report.findings.push(finding("degraded", "notice", `base evaluation reduced: ${reason}`, [], { line: 0 }));
    }
  }
  report.head = input.head.result.evaluation;
  if (effective.base && !effective.thresholdsOnly) {
    report.base = effective.base.result.evaluation;
    const changes = elementChanges(effective.base, input.head);
    if (changes.added.length + changes.removed.length > 0) report.changes = changes;
  }
  report.status = fileStatus(input.change, report.findings);
  return report;
}

// src/gate/verdict.ts
var FILE_STATUSES = ["pass", "regressed", "below-threshold", "new", "removed", "renamed", "error"];
function countStatuses(files) {
  const counts = Object.fromEntries(FILE_STATUSES.map((s) => [s, 0]));
  for (const f of files) counts[f.status]++;
  return counts;
}
function verdictOf(files) {
  const failed = files.some((f) => f.status === "error" || f.findings.some((x) => x.severity === "fail"));
  return failed ? "fail" : "pass";
}
function exitCodeOf(report) {
  return report.verdict === "fail" && report.mode === "block" ? 1 : 0;
}

// src/policy/resolve.ts
var import_picomatch = __toESM(require_picomatch2(), 1);

// src/topology/suggest.ts
function levenshtein(a, b) {
  if (a === b) return 0;
  if (a.length === 0) return b.length;
  if (b.length === 0) return a.length;
  let prev = new Int32Array(b.length + 1);
  let cur = new Int32Array(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    cur[0] = i;
    const ca = a.charCodeAt(i - 1);
    for (let j = 1; j <= b.length; j++) {
      const cost = ca === b.charCodeAt(j - 1) ? 0 : 1;
      cur[j] = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + cost);
    }
    [prev, cur] = [cur, prev];
  }
  return prev[b.length];
}
var MAX_CANDIDATES = 5e3;
var MAX_WORD = 64;
function closest(word, candidates2) {
  if (word.length > MAX_WORD) return void 0;
  const limit = Math.min(3, Math.max(1, Math.ceil(word.length / 3)));
  const w = word.toLowerCase();
  let best;
  let bestDistance = limit + 1;
  let seen = 0;
  for (const c of candidates2) {
    if (++seen > MAX_CANDIDATES) break;
    if (Math.abs(c.length - word.length) > limit) continue;
    const d = levenshtein(w, c.toLowerCase());
    if (d < bestDistance && d < word.length) {
      best = c;
      bestDistance = d;
    }
  }
  return best;
}
function didYouMean(word, candidates2, fallback = "") {
  const c = closest(word, candidates2);
  return c === void 0 ? fallback : `did you mean "${c}"?`;
}

// src/policy/budget.ts
var ENGINE_VISITS_PER_SECOND = 5e7;
var DEFAULT_BUDGET_SECONDS = 60;
function budgetWork(b) {
  const fromSeconds = b.seconds === void 0 ? Infinity : Math.floor(b.seconds * ENGINE_VISITS_PER_SECOND);
  const work = Math.min(b.work ?? Infinity, fromSeconds);
  if (work === Infinity) return budgetWork({ seconds: DEFAULT_BUDGET_SECONDS });
  return Math.max(1, Math.floor(work));
}

// src/policy/load.ts
var import_ajv = __toESM(require_ajv(), 1);

// src/policy/requirement-id.ts
function statisticTag(s) {
  switch (s.kind) {
    case "quantile":
      return `q${s.q}`;
    case "worst-case":
      return `worst-case×${s.removals}`;
    default:
      return s.kind;
  }
}
function requirementId(r) {
  switch (r.kind) {
    case "r-threshold":
      return r.statistic.kind === "worst-case" ? `r-threshold:${r.challenge}:${statisticTag(r.statistic)}` : `r-threshold:${r.challenge}@${r.at}:${statisticTag(r.statistic)}`;
    case "area-floor":
    case "spread-ceiling":
      return `${r.kind}:${r.challenge}`;
    case "n-1":
      return `n-1:${r.element}`;
    case "no-new-spof":
      if (r.bridges && r.cutNodes) return "no-new-spof";
      return r.bridges ? "no-new-spof:bridges" : "no-new-spof:cut-nodes";
  }
}

// src/policy/policy.schema.json
var policy_schema_default = {
  $schema: "http://json-schema.org/draft-07/schema#",
  title: "netbrace policy",
  description: "What a network design must satisfy before a change to it merges. Usually the file .netbrace.yaml at the repository root.",
  type: "object",
  additionalProperties: false,
  properties: {
    version: {
      description: "Version of the policy format. Only 1 exists.",
      const: 1
    },
    inherits: {
      description: "A base policy file (path in the repository, relative to this file). Its floors may be tightened here, never loosened.",
      type: "string",
      minLength: 1
    },
    designs: {
      description: "Which files are designs. Default: every .graphml and .gml file and every .net.yaml, .net.yml and .net.json file.",
      type: "array",
      minItems: 1,
      items: { $ref: "#/definitions/designGlob" }
    },
    exclude: {
      description: "Globs of files that are never designs, even when a designs glob matches them.",
      $ref: "#/definitions/globs"
    },
    seed: {
      description: "Seed of every random challenge that does not set its own. Same seed, same inputs: the same report, byte for byte.",
      $ref: "#/definitions/seed"
    },
    "r-value": {
      description: "How the robustness value R of a (damaged) design is computed from normalized metrics.",
      type: "object",
      additionalProperties: false,
      required: ["metrics"],
      properties: {
        metrics: {
          description: "Metric id → weight. Each metric is normalized to [0, 1] before it is combined.",
          type: "object",
          minProperties: 1,
          additionalProperties: false,
          properties: {
            efficiency: { $ref: "#/definitions/weight" },
            weighted_efficiency: { $ref: "#/definitions/weight" },
            largest_component: { $ref: "#/definitions/weight" },
            pair_connectivity: { $ref: "#/definitions/weight" },
            average_hop: { $ref: "#/definitions/weight" },
            diameter: { $ref: "#/definitions/weight" },
            algebraic_connectivity: { $ref: "#/definitions/weight" },
            effective_resistance: { $ref: "#/definitions/weight" },
            natural_connectivity: { $ref: "#/definitions/weight" },
            spectral_radius: { $ref: "#/definitions/weight" },
            node_connectivity: { $ref: "#/definitions/weight" },
            link_connectivity: { $ref: "#/definitions/weight" },
            bridges: { $ref: "#/definitions/weight" },
            cut_nodes: { $ref: "#/definitions/weight" },
            demand_served: { $ref: "#/definitions/weight" }
          }
        },
        combine: {
          description: "mean: weighted mean of the normalized metrics; min: the smallest of them (weights ignored).",
          enum: ["mean", "min"],
          default: "mean"
        }
      }
    },
    challenges: {
      description: "The challenges to run, by a name of your choosing (requirements refer to it).",
      type: "object",
      propertyNames: { pattern: "^[A-Za-z0-9][A-Za-z0-9_.-]*$" },
      additionalProperties: { $ref: "#/definitions/challenge" }
    },
    requirements: {
      description: "What every design must satisfy.",
      $ref: "#/definitions/requirements"
    },
    weakening: { $ref: "#/definitions/weakening" },
    "removed-designs": { $ref: "#/definitions/removedDesigns" },
    budget: { $ref: "#/definitions/budget" },
    scopes: {
      description: "Rules for some files only: they add requirements or tighten existing ones, never loosen them.",
      type: "array",
      items: {
        type: "object",
        additionalProperties: false,
        required: ["paths"],
        properties: {
          paths: { description: "Globs of the design files this scope applies to.", $ref: "#/definitions/globs" },
          requirements: { $ref: "#/definitions/requirements" },
          weakening: { $ref: "#/definitions/weakening" },
          "removed-designs": { $ref: "#/definitions/removedDesigns" },
          budget: { $ref: "#/definitions/budget" }
        }
      }
    }
  },
  definitions: {
    glob: { type: "string", minLength: 1 },
    globs: {
      anyOf: [
        { $ref: "#/definitions/glob" },
        { type: "array", minItems: 1, items: { $ref: "#/definitions/glob" } }
      ]
    },
    seed: { type: "integer", minimum: 0, maximum: 4294967295 },
    weight: { description: "Weight of the metric in the mean (> 0).", type: "number", exclusiveMinimum: 0 },
    severity: {
      description: "fail: the gate fails; warn: reported as a warning; notice: reported only.",
      enum: ["fail", "warn", "notice"],
      default: "fail"
    },
    r: { type: "number", minimum: 0, maximum: 1 },
    designGlob: {
      type: "object",
      additionalProperties: false,
      required: ["paths"],
      properties: {
        paths: { description: "Globs of design files (relative to the repository root).", $ref: "#/definitions/globs" },
        format: {
          description: "The format of the matched files, where the extension does not say it.",
          enum: ["native-yaml", "native-json", "graphml", "gml", "csv"]
        }
      }
    },
    challenge: {
      type: "object",
      additionalProperties: false,
      required: ["remove"],
      properties: {
        remove: {
          description: "What fails: nodes, links, risk-groups (shared-risk link groups) or region (every element within a radius of an epicentre).",
          enum: ["nodes", "links", "risk-groups", "region"]
        },
        order: {
          description: "random: a Monte Carlo envelope over realizations; degree, betweenness, eigenvector, closeness: a targeted attack, highest score first; worst-first: risk groups in the order that hurts most.",
          enum: ["random", "degree", "betweenness", "eigenvector", "closeness", "worst-first"],
          default: "random"
        },
        adaptive: {
          description: "For targeted attacks: recompute the scores after each removal.",
          type: "boolean",
          default: false
        },
        until: {
          description: "End of the x axis: the fraction removed (0 < until ≤ 1), or the radius in km for region (default 50 km, the same for every design so that base and head share one grid).",
          type: "number",
          exclusiveMinimum: 0
        },
        points: { description: "Grid points on the x axis, 0 included.", type: "integer", minimum: 2, maximum: 1001 },
        realizations: { description: "Monte Carlo realizations (random order only).", type: "integer", minimum: 1, maximum: 1e6 },
        band: {
          description: "Lower and upper quantile of the envelope's band, e.g. [0.1, 0.9].",
          type: "array",
          minItems: 2,
          maxItems: 2,
          items: { type: "number", exclusiveMinimum: 0, exclusiveMaximum: 1 }
        },
        seed: { description: "Seed of this challenge (default: the policy's seed).", $ref: "#/definitions/seed" },
        "worst-case": {
          description: "Length of the worst-case removal search (0: none).",
          type: "integer",
          minimum: 0,
          maximum: 10
        }
      }
    },
    requirements: {
      type: "array",
      items: { $ref: "#/definitions/requirement" }
    },
    requirement: {
      type: "object",
      required: ["kind"],
      discriminator: { propertyName: "kind" },
      oneOf: [
        {
          description: "r-threshold: at removal fraction `at`, a statistic of the challenge's envelope must be at least `min`.",
          type: "object",
          additionalProperties: false,
          required: ["kind", "challenge", "min"],
          properties: {
            kind: { const: "r-threshold" },
            challenge: { description: "Name of a challenge under `challenges:`.", type: "string" },
            at: { description: "Removal fraction (or km for region) where R is judged; put on the grid.", type: "number", minimum: 0 },
            statistic: {
              description: "quantile (with q), median, mean, min (over realizations), worst-case (with removals), value (targeted attacks). Default: median for random challenges, value otherwise.",
              enum: ["quantile", "median", "mean", "min", "worst-case", "value"]
            },
            q: { description: "The quantile for statistic: quantile, e.g. 0.1.", type: "number", exclusiveMinimum: 0, exclusiveMaximum: 1 },
            removals: { description: "For statistic: worst-case, how many removals (≤ the challenge's worst-case depth).", type: "integer", minimum: 1, maximum: 10 },
            min: { description: "The floor: R must be at least this.", $ref: "#/definitions/r" },
            severity: { $ref: "#/definitions/severity" }
          }
        },
        {
          description: "area-floor: the envelope's area (mean of the median over the grid) must be at least `min`; without `min` it is tracked for regressions only.",
          type: "object",
          additionalProperties: false,
          required: ["kind", "challenge"],
          properties: {
            kind: { const: "area-floor" },
            challenge: { type: "string" },
            min: { $ref: "#/definitions/r" },
            severity: { $ref: "#/definitions/severity" }
          }
        },
        {
          description: "spread-ceiling: the envelope's mean band width must be at most `max`.",
          type: "object",
          additionalProperties: false,
          required: ["kind", "challenge", "max"],
          properties: {
            kind: { const: "spread-ceiling" },
            challenge: { type: "string" },
            max: { $ref: "#/definitions/r" },
            severity: { $ref: "#/definitions/severity" }
          }
        },
        {
          description: "n-1: no single node (or link) removal may drop R below `min`.",
          type: "object",
          additionalProperties: false,
          required: ["kind", "min"],
          properties: {
            kind: { const: "n-1" },
            element: { enum: ["node", "link"], default: "link" },
            min: { $ref: "#/definitions/r" },
            severity: { $ref: "#/definitions/severity" }
          }
        },
        {
          description: "no-new-spof: the change may not add bridges or cut nodes that the base did not have.",
          type: "object",
          additionalProperties: false,
          required: ["kind"],
          properties: {
            kind: { const: "no-new-spof" },
            elements: {
              description: "Which single points of failure count (default both).",
              type: "array",
              minItems: 1,
              uniqueItems: true,
              items: { enum: ["bridges", "cut-nodes"] }
            },
            severity: { $ref: "#/definitions/severity" }
          }
        }
      ]
    },
    weakening: {
      description: "How far a requirement's value may drop from base to head. A drop within the allowance is a notice; a drop smaller than error-multiple × its standard error is never a failure.",
      type: "object",
      additionalProperties: false,
      properties: {
        "allowed-drop": { description: "Largest tolerated drop, in units of R.", type: "number", minimum: 0 },
        "allowed-relative-drop": { description: "Largest tolerated drop as a fraction of the base value (0.05 = 5 %). With allowed-drop too, the larger allowance applies.", type: "number", minimum: 0, maximum: 1 },
        "error-multiple": { description: "A drop below error-multiple × se is Monte Carlo noise (default 2).", type: "number", minimum: 0 },
        severity: { $ref: "#/definitions/severity" }
      }
    },
    budget: {
      description: "Work each evaluation of a design (head and base alike) may take. Beyond it the engine runs fewer realizations or N-1 cases and the report says so; what the reduced work cannot settle is uncertain, never met. Default: seconds 60. An inheriting policy or a scope may raise it, never lower it.",
      type: "object",
      additionalProperties: false,
      minProperties: 1,
      properties: {
        work: { description: "Element visits (one graph pass visits every node and link once). With seconds too, the smaller applies.", type: "number", exclusiveMinimum: 0 },
        seconds: { description: "Seconds of engine time, converted to work at a fixed rate of 5e7 element visits per second, so results never depend on the machine's speed.", type: "number", exclusiveMinimum: 0 }
      }
    },
    removedDesigns: {
      description: "What a deleted design file is: a failure (fail), a warning (warn), a note (notice, the default) or nothing (ignore).",
      enum: ["fail", "warn", "notice", "ignore"]
    }
  }
};

// src/policy/yaml-source.ts
var import_yaml2 = __toESM(require_dist(), 1);

// src/topology/nesting.ts
var import_yaml = __toESM(require_dist(), 1);
var MAX_NESTING = 100;
var DOCUMENT = "";
var FLOW_END = "";
var SCALAR = "";
function yamlNestingExceeded(text2, max = MAX_NESTING) {
  const indents = [];
  let offset = 0;
  let flow = 0;
  let onLine = 0;
  let lineStart = true;
  let indent = 0;
  let scalarNext = false;
  for (const tok of new import_yaml.Lexer().lex(text2)) {
    if (tok === DOCUMENT || tok === FLOW_END) continue;
    if (tok === SCALAR) {
      scalarNext = true;
      continue;
    }
    const start = offset;
    offset += tok.length;
    const content = scalarNext;
    scalarNext = false;
    if (!content) {
      if (tok === "\n" || tok === "\r\n" || tok === "") {
        lineStart = true;
        indent = 0;
        onLine = 0;
        continue;
      }
      if (lineStart && /^[ \t]+$/.test(tok)) {
        indent = tok.length;
        continue;
      }
      if (tok[0] === "#") continue;
    }
    if (lineStart) {
      lineStart = false;
      if (flow === 0) {
        while (indents.length > 0 && indents[indents.length - 1] >= indent) indents.pop();
        indents.push(indent);
      }
    }
    if (content) {
      if (tok.endsWith("\n")) {
        lineStart = true;
        indent = 0;
        onLine = 0;
      }
      continue;
    }
    if (tok === "[" || tok === "{") flow++;
    else if (tok === "]" || tok === "}") flow = Math.max(0, flow - 1);
    else if ((tok === "-" || tok === "?" || tok === ":") && flow === 0) onLine++;
    else continue;
    if (indents.length + onLine + flow > max) return start;
  }
  return -1;
}
function positionOf(text2, offset) {
  let line = 1;
  let start = 0;
  for (let i = text2.indexOf("\n"); i >= 0 && i < offset; i = text2.indexOf("\n", i + 1)) {
    line++;
    start = i + 1;
  }
  return { line, column: Math.max(0, offset - start) + 1 };
}

// src/policy/yaml-source.ts
var MAX_ALIAS_COUNT = 100;
var YamlSource = class {
  file;
  data;
  doc;
  lines;
  constructor(text2, file) {
    this.file = file;
    this.lines = new import_yaml2.LineCounter();
    const deep = yamlNestingExceeded(text2);
    if (deep >= 0) {
      throw new PolicyError(`the policy nests deeper than ${MAX_NESTING} levels`, { file, ...positionOf(text2, deep) }, "a policy needs a few levels of nesting; flatten this structure");
    }
    this.doc = (0, import_yaml2.parseDocument)(text2, { lineCounter: this.lines, prettyErrors: false, uniqueKeys: true });
    const problem = this.doc.errors[0];
    if (problem) {
      const where = this.offset(problem.pos[0]);
      const duplicate = problem.code === "DUPLICATE_KEY";
      throw new PolicyError(
        duplicate ? "a key appears twice in the same mapping" : `the policy is not valid YAML: ${problem.message}`,
        where,
        duplicate ? "keep one of them" : "check the indentation and quoting on this line"
      );
    }
    try {
      this.data = this.doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
    } catch (error) {
      throw new PolicyError(
        `the policy could not be read: ${error instanceof Error ? error.message : String(error)}`,
        { file, line: 1, column: 1 },
        "use fewer YAML aliases"
      );
    }
  }
  /** Location of a byte offset. */
  offset(pos) {
    const { line, col } = this.lines.linePos(pos);
    return { file: this.file, line, column: col };
  }
  /** Location of the value at `path`, or of its key when `key` is set; the nearest existing ancestor otherwise. */
  where(path, key = false) {
    let node = this.doc.contents;
    let last = { file: this.file, line: 1, column: 1 };
    if (node?.range) last = this.offset(node.range[0]);
    for (let i = 0; i < path.length; i++) {
      if (node && (0, import_yaml2.isAlias)(node)) node = node.resolve(this.doc);
      const seg = path[i];
      if (node && (0, import_yaml2.isMap)(node)) {
        const pair = node.items.find((p) => (0, import_yaml2.isScalar)(p.key) && String(p.key.value) === String(seg));
        if (!pair) return last;
        const keyNode = pair.key;
        const isLast = i === path.length - 1;
        if (isLast && key && keyNode.range) return this.offset(keyNode.range[0]);
        node = pair.value;
        if (node?.range) last = this.offset(node.range[0]);
        else if (keyNode.range) last = this.offset(keyNode.range[0]);
      } else if (node && (0, import_yaml2.isSeq)(node)) {
        node = node.items[Number(seg)];
        if (node?.range) last = this.offset(node.range[0]);
        else return last;
      } else {
        return last;
      }
    }
    return last;
  }
};
function pointerSegments(pointer) {
  if (pointer === "") return [];
  return pointer.slice(1).split("/").map((s) => s.replace(/~1/g, "/").replace(/~0/g, "~")).map((s) => /^(0|[1-9][0-9]*)$/.test(s) ? Number(s) : s);
}

// src/policy/schema-errors.ts
function describePath(path) {
  if (path.length === 0) return "the policy";
  const parts = [];
  let i = 0;
  while (i < path.length) {
    const seg = path[i];
    const next = path[i + 1];
    if (seg === "requirements" && typeof next === "number") {
      parts.push(`requirement ${next + 1}`);
      i += 2;
    } else if (seg === "scopes" && typeof next === "number") {
      parts.push(`scope ${next + 1}`);
      i += 2;
    } else if (seg === "designs" && typeof next === "number") {
      parts.push(`designs entry ${next + 1}`);
      i += 2;
    } else if (seg === "challenges" && next !== void 0) {
      parts.push(`challenge "${next}"`);
      i += 2;
    } else if (typeof next === "number") {
      parts.push(`item ${next + 1} of "${seg}"`);
      i += 2;
    } else {
      parts.push(`"${seg}"`);
      i += 1;
    }
  }
  return parts.join(", ");
}
var TYPE_WORDS = {
  object: "a mapping (key: value lines)",
  array: "a list",
  string: "text",
  number: "a number",
  integer: "a whole number",
  boolean: "true or false"
};
function typeOf(value) {
  if (value === null || value === void 0) return "empty";
  if (Array.isArray(value)) return "a list";
  if (typeof value === "object") return "a mapping";
  if (typeof value === "string") return `the text "${value}"`;
  if (typeof value === "number") return Number.isInteger(value) ? `the number ${value}` : `the number ${value}`;
  return String(value);
}
var RENAMED_KEYS = {
  "extends": "inherits",
  "ignore": "exclude",
  "files": "paths",
  "overrides": "scopes",
  "regression": "weakening",
  "noise-factor": "error-multiple"
};
function renamedKey(key, known) {
  const renamed = Object.hasOwn(RENAMED_KEYS, key) ? RENAMED_KEYS[key] : void 0;
  return renamed !== void 0 && known.includes(renamed) ? renamed : void 0;
}
function renamedAt(e) {
  if (e.keyword !== "additionalProperties") return void 0;
  const known = Object.keys(e.parentSchema?.properties ?? {});
  const renamed = renamedKey(String(e.params.additionalProperty), known);
  return renamed === void 0 ? void 0 : `${e.instancePath}\0${renamed}`;
}
function suggestion(word, candidates2, listName) {
  const c = typeof word === "string" ? closest(word, candidates2) : void 0;
  return c !== void 0 ? `did you mean "${c}"?` : `${listName}: ${candidates2.join(", ")}`;
}
function diagnose(e, src) {
  const path = pointerSegments(e.instancePath);
  const subject = describePath(path);
  const parentSchema = e.parentSchema;
  const params = e.params;
  switch (e.keyword) {
    case "additionalProperties": {
      const key = String(params.additionalProperty);
      const known = Object.keys(parentSchema?.properties ?? {});
      const where = src.where([...path, key], true);
      if (path.length === 2 && path[0] === "r-value" && path[1] === "metrics") {
        return { where, message: `unknown metric "${key}"`, hint: suggestion(key, known, "known metrics") };
      }
      const renamed = renamedKey(key, known);
      const hint = renamed !== void 0 ? `did you mean "${renamed}"?` : suggestion(key, known, "known keys");
      return { where, message: `unknown key "${key}" in ${subject}`, hint };
    }
    case "required": {
      const key = String(params.missingProperty);
      return { where: src.where(path), message: `${subject} is missing "${key}"`, hint: `add a "${key}:" line` };
    }
    case "type": {
      const want = String(params.type).split(",").map((t) => TYPE_WORDS[t] ?? t).join(" or ");
      return { where: src.where(path), message: `${subject} must be ${want}, not ${typeOf(e.data)}`, hint: "" };
    }
    case "enum": {
      const allowed = params.allowedValues.map(String);
      return {
        where: src.where(path),
        message: `${subject} cannot be ${typeOf(e.data)}; it is one of ${allowed.join(", ")}`,
        hint: suggestion(e.data, allowed, "allowed")
      };
    }
    case "const":
      return { where: src.where(path), message: `${subject} must be ${JSON.stringify(params.allowedValue)}`, hint: "" };
    case "minimum":
    case "maximum":
    case "exclusiveMinimum":
    case "exclusiveMaximum": {
      const op = { minimum: "≥", maximum: "≤", exclusiveMinimum: ">", exclusiveMaximum: "<" }[e.keyword];
      return { where: src.where(path), message: `${subject} must be ${op} ${String(params.limit)} (it is ${String(e.data)})`, hint: "" };
    }
    case "minItems":
    case "maxItems": {
      const exact = parentSchema?.minItems !== void 0 && parentSchema.minItems === parentSchema.maxItems;
      const n = String(params.limit);
      const message = exact ? `${subject} must have exactly ${n} items` : e.keyword === "minItems" ? `${subject} needs at least ${n} item${n === "1" ? "" : "s"}` : `${subject} may have at most ${n} items`;
      return { where: src.where(path), message, hint: "" };
    }
    case "minProperties":
      return { where: src.where(path), message: `${subject} needs at least one entry`, hint: "" };
    case "minLength":
      return { where: src.where(path), message: `${subject} must not be empty`, hint: "" };
    case "uniqueItems":
      return { where: src.where(path), message: `${subject} lists the same item twice`, hint: "remove the repeated item" };
    case "propertyNames":
      return {
        where: src.where([...path, String(params.propertyName)], true),
        message: `the name "${String(params.propertyName)}" in ${subject} may use only letters, digits, "-", "_" and "."`,
        hint: ""
      };
    case "anyOf":
      return { where: src.where(path), message: `${subject} must be a glob or a list of globs`, hint: 'e.g. "networks/**/*.graphml"' };
    case "discriminator": {
      if (params.error === "mapping") {
        const kinds = requirementKinds(parentSchema);
        return {
          where: src.where([...path, "kind"]),
          message: `unknown requirement kind "${String(params.tagValue)}"`,
          hint: suggestion(params.tagValue, kinds, "kinds")
        };
      }
      const data = e.data;
      if (data === null || typeof data !== "object" || data.kind === void 0) return void 0;
      return { where: src.where([...path, "kind"]), message: `${subject}: "kind" must be text`, hint: "" };
    }
    // Sub-errors of propertyNames and anyOf are reported through their parent error.
    case "pattern":
      return void 0;
    default:
      return { where: src.where(path), message: `${subject}: ${e.message ?? "is not valid"}`, hint: "" };
  }
}
function requirementKinds(schema) {
  const branches = schema?.oneOf ?? [];
  return branches.map((b) => b.properties?.kind?.const ?? "").filter((k) => k !== "");
}
function throwSchemaErrors(errors, src) {
  const anyOfPaths = errors.filter((e) => e.keyword === "anyOf").map((e) => e.instancePath);
  const renamed = new Set(errors.map(renamedAt).filter((r) => r !== void 0));
  const kept = errors.filter(
    (e) => (e.keyword === "anyOf" || !anyOfPaths.some((p) => e.instancePath === p || e.instancePath.startsWith(`${p}/`))) && !(e.keyword === "required" && renamed.has(`${e.instancePath}\0${String(e.params.missingProperty)}`))
  );
  const seen = /* @__PURE__ */ new Set();
  const list = [];
  for (const e of kept) {
    const d = diagnose(e, src);
    if (!d) continue;
    const key = `${d.where.line}:${d.where.column}:${d.message}`;
    if (seen.has(key)) continue;
    seen.add(key);
    list.push(d);
  }
  list.sort((a, b) => a.where.line - b.where.line || a.where.column - b.where.column);
  const [first, ...rest] = list;
  throw new PolicyError(
    first.message,
    first.where,
    first.hint,
    rest.slice(0, 20).map((d) => ({ ...d.where, message: d.hint ? `${d.message} — ${d.hint}` : d.message }))
  );
}

// src/policy/load.ts
var validator;
function validate(data) {
  validator ??= new import_ajv.Ajv({ allErrors: true, verbose: true, discriminator: true, strict: false }).compile(policy_schema_default);
  validator(data);
  return validator;
}
var ENGINE = {
  nodes: {
    random: { static: "random-nodes" },
    degree: { static: "degree", adaptive: "degree-adaptive" },
    betweenness: { static: "betweenness", adaptive: "betweenness-adaptive" },
    eigenvector: { static: "eigenvector" },
    closeness: { static: "closeness" }
  },
  links: {
    random: { static: "random-links" },
    betweenness: { static: "link-betweenness", adaptive: "link-betweenness-adaptive" }
  },
  "risk-groups": {
    random: { static: "risk-groups" },
    "worst-first": { static: "risk-groups-worst" }
  },
  region: {
    random: { static: "regional" }
  }
};
function globs(value) {
  return typeof value === "string" ? [value] : value;
}
var FileBuilder = class {
  constructor(src) {
    this.src = src;
  }
  src;
  at(path, key = false) {
    return this.src.where(path, key);
  }
  fail(message, path, hint = "", key = false) {
    throw new PolicyError(message, this.at(path, key), hint);
  }
  challenge(name, raw) {
    const path = ["challenges", name];
    const remove = raw.remove;
    const order = raw.order ?? "random";
    const adaptive = raw.adaptive ?? false;
    const options = ENGINE[remove];
    const entry = options[order];
    if (!entry) {
      this.fail(
        `challenge "${name}": ${remove} cannot be removed in ${order} order`,
        [...path, raw.order === void 0 ? "remove" : "order"],
        `orders for ${remove}: ${Object.keys(options).join(", ")}`
      );
    }
    const engine = adaptive ? entry.adaptive : entry.static;
    if (!engine) {
      this.fail(
        `challenge "${name}": the ${order} order of ${remove} has no adaptive form`,
        [...path, "adaptive"],
        order === "random" ? "adaptive applies to targeted attacks only" : 'remove "adaptive: true"'
      );
    }
    const random = order === "random";
    for (const key of ["realizations", "band"]) {
      if (!random && raw[key] !== void 0) {
        this.fail(`challenge "${name}": "${key}" applies only to random order`, [...path, key], "a targeted attack is one curve", true);
      }
    }
    if (raw["worst-case"] !== void 0 && !(random && (remove === "nodes" || remove === "links"))) {
      this.fail(
        `challenge "${name}": "worst-case" applies only to random node or link removal`,
        [...path, "worst-case"],
        "",
        true
      );
    }
    const until = raw.until;
    if (remove !== "region" && until !== void 0 && until > 1) {
      this.fail(
        `challenge "${name}": "until" is a fraction of the ${remove} removed and must be ≤ 1 (it is ${until})`,
        [...path, "until"],
        "e.g. 0.5 for half of them"
      );
    }
    const band = raw.band;
    if (band && !(band[0] < band[1])) {
      this.fail(`challenge "${name}": the band's lower quantile must be below its upper one`, [...path, "band"], `e.g. [0.1, 0.9]`);
    }
    const params = { challenge: engine, until: until ?? (remove === "region" ? REGIONAL_UNTIL_KM : DEFAULTS.until) };
    if (random) {
      params.points = raw.points ?? DEFAULTS.points;
      params.realizations = raw.realizations ?? DEFAULTS.realizations;
      params.band = band ?? [...DEFAULTS.band];
      params.worstCase = raw["worst-case"] ?? DEFAULTS.worstCase;
    } else if (raw.points !== void 0) {
      params.points = raw.points;
    }
    if (raw.seed !== void 0) params.seed = raw.seed;
    return { name, remove, order, adaptive, engine, random, params, where: this.at(path, true) };
  }
  statistic(raw, path) {
    const kind = raw.statistic ?? "median";
    if (raw.q !== void 0 && kind !== "quantile") {
      this.fail(`${describePath(path)}: "q" needs "statistic: quantile"`, [...path, "q"], 'add "statistic: quantile" or remove "q"', true);
    }
    if (raw.removals !== void 0 && kind !== "worst-case") {
      this.fail(`${describePath(path)}: "removals" needs "statistic: worst-case"`, [...path, "removals"], "", true);
    }
    if (kind === "quantile") {
      if (raw.q === void 0) this.fail(`${describePath(path)}: "statistic: quantile" needs "q"`, [...path, "statistic"], 'e.g. "q: 0.1"');
      return { kind, q: raw.q };
    }
    if (kind === "worst-case") {
      if (raw.removals === void 0) {
        this.fail(`${describePath(path)}: "statistic: worst-case" needs "removals"`, [...path, "statistic"], 'e.g. "removals: 2"');
      }
      if (raw.at !== void 0) {
        this.fail(`${describePath(path)}: a worst-case threshold counts "removals", not "at"`, [...path, "at"], 'remove "at"', true);
      }
      return { kind, removals: raw.removals };
    }
    return { kind };
  }
  requirement(raw, path) {
    const where = this.at(path);
    const severity = raw.severity ?? "fail";
    const valueKey = raw.min !== void 0 ? "min" : raw.max !== void 0 ? "max" : "kind";
    const valueWhere = this.at([...path, valueKey]);
    const common = { id: "", severity, where, valueWhere };
    const ref = { challenge: raw.challenge, challengeWhere: this.at([...path, "challenge"]) };
    let req;
    switch (raw.kind) {
      case "r-threshold": {
        const statistic = this.statistic(raw, path);
        if (statistic.kind !== "worst-case" && raw.at === void 0) {
          this.fail(`${describePath(path)} has no "at"`, path, 'add "at:", the removal fraction where R is judged');
        }
        req = {
          ...common,
          kind: "r-threshold",
          ...ref,
          statistic,
          min: raw.min,
          ...raw.at !== void 0 ? { at: raw.at } : {}
        };
        break;
      }
      case "area-floor":
        req = {
          ...common,
          kind: "area-floor",
          ...ref,
          ...raw.min !== void 0 ? { min: raw.min } : {}
        };
        break;
      case "spread-ceiling":
        req = { ...common, kind: "spread-ceiling", ...ref, max: raw.max };
        break;
      case "n-1":
        req = { ...common, kind: "n-1", element: raw.element ?? "link", min: raw.min };
        break;
      default: {
        const elements = raw.elements ?? ["bridges", "cut-nodes"];
        req = {
          ...common,
          valueWhere: this.at([...path, raw.elements !== void 0 ? "elements" : "kind"]),
          kind: "no-new-spof",
          bridges: elements.includes("bridges"),
          cutNodes: elements.includes("cut-nodes")
        };
      }
    }
    req.id = requirementId(req);
    return req;
  }
  requirements(list, path) {
    if (list === void 0) return [];
    const out = [];
    const byId2 = /* @__PURE__ */ new Map();
    list.forEach((raw, i) => {
      const req = this.requirement(raw, [...path, i]);
      const twin = byId2.get(req.id);
      if (twin) {
        throw new PolicyError(`${describePath([...path, i])} repeats requirement ${req.id}`, req.where, "keep one of them", [
          { ...twin.where, message: "first written here" }
        ]);
      }
      byId2.set(req.id, req);
      out.push(req);
    });
    return out;
  }
  weakening(raw, path) {
    if (raw === void 0) return void 0;
    const fieldWhere = {};
    const field = (key, name) => {
      if (raw[key] !== void 0) fieldWhere[name] = this.at([...path, key]);
      return raw[key];
    };
    const rule = {
      errorMultiple: field("error-multiple", "errorMultiple") ?? DEFAULT_ERROR_MULTIPLE,
      severity: field("severity", "severity") ?? "fail",
      where: this.at(path, true),
      fieldWhere
    };
    const abs = field("allowed-drop", "allowedDrop");
    const rel = field("allowed-relative-drop", "allowedRelativeDrop");
    if (abs !== void 0) rule.allowedDrop = abs;
    if (rel !== void 0) rule.allowedRelativeDrop = rel;
    return rule;
  }
  budget(raw, path) {
    if (raw === void 0) return void 0;
    const budget = { where: this.at(path, true), fieldWhere: {} };
    for (const key of ["work", "seconds"]) {
      if (raw[key] === void 0) continue;
      budget[key] = raw[key];
      budget.fieldWhere[key] = this.at([...path, key]);
    }
    return budget;
  }
  removed(raw, path) {
    return raw === void 0 ? void 0 : { severity: raw, where: this.at(path) };
  }
};
function joinRepoPath(fromFile, relative, where) {
  if (relative.startsWith("/") || /^[A-Za-z]:[\\/]/.test(relative)) {
    throw new PolicyError(`"inherits" must be a path inside the repository, not ${relative}`, where, "write it relative to this policy file");
  }
  const dir = fromFile.split("/").slice(0, -1);
  const parts = [...dir];
  for (const seg of relative.replace(/\\/g, "/").split("/")) {
    if (seg === "" || seg === ".") continue;
    if (seg === "..") {
      if (parts.length === 0) {
        throw new PolicyError(`"inherits" leaves the repository: ${relative}`, where, "the base policy must be a file in this repository");
      }
      parts.pop();
    } else {
      parts.push(seg);
    }
  }
  return parts.join("/");
}
function parsePolicyFile(text2, file) {
  const src = new YamlSource(text2, file);
  const data = src.data ?? {};
  if (typeof data !== "object" || data === null || Array.isArray(data)) {
    throw new PolicyError("the policy must be a mapping of keys (key: value lines)", src.where([]), 'see "netbrace init" for a starter file');
  }
  const v = validate(data);
  if (v.errors && v.errors.length > 0) throwSchemaErrors(v.errors, src);
  const raw = data;
  const b = new FileBuilder(src);
  const policy = { path: file, scopes: [] };
  if (raw.inherits !== void 0) {
    const where = src.where(["inherits"]);
    policy.inherits = { path: joinRepoPath(file, raw.inherits, where), where };
  }
  if (raw.designs !== void 0) {
    policy.designs = raw.designs.map(
      (d, i) => ({
        paths: globs(d.paths),
        ...d.format !== void 0 ? { format: d.format } : {},
        where: src.where(["designs", i])
      })
    );
  }
  if (raw.exclude !== void 0) policy.exclude = { globs: globs(raw.exclude), where: src.where(["exclude"]) };
  if (raw.seed !== void 0) policy.seed = { value: raw.seed, where: src.where(["seed"]) };
  if (raw["r-value"] !== void 0) {
    const r = raw["r-value"];
    const spec = {
      metrics: Object.entries(r.metrics).map(([id, weight]) => ({ id, weight })),
      combine: r.combine ?? "mean"
    };
    policy.rValue = { spec, where: src.where(["r-value"], true) };
  }
  const byEngine = /* @__PURE__ */ new Map();
  if (raw.challenges !== void 0) policy.challenges = [];
  for (const [name, c] of Object.entries(raw.challenges ?? {})) {
    const def = b.challenge(name, c);
    const twin = byEngine.get(def.engine);
    if (twin) {
      throw new PolicyError(
        `challenges "${twin.name}" and "${name}" are the same challenge (${def.remove}, ${def.order}${def.adaptive ? ", adaptive" : ""})`,
        def.where,
        "define each challenge once",
        [{ ...twin.where, message: `"${twin.name}" is defined here` }]
      );
    }
    byEngine.set(def.engine, def);
    policy.challenges?.push(def);
  }
  if (raw.requirements !== void 0) policy.requirements = b.requirements(raw.requirements, ["requirements"]);
  const weakening = b.weakening(raw.weakening, ["weakening"]);
  if (weakening) policy.weakening = weakening;
  const removed = b.removed(raw["removed-designs"], ["removed-designs"]);
  if (removed) policy.removedDesigns = removed;
  const budget = b.budget(raw.budget, ["budget"]);
  if (budget) policy.budget = budget;
  policy.scopes = (raw.scopes ?? []).map((o, i) => {
    const path = ["scopes", i];
    const scope = {
      paths: globs(o.paths),
      requirements: b.requirements(o.requirements, [...path, "requirements"]),
      where: src.where(path)
    };
    const rule = b.weakening(o.weakening, [...path, "weakening"]);
    if (rule) scope.weakening = rule;
    const rem = b.removed(o["removed-designs"], [...path, "removed-designs"]);
    if (rem) scope.removedDesigns = rem;
    const ob = b.budget(o.budget, [...path, "budget"]);
    if (ob) scope.budget = ob;
    return scope;
  });
  return policy;
}

// src/policy/resolve.ts
var SEVERITY_RANK = { ignore: 0, notice: 1, warn: 2, fail: 3 };
var builtinFile;
function builtin() {
  builtinFile ??= parsePolicyFile(STARTER_POLICY, BUILTIN_POLICY_NAME);
  return builtinFile;
}
function related(where, message) {
  return { ...where, message };
}
function describeValue(r) {
  switch (r.kind) {
    case "spread-ceiling":
      return `max ${r.max}`;
    case "no-new-spof":
      return [r.bridges ? "bridges" : "", r.cutNodes ? "cut-nodes" : ""].filter(Boolean).join(" and ");
    case "area-floor":
      return r.min === void 0 ? "no floor" : `min ${r.min}`;
    default:
      return `min ${r.min}`;
  }
}
function loosening(prev, next) {
  if (SEVERITY_RANK[next.severity] < SEVERITY_RANK[prev.severity]) {
    return {
      message: `lowers the severity of ${prev.id} from ${prev.severity} to ${next.severity}`,
      where: next.where,
      prevWhere: prev.where
    };
  }
  let looser = false;
  if (prev.kind === "spread-ceiling" && next.kind === "spread-ceiling") looser = next.max > prev.max;
  else if (prev.kind === "no-new-spof" && next.kind === "no-new-spof") {
    looser = prev.bridges && !next.bridges || prev.cutNodes && !next.cutNodes;
  } else if (prev.kind === "area-floor" && next.kind === "area-floor") {
    looser = prev.min !== void 0 && (next.min === void 0 || next.min < prev.min);
  } else if ("min" in prev && "min" in next) looser = next.min < prev.min;
  if (!looser) return void 0;
  return {
    message: `loosens ${prev.id}: ${describeValue(next)} where ${describeValue(prev)} is required`,
    where: next.valueWhere,
    prevWhere: prev.valueWhere
  };
}
function loosenError(what, why, where, prevWhere) {
  return new PolicyError(`${what} ${why}`, where, "an inheriting policy or a scope may tighten a floor, never loosen it", [
    related(prevWhere, "the floor it would loosen")
  ]);
}
function mergeRequirement(list, next, what) {
  const i = list.findIndex((r) => r.value.id === next.value.id);
  if (i < 0) {
    list.push(next);
    return;
  }
  const prev = list[i];
  const why = loosening(prev.value, next.value);
  if (!why) {
    list[i] = { value: next.value, layer: Math.max(prev.layer, next.layer) };
    return;
  }
  if (next.layer >= prev.layer) throw loosenError(what, why.message, why.where, why.prevWhere);
}
var WEAKENING_FIELDS = [
  ["allowedDrop", "allowed-drop"],
  ["allowedRelativeDrop", "allowed-relative-drop"],
  ["errorMultiple", "error-multiple"]
];
function mergeWeakening(prev, next, what) {
  const merged = { ...prev.value, fieldWhere: { ...prev.value.fieldWhere }, where: next.value.where };
  const mayLoosen = next.layer < prev.layer;
  for (const [field, key] of WEAKENING_FIELDS) {
    const at = next.value.fieldWhere[field];
    if (!at) continue;
    const value = next.value[field];
    const before = prev.value[field] ?? 0;
    const prevAt = prev.value.fieldWhere[field] ?? prev.value.where;
    if (value > before) {
      if (mayLoosen) continue;
      throw loosenError(what, `loosens weakening ${key}: ${value} where ${before} is allowed`, at, prevAt);
    }
    merged[field] = value;
    merged.fieldWhere[field] = at;
  }
  const sevAt = next.value.fieldWhere.severity;
  if (sevAt) {
    if (SEVERITY_RANK[next.value.severity] < SEVERITY_RANK[prev.value.severity]) {
      if (!mayLoosen) {
        throw loosenError(
          what,
          `lowers the weakening severity from ${prev.value.severity} to ${next.value.severity}`,
          sevAt,
          prev.value.fieldWhere.severity ?? prev.value.where
        );
      }
    } else {
      merged.severity = next.value.severity;
      merged.fieldWhere.severity = sevAt;
    }
  }
  return { value: merged, layer: Math.max(prev.layer, next.layer) };
}
function mergeRemoved(prev, next, what) {
  if (SEVERITY_RANK[next.value.severity] >= SEVERITY_RANK[prev.value.severity]) return next;
  if (next.layer < prev.layer) return prev;
  throw loosenError(
    what,
    `lowers removed-designs from ${prev.value.severity} to ${next.value.severity}`,
    next.value.where,
    prev.value.where ?? next.value.where
  );
}
function visits(n) {
  return n >= 1e6 ? n.toExponential().replace("e+", "e") : String(n);
}
function bindingKey(b) {
  if (b.seconds !== void 0 && (b.work === void 0 || b.seconds * ENGINE_VISITS_PER_SECOND <= b.work)) return "seconds";
  return b.work !== void 0 ? "work" : void 0;
}
function describeBudget(b) {
  return [b.work !== void 0 ? `work ${visits(b.work)}` : "", b.seconds !== void 0 ? `seconds ${b.seconds}` : ""].filter(Boolean).join(", ");
}
function mergeBudget(prev, next, what) {
  const merged = { ...prev.value, fieldWhere: { ...prev.value.fieldWhere }, where: next.value.where };
  for (const key of ["work", "seconds"]) {
    const value = next.value[key];
    if (value === void 0) continue;
    merged[key] = value;
    merged.fieldWhere[key] = next.value.fieldWhere[key];
  }
  const before = budgetWork(prev.value);
  const after = budgetWork(merged);
  if (after >= before) return { value: merged, layer: Math.max(prev.layer, next.layer) };
  if (next.layer < prev.layer) return prev;
  const at = bindingKey(merged);
  const prevAt = bindingKey(prev.value);
  throw new PolicyError(
    `${what} lowers the budget to ${visits(after)} element visits (${describeBudget(merged)}) where ${visits(before)} (${describeBudget(prev.value)}) is in force`,
    at && merged.fieldWhere[at] || next.value.where,
    "an inheriting policy or a scope may raise the budget, never lower it: a smaller budget leaves requirements uncertain",
    [related(prevAt && prev.value.fieldWhere[prevAt] || prev.value.where, "the budget in force")]
  );
}
function sameRValue(a, b) {
  return JSON.stringify(a) === JSON.stringify(b);
}
function sameChallenge(a, b) {
  return a.engine === b.engine && JSON.stringify(a.params) === JSON.stringify(b.params);
}
function checkRequirement(r, challenges2, what) {
  if (r.kind === "n-1" || r.kind === "no-new-spof") return r;
  const c = challenges2.find((x) => x.name === r.challenge);
  if (!c) {
    const near = closest(r.challenge, challenges2.map((x) => x.name));
    throw new PolicyError(
      `${what} refers to challenge "${r.challenge}", which the policy does not define`,
      r.challengeWhere,
      near ? `did you mean "${near}"?` : `defined challenges: ${challenges2.map((x) => x.name).join(", ") || "none"}`
    );
  }
  if (r.kind === "spread-ceiling" && !c.random) {
    throw new PolicyError(
      `${what}: challenge "${c.name}" is a targeted attack (one curve), so it has no spread`,
      r.where,
      "use a random challenge",
      [related(c.where, `"${c.name}" is defined here`)]
    );
  }
  if (r.kind !== "r-threshold") return r;
  const s = r.statistic;
  if (s.kind === "worst-case") {
    const depth = c.params.worstCase ?? 0;
    if (r.statistic.kind === "worst-case" && s.removals > depth) {
      throw new PolicyError(
        `${what} asks for the worst ${s.removals} removals, but challenge "${c.name}" searches only ${depth} deep`,
        r.valueWhere,
        `set "worst-case: ${s.removals}" (or more) on challenge "${c.name}"`,
        [related(c.where, `"${c.name}" is defined here`)]
      );
    }
    return r;
  }
  if (!c.random) {
    if (s.kind === "quantile" || s.kind === "min" || s.kind === "mean") {
      throw new PolicyError(
        `${what}: challenge "${c.name}" is a targeted attack (one curve); "statistic: ${s.kind}" needs a random challenge`,
        r.where,
        'leave "statistic" out (the curve’s value is judged)',
        [related(c.where, `"${c.name}" is defined here`)]
      );
    }
    if (s.kind !== "value") {
      const normalized = { ...r, statistic: { kind: "value" } };
      normalized.id = requirementId(normalized);
      return normalized;
    }
  } else if (s.kind === "value") {
    throw new PolicyError(
      `${what}: challenge "${c.name}" is random; say which statistic of its envelope is judged`,
      r.where,
      "statistic: quantile (with q), median, mean or min"
    );
  }
  if (r.at !== void 0 && c.params.until !== void 0 && r.at > c.params.until + 1e-12) {
    throw new PolicyError(
      `${what} judges R at ${r.at}, beyond the end of challenge "${c.name}" (until ${c.params.until})`,
      r.where,
      `raise "until" of "${c.name}" or lower "at"`,
      [related(c.where, `"${c.name}" is defined here`)]
    );
  }
  return r;
}
function checkMetrics(spec, where) {
  for (const m of spec.metrics) {
    if (!isMetricId(m.id)) {
      throw new PolicyError(
        `metric "${m.id}" is not available in this version of netbrace`,
        where,
        `available: ${metrics.map((x) => x.id).join(", ")}`
      );
    }
  }
}
function describeRequirementSite(file, r, scope) {
  const list = scope === void 0 ? file.requirements : file.scopes[scope].requirements;
  const index = (list ?? []).indexOf(r);
  const req = index >= 0 ? `requirement ${index + 1}` : "a requirement";
  return scope === void 0 ? req : `scope ${scope + 1}, ${req}`;
}
function readChain(entry, read) {
  const chain = [];
  const seen = /* @__PURE__ */ new Set();
  let path = entry;
  let from;
  for (; ; ) {
    if (seen.has(path)) {
      throw new PolicyError(`"inherits" goes round in a circle back to ${path}`, from ?? { file: path }, "remove one of the inherits lines");
    }
    seen.add(path);
    const text2 = read(path);
    if (text2 === null) {
      if (from) throw new PolicyError(`the base policy ${path} does not exist`, from, "check the path; it is relative to this file");
      throw new PolicyError(`the policy file ${path} does not exist`, { file: path }, 'run "netbrace init" to write one');
    }
    const file = parsePolicyFile(text2, path);
    chain.unshift(file);
    if (!file.inherits) break;
    from = file.inherits.where;
    path = file.inherits.path;
  }
  return chain;
}
function builtinPolicy() {
  return { ...mergeChain([builtin()]), source: "builtin", files: [] };
}
function loadPolicy(entry, read) {
  return mergeChain(readChain(entry, read));
}
function mergeChain(chain) {
  const root = chain[0];
  const base = builtin();
  const challenges2 = /* @__PURE__ */ new Map();
  for (const c of root.challenges ?? base.challenges ?? []) challenges2.set(c.name, c);
  let rValue = { spec: (root.rValue ?? base.rValue).spec, where: (root.rValue ?? base.rValue).where };
  checkMetrics(rValue.spec, rValue.where);
  let designs = root.designs ?? base.designs ?? [];
  const exclude = [...root.exclude?.globs ?? []];
  let seed = (root.seed ?? base.seed)?.value ?? 1;
  let weakening = { value: root.weakening ?? base.weakening, layer: 0 };
  let removed = {
    value: root.removedDesigns ?? base.removedDesigns ?? { severity: "notice" },
    layer: 0
  };
  let budget = { value: root.budget ?? base.budget, layer: 0 };
  const requirements = [];
  const rootReqs = root.requirements ?? (root.challenges === void 0 ? base.requirements ?? [] : (base.requirements ?? []).filter((r) => !("challenge" in r) || challenges2.has(r.challenge)));
  for (const r of rootReqs) requirements.push({ value: r, layer: 0 });
  chain.forEach((file, layer) => {
    if (layer === 0) return;
    if (file.rValue && !sameRValue(file.rValue.spec, rValue.spec)) {
      throw new PolicyError(
        "an inheriting policy cannot change the r-value of the policy it inherits",
        file.rValue.where,
        'the floors of the base policy are measured in its R; remove "r-value" here',
        [related(rValue.where, "the r-value in force")]
      );
    }
    for (const c of file.challenges ?? []) {
      const prev = challenges2.get(c.name) ?? [...challenges2.values()].find((x) => x.engine === c.engine);
      if (prev && !sameChallenge(prev, c)) {
        throw new PolicyError(
          `challenge "${c.name}" redefines challenge "${prev.name}" of the policy it inherits`,
          c.where,
          "an inheriting policy may add challenges, not change them",
          [related(prev.where, `"${prev.name}" is defined here`)]
        );
      }
      if (!prev) challenges2.set(c.name, c);
    }
    if (file.designs) designs = [...designs, ...file.designs];
    for (const g of file.exclude?.globs ?? []) {
      if (!exclude.includes(g)) {
        throw new PolicyError(
          `an inheriting policy cannot exclude "${g}": the policy it inherits judges those files`,
          file.exclude.where,
          "exclude the files in the base policy, or narrow the designs there"
        );
      }
    }
    if (file.seed) seed = file.seed.value;
    for (const r of file.requirements ?? []) {
      mergeRequirement(requirements, { value: r, layer }, describeRequirementSite(file, r));
    }
    if (file.weakening) weakening = mergeWeakening(weakening, { value: file.weakening, layer }, "weakening");
    if (file.removedDesigns) removed = mergeRemoved(removed, { value: file.removedDesigns, layer }, "the policy");
    if (file.budget) budget = mergeBudget(budget, { value: file.budget, layer }, "the policy");
  });
  const challengeList = [...challenges2.values()];
  const checked = requirements.map((r) => ({
    ...r,
    value: checkRequirement(r.value, challengeList, describeRequirementSite(chain[r.layer] ?? root, r.value))
  }));
  const scopes = [];
  chain.forEach(
    (file, layer) => file.scopes.forEach((o, i) => {
      const what = (r) => describeRequirementSite(file, r, i);
      const requirementsChecked = o.requirements.map((r) => checkRequirement(r, challengeList, what(r)));
      const scratch = checked.map((r) => ({ ...r }));
      for (const r of requirementsChecked) mergeRequirement(scratch, { value: r, layer }, what(r));
      if (o.weakening) mergeWeakening(weakening, { value: o.weakening, layer }, `scope ${i + 1}, weakening`);
      if (o.removedDesigns) mergeRemoved(removed, { value: o.removedDesigns, layer }, `scope ${i + 1}`);
      if (o.budget) mergeBudget(budget, { value: o.budget, layer }, `scope ${i + 1}`);
      scopes.push({ ...o, requirements: requirementsChecked, layer });
    })
  );
  return {
    source: "file",
    files: chain.map((f) => f.path).reverse(),
    designs,
    exclude,
    seed,
    rValue: rValue.spec,
    challenges: challengeList,
    requirements: checked.map((r) => r.value),
    weakening: weakening.value,
    removedDesigns: removed.value,
    budget: budget.value,
    scopes,
    layers: { requirements: checked.map((r) => r.layer), weakening: weakening.layer, removed: removed.layer, budget: budget.layer }
  };
}
var matchers = /* @__PURE__ */ new Map();
function matches(globs2, given) {
  const path = given.replace(/[\r\n\u2028\u2029]/g, "");
  return globs2.some((g) => {
    let m = matchers.get(g);
    if (!m) {
      m = (0, import_picomatch.default)(g, { dot: true });
      matchers.set(g, m);
    }
    return m(path);
  });
}
function isDesignPath(policy, path) {
  return policy.designs.some((d) => matches(d.paths, path)) && !matches(policy.exclude, path);
}
function policyForFile(policy, path) {
  const layers = policy.layers;
  const requirements = policy.requirements.map((value, i) => ({ value, layer: layers.requirements[i] }));
  let weakening = { value: policy.weakening, layer: layers.weakening };
  let removed = { value: policy.removedDesigns, layer: layers.removed };
  let budget = { value: policy.budget, layer: layers.budget };
  for (const o of policy.scopes) {
    if (!matches(o.paths, path)) continue;
    const { layer } = o;
    const what = `a scope matching ${path}`;
    for (const r of o.requirements) mergeRequirement(requirements, { value: r, layer }, what);
    if (o.weakening) weakening = mergeWeakening(weakening, { value: o.weakening, layer }, `${what}:`);
    if (o.removedDesigns) removed = mergeRemoved(removed, { value: o.removedDesigns, layer }, what);
    if (o.budget) budget = mergeBudget(budget, { value: o.budget, layer }, what);
  }
  const b = budget.value;
  const format = policy.designs.find((d) => d.format !== void 0 && matches(d.paths, path))?.format;
  return {
    rValue: policy.rValue,
    seed: policy.seed,
    challenges: policy.challenges,
    requirements: requirements.map((r) => r.value),
    weakening: weakening.value,
    removedDesigns: removed.value.severity,
    budget: { ...b.work !== void 0 ? { work: b.work } : {}, ...b.seconds !== void 0 ? { seconds: b.seconds } : {}, maxWork: budgetWork(b) },
    ...format ? { format } : {}
  };
}

// src/report/report.ts
var REPORT_VERSION = 1;
var CAUTION = "netbrace evaluates topology-level robustness under the stated assumptions (the metrics, challenges and removal models in the policy). It informs engineering judgement; it does not replace engineering studies. Local codes, regulators’ standards and licensed practice decide for real infrastructure, power systems especially.";
var REPORT_DIGITS = 12;
function serializeReport(report) {
  return `${JSON.stringify(
    report,
    (_key, value) => {
      if (typeof value !== "number") return value;
      if (!Number.isFinite(value)) return null;
      if (Number.isInteger(value)) return value;
      const rounded = Number(value.toPrecision(REPORT_DIGITS));
      return Object.is(rounded, -0) ? 0 : rounded;
    },
    2
  )}
`;
}

// src/topology/model.ts
var DEFAULT_MAX_BYTES = 20 * 1024 * 1024;
var DEFAULT_MAX_ELEMENTS = 2e6;
function linkKey(source, target, occurrence) {
  const [a, b] = source <= target ? [source, target] : [target, source];
  return occurrence > 1 ? `${a}—${b}#${occurrence}` : `${a}—${b}`;
}

// src/topology/detect.ts
var BY_EXTENSION = [
  [".net.yaml", "native-yaml"],
  [".net.yml", "native-yaml"],
  [".net.json", "native-json"],
  [".yaml", "native-yaml"],
  [".yml", "native-yaml"],
  [".json", "native-json"],
  [".graphml", "graphml"],
  [".gml", "gml"],
  [".csv", "csv"]
];
function detectFormat(file) {
  const lower = file.toLowerCase();
  for (const [ext, format] of BY_EXTENSION) if (lower.endsWith(ext)) return format;
  return void 0;
}
var FORMAT_CHOICES = "yaml, json, graphml, gml, csv";

// src/topology/native.ts
var import_ajv2 = __toESM(require_ajv(), 1);
var import_yaml3 = __toESM(require_dist(), 1);

// src/topology/design.schema.json
var design_schema_default = {
  $schema: "http://json-schema.org/draft-07/schema#",
  $id: "urn:netbrace:design:1",
  title: "netbrace design file",
  description: "A network design for netbrace: nodes, links between them, optional shared-risk link groups, traffic demands and free-form metadata. Written as YAML (.net.yaml) or JSON (.net.json).",
  type: "object",
  additionalProperties: false,
  required: ["nodes"],
  properties: {
    network: {
      description: "What this design is.",
      type: "object",
      additionalProperties: false,
      properties: {
        name: { type: "string" },
        description: { type: "string" }
      }
    },
    nodes: {
      description: "Sites, routers, switches, substations: anything a link ends at.",
      type: "array",
      items: { $ref: "#/definitions/node" }
    },
    links: {
      description: "Undirected links. Two links between the same pair are kept: they are physical redundancy.",
      type: "array",
      items: { $ref: "#/definitions/link" }
    },
    risk_groups: {
      description: "Descriptions of shared-risk link groups (SRLG, RFC 4202): links that fail together, e.g. fibres in one duct. Groups named by links but not described here still count.",
      type: "array",
      items: { $ref: "#/definitions/riskGroup" }
    },
    demands: {
      description: "Traffic demands between node pairs.",
      type: "array",
      items: { $ref: "#/definitions/demand" }
    },
    latency_budget: {
      description: "How much longer than the intact network's path a demand's path may become and still count as served (1.5 = 50 % longer).",
      type: "number",
      minimum: 1
    },
    metadata: {
      description: "Anything else you want to keep with the design; netbrace carries it into reports and ignores it otherwise.",
      type: "object"
    }
  },
  definitions: {
    id: {
      type: ["string", "integer"],
      minLength: 1
    },
    node: {
      type: "object",
      additionalProperties: false,
      required: ["id"],
      properties: {
        id: { $ref: "#/definitions/id" },
        label: { description: "A human name for reports.", type: "string" },
        kind: { description: "Free text: router, pop, datacentre, substation, ...", type: "string" },
        site: {
          description: "Where the node is, in degrees (WGS 84).",
          type: "object",
          additionalProperties: false,
          required: ["lat", "lon"],
          properties: {
            lat: { type: "number", minimum: -90, maximum: 90 },
            lon: { type: "number", minimum: -180, maximum: 180 }
          }
        },
        hardened: { description: "Never removed by a challenge.", type: "boolean" }
      }
    },
    link: {
      type: "object",
      additionalProperties: false,
      required: ["between"],
      properties: {
        id: { $ref: "#/definitions/id" },
        between: {
          description: "The two node ids the link joins.",
          type: "array",
          items: { $ref: "#/definitions/id" },
          minItems: 2,
          maxItems: 2
        },
        length_km: { type: "number", minimum: 0 },
        latency_ms: { type: "number", minimum: 0 },
        capacity_gbps: { type: "number", minimum: 0 },
        risk_groups: {
          description: "Ids of the shared-risk link groups this link belongs to.",
          type: "array",
          items: { $ref: "#/definitions/id" }
        },
        hardened: { description: "Never removed by a challenge.", type: "boolean" }
      }
    },
    riskGroup: {
      type: "object",
      additionalProperties: false,
      required: ["id"],
      properties: {
        id: { $ref: "#/definitions/id" },
        description: { type: "string" }
      }
    },
    demand: {
      type: "object",
      additionalProperties: false,
      required: ["between", "volume"],
      properties: {
        between: {
          type: "array",
          items: { $ref: "#/definitions/id" },
          minItems: 2,
          maxItems: 2
        },
        volume: { type: "number", minimum: 0 }
      }
    }
  }
};

// src/topology/builder.ts
var MAX_ID_LENGTH = 256;
var DASH = "—";
var TopologyBuilder = class {
  file;
  format;
  maxElements;
  duplicateLinkIds;
  nodes = [];
  links = [];
  nodeLine = /* @__PURE__ */ new Map();
  linkIds = /* @__PURE__ */ new Map();
  /** Occurrences of each unordered end pair so far, for parallel-link keys. */
  pairCount = /* @__PURE__ */ new Map();
  warnings = [];
  riskGroups = [];
  riskGroupPos = /* @__PURE__ */ new Map();
  demands = [];
  constructor(file, format, options = {}) {
    this.file = file;
    this.format = format;
    this.maxElements = options.maxElements ?? DEFAULT_MAX_ELEMENTS;
    this.duplicateLinkIds = options.duplicateLinkIds ?? "warn";
  }
  get nodeCount() {
    return this.nodes.length;
  }
  hasNode(id) {
    return this.nodeLine.has(id);
  }
  /** A located DesignError in this file. */
  error(message, pos, hint = "") {
    return new DesignError(message, { file: this.file, line: pos?.line ?? 0, column: pos?.column ?? 0 }, hint);
  }
  warn(message, pos, hint) {
    this.warnings.push({
      file: this.file,
      line: pos?.line ?? 0,
      column: pos?.column ?? 0,
      severity: "warning",
      message,
      ...hint ? { hint } : {}
    });
  }
  /** Refuses an id longer than MAX_ID_LENGTH (LimitError at the element). */
  checkId(id, what, pos) {
    if (id.length <= MAX_ID_LENGTH) return;
    throw new LimitError(
      `${what} is ${id.length} characters long; netbrace accepts ids of at most ${MAX_ID_LENGTH} ("${id.slice(0, 24)}…")`,
      { file: this.file, line: pos?.line ?? 0, column: pos?.column ?? 0 },
      "use a short id and put the long name in a label"
    );
  }
  countElement(pos) {
    if (this.nodes.length + this.links.length >= this.maxElements) {
      throw new LimitError(
        `the design has more than ${this.maxElements} elements (nodes + links)`,
        { file: this.file, line: pos.line, column: pos.column },
        "split the design, or raise the element limit if this size is intended"
      );
    }
  }
  addNode(input) {
    this.checkId(input.id, "a node id", input.pos);
    const first = this.nodeLine.get(input.id);
    if (first !== void 0) {
      throw this.error(`duplicate node id "${input.id}"`, input.pos, `first defined on line ${first.line}; node ids must be unique`);
    }
    this.countElement(input.pos);
    this.nodeLine.set(input.id, input.pos);
    const node = { id: input.id, hardened: input.hardened ?? false, pos: input.pos, attrs: input.attrs ?? {} };
    if (input.label !== void 0) node.label = input.label;
    if (input.kind !== void 0) node.kind = input.kind;
    if (input.lat !== void 0 && input.lon !== void 0) {
      node.lat = input.lat;
      node.lon = input.lon;
    }
    this.nodes.push(node);
  }
  requireNode(id, pos, what) {
    if (this.nodeLine.has(id)) return;
    this.checkId(id, `a node id in ${what}`, pos);
    throw this.error(
      `${what} refers to unknown node "${id}"`,
      pos,
      didYouMean(id, this.nodeLine.keys(), "declare the node first, or fix the id")
    );
  }
  /** Adds a link; returns false when it was dropped (a self-loop). */
  addLink(input) {
    if (input.id !== void 0) this.checkId(input.id, "a link id", input.pos);
    for (const g of input.riskGroups ?? []) this.checkId(g, "a risk group id of a link", input.pos);
    const what = input.what ?? (input.id !== void 0 ? `link "${input.id}"` : `link on line ${input.pos.line}`);
    this.requireNode(input.source, input.sourcePos ?? input.pos, what);
    this.requireNode(input.target, input.targetPos ?? input.pos, what);
    if (input.source === input.target) {
      this.warn(`self-loop on node "${input.source}" dropped`, input.pos, "a link from a node to itself adds no connectivity");
      return false;
    }
    this.countElement(input.pos);
    const pairKey = input.source <= input.target ? `${input.source}\0${input.target}` : `${input.target}\0${input.source}`;
    const occurrence = (this.pairCount.get(pairKey) ?? 0) + 1;
    this.pairCount.set(pairKey, occurrence);
    let id = input.id;
    if (id !== void 0) {
      const first = this.linkIds.get(id);
      if (first !== void 0) {
        if (this.duplicateLinkIds === "error") {
          throw this.error(`duplicate link id "${id}"`, input.pos, `first used on line ${first.line}; link ids must be unique`);
        }
        this.warn(`duplicate link id "${id}" (first on line ${first.line}); the link is named by its ends instead`, input.pos);
        id = void 0;
      }
    }
    if (id === void 0) {
      const base = `${input.source}${DASH}${input.target}`;
      id = occurrence > 1 ? `${base}#${occurrence}` : base;
      for (let k = 2; this.linkIds.has(id); k++) id = `${base}#${occurrence}.${k}`;
    }
    this.linkIds.set(id, input.pos);
    const link = {
      id,
      key: linkKey(input.source, input.target, occurrence),
      source: input.source,
      target: input.target,
      riskGroups: input.riskGroups ?? [],
      hardened: input.hardened ?? false,
      pos: input.pos,
      attrs: input.attrs ?? {}
    };
    if (input.length !== void 0) link.length = input.length;
    if (input.latency !== void 0) link.latency = input.latency;
    if (input.capacity !== void 0) link.capacity = input.capacity;
    if (input.weight !== void 0) link.weight = input.weight;
    this.links.push(link);
    return true;
  }
  addRiskGroup(group) {
    this.checkId(group.id, "a risk group id", group.pos);
    const first = this.riskGroupPos.get(group.id);
    if (first) throw this.error(`duplicate risk group id "${group.id}"`, group.pos, `first described on line ${first.line}`);
    this.riskGroupPos.set(group.id, group.pos);
    this.riskGroups.push(group);
  }
  addDemand(source, target, volume, pos, endPos, what = "demand") {
    this.requireNode(source, endPos?.[0] ?? pos, what);
    this.requireNode(target, endPos?.[1] ?? pos, what);
    if (source === target) throw this.error(`${what} goes from node "${source}" to itself`, pos, "a demand needs two different ends");
    this.demands.push({ source, target, volume, pos });
  }
  finish(extra = {}) {
    const t = {
      file: this.file,
      format: this.format,
      nodes: this.nodes,
      links: this.links,
      riskGroups: this.riskGroups,
      demands: this.demands,
      metadata: extra.metadata ?? {},
      warnings: this.warnings
    };
    if (extra.name !== void 0) t.name = extra.name;
    if (extra.latencyBudget !== void 0) t.latencyBudget = extra.latencyBudget;
    return t;
  }
};

// src/topology/native.ts
var MAX_ALIAS_COUNT2 = 50;
var Ajv2 = import_ajv2.default.default ?? import_ajv2.default;
var validator2;
function validate2() {
  validator2 ??= new Ajv2({ allErrors: true, verbose: true, strict: true, allowUnionTypes: true }).compile(design_schema_default);
  return validator2;
}
var Locator = class {
  constructor(doc, lines) {
    this.doc = doc;
    this.lines = lines;
  }
  doc;
  lines;
  at(offset) {
    const p = this.lines.linePos(offset);
    return { line: p.line, column: p.col };
  }
  child(node, key) {
    if ((0, import_yaml3.isAlias)(node)) node = node.resolve(this.doc);
    if (!(0, import_yaml3.isCollection)(node)) return void 0;
    if (typeof key === "number" && !(0, import_yaml3.isMap)(node)) return node.items[key];
    for (const item of node.items) {
      if ((0, import_yaml3.isPair)(item)) {
        const k = (0, import_yaml3.isScalar)(item.key) ? item.key.value : item.key;
        if (String(k) === String(key)) return item.value;
      }
    }
    return void 0;
  }
  /** The YAML node at a path (the deepest one that exists) and whether it was found whole. */
  node(path) {
    let cur = this.doc.contents;
    let last = cur ?? void 0;
    for (const key of path) {
      const next = this.child(cur, key);
      if (next === void 0 || next === null) return { node: last, exact: false };
      cur = next;
      last = next;
    }
    return { node: last, exact: true };
  }
  pos(path) {
    const { node } = this.node(path);
    return node?.range ? this.at(node.range[0]) : { line: 1, column: 1 };
  }
  /** Where the key `name` of the map at `path` is written. */
  keyPos(path, name) {
    let { node } = this.node(path);
    if ((0, import_yaml3.isAlias)(node)) node = node.resolve(this.doc);
    if ((0, import_yaml3.isMap)(node)) {
      for (const item of node.items) {
        const k = item.key;
        if ((0, import_yaml3.isScalar)(k) && String(k.value) === name && k.range) return this.at(k.range[0]);
      }
    }
    return this.pos(path);
  }
};
function pathText(path) {
  let s = "";
  for (const k of path) s += typeof k === "number" ? `[${k}]` : s === "" ? k : `.${k}`;
  return s === "" ? "the design" : s;
}
function splitPointer(pointer) {
  if (pointer === "") return [];
  return pointer.slice(1).split("/").map((seg) => seg.replace(/~1/g, "/").replace(/~0/g, "~")).map((seg) => /^\d+$/.test(seg) ? Number(seg) : seg);
}
function describe(v) {
  if (v === null) return "empty (null)";
  if (Array.isArray(v)) return "a list";
  if (typeof v === "string") return `the text "${v.length > 40 ? `${v.slice(0, 40)}…` : v}"`;
  if (typeof v === "object") return "a mapping";
  return `${typeof v} ${String(v)}`;
}
var TYPE_WORDS2 = {
  number: "a number",
  integer: "a whole number",
  string: "text",
  boolean: "true or false",
  object: "a mapping (key: value)",
  array: "a list",
  "string,integer": "an id (text or a whole number)"
};
function toDesignError(e, file, loc) {
  const path = splitPointer(e.instancePath);
  const where = (pos) => ({ file, line: pos.line, column: pos.column });
  const what = pathText(path);
  const params = e.params;
  switch (e.keyword) {
    case "additionalProperties": {
      const key = String(params.additionalProperty);
      const allowed = Object.keys(e.parentSchema?.properties ?? {});
      return new DesignError(
        `unknown key "${key}" in ${what}`,
        where(loc.keyPos(path, key)),
        didYouMean(key, allowed, `allowed keys: ${allowed.join(", ")}`)
      );
    }
    case "required": {
      const key = String(params.missingProperty);
      if (key === "between" && path[0] === "links") {
        return new DesignError(`${what} has no ends: "between" is missing`, where(loc.pos(path)), "write between: [node-a, node-b]");
      }
      return new DesignError(`${what} is missing the required key "${key}"`, where(loc.pos(path)));
    }
    case "type": {
      const want = TYPE_WORDS2[String(params.type)] ?? String(params.type);
      return new DesignError(`${what} must be ${want}, not ${describe(e.data)}`, where(loc.pos(path)), e.data === null ? "give a value after the colon, or remove the key" : "");
    }
    case "minItems":
    case "maxItems": {
      const n = Array.isArray(e.data) ? e.data.length : 0;
      if (path[path.length - 1] === "between") {
        return new DesignError(
          `${what} needs exactly two node ids, found ${n}`,
          where(loc.pos(path)),
          n < 2 ? "a link end is missing: write between: [node-a, node-b]" : "a link joins two nodes; write one link per pair"
        );
      }
      return new DesignError(`${what} ${e.message ?? "has the wrong number of items"}`, where(loc.pos(path)));
    }
    case "minimum":
    case "exclusiveMinimum": {
      const limit = Number(params.limit);
      const message = limit === 0 ? `${what} must not be negative (found ${String(e.data)})` : `${what} must be at least ${limit} (found ${String(e.data)})`;
      return new DesignError(message, where(loc.pos(path)));
    }
    case "maximum":
      return new DesignError(`${what} must be at most ${String(params.limit)} (found ${String(e.data)})`, where(loc.pos(path)));
    case "minLength":
      return new DesignError(`${what} must not be empty`, where(loc.pos(path)));
    default:
      return new DesignError(`${what} ${e.message ?? "is not valid"}`, where(loc.pos(path)));
  }
}
function firstError(errors, file, loc) {
  const located = errors.map((e) => toDesignError(e, file, loc));
  located.sort((a, b) => a.line - b.line || a.column - b.column);
  return located[0];
}
function parseNative(text2, file, options = {}, format = "native-yaml") {
  const kindWord = format === "native-json" ? "JSON" : "YAML";
  const deep = yamlNestingExceeded(text2);
  if (deep >= 0) {
    throw new DesignError(
      `the ${kindWord} nests deeper than ${MAX_NESTING} levels`,
      { file, ...positionOf(text2, deep) },
      "a design needs a few levels of nesting; flatten this structure"
    );
  }
  const lines = new import_yaml3.LineCounter();
  const doc = (0, import_yaml3.parseDocument)(text2, { lineCounter: lines, prettyErrors: false, uniqueKeys: true, strict: true });
  const loc = new Locator(doc, lines);
  if (doc.errors.length > 0) {
    const e = doc.errors[0];
    if (e.code === "DUPLICATE_KEY") {
      throw new DesignError(`${kindWord}: a key appears twice in the same mapping`, { file, ...loc.at(e.pos[0]) }, "keep one of them");
    }
    const message = e.message.split("\n")[0].replace(/ at line \d+, column \d+:?$/, "");
    throw new DesignError(`${kindWord} syntax error: ${message}`, { file, ...loc.at(e.pos[0]) }, "fix the syntax at this point (check indentation, colons and quotes)");
  }
  let data;
  try {
    data = doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT2 });
  } catch (e) {
    if (e instanceof ReferenceError || e instanceof Error && /alias/i.test(e.message)) {
      let first = { line: 1, column: 1 };
      (0, import_yaml3.visit)(doc, {
        Alias(_, node) {
          if (node.range) first = loc.at(node.range[0]);
          return import_yaml3.visit.BREAK;
        }
      });
      throw new DesignError(
        "too many YAML aliases are expanded (this looks like an alias bomb)",
        { file, ...first },
        `netbrace expands at most ${MAX_ALIAS_COUNT2} aliases; write the values out instead of using *aliases`
      );
    }
    throw e;
  }
  if (data === null || data === void 0) {
    throw new DesignError(`the ${kindWord} design is empty`, { file, line: 1, column: 1 }, "a design needs at least `nodes:`");
  }
  const check2 = validate2();
  if (!check2(data)) throw firstError(check2.errors ?? [], file, loc);
  const d = data;
  const b = new TopologyBuilder(file, format, { ...options, duplicateLinkIds: "error" });
  for (const w of doc.warnings) b.warn(`${kindWord}: ${w.message.split("\n")[0]}`, loc.at(w.pos[0]));
  d.nodes.forEach((n, i) => {
    b.addNode({
      id: String(n.id),
      pos: loc.pos(["nodes", i]),
      ...n.label !== void 0 ? { label: n.label } : {},
      ...n.kind !== void 0 ? { kind: n.kind } : {},
      ...n.site ? { lat: n.site.lat, lon: n.site.lon } : {},
      hardened: n.hardened ?? false
    });
  });
  (d.risk_groups ?? []).forEach((g, i) => {
    b.addRiskGroup({ id: String(g.id), pos: loc.pos(["risk_groups", i]), ...g.description !== void 0 ? { description: g.description } : {} });
  });
  (d.links ?? []).forEach((l, i) => {
    const at = ["links", i];
    b.addLink({
      what: l.id !== void 0 ? `link "${String(l.id)}" (links[${i}])` : `links[${i}]`,
      ...l.id !== void 0 ? { id: String(l.id) } : {},
      source: String(l.between[0]),
      target: String(l.between[1]),
      pos: loc.pos(at),
      sourcePos: loc.pos([...at, "between", 0]),
      targetPos: loc.pos([...at, "between", 1]),
      ...l.length_km !== void 0 ? { length: l.length_km } : {},
      ...l.latency_ms !== void 0 ? { latency: l.latency_ms } : {},
      ...l.capacity_gbps !== void 0 ? { capacity: l.capacity_gbps } : {},
      riskGroups: (l.risk_groups ?? []).map(String),
      hardened: l.hardened ?? false
    });
  });
  (d.demands ?? []).forEach((dm, i) => {
    const at = ["demands", i];
    b.addDemand(String(dm.between[0]), String(dm.between[1]), dm.volume, loc.pos(at), [
      loc.pos([...at, "between", 0]),
      loc.pos([...at, "between", 1])
    ], `demands[${i}]`);
  });
  const t = b.finish({
    ...d.network?.name !== void 0 ? { name: d.network.name } : {},
    ...d.latency_budget !== void 0 ? { latencyBudget: d.latency_budget } : {},
    metadata: d.metadata ?? {}
  });
  if (d.network?.description !== void 0) t.description = d.network.description;
  return t;
}

// src/topology/attributes.ts
var NODE_FIELDS = {
  label: "label",
  name: "label",
  type: "kind",
  kind: "kind",
  latitude: "lat",
  lat: "lat",
  longitude: "lon",
  lon: "lon",
  lng: "lon",
  long: "lon",
  x: "x",
  y: "y",
  hardened: "hardened"
};
var LINK_FIELDS = {
  weight: "weight",
  cost: "weight",
  length: "length",
  length_km: "length",
  distance: "length",
  linklength: "length",
  latency: "latency",
  latency_ms: "latency",
  delay: "latency",
  linklatency: "latency",
  linkdelay: "latency",
  capacity: "capacity",
  capacity_gbps: "capacity",
  bandwidth: "capacity",
  // The zoo's raw link speed is in bit/s; capacity is kept in Gbit/s.
  linkspeedraw: "bitrate",
  risk_groups: "riskGroups",
  srlg: "riskGroups",
  srlgs: "riskGroups",
  hardened: "hardened"
};
function toNumber(v) {
  if (typeof v === "number") return Number.isFinite(v) ? v : void 0;
  if (typeof v !== "string") return void 0;
  const s = v.trim();
  if (s === "" || !/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s)) return void 0;
  const n = Number(s);
  return Number.isFinite(n) ? n : void 0;
}
function toFlag(v) {
  if (typeof v === "boolean") return v;
  if (typeof v === "number") return v !== 0;
  if (typeof v !== "string") return void 0;
  const s = v.trim().toLowerCase();
  if (["1", "true", "yes", "y"].includes(s)) return true;
  if (["0", "false", "no", "n", ""].includes(s)) return false;
  return void 0;
}
var text = (v) => typeof v === "string" ? v : String(v);
function mapNodeAttributes(raw, b, posOf) {
  const out = { attrs: {} };
  let x;
  let y;
  let lat;
  let lon;
  for (const [name, value] of Object.entries(raw)) {
    const field = NODE_FIELDS[name.toLowerCase()];
    if (field === "label") out.label = text(value);
    else if (field === "kind") out.kind = text(value);
    else if (field === "hardened") {
      const f = toFlag(value);
      if (f === void 0) throw b.error(`"${name}" must be true/false or 1/0, not "${text(value)}"`, posOf(name));
      out.hardened = f;
    } else if (field === "lat" || field === "lon" || field === "x" || field === "y") {
      const n = toNumber(value);
      if (n === void 0) {
        b.warn(`node coordinate "${name}" is not a number ("${text(value)}"); ignored`, posOf(name));
        out.attrs[name] = value;
        continue;
      }
      if (field === "lat") lat = [n, name];
      else if (field === "lon") lon = [n, name];
      else if (field === "x") x = [n, name];
      else y = [n, name];
      out.attrs[name] = value;
    } else {
      out.attrs[name] = value;
    }
  }
  if (lat === void 0 && lon === void 0 && x !== void 0 && y !== void 0) {
    lat = y;
    lon = x;
  }
  if (lat !== void 0 && lon !== void 0) {
    for (const name of [lat[1], lon[1]]) delete out.attrs[name];
    if (Math.abs(lat[0]) <= 90 && Math.abs(lon[0]) <= 180) {
      out.lat = lat[0];
      out.lon = lon[0];
    } else {
      b.warn(`coordinates ${lat[1]}=${lat[0]}, ${lon[1]}=${lon[0]} are not a latitude/longitude; ignored`, posOf(lat[1]));
      out.attrs[lat[1]] = lat[0];
      out.attrs[lon[1]] = lon[0];
    }
  } else if (lat === void 0 !== (lon === void 0)) {
    const only = lat ?? lon;
    b.warn(`node has "${only[1]}" but not the other coordinate; no site recorded`, posOf(only[1]));
  }
  return out;
}
function mapLinkAttributes(raw, b, posOf) {
  const out = { attrs: {} };
  for (const [name, value] of Object.entries(raw)) {
    const field = LINK_FIELDS[name.toLowerCase()];
    if (field === void 0) {
      out.attrs[name] = value;
      continue;
    }
    if (field === "riskGroups") {
      out.riskGroups = text(value).split(";").map((s) => s.trim()).filter((s) => s !== "");
      continue;
    }
    if (field === "hardened") {
      const f = toFlag(value);
      if (f === void 0) throw b.error(`"${name}" must be true/false or 1/0, not "${text(value)}"`, posOf(name));
      out.hardened = f;
      continue;
    }
    if (typeof value === "string" && value.trim() === "") continue;
    const n = toNumber(value);
    if (field === "bitrate") {
      if (n !== void 0 && n >= 0) out.capacity ??= n / 1e9;
      out.attrs[name] = value;
      continue;
    }
    if (n === void 0) throw b.error(`link ${name} must be a number, not "${text(value)}"`, posOf(name), "write a plain decimal number");
    if (n < 0) throw b.error(`link ${name} must not be negative (${n})`, posOf(name));
    if (field === "capacity") out.capacity = n;
    else out[field] = n;
  }
  return out;
}

// src/topology/gml.ts
var ENTITIES = { quot: '"', amp: "&", lt: "<", gt: ">", apos: "'" };
function unescape(s) {
  if (!s.includes("&")) return s;
  return s.replace(/&(#x[0-9a-fA-F]+|#\d+|[a-zA-Z]+);/g, (m, body) => {
    if (body[0] === "#") {
      const code = body[1] === "x" || body[1] === "X" ? parseInt(body.slice(2), 16) : parseInt(body.slice(1), 10);
      return code >= 0 && code <= 1114111 ? String.fromCodePoint(code) : m;
    }
    return ENTITIES[body] ?? m;
  });
}
var KEY = /[A-Za-z_][A-Za-z0-9_]*/y;
var NUMBER = /[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/y;
var GmlReader = class {
  constructor(text2, b) {
    this.text = text2;
    this.b = b;
  }
  text;
  b;
  i = 0;
  line = 1;
  lineStart = 0;
  /** Lists open; bounded so that hostile nesting is an error, not a stack overflow. */
  depth = 0;
  here() {
    return { line: this.line, column: this.i - this.lineStart + 1 };
  }
  /** Skip white space and `#` comments, counting lines. */
  skip() {
    const t = this.text;
    while (this.i < t.length) {
      const c = t.charCodeAt(this.i);
      if (c === 10) {
        this.i++;
        this.line++;
        this.lineStart = this.i;
      } else if (c === 32 || c === 9 || c === 13 || c === 65279) {
        this.i++;
      } else if (c === 35) {
        while (this.i < t.length && t.charCodeAt(this.i) !== 10) this.i++;
      } else {
        return;
      }
    }
  }
  /** Reads pairs until `]` (nested) or the end of the text (top level). */
  readList(open) {
    const pairs = [];
    const t = this.text;
    for (; ; ) {
      this.skip();
      if (this.i >= t.length) {
        if (open) {
          throw this.b.error('unclosed "[": the list is never closed with "]"', open, 'add the missing "]" (check the brackets above the end of the file)');
        }
        return pairs;
      }
      if (t[this.i] === "]") {
        if (open) {
          this.i++;
          return pairs;
        }
        throw this.b.error('unexpected "]" with no open "["', this.here(), 'remove it, or add the "[" it closes');
      }
      const pos = this.here();
      KEY.lastIndex = this.i;
      const key = KEY.exec(t);
      if (!key) throw this.b.error(`expected a key, found "${t[this.i]}"`, pos, "GML is a list of `key value` pairs; keys are letters, digits and _");
      this.i += key[0].length;
      this.skip();
      pairs.push(this.readValue(key[0], pos));
    }
  }
  readValue(key, pos) {
    const t = this.text;
    const vpos = this.here();
    if (this.i >= t.length) throw this.b.error(`key "${key}" has no value`, pos, 'give a number, a "string" or a [ list ]');
    const c = t[this.i];
    if (c === "[") {
      if (++this.depth > MAX_NESTING) {
        throw this.b.error(`lists nest deeper than ${MAX_NESTING} levels`, vpos, "a GML design needs a few levels (graph, node, graphics); flatten this structure");
      }
      this.i++;
      const value = this.readList(vpos);
      this.depth--;
      return { key, value, raw: "", pos };
    }
    if (c === '"') {
      const start = this.i + 1;
      const end = t.indexOf('"', start);
      if (end < 0) throw this.b.error(`unterminated string for key "${key}"`, vpos, "close it with a double quote");
      const raw = t.slice(start, end);
      for (let k = start; k < end; k++) {
        if (t.charCodeAt(k) === 10) {
          this.line++;
          this.lineStart = k + 1;
        }
      }
      this.i = end + 1;
      return { key, value: unescape(raw), raw, pos };
    }
    NUMBER.lastIndex = this.i;
    const num2 = NUMBER.exec(t);
    if (num2) {
      this.i += num2[0].length;
      return { key, value: Number(num2[0]), raw: num2[0], pos };
    }
    throw this.b.error(`value of "${key}" is not a number, a "string" or a [ list ]`, vpos);
  }
};
function toPlain(pairs) {
  const out = {};
  for (const p of pairs) {
    const v = Array.isArray(p.value) ? toPlain(p.value) : p.value;
    if (p.key in out) {
      const prev = out[p.key];
      out[p.key] = Array.isArray(prev) ? [...prev, v] : [prev, v];
    } else out[p.key] = v;
  }
  return out;
}
function scalarId(p) {
  if (Array.isArray(p.value)) return void 0;
  return typeof p.value === "number" ? p.raw : p.value;
}
function parseGml(text2, file, options = {}, format = "gml") {
  const b = new TopologyBuilder(file, format, options);
  const top = new GmlReader(text2, b).readList();
  const graph = top.find((p) => p.key === "graph");
  if (!graph || !Array.isArray(graph.value)) {
    throw b.error('no "graph [ ... ]" list in this file', top[0]?.pos ?? { line: 1, column: 1 }, "a GML design is `graph [ node [ id 1 ] ... edge [ source 1 target 2 ] ]`");
  }
  const metadata = {};
  let name;
  let network;
  const edges = [];
  for (const p of graph.value) {
    if (p.key === "node" && Array.isArray(p.value)) readNode(p, p.value, b);
    else if (p.key === "edge" && Array.isArray(p.value)) edges.push(p);
    else if (p.key === "directed") {
      if (p.value !== 0) b.warn('the graph is directed ("directed 1"); links are read as undirected', p.pos);
    } else if (p.key === "multigraph") {
    } else {
      if (p.key === "label" && typeof p.value === "string") name = p.value;
      if (p.key === "Network" && typeof p.value === "string") network = p.value;
      metadata[p.key] = Array.isArray(p.value) ? toPlain(p.value) : p.value;
    }
  }
  for (const e of edges) readEdge(e, e.value, b);
  const resolved = name ?? network;
  return b.finish({ ...resolved !== void 0 ? { name: resolved } : {}, metadata });
}
function readNode(node, body, b) {
  let id;
  const raw = {};
  const where = /* @__PURE__ */ new Map();
  for (const p of body) {
    if (p.key === "id") {
      id = scalarId(p);
      if (id === void 0) throw b.error('node "id" must be a number or a string', p.pos);
      continue;
    }
    raw[p.key] = Array.isArray(p.value) ? toPlain(p.value) : p.value;
    where.set(p.key, p.pos);
  }
  if (id === void 0) throw b.error('node without "id"', node.pos, "every GML node needs `id N`");
  const mapped = mapNodeAttributes(raw, b, (k) => where.get(k) ?? node.pos);
  b.addNode({ id, pos: node.pos, ...mapped });
}
function readEdge(edge, body, b) {
  let source;
  let target;
  let id;
  const raw = {};
  const where = /* @__PURE__ */ new Map();
  for (const p of body) {
    if (p.key === "source") source = p;
    else if (p.key === "target") target = p;
    else if (p.key === "id" && !Array.isArray(p.value)) id = scalarId(p);
    else {
      raw[p.key] = Array.isArray(p.value) ? toPlain(p.value) : p.value;
      where.set(p.key, p.pos);
    }
  }
  if (!source || !target) {
    throw b.error(`edge without "${source ? "target" : "source"}"`, edge.pos, "every GML edge needs `source N target M`");
  }
  const s = scalarId(source);
  const d = scalarId(target);
  if (s === void 0 || d === void 0) throw b.error('edge "source" and "target" must be node ids', edge.pos);
  const mapped = mapLinkAttributes(raw, b, (k) => where.get(k) ?? edge.pos);
  b.addLink({ what: id !== void 0 ? `edge "${id}"` : "edge", ...id !== void 0 ? { id } : {}, source: s, target: d, pos: edge.pos, sourcePos: source.pos, targetPos: target.pos, ...mapped });
}

// src/topology/graphml.ts
var import_saxes = __toESM(require_saxes(), 1);
function typed(text2, type) {
  switch (type) {
    case "int":
    case "integer":
    case "long":
    case "float":
    case "double":
      return toNumber(text2) ?? text2;
    case "boolean":
      return toFlag(text2) ?? text2;
    default:
      return text2;
  }
}
function parseGraphml(text2, file, options = {}, format = "graphml") {
  const b = new TopologyBuilder(file, format, options);
  const parser = new import_saxes.SaxesParser({ xmlns: false, position: true });
  const keys = /* @__PURE__ */ new Map();
  const nodes = [];
  const edges = [];
  const metadata = {};
  const stack = [];
  let current;
  let graphDepth = 0;
  let currentKey;
  let dataKey;
  let dataPos = { line: 1, column: 1 };
  let dataText = "";
  let dataNested = false;
  let defaultText;
  let sawRoot = false;
  let warnedDirected = false;
  let warnedNested = false;
  let tagStart = { line: 1, column: 1 };
  let graphId;
  const here = () => ({ line: parser.line, column: parser.column + 1 });
  const directed = (pos, how) => {
    if (warnedDirected) return;
    warnedDirected = true;
    b.warn(`the graph is directed (${how}); links are read as undirected`, pos);
  };
  parser.on("error", (err) => {
    const message = err.message.replace(/^(?:[^:\n]*:)?\d+:\d+: /, "").replace(/\.$/, "");
    throw b.error(`malformed XML: ${message}`, here(), "the file is not well-formed XML; check the tag at this point");
  });
  parser.on("doctype", (doctype) => {
    if (/<!ENTITY/i.test(doctype)) {
      throw b.error(
        "the XML declares entities in a DOCTYPE, which netbrace refuses",
        offsetPos(text2, text2.search(/<!DOCTYPE/i)),
        'entity declarations can expand without bound ("billion laughs"); GraphML needs none — remove the DOCTYPE'
      );
    }
  });
  parser.on("opentagstart", (tag) => {
    tagStart = { line: parser.line, column: Math.max(1, parser.column - tag.name.length - 1) };
  });
  parser.on("opentag", (tag) => {
    const name2 = localName(tag.name);
    const attrs = tag.attributes;
    const pos = tagStart;
    stack.push(name2);
    if (stack.length > MAX_NESTING) {
      throw b.error(`elements nest deeper than ${MAX_NESTING} levels`, pos, "GraphML needs a few levels (graphml, graph, node, data); flatten this structure");
    }
    if (dataKey !== void 0) {
      dataNested = true;
      return;
    }
    switch (name2) {
      case "graphml":
        sawRoot = true;
        break;
      case "key": {
        const id = attrs.id;
        if (id === void 0) throw b.error('<key> without an "id"', pos);
        currentKey = { name: attrs["attr.name"] ?? id, domain: attrs.for ?? "all", type: attrs["attr.type"] ?? "string" };
        keys.set(id, currentKey);
        break;
      }
      case "default":
        if (currentKey) defaultText = "";
        break;
      case "graph":
        graphDepth++;
        if (graphDepth === 1 && attrs.id) graphId = attrs.id;
        if (graphDepth > 1 && !warnedNested) {
          warnedNested = true;
          b.warn("nested <graph> found; its nodes and edges are read into the one design", pos);
        }
        if (attrs.edgedefault === "directed") directed(pos, 'edgedefault="directed"');
        break;
      case "node":
        if (attrs.id === void 0) throw b.error('<node> without an "id"', pos, 'every GraphML node needs id="..."');
        current = { pos, attrs, data: {}, dataPos: /* @__PURE__ */ new Map() };
        nodes.push(current);
        break;
      case "edge":
        if (attrs.source === void 0 || attrs.target === void 0) {
          throw b.error(`<edge> without a "${attrs.source === void 0 ? "source" : "target"}"`, pos, 'every GraphML edge needs source="..." and target="..."');
        }
        if (attrs.directed === "true") directed(pos, 'an edge has directed="true"');
        current = { pos, attrs, data: {}, dataPos: /* @__PURE__ */ new Map() };
        edges.push(current);
        break;
      case "hyperedge":
        b.warn("<hyperedge> is not supported and was skipped", pos);
        break;
      case "data":
        dataKey = attrs.key ?? "";
        dataPos = pos;
        dataText = "";
        dataNested = false;
        break;
      default:
        break;
    }
  });
  const onText = (t) => {
    if (dataKey !== void 0 && !dataNested) dataText += t;
    else if (defaultText !== void 0) defaultText += t;
  };
  parser.on("text", onText);
  parser.on("cdata", onText);
  parser.on("closetag", (tag) => {
    const name2 = localName(tag.name);
    stack.pop();
    if (dataKey !== void 0 && name2 !== "data") return;
    switch (name2) {
      case "data": {
        const def = keys.get(dataKey ?? "");
        const attrName = def?.name ?? dataKey ?? "";
        const value = typed(dataNested ? dataText.trim() : dataText, def?.type ?? "string");
        if (current) {
          current.data[attrName] = value;
          current.dataPos.set(attrName, dataPos);
        } else if (graphDepth > 0) {
          metadata[attrName] = value;
        }
        dataKey = void 0;
        break;
      }
      case "default":
        if (currentKey && defaultText !== void 0) currentKey.default = defaultText;
        defaultText = void 0;
        break;
      case "key":
        currentKey = void 0;
        break;
      case "node":
      case "edge":
        current = void 0;
        break;
      case "graph":
        graphDepth--;
        break;
      default:
        break;
    }
  });
  parser.write(text2).close();
  if (!sawRoot) throw b.error("no <graphml> element in this file", { line: 1, column: 1 }, "is this really a GraphML file?");
  const defaults = (domain) => [...keys.values()].filter((k) => k.default !== void 0 && (k.domain === domain || k.domain === "all"));
  const nodeDefaults = defaults("node");
  const edgeDefaults = defaults("edge");
  const withDefaults = (el, defs) => {
    for (const k of defs) if (!(k.name in el.data)) el.data[k.name] = typed(k.default, k.type);
    return el.data;
  };
  for (const n of nodes) {
    const mapped = mapNodeAttributes(withDefaults(n, nodeDefaults), b, (k) => n.dataPos.get(k) ?? n.pos);
    b.addNode({ id: n.attrs.id, pos: n.pos, ...mapped });
  }
  for (const e of edges) {
    const data = withDefaults(e, edgeDefaults);
    let id = e.attrs.id;
    if (id === void 0 && "id" in data) {
      id = String(data.id);
      delete data.id;
    }
    const mapped = mapLinkAttributes(data, b, (k) => e.dataPos.get(k) ?? e.pos);
    b.addLink({ what: id !== void 0 ? `edge "${id}"` : "edge", ...id !== void 0 ? { id } : {}, source: e.attrs.source, target: e.attrs.target, pos: e.pos, ...mapped });
  }
  const name = metadata.label ?? metadata.Network ?? metadata.name ?? graphId;
  return b.finish({ ...typeof name === "string" ? { name } : {}, metadata });
}
function offsetPos(text2, offset) {
  if (offset < 0) return { line: 1, column: 1 };
  let line = 1;
  let start = 0;
  for (let i = text2.indexOf("\n"); i >= 0 && i < offset; i = text2.indexOf("\n", i + 1)) {
    line++;
    start = i + 1;
  }
  return { line, column: offset - start + 1 };
}
function localName(qname) {
  const colon = qname.indexOf(":");
  return colon < 0 ? qname : qname.slice(colon + 1);
}

// src/topology/edgelist.ts
function* csvRows(text2, b) {
  let i = 0;
  let line = 1;
  let lineStart = 0;
  if (text2.charCodeAt(0) === 65279) i = lineStart = 1;
  const n = text2.length;
  while (i < n) {
    const cells = [];
    for (; ; ) {
      const pos = { line, column: i - lineStart + 1 };
      let value = "";
      if (text2[i] === '"') {
        i++;
        for (; ; ) {
          if (i >= n) throw b.error("unterminated quoted field", pos, 'close the field with a double quote (write "" for a quote inside it)');
          const c = text2[i];
          if (c === '"') {
            if (text2[i + 1] === '"') {
              value += '"';
              i += 2;
              continue;
            }
            i++;
            break;
          }
          if (c === "\n") {
            line++;
            lineStart = i + 1;
          }
          value += c;
          i++;
        }
        if (i < n && text2[i] !== "," && text2[i] !== "\n" && text2[i] !== "\r") {
          throw b.error("text after a closing quote", { line, column: i - lineStart + 1 }, "a quoted field must end at a comma or the end of the line");
        }
      } else {
        const start = i;
        while (i < n && text2[i] !== "," && text2[i] !== "\n" && text2[i] !== "\r") i++;
        value = text2.slice(start, i);
        if (value.includes('"')) throw b.error("a double quote inside an unquoted field", pos, 'quote the whole field and double the quote: "a ""b"""');
      }
      cells.push({ text: value, pos });
      if (i < n && text2[i] === ",") {
        i++;
        continue;
      }
      break;
    }
    const end = { line, column: i - lineStart + 1 };
    if (text2[i] === "\r") i++;
    if (text2[i] === "\n") i++;
    line++;
    lineStart = i;
    if (cells.length === 1 && cells[0].text.trim() === "") continue;
    yield { cells, end };
  }
}
function parseEdgeList(text2, file, options = {}, format = "csv") {
  const b = new TopologyBuilder(file, format, options);
  const rows = csvRows(text2, b);
  const first = rows.next();
  if (first.done) throw b.error("the CSV file is empty", { line: 1, column: 1 }, "the first line must be a header with source,target");
  const headerCells = first.value.cells;
  const header = headerCells.map((c) => c.text.trim());
  const lower = header.map((h) => h.toLowerCase());
  for (const need of ["source", "target"]) {
    if (!lower.includes(need)) {
      throw b.error(`the CSV header has no "${need}" column`, headerCells[0].pos, "the first line must name the columns, e.g. source,target,length");
    }
  }
  const seen = /* @__PURE__ */ new Map();
  lower.forEach((h, k) => {
    if (h === "") throw b.error(`column ${k + 1} of the header has no name`, headerCells[k].pos);
    const earlier = seen.get(h);
    if (earlier !== void 0) throw b.error(`column "${header[k]}" appears twice in the header`, headerCells[k].pos, `first as column ${earlier + 1}`);
    seen.set(h, k);
  });
  const src = lower.indexOf("source");
  const dst = lower.indexOf("target");
  const idCol = lower.indexOf("id");
  let r = 0;
  for (const { cells, end } of rows) {
    r++;
    if (cells.length < header.length) {
      const missing2 = header.slice(cells.length).map((h) => `"${h}"`).join(", ");
      throw b.error(
        `row has ${cells.length} of the header's ${header.length} columns (missing ${missing2})`,
        end,
        "add the missing values (an empty value is written as nothing between two commas)"
      );
    }
    if (cells.length > header.length) {
      throw b.error(`row has ${cells.length} columns but the header has ${header.length}`, cells[header.length].pos, "quote values that contain commas");
    }
    const pos = cells[0].pos;
    const ends = [cells[src], cells[dst]];
    for (const c of ends) {
      const id2 = c.text.trim();
      if (id2 === "") throw b.error(`empty ${c === cells[src] ? "source" : "target"}`, c.pos, "every row needs both link ends");
      if (!b.hasNode(id2)) b.addNode({ id: id2, pos: c.pos });
    }
    const raw = {};
    const where = /* @__PURE__ */ new Map();
    header.forEach((h, k) => {
      if (k === src || k === dst || k === idCol) return;
      raw[h] = cells[k].text;
      where.set(h, cells[k].pos);
    });
    const mapped = mapLinkAttributes(raw, b, (k) => where.get(k) ?? pos);
    const id = idCol >= 0 ? cells[idCol].text.trim() : "";
    b.addLink({
      what: `row ${r + 1}`,
      ...id !== "" ? { id } : {},
      source: ends[0].text.trim(),
      target: ends[1].text.trim(),
      pos,
      sourcePos: ends[0].pos,
      targetPos: ends[1].pos,
      ...mapped
    });
  }
  return b.finish();
}

// src/topology/parse.ts
function utf8Length(text2) {
  let bytes = 0;
  for (let i = 0; i < text2.length; i++) {
    const c = text2.charCodeAt(i);
    if (c < 128) bytes += 1;
    else if (c < 2048) bytes += 2;
    else if (c >= 55296 && c <= 56319 && i + 1 < text2.length) {
      bytes += 4;
      i++;
    } else bytes += 3;
  }
  return bytes;
}
function checkSize(text2, file, maxBytes = DEFAULT_MAX_BYTES) {
  if (text2.length * 3 <= maxBytes) return;
  const bytes = utf8Length(text2);
  if (bytes > maxBytes) throw sizeError(file, bytes, maxBytes);
}
function sizeError(file, bytes, maxBytes) {
  return new LimitError(
    `the design file is larger than the limit (${bytes} bytes > ${maxBytes})`,
    { file },
    "raise the limit (for the CLI: --max-bytes) if a file this large is intended"
  );
}
function parseDesign(text2, file, options = {}) {
  const format = options.format ?? detectFormat(file);
  if (format === void 0) {
    throw new DesignError(
      "cannot tell the design format from the file name",
      { file },
      `use an extension .net.yaml, .net.json, .graphml, .gml or .csv, or force one (${FORMAT_CHOICES})`
    );
  }
  checkSize(text2, file, options.maxBytes ?? DEFAULT_MAX_BYTES);
  if (text2.charCodeAt(0) === 65279) text2 = text2.slice(1);
  const builderOptions = { maxElements: options.maxElements ?? DEFAULT_MAX_ELEMENTS };
  switch (format) {
    case "native-yaml":
    case "native-json":
      return parseNative(text2, file, builderOptions, format);
    case "gml":
      return parseGml(text2, file, builderOptions);
    case "graphml":
      return parseGraphml(text2, file, builderOptions);
    case "csv":
      return parseEdgeList(text2, file, builderOptions);
  }
}

// src/version.ts
var VERSION = "0.1.0";

// src/run-gate.ts
function pathHash(path) {
  let h = 2166136261;
  const bytes = new TextEncoder().encode(path);
  for (const b of bytes) {
    h ^= b;
    h = Math.imul(h, 16777619) >>> 0;
  }
  return h >>> 0;
}
function inPart(path, part) {
  return pathHash(path) % part.total === part.index - 1;
}
var NeedFile = class {
  constructor(path) {
    this.path = path;
  }
  path;
};
async function loadPolicyAt(entry, read) {
  const texts = /* @__PURE__ */ new Map();
  for (let attempt = 0; attempt < 64; attempt++) {
    try {
      const policy = loadPolicy(entry, (p) => {
        if (!texts.has(p)) throw new NeedFile(p);
        return texts.get(p);
      });
      return { policy, texts };
    } catch (e) {
      if (!(e instanceof NeedFile)) throw e;
      texts.set(e.path, await read(e.path));
    }
  }
  throw new PolicyError("the policy inherits too many files", { file: entry }, "keep the chain of inherits short");
}
function orgFolder(orgPath) {
  const i = orgPath.lastIndexOf("/");
  return i < 0 ? "" : orgPath.slice(0, i + 1);
}
function isOrgFile(request, p) {
  const org = request.orgPolicyPath;
  if (org === void 0) return false;
  const folder = orgFolder(org);
  return p === org || folder !== "" && p.startsWith(folder);
}
function requireOrgPolicy(request, entry, policy) {
  const org = request.orgPolicyPath;
  if (org === void 0 || entry === org || policy.files.includes(org)) return;
  throw new PolicyError(
    `${entry} does not inherit the organisation policy ${org}`,
    { file: entry, line: 1, column: 1 },
    `add "inherits: ${org}" (or inherit a file that inherits it); a team policy may only tighten the organisation's floors`,
    [{ file: org, line: 1, column: 1, message: "the organisation policy every team policy must inherit" }]
  );
}
async function choosePolicy(request, deps, base, head) {
  const path = request.policyPath ?? DEFAULT_POLICY_PATH;
  const explicit = request.policyPath !== void 0;
  const trusted = request.policySource === "base" && base !== void 0 ? base : head;
  const other = trusted === head ? base : head;
  const readOrg = async (p) => {
    if (!deps.readOrgPolicy) throw new UsageError(`the organisation policy ${p} cannot be read here`, "give the path of its checkout");
    return deps.readOrgPolicy(p);
  };
  const readAtRev = (rev) => async (p) => isOrgFile(request, p) ? readOrg(p) : deps.readAt(rev, p);
  const readTrusted = readAtRev(trusted);
  const entryText = await readTrusted(path);
  const otherText = other !== void 0 ? await deps.readAt(other, path) : null;
  if (entryText === null) {
    if (otherText !== null && other !== void 0) {
      const p = builtinPolicy();
      return {
        policy: p,
        info: {
          source: "builtin",
          path,
          revision: trusted,
          changed: true,
          note: `${path} is added by this change; it applies once merged, and the built-in policy judges this change`
        }
      };
    }
    if (explicit) {
      throw new UsageError(`the policy file ${path} does not exist${trusted === "worktree" ? "" : ` at ${trusted}`}`, 'check --policy, or run "netbrace init"');
    }
    if (request.orgPolicyPath !== void 0) {
      const org = request.orgPolicyPath;
      const { policy: policy2 } = await loadPolicyAt(org, readOrg);
      return { policy: policy2, info: { source: "file", path: org, files: policy2.files, note: `the repository has no policy; the organisation policy ${org} applies` } };
    }
    return { policy: builtinPolicy(), info: { source: "builtin", revision: trusted } };
  }
  const { policy, texts } = await loadPolicyAt(path, readTrusted);
  requireOrgPolicy(request, path, policy);
  const info = { source: "file", path, revision: trusted, files: policy.files };
  if (other !== void 0) {
    let changed = false;
    for (const [p, text2] of texts) if (!isOrgFile(request, p) && await deps.readAt(other, p) !== text2) changed = true;
    if (changed) {
      info.changed = true;
      if (trusted === base) {
        let verdict = "it applies once merged";
        try {
          const proposed = await loadPolicyAt(path, readAtRev(other));
          requireOrgPolicy(request, path, proposed.policy);
        } catch (e) {
          if (!isNetbraceError(e)) throw e;
          verdict = `the proposed version has an error: ${e.format().split("\n")[0]}`;
        }
        info.note = `this change modifies the policy; the version at the base judges it (${verdict})`;
      } else {
        info.note = "this change modifies the policy, and the policy of the head applies (policy-source: head)";
      }
    }
  }
  return { policy, info };
}
async function candidates(request, deps, policy, base, head) {
  if (request.paths && request.paths.length > 0) {
    const list2 = [];
    for (const path of [...new Set(request.paths.map(normalizePath))]) {
      if (base === void 0) {
        list2.push({ path, change: "unchanged" });
        continue;
      }
      const [h, b] = [await deps.readAt(head, path), await deps.readAt(base, path)];
      const change = h === null ? "deleted" : b === null ? "added" : h === b ? "unchanged" : "modified";
      if (h === null && b === null) throw new UsageError(`${path} exists neither at ${head} nor at ${base}`, "give paths relative to the repository root");
      list2.push({ path, change });
    }
    return { list: list2, scope: "paths" };
  }
  if (base === void 0 || request.eventKind === "schedule") {
    const all = await deps.listAll(head);
    return { list: all.filter((p) => isDesignPath(policy, p)).map((path) => ({ path, change: "unchanged" })), scope: "all" };
  }
  const changed = await deps.listChanged(base, head);
  const list = changed.filter((f) => isDesignPath(policy, f.path) || f.previousPath !== void 0 && isDesignPath(policy, f.previousPath)).map((f) => ({ path: f.path, change: f.status, ...f.previousPath !== void 0 ? { previousPath: f.previousPath } : {} }));
  return { list, scope: "changed" };
}
function normalizePath(p) {
  return p.replace(/\\/g, "/").replace(/^\.\//, "");
}
function evaluationSpecs(fp, seed) {
  const challenges2 = fp.challenges.map((c) => {
    const at = fp.requirements.filter((r) => r.kind === "r-threshold" && r.challenge === c.name && r.at !== void 0).map((r) => r.kind === "r-threshold" ? r.at : 0);
    const params = { ...c.params };
    if (c.random && at.length > 0) params.at = [...new Set(at)].sort((a, b) => a - b);
    return params;
  });
  const elements = [...new Set(fp.requirements.flatMap((r) => r.kind === "n-1" ? [r.element] : []))].sort();
  const budget = { maxWork: fp.budget.maxWork };
  const specs = [{ r: fp.rValue, challenges: challenges2, seed, budget }];
  elements.forEach((element, i) => {
    const n1 = { challenge: "n-1", element };
    if (i === 0) specs[0].challenges.push(n1);
    else specs.push({ r: fp.rValue, challenges: [n1], seed, budget });
  });
  return specs;
}
function joinEvaluations(parts) {
  if (parts.length === 1) return parts[0];
  const [first, ...rest] = parts;
  const evaluation = { ...first.evaluation };
  evaluation.envelopes = [...first.evaluation.envelopes];
  evaluation.attacks = [...first.evaluation.attacks];
  evaluation.contingencies = [...first.evaluation.contingencies];
  evaluation.degraded = [...first.evaluation.degraded];
  const samples = new Map(first.samples);
  const labels = new Map(first.labels);
  for (const p of rest) {
    evaluation.envelopes.push(...p.evaluation.envelopes);
    evaluation.attacks.push(...p.evaluation.attacks);
    evaluation.contingencies.push(...p.evaluation.contingencies);
    evaluation.degraded.push(...p.evaluation.degraded);
    for (const [k, v] of p.samples) samples.set(k, v);
    for (const [k, v] of p.labels) labels.set(k, v);
  }
  return { evaluation, samples, labels };
}
function compileText(text2, path, fp) {
  try {
    return { graph: compileTopology(parseDesign(text2, path, fp.format ? { format: fp.format } : {})) };
  } catch (e) {
    if (isNetbraceError(e) && (e.kind === "design" || e.kind === "limit" || e.kind === "usage")) {
      return { error: { message: e.hint ? `${e.message} — ${e.hint}` : e.message, line: e.line, column: e.column } };
    }
    throw e;
  }
}
async function evaluateGraph(g, specs, cuts, request, deps) {
  const evaluate2 = deps.evaluate ?? ((graph, spec) => evaluateDesign(graph, spec));
  const parts = [];
  for (const [i, spec] of specs.entries()) {
    const part = await evaluate2(g, spec, request.threads);
    notePairedCuts(part, cuts, i);
    parts.push(part);
  }
  return { graph: g, result: joinEvaluations(parts) };
}
function validateRequest(request) {
  if (request.mode !== "block" && request.mode !== "inform") throw new UsageError(`mode must be block or inform, not ${String(request.mode)}`);
  if (request.policySource !== "base" && request.policySource !== "head") {
    throw new UsageError(`policy-source must be base or head, not ${String(request.policySource)}`);
  }
  const s = request.part;
  if (s && !(Number.isInteger(s.index) && Number.isInteger(s.total) && s.total >= 1 && s.index >= 1 && s.index <= s.total)) {
    throw new UsageError(`part ${s.index}/${s.total} is not k/n with 1 ≤ k ≤ n`, "e.g. 2/4 for the second of four parts");
  }
  if (request.seed !== void 0 && !(Number.isInteger(request.seed) && request.seed >= 0 && request.seed <= 4294967295)) {
    throw new UsageError(`seed must be a whole number from 0 to 4294967295, not ${request.seed}`);
  }
  if (request.threads !== void 0 && !(Number.isInteger(request.threads) && request.threads >= 1)) {
    throw new UsageError(`threads must be a whole number ≥ 1, not ${request.threads}`);
  }
}
async function runGate(request, deps) {
  validateRequest(request);
  const head = request.worktree ? "worktree" : request.head ?? "HEAD";
  const base = request.eventKind === "schedule" ? void 0 : request.base;
  const { policy, info } = await choosePolicy(request, deps, base, head);
  const { list: all, scope } = await candidates(request, deps, policy, base, head);
  const chosen = [...all].sort((a, b) => a.path < b.path ? -1 : a.path > b.path ? 1 : 0).filter((c) => !request.part || inPart(c.path, request.part));
  const rules = chosen.map((c) => policyForFile(policy, c.path));
  const seed = request.seed ?? policy.seed;
  const files = [];
  for (const [i, c] of chosen.entries()) {
    const fp = rules[i];
    const thresholdsOnly = base === void 0 || scope === "all";
    const input = { path: c.path, change: c.change, policy: fp, thresholdsOnly };
    if (c.previousPath !== void 0) input.previousPath = c.previousPath;
    if (fp.format) input.format = fp.format;
    if (c.change !== "deleted") {
      const headText = await deps.readAt(head, c.path);
      if (headText === null) {
        input.change = "deleted";
      } else {
        const h = compileText(headText, c.path, fp);
        if ("error" in h) input.headError = h.error;
        else {
          let baseGraph;
          let same = false;
          if (!thresholdsOnly && c.change !== "added") {
            const basePath = c.previousPath ?? c.path;
            const baseText = await deps.readAt(base, basePath);
            if (baseText === headText) {
              same = true;
            } else if (baseText !== null) {
              const b = compileText(baseText, basePath, fp);
              if ("error" in b) input.baseError = b.error;
              else baseGraph = b.graph;
            }
          }
          const specs = budgetSpecs(evaluationSpecs(fp, seed), fp.budget.maxWork, h.graph, baseGraph);
          input.head = await evaluateGraph(h.graph, specs.head, specs.cuts, request, deps);
          if (same) input.base = input.head;
          else if (baseGraph) input.base = await evaluateGraph(baseGraph, specs.base, specs.cuts, request, deps);
        }
      }
    }
    files.push(compareDesign(input));
  }
  const report = {
    version: REPORT_VERSION,
    tool: { name: "netbrace", version: VERSION },
    verdict: verdictOf(files),
    mode: request.mode,
    policy: info,
    ...base !== void 0 ? { base } : {},
    head,
    seed,
    ...request.part ? { part: { index: request.part.index, total: request.part.total } } : {},
    scope,
    counts: countStatuses(files),
    files,
    caution: CAUTION
  };
  return { report, exitCode: exitCodeOf(report) };
}

// src/topology/write-native.ts
function writeNativeJson(t) {
  const doc = {};
  if (t.name !== void 0 || t.description !== void 0) {
    doc.network = { ...t.name !== void 0 ? { name: t.name } : {}, ...t.description !== void 0 ? { description: t.description } : {} };
  }
  doc.nodes = t.nodes.map((n) => ({
    id: n.id,
    ...n.label !== void 0 ? { label: n.label } : {},
    ...n.kind !== void 0 ? { kind: n.kind } : {},
    ...n.lat !== void 0 && n.lon !== void 0 ? { site: { lat: n.lat, lon: n.lon } } : {},
    ...n.hardened ? { hardened: true } : {}
  }));
  doc.links = t.links.map((l) => ({
    between: [l.source, l.target],
    id: l.id,
    ...l.length !== void 0 ? { length_km: l.length } : {},
    ...l.weight !== void 0 ? { weight: l.weight } : {},
    ...l.latency !== void 0 ? { latency_ms: l.latency } : {},
    ...l.capacity !== void 0 ? { capacity_gbps: l.capacity } : {},
    ...l.riskGroups.length > 0 ? { risk_groups: [...l.riskGroups] } : {},
    ...l.hardened ? { hardened: true } : {}
  }));
  if (t.riskGroups.length > 0) doc.risk_groups = t.riskGroups.map((r) => ({ id: r.id, ...r.description !== void 0 ? { description: r.description } : {} }));
  if (t.demands.length > 0) doc.demands = t.demands.map((d) => ({ between: [d.source, d.target], volume: d.volume }));
  if (t.latencyBudget !== void 0) doc.latency_budget = t.latencyBudget;
  return `${JSON.stringify(doc, null, 2)}
`;
}

// src/api/graph.ts
import { MultiUndirectedGraph } from "graphology";
function toGraph(t) {
  const g = new MultiUndirectedGraph({ allowSelfLoops: false });
  const attributes = {
    file: t.file,
    format: t.format,
    riskGroups: t.riskGroups.map((r) => ({ ...r })),
    demands: t.demands.map((d) => ({ ...d })),
    metadata: { ...t.metadata }
  };
  if (t.name !== void 0) attributes.name = t.name;
  if (t.description !== void 0) attributes.description = t.description;
  if (t.latencyBudget !== void 0) attributes.latencyBudget = t.latencyBudget;
  g.replaceAttributes(attributes);
  for (const n of t.nodes) {
    const a = { hardened: n.hardened, line: n.pos.line, attrs: { ...n.attrs } };
    if (n.label !== void 0) a.label = n.label;
    if (n.kind !== void 0) a.kind = n.kind;
    if (n.lat !== void 0) a.lat = n.lat;
    if (n.lon !== void 0) a.lon = n.lon;
    g.addNode(n.id, a);
  }
  for (const l of t.links) {
    const a = { id: l.id, risk_groups: [...l.riskGroups], hardened: l.hardened, line: l.pos.line, attrs: { ...l.attrs } };
    if (l.length !== void 0) a.length_km = l.length;
    if (l.latency !== void 0) a.latency_ms = l.latency;
    if (l.capacity !== void 0) a.capacity_gbps = l.capacity;
    if (l.weight !== void 0) a.weight = l.weight;
    g.addEdgeWithKey(l.key, l.source, l.target, a);
  }
  return g;
}
function num(v) {
  return typeof v === "number" && Number.isFinite(v) ? v : void 0;
}
function lineOf(v, fallback) {
  return { line: typeof v === "number" && Number.isInteger(v) && v >= 1 ? v : fallback, column: 1 };
}
function fromGraph(g, options = {}) {
  const ga = g.getAttributes();
  const file = options.file ?? (typeof ga.file === "string" ? ga.file : "graph");
  const b = new TopologyBuilder(file, "native-json");
  let i = 0;
  g.forEachNode((id, raw) => {
    const a = raw;
    const known = /* @__PURE__ */ new Set(["label", "kind", "lat", "lon", "hardened", "line", "attrs"]);
    const attrs = { ...a.attrs ?? {} };
    for (const [k, v] of Object.entries(a)) if (!known.has(k)) attrs[k] = v;
    i++;
    b.addNode({
      id: String(id),
      pos: lineOf(a.line, i),
      ...typeof a.label === "string" ? { label: a.label } : {},
      ...typeof a.kind === "string" ? { kind: a.kind } : {},
      ...num(a.lat) !== void 0 && num(a.lon) !== void 0 ? { lat: num(a.lat), lon: num(a.lon) } : {},
      hardened: a.hardened === true,
      attrs
    });
  });
  g.forEachEdge((key, raw, source, target) => {
    const a = raw;
    const known = /* @__PURE__ */ new Set(["id", "length_km", "latency_ms", "capacity_gbps", "weight", "risk_groups", "hardened", "line", "attrs"]);
    const attrs = { ...a.attrs ?? {} };
    for (const [k, v] of Object.entries(a)) if (!known.has(k)) attrs[k] = v;
    i++;
    const pos = lineOf(a.line, i);
    const length = num(a.length_km);
    const latency = num(a.latency_ms);
    const capacity = num(a.capacity_gbps);
    const weight = num(a.weight);
    b.addLink({
      ...typeof a.id === "string" && a.id !== "" ? { id: a.id } : {},
      source: String(source),
      target: String(target),
      pos,
      ...length !== void 0 ? { length } : {},
      ...latency !== void 0 ? { latency } : {},
      ...capacity !== void 0 ? { capacity } : {},
      ...weight !== void 0 ? { weight } : {},
      riskGroups: Array.isArray(a.risk_groups) ? a.risk_groups.map(String) : [],
      hardened: a.hardened === true,
      attrs,
      what: `edge "${key}"`
    });
  });
  for (const r of ga.riskGroups ?? []) b.addRiskGroup({ id: String(r.id), ...r.description !== void 0 ? { description: r.description } : {}, pos: r.pos ?? { line: 1, column: 1 } });
  for (const d of ga.demands ?? []) b.addDemand(String(d.source), String(d.target), d.volume, d.pos ?? { line: 1, column: 1 });
  const extra = { metadata: { ...ga.metadata ?? {} } };
  if (ga.name !== void 0) extra.name = ga.name;
  if (ga.latencyBudget !== void 0) extra.latencyBudget = ga.latencyBudget;
  const t = b.finish(extra);
  if (ga.description !== void 0) t.description = ga.description;
  return t;
}

// src/api/index.ts
function readDesign(text2, file, options = {}) {
  return parseDesign(text2, file, options);
}
function asText(path, d) {
  if (typeof d === "string") return { path, text: d };
  const jsonPath = /\.net\.json$/i.test(path) ? path : `${path}.net.json`;
  return { path: jsonPath, text: writeNativeJson(d) };
}
function memoryRepo(files, policy) {
  const out = new Map(Object.entries(policy));
  for (const [p, d] of Object.entries(files ?? {})) {
    const { path, text: text2 } = asText(p, d);
    out.set(path, text2);
  }
  return out;
}
async function check(input) {
  const policy = { ...input.policyFiles ?? {} };
  if (input.policy !== void 0) policy[DEFAULT_POLICY_PATH] = input.policy;
  const sides = { base: memoryRepo(input.base, policy), head: memoryRepo(input.head, policy) };
  const side = (rev) => rev === "base" ? sides.base : sides.head;
  const deps = {
    listChanged() {
      const out = [];
      for (const [p, text2] of sides.head) {
        const before = sides.base.get(p);
        if (before === void 0) out.push({ status: "added", path: p });
        else if (before !== text2) out.push({ status: "modified", path: p });
      }
      for (const p of sides.base.keys()) if (!sides.head.has(p)) out.push({ status: "deleted", path: p });
      return out;
    },
    readAt: (rev, p) => side(rev).get(p) ?? null,
    listAll: (rev) => [...side(rev).keys()].sort()
  };
  const request = {
    ...input.base !== void 0 ? { base: "base" } : {},
    head: "head",
    policySource: "base",
    mode: input.mode ?? "block",
    eventKind: "local",
    ...input.seed !== void 0 ? { seed: input.seed } : {}
  };
  return runGate(request, deps);
}
async function evaluate(design, options = {}) {
  const path = options.path ?? (typeof design === "string" ? "design.net.yaml" : "design.net.json");
  const { report } = await check({
    head: { [path]: design },
    ...options.policy !== void 0 ? { policy: options.policy } : {},
    ...options.policyFiles !== void 0 ? { policyFiles: options.policyFiles } : {},
    ...options.seed !== void 0 ? { seed: options.seed } : {}
  });
  const file = report.files[0];
  if (!file) throw new Error(`${path} is not a design under this policy (check its designs paths)`);
  return file;
}
export {
  check,
  evaluate,
  fromGraph,
  readDesign,
  serializeReport,
  toGraph,
  writeNativeJson
};
