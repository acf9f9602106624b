package org.phasewright.language.validation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.validation.Check;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.Member;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymmetryDecl;
import org.phasewright.language.phase.TimeDecl;

/** Names are unique within their kind (symbols, symmetries, studies); there is at most one time variable. */
public class NameChecks extends PhaseCheckBase {

    @Check
    public void uniqueNames(PhaseModel model) {
        reportDuplicates(PhaseModels.membersOf(model, Symbol.class));
        reportDuplicates(PhaseModels.membersOf(model, SymmetryDecl.class));
        reportDuplicates(PhaseModels.membersOf(model, StudyDecl.class));
    }

    /** Study results go to a folder named after the study; file systems allow 255 bytes per name, we keep a margin. */
    static final int MAX_STUDY_NAME_LENGTH = 100;

    @Check
    public void studyNameFitsAFolderName(StudyDecl study) {
        if (study.getName() != null && study.getName().length() > MAX_STUDY_NAME_LENGTH) {
            error("Study name is " + study.getName().length() + " characters long; its results folder is named after it,"
                    + " so keep it to at most " + MAX_STUDY_NAME_LENGTH + ".", study, PHASE.getStudyDecl_Name(),
                    IssueCodes.STUDY_NAME_TOO_LONG);
        }
    }

    @Check
    public void singleTimeVariable(PhaseModel model) {
        List<TimeDecl> times = PhaseModels.timeDecls(model);
        for (TimeDecl extra : times.subList(Math.min(1, times.size()), times.size())) {
            error("Only one time variable may be declared; the first is on line " + line(times.get(0)) + ".", extra,
                    PHASE.getSymbol_Name(), IssueCodes.DUPLICATE_TIME);
        }
    }

    private void reportDuplicates(List<? extends Member> members) {
        Map<String, Member> first = new HashMap<>();
        for (Member member : members) {
            String name = nameOf(member);
            if (name == null) {
                continue;
            }
            Member earlier = first.putIfAbsent(name, member);
            if (earlier != null) {
                error("Duplicate name '" + name + "': already declared as " + describe(earlier) + " on line "
                        + line(earlier) + ".", member, nameFeature(member), IssueCodes.DUPLICATE_NAME, name);
            }
        }
    }

    private static String nameOf(Member member) {
        if (member instanceof Symbol symbol) {
            return symbol.getName();
        }
        if (member instanceof SymmetryDecl symmetry) {
            return symmetry.getName();
        }
        return ((StudyDecl) member).getName();
    }

    private static org.eclipse.emf.ecore.EStructuralFeature nameFeature(Member member) {
        if (member instanceof Symbol) {
            return PHASE.getSymbol_Name();
        }
        if (member instanceof SymmetryDecl) {
            return PHASE.getSymmetryDecl_Name();
        }
        return PHASE.getStudyDecl_Name();
    }

    private static String describe(Member member) {
        if (member instanceof Symbol symbol) {
            return PhaseModels.aKind(symbol);
        }
        return member instanceof SymmetryDecl ? "a symmetry" : "a study";
    }

    static int line(EObject object) {
        INode node = NodeModelUtils.getNode(object);
        return node == null ? 0 : node.getStartLine();
    }
}
