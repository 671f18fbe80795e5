import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TablePagination from '@mui/material/TablePagination';
import TableRow from '@mui/material/TableRow';
import TableSortLabel from '@mui/material/TableSortLabel';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useMemo, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { useDownloadGradebookCsv } from '../api/download-gradebook-csv';
import {
  assignmentStatuses,
  type AssignmentStatus,
  type Gradebook,
  type GradebookCell,
} from '../types';
import { statusWords } from './assignment-status-chip';

/** Sorting by the student's name, or by the best score on one assignment. */
type SortKey = { by: 'student' } | { by: 'assignment'; id: string };
type Direction = 'asc' | 'desc';
type Student = Gradebook['students'][number];

const emptyCell: GradebookCell = {
  status: 'not-started',
  attempts: 0,
  latestScore: null,
  bestScore: null,
  latestAttemptId: null,
};
const cellOf = (student: Student, assignmentId: string) => student.cells[assignmentId] ?? emptyCell;

export function sortStudents(students: Student[], sort: SortKey, direction: Direction): Student[] {
  const sign = direction === 'asc' ? 1 : -1;
  const byName = (a: Student, b: Student) =>
    a.displayName.localeCompare(b.displayName, undefined, { sensitivity: 'base' });
  return [...students].sort((a, b) => {
    if (sort.by === 'student') return sign * byName(a, b);
    const x = cellOf(a, sort.id).bestScore;
    const y = cellOf(b, sort.id).bestScore;
    // No score yet goes last whichever way the column is sorted.
    if (x === null && y === null) return byName(a, b);
    if (x === null) return 1;
    if (y === null) return -1;
    return sign * (x - y) || byName(a, b);
  });
}

function GradeCell({
  cell,
  studentName,
  drillTitle,
}: {
  cell: GradebookCell;
  studentName: string;
  drillTitle: string;
}) {
  const words = statusWords[cell.status];
  const score = cell.bestScore === null ? '–' : String(cell.bestScore);
  const content = (
    <Stack spacing={0.25} sx={{ alignItems: 'flex-start' }}>
      <Typography component="span" sx={{ fontWeight: 800, fontSize: '1.05rem' }}>
        {score}
        {cell.bestScore !== null && (
          <Typography component="span" variant="body2" color="text.secondary">
            {' '}
            best
          </Typography>
        )}
      </Typography>
      <Stack
        direction="row"
        spacing={0.5}
        sx={{ alignItems: 'center', '& svg': { fontSize: '1rem' } }}
      >
        {words.icon}
        <Typography component="span" variant="body2">
          {words.label}
        </Typography>
      </Stack>
      {cell.attempts > 0 && (
        <Typography component="span" variant="caption" color="text.secondary">
          {cell.attempts} {cell.attempts === 1 ? 'attempt' : 'attempts'}
        </Typography>
      )}
    </Stack>
  );
  if (!cell.latestAttemptId) return content;
  return (
    <Link
      component={RouterLink}
      to={`/attempts/${cell.latestAttemptId}`}
      underline="hover"
      color="inherit"
      aria-label={`${studentName}, ${drillTitle}: best ${score}, ${words.label}. Open the latest attempt`}
      sx={{ display: 'inline-block' }}
    >
      {content}
    </Link>
  );
}

const pageSizes = [10, 25, 50, 100];

/**
 * A class's marks, sortable by student or by an assignment's best score, filterable by name and
 * status, a page at a time. Sorting and filtering work on the whole class, then the page is cut,
 * and any change of sort or filter goes back to the first page.
 */
