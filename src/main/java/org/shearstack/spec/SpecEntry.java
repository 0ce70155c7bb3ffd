package org.shearstack.spec;

/** One value from a spec with where it was written. Lines and columns count from 1. */
public sealed interface SpecEntry permits SpecEntry.Value, SpecEntry.Text, SpecEntry.Auto {

    /** Dotted key path, e.g. "supply.pressure" or a sub-key such as "supply.free-air-flow.pressure". */
    String path();

    /** The text as written. */
    String written();

    int line();

    int column();

    /** A quantity in canonical units. */
    record Value(String path, Quantity quantity, String written, int line, int column) implements SpecEntry {
    }

    /** A word or name: a choice ("converging"), a profile name, a designation ("608"). */
    record Text(String path, String text, String written, int line, int column) implements SpecEntry {
    }

    /** "auto": the rules decide. */
    record Auto(String path, String written, int line, int column) implements SpecEntry {
    }
}
