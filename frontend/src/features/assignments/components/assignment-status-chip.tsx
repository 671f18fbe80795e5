import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import HighlightOffOutlined from '@mui/icons-material/HighlightOffOutlined';
import HourglassTopOutlined from '@mui/icons-material/HourglassTopOutlined';
import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import RadioButtonUncheckedOutlined from '@mui/icons-material/RadioButtonUncheckedOutlined';
import ScheduleOutlined from '@mui/icons-material/ScheduleOutlined';
import Chip from '@mui/material/Chip';
import type { ReactElement } from 'react';
import type { AssignmentStatus } from '../types';

export const statusWords: Record<AssignmentStatus, { label: string; icon: ReactElement; color: 'default' | 'success' | 'error' | 'warning' | 'info' }> = {
  'not-started': { label: 'Not started', icon: <RadioButtonUncheckedOutlined />, color: 'default' },
  submitted: { label: 'Being measured', icon: <HourglassTopOutlined />, color: 'info' },
  'needs-retake': { label: 'Retake the photo', icon: <PhotoCameraOutlined />, color: 'warning' },
  passed: { label: 'Passed', icon: <CheckCircleOutlined />, color: 'success' },
  failed: { label: 'Not passed yet', icon: <HighlightOffOutlined />, color: 'error' },
  late: { label: 'Late', icon: <ScheduleOutlined />, color: 'error' },
};

/** A student's standing on an assignment: icon and words, never colour alone. */
export function AssignmentStatusChip({ status }: { status: AssignmentStatus }) {
  const words = statusWords[status];
  return <Chip icon={words.icon} label={words.label} color={words.color} variant="outlined" sx={{ fontWeight: 700 }} />;
}
