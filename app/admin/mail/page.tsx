import type { Metadata } from "next";
import Link from "next/link";
import { ResendButton } from "@/components/mail/resend-button";
import { MAIL_STATUS_TONES, MAIL_STATUS_WORDS } from "@/components/mail/status-words";
import { PageHeader, PageShell } from "@/components/page-header";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { requirePageUser } from "@/lib/auth/guard";
import {
  countOutboxByStatus,
  listOutboxMessages,
  OUTBOX_FILTERS,
  type OutboxFilter,
} from "@/lib/mail/queries/outbox";

export const metadata: Metadata = { title: "Mail" };

const FILTER_WORDS: Record<OutboxFilter, string> = {
  all: "All",
  pending: "Waiting",
  sent: "Sent",
  failed: "Failed",
};

function formatTime(iso: string): string {
  return new Date(iso).toLocaleString("en-US", {
    dateStyle: "medium",
    timeStyle: "short",
    timeZone: "UTC",
  });
}

export default async function AdminMailPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  await requirePageUser("admin:mail", "/admin/mail");
  const raw = (await searchParams).status;
  const filter = OUTBOX_FILTERS.find((f) => f === raw) ?? "all";
  const [messages, counts] = await Promise.all([
    listOutboxMessages({ filter }),
    countOutboxByStatus({ days: 7 }),
  ]);

  return (
    <PageShell>
      <PageHeader
        title="Mail"
        lead={`Every message the store queued, newest first. Last 7 days: ${counts.sent} sent, ${counts.pending} waiting, ${counts.failed} failed. Times in UTC.`}
      />
      <nav aria-label="Filter messages" className="mb-4">
        <ul className="flex flex-wrap gap-2">
          {OUTBOX_FILTERS.map((f) => (
            <li key={f}>
              <Link
                href={f === "all" ? "/admin/mail" : `/admin/mail?status=${f}`}
                aria-current={f === filter ? "page" : undefined}
                className={`inline-flex min-h-11 items-center rounded-lg border px-3 font-bold ${f === filter ? "border-moss-700 bg-moss-700 text-paper-50" : "border-moss-600 text-moss-800 underline"}`}
              >
                {FILTER_WORDS[f]}
              </Link>
            </li>
          ))}
        </ul>
      </nav>
      {messages.length === 0 ? (
        <EmptyState
          title="No messages here"
          description="Messages appear as soon as an order is paid, a gift arrives or someone asks for a password reset."
          illustration={null}
        />
      ) : (
        <Table caption={`${FILTER_WORDS[filter]} messages (newest ${messages.length})`} hideCaption>
          <THead>
            <tr>
              <Th>Queued</Th>
              <Th>Message</Th>
              <Th>Status</Th>
              <Th numeric>Tries</Th>
              <Th>Detail</Th>
              <Th>
                <span className="sr-only">Action</span>
              </Th>
            </tr>
          </THead>
          <TBody>
            {messages.map((m) => (
              <Tr key={m.id}>
                <Td className="whitespace-nowrap text-sm">{formatTime(m.createdAt)}</Td>
                <Td>
                  <p className="font-bold">{m.subject}</p>
                  <p className="text-sm text-ink-soft">
                    {m.kind} · to {m.to}
                  </p>
                </Td>
                <Td>
                  <Badge tone={MAIL_STATUS_TONES[m.status]}>{MAIL_STATUS_WORDS[m.status]}</Badge>
                </Td>
                <Td numeric>{m.attempts}</Td>
                <Td className="max-w-xs text-sm break-words">
                  {m.lastError ? <p className="text-berry-800">{m.lastError}</p> : null}
                  {m.status === "sent" && m.sentAt ? <p>Sent {formatTime(m.sentAt)}</p> : null}
                  {m.status === "pending" ? <p>Next try {formatTime(m.nextAttemptAt)}</p> : null}
                  {m.providerId ? (
                    <p className="text-ink-soft">Provider id {m.providerId}</p>
                  ) : null}
                </Td>
                <Td>
                  {m.kind === "password-reset" && m.status === "sent" ? null : (
                    <ResendButton id={m.id} status={m.status} subject={m.subject} />
                  )}
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </PageShell>
  );
}
