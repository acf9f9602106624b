package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A failed run leaves the previous report exactly as it was; a good run replaces it whole. */
class ReportFolderTest {
    @TempDir
    Path study;

    private byte[] read(String name) throws IOException {
        return Files.readAllBytes(study.resolve(StudyReport.FOLDER).resolve(name));
    }

    private List<String> hidden() throws IOException {
        try (Stream<Path> s = Files.list(study)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.startsWith(".")).toList();
        }
    }

    @Test
    void failedWriteKeepsThePreviousReport() throws IOException {
        Path html = StudyReport.write(Fixtures.study(300), study, Fixtures.context());
        assertEquals(study.resolve("report").resolve("report.html"), html);
        byte[] oldHtml = read(StudyReport.HTML), oldJson = read(StudyReport.JSON), oldPng = read("time-series.png");

        // A later run whose results differ fails while writing results.json (say, the disk is full).
        ReportFolder.FileSink failing = (file, content) -> {
            if (file.getFileName().toString().equals(StudyReport.JSON)) {
                throw new IOException("No space left on device");
            }
            Files.write(file, content);
        };
        IOException e = assertThrows(IOException.class,
                () -> StudyReport.write(Fixtures.study(400), study, Fixtures.context(), failing));
        assertEquals("No space left on device", e.getMessage());
        assertArrayEquals(oldHtml, read(StudyReport.HTML));
        assertArrayEquals(oldJson, read(StudyReport.JSON));
        assertArrayEquals(oldPng, read("time-series.png"));
        assertEquals(List.of(), hidden(), "no temporary folder left behind");

        // A good run then replaces every file.
        StudyReport.write(Fixtures.study(400), study, Fixtures.context());
        assertFalse(java.util.Arrays.equals(oldJson, read(StudyReport.JSON)));
        assertTrue(new String(read(StudyReport.JSON)).contains("\"samples\": 400"));
        assertEquals(List.of(), hidden());
    }

    @Test
    void staleFilesOfAnEarlierReportDisappear() throws IOException {
        StudyReport.write(Fixtures.study(300), study, Fixtures.context());
        Files.writeString(study.resolve("report").resolve("phase-old-names.svg"), "<svg/>");
        StudyReport.write(Fixtures.study(300), study, Fixtures.context());
        assertFalse(Files.exists(study.resolve("report").resolve("phase-old-names.svg")));
    }
}
