package dev.ampsieve.stats;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.core.source64.XoRoShiRo128PlusPlus;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * The random numbers of one Monte Carlo run: uniform doubles and standard normal draws from one
 * stream of its own, fixed by the stage's seed and the part's id.
 *
 * <p>Generator: xoroshiro128++ (commons-rng-core {@code XoRoShiRo128PlusPlus}, made directly: going
 * through commons-rng-simple's {@code RandomSource} loads every generator class it knows, about 70,
 * at each start; Blackman and Vigna,
 * "Scrambled linear pseudorandom number generators", ACM TOMS 47 (2021)), normal draws by the
 * McFarland ziggurat (commons-rng {@code ZigguratSampler.NormalizedGaussian}; McFarland, J. Stat.
 * Comput. Simul. 86 (2016) 1281): nearly every draw costs one 64-bit output and a table look-up,
 * against a logarithm, a square root and a sine or cosine per pair for Box-Muller.
 *
 * <p>Seeding: the 128-bit state is the first 16 bytes of SHA-256 over the stage's seed (8 bytes,
 * big-endian) and the part id (UTF-8). Each part thus has a stream of its own, independent of
 * which thread budgets it and in what order, so a ranking computed on several cores gives the
 * same numbers as one computed on one. A part has further streams for draws of one purpose
 * ({@link #of(long, String, String)}). Not thread-safe: one run, one stream.
 */
public final class UnitStream {

    private final UniformRandomProvider rng;
    private final ZigguratSampler.NormalizedGaussian normal;

    private UnitStream(UniformRandomProvider rng) {
        this.rng = rng;
        this.normal = ZigguratSampler.NormalizedGaussian.of(rng);
    }

    /** Names the second stream of a part: the draws only a trimmed unit needs. */
    public static final String TRIM = "trim";

    /** The stream of part {@code partId} under a stage seeded with {@code seed}. */
    public static UnitStream of(long seed, String partId) {
        return of(seed, partId.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * A further stream of the same part for draws of one {@code purpose} ({@link #TRIM}), independent
     * of the first: its state hashes the seed, the id, a zero byte (which no id holds: ids are
     * lowercase letters, digits and dashes) and the purpose.
     */
    public static UnitStream of(long seed, String partId, String purpose) {
        return of(seed, (partId + '\0' + purpose).getBytes(StandardCharsets.UTF_8));
    }

    private static UnitStream of(long seed, byte[] id) {
        ByteBuffer in =
                ByteBuffer.allocate(Long.BYTES + id.length).putLong(seed).put(id);
        ByteBuffer h = ByteBuffer.wrap(sha256(in.array()));
        return new UnitStream(new XoRoShiRo128PlusPlus(h.getLong(), h.getLong()));
    }

    /** A standard normal draw N(0, 1). */
    public double gaussian() {
        return normal.sample();
    }

    /** A uniform draw in [0, 1). */
    public double uniform() {
        return rng.nextDouble();
    }

    /** One digest per thread: looking SHA-256 up among the security providers costs more than hashing a few bytes. */
    private static final ThreadLocal<MessageDigest> SHA256 = ThreadLocal.withInitial(() -> {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    });

    private static byte[] sha256(byte[] b) {
        return SHA256.get().digest(b); // digest() resets it for the next use
    }
}
