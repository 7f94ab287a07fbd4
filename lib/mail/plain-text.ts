// The shape html-to-text takes (its own types are not installed here; react-email passes it through).
type HtmlToTextOptions = {
  selectors: { selector: string; format?: string; options?: Record<string, unknown> }[];
};

// How the plain-text version of a message is read off its HTML (html-to-text through
// react-email): amount tables keep their columns, headings keep their case (capitals read as
// shouting), and layout tables (react-email's sections) stay plain blocks.
export const PLAIN_TEXT_OPTIONS: HtmlToTextOptions = {
  selectors: [
    {
      selector: "table.amounts",
      format: "dataTable",
      options: { uppercaseHeaderCells: false, maxColumnWidth: 70 },
    },
    ...(["h1", "h2", "h3"] as const).map((selector) => ({
      selector,
      options: { uppercase: false },
    })),
  ],
};
