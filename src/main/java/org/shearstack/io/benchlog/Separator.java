package org.shearstack.io.benchlog;

import java.util.List;

/** Field separator of a log and the number syntax that goes with it. */
enum Separator {
    SEMICOLON(";"), TAB("\t"), COMMA(","), SPACE("\\s+");

    private final String regex;

    Separator(String regex) {
        this.regex = regex;
    }

    /** The first of ';', tab, ',' found in the first 20 content lines, else spaces. */
    static Separator detect(List<String> lines, List<Integer> content) {
        boolean semi = false;
        boolean tab = false;
        boolean comma = false;
        for (int k = 0; k < Math.min(20, content.size()); k++) {
            String l = lines.get(content.get(k));
            semi |= l.indexOf(';') >= 0;
            tab |= l.indexOf('\t') >= 0;
            comma |= l.indexOf(',') >= 0;
        }
        return semi ? SEMICOLON : tab ? TAB : comma ? COMMA : SPACE;
    }

    String[] split(String line) {
        String l = line.strip();
        if (this != SPACE && (l.endsWith(";") || l.endsWith(",")) && l.endsWith(regex)) {
            l = l.substring(0, l.length() - 1);
        }
        String[] f = l.split(regex, -1);
        for (int i = 0; i < f.length; i++) {
            String s = f[i].trim();
            if (s.length() >= 2 && s.startsWith("\"") && s.endsWith("\"")) {
                s = s.substring(1, s.length() - 1).trim();
            }
            f[i] = s;
        }
        return f;
    }

    /** The number in a field, or null; a decimal comma is accepted unless the separator is a comma. */
    Double number(String field) {
        String s = field.trim();
        if (s.isEmpty()) {
            return null;
        }
        if (this != COMMA && s.indexOf(',') >= 0) {
            if (s.indexOf('.') >= 0 || s.indexOf(',') != s.lastIndexOf(',')) {
                return null; // "1.234,5" or "1,2,3": thousands separators are not guessed
            }
            s = s.replace(',', '.');
        }
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!(Character.isDigit(c) || c == '.' || c == '-' || c == '+' || c == 'e' || c == 'E')) {
                return null; // refuses "NaN", "Infinity", hex and suffixes like 0x1p3 or 1d
            }
        }
        try {
            return Double.parseDouble(s);
        } catch (NumberFormatException e) {
            return null;
        }
    }
}
