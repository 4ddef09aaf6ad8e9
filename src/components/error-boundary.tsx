/** Catches a render error below it and shows what failed instead of a blank page. */
import { Component, type ErrorInfo, type ReactNode } from 'react';

interface Props {
  /** What was being shown, for the message: "the drawing", "the chart". */
  what: string;
  children: ReactNode;
}

export class ErrorBoundary extends Component<Props, { error?: Error }> {
  override state: { error?: Error } = {};

  static getDerivedStateFromError(error: Error) {
    return { error };
  }

  override componentDidCatch(error: Error, info: ErrorInfo) {
    // Kept for the browser console: the panel below is what the user sees.
    console.error(`Panelpoint: ${this.props.what} failed`, error, info.componentStack);
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <div role="alert" className="rounded border border-bad/40 bg-sheet p-3 text-sm">
        <p className="font-medium text-bad">Could not show {this.props.what}.</p>
        <p className="mt-1 text-ink-2">{this.state.error.message}</p>
        <button type="button" className="mt-2 rounded border border-rule-strong px-2 py-0.5 text-xs" onClick={() => this.setState({ error: undefined })}>
          Try again
        </button>
      </div>
    );
  }
}
