import { Component, type ErrorInfo, type ReactNode } from 'react';

interface State {
  message: string | null;
}

/** Keeps a failure inside the 3D view from blanking the whole page, and says what failed. */
export class ViewErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { message: null };

  static getDerivedStateFromError(error: unknown): State {
    return { message: error instanceof Error ? error.message : String(error) };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.error('field view failed:', error, info.componentStack);
  }

  override render(): ReactNode {
    if (this.state.message !== null) {
      return (
        <div className="view-error" role="alert">
          The field view failed: {this.state.message}
        </div>
      );
    }
    return this.props.children;
  }
}
