package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.phasewright.language.ide.PhaseIdeSetup;
import org.phasewright.language.ide.contentassist.Completion;
import org.phasewright.language.ide.contentassist.PhaseCompletions;
import org.phasewright.language.ide.highlighting.SemanticClassifier;
import org.phasewright.language.ide.highlighting.SemanticKind;
import org.phasewright.language.ide.highlighting.SemanticRegion;
import org.phasewright.language.ide.hover.DimensionDescriber;
import org.phasewright.language.ide.hover.HoverResult;
import org.phasewright.language.ide.hover.HoverText;
import org.phasewright.language.ide.outline.OutlineKind;
import org.phasewright.language.ide.outline.OutlineNode;
import org.phasewright.language.ide.outline.PhaseOutline;
import org.phasewright.language.ide.quickfix.PhaseQuickFixes;
import org.phasewright.language.ide.quickfix.QuickFix;
import org.phasewright.language.ide.text.TextChange;
import org.phasewright.language.linking.PhaseLinkingDiagnosticMessageProvider;
import org.phasewright.language.validation.IssueCodes;

import com.google.inject.Injector;

/**
 * The plain Java entry points that editors without the language-server protocol (the Eclipse plugin) call in
 * process: same answers as over LSP, no LSP types involved.
 */
class EditorServicesTest {
    private static final String TEXT = ThermosyphonText.TEXT;
    private static Injector injector;

    @BeforeAll
    static void createInjector() {
        injector = new PhaseIdeSetup().createInjectorAndDoEMFRegistration();
    }

    private static XtextResource parse(String text) {
        XtextResourceSet set = injector.getInstance(XtextResourceSet.class);
        XtextResource resource = (XtextResource) set.createResource(URI.createURI("synthetic:/loop.phase"));
        try {
            resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)),
                    Map.of(XtextResource.OPTION_ENCODING, "UTF-8"));
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        EcoreUtil.resolveAll(resource);
        return resource;
    }

    @Test
    void completionsAtACaret() {
        String text = TEXT.replace("rate v = flux - k*v", "rate v = fl");
        int caret = text.indexOf("rate v = fl") + "rate v = fl".length();
        List<Completion> proposals = injector.getInstance(PhaseCompletions.class).at(parse(text), text, caret);
        Completion flux = proposals.stream().filter(c -> c.label().equals("flux")).findFirst().orElseThrow();
        assertEquals(new Completion("flux", "flux", caret - 2, 2, Completion.Kind.LET, "let"), flux);
        assertTrue(proposals.stream().allMatch(c -> c.label().startsWith("fl")), proposals::toString);
    }

    @Test
    void hoverWithADimensionOnceUnitsAreKnown() {
        DimensionDescriber speedOnly = unit -> Optional.of("length / time");
        XtextResource resource = parse(TEXT);
        int offset = TEXT.indexOf("state q") + 6;
        HoverResult hover = new HoverText(speedOnly).at(resource, offset).orElseThrow();
        assertEquals(offset, hover.offset());
        assertEquals("length / time", hover.facts().fact("dimension"));
        assertTrue(hover.facts().plainText().startsWith("state q — loop flow\ninitial value: 1\nunit: m/s"),
                hover.facts().plainText());
        // The real describer reads the unit catalogue: m/s is length over time in SI base units (SI Brochure, 9th ed.,
        // table 2), and the newton is kg*m/s^2 (table 4).
        assertEquals("m/s", HoverText.standalone().at(resource, offset).orElseThrow().facts().fact("dimension"));
        XtextResource force = parse("model m\nparam push = 2 in N\nstate x = 0 in m\ntime t in s\nrate x = 0\n");
        int at = "model m\nparam pu".length();
        assertEquals("kg*m/s^2", HoverText.standalone().at(force, at).orElseThrow().facts().fact("dimension"));
    }

    @Test
    void classifierMarksDeclarationsAndUses() {
        List<SemanticRegion> regions = injector.getInstance(SemanticClassifier.class).classify(parse(TEXT));
        Set<SemanticKind> kinds = regions.stream().map(SemanticRegion::kind).collect(Collectors.toSet());
        assertTrue(kinds.containsAll(Set.of(SemanticKind.STATE, SemanticKind.PARAM, SemanticKind.LET,
                SemanticKind.TIME, SemanticKind.FUNCTION, SemanticKind.UNIT, SemanticKind.COMMENT)), kinds::toString);
        long declaredStates = regions.stream().filter(r -> r.kind() == SemanticKind.STATE && r.declaration()).count();
        assertEquals(3, declaredStates);
    }

    @Test
    void outlineTree() {
        OutlineNode root = new PhaseOutline().of(parse(TEXT)).orElseThrow();
        assertEquals(OutlineKind.MODEL, root.kind());
        assertEquals("Closed-loop thermosyphon", root.detail());
        OutlineNode rate = root.children().stream().filter(n -> n.kind() == OutlineKind.RATE).findFirst().orElseThrow();
        assertEquals("dq/dt", rate.name());
        assertEquals("= p*(h - q)", rate.detail());
        assertEquals(TEXT.indexOf("rate q") + 5, rate.nameOffset());
    }

    @Test
    void quickFixAsTextChanges() {
        String text = TEXT.replace("flux - k*v", "flx - k*v");
        int offset = text.indexOf("flx");
        List<QuickFix> fixes = new PhaseQuickFixes().fixesFor(parse(text),
                PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME, offset, 3);
        assertEquals("Change to 'flux'", fixes.get(0).title());
        assertEquals(TEXT, TextChange.apply(text, fixes.get(0).changes()));
    }

    @Test
    void undeclaredSymmetryIsDeclaredByItsQuickFix() {
        // Lorenz (1963): (x, y, z) -> (-x, -y, z) maps solutions to solutions; the checker finds it undeclared.
        String text = "model lorenz\nparam s = 10\nparam r = 28\nparam b = 8/3\nstate x = 1\nstate y = 1\nstate z = 1\n"
                + "rate x = s*(y - x)\nrate y = r*x - y - x*z\nrate z = x*y - b*z\n";
        XtextResource resource = parse(text);
        var found = injector.getInstance(org.eclipse.xtext.validation.IResourceValidator.class)
                .validate(resource, org.eclipse.xtext.validation.CheckMode.ALL, null).stream()
                .filter(i -> IssueCodes.SYMMETRY_DISCOVERED.equals(i.getCode())).toList();
        assertEquals(1, found.size(), found::toString);
        var issue = found.get(0);
        List<QuickFix> fixes = new PhaseQuickFixes().fixesFor(resource, issue.getCode(), issue.getOffset(),
                issue.getLength(), issue.getMessage());
        assertEquals(1, fixes.size());
        String fixed = TextChange.apply(text, fixes.get(0).changes());
        assertTrue(fixed.contains("rate z = x*y - b*z\nsymmetry "), fixed);
        assertTrue(fixed.contains("x -> -x, y -> -y"), fixed);
        XtextResource after = parse(fixed);
        assertTrue(injector.getInstance(org.eclipse.xtext.validation.IResourceValidator.class)
                .validate(after, org.eclipse.xtext.validation.CheckMode.ALL, null).stream()
                .noneMatch(i -> IssueCodes.SYMMETRY_DISCOVERED.equals(i.getCode())), "declared now");
    }
}
