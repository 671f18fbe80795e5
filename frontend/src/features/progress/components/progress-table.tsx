import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { formatMean, formatPassRate, weekLabel } from '../format';
import type { WeekProgress } from '../types';

/** The charts' numbers, week by week, for screen readers and for those who want them. */
export function ProgressTable({ weeks, caption }: { weeks: WeekProgress[]; caption: string }) {
  return (
    <TableContainer component={Paper} sx={{ overflowX: 'auto' }}>
      <Table size="small">
        <caption style={{ captionSide: 'top', textAlign: 'left', padding: '12px 16px 4px' }}>{caption}</caption>
        <TableHead>
          <TableRow sx={{ '& th': { whiteSpace: 'nowrap' } }}>
            <TableCell component="th" scope="col">Week of</TableCell>
            <TableCell align="right">Attempts</TableCell>
            <TableCell align="right">Graded</TableCell>
            <TableCell align="right">Pass rate</TableCell>
            <TableCell align="right">ΔE00</TableCell>
            <TableCell align="right">Value |ΔL*|</TableCell>
            <TableCell align="right">Temperature |ΔWC|</TableCell>
            <TableCell align="right">Hue |ΔH′|</TableCell>
            <TableCell align="right">Chroma |ΔC′|</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {weeks.map((w) => (
            <TableRow key={w.week}>
              <TableCell component="th" scope="row">
                <time dateTime={w.week}>{weekLabel(w.week)}</time>
              </TableCell>
              <TableCell align="right">{w.attempts}</TableCell>
              <TableCell align="right">{w.graded}</TableCell>
              <TableCell align="right">{formatPassRate(w.passRate)}</TableCell>
              <TableCell align="right">{formatMean(w.meanDeltaE)}</TableCell>
              <TableCell align="right">{formatMean(w.meanValueError)}</TableCell>
              <TableCell align="right">{formatMean(w.meanTemperatureError)}</TableCell>
              <TableCell align="right">{formatMean(w.meanHueError)}</TableCell>
              <TableCell align="right">{formatMean(w.meanChromaError)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
