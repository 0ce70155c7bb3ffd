package org.shearstack.rules;

import java.util.List;

/**
 * One step of the design: reads named quantities, writes named quantities, and says how.
 * A rule is a pure function of its inputs. The engine orders rules by what they read and write,
 * records a {@link Derivation} for every value written, and keeps user pins in place of a rule's output.
 *
 * <p>Rule ids are stable and greppable, upper-case with hyphens, grouped by prefix:
 * {@code GEO-} geometry, {@code SIZE-} flow sizing, {@code PRN-} printer quantisation.
 */
public interface Rule {

    /** Stable id, for example {@code GEO-HOUSING-CHAMBER}. */
    String id();

    /** Everything {@link #apply} may read. Reading an undeclared key is a programming error. */
    List<Key> reads();

    /** Everything {@link #apply} writes. Two rules writing one key is a programming error. */
    List<Key> writes();

    /** Computes the outputs from the inputs. Must write every key in {@link #writes()}. */
    void apply(RuleInputs in, RuleOutputs out);
}
