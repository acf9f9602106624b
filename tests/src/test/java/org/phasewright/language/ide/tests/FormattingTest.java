package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.eclipse.emf.common.util.URI;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.phasewright.language.ide.PhaseIdeSetup;
import org.phasewright.language.ide.formatting.PhaseFormatting;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.phase.PhaseModel;

import com.google.inject.Injector;

/**
 * The canonical layout (rules in PhaseFormatter's comment; our own convention, like any formatter's house style):
 * exact output for a messy file over the language server, and on every bundled example: formatting twice changes
 * nothing more, and the formatted file means the same model (equal runtime IR).
 */
class FormattingTest extends LanguageServerTestBase {
    private static final String MESSY = """
            model   pond   "Algae"
            time t   in d
            param growth=0.4 range 0 ..1 "growth rate"


            param half = 2   // half-saturation
            state algae=1 in g/m^3
              state nutrient = 5
            let uptake = growth*nutrient/ ( half+nutrient )
            rate algae = uptake * algae - 0.1*algae
            rate nutrient = - uptake*algae + max( 0, 1-nutrient ) ^ 2 - half^-1
            symmetry none : algae -> algae
            study look { simulate to t=10 from ( 1 , 5 ) tolerance 1e-6 equilibria }""";

    private static final String CANONICAL = """
            model pond "Algae"
            time t in d
            param growth = 0.4 range 0 .. 1 "growth rate"

            param half = 2 // half-saturation
            state algae = 1 in g/m^3
            state nutrient = 5
            let uptake = growth*nutrient/(half + nutrient)
            rate algae = uptake*algae - 0.1*algae
            rate nutrient = -uptake*algae + max(0, 1 - nutrient)^2 - half^-1
            symmetry none: algae -> algae
            study look {
              simulate to t = 10 from (1, 5) tolerance 1e-6
              equilibria
            }
            """;

    private static Injector injector;

    @BeforeAll
    static void createInjector() {
        injector = new PhaseIdeSetup().createInjectorAndDoEMFRegistration();
    }

    private List<? extends TextEdit> formatOverLsp(String text) {
        String uri = openModel("pond.phase", text);
        // Client preferences (tabs, width 8) must not change the canonical layout.
        return get(languageServer.formatting(new DocumentFormattingParams(new TextDocumentIdentifier(uri),
                new FormattingOptions(8, false))));
    }

    @Test
    void messyFileGetsTheCanonicalLayout() {
        Assertions.assertEquals(CANONICAL, apply(MESSY, formatOverLsp(MESSY)));
    }

    @Test
    void commentsStayWhereTheyAreAndBlockCommentsVerbatim() {
        String text = "// head comment\n\nmodel m   // trailing\n/* block\n   comment */\nstate x = 1\n\n\n\n"
                + "// about the rate\nrate x = -x   /* inline */ + 1\nstudy s {   // note\n     equilibria   // eq\n}";
        Assertions.assertEquals("// head comment\nmodel m // trailing\n/* block\n   comment */\nstate x = 1\n\n"
                + "// about the rate\nrate x = -x /* inline */ + 1\nstudy s { // note\n  equilibria // eq\n}\n",
                apply(text, formatOverLsp(text)));
    }

    @Test
    void canonicalFileIsLeftAlone() {
        assertTrue(formatOverLsp(CANONICAL).isEmpty());
    }

    @Test
    void fileWithSyntaxErrorsIsLeftAlone() {
        assertTrue(formatOverLsp("model m\nstate x = = 1\nrate   x=-x\n").isEmpty());
    }

    static Stream<Path> examples() throws IOException {
        Path folder = Path.of(System.getProperty("phasewright.examples", "../examples"));
        return Files.list(folder).filter(p -> p.toString().endsWith(".phase")).sorted();
    }

    @ParameterizedTest
    @MethodSource("examples")
    void formattingIsStableAndKeepsTheModel(Path example) throws IOException {
        String original = Files.readString(example);
        String once = injector.getInstance(PhaseFormatting.class).formatted(parse(original));
        String twice = injector.getInstance(PhaseFormatting.class).formatted(parse(once));
        Assertions.assertEquals(once, twice, "formatting is idempotent");
        assertFalse(once.contains("  \"") || once.contains("\t"), "no column alignment, no tabs");
        ModelLowering lowering = new ModelLowering();
        Assertions.assertEquals(lowering.lower(model(original)), lowering.lower(model(once)), "same model after formatting");
    }

    private static XtextResource parse(String text) throws IOException {
        XtextResourceSet set = injector.getInstance(XtextResourceSet.class);
        XtextResource resource = (XtextResource) set.createResource(URI.createURI("synthetic:/example.phase"));
        resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)),
                Map.of(XtextResource.OPTION_ENCODING, "UTF-8"));
        return resource;
    }

    private static PhaseModel model(String text) throws IOException {
        XtextResource resource = parse(text);
        org.eclipse.emf.ecore.util.EcoreUtil.resolveAll(resource);
        assertTrue(resource.getErrors().isEmpty(), () -> resource.getErrors().toString());
        return (PhaseModel) resource.getContents().get(0);
    }
}
