import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import type { CriterionResult } from "@/lib/catalog/design-check";

const STATUS = {
  pass: { tone: "good", words: "Meets it" },
  note: { tone: "fair", words: "Note" },
  fail: { tone: "poor", words: "Falls short" },
} as const;

export function CriteriaTable({ results }: { results: CriterionResult[] }) {
  return (
    <Table caption="Design criteria, one row each" hideCaption wrapperClassName="mt-4">
      <THead>
        <Tr>
          <Th>Criterion</Th>
          <Th>Result</Th>
          <Th>This house</Th>
          <Th>Why</Th>
          <Th>Source</Th>
        </Tr>
      </THead>
      <TBody>
        {results.map((r) => (
          <Tr key={r.id} data-criterion={r.id}>
            <Td>
              <span className="font-bold">{r.rule}</span>
              <span className="block text-sm text-ink-soft">{r.kind === "required" ? "Required" : "Advisory"}</span>
            </Td>
            <Td>
              <Badge tone={STATUS[r.status].tone}>{STATUS[r.status].words}</Badge>
            </Td>
            <Td>{r.value}</Td>
            <Td>{r.reason}</Td>
            <Td className="text-sm text-ink-soft">{r.source}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
