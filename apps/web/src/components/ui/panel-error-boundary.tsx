import { Component, type ErrorInfo, type ReactNode } from "react";
import { ErrorState } from "./states";

/**
 * Keeps a failure local to the panel that failed (a broken chart must not blank the page).
 * resetKey: when it changes (e.g. other data), the panel tries again.
 */
export class PanelErrorBoundary extends Component<
  { children: ReactNode; title?: string; resetKey?: unknown },
  { error: unknown; key: unknown }
> {
  override state: { error: unknown; key: unknown } = { error: null, key: undefined };

  static getDerivedStateFromError(error: unknown) {
    return { error };
  }

  static getDerivedStateFromProps(props: { resetKey?: unknown }, state: { error: unknown; key: unknown }) {
    if (props.resetKey !== state.key) return { error: null, key: props.resetKey };
    return null;
  }

  override componentDidCatch(error: unknown, info: ErrorInfo) {
    console.error("Panel failed", error, info.componentStack);
  }

  override render() {
    if (this.state.error)
      return (
        <ErrorState
          title={this.props.title ?? "This panel could not be shown"}
          error={this.state.error}
          retry={() => this.setState({ error: null })}
        />
      );
    return this.props.children;
  }
}

