package org.shearstack.view;

import java.util.ArrayList;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Optional;
import org.shearstack.assembly.Kit;
import org.shearstack.check.Severity;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.geom.GeometryContext;
import org.shearstack.rules.Key;

/**
 * Design-to-scene steps: a resolved design becomes its kit (parts, placements, exploded placements,
 * findings) plus headline figures. While the rules do not yet resolve every dimension the kit needs,
 * the scene shows the figures it has and says which value is missing.
 */
public final class DesignScenes {

    /** Coarsest chord tolerance used for the preview (finer when the spec asks): keeps watch mode quick. */
    public static final double PREVIEW_CHORD_TOLERANCE_MM = 0.05;

    private DesignScenes() {
    }

    /** The design's kit and headline figures; without parts (and a note why) when the kit cannot be built yet. */
    public static ViewScene fromDesign(ResolvedDesign design) {
        List<HeadlineFigure> figures = headlines(design);
        Kit kit;
        try {
            kit = Kit.build(design, previewContext(design));
        } catch (NoSuchElementException e) {
            return new ViewScene(design.name(), List.of(), List.of(), figures,
                    List.of("no parts drawn: the design does not resolve every dimension yet (" + e.getMessage() + ")"));
        }
        return KitScenes.from(kit, figures, List.of("preview faceted to "
                + previewContext(design).chordToleranceMm() + " mm"));
    }

    /** The design's name and main figures, with no parts. */
    public static ViewScene withoutParts(ResolvedDesign design) {
        return new ViewScene(design.name(), List.of(), List.of(), headlines(design), List.of("parts not requested"));
    }

    /** The spec's chord tolerance, but no finer than {@link #PREVIEW_CHORD_TOLERANCE_MM}. */
    public static GeometryContext previewContext(ResolvedDesign design) {
        double tolerance = design.key("output.chord-tolerance").flatMap(design::find)
                .map(t -> Math.max(t, PREVIEW_CHORD_TOLERANCE_MM)).orElse(PREVIEW_CHORD_TOLERANCE_MM);
        return GeometryContext.withChordTolerance(tolerance);
    }

    /**
     * Operating point, runaway against allowable speed, safe pressure, as far as the design holds them
     * (found by key name ending, so they appear as the rules that make them are added).
     */
    public static List<HeadlineFigure> headlines(ResolvedDesign design) {
        List<HeadlineFigure> out = new ArrayList<>();
        Optional<String> speed = shown(design, "performance.operating-speed");
        Optional<String> power = shown(design, "performance.operating-power");
        if (speed.isPresent() || power.isPresent()) {
            out.add(new HeadlineFigure("operating point",
                    String.join(", ", speed.stream().toList()) + (speed.isPresent() && power.isPresent() ? ", " : "")
                            + String.join(", ", power.stream().toList()), Severity.OK));
        }
        Optional<Key> runaway = design.key("performance.runaway-speed");
        Optional<Key> allowable = endingWith(design, "allowable-speed");
        if (runaway.isPresent()) {
            Severity s = Severity.OK;
            String text = design.display(runaway.get());
            if (allowable.isPresent()) {
                text += " vs " + design.display(allowable.get()) + " allowable";
                s = design.get(runaway.get()) > design.get(allowable.get()) ? Severity.FAIL : Severity.OK;
            }
            out.add(new HeadlineFigure("runaway speed", text, s));
        }
        endingWith(design, "safe-pressure").ifPresent(k ->
                out.add(new HeadlineFigure("safe pressure", design.display(k), Severity.OK)));
        if (out.isEmpty()) {
            for (String name : List.of("printer", "filament", "supply.pressure")) {
                shown(design, name).ifPresent(v -> out.add(new HeadlineFigure(name, v, Severity.OK)));
            }
        }
        return out;
    }

    private static Optional<String> shown(ResolvedDesign design, String name) {
        return design.key(name).map(design::display);
    }

    private static Optional<Key> endingWith(ResolvedDesign design, String suffix) {
        return design.keys().stream().filter(k -> k.name().endsWith(suffix)).findFirst();
    }
}
