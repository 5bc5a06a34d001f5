/*
 * Benchmark workload W1 (README.md beside this file) written as plain scalar C on one thread:
 * the "straightforward native code" yardstick the engine's speed is compared with.
 *
 * Build and run:  gcc -O3 -march=native -o w1-reference w1-reference.c -lm
 *                 ./w1-reference [MEMBERS=100000] [--temperature end-of-year|annual-mean]
 *                                [--feedback f2x|co2-scaled] [--seed S]
 * The defaults are W1's definition; the two options follow the engine's conventions where they
 * differ from it (README.md: "Where the engine's conventions differ").
 * Prints one JSON line: impl, members, years, total_s, sample_s, simulate_s, summarize_s,
 * member_years_per_s, check. --seed (default 20261205) seeds the random stream: the check
 * varies with it by sampling noise only (README.md: "What each program prints").
 *
 * Memory stays O(members): the members are advanced year by year twice — a first pass up to
 * 1900 for each member's 1850–1900 mean, then the reporting pass that summarises each year as
 * soon as it is computed — so no members x years matrix is ever built.
 */
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

enum { FIRST_YEAR = 1750, LAST_YEAR = 2100, YEARS = LAST_YEAR - FIRST_YEAR + 1, AGENTS = 8 };
enum { BASELINE_FROM = 1850, BASELINE_TO = 1900 };
static const double AGENT_AMPLITUDE[AGENTS] = {2.2, 0.6, 0.25, 0.4, 0.45, -0.35, -1.0, -0.2};
static const double AGENT_SCALE_SD[AGENTS] = {0.1, 0.2, 0.15, 0.3, 0.5, 0.5, 0.7, 0.5};
static const double PERCENTILES[5] = {0.05, 0.17, 0.50, 0.83, 0.95};
static const double THRESHOLD_K = 1.5;

/* ---- random numbers: xoshiro256** (Blackman & Vigna 2018) seeded by splitmix64 ---- */
static uint64_t rng_state[4];
static uint64_t rotl(uint64_t x, int k) { return (x << k) | (x >> (64 - k)); }
static uint64_t splitmix64(uint64_t *x) {
  uint64_t z = (*x += 0x9E3779B97F4A7C15ULL);
  z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
  z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
  return z ^ (z >> 31);
}
static void seed_rng(uint64_t seed) {
  for (int i = 0; i < 4; i++) rng_state[i] = splitmix64(&seed);
}
static uint64_t next_u64(void) {
  uint64_t *s = rng_state, result = rotl(s[1] * 5, 7) * 9, t = s[1] << 17;
  s[2] ^= s[0]; s[3] ^= s[1]; s[1] ^= s[2]; s[0] ^= s[3]; s[2] ^= t; s[3] = rotl(s[3], 45);
  return result;
}
/* uniform on (-1, 1) from the top 53 bits */
static double uniform_signed(void) { return ((double)(next_u64() >> 11) + 0.5) * (2.0 / 9007199254740992.0) - 1.0; }
/* standard normal by Marsaglia's polar method; the second value of each pair is kept for the next call */
static double standard_normal(void) {
  static int has_spare = 0;
  static double spare;
  if (has_spare) { has_spare = 0; return spare; }
  double u, v, s;
  do { u = uniform_signed(); v = uniform_signed(); s = u * u + v * v; } while (s >= 1.0 || s == 0.0);
  double factor = sqrt(-2.0 * log(s) / s);
  spare = v * factor; has_spare = 1;
  return u * factor;
}
static double normal_clipped_below(double mean, double sd, double floor_value) {
  return fmax(floor_value, mean + sd * standard_normal());
}

/* ---- the exact one-year step of the two-layer model with efficacy, forcing held constant ----
 * State x = (T, Td): dx/dt = A x + b F with A = [[-(lambda + eff gamma)/C, eff gamma/C], [gamma/Cd, -gamma/Cd]],
 * b = (1/C, 0). Over one year: x1 = E x0 + M b F with E = e^A and M = integral_0^1 e^(As) ds = A^-1 (E - I).
 * For a 2 x 2 matrix with real eigenvalues mu +- d: e^A = e^mu [cosh(d) I + sinh(d)/d (A - mu I)].
 * The year's mean state is M x0 + A^-1 (M - I) b F; only its upper-layer row is kept. */
typedef struct {
  double e11, e12, e21, e22; /* e^A */
  double f1, f2;             /* M b: response of the end-of-year state to F */
  double m11, m12, g1;       /* upper row of M, and of A^-1 (M - I) b: the year's mean T */
} Propagator;

