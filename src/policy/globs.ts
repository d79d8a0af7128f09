// The globs of a policy (designs, ignore, overrides' files), checked when the policy loads.
// picomatch never refuses a glob: an unclosed brace compiles to a pattern that matches
// nothing, a leading "/" or a backslash path to one that matches no repository path. A glob
// that silently selects nothing makes the gate judge nothing and pass, so every glob is read
// here first and a broken one is a policy error at its line. The rules are glob syntax as
// shells and picomatch read it (common practice); paths are repository paths: forward
// slashes, relative to the root, never "." or ".." segments, files (not directories).

import picomatch from 'picomatch';

export interface GlobProblem {
  message: string;
  hint: string;
}

/** Characters a backslash may escape in a glob (anything else is a path separator typed the Windows way). */
const ESCAPABLE = new Set('*?[]{}()!+@,\\/^$.|- '.split(''));

/** What is wrong with a glob, or undefined when it can select repository files. */
export function globProblem(glob: string): GlobProblem | undefined {
  if (glob.trim() === '') return { message: 'is empty', hint: 'write a glob such as "networks/**/*.net.yaml"' };
  if (glob.trim() !== glob)
    return { message: 'starts or ends with white space, which is part of the glob', hint: 'remove the spaces' };
  if (glob.startsWith('!') && !glob.startsWith('!(')) {
    return {
      message: 'starts with "!", which would select every file except these',
      hint: 'list the files to leave out under "ignore:"',
    };
  }
  if (glob.startsWith('/') || /^[A-Za-z]:[\\/]/.test(glob)) {
    return {
      message: 'is an absolute path; globs are read from the repository root',
      hint: `write it without the leading "/": "${glob.replace(/^\/+|^[A-Za-z]:[\\/]+/, '')}"`,
    };
  }
  const braces: number[] = [];
  const parens: number[] = [];
  for (let i = 0; i < glob.length; i++) {
    const ch = glob[i];
    if (ch === '\\') {
      const next = glob[i + 1];
      if (next === undefined || !ESCAPABLE.has(next)) {
        return {
          message: 'has a backslash, which escapes the next character in a glob; it is not a path separator',
          hint: `use forward slashes: "${glob.replace(/\\/g, '/')}"`,
        };
      }
      i++;
    } else if (ch === '[') {
      // A class: "]" right after "[" (or "[^") is a member, not the end.
      let j = i + 1;
      if (glob[j] === '!') {
        // Shells read "[!x]" as "not x"; picomatch reads it as "! or x" (picomatch 4.0.7).
        return {
          message: 'has "[!", which picomatch reads as the character "!", not as "none of"',
          hint: 'write "[^" for a class of characters to leave out',
        };
      }
      if (glob[j] === '^') j++;
      if (glob[j] === ']') j++;
      while (j < glob.length && glob[j] !== ']') j += glob[j] === '\\' ? 2 : 1;
      if (j >= glob.length)
        return {
          message: 'has a "[" that is never closed',
          hint: 'close the character class with "]", or write "\\[" for a literal bracket',
        };
      i = j;
    } else if (ch === '{') braces.push(i);
    else if (ch === '}') {
      if (braces.pop() === undefined)
        return { message: 'has a "}" without its "{"', hint: 'alternatives are written {a,b}' };
    } else if (ch === '(') parens.push(i);
    else if (ch === ')') {
      if (parens.pop() === undefined)
        return { message: 'has a ")" without its "("', hint: 'groups are written @(a|b)' };
    }
  }
  if (braces.length > 0)
    return {
      message: 'has a "{" that is never closed',
      hint: 'close it: alternatives are written {a,b}, e.g. "**/*.{graphml,gml}"',
    };
  if (parens.length > 0)
    return { message: 'has a "(" that is never closed', hint: 'close it: groups are written @(a|b)' };
  if (glob.endsWith('/'))
    return { message: 'ends with "/", so it matches directories, never files', hint: `add the files: "${glob}**"` };
  const segments = glob.replace(/^\.\//, '').split('/');
  if (segments.includes('..'))
    return {
      message: 'has a ".." segment; globs are read from the repository root',
      hint: 'write the path from the root, without ".."',
    };
  if (segments.includes('.'))
    return { message: 'has a "." segment, which repository paths never have', hint: 'remove the "./"' };
  if (segments.includes(''))
    return { message: 'has an empty segment ("//"), which repository paths never have', hint: 'write one "/"' };
  let re: RegExp;
  try {
    re = picomatch.makeRe(glob, { dot: true });
  } catch (e) {
    return {
      message: `cannot be read as a glob (${e instanceof Error ? e.message : String(e)})`,
      hint: 'see the glob syntax in the README ("Policy")',
    };
  }
  // picomatch's own "matches nothing" pattern, for what it could not parse.
  if (re.source === '$^')
    return {
      message: 'cannot be read as a glob: it would match no file',
      hint: 'see the glob syntax in the README ("Policy")',
    };
  return undefined;
}
