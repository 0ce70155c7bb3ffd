package org.shearstack.check;

import java.util.List;
import org.shearstack.design.ResolvedDesign;

/**
 * One check of a resolved design. A check never throws for a design it cannot judge: it reports what is
 * missing as a finding instead. Codes are stable.
 */
public interface Check {

    /** The stable code of the check's group (its findings may carry several codes, see {@link #codes()}). */
    String code();

    /** Every finding code this check can emit. */
    List<String> codes();

    /** Runs the check. */
    List<Finding> run(ResolvedDesign design);
}
