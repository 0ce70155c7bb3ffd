package org.shearstack.cli;

import java.util.Locale;
import picocli.CommandLine;

/**
 * Reads a moment of inertia with an optional unit: "2.5e-6" (kg·m²), "2.5e-6 kg*m^2", "25 g*cm^2",
 * "2500 g*mm^2", "2.5 kg*mm^2" (CAD programs often report g·mm² or kg·mm²).
 */
public final class InertiaConverter implements CommandLine.ITypeConverter<Double> {
    @Override
    public Double convert(String text) {
        return parseKgM2(text);
    }

    /** The inertia in kg·m². @throws CommandLine.TypeConversionException with the expected format */
    public static double parseKgM2(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT).replace("·", "*").replace(" ", "").replace("²", "^2");
        int split = 0;
        while (split < t.length() && "0123456789.+-e".indexOf(t.charAt(split)) >= 0) {
            if (t.charAt(split) == 'e' && (split + 1 >= t.length() || "0123456789+-".indexOf(t.charAt(split + 1)) < 0)) {
                break;
            }
            split++;
        }
        String num = t.substring(0, split);
        String unit = t.substring(split).replace("^2", "2").replace("*", "").replace(".", "");
        double scale;
        switch (unit) {
            case "", "kgm2" -> scale = 1;
            case "kgcm2" -> scale = 1e-4;
            case "kgmm2" -> scale = 1e-6;
            case "gcm2" -> scale = 1e-7;
            case "gmm2" -> scale = 1e-9;
            default -> throw new CommandLine.TypeConversionException("expected an inertia like 2.5e-6 (kg*m^2) or"
                    + " '25 g*cm^2', '2500 g*mm^2', '2.5 kg*mm^2', found '" + text + "'");
        }
        double v;
        try {
            v = Double.parseDouble(num);
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException("expected an inertia like 2.5e-6 (kg*m^2) or '25 g*cm^2',"
                    + " found '" + text + "'");
        }
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new CommandLine.TypeConversionException("expected an inertia >= 0, found '" + text + "'");
        }
        return v * scale;
    }
}
