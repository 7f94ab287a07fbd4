// html-to-text ships no types of its own and @types/html-to-text is not installed; the tests
// use only its convert(html, options) to read rendered HTML independently of react-email.
declare module "html-to-text" {
  export function convert(html: string, options?: Record<string, unknown>): string;
}
