package org.shearstack.physics.fit;

import java.util.ArrayList;
import java.util.List;

/**
 * A one-dimensional tolerance chain: a gap (end play, radial clearance) as the signed sum of contributors.
 * Worst case adds the half-ranges; RSS (root sum of squares) treats them as independent, centred, and
 * adds them in quadrature (common practice in tolerance analysis). A contributor repeated n times as separate
 * parts (discs in a pack) adds n times its mean and n times its half-range in the worst case, √n times in RSS.
 */
public final class StackUp {

    /**
     * One link of the chain.
     *
     * @param name    what it is ("disc thickness")
     * @param sign    +1 when it opens the gap, −1 when it closes it
     * @param count   how many identical, independent parts
     * @param nominalMm nominal size
     * @param lowerMm lower deviation (≤ upper)
     * @param upperMm upper deviation
     */
    public record Link(String name, int sign, int count, double nominalMm, double lowerMm, double upperMm) {
        public Link {
            if (sign != 1 && sign != -1) {
                throw new IllegalArgumentException("sign must be +1 or -1, found " + sign);
            }
            if (count < 1 || lowerMm > upperMm) {
                throw new IllegalArgumentException(name + ": need count >= 1 and lower <= upper deviation");
            }
        }

        public static Link opens(String name, double nominalMm, double plusMinusMm) {
            return new Link(name, 1, 1, nominalMm, -plusMinusMm, plusMinusMm);
        }

        public static Link closes(String name, int count, double nominalMm, double plusMinusMm) {
            return new Link(name, -1, count, nominalMm, -plusMinusMm, plusMinusMm);
        }

        double mean() {
            return nominalMm + (lowerMm + upperMm) / 2;
        }

        double half() {
            return (upperMm - lowerMm) / 2;
        }
    }

    /**
     * The gap's range both ways.
     *
     * @param meanMm       gap at the mean of every link
     * @param worstMinMm   smallest gap, worst case
     * @param worstMaxMm   largest gap, worst case
     * @param rssMinMm     smallest gap, RSS
     * @param rssMaxMm     largest gap, RSS
     */
    public record Result(double meanMm, double worstMinMm, double worstMaxMm, double rssMinMm, double rssMaxMm) {
    }

    private final List<Link> links;

    private StackUp(List<Link> links) {
        this.links = List.copyOf(links);
    }

    public static StackUp of(List<Link> links) {
        if (links.isEmpty()) {
            throw new IllegalArgumentException("a stack-up needs at least one link");
        }
        return new StackUp(links);
    }

    public List<Link> links() {
        return links;
    }

    /** A new stack with one more link. */
    public StackUp with(Link link) {
        List<Link> l = new ArrayList<>(links);
        l.add(link);
        return new StackUp(l);
    }

    public Result evaluate() {
        double mean = 0;
        double worst = 0;
        double squares = 0;
        for (Link k : links) {
            mean += k.sign() * k.count() * k.mean();
            worst += k.count() * k.half();
            squares += k.count() * k.half() * k.half();
        }
        double rss = Math.sqrt(squares);
        return new Result(mean, mean - worst, mean + worst, mean - rss, mean + rss);
    }
}
