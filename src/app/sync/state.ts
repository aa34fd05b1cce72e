/**
 * Where the shop server is: all the first screen needs to know (whether to load the rest). Who is
 * signed in and how the log stands with the server are in `session.ts`, loaded with the log or the
 * replication (`engine.ts`), after the first paint and only when a server is set up.
 */
import { persisted } from '../ui/persist';

export interface ShopSettings {
  /** The server's address; default: this app's own origin under /db/ (the web server proxies it). */
  address: string;
  /** The plant's database on that server; empty: no server, the log stays on this device. */
  database: string;
}

export const DEFAULT_SHOP: ShopSettings = { address: '/db/', database: '' };

export const shopSettings = persisted<ShopSettings>('shop', DEFAULT_SHOP);

/** Whether a server is set up for this device. */
export const shopConfigured = (settings: ShopSettings = shopSettings.value): boolean => settings.database.trim() !== '';
