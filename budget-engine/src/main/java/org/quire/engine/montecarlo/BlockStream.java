package org.quire.engine.montecarlo;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.NormalizedGaussianSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * The random stream of one block of Monte Carlo trials: the XoRoShiRo128++ generator (Blackman and Vigna), with
 * bulk methods that fill a column of uniform variates, or of Student t variates, while the generator's state
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
 * Stat. Comput. Simul. 86 (2016) 1281-1294; R. W. Bailey, Polar generation of random variates with the
 * t-distribution, Math. Comp. 62 (1994) 779-781; JCGM 101:2008 C.3 and C.4 (generators and the normal
 * distribution).
 */
public final class BlockStream implements UniformRandomProvider {
    private static final double TWO_POW_MINUS_53 = 0x1.0p-53;

    private long s0;
    private long s1;
    /** scratch space for samplers that need a second column; kept across restarts */
    private double[] scratch = new double[0];

    /** A stream started at the state (s0, s1), which must not be all zero. */
    BlockStream(long s0, long s1) {
        restart(s0, s1);
    }

    /** Starts the stream again at the state (s0, s1), which must not be all zero, keeping the scratch space. */
    void restart(long s0, long s1) {
        if (s0 == 0 && s1 == 0) {
            throw new IllegalArgumentException("the generator's state must not be all zero");
        }
        this.s0 = s0;
        this.s1 = s1;
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
     * Sets {@code out[t] = lo + width u_t} for t in {@code from .. from+n-1}, u_t the uniform variates of n calls
     * of nextDouble: a rectangular variate in one pass, the same values as drawing u and scaling it after.
     */
    void uniforms(double[] out, int from, int n, double lo, double width) {
        long a = s0;
        long b = s1;
        for (int t = from, end = from + n; t < end; t++) {
            long result = Long.rotateLeft(a + b, 17) + a;
            b ^= a;
            a = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
            b = Long.rotateLeft(b, 28);
            out[t] = lo + width * ((result >>> 11) * TWO_POW_MINUS_53);
        }
        s0 = a;
        s1 = b;
    }

    /**
     * Fills {@code first[from .. from+n-1]} and {@code second[from .. from+n-1]} with pairs of uniform variates in
     * [0, 1), trial by trial: {@code first[t]} and {@code second[t]} are the values of two consecutive calls of
     * nextDouble, so a sampler that combines two uniforms per trial gets the same values as drawing them one by
     * one.
     */
    void uniformPairs(double[] first, double[] second, int from, int n) {
        long a = s0;
        long b = s1;
        for (int t = from, end = from + n; t < end; t++) {
            long r = Long.rotateLeft(a + b, 17) + a;
            b ^= a;
            a = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
            b = Long.rotateLeft(b, 28);
            long q = Long.rotateLeft(a + b, 17) + a;
            b ^= a;
            a = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
            b = Long.rotateLeft(b, 28);
            first[t] = (r >>> 11) * TWO_POW_MINUS_53;
            second[t] = (q >>> 11) * TWO_POW_MINUS_53;
        }
        s0 = a;
        s1 = b;
    }

    /** Fills {@code out[from .. from+n-1]} with uniform variates in (0, 1), the same as n calls of nextOpenDouble. */
    void openUniforms(double[] out, int from, int n) {
        long a = s0;
        long b = s1;
        for (int t = from, end = from + n; t < end; t++) {
            long result = Long.rotateLeft(a + b, 17) + a;
            b ^= a;
            a = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
            b = Long.rotateLeft(b, 28);
            out[t] = ((result >>> 11) + 0.5) * TWO_POW_MINUS_53;
        }
        s0 = a;
        s1 = b;
    }

    /** @return a scratch column of at least {@code n} values for a sampler's second variate, content undefined */
    double[] second(int n) {
        return scratch(n);
    }

    /**
     * Fills {@code out[from .. from+n-1]} with variates of Student's t distribution with {@code nu} degrees of
     * freedom (finite, &gt; 0) by Bailey's polar method: draw u, v uniform on (-1, 1) until w = u^2 + v^2 &lt;= 1,
     * then t = u sqrt(nu (w^(-2/nu) - 1) / w). Two uniforms per attempt, accepted with probability pi/4, and no
     * normal or gamma variate; w^(-2/nu) is a square root or a division for nu = 1, 2 and 4, and
     * exp(-2 ln(w) / nu) otherwise (through expm1 for large nu, where w^(-2/nu) - 1 would cancel).
     *
     * <p>References: R. W. Bailey, Polar generation of random variates with the t-distribution, Math. Comp. 62
     * (1994) 779-781, doi:10.1090/S0025-5718-1994-1219702-8.
     */
    void studentT(double[] out, int from, int n, double nu) {
        // first the accepted pairs (u into out, w into the scratch column) without a branch on acceptance, so
        // that the second loop, the arithmetic, runs without mispredicted branches (and vectorised where it can)
        double[] ws = scratch(n);
        long a = s0;
        long b = s1;
        int k = 0;
        while (k < n) {
            long r = Long.rotateLeft(a + b, 17) + a;
            b ^= a;
            a = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
            b = Long.rotateLeft(b, 28);
            long q = Long.rotateLeft(a + b, 17) + a;
            b ^= a;
            a = Long.rotateLeft(a, 49) ^ b ^ (b << 21);
            b = Long.rotateLeft(b, 28);
            // 54 signed bits, offset by half a step: symmetric and never 0, so w > 0
            double u = ((r >> 10) + 0.5) * TWO_POW_MINUS_53;
            double v = ((q >> 10) + 0.5) * TWO_POW_MINUS_53;
            double w = u * u + v * v;
            out[from + k] = u;
            ws[k] = w;
            k += w <= 1.0 ? 1 : 0;
        }
        s0 = a;
        s1 = b;
        double exponent = -2.0 / nu;
        if (nu == 1.0) {
            for (int t = 0; t < n; t++) {
                double w = ws[t];
                out[from + t] *= Math.sqrt((1.0 - w * w) / (w * w * w));
            }
        } else if (nu == 2.0) {
            for (int t = 0; t < n; t++) {
                double w = ws[t];
                out[from + t] *= Math.sqrt(2.0 * (1.0 - w)) / w;
            }
        } else if (nu == 4.0) {
            for (int t = 0; t < n; t++) {
                double w = ws[t];
                double r = Math.sqrt(w);
                out[from + t] *= 2.0 * Math.sqrt((1.0 - r) / (r * w));
            }
        } else if (nu <= 100.0) {
            for (int t = 0; t < n; t++) {
                double w = ws[t];
                out[from + t] *= Math.sqrt(nu * (Math.pow(w, exponent) - 1.0) / w);
            }
        } else {
            for (int t = 0; t < n; t++) {
                double w = ws[t];
                out[from + t] *= Math.sqrt(nu * Math.expm1(exponent * Math.log(w)) / w);
            }
        }
    }

    /** @return the scratch column of at least {@code n} values, its content undefined */
    private double[] scratch(int n) {
        if (scratch.length < n) {
            scratch = new double[n];
        }
        return scratch;
    }

    /**
     * Fills {@code out[from .. from+n-1]} with standard normal variates by the modified Ziggurat method of
     * McFarland (Commons RNG {@code ZigguratSampler.NormalizedGaussian}), which reads this stream: the same
     * values as n calls of {@link #nextNormal}. The sampler's fast path (about 98.8 % of draws: one output of the
     * generator whose low byte i selects a layer below {@link FastPath#LAYERS}, and the value x_i times that
     * output) runs here with the generator's state in locals; any other draw is handed to the sampler, from the
     * state before it, so the sampler reads the same output and goes on from there.
     */
    void normals(double[] out, int from, int n) {
        NormalizedGaussianSampler g = ZigguratSampler.NormalizedGaussian.of(this);
        double[] x = FastPath.X;
        if (x == null) {
            for (int t = from, end = from + n; t < end; t++) {
                out[t] = g.sample();
            }
            return;
        }
        long a = s0;
        long b = s1;
        for (int t = from, end = from + n; t < end; t++) {
            long xx = Long.rotateLeft(a + b, 17) + a;
            int i = ((int) xx) & 0xff;
            if (i < FastPath.LAYERS) {
                long c = b ^ a;
                a = Long.rotateLeft(a, 49) ^ c ^ (c << 21);
                b = Long.rotateLeft(c, 28);
                out[t] = x[i] * xx;
            } else {
                s0 = a;
                s1 = b;
                out[t] = g.sample();
                a = s0;
                b = s1;
            }
        }
        s0 = a;
        s1 = b;
    }

    /** @return one standard normal variate (the same method as {@link #normals}) */
    double nextNormal() {
        return ZigguratSampler.NormalizedGaussian.of(this).sample();
    }

    /**
     * The layers of the Commons RNG normal Ziggurat sampler that it draws from one generator output, and their
     * x values, read from the sampler itself through its public interface: fed the output 2^62 + i (low byte i),
     * the fast path returns x_i 2^62 exactly (2^62 + i rounds to 2^62 as a double, and the product by a power of
     * two is exact). {@code BlockStreamTest} checks the bulk normals against the sampler draw by draw; when the
     * sampler does not answer as expected, X is null and every draw goes through the sampler (same values).
     */
    static final class FastPath {
        /** Layers 0 .. LAYERS-1 take the fast path (I_MAX of the sampler, Commons RNG 1.7). */
        static final int LAYERS = 253;
        static final double[] X = read();

        private FastPath() {
        }

        private static double[] read() {
            double[] x = new double[LAYERS];
            long[] next = new long[1];
            int[] calls = new int[1];
            // the probe first, then a real stream: a sampler whose fast path has fewer layers than LAYERS takes
            // its slow path for the probe, which ends (it reads the real stream) and is seen as a second call
            BlockStream after = new BlockStream(0x9E3779B97F4A7C15L, 1L);
            UniformRandomProvider probe = () -> calls[0]++ == 0 ? next[0] : after.nextLong();
            NormalizedGaussianSampler g = ZigguratSampler.NormalizedGaussian.of(probe);
            for (int i = 0; i < LAYERS; i++) {
                next[0] = (1L << 62) + i;
                calls[0] = 0;
                x[i] = g.sample() * 0x1.0p-62;
                if (calls[0] != 1) {
                    return null; // not the fast path this class was written for: every draw by the sampler
                }
                // a fast-path value lies inside the layers' span, 0 < x_i 2^63 < 3.7 (x_1 is the base strip's end)
                if (!(x[i] > 0 && x[i] * 0x1.0p63 < 3.7)) {
                    return null;
                }
            }
            return x;
        }
    }
}
