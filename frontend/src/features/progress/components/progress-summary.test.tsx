import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '@/testing/test-utils';
import type { Progress, WeekProgress } from '../types';
import ProgressCharts from './progress-charts';
import { ProgressSummary } from './progress-summary';

const week = (w: string, values: Partial<WeekProgress>): WeekProgress => ({
  week: w,
  attempts: 0,
  graded: 0,
  passRate: null,
  meanDeltaE: null,
  meanValueError: null,
  meanTemperatureError: null,
  meanHueError: null,
  meanChromaError: null,
  ...values,
});

const weeks = [
  week('2026-03-02', { attempts: 4, graded: 4, passRate: 0.25, meanDeltaE: 9.4, meanValueError: 6.2, meanTemperatureError: 0.31, meanHueError: 4.8, meanChromaError: 5.5 }),
  week('2026-03-09', { attempts: 1, graded: 0 }),
  week('2026-03-16', { attempts: 5, graded: 5, passRate: 0.8, meanDeltaE: 3.1, meanValueError: 1.9, meanTemperatureError: 0.12, meanHueError: 1.6, meanChromaError: 2.2 }),
];
const progress: Progress = { weeks, totals: { attempts: 10, graded: 9, passed: 5 }, streakDays: 3 };

describe('ProgressCharts', () => {
  it('should draw one chart per skill over the weeks it is given', () => {
    const { container } = render(<ProgressCharts weeks={weeks} />);
    for (const title of ['Overall difference (ΔE00)', 'Value error (|ΔL*|)', 'Temperature and hue error', 'Chroma error (|ΔC′|)', 'Pass rate']) {
      expect(screen.getByRole('figure', { name: title })).toBeInTheDocument();
    }
    const overall = container.querySelector('[data-chart="overall"]') as HTMLElement;
    expect(overall.querySelectorAll('svg').length).toBeGreaterThan(0);
    // The week labels on the x axis are the weeks given, in order.
    const ticks = [...overall.querySelectorAll('.MuiChartsAxis-directionX .MuiChartsAxis-tickLabel')].map((t) => t.textContent);
    expect(ticks).toEqual(['2 Mar', '9 Mar', '16 Mar']);
  });

  it('should label every graded week on the pass-rate chart, so a week where nothing passed shows 0 %', () => {
    const none = [
      week('2026-03-02', { attempts: 3, graded: 3, passRate: 0, meanDeltaE: 11.2 }),
      week('2026-03-09', { attempts: 1, graded: 0 }),
      week('2026-03-16', { attempts: 4, graded: 4, passRate: 0.5, meanDeltaE: 4.1 }),
    ];
    const { container } = render(<ProgressCharts weeks={none} />);
    const passRate = container.querySelector('[data-chart="pass-rate"]') as HTMLElement;
    const labels = [...passRate.querySelectorAll('.MuiBarChart-label')].map((t) => t.textContent);
    expect(labels).toEqual(['0 %', '50 %']);
  });
});

describe('ProgressSummary', () => {
  it('should show the streak, the totals and the weekly numbers as a table', async () => {
    renderApp(<ProgressSummary progress={progress} />);
    expect(screen.getByText('3 days')).toBeInTheDocument();
    const table = screen.getByRole('table', { name: /the same numbers, week by week/i });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(4);
    expect(within(rows[1]).getAllByRole('cell').map((c) => c.textContent)).toEqual(['4', '4', '25 %', '9.4', '6.2', '0.3', '4.8', '5.5']);
    expect(within(rows[2]).getAllByRole('cell').map((c) => c.textContent)).toEqual(['1', '0', '–', '–', '–', '–', '–', '–']);
    expect(await screen.findByRole('figure', { name: 'Pass rate' })).toBeInTheDocument();
  });

  it('should say what to do when there are no attempts', () => {
    renderApp(<ProgressSummary progress={{ weeks: [], totals: { attempts: 0, graded: 0, passed: 0 }, streakDays: 0 }} />);
    expect(screen.getByText('No attempts yet')).toBeInTheDocument();
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
  });
});
