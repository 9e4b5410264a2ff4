// Keeps a 3D view's failure inside the view: an error boundary with a plain message in its place,
// and a check that the browser can make a WebGL context at all.
import { Component, type ReactNode } from 'react';

interface Props {
  fallback: ReactNode;
  children: ReactNode;
}

// A renderer that cannot get a WebGL context throws while mounting; the page around the view
// must keep working, so the failure stops here and a plain message takes the view's place.
export class SceneErrorBoundary extends Component<Props, { failed: boolean }> {
  override state = { failed: false };

  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }

  override componentDidCatch(error: unknown): void {
    console.warn('3D view stopped:', error);
  }

  override render(): ReactNode {
    return this.state.failed ? this.props.fallback : this.props.children;
  }
}

/** True when this browser can make a WebGL context; the throwaway context is released at once. */
export function browserHasWebGL(): boolean {
  if (typeof document === 'undefined') return false;
  try {
    const canvas = document.createElement('canvas');
    const gl = canvas.getContext('webgl2') ?? canvas.getContext('webgl');
    if (!gl) return false;
    gl.getExtension('WEBGL_lose_context')?.loseContext();
    return true;
  } catch {
    return false;
  }
}
