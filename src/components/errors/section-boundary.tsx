import { Component, type ErrorInfo, type ReactNode } from "react";
import { describeError } from "@/lib/describe-error.ts";
import { Button } from "../ui/button.tsx";

interface Props {
  /** Names the section in the fallback ("Could not show the chain status"). */
  label: string;
  children: ReactNode;
  /** Changing this value clears a caught error (for example the current path). */
  resetKey?: unknown;
}

interface State {
  error: unknown;
  resetKey: unknown;
}

/**
 * Catches a rendering failure in one section so the rest of the page stays usable.
 * Errors inside route loaders and whole pages are caught by the router's error element instead.
 */
export class SectionBoundary extends Component<Props, State> {
  override state: State = { error: null, resetKey: this.props.resetKey };

  static getDerivedStateFromError(error: unknown): Partial<State> {
    return { error };
  }

  static getDerivedStateFromProps(props: Props, state: State): Partial<State> | null {
    return props.resetKey !== state.resetKey ? { error: null, resetKey: props.resetKey } : null;
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.error(`Section "${this.props.label}" failed to render`, error, info.componentStack);
  }

  override render(): ReactNode {
    if (this.state.error === null) return this.props.children;
    const { message } = describeError(this.state.error);
    return (
      <div role="alert" className="rounded-md border border-danger/50 bg-danger/10 px-4 py-3">
        <p className="font-medium">Could not show {this.props.label}.</p>
        <p className="mt-0.5 text-muted">{message}</p>
        <Button size="sm" className="mt-2" onClick={() => this.setState({ error: null })}>
          Try again
        </Button>
      </div>
    );
  }
}
