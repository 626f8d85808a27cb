package dev.ampsieve.testing;

import dev.ampsieve.stage.Follower;
import dev.ampsieve.stage.Inverting;
import dev.ampsieve.stage.Network;
import dev.ampsieve.stage.NonInverting;
import dev.ampsieve.stage.Topology;

/** The three voltage-gain networks from their four resistors, for fixtures written before the network type. */
public final class Networks {
    private Networks() {}

    public static Network of(Topology topology, double rf, double rg, double rs, double rp) {
        return switch (topology) {
            case NON_INVERTING -> new NonInverting(rf, rg, rs, rp);
            case INVERTING -> new Inverting(rf, rg, rs, rp);
            case FOLLOWER -> new Follower(rf, rs, rp);
            case DIFFERENCE, TRANSIMPEDANCE -> throw new IllegalArgumentException(topology + " has other parts");
        };
    }

    /** The gain resistor of a non-inverting or inverting stage; infinite for a follower. */
    public static double rg(dev.ampsieve.stage.Stage s) {
        Network n = s.network();
        if (n instanceof NonInverting x) {
            return x.rg();
        }
        if (n instanceof Inverting x) {
            return x.rg();
        }
        if (n instanceof Follower) {
            return Double.POSITIVE_INFINITY;
        }
        throw new IllegalArgumentException(n.topology() + " has no rg");
    }

    /** The balance resistor of a non-inverting, inverting or follower stage. */
    public static double rp(dev.ampsieve.stage.Stage s) {
        Network n = s.network();
        if (n instanceof NonInverting x) {
            return x.rp();
        }
        if (n instanceof Inverting x) {
            return x.rp();
        }
        if (n instanceof Follower x) {
            return x.rp();
        }
        throw new IllegalArgumentException(n.topology() + " has no balance resistor");
    }
}
