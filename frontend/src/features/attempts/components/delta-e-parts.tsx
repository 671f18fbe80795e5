import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableRow from '@mui/material/TableRow';
import type { TargetMark } from '@mixmark/common';

/** A signed difference; one that rounds to zero is shown without a sign. */
const signed = (n: number, digits = 1) => {
  const text = Math.abs(n).toFixed(digits);
  if (Number(text) === 0) return text;
  return `${n > 0 ? '+' : '−'}${text}`;
};

/** ΔE00 split into its lightness, chroma and hue parts, each with what it means. */
export function DeltaEParts({ mark }: { mark: TargetMark }) {
  const { parts, judgement } = mark;
  const rows = [
    {
      name: 'Lightness ΔL′',
      value: signed(parts.deltaLPrime),
      term: parts.lightnessTerm,
      words: judgement.lightness === 'same' ? 'same value' : judgement.lightness === 'lighter' ? 'too light' : 'too dark',
    },
    {
      name: 'Chroma ΔC′',
      value: signed(parts.deltaCPrime),
      term: parts.chromaTerm,
      words:
        judgement.intensity === 'same' ? 'same intensity' : judgement.intensity === 'more-intense' ? 'too intense' : 'too grey',
    },
    {
      name: 'Hue ΔH′',
      value: signed(parts.deltaHPrime),
      term: parts.hueTerm,
      words: judgement.hueLean ? `leans ${judgement.hueLean}` : 'same hue',
    },
  ];
  return (
    <Table size="small" aria-label="Parts of the colour difference">
      <TableBody>
        <TableRow>
          <TableCell component="th" scope="row" sx={{ fontWeight: 800 }}>
            ΔE00
          </TableCell>
          <TableCell sx={{ fontWeight: 800, fontVariantNumeric: 'tabular-nums' }}>{mark.deltaE.toFixed(1)}</TableCell>
          <TableCell>{mark.pass ? 'within tolerance' : 'outside tolerance'}</TableCell>
        </TableRow>
        <TableRow>
          <TableCell component="th" scope="row">
            Temperature
          </TableCell>
          <TableCell sx={{ fontVariantNumeric: 'tabular-nums' }}>WC {signed(judgement.numbers.deltaWarmCool, 2)}</TableCell>
          <TableCell>
            {judgement.temperature === 'same' ? 'same temperature' : judgement.temperature === 'warmer' ? 'warmer' : 'cooler'}
          </TableCell>
        </TableRow>
        {rows.map((row) => (
          <TableRow key={row.name}>
            <TableCell component="th" scope="row">
              {row.name}
            </TableCell>
            <TableCell sx={{ fontVariantNumeric: 'tabular-nums' }}>
              {row.value} <span style={{ opacity: 0.75 }}>(term {signed(row.term, 2)})</span>
            </TableCell>
            <TableCell>{row.words}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
