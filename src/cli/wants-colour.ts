/**
 * Colour only on a terminal, and never when NO_COLOR is set to anything
 * non-empty (https://no-color.org).
 */
export function wantsColour(stream: {isTTY?: boolean}, env: NodeJS.ProcessEnv): boolean {
  return Boolean(stream.isTTY) && !env['NO_COLOR'];
}