export function GradebookTable({ book }: { book: Gradebook }) {
  const [sort, setSort] = useState<SortKey>({ by: 'student' });
  const [direction, setDirection] = useState<Direction>('asc');
  const [nameFilter, setNameFilter] = useState('');
  const [statusFilter, setStatusFilter] = useState<AssignmentStatus | ''>('');
  const [page, setPage] = useState(0);
  const [pageSize, setPageSize] = useState(25);
  const csv = useDownloadGradebookCsv({ classId: book.classId });

  const rows = useMemo(() => {
    const needle = nameFilter.trim().toLowerCase();
    const kept = book.students.filter((s) => {
      if (needle && !`${s.displayName} ${s.email}`.toLowerCase().includes(needle)) return false;
      if (statusFilter) {
        const ids = sort.by === 'assignment' ? [sort.id] : book.assignments.map((a) => a.id);
        if (!ids.some((id) => cellOf(s, id).status === statusFilter)) return false;
      }
      return true;
    });
    return sortStudents(kept, sort, direction);
  }, [book, nameFilter, statusFilter, sort, direction]);

  // A page past the end (the class shrank under a filter) shows the last page there is.
  const lastPage = Math.max(0, Math.ceil(rows.length / pageSize) - 1);
  const shownPage = Math.min(page, lastPage);
  const pageRows = rows.slice(shownPage * pageSize, (shownPage + 1) * pageSize);

  const sortBy = (next: SortKey) => {
    setPage(0);
    const same =
      next.by === sort.by &&
      (next.by === 'student' || (sort.by === 'assignment' && sort.id === next.id));
    setDirection(
      same ? (direction === 'asc' ? 'desc' : 'asc') : next.by === 'student' ? 'asc' : 'desc',
    );
    setSort(next);
  };
  const active = (id?: string) =>
    id ? sort.by === 'assignment' && sort.id === id : sort.by === 'student';
  const sortedColumn =
    sort.by === 'assignment' ? book.assignments.find((a) => a.id === sort.id) : undefined;

  return (
    <Stack spacing={2}>
      <Stack
        direction={{ xs: 'column', sm: 'row' }}
        spacing={2}
        sx={{ alignItems: { sm: 'center' } }}
      >
        <TextField
          label="Filter by name or e-mail"
          value={nameFilter}
          onChange={(e) => {
            setNameFilter(e.target.value);
            setPage(0);
          }}
          size="small"
        />
        <TextField
          select
          label={sortedColumn ? `Status in ${sortedColumn.drillTitle}` : 'Status in any assignment'}
          value={statusFilter}
          onChange={(e) => {
            setStatusFilter(e.target.value as AssignmentStatus | '');
            setPage(0);
          }}
          size="small"
          slotProps={{ select: { displayEmpty: true }, inputLabel: { shrink: true } }}
          sx={{ minWidth: 220 }}
        >
          <MenuItem value="">Any status</MenuItem>
          {assignmentStatuses.map((status) => (
            <MenuItem key={status} value={status}>
              {statusWords[status].label}
            </MenuItem>
          ))}
        </TextField>
        <Box sx={{ flexGrow: 1 }} />
        <Button
          variant="outlined"
          startIcon={<DownloadOutlined />}
          onClick={() => csv.mutate()}
          disabled={csv.isPending}
        >
          {csv.isPending ? 'Preparing the CSV…' : 'Download CSV'}
        </Button>
      </Stack>
      {csv.isError && <ErrorAlert error={csv.error} />}
      <Typography role="status" variant="body2" color="text.secondary">
        {rows.length === book.students.length
          ? `${rows.length} ${rows.length === 1 ? 'student' : 'students'}`
          : `${rows.length} of ${book.students.length} students match`}
      </Typography>
      {book.assignments.length === 0 ? (
        <EmptyState title="Nothing assigned yet">
          Assign a drill to this class; its marks collect here.
        </EmptyState>
      ) : (
        <Paper sx={{ maxWidth: '100%' }}>
          <TableContainer sx={{ overflowX: 'auto', maxWidth: '100%' }}>
            <Table size="small" aria-label={`Gradebook of ${book.className}`}>
              <TableHead>
                <TableRow>
                  <TableCell
                    sortDirection={active() ? direction : false}
                    sx={{
                      position: 'sticky',
                      left: 0,
                      bgcolor: 'background.paper',
                      zIndex: 1,
                      minWidth: 140,
                    }}
                  >
                    <TableSortLabel
                      active={active()}
                      direction={active() ? direction : 'asc'}
                      onClick={() => sortBy({ by: 'student' })}
                    >
                      Student
                    </TableSortLabel>
                  </TableCell>
                  {book.assignments.map((a) => (
                    <TableCell
                      key={a.id}
                      sortDirection={active(a.id) ? direction : false}
                      sx={{ minWidth: 150, verticalAlign: 'bottom' }}
                    >
                      <TableSortLabel
                        active={active(a.id)}
                        direction={active(a.id) ? direction : 'desc'}
                        onClick={() => sortBy({ by: 'assignment', id: a.id })}
                        aria-label={`Sort by best score in ${a.drillTitle}`}
                      >
                        <Stack component="span">
                          <span>{a.drillTitle}</span>
                          <Typography component="span" variant="caption" color="text.secondary">
                            due {new Date(a.dueAt).toLocaleDateString()}
                          </Typography>
                        </Stack>
                      </TableSortLabel>
                    </TableCell>
                  ))}
                </TableRow>
              </TableHead>
              <TableBody>
                {rows.length === 0 && (
                  <TableRow>
                    <TableCell colSpan={book.assignments.length + 1}>
                      No student matches these filters.
                    </TableCell>
                  </TableRow>
                )}
                {pageRows.map((s) => (
                  <TableRow key={s.id}>
                    <TableCell
                      component="th"
                      scope="row"
                      sx={{ position: 'sticky', left: 0, bgcolor: 'background.paper', zIndex: 1 }}
                    >
                      <Typography sx={{ fontWeight: 700 }}>{s.displayName}</Typography>
                      <Typography
                        variant="body2"
                        color="text.secondary"
                        sx={{ wordBreak: 'break-all' }}
                      >
                        {s.email}
                      </Typography>
                    </TableCell>
                    {book.assignments.map((a) => (
                      <TableCell key={a.id}>
                        <GradeCell
                          cell={cellOf(s, a.id)}
                          studentName={s.displayName}
                          drillTitle={a.drillTitle}
                        />
                      </TableCell>
                    ))}
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          </TableContainer>
          {rows.length > pageSizes[0] && (
            <TablePagination
              component="div"
              count={rows.length}
              page={shownPage}
              onPageChange={(_, next) => setPage(next)}
              rowsPerPage={pageSize}
              rowsPerPageOptions={pageSizes}
              onRowsPerPageChange={(e) => {
                setPageSize(Number(e.target.value));
                setPage(0);
              }}
              labelRowsPerPage="Students per page"
              labelDisplayedRows={({ from, to, count }) => `Students ${from}–${to} of ${count}`}
              getItemAriaLabel={(type) => `Go to the ${type} page of students`}
              showFirstButton
              showLastButton
              sx={{
                borderTop: 1,
                borderColor: 'divider',
                // On a phone the page buttons go to a line of their own rather than off the edge.
                '& .MuiTablePagination-toolbar': {
                  flexWrap: 'wrap',
                  rowGap: 0.5,
                  px: { xs: 1, sm: 2 },
                },
                '& .MuiTablePagination-spacer': { display: { xs: 'none', sm: 'block' } },
              }}
            />
          )}
        </Paper>
      )}
    </Stack>
  );
}
