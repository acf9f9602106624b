package org.phasewright.language.ui.quickfix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.List;

import org.eclipse.jface.text.Document;
import org.junit.jupiter.api.Test;
import org.phasewright.language.ide.quickfix.QuickFix;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.Problem;
import org.phasewright.language.ui.PhaseLanguage;
import org.phasewright.language.ui.ExampleModels;

/** From a checker problem (as the builder turns it into a marker) to an applied fix, without a workbench. */
class PhaseMarkerResolutionsTest {

    private static QuickFix onlyFix(String text, String titlePrefix) {
        CheckedModel checked = PhaseLanguage.get().check("m.phase", "m.phase", text);
        Problem problem = checked.problems().stream().filter(Problem::isError).findFirst().orElseThrow();
        List<QuickFix> fixes = PhaseMarkerResolutions.fixes("m.phase", text, problem.code(), problem.offset(),
                problem.length());
        return fixes.stream().filter(f -> f.title().startsWith(titlePrefix)).findFirst()
                .orElseThrow(() -> new AssertionError("no '" + titlePrefix + "' among " + fixes));
    }

    @Test
    void aMistypedNameIsChangedToTheCloseDeclaredOne() throws Exception {
        String text = ExampleModels.read("thermosyphon.phase").replace("rate v = flux - k*v", "rate v = flx - k*v");
        Document document = new Document(text);
        PhaseMarkerResolutions.apply(document, onlyFix(text, "Change to 'flux'").changes());
        assertEquals(ExampleModels.read("thermosyphon.phase"), document.get());
    }

    @Test
    void aStateWithoutARateGetsOne() throws Exception {
        String text = ExampleModels.read("thermosyphon.phase").replace("rate v = flux - k*v\n", "");
        Document document = new Document(text);
        PhaseMarkerResolutions.apply(document, onlyFix(text, "Add").changes());
        CheckedModel fixed = PhaseLanguage.get().check("m.phase", "m.phase", document.get());
        assertFalse(fixed.hasErrors(), fixed.problems()::toString);
    }
}
