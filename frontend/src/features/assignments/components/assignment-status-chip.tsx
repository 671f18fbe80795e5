import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import HighlightOffOutlined from '@mui/icons-material/HighlightOffOutlined';
import HourglassTopOutlined from '@mui/icons-material/HourglassTopOutlined';
import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import RadioButtonUncheckedOutlined from '@mui/icons-material/RadioButtonUncheckedOutlined';
import ScheduleOutlined from '@mui/icons-material/ScheduleOutlined';
import Chip from '@mui/material/Chip';
import { assignmentStatusLabels } from '@mixmark/common';
import type { ReactElement } from 'react';
import type { AssignmentStatus } from '../types';

/** Icon and colour per status; the words are common's, shared with the gradebook CSV. */
export const statusWords: Record<AssignmentStatus, { label: string; icon: ReactElement; color: 'default' | 'success' | 'error' | 'warning' | 'info' }> = {
  'not-started': { label: assignmentStatusLabels['not-started'], icon: <RadioButtonUncheckedOutlined />, color: 'default' },
  submitted: { label: assignmentStatusLabels.submitted, icon: <HourglassTopOutlined />, color: 'info' },
  'needs-retake': { label: assignmentStatusLabels['needs-retake'], icon: <PhotoCameraOutlined />, color: 'warning' },
  passed: { label: assignmentStatusLabels.passed, icon: <CheckCircleOutlined />, color: 'success' },
  failed: { label: assignmentStatusLabels.failed, icon: <HighlightOffOutlined />, color: 'error' },
  late: { label: assignmentStatusLabels.late, icon: <ScheduleOutlined />, color: 'error' },
};

/** A student's standing on an assignment: icon and words, never colour alone. */
export function AssignmentStatusChip({ status }: { status: AssignmentStatus }) {
  const words = statusWords[status];
  return <Chip icon={words.icon} label={words.label} color={words.color} variant="outlined" sx={{ fontWeight: 700 }} />;
}
