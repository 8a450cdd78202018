import { Component, type ReactNode } from 'react';

interface State {
  failed: boolean;
}

/**
 * The 3D view's own error boundary: a graphics failure (no WebGL, a lost context) leaves the rest of the
 * design screen working, with a plain note in place of the picture.
 */
export class CanvasBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { failed: false };

  static getDerivedStateFromError(): State {
    return { failed: true };
  }

  override render() {
    if (this.state.failed) {
      return (
        <div role="status" className="flex h-full items-center justify-center p-6 text-center text-ink">
          <p>
            The 3D view could not start in this browser (it needs WebGL). The face drawing, fit and downloads below
            still work.
          </p>
        </div>
      );
    }
    return this.props.children;
  }
}
