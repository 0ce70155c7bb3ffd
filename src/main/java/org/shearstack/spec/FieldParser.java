package org.shearstack.spec;

/** Turns the scalar text of one spec key into entries (or problems) through a {@link FieldContext}. */
@FunctionalInterface
public interface FieldParser {

    void parse(String text, FieldContext context);
}
