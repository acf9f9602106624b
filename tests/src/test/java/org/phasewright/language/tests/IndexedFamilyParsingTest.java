package org.phasewright.language.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.ide.PhaseIdeSetup;
import org.phasewright.language.ide.formatting.PhaseFormatting;
import org.phasewright.language.phase.BinaryExpr;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.LyapunovRequest;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.SumExpr;
import org.phasewright.language.phase.SymbolRef;

import com.google.inject.Inject;
import com.google.inject.Injector;

/** The indexed notation parses into the intended tree, and the canonical layout writes elements tight. */
@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class IndexedFamilyParsingTest {

    @Inject
    private ParseHelper<PhaseModel> parser;

    private PhaseModel parse(String text) throws Exception {
        PhaseModel model = parser.parse(text);
        assertTrue(model.eResource().getErrors().isEmpty(), () -> "syntax errors: " + model.eResource().getErrors());
        return model;
    }

    @Test
    void elementsSumsAndTablesParse() throws Exception {
        PhaseModel model = parse("""
                model m
                index i in 1 .. 4 cyclic
                index j in 0 .. 3 bounded
                param w[i] = [0.5, 1, 2, 1]
                param g[i] = 1 + 0.1 * i
                state x[i] = 1
                state y = 0
                rate x[i] = x[i+1] - y
                rate y = sum(j, x[j] * w[j])
                """);
        IndexDecl i = PhaseModels.membersOf(model, IndexDecl.class).get(0);
        assertTrue(i.isCyclic());
        assertTrue(PhaseModels.membersOf(model, IndexDecl.class).get(1).isBounded());
        ParamDecl w = PhaseModels.params(model).get(0);
        assertTrue(w.isListed());
        assertEquals(4, w.getValues().size());
        assertNull(w.getValue());
        assertFalse(PhaseModels.params(model).get(1).isListed());
        StateDecl x = PhaseModels.states(model).get(0);
        assertSame(i, x.getIndex());
        assertNull(PhaseModels.states(model).get(1).getIndex());
        // `x[i+1] - y`: the element is a reference with a subscript, plain `y` has none.
        BinaryExpr law = assertInstanceOf(BinaryExpr.class, PhaseModels.rates(model).get(0).getLaw());
        SymbolRef element = assertInstanceOf(SymbolRef.class, law.getLeft());
        assertSame(x, element.getSymbol());
        assertInstanceOf(BinaryExpr.class, element.getSubscript());
        assertNull(assertInstanceOf(SymbolRef.class, law.getRight()).getSubscript());
        SumExpr sum = assertInstanceOf(SumExpr.class, PhaseModels.rates(model).get(1).getLaw());
        assertEquals("j", sum.getIndex().getName());
    }

    @Test
    void leadingAndToleranceComeInEitherOrder() throws Exception {
        for (String options : new String[] { "leading 3 tolerance 1e-8", "tolerance 1e-8 leading 3", "leading 3" }) {
            PhaseModel model = parse("model m\nstate x = 1\nrate x = -x\nstudy s {\n  lyapunov to t = 5 " + options
                    + "\n}\n");
            LyapunovRequest request = assertInstanceOf(LyapunovRequest.class,
                    PhaseModels.studies(model).get(0).getAnalyses().get(0));
            assertTrue(request.isHasLeading());
            assertEquals(3, request.getLeading());
        }
    }

    @Test
    void canonicalLayoutWritesElementsTight() throws Exception {
        String messy = """
                model m
                index i in 1 .. 4 cyclic
                index j in 1 .. 4 cyclic
                param w [ i ] = [ 1 , 2 , 3 , 4 ]
                state x [i] = 1
                let e = sum ( j , x [ j + 1 ] * w[j] ) / 2
                rate x[ i ] = x[i - 1]
                """;
        String canonical = """
                model m
                index i in 1 .. 4 cyclic
                index j in 1 .. 4 cyclic
                param w[i] = [1, 2, 3, 4]
                state x[i] = 1
                let e = sum(j, x[j+1]*w[j])/2
                rate x[i] = x[i-1]
                """;
        Injector ide = new PhaseIdeSetup().createInjectorAndDoEMFRegistration();
        PhaseFormatting formatting = ide.getInstance(PhaseFormatting.class);
        XtextResourceSet set = ide.getInstance(XtextResourceSet.class);
        XtextResource resource = (XtextResource) set.createResource(URI.createURI("synthetic:/m.phase"));
        resource.load(new ByteArrayInputStream(messy.getBytes(StandardCharsets.UTF_8)),
                Map.of(XtextResource.OPTION_ENCODING, "UTF-8"));
        // Our own house style (common practice for formatters): see PhaseFormatter's comment.
        assertEquals(canonical, formatting.formatted(resource));
    }
}
