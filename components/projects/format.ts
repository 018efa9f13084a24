/** How project dates and authors read in lists: "2 Dec 2026, 14:05 by Ada Lind". */
import type { PersonRef, Project } from '@/lib/schema/api-projects';

const dateTime = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

export function formatWhen(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : dateTime.format(d);
}

export function formatWhenBy(iso: string, by: string | null): string {
  return by ? `${formatWhen(iso)} by ${by}` : formatWhen(iso);
}

/** "Client · Site", or a dash when neither is set. */
export function clientAndSite(p: Pick<Project, 'client' | 'site'>): string {
  const parts = [p.client, p.site].filter((s): s is string => Boolean(s && s.trim()));
  return parts.length ? parts.join(' · ') : '—';
}

/** A person's name from the reply itself, else from the team's member list, else null. */
export function nameOf(ref: PersonRef | null, explicit: string | null | undefined, names: ReadonlyMap<string, string>): string | null {
  if (explicit) return explicit;
  if (!ref) return null;
  return ref.name ?? names.get(ref.id) ?? null;
}
