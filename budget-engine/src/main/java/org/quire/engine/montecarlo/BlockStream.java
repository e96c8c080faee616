package org.quire.engine.montecarlo;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.NormalizedGaussianSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * The random stream of one block of Monte Carlo trials: the XoRoShiRo128++ generator (Blackman and Vigna), with
 * bulk methods that fill a column of uniform variates, or of products of uniforms, while the generator's state
 * stays in local variables for the whole column. The single-value methods of {@link UniformRandomProvider} give
 * the same sequence as the bulk ones, and the same as the Commons RNG implementation of the generator started at
 * the same state. Normal variates are drawn by the modified Ziggurat method of McFarland as Commons RNG implements
 * it, reading this stream.
 *
 * <p>Not thread-safe: one stream is used by one thread.
 *
 * <p>References: D. Blackman, S. Vigna, Scrambled linear pseudorandom number generators, ACM Trans. Math. Softw.
 * 47 (2021) 36 (xoroshiro128++: rotations 49, 21, 28 and the scrambler rotl(s0 + s1, 17) + s0); C. D. McFarland,
 * A modified ziggurat algorithm for generating exponentially and normally distributed pseudorandom numbers, J.
 * Stat. Comput. Simul. 86 (2016) 1281-1294; JCGM 101:2008 C.3 and C.4 (generators and the normal distribution).
 */
public final class BlockStream implements UniformRandomProvider {
    private static final double TWO_POW_MINUS_53 = 0x1.0p-53;

    private long s0;
    private long s1;
    /** scratch columns for samplers that combine several variates per trial; kept across restarts */
    private double[][] scratch = new double[2][0];

    /** A stream started at the state (s0, s1), which must not be all zero. */
    BlockStream(long s0, long s1) {
        restart(s0, s1);
    }

    /** Starts the stream again at the state (s0, s1), which must not be all zero, keeping the scratch columns. */
    void restart(long s0, long s1) {
        if (s0 == 0 && s1 == 0) {
            throw new IllegalArgumentException("the generator's state must not be all zero");
        }
        this.s0 = s0;
        this.s1 = s1;
    }

    /** @return scratch column {@code which} (0 or 1) of at least {@code n} values, its content undefined */
    double[] scratch(int which, int n) {
        if (scratch[which].length < n) {
            scratch[which] = new double[n];
        }
        return scratch[which];
    }

    @Override
    public long nextLong() {
        long a = s0;
        long b = s1;
        long result = Long.rotateLeft(a + b, 17) + a;
        b ^= a;
        s0 = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
        s1 = Long.rotateLeft(b, 28);
        return result;
    }

    @Override
    public int nextInt() {
        return (int) (nextLong() >>> 32);
    }

    /** @return a uniform variate in [0, 1): the high 53 bits of the next output */
    @Override
    public double nextDouble() {
        return (nextLong() >>> 11) * TWO_POW_MINUS_53;
    }

    /** @return a uniform variate in the open interval (0, 1): 53 random bits, offset by half a step */
    double nextOpenDouble() {
        return ((nextLong() >>> 11) + 0.5) * TWO_POW_MINUS_53;
    }

    /** Fills {@code out[from .. from+n-1]} with uniform variates in [0, 1), the same as n calls of nextDouble. */
    void uniforms(double[] out, int from, int n) {
        long a = s0;
        long b = s1;
        for (int t = from, end = from + n; t < end; t++) {
            long result = Long.rotateLeft(a + b, 17) + a;
            b ^= a;
            a = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
            b = Long.rotateLeft(b, 28);
            out[t] = (result >>> 11) * TWO_POW_MINUS_53;
        }
        s0 = a;
        s1 = b;
    }

    /**
     * Sets {@code out[t] = -ln(r_1 ... r_k)}, r open uniforms, for t in {@code from .. from+n-1}: a gamma variate of
     * whole shape k and unit scale, the sum of k unit exponentials (Devroye 1986, IX.3).
     */
    void logProducts(double[] out, int from, int n, int k) {
        long a = s0;
        long b = s1;
        for (int t = from, end = from + n; t < end; t++) {
            double product = 1.0;
            for (int j = 0; j < k; j++) {
                long result = Long.rotateLeft(a + b, 17) + a;
                b ^= a;
                a = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
                b = Long.rotateLeft(b, 28);
                product *= ((result >>> 11) + 0.5) * TWO_POW_MINUS_53;
            }
            out[t] = -Math.log(product);
        }
        s0 = a;
        s1 = b;
    }

    /**
     * Fills {@code out[from .. from+n-1]} with standard normal variates by the modified Ziggurat method of
     * McFarland (Commons RNG {@code ZigguratSampler.NormalizedGaussian}), which reads this stream.
     */
    void normals(double[] out, int from, int n) {
        NormalizedGaussianSampler g = ZigguratSampler.NormalizedGaussian.of(this);
        for (int t = from, end = from + n; t < end; t++) {
            out[t] = g.sample();
        }
    }

    /** @return one standard normal variate (the same method as {@link #normals}) */
    double nextNormal() {
        return ZigguratSampler.NormalizedGaussian.of(this).sample();
    }
}
