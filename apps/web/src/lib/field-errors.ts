import { errorMessage, isApiError } from './api-client';

// The API names the field in each part of a refusal: "matGsm: a mat needs its weight; code: …".
// A form puts each part beside its field and shows the rest above the buttons.

export interface SplitErrors {
  fields: Record<string, string>;
  /** What belongs to no field of the form, or null. */
  other: string | null;
}

const capitalise = (text: string) => (text ? text.charAt(0).toUpperCase() + text.slice(1) : text);

/**
 * `fieldNames` are the form's fields; a part about "packSizes.0.size" goes to "packSizes".
 * `codes` maps an error code to a field (a 409 duplicate code → "code").
 */
export function splitFieldErrors(
  error: unknown,
  fieldNames: readonly string[],
  codes: Record<string, string> = {},
): SplitErrors {
  const message = errorMessage(error);
  if (isApiError(error) && codes[error.code]) {
    return { fields: { [codes[error.code] as string]: message }, other: null };
  }
  const fields: Record<string, string> = {};
  const rest: string[] = [];
  for (const part of message.split(/;\s+/)) {
    const match = /^([A-Za-z][\w.]*):\s*(.+)$/.exec(part);
    const path = match?.[1];
    const text = match?.[2];
    const field = path ? fieldNames.find((name) => path === name || path.startsWith(`${name}.`)) : undefined;
    if (field && text) {
      fields[field] = fields[field] ? `${fields[field]}; ${text}` : capitalise(text);
    } else {
      rest.push(part);
    }
  }
  return { fields, other: rest.length > 0 ? rest.join('; ') : null };
}
