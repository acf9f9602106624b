package org.phasewright.language.formatting;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.AbstractRule;
import org.eclipse.xtext.Assignment;
import org.eclipse.xtext.GrammarUtil;
import org.eclipse.xtext.Keyword;
import org.eclipse.xtext.formatting2.AbstractFormatter2;
import org.eclipse.xtext.formatting2.FormatterPreferenceKeys;
import org.eclipse.xtext.formatting2.FormatterRequest;
import org.eclipse.xtext.formatting2.IFormattableDocument;
import org.eclipse.xtext.formatting2.IHiddenRegionFormatter;
import org.eclipse.xtext.formatting2.ITextReplacer;
import org.eclipse.xtext.formatting2.ITextReplacerContext;
import org.eclipse.xtext.formatting2.regionaccess.IComment;
import org.eclipse.xtext.formatting2.regionaccess.IEObjectRegion;
import org.eclipse.xtext.formatting2.regionaccess.ISemanticRegion;
import org.eclipse.xtext.formatting2.regionaccess.ITextReplacement;
import org.eclipse.xtext.formatting2.regionaccess.ITextSegment;
import org.eclipse.xtext.preferences.MapBasedPreferenceValues;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.xbase.lib.Procedures.Procedure1;
import org.phasewright.language.ast.Families;
import org.phasewright.language.phase.Analysis;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.Member;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.StudyDecl;

/**
 * The one canonical layout of `.phase` files, so that reformatting never shows up in a diff:
 * <ul>
 * <li>one declaration per line, at most one blank line between declarations, no indentation at top level;</li>
 * <li>a study's analyses one per line, indented by two spaces, `}` on its own line;</li>
 * <li>single spaces between words and around `=`, `..`, `->`, binary `+` and `-`;</li>
 * <li>no spaces around `*`, `/`, `^`, after unary minus, inside parentheses, before `,` and `:`, or between a
 * function name (or `sum`) and its `(`; one space after `,` and `:`;</li>
 * <li>elements written tight, `x[i+1]`: no space before a subscript's `[`, inside the brackets or around index
 * arithmetic; a listed table keeps its space after `=`;</li>
 * <li>comments are kept, block comments verbatim; the file ends with one line break.</li>
 * </ul>
 * Indentation ignores editor settings on purpose: the layout is part of the notation, not a preference. A file
 * with syntax errors is left untouched, because its token stream cannot be trusted.
 */
public class PhaseFormatter extends AbstractFormatter2 {
    private static final String INDENT = "  ";

    private static final Procedure1<IHiddenRegionFormatter> NO_SPACE = IHiddenRegionFormatter::noSpace;
    private static final Procedure1<IHiddenRegionFormatter> ONE_SPACE = IHiddenRegionFormatter::oneSpace;
    private static final Procedure1<IHiddenRegionFormatter> NEW_LINE = IHiddenRegionFormatter::newLine;
    /** A line break, keeping at most one blank line the author put there. */
    private static final Procedure1<IHiddenRegionFormatter> DECLARATION_BREAK = f -> f.setNewLines(1, 1, 2);

    @Override
    protected void initialize(FormatterRequest request) {
        MapBasedPreferenceValues fixed = new MapBasedPreferenceValues();
        fixed.put(FormatterPreferenceKeys.indentation, INDENT);
        fixed.put(FormatterPreferenceKeys.lineSeparator, "\n");
        request.setPreferences(fixed);
        super.initialize(request);
    }

    /** Block comments keep their inner lines exactly: they are the author's text, not layout. */
    @Override
    public ITextReplacer createCommentReplacer(IComment comment) {
        if (comment.getGrammarElement() instanceof AbstractRule rule && rule.getName().equals("ML_COMMENT")) {
            return new ITextReplacer() {
                @Override
                public ITextSegment getRegion() {
                    return comment;
                }

                @Override
                public ITextReplacerContext createReplacements(ITextReplacerContext context) {
                    return context;
                }
            };
        }
        return super.createCommentReplacer(comment);
    }

    /** Drops replacements that change nothing, so a file already in canonical layout gets no edits at all. */
    @Override
    protected List<ITextReplacement> postProcess(IFormattableDocument document, List<ITextReplacement> replacements) {
        List<ITextReplacement> changes = new ArrayList<>();
        for (ITextReplacement replacement : super.postProcess(document, replacements)) {
            if (!replacement.getText().equals(replacement.getReplacementText())) {
                changes.add(replacement);
            }
        }
        return changes;
    }

    @Override
    public void format(Object object, IFormattableDocument document) {
        if (object instanceof XtextResource resource) {
            if (resource.getParseResult() == null || resource.getParseResult().hasSyntaxErrors()
                    || !(resource.getContents().isEmpty() || resource.getContents().get(0) instanceof PhaseModel)) {
                return;
            }
            if (!resource.getContents().isEmpty()) {
                formatModel((PhaseModel) resource.getContents().get(0), document);
            }
        }
    }

