/** The shop server's state in the header, readable at a glance; nothing when no server is set up. */
import { formatMessageNumber } from '../../i18n/format';
import { useScreenContext } from '../settings/screenContext';
// The rules' module alone (plain constants), not the log's index.
import { REFUSAL_CODES } from '../../jobs/designDoc';
import { startSync } from './engine';
import { syncStatus } from './session';

function clockTime(iso: string | undefined, locale: string): string {
  const ms = iso === undefined ? Number.NaN : Date.parse(iso);
  return Number.isNaN(ms)
    ? ''
    : new Intl.DateTimeFormat(locale, { hour: '2-digit', minute: '2-digit' }).format(new Date(ms));
}

export function SyncBadge() {
  const { t, locale } = useScreenContext();
  const status = syncStatus.value;
  if (status.state === 'off') return null;
  const text =
    status.state === 'waiting'
      ? t('app.sync.status.waiting', { count: status.pending })
      : status.state === 'receiving'
        ? t('app.sync.status.receiving', { count: status.received, jobs: formatMessageNumber(status.received, locale) })
        : status.state === 'offline'
          ? t('app.sync.status.offline', { time: clockTime(status.since, locale) })
          : status.state === 'refused'
            ? t('app.sync.status.refused', { reason: t(`app.sync.refusals.${refusalKey(status.reason)}`) })
            : t(`app.sync.status.${status.state}`);
  return (
    <span class={`offline-status sync-status sync-status-${status.state}`} role="status" data-sync-state={status.state}>
      {text}
    </span>
  );
}

/** A server refusal's code as a locale key; anything else is "the server refused". */
export function refusalKey(reason: string | undefined): string {
  return reason !== undefined && (REFUSAL_CODES as readonly string[]).includes(reason) ? reason : 'unknown';
}

/** Starts the replication (its code, with PouchDB, comes in this chunk). */
export function startShopSync(): void {
  void startSync();
}
