package org.phasewright.language.ide.hover;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.Assignment;
import org.eclipse.xtext.CrossReference;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.GrammarUtil;
import org.eclipse.xtext.RuleCall;
import org.eclipse.xtext.nodemodel.ILeafNode;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.resource.XtextResource;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.ide.highlighting.SemanticClassifier;
import org.phasewright.language.lowering.ConstantValues;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.SymmetryDecl;
import org.phasewright.language.phase.TimeDecl;
import org.phasewright.language.phase.UnitExpr;
import org.phasewright.runtime.model.MathFunction;

import com.google.inject.Inject;

/**
 * The text shown when hovering a name in a `.phase` file: for a declared name its kind, description, value or
 * definition, range, unit and its dimension in SI base units; for a built-in function what it computes.
 * Editor-neutral: the Eclipse plugin calls {@link #at} or {@link #describe} directly, the language server through
 * {@link PhaseHoverService}.
 */
public class HoverText {
    private static final Map<MathFunction, String> FUNCTION_WORDS = Map.ofEntries(
            Map.entry(MathFunction.SIN, "sine (radians)"), Map.entry(MathFunction.COS, "cosine (radians)"),
            Map.entry(MathFunction.TAN, "tangent (radians)"), Map.entry(MathFunction.EXP, "exponential"),
            Map.entry(MathFunction.LOG, "natural logarithm"), Map.entry(MathFunction.SQRT, "square root"),
            Map.entry(MathFunction.ABS, "absolute value"), Map.entry(MathFunction.TANH, "hyperbolic tangent"),
            Map.entry(MathFunction.SINH, "hyperbolic sine"), Map.entry(MathFunction.COSH, "hyperbolic cosine"),
            Map.entry(MathFunction.ATAN, "arctangent (radians)"),
            Map.entry(MathFunction.MIN, "the smaller of two values"),
            Map.entry(MathFunction.MAX, "the larger of two values"));

    private final DimensionDescriber dimensions;

    @Inject
    public HoverText(DimensionDescriber dimensions) {
        this.dimensions = dimensions;
    }

    /** A hover text for callers outside Guice (the Eclipse plugin's hover). */
    public static HoverText standalone() {
        return new HoverText(new DimensionDescriber.FromUnits());
    }

    /** The hover for the name at {@code offset}: a declaration, a reference to one, or a function call. */
    public Optional<HoverResult> at(XtextResource resource, int offset) {
        if (resource.getParseResult() == null || resource.getParseResult().getRootNode() == null) {
            return Optional.empty();
        }
        ILeafNode leaf = NodeModelUtils.findLeafNodeAtOffset(resource.getParseResult().getRootNode(), offset);
        if (leaf == null || leaf.isHidden()) {
            return Optional.empty();
        }
        EObject subject = null;
        if (leaf.getGrammarElement() instanceof CrossReference reference) {
            subject = SemanticClassifier.referenceTarget(leaf, reference);
        } else if (leaf.getGrammarElement() instanceof RuleCall call
                && GrammarUtil.containingAssignment(call) instanceof Assignment assignment
                && (assignment.getFeature().equals("name") || assignment.getFeature().equals("function"))) {
            subject = NodeModelUtils.findActualSemanticObjectFor(leaf);
        }
        return Optional.ofNullable(subject).flatMap(this::facts)
                .map(facts -> new HoverResult(leaf.getOffset(), leaf.getLength(), facts));
    }

    /** Markdown describing a declaration or function call; empty for anything else. */
    public Optional<String> describe(EObject element) {
        return facts(element).map(SymbolFacts::markdown);
    }

    public Optional<SymbolFacts> facts(EObject element) {
        if (element instanceof StateDecl state) {
            return Optional.of(state(state));
        }
        if (element instanceof ParamDecl param) {
            return Optional.of(param(param));
        }
        if (element instanceof LetDecl let) {
            List<SymbolFacts.Fact> facts = new ArrayList<>();
            facts.add(code("definition", text(let.getDefinition())));
            addUnit(facts, let.getUnit());
            return Optional.of(new SymbolFacts("let", let.getName(), let.getDescription(), facts));
        }
        if (element instanceof TimeDecl time) {
            List<SymbolFacts.Fact> facts = new ArrayList<>();
            facts.add(new SymbolFacts.Fact("role", "the independent variable", false));
            addUnit(facts, time.getUnit());
            return Optional.of(new SymbolFacts("time", time.getName(), null, facts));
        }
        if (element instanceof FunctionCall call) {
            return MathFunction.byNotationName(call.getFunction()).map(HoverText::function);
        }
        if (element instanceof PhaseModel model) {
            return Optional.of(model(model));
        }
        if (element instanceof SymmetryDecl symmetry) {
            List<SymbolFacts.Fact> facts = new ArrayList<>();
            facts.add(code("maps", symmetry.getMaps().stream().map(HoverText::text).collect(Collectors.joining(", "))));
            facts.add(new SymbolFacts.Fact("reverses time", symmetry.isReversesTime() ? "yes" : "no", false));
            return Optional.of(new SymbolFacts("symmetry", symmetry.getName(), null, facts));
        }
        if (element instanceof StudyDecl study) {
            List<SymbolFacts.Fact> facts = new ArrayList<>();
            study.getAnalyses().forEach(a -> facts.add(code("analysis", text(a))));
            return Optional.of(new SymbolFacts("study", study.getName(), null, facts));
        }
        return Optional.empty();
    }

