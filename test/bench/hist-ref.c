/*
 * C reference for the histogram kernel benchmark: the same loop as histValue in assembly/kernels.ts
 * (per feature: clear 256 bins x [rows, sum w, sum w*y], then for each row of the node add 1, w, w*y to
 * the row's bin), over the same binned data written by run.mjs. Compiled with `cc -O3`.
 * Usage: c-ref data.bin reps  ->  prints "<best seconds> <checksum>"
 */
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

static double now(void) {
  struct timespec t;
  clock_gettime(CLOCK_MONOTONIC, &t);
  return t.tv_sec + t.tv_nsec * 1e-9;
}

static void hist_value(const uint8_t *codes, int n_rows, const int32_t *rows, int count, const double *gw,
                       const double *gs, const int32_t *feats, int n_feats, double *hist) {
  for (int k = 0; k < n_feats; k++) {
    int f = feats[k];
    const uint8_t *col = codes + (size_t)f * n_rows;
    double *h = hist + (size_t)f * 256 * 3;
    memset(h, 0, 256 * 3 * sizeof(double));
    for (int i = 0; i < count; i++) {
      double *p = h + col[rows[i]] * 3;
      p[0] += 1.0;
      p[1] += gw[i];
      p[2] += gs[i];
    }
  }
}

int main(int argc, char **argv) {
  if (argc < 3) { fprintf(stderr, "usage: c-ref data.bin reps\n"); return 2; }
  FILE *fp = fopen(argv[1], "rb");
  if (!fp) { perror("open"); return 1; }
  int32_t hdr[2];
  if (fread(hdr, 4, 2, fp) != 2) return 1;
  int n = hdr[0], nf = hdr[1], reps = atoi(argv[2]);
  uint8_t *codes = malloc((size_t)n * nf);
  double *gw = malloc((size_t)n * 8), *gs = malloc((size_t)n * 8), *hist = malloc((size_t)nf * 256 * 3 * 8);
  int32_t *rows = malloc((size_t)n * 4), *feats = malloc((size_t)nf * 4);
  if (fread(codes, 1, (size_t)n * nf, fp) != (size_t)n * nf || fread(gw, 8, n, fp) != (size_t)n || fread(gs, 8, n, fp) != (size_t)n) return 1;
  fclose(fp);
  for (int i = 0; i < n; i++) rows[i] = i;
  for (int f = 0; f < nf; f++) feats[f] = f;
  double best = 1e30;
  for (int r = 0; r < reps; r++) {
    double t0 = now();
    hist_value(codes, n, rows, n, gw, gs, feats, nf, hist);
    double t = now() - t0;
    if (t < best) best = t;
  }
  double sum = 0;
  for (size_t j = 0; j < (size_t)nf * 256 * 3; j++) sum += hist[j];
  printf("%.6f %.17g\n", best, sum);
  return 0;
}
