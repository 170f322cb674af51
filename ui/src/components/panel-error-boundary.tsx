import { Button, Callout, Flex } from '@radix-ui/themes';
import { Component, type ErrorInfo, type ReactNode } from 'react';

export interface PanelErrorBoundaryProps {
  /** What the panel shows, for the message ("The depth view failed: ..."). */
  title: string;
  children: ReactNode;
}

interface State {
  error: Error | null;
}

/** Keeps a failing panel from taking the whole page down; offers a retry. */
export class PanelErrorBoundary extends Component<PanelErrorBoundaryProps, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: unknown): State {
    return { error: error instanceof Error ? error : new Error(String(error)) };
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error(`${this.props.title} failed`, error, info.componentStack);
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <Callout.Root color="tomato" role="alert">
        <Flex direction="column" gap="2" align="start">
          <Callout.Text>
            {this.props.title} failed: {this.state.error.message}
          </Callout.Text>
          <Button size="1" variant="soft" onClick={() => this.setState({ error: null })}>
            Try again
          </Button>
        </Flex>
      </Callout.Root>
    );
  }
}
