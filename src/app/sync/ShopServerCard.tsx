/**
 * Settings → shop server: the server's address (this app's own origin under /db/ unless the shop
 * says otherwise), the plant's database, and signing in with the person's own server user. With no
 * database the log stays on this device, as without a server.
 */
import { useState } from 'preact/hooks';
import { useT } from '../../i18n/useT';
import { TextField } from '../ui/TextField';
import { patch } from '../ui/persist';
import { SyncBadge } from './SyncBadge';
import { signedIn } from './session';
import { shopConfigured, shopSettings } from './state';

type Engine = typeof import('./engine');
const engine = (): Promise<Engine> => import('./engine');

/** Roles under which the person may not release, hold or reject (said before they try). */
export const SUPERVISOR_ROLE = 'supervisor';

export function ShopServerCard() {
  const t = useT();
  const settings = shopSettings.value;
  const [name, setName] = useState(signedIn.value.name);
  const [password, setPassword] = useState('');
  const [message, setMessage] = useState<{ ok: boolean; text: string } | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const person = signedIn.value;

  const signIn = async (event: Event) => {
    event.preventDefault();
    setMessage(undefined);
    if (!shopConfigured()) {
      setMessage({ ok: false, text: t('app.shop.needDatabase') });
      return;
    }
    setBusy(true);
    const outcome = await (await engine()).signIn(name.trim(), password);
    setBusy(false);
    setPassword('');
    setMessage(
      outcome.ok
        ? { ok: true, text: t('app.shop.signedIn', { name: signedIn.value.name }) }
        : { ok: false, text: t(`app.shop.errors.${outcome.code}`) },
    );
  };
  const signOut = async () => {
    setBusy(true);
    await (await engine()).signOut();
    setBusy(false);
    setMessage({ ok: true, text: t('app.shop.signedOutNow') });
  };
  const roleWords = person.roles.filter((role) => ['operator', 'lab', 'supervisor', 'engineer'].includes(role));

  return (
    <section class="card shop-server" aria-labelledby="settings-shop">
      <h2 id="settings-shop">{t('app.shop.title')}</h2>
      <p class="note">{t('app.shop.intro')}</p>
      <TextField
        id="shop-address"
        label={t('app.shop.address')}
        value={settings.address}
        hint={t('app.shop.addressHint')}
        onInput={(address) => patch(shopSettings, { address })}
      />
      <TextField
        id="shop-database"
        label={t('app.shop.database')}
        value={settings.database}
        hint={t('app.shop.databaseHint')}
        onInput={(database) => patch(shopSettings, { database })}
      />
      <SyncBadge />
      {person.name ? (
        <>
          <p class="shop-person" data-shop-user={person.name}>
            {t('app.shop.signedInAs', {
              name: person.name,
              roles: roleWords.map((role) => t(`app.shop.roles.${role}`)).join(', ') || t('app.shop.noRole'),
            })}
          </p>
          {!person.roles.includes(SUPERVISOR_ROLE) && <p class="note">{t('app.shop.notSupervisor')}</p>}
          <button type="button" class="button" disabled={busy} onClick={() => void signOut()}>
            {t('app.shop.signOut')}
          </button>
        </>
      ) : (
        <form class="shop-sign-in" onSubmit={(e) => void signIn(e)} noValidate>
          <TextField id="shop-name" label={t('app.shop.name')} value={name} onInput={setName} />
          <TextField
            id="shop-password"
            type="password"
            label={t('app.shop.password')}
            value={password}
            onInput={setPassword}
          />
          <button type="submit" class="button button-primary" disabled={busy}>
            {t('app.shop.signIn')}
          </button>
        </form>
      )}
      <div aria-live="polite">{message && <p class={message.ok ? 'log-saved' : 'error-note'}>{message.text}</p>}</div>
    </section>
  );
}