    private void formatModel(PhaseModel model, IFormattableDocument document) {
        Set<ISemanticRegion> declarationStarts = new HashSet<>();
        Set<ISemanticRegion> analysisStarts = new HashSet<>();
        for (Member member : model.getMembers()) {
            addFirstRegion(member, declarationStarts);
            if (member instanceof StudyDecl study) {
                for (Analysis analysis : study.getAnalyses()) {
                    addFirstRegion(analysis, analysisStarts);
                }
                indentBody(study, document);
            }
        }
        IEObjectRegion root = getTextRegionAccess().regionForRootEObject();
        if (root == null) {
            return;
        }
        ISemanticRegion previous = null;
        ISemanticRegion current = root.getPreviousHiddenRegion().getNextSemanticRegion();
        while (current != null) {
            document.set(current.getPreviousHiddenRegion(),
                    spacing(previous, current, declarationStarts, analysisStarts));
            previous = current;
            current = current.getNextSemanticRegion();
        }
        if (previous != null) {
            document.set(previous.getNextHiddenRegion(), NEW_LINE);
        }
    }

    private void addFirstRegion(EObject object, Set<ISemanticRegion> into) {
        IEObjectRegion region = getTextRegionAccess().regionForEObject(object);
        if (region != null) {
            ISemanticRegion first = region.getPreviousHiddenRegion().getNextSemanticRegion();
            if (first != null) {
                into.add(first);
            }
        }
    }

    private void indentBody(StudyDecl study, IFormattableDocument document) {
        ISemanticRegion open = textRegionExtensions.regionFor(study).keyword("{");
        ISemanticRegion close = textRegionExtensions.regionFor(study).keyword("}");
        if (open != null && close != null) {
            document.interior(open, close, IHiddenRegionFormatter::indent);
        }
    }

    private static Procedure1<IHiddenRegionFormatter> spacing(ISemanticRegion previous, ISemanticRegion next,
            Set<ISemanticRegion> declarationStarts, Set<ISemanticRegion> analysisStarts) {
        if (previous == null) {
            return NO_SPACE;
        }
        if (declarationStarts.contains(next)) {
            return DECLARATION_BREAK;
        }
        if (analysisStarts.contains(next) || is(next, "}") || is(previous, "{")) {
            return NEW_LINE;
        }
        if (is(next, ",") || is(next, ")") || is(next, ":") || is(previous, "(") || is(next, "]")
                || is(previous, "[")) {
            return NO_SPACE;
        }
        if (is(next, "[") && !(previous.getGrammarElement() instanceof Keyword)) {
            return NO_SPACE;
        }
        if (isSubscriptOperator(previous) || isSubscriptOperator(next)) {
            return NO_SPACE;
        }
        if (is(next, "(") && is(previous, "sum")) {
            return NO_SPACE;
        }
        if (isTightOperator(previous) || isTightOperator(next) || isUnaryMinus(previous)) {
            return NO_SPACE;
        }
        if (is(next, "(") && isFunctionName(previous)) {
            return NO_SPACE;
        }
        return ONE_SPACE;
    }

    private static boolean is(ISemanticRegion region, String keyword) {
        return region.getGrammarElement() instanceof Keyword k && k.getValue().equals(keyword);
    }

    private static String ruleOf(ISemanticRegion region) {
        AbstractRule rule = GrammarUtil.containingRule(region.getGrammarElement());
        return rule == null ? "" : rule.getName();
    }

    /** `*`, `/` and `^` in expressions and units bind tightly and are written without spaces. */
    private static boolean isTightOperator(ISemanticRegion region) {
        if (!(region.getGrammarElement() instanceof Keyword k)) {
            return false;
        }
        return switch (k.getValue()) {
            case "*", "/", "^" -> true;
            default -> false;
        };
    }

    /** `+` and `-` of index arithmetic inside `[...]`. */
    private static boolean isSubscriptOperator(ISemanticRegion region) {
        return (is(region, "+") || is(region, "-")) && ruleOf(region).equals("Additive")
                && Families.inSubscript(region.getSemanticElement());
    }

    private static boolean isUnaryMinus(ISemanticRegion region) {
        if (!is(region, "-")) {
            return false;
        }
        String rule = ruleOf(region);
        return rule.equals("Prefixed") || rule.equals("SignedInt");
    }

    private static boolean isFunctionName(ISemanticRegion region) {
        Assignment assignment = GrammarUtil.containingAssignment(region.getGrammarElement());
        return assignment != null && "function".equals(assignment.getFeature())
                && region.getSemanticElement() instanceof FunctionCall;
    }
}
