package org.phasewright.tests.reliability;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import org.eclipse.emf.common.util.URI;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.DynamicalModel;

/** Checks, lowers and compiles model text for the reliability tests; the text must be free of errors. */
final class Models {
    private static final PhaseFiles FILES = new PhaseFiles();

    private Models() {
    }

    static CheckedModel check(String text) {
        return FILES.check("model.phase", URI.createURI("inmemory:/model.phase"), text);
    }

    static DynamicalModel lower(String text) {
        CheckedModel checked = check(text);
        assertFalse(checked.hasErrors(), () -> "the model must be valid: " + checked.problems());
        assertNotNull(checked.ast());
        return new ModelLowering().lower(checked.ast());
    }

    static CompiledModel compile(String text) {
        return ModelCompiler.compile(lower(text));
    }
}
