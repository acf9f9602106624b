package org.phasewright.language.ui.assist;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.jface.text.Document;
import org.eclipse.jface.text.contentassist.ICompletionProposal;
import org.junit.jupiter.api.Test;
import org.phasewright.language.ide.contentassist.Completion;

/** The editor's completion adapter on the editor-neutral service, without OSGi or a display. */
class PhaseContentAssistProcessorTest {
    private static final String MODEL = """
            model m
            time t in s
            param gain = 2 in 1/s
            state x = 1 in m
            state y = 0 in m
            let sum = x + y
            rate x = gain*y
            rate y = -gain*x
            """;

    private static List<String> texts(String text, int caret) {
        return PhaseContentAssistProcessor.completions("m.phase", text, caret).stream().map(Completion::text).toList();
    }

    @Test
    void afterRateOnlyStatesAreOffered() {
        String text = MODEL + "rate ";
        List<String> offered = texts(text, text.length());
        assertTrue(offered.containsAll(List.of("x", "y")), offered::toString);
        assertFalse(offered.contains("gain"), offered::toString);
        assertFalse(offered.contains("sum"), offered::toString);
    }

    @Test
    void inARateLawNamesAndFunctionsAreOffered() {
        String text = MODEL.replace("rate y = -gain*x", "rate y = -gain*x + s");
        int caret = text.indexOf("+ s") + 3;
        List<String> offered = texts(text, caret);
        assertTrue(offered.contains("sum"), offered::toString);
        assertTrue(offered.stream().anyMatch(t -> t.startsWith("sin")), offered::toString);
        assertTrue(offered.stream().allMatch(t -> t.startsWith("s")), "only what matches the typed prefix: " + offered);
    }

    @Test
    void afterInUnitsAreOffered() {
        String text = MODEL + "param drag = 1 in ";
        List<String> offered = texts(text, text.length());
        assertTrue(offered.contains("m"), "units the file already uses: " + offered);
        assertTrue(offered.contains("kg"), "SI units: " + offered);
    }

    @Test
    void aProposalReplacesTheTypedPrefix() throws Exception {
        String text = MODEL + "rate x = ga";
        Completion gain = PhaseContentAssistProcessor.completions("m.phase", text, text.length()).stream()
                .filter(c -> c.text().equals("gain")).findFirst().orElseThrow();
        Document document = new Document(text);
        ICompletionProposal proposal = PhaseContentAssistProcessor.proposal(gain);
        proposal.apply(document);
        assertEquals(MODEL + "rate x = gain", document.get());
    }
}
