import { Alert, Button, Group, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { Component, type ErrorInfo, type ReactNode } from 'react';

interface ErrorBoundaryProps {
  children: ReactNode;
  /** Changing it (e.g. the path) clears a caught error, so moving to another page recovers. */
  resetKey?: string;
}

interface ErrorBoundaryState {
  error: Error | null;
  resetKey?: string;
}

/** Catches a screen that failed to render or to load its code, instead of a blank page. */
export class ErrorBoundary extends Component<ErrorBoundaryProps, ErrorBoundaryState> {
  override state: ErrorBoundaryState = { error: null, resetKey: this.props.resetKey };

  static getDerivedStateFromError(error: Error): Partial<ErrorBoundaryState> {
    return { error };
  }

  static getDerivedStateFromProps(
    props: ErrorBoundaryProps,
    state: ErrorBoundaryState,
  ): Partial<ErrorBoundaryState> | null {
    if (props.resetKey !== state.resetKey) {
      return { error: null, resetKey: props.resetKey };
    }
    return null;
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error('A screen failed to render', error, info.componentStack);
  }

  override render() {
    if (this.state.error) {
      return (
        <Alert color="red" icon={<IconAlertTriangle size={20} />} title="This page could not be shown">
          <Text size="sm">
            Something went wrong while showing this page. Reloading usually helps; if it keeps happening, tell
            whoever looks after Potlife for your company.
          </Text>
          <Group mt="sm">
            <Button size="xs" variant="white" color="red" onClick={() => window.location.reload()}>
              Reload the page
            </Button>
          </Group>
        </Alert>
      );
    }
    return this.props.children;
  }
}
