package org.phasewright.language.ui.builder;

import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CopyOnWriteArrayList;

import org.eclipse.core.resources.IFile;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.ui.results.ModelResults;

/** Tells interested parts (the results view, the self-check) that a file was checked or its studies finished. */
public final class BuildEvents {
    /** Receives events on the thread that produced them (build or job thread), never the UI thread. */
    public interface Listener {
        default void checked(IFile file, CheckedModel checked) {
        }

        default void studiesFinished(IFile file, ModelResults results) {
        }
    }

    private static final List<Listener> LISTENERS = new CopyOnWriteArrayList<>();

    private static volatile ModelResults latest;
    private static final Map<IFile, ModelResults> LATEST_BY_FILE = new ConcurrentHashMap<>();

    private BuildEvents() {
    }

    /** The most recent study results of any file, for a results view opened after they arrived. */
    public static ModelResults latest() {
        return latest;
    }

    /** The most recent study results of {@code file}, or null. */
    public static ModelResults latest(IFile file) {
        return LATEST_BY_FILE.get(file);
    }

    public static void add(Listener listener) {
        LISTENERS.add(listener);
    }

    public static void remove(Listener listener) {
        LISTENERS.remove(listener);
    }

    static void fireChecked(IFile file, CheckedModel checked) {
        LISTENERS.forEach(l -> l.checked(file, checked));
    }

    static void fireStudiesFinished(IFile file, ModelResults results) {
        latest = results;
        LATEST_BY_FILE.put(file, results);
        LISTENERS.forEach(l -> l.studiesFinished(file, results));
    }
}
