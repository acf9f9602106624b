package org.phasewright.language.ui.editor;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.jface.text.Position;
import org.eclipse.jface.text.source.Annotation;
import org.eclipse.jface.text.source.projection.ProjectionAnnotation;
import org.eclipse.jface.text.source.projection.ProjectionAnnotationModel;
import org.eclipse.jface.text.source.projection.ProjectionViewer;
import org.eclipse.xtext.nodemodel.ICompositeNode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.StudyDecl;

/**
 * Folding regions for study blocks that span more than one line, refreshed after every background parse. Regions
 * that did not move keep their annotation, so a folded study stays folded while the user types elsewhere.
 */
final class StudyFolding {
    private final ProjectionViewer viewer;

    StudyFolding(ProjectionViewer viewer) {
        this.viewer = viewer;
    }

    void update(PhaseModel model) {
        ProjectionAnnotationModel annotations = viewer.getProjectionAnnotationModel();
        if (annotations == null) {
            return;
        }
        Set<Position> wanted = new HashSet<>(studyRegions(model));
        List<Annotation> removed = new ArrayList<>();
        for (Iterator<Annotation> it = annotations.getAnnotationIterator(); it.hasNext();) {
            Annotation annotation = it.next();
            Position position = annotations.getPosition(annotation);
            if (position == null || !wanted.remove(new Position(position.getOffset(), position.getLength()))) {
                removed.add(annotation);
            }
        }
        Map<Annotation, Position> added = new HashMap<>();
        for (Position position : wanted) {
            added.put(new ProjectionAnnotation(), position);
        }
        if (!removed.isEmpty() || !added.isEmpty()) {
            annotations.modifyAnnotations(removed.toArray(new Annotation[0]), added, null);
        }
    }

    private static List<Position> studyRegions(PhaseModel model) {
        List<Position> regions = new ArrayList<>();
        for (StudyDecl study : PhaseModels.studies(model)) {
            ICompositeNode node = NodeModelUtils.getNode(study);
            if (node != null && node.getEndLine() > node.getStartLine()) {
                regions.add(new Position(node.getOffset(), node.getLength()));
            }
        }
        return regions;
    }
}
