import { createElement as h } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";

import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { getProgressPercent, ProgressBar } from "@/components/ui/progress-bar";
import { Select } from "@/components/ui/select";
import { Table, TBody, Th, THead, Tr } from "@/components/ui/table";

// Server-rendered markup is what assistive technology meets first, so the accessibility wiring
// (ids, aria-*) is checked on it directly. Attribute order in React's output is stable.

/** The attributes of the first element of `tag` whose markup contains `marker`. */
function attributesOf(html: string, tag: string, marker = ""): Record<string, string> {
  const element = [...html.matchAll(new RegExp(`<${tag}\\b[^>]*>`, "g"))]
    .map((match) => match[0])
    .find((markup) => markup.includes(marker));
  if (!element) throw new Error(`No <${tag}> containing "${marker}" in ${html}`);
  return Object.fromEntries([...element.matchAll(/([\w-]+)="([^"]*)"/g)].map((m) => [m[1], m[2]]));
}

describe("Field", () => {
  it("labels its control and ties the hint and the error to it", () => {
    const html = renderToStaticMarkup(
      h(Field, {
        label: "Chamber spacing",
        hint: "Inside, in inches.",
        error: "Too wide.",
        id: "gap",
        children: h(Input, { name: "gap" }),
      }),
    );
    const input = attributesOf(html, "input");
    expect(attributesOf(html, "label")["for"]).toBe("gap");
    expect(input["id"]).toBe("gap");
    expect(input["aria-describedby"]).toBe("gap-hint gap-error");
    expect(input["aria-invalid"]).toBe("true");
    expect(html).toContain('id="gap-hint"');
    expect(html).toContain('id="gap-error"');
    expect(html).not.toContain('role="alert"');
  });

  it("leaves a valid control unmarked and says 'required' in words", () => {
    const html = renderToStaticMarkup(
      h(Field, {
        label: "ZIP code",
        required: true,
        children: h(Select, null, h("option", null, "A")),
      }),
    );
    const select = attributesOf(html, "select");
    expect(select["aria-invalid"]).toBeUndefined();
    expect(select["aria-describedby"]).toBeUndefined();
    expect(select["aria-required"]).toBe("true");
    expect(select["id"]).toBe(attributesOf(html, "label")["for"]);
    expect(html).toContain("(required)");
  });

  it("lets a control's own aria-describedby add to the field's", () => {
    const html = renderToStaticMarkup(
      h(Field, {
        label: "Reason",
        hint: "Kept in history.",
        id: "why",
        children: h(Input, { "aria-describedby": "extra" }),
      }),
    );
    expect(attributesOf(html, "input")["aria-describedby"]).toBe("why-hint extra");
  });
});

describe("Checkbox", () => {
  it("ties its label, hint and error to the box", () => {
    const html = renderToStaticMarkup(
      h(Checkbox, { id: "gift", label: "Add a gift", hint: "Optional.", error: "Pick one." }),
    );
    const box = attributesOf(html, "input");
    expect(box["type"]).toBe("checkbox");
    expect(attributesOf(html, "label")["for"]).toBe("gift");
    expect(box["aria-describedby"]).toBe("gift-hint gift-error");
    expect(box["aria-invalid"]).toBe("true");
  });
});

describe("Button", () => {
  it("is a plain type=button by default, so it never submits a form by accident", () => {
    expect(attributesOf(renderToStaticMarkup(h(Button, null, "Save")), "button")["type"]).toBe(
      "button",
    );
  });

  it("while loading is disabled, marked busy and keeps its label", () => {
    const html = renderToStaticMarkup(h(Button, { loading: true, type: "submit" }, "Pay $189"));
    const button = attributesOf(html, "button");
    expect(button["aria-busy"]).toBe("true");
    expect(html).toMatch(/<button[^>]*disabled=""/);
    expect(html).toContain("Pay $189");
    expect(html).toContain("animate-spin");
  });
});

describe("ProgressBar", () => {
  it("computes the share and clamps it at both ends", () => {
    expect(getProgressPercent({ value: 5, max: 8 })).toBe(62.5);
    expect(getProgressPercent({ value: 0, max: 8 })).toBe(0);
    expect(getProgressPercent({ value: 8, max: 8 })).toBe(100);
    expect(getProgressPercent({ value: 12, max: 8 })).toBe(100);
    expect(getProgressPercent({ value: -3, max: 8 })).toBe(0);
    expect(getProgressPercent({ value: 3, max: 0 })).toBe(0);
    expect(getProgressPercent({ value: Number.NaN, max: 8 })).toBe(0);
  });

  it("exposes role, value range, value text and a name from its visible label", () => {
    const html = renderToStaticMarkup(
      h(ProgressBar, { label: "Orders packed", value: 11, max: 8, valueText: "all 8" }),
    );
    const bar = attributesOf(html, "div", 'role="progressbar"');
    expect(bar["aria-valuenow"]).toBe("8");
    expect(bar["aria-valuemin"]).toBe("0");
    expect(bar["aria-valuemax"]).toBe("8");
    expect(bar["aria-valuetext"]).toBe("all 8");
    const labelId = bar["aria-labelledby"] ?? "missing";
    expect(html).toContain(`id="${labelId}"`);
    expect(html).toContain("width:100%");
  });
});

describe("Table", () => {
  it("wraps the table in a named, focusable scroll region with a caption", () => {
    const html = renderToStaticMarkup(h(Table, { caption: "Paid orders" }, h(TBody, null)));
    const region = attributesOf(html, "div", 'role="region"');
    expect(region["aria-label"]).toBe("Paid orders");
    expect(region["tabindex"]).toBe("0");
    expect(html).toContain("<caption");
    expect(html).toContain("overflow-x-auto");
  });

  it("marks the sorted column with aria-sort and makes sortable headers controls", () => {
    const html = renderToStaticMarkup(
      h(
        Table,
        { caption: "Houses" },
        h(
          THead,
          null,
          h(
            Tr,
            null,
            h(Th, { sort: "descending", sortHref: "?sort=price" }, "Price"),
            h(Th, { sort: "none", sortHref: "?sort=name" }, "Name"),
            h(Th, null, "Fit"),
          ),
        ),
      ),
    );
    const headers = [...html.matchAll(/<th\b[^>]*>/g)].map((m) => m[0]);
    expect(headers[0]).toContain('aria-sort="descending"');
    expect(headers[1]).not.toContain("aria-sort");
    expect(headers[2]).not.toContain("aria-sort");
    expect(html).toContain('href="?sort=price"');
    expect(html).toContain('href="?sort=name"');
    expect(headers.every((th) => th.includes('scope="col"'))).toBe(true);
  });
});

describe("Alert and Badge", () => {
  it("is a polite status only when it reports the result of an action, and never role=alert", () => {
    expect(renderToStaticMarkup(h(Alert, { tone: "good", live: true }, "Saved."))).toContain(
      'role="status"',
    );
    const fixed = renderToStaticMarkup(
      h(Alert, { tone: "warn", title: "Before you climb" }, "Two people."),
    );
    expect(fixed).not.toContain("role=");
  });

  it("gives each tone its own colours and shape", () => {
    const good = renderToStaticMarkup(h(Badge, { tone: "good", children: "Good fit" }));
    const poor = renderToStaticMarkup(h(Badge, { tone: "poor", children: "Poor fit" }));
    expect(good).toContain("bg-moss-100");
    expect(poor).toContain("bg-berry-100");
    const shape = (html: string) => html.match(/<path[^>]*d="([^"]+)"/)?.[1];
    expect(shape(good)).toBeDefined();
    expect(shape(good)).not.toBe(shape(poor));
    expect(renderToStaticMarkup(h(Badge, { children: "Draft" }))).not.toContain("<svg");
  });
});
