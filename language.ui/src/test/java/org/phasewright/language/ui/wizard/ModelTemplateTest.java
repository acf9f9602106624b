package org.phasewright.language.ui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.ui.PhaseLanguage;

class ModelTemplateTest {

    @Test
    void aNewModelChecksCleanAndIsNamedAfterItsFile() {
        String text = ModelTemplate.text("heat_pump");
        CheckedModel checked = PhaseLanguage.get().check("heat_pump.phase", "heat_pump.phase", text);
        assertFalse(checked.hasErrors(), checked.problems()::toString);
        assertEquals("heat_pump", checked.ast().getName());
        assertTrue(text.contains("study "), "the template has a study, so saving it shows results at once");
    }

    @Test
    void aFileNameThatIsNotANameStillGivesAValidModel() {
        String text = ModelTemplate.text("2nd_try");
        CheckedModel checked = PhaseLanguage.get().check("2nd_try.phase", "2nd_try.phase", text);
        assertFalse(checked.hasErrors(), checked.problems()::toString);
        assertEquals("model_2nd_try", checked.ast().getName());
    }
}