static Propagator exact_propagator(double lambda, double c, double cd, double gamma, double efficacy) {
  double a11 = -(lambda + efficacy * gamma) / c, a12 = efficacy * gamma / c, a21 = gamma / cd, a22 = -gamma / cd;
  double mu = 0.5 * (a11 + a22), det = a11 * a22 - a12 * a21, d = sqrt(mu * mu - det);
  double scale = exp(mu), ch = cosh(d), sh_over_d = d > 0 ? sinh(d) / d : 1.0;
  Propagator p;
  p.e11 = scale * (ch + sh_over_d * (a11 - mu));
  p.e12 = scale * sh_over_d * a12;
  p.e21 = scale * sh_over_d * a21;
  p.e22 = scale * (ch + sh_over_d * (a22 - mu));
  /* A^-1 = [[a22, -a12], [-a21, a11]] / det */
  double m11 = (a22 * (p.e11 - 1) - a12 * p.e21) / det, m12 = (a22 * p.e12 - a12 * (p.e22 - 1)) / det;
  double m21 = (-a21 * (p.e11 - 1) + a11 * p.e21) / det, m22 = (-a21 * p.e12 + a11 * (p.e22 - 1)) / det;
  p.f1 = m11 / c;
  p.f2 = m21 / c;
  p.m11 = m11;
  p.m12 = m12;
  /* (M - I) b = ((m11 - 1)/c, m21/c); first row of A^-1 applied to it */
  p.g1 = (a22 * (m11 - 1) / c - a12 * m21 / c) / det;
  (void)m22;
  return p;
}

/* ---- exact R type 7 percentiles by selection (no full sort) ---- */
static void swap(double *a, size_t i, size_t j) { double t = a[i]; a[i] = a[j]; a[j] = t; }
/* Rearranges a[lo..hi] so that a[k] holds the value it would hold if sorted, smaller-or-equal values
 * before it and greater-or-equal after (Hoare's FIND with a median-of-three pivot). */
static void select_in_place(double *a, size_t lo, size_t hi, size_t k) {
  while (hi > lo) {
    size_t mid = lo + (hi - lo) / 2;
    if (a[mid] < a[lo]) swap(a, mid, lo);
    if (a[hi] < a[lo]) swap(a, hi, lo);
    if (a[hi] < a[mid]) swap(a, hi, mid);
    double pivot = a[mid];
    size_t i = lo, j = hi;
    for (;;) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i >= j) break;
      swap(a, i, j);
      i++;
      j--;
    }
    /* now a[lo..j] <= pivot <= a[j+1..hi] */
    if (k <= j) hi = j;
    else lo = j + 1;
  }
}
/* Percentiles (ascending probabilities) of a[0..n-1], linear interpolation between order statistics
 * at h = (n-1)p (Hyndman & Fan 1996, type 7). Each selection starts where the previous one ended. */
static double sum_of_percentiles(double *a, size_t n) {
  double total = 0;
  size_t from = 0;
  for (int i = 0; i < 5; i++) {
    double h = (double)(n - 1) * PERCENTILES[i];
    size_t k = (size_t)floor(h);
    select_in_place(a, from, n - 1, k);
    double value = a[k];
    if (h > (double)k) {
      double next = a[k + 1];
      for (size_t m = k + 2; m < n; m++) if (a[m] < next) next = a[m];
      value += (h - (double)k) * (next - value);
    }
    total += value;
    from = k;
  }
  return total;
}

static double seconds_now(void) {
  struct timespec t;
  clock_gettime(CLOCK_MONOTONIC, &t);
  return (double)t.tv_sec + 1e-9 * (double)t.tv_nsec;
}

static int usage(const char *problem) {
  fprintf(stderr, "w1-reference: %s\nusage: w1-reference [MEMBERS >= 2] [--temperature end-of-year|annual-mean] [--feedback f2x|co2-scaled] [--seed S]\n", problem);
  return 2;
}

