package org.shearstack.profile;

import static org.shearstack.spec.Dimension.*;

import java.util.List;
import java.util.Set;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Range;

/**
 * A filament's printed properties. SI units (Pa, kg/m³, K).
 *
 * @param tensileStrengthXyPa  printed flat, loaded in the layer plane
 * @param tensileStrengthZPa   loaded across layers
 * @param softeningK           glass-transition or heat-deflection temperature (the lower, conservatively)
 * @param sources              where the values come from, as written in the profile
 */
public record FilamentProfile(String name, String source, String description, double densityKgPerM3,
                              double elasticModulusPa, double poissonRatio, double tensileStrengthXyPa,
                              double tensileStrengthZPa, double softeningK, String sources) {

    static final Set<String> KEYS = Set.of("kind", "name", "description", "density", "elastic-modulus",
            "poisson-ratio", "tensile-strength-xy", "tensile-strength-z", "softening-temperature", "sources");

    static FilamentProfile read(YamlDoc d, String source, List<Problem> problems) {
        d.allowOnly(KEYS);
        FilamentProfile f = new FilamentProfile(d.text("name"), source, d.optionalText("description").orElse(""),
                d.quantity("density", DENSITY, Range.aboveUpTo(0, 3000, "above 0 and at most 3 g/cm3")),
                d.quantity("elastic-modulus", STRESS, Range.aboveUpTo(0, 50e9, "above 0 and at most 50 GPa")),
                d.quantity("poisson-ratio", DIMENSIONLESS, Range.aboveUpTo(0, 0.5, "above 0 and at most 0.5")),
                d.quantity("tensile-strength-xy", STRESS, Range.aboveUpTo(0, 1e9, "above 0 and at most 1000 MPa")),
                d.quantity("tensile-strength-z", STRESS, Range.aboveUpTo(0, 1e9, "above 0 and at most 1000 MPa")),
                d.quantity("softening-temperature", TEMPERATURE, Range.between(273.15, 673.15, "between 0 and 400 degC")),
                d.text("sources"));
        if (f.tensileStrengthZPa() > f.tensileStrengthXyPa()) {
            d.problem("tensile-strength-z", "at most tensile-strength-xy (layers bond weaker than lines)",
                    f.tensileStrengthZPa() / 1e6 + " MPa");
        }
        return f;
    }
}
