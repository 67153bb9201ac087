// Every schema issue of a synthesise body, in words, under the path of the field it belongs to.
import type { BodyIssue } from './describeIssue.js';
import { describeIssue } from './describeIssue.js';
import type { FieldErrors } from './specFormValues.js';

const ITEM_NOUNS: Record<string, string> = { outputs: 'Output', taps: 'Tap', coefficients: 'Coefficient' };

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let node = root;
  for (const key of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<PropertyKey, unknown>)[key];
  }
  return node;
}

/** A union's failure: the branch the user actually chose, i.e. whose first issue points at a value that is present. */
function chosenBranch(issue: Extract<BodyIssue, { code: 'invalid_union' }>, root: unknown): BodyIssue[] {
  const branches = issue.errors as BodyIssue[][];
  const chosen = branches.find((b) => b[0] !== undefined && valueAt(root, [...issue.path, ...b[0].path]) !== undefined);
  return (chosen ?? branches[0] ?? []).map((inner) => ({ ...inner, path: [...issue.path, ...inner.path] }) as BodyIssue);
}

/** "Tap 2: " before an issue on one item of a list field. */
function itemPrefix(path: readonly PropertyKey[]): string {
  for (let k = 0; k < path.length - 1; k += 1) {
    const noun = ITEM_NOUNS[String(path[k])];
    const index = path[k + 1];
    if (noun && typeof index === 'number') return `${noun} ${index + 1}: `;
  }
  return '';
}

/** The first issue of each path, in words, keyed by the path joined with dots ("spec.mask.regions.0.range.toHz"). */
export function issuesToFieldErrors(issues: readonly BodyIssue[], body: unknown): FieldErrors {
  const errors: FieldErrors = {};
  const add = (issue: BodyIssue) => {
    if (issue.code === 'invalid_union') {
      chosenBranch(issue, body).forEach(add);
      return;
    }
    const key = issue.path.map(String).join('.');
    if (errors[key] !== undefined) return;
    const words = describeIssue(issue, issue.path, valueAt(body, issue.path));
    const prefix = itemPrefix(issue.path);
    errors[key] = prefix ? `${prefix}${words.charAt(0).toLowerCase()}${words.slice(1)}` : words;
  };
  issues.forEach(add);
  return errors;
}