int main(int argc, char **argv) {
  size_t n = 100000;
  int annual_mean = 0, co2_scaled_feedback = 0;
  uint64_t seed = 20261205;
  for (int i = 1; i < argc; i++) {
    if (strcmp(argv[i], "--temperature") == 0 && i + 1 < argc) {
      const char *v = argv[++i];
      if (strcmp(v, "annual-mean") == 0) annual_mean = 1;
      else if (strcmp(v, "end-of-year") != 0) return usage("--temperature must be end-of-year or annual-mean");
    } else if (strcmp(argv[i], "--feedback") == 0 && i + 1 < argc) {
      const char *v = argv[++i];
      if (strcmp(v, "co2-scaled") == 0) co2_scaled_feedback = 1;
      else if (strcmp(v, "f2x") != 0) return usage("--feedback must be f2x or co2-scaled");
    } else if (strcmp(argv[i], "--seed") == 0 && i + 1 < argc) {
      char *end;
      const char *v = argv[++i];
      seed = strtoull(v, &end, 10);
      if (*v == '\0' || *v == '-' || *end != '\0') return usage("--seed must be a whole number");
    } else {
      char *end;
      unsigned long long value = strtoull(argv[i], &end, 10);
      if (*end != '\0' || value < 2) return usage("MEMBERS must be a whole number of at least 2");
      n = (size_t)value;
    }
  }
  static double base_forcing[AGENTS][YEARS];
  for (int k = 0; k < AGENTS; k++)
    for (int t = 0; t < YEARS; t++)
      base_forcing[k][t] = AGENT_AMPLITUDE[k] * pow((double)t / (YEARS - 1), 2.5 + 0.3 * k);

  double start = seconds_now();
  seed_rng(seed);
  double *scale = malloc(sizeof(double) * AGENTS * n);
  Propagator *step = malloc(sizeof(Propagator) * n);
  double *upper = malloc(sizeof(double) * n), *deep = malloc(sizeof(double) * n);
  double *baseline = calloc(n, sizeof(double)), *anomaly = malloc(sizeof(double) * n);
  double *forcing = malloc(sizeof(double) * n);
  if (!scale || !step || !upper || !deep || !baseline || !anomaly || !forcing) {
    fprintf(stderr, "w1-reference: out of memory for %zu members\n", n);
    return 1;
  }
  for (size_t m = 0; m < n; m++) {
    for (int k = 0; k < AGENTS; k++) scale[k * n + m] = 1.0 + AGENT_SCALE_SD[k] * standard_normal();
    double ecs = 3.0 * exp(0.3039 * standard_normal());
    double f2x = 3.93 + 0.24 * standard_normal();
    double c = normal_clipped_below(8, 1, 3), cd = normal_clipped_below(100, 20, 20);
    double gamma = normal_clipped_below(0.7, 0.1, 0.2), efficacy = normal_clipped_below(1.2, 0.2, 0.5);
    /* W1: lambda = F2x / ECS. The engine (0.3.0 on) takes the doubling forcing the member feels,
       its CO2 scale times F2x, so that holding doubled CO2 gives back the member's ECS. */
    double doubling = co2_scaled_feedback ? scale[0 * n + m] * f2x : f2x;
    step[m] = exact_propagator(doubling / ecs, c, cd, gamma, efficacy);
  }
  double sampled = seconds_now();

  double simulate = 0, summarize = 0, check = 0;
  for (int pass = 0; pass < 2; pass++) {
    memset(upper, 0, sizeof(double) * n);
    memset(deep, 0, sizeof(double) * n);
    int last_year = pass == 0 ? BASELINE_TO : LAST_YEAR;
    for (int year = FIRST_YEAR; year <= last_year; year++) {
      int t = year - FIRST_YEAR;
      double t0 = seconds_now();
      for (size_t m = 0; m < n; m++) forcing[m] = 0;
      for (int k = 0; k < AGENTS; k++) {
        const double *s = scale + k * n;
        double b = base_forcing[k][t];
        for (size_t m = 0; m < n; m++) forcing[m] += s[m] * b;
      }
      for (size_t m = 0; m < n; m++) {
        const Propagator *p = &step[m];
        double x = upper[m], y = deep[m], f = forcing[m];
        /* the year's temperature: its mean (needs the start state) or the state at its end */
        double reported = annual_mean ? p->m11 * x + p->m12 * y + p->g1 * f : 0;
        upper[m] = p->e11 * x + p->e12 * y + p->f1 * f;
        deep[m] = p->e21 * x + p->e22 * y + p->f2 * f;
        anomaly[m] = annual_mean ? reported : upper[m];
      }
      double t1 = seconds_now();
      simulate += t1 - t0;
      if (pass == 0) {
        if (year >= BASELINE_FROM)
          for (size_t m = 0; m < n; m++) baseline[m] += anomaly[m] / (BASELINE_TO - BASELINE_FROM + 1);
        continue;
      }
      size_t above = 0;
      for (size_t m = 0; m < n; m++) {
        anomaly[m] -= baseline[m];
        above += anomaly[m] > THRESHOLD_K;
      }
      check += sum_of_percentiles(anomaly, n) + (double)above / (double)n;
      summarize += seconds_now() - t1;
    }
  }
  double total = seconds_now() - start;
  printf("{\"impl\":\"c-scalar\",\"members\":%zu,\"years\":%d,\"total_s\":%.4f,\"sample_s\":%.4f,"
         "\"simulate_s\":%.4f,\"summarize_s\":%.4f,\"member_years_per_s\":%.4e,\"check\":%.4f}\n",
         n, YEARS, total, sampled - start, simulate, summarize, (double)n * YEARS / total, check);
  return 0;
}
