import Box from '@mui/material/Box';
import Grid from '@mui/material/Grid';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { BarChart } from '@mui/x-charts/BarChart';
import { LineChart } from '@mui/x-charts/LineChart';
import { weekLabel } from '../format';
import type { WeekProgress } from '../types';

const chartHeight = 220;
const lineColours = ['#2f5d62', '#6b4f3a'];

/**
 * x-charts draws nothing (not even the label) for a bar of zero height, so a week where none
 * passed gets a stub this tall (in % of the axis), labelled "0 %" like every other bar.
 */
const zeroStub = 1.5;

type Metric = { key: keyof WeekProgress; label: string; unit: string };

const errorCharts: { id: string; title: string; hint: string; metrics: Metric[] }[] = [
  {
    id: 'overall',
    title: 'Overall difference (ΔE00)',
    hint: 'How far your mixes are from the targets; lower is closer.',
    metrics: [{ key: 'meanDeltaE', label: 'ΔE00', unit: '' }],
  },
  {
    id: 'value',
    title: 'Value error (|ΔL*|)',
    hint: 'Too light or too dark, in L* units.',
    metrics: [{ key: 'meanValueError', label: 'Value |ΔL*|', unit: '' }],
  },
  {
    id: 'temperature',
    title: 'Temperature and hue error',
    hint: 'Too warm or too cool (warm–cool index units) and hue drift (|ΔH′|).',
    metrics: [
      { key: 'meanTemperatureError', label: 'Temperature |ΔWC|', unit: '' },
      { key: 'meanHueError', label: 'Hue |ΔH′|', unit: '' },
    ],
  },
  {
    id: 'chroma',
    title: 'Chroma error (|ΔC′|)',
    hint: 'Too intense or too greyed.',
    metrics: [{ key: 'meanChromaError', label: 'Chroma |ΔC′|', unit: '' }],
  },
];

function ChartCard({
  id,
  title,
  hint,
  children,
}: {
  id: string;
  title: string;
  hint: string;
  children: React.ReactNode;
}) {
  return (
    <Paper
      component="figure"
      aria-labelledby={`chart-${id}-title`}
      sx={{ p: 2, m: 0, height: '100%' }}
      data-chart={id}
    >
      <Typography
        id={`chart-${id}-title`}
        variant="h4"
        component="figcaption"
        sx={{ fontSize: '1rem', fontWeight: 700 }}
      >
        {title}
      </Typography>
      <Typography variant="body2" color="text.secondary">
        {hint}
      </Typography>
      {/* The numbers are in the table below; the picture is for sighted readers. */}
      <Box aria-hidden sx={{ width: '100%', minWidth: 0 }}>
        {children}
      </Box>
    </Paper>
  );
}

/** Weekly error and pass-rate charts for the weeks given, oldest first. */
export default function ProgressCharts({ weeks }: { weeks: WeekProgress[] }) {
  const labels = weeks.map((w) => weekLabel(w.week));
  const passRates = weeks.map((w) => (w.passRate === null ? null : Math.round(w.passRate * 100)));
  return (
    <Grid container spacing={2}>
      {errorCharts.map((chart) => (
        <Grid key={chart.id} size={{ xs: 12, md: 6 }}>
          <ChartCard id={chart.id} title={chart.title} hint={chart.hint}>
            <LineChart
              height={chartHeight}
              xAxis={[{ scaleType: 'point', data: labels }]}
              yAxis={[{ min: 0 }]}
              series={chart.metrics.map((metric, i) => ({
                id: metric.key,
                label: metric.label,
                data: weeks.map((w) => w[metric.key] as number | null),
                connectNulls: true,
                showMark: true,
                color: lineColours[i],
                valueFormatter: (v: number | null) =>
                  v === null ? 'nothing graded' : v.toFixed(1),
              }))}
              hideLegend={chart.metrics.length < 2}
              margin={{ left: 0, right: 16 }}
            />
          </ChartCard>
        </Grid>
      ))}
      <Grid size={{ xs: 12, md: 6 }}>
        <ChartCard
          id="pass-rate"
          title="Pass rate"
          hint="Share of graded attempts that passed, written above each week’s bar (0 % when none passed)."
        >
          <BarChart
            height={chartHeight}
            xAxis={[{ scaleType: 'band', data: labels }]}
            // Headroom above 100 % for the figure over a full bar; the ticks stop at 100 %.
            yAxis={[
              {
                min: 0,
                max: 112,
                tickInterval: [0, 25, 50, 75, 100],
                valueFormatter: (v: number) => `${v} %`,
              },
            ]}
            series={[
              {
                id: 'passRate',
                label: 'Pass rate',
                data: passRates.map((rate) => (rate === 0 ? zeroStub : rate)),
                color: lineColours[0],
                valueFormatter: (_v: number | null, { dataIndex }) => {
                  const rate = passRates[dataIndex];
                  return rate === null ? 'nothing graded' : `${rate} %`;
                },
                // Every graded week carries its figure above its bar.
                barLabel: (item) =>
                  passRates[item.dataIndex] === null ? null : `${passRates[item.dataIndex]} %`,
                barLabelPlacement: 'outside',
              },
            ]}
            hideLegend
            margin={{ left: 0, right: 16 }}
          />
        </ChartCard>
      </Grid>
    </Grid>
  );
}
