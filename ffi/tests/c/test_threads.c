/*
 * Calls from several threads at once give bitwise the same results as one
 * thread: every property of a grid of states over regions 1, 2, 3 and 5 and
 * the saturation line, through ebullio_solve and ebullio_property_array.
 * Built with -std=c99 -pthread by ffi/tests/run.sh.
 */
#define _POSIX_C_SOURCE 200809L
#include <pthread.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "ebullio.h"

#define NP 40
#define NT 50
#define N (NP * NT)
#define THREADS 4
#define ROUNDS 25

static double pressures[N], temperatures[N];

struct result {
    EbullioState states[N];
    EbullioStatus solve_status[N];
    double enthalpy[N];
    EbullioStatus array_status[N];
};

static void compute(struct result *r) {
    size_t i;
    memset(r, 0, sizeof *r);
    for (i = 0; i < N; ++i) {
        r->states[i].size = (uint32_t)sizeof(EbullioState);
        r->solve_status[i] = ebullio_solve(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                                           pressures[i], temperatures[i],
                                           EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT,
                                           &r->states[i], NULL);
    }
    (void)ebullio_property_array(EBULLIO_PROPERTY_ENTHALPY,
                                 EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, pressures,
                                 temperatures, N, EBULLIO_UNITS_US_CUSTOMARY,
                                 EBULLIO_METHOD_EXACT, r->enthalpy, r->array_status);
}

static struct result reference;
static struct result per_thread[THREADS];
static int mismatches[THREADS];

static void *worker(void *arg) {
    size_t k = (size_t)arg;
    int round;
    for (round = 0; round < ROUNDS; ++round) {
        compute(&per_thread[k]);
        if (memcmp(&per_thread[k], &reference, sizeof reference) != 0) {
            ++mismatches[k];
        }
    }
    return NULL;
}

int main(void) {
    pthread_t threads[THREADS];
    size_t i, j, good = 0;
    int failed = 0;
    /* 0.001 to 100 MPa, 275 to 2200 K: regions 1, 2, 3, 5 and refusals
       (above 50 MPa past 1073.15 K), so error statuses are compared too. */
    for (i = 0; i < NP; ++i) {
        for (j = 0; j < NT; ++j) {
            pressures[i * NT + j] = 0.001 + 99.999 * (double)i / (NP - 1);
            temperatures[i * NT + j] = 275.0 + 1925.0 * (double)j / (NT - 1);
        }
    }
    compute(&reference);
    for (i = 0; i < N; ++i) {
        good += reference.solve_status[i] == EBULLIO_STATUS_OK;
    }
    if (good < N / 2) {
        fprintf(stderr, "threads: only %zu of %d reference states solved\n", good, N);
        return EXIT_FAILURE;
    }
    for (i = 0; i < THREADS; ++i) {
        if (pthread_create(&threads[i], NULL, worker, (void *)i) != 0) {
            fprintf(stderr, "threads: pthread_create failed\n");
            return EXIT_FAILURE;
        }
    }
    for (i = 0; i < THREADS; ++i) {
        pthread_join(threads[i], NULL);
        failed += mismatches[i];
    }
    printf("threads: %d threads x %d rounds x %d states (%zu solvable), %d mismatches\n",
           THREADS, ROUNDS, N, good, failed);
    return failed == 0 ? EXIT_SUCCESS : EXIT_FAILURE;
}
