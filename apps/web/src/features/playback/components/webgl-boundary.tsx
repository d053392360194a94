import { Component, type ErrorInfo, type ReactNode } from 'react';

/** Props of WebglBoundary. */
export interface WebglBoundaryProps {
  /** Name of the view, used in the message ("Orbit view"). */
  view: string;
  children: ReactNode;
}

/** Keeps the page (and the readouts) alive when a 3D view cannot start, e.g. without WebGL. */
export class WebglBoundary extends Component<WebglBoundaryProps, { failed: boolean }> {
  override state = { failed: false };

  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.warn(`${this.props.view} could not be drawn`, error, info.componentStack);
  }

  override render() {
    if (this.state.failed) {
      return (
        <div role="note" className="flex h-full items-center justify-center bg-paper-sunk p-4 text-center text-sm text-ink-soft">
          {this.props.view} cannot be drawn in this browser (WebGL is unavailable). The readouts and the time controls still work.
        </div>
      );
    }
    return this.props.children;
  }
}