    private SymbolFacts state(StateDecl state) {
        List<SymbolFacts.Fact> facts = new ArrayList<>();
        facts.add(code("initial value", withValue(state, state.getInitial())));
        addUnit(facts, state.getUnit());
        PhaseModel model = EcoreUtil2.getContainerOfType(state, PhaseModel.class);
        if (model != null) {
            for (RateDecl rate : PhaseModels.rates(model)) {
                if (rate.getTarget() == state) {
                    facts.add(code("rate", text(rate.getLaw())));
                }
            }
        }
        return new SymbolFacts("state", state.getName(), state.getDescription(), facts);
    }

    private SymbolFacts param(ParamDecl param) {
        List<SymbolFacts.Fact> facts = new ArrayList<>();
        facts.add(code("value", withValue(param, param.getValue())));
        if (param.getLow() != null && param.getHigh() != null) {
            facts.add(code("range", text(param.getLow()) + " .. " + text(param.getHigh())));
        }
        addUnit(facts, param.getUnit());
        return new SymbolFacts("param", param.getName(), param.getDescription(), facts);
    }

    private static SymbolFacts model(PhaseModel model) {
        List<SymbolFacts.Fact> facts = new ArrayList<>();
        facts.add(new SymbolFacts.Fact("states", Integer.toString(PhaseModels.states(model).size()), false));
        facts.add(new SymbolFacts.Fact("params", Integer.toString(PhaseModels.params(model).size()), false));
        facts.add(new SymbolFacts.Fact("studies", Integer.toString(PhaseModels.studies(model).size()), false));
        return new SymbolFacts("model", model.getName(), model.getTitle(), facts);
    }

    private static SymbolFacts function(MathFunction function) {
        String arguments = function.arity() == 1 ? "x" : "a, b";
        return new SymbolFacts("function", function.notationName(),
                FUNCTION_WORDS.getOrDefault(function, "built-in function"),
                List.of(code("call", function.notationName() + "(" + arguments + ")")));
    }

    private void addUnit(List<SymbolFacts.Fact> facts, UnitExpr unit) {
        if (unit == null) {
            return;
        }
        facts.add(code("unit", text(unit).replace(" ", "")));
        dimensions.dimensionOf(unit).ifPresent(d -> facts.add(new SymbolFacts.Fact("dimension", d, false)));
    }

    /** The expression as written, followed by its number when it is a formula over params, e.g. `8/3 (= 2.66667)`. */
    private static String withValue(EObject inside, Expression expression) {
        String written = text(expression);
        PhaseModel model = EcoreUtil2.getContainerOfType(inside, PhaseModel.class);
        if (model == null || expression == null) {
            return written;
        }
        OptionalDouble value = ConstantValues.of(model).evaluate(expression);
        if (value.isEmpty()) {
            return written;
        }
        String number = formatNumber(value.getAsDouble());
        return isPlainNumber(written, value.getAsDouble()) ? written : written + " (= " + number + ")";
    }

    private static boolean isPlainNumber(String written, double value) {
        try {
            return Double.parseDouble(written) == value;
        } catch (NumberFormatException notANumber) {
            return false;
        }
    }

    static String formatNumber(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        String text = String.format(Locale.ROOT, "%.6g", value);
        String mantissa = text.contains("e") ? text.substring(0, text.indexOf('e')) : text;
        String exponent = text.contains("e") ? text.substring(text.indexOf('e')) : "";
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return mantissa + exponent;
    }

    private static SymbolFacts.Fact code(String label, String text) {
        return new SymbolFacts.Fact(label, text, true);
    }

    /** Source text of a subtree, tokens separated as written (whitespace runs become one space). */
    private static String text(EObject element) {
        INode node = element == null ? null : NodeModelUtils.getNode(element);
        String text = node == null ? null : NodeModelUtils.getTokenText(node);
        return text == null ? "?" : text;
    }
}
