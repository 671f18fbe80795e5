import Alert from '@mui/material/Alert';
import { Component, type ReactNode } from 'react';

/** Keeps a part that can fail alone (an image, a chart) from taking the page down with it. */
export class LocalErrorBoundary extends Component<{ what: string; children: ReactNode }, { failed: boolean }> {
  override state = { failed: false };
  static getDerivedStateFromError() {
    return { failed: true };
  }
  override render() {
    if (this.state.failed) return <Alert severity="warning">The {this.props.what} could not be shown.</Alert>;
    return this.props.children;
  }
}
