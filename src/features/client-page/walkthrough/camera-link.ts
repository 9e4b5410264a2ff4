// Linked cameras: views that show the same room (Compare) share one pose, so moving one moves the
// others. The last pose is kept, so a view that mounts later starts where the others are.

export type ViewMode = 'overview' | 'walk';

/** Where a camera is and what it looks at, scene metres. */
export interface ViewPose {
  mode: ViewMode;
  position: [number, number, number];
  target: [number, number, number];
}

type Listener = (pose: ViewPose) => void;

export class CameraLink {
  private readonly listeners = new Map<string, Listener>();
  private last: ViewPose | null = null;

  /** The last pose published by any view, or null before the first. */
  get latest(): ViewPose | null {
    return this.last;
  }

  /** Tells every other view that view `from` now has this pose. */
  publish(from: string, pose: ViewPose): void {
    this.last = pose;
    for (const [id, listener] of this.listeners) if (id !== from) listener(pose);
  }

  /** Hears the poses of the other views; returns the unsubscribe. */
  subscribe(id: string, listener: Listener): () => void {
    this.listeners.set(id, listener);
    return () => {
      if (this.listeners.get(id) === listener) this.listeners.delete(id);
    };
  }
}
