const DEFAULT_TYPE_MESSAGE = /^Invalid input: expected (\w+), received (\w+)$/;
const TYPE_NAMES: Record<string, string> = { string: 'text', number: 'a number', int: 'a whole number', boolean: 'yes or no', array: 'a list', object: 'a group of fields' };

/** zod's own wording for a missing or mistyped field, in the words of our messages: "Title is required." */
export function readableMessage(message: string, path: readonly PropertyKey[]): string {
  const match = DEFAULT_TYPE_MESSAGE.exec(message);
  if (!match) return message;
  const name = [...path].reverse().find((part) => typeof part === 'string');
  const label = name ? name.replace(/([a-z\d])([A-Z])/g, '$1 $2').toLowerCase().replace(/ (cents|id)$/, '').replace(/^./, (c) => c.toUpperCase()) : 'This value';
  const [, expected, received] = match;
  if (received === 'undefined') return `${label} is required.`;
  return `${label} must be ${TYPE_NAMES[expected ?? ''] ?? expected}.`;
}
