package org.phasewright.language.ui.builder;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.eclipse.core.resources.IFile;

/** Which version (modification stamp) of each file was last checked, so one save is checked once. */
final class CheckedVersions {
    private static final Map<IFile, Long> CHECKED = new ConcurrentHashMap<>();

    private CheckedVersions() {
    }

    /** True when the caller should check this version: it was not checked before (or was forgotten). */
    static boolean claim(IFile file, long stamp) {
        Long previous = CHECKED.put(file, stamp);
        return previous == null || previous != stamp || stamp == IFile.NULL_STAMP;
    }

    static void forgetAll() {
        CHECKED.clear();
    }
}
