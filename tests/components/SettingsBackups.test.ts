// @vitest-environment happy-dom
import type { BackupStatus } from '@shared/schemas/backup';
import { PiniaColada } from '@pinia/colada';
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import { afterEach, describe, expect, it, vi } from 'vitest';
import SettingsBackups from '@/components/SettingsBackups.vue';

function json(status: number, body: unknown) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

function statusFixture(overrides: Partial<BackupStatus> = {}): BackupStatus {
  return {
    directory: '/srv/shipkeeper/backups',
    keep: 14,
    hour: 3,
    nextAt: '2026-01-02T03:00:00.000Z',
    runningSince: null,
    lastSuccess: { at: '2026-01-01T03:00:02.000Z', name: 'shipkeeper-20260101T030000Z', path: '/srv/shipkeeper/backups/shipkeeper-20260101T030000Z', sizeBytes: 5_452_595, fileCount: 370, missingFiles: 0, durationMs: 2000 },
    lastFailure: null,
    backups: [{ name: 'shipkeeper-20260101T030000Z', createdAt: '2026-01-01T03:00:00Z' }],
    ...overrides,
  };
}

async function mountWith(answers: { get: BackupStatus[]; post?: BackupStatus }) {
  const gets = [...answers.get];
  const fetchMock = vi.fn((input: string | URL | Request, init?: RequestInit) => {
    const path = String(input);
    if (path.endsWith('/auth/csrf')) return Promise.resolve(json(200, { csrfToken: 'token' }));
    if (path.endsWith('/backups') && init?.method === 'POST') return Promise.resolve(json(202, answers.post));
    if (path.endsWith('/backups')) return Promise.resolve(json(200, gets.length > 1 ? gets.shift() : gets[0]));
    return Promise.reject(new Error(`unexpected request ${path}`));
  });
  vi.stubGlobal('fetch', fetchMock);
  const wrapper = mount(SettingsBackups, { global: { plugins: [createPinia(), PiniaColada, [PrimeVue, { unstyled: true }]] } });
  await flushPromises();
  return { wrapper, fetchMock };
}

afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('SettingsBackups', () => {
  it('shows the last backup with its size, the schedule and the backups kept', async () => {
    const { wrapper } = await mountWith({ get: [statusFixture()] });
    const last = wrapper.find('[data-test=last-backup]').text();
    expect(last).toContain('5.2 MB');
    expect(last).toContain('the database and 370 files');
    expect(last).toContain('/srv/shipkeeper/backups/shipkeeper-20260101T030000Z');
    expect(wrapper.text()).toContain('Every day at 03:00 server time');
    expect(wrapper.text()).toContain('the latest 14 are kept');
    expect(wrapper.text()).toContain('1 backup');
    expect(wrapper.find('[role=alert]').exists()).toBe(false);
  });

  it('shows a failure as an error, and that there is no backup yet', async () => {
    const { wrapper } = await mountWith({ get: [statusFixture({ lastSuccess: null, lastFailure: { at: '2026-01-01T03:00:00.000Z', message: 'The backup folder /mnt/usb cannot be written (EACCES).' } })] });
    expect(wrapper.find('[data-test=last-backup]').text()).toBe('None yet.');
    const alert = wrapper.find('[role=alert]');
    expect(alert.text()).toContain('The last backup failed');
    expect(alert.text()).toContain('The backup folder /mnt/usb cannot be written (EACCES).');
  });

  it('"Back up now" shows the backup running, then its outcome', async () => {
    vi.useFakeTimers({ shouldAdvanceTime: true });
    const runningStatus = statusFixture({ runningSince: '2026-01-01T10:00:00.000Z' });
    const finished = statusFixture({ lastSuccess: { ...statusFixture().lastSuccess!, at: '2026-01-01T10:00:03.000Z', sizeBytes: 2048, fileCount: 1 } });
    const { wrapper, fetchMock } = await mountWith({ get: [statusFixture(), finished], post: runningStatus });
    await wrapper.find('button').trigger('click');
    await flushPromises();
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(true);
    expect(wrapper.text()).toContain('Backing up since');
    expect(wrapper.find('button').attributes('disabled')).toBeDefined();

    await vi.advanceTimersByTimeAsync(1100);
    await flushPromises();
    expect(wrapper.text()).not.toContain('Backing up since');
    expect(wrapper.find('[data-test=last-backup]').text()).toContain('2 KB · the database and 1 file');
  });
});
