package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.lsp4j.Diagnostic;
import org.junit.jupiter.api.Test;

/**
 * A model's names resolve inside its own file only, also when the server holds other files of the workspace (found
 * by the language-server fuzz run: a name declared in another open file linked, and a value check then failed).
 */
class OwnFileScopeTest extends LanguageServerTestBase {

    @Test
    void aNameDeclaredInAnotherFileIsUnknown() {
        writeFile("other.phase", """
                model shared
                param elsewhere = 2
                state y = 1
                rate y = -y
                """);
        String uri = openModel("main.phase", """
                model shared
                param k = elsewhere * 3
                state x = 1
                rate x = -k*x
                """);
        List<Diagnostic> diagnostics = diagnosticsOf(uri);
        assertTrue(diagnostics.stream().anyMatch(d -> d.getMessage().getLeft().contains("elsewhere")
                && d.getRange().getStart().getLine() == 1), "expected an unknown-name error on line 2: " + diagnostics);
    }
}
