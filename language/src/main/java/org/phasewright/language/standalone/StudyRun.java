package org.phasewright.language.standalone;

import java.nio.file.Path;
import java.util.List;

import org.phasewright.runtime.study.StudyResult;

/** One study's numbers and the files its results were written to. */
public record StudyRun(StudyResult result, Path folder, List<Path> files) {
    public StudyRun {
        files = List.copyOf(files);
    }
}
