import { render, screen, within } from '@testing-library/react';
import { NeedsMePanel } from '../../../components/overview/needs-me-panel';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

describe('NeedsMePanel', () => {
  it('lists the regressions of a plan that mails a maintainer who subscribes to no library, as a link to them', () => {
    render(
      <NeedsMePanel
        role="maintainer"
        now={Date.parse('2026-03-02T09:00:00Z')}
        needsMe={{
          reviewQueue: null,
          changesRequested: [],
          subscriptions: [],
          mailPlans: ['complex.js nightly'],
          regressions: [
            {
              targetKey: null,
              runId: 'c0000000-0000-4000-8000-000000000031',
              planName: 'complex.js nightly',
              finishedAt: '2026-03-02T02:41:00Z',
              count: 31,
              branch: 20,
            },
          ],
        }}
      />,
    );
    expect(screen.getByText('Waiting for you: 1')).toBeTruthy();
    const link = screen.getByRole('link', { name: /^↑ 31 regressions in complex\.js nightly: 20 branch, 11 accuracy/ });
    expect(link.getAttribute('href')).toBe('/failures?run=c0000000-0000-4000-8000-000000000031&status=new');
    expect(within(link).getByText("You receive this plan's regression mail · finished 6 h ago")).toBeTruthy();
    expect(screen.queryByText(/Nothing is waiting/)).toBeNull();
  });
});
