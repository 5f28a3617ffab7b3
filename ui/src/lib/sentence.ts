/**
 * A message as a sentence on screen. The shared schemas word their messages to follow a field's
 * name ("title: at least 3 characters"); shown alone under the field, they start with a capital.
 */
export function sentence(message: string): string {
  return message.charAt(0).toUpperCase() + message.slice(1);
}
