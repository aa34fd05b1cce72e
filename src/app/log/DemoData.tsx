/**
 * "Load demo data": the invented plant's jobs, added to this device's log only when a person asks
 * and confirms. The demo module loads with the tap (import()), so nothing of it is in the app before.
 */
import { useState } from 'preact/hooks';
import { describeJobsError } from '../../jobs';
import { useScreenContext } from '../settings/screenContext';
import { ErrorNote } from '../ui/Notices';
import { writeToLog } from './db';
import { shiftConfig } from './shifts';

/** About a year of jobs across three furnaces: enough for the summary and a calibration per furnace. */
export const DEMO_JOB_COUNT = 200;

type Step = { step: 'idle' } | { step: 'confirm' } | { step: 'busy' } | { step: 'done'; ok: boolean; text: string };

export function DemoData() {
  const { t } = useScreenContext();
  const [state, setState] = useState<Step>({ step: 'idle' });

  const load = async () => {
    setState({ step: 'busy' });
    const { demoJobs } = await import('./demo/demoLog');
    const jobs = demoJobs({ count: DEMO_JOB_COUNT, end: new Date(), shiftConfig: shiftConfig.value });
    const result = await writeToLog((store) => store.putMany(jobs));
    setState(
      result.ok
        ? { step: 'done', ok: true, text: t('app.log.files.demo.loaded', { count: result.value }) }
        : { step: 'done', ok: false, text: describeJobsError(t, result.error) },
    );
  };

  return (
    <section class="card" aria-labelledby="files-demo">
      <h2 id="files-demo">{t('app.log.files.demo.heading')}</h2>
      <p class="note">{t('app.log.files.demo.intro', { count: DEMO_JOB_COUNT })}</p>
      {state.step === 'confirm' ? (
        <div role="group" aria-labelledby="files-demo-confirm">
          <p id="files-demo-confirm" class="note">
            {t('app.log.files.demo.confirm', { count: DEMO_JOB_COUNT })}
          </p>
          <div class="button-row">
            <button type="button" class="button button-primary" onClick={() => void load()}>
              {t('app.log.files.demo.yes')}
            </button>
            <button type="button" class="button" onClick={() => setState({ step: 'idle' })}>
              {t('app.log.cancel')}
            </button>
          </div>
        </div>
      ) : (
        <button
          type="button"
          class="button"
          disabled={state.step === 'busy'}
          onClick={() => setState({ step: 'confirm' })}
        >
          {t('app.log.files.demo.load')}
        </button>
      )}
      <div aria-live="polite">
        {state.step === 'done' &&
          (state.ok ? <p class="log-saved">{state.text}</p> : <ErrorNote message={state.text} />)}
      </div>
    </section>
  );
}
