package org.shearstack.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.NoSuchElementException;
import java.util.Optional;
import java.util.stream.Stream;
import org.shearstack.assembly.RotatingInertia;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.geom.GeometryContext;
import org.shearstack.part.DesignValues;
import org.shearstack.part.Dims;
import org.shearstack.physics.rotor.TurbineModel;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.DesignResolver;
import org.shearstack.rules.ProfileKeys;
import org.shearstack.rules.sizing.DesignModels;
import org.shearstack.spec.SpecReader;

/**
 * Design lookup for the bench commands: a spec file, or a folder holding exactly one spec (.yaml), is resolved;
 * the inertia comes from the kit's rotating parts ({@link RotatingInertia}), the model from the design's
 * performance model when the design resolves one.
 */
final class SpecDesigns implements DesignLink.Source {
    private static final double CHORD_TOLERANCE_MM = 0.05;
    private final Profiles profiles;

    SpecDesigns(Profiles profiles) {
        this.profiles = profiles;
    }

    @Override
    public DesignLink.Design load(Path path) {
        Path specFile = specFile(path);
        ResolvedDesign design = DesignResolver.resolve(SpecReader.read(specFile).orThrow(), profiles);
        double inertia = Double.NaN;
        String source = "the design has no resolved rotor geometry";
        try {
            Dims dims = Dims.of(DesignValues.of(design::get, design::text, design::has));
            double density = design.get(ProfileKeys.DENSITY);
            RotatingInertia.Result r = RotatingInertia.of(dims, GeometryContext.withChordTolerance(CHORD_TOLERANCE_MM),
                    density);
            inertia = r.totalKgM2();
            source = String.format(Locale.ROOT, "design %s: %d rotating printed parts from their meshes at %.0f kg/m3"
                    + "%s, %.4g kg*m^2 (generator rotor not included)", design.name(), r.shares().stream()
                    .mapToInt(RotatingInertia.Share::copies).sum(), density,
                    r.metalShaftKgM2() > 0 ? " plus the steel shaft" : "", inertia);
        } catch (NoSuchElementException | IllegalArgumentException e) {
            source = "the design has no resolved rotor geometry (" + e.getMessage() + ")";
        }
        return new DesignLink.Design(design.name(), inertia, source, model(design));
    }

    /** The design's performance model (nominal calibration); empty when the design lacks the sized keys. */
    private static Optional<TurbineModel> model(ResolvedDesign design) {
        try {
            return Optional.of(DesignModels.turbineModel(design));
        } catch (NoSuchElementException | IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    private static Path specFile(Path path) {
        if (!Files.isDirectory(path)) {
            return path;
        }
        List<Path> specs;
        try (Stream<Path> s = Files.list(path)) {
            specs = s.filter(p -> p.getFileName().toString().endsWith(".yaml")).sorted().toList();
        } catch (IOException e) {
            throw new IllegalArgumentException("--design " + path + ": cannot list the folder: " + e.getMessage(), e);
        }
        if (specs.size() != 1) {
            throw new IllegalArgumentException("--design " + path + ": expected a spec file or a folder with one spec"
                    + " (.yaml), found " + specs.size() + " .yaml files");
        }
        return specs.get(0);
    }
}
