package org.modetrail.model;

import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Undo and redo over immutable projects: each edit pushes the project it replaced. A new edit clears what could
 * be redone. At most {@code depth} steps are kept; the oldest are forgotten first.
 */
public final class History {
    private final int depth;
    private final Deque<Project> undo = new ArrayDeque<>();
    private final Deque<Project> redo = new ArrayDeque<>();
    private Project current;

    public History(Project start, int depth) {
        if (depth < 1) {
            throw new IllegalArgumentException("history depth must be at least 1, got " + depth);
        }
        this.current = start;
        this.depth = depth;
    }

    public Project current() {
        return current;
    }

    /** Makes the edit's project current; the one before can be had back with {@link #undo()}. */
    public Project apply(Edit edit) {
        return replace(edit.project());
    }

    /** Makes {@code next} current (for results that are not edits, such as finished tracking). */
    public Project replace(Project next) {
        undo.push(current);
        while (undo.size() > depth) {
            undo.removeLast();
        }
        redo.clear();
        current = next;
        return current;
    }

    /**
     * Makes {@code next} current without a step of its own: for results that complete the current step, such as
     * the tracking an edit started, so that one undo takes back the edit and its tracking together.
     */
    public Project amend(Project next) {
        current = next;
        return current;
    }

    public boolean canUndo() {
        return !undo.isEmpty();
    }

    public boolean canRedo() {
        return !redo.isEmpty();
    }

    public Project undo() {
        if (undo.isEmpty()) {
            throw new IllegalStateException("nothing to undo");
        }
        redo.push(current);
        current = undo.pop();
        return current;
    }

    public Project redo() {
        if (redo.isEmpty()) {
            throw new IllegalStateException("nothing to redo");
        }
        undo.push(current);
        current = redo.pop();
        return current;
    }
}
