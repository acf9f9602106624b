/* Reference: GSL's rk8pd (Prince-Dormand 8(9)) on the Lorenz model with a hand-written right-hand side.
 * Build: cc -O2 lorenz_rk8pd.c -lgsl -lgslcblas -lm.  Usage: lorenz_rk8pd [END] [RTOL] [ATOL] [REPEATS] */
#include <stdio.h>
#include <stdlib.h>
#include <time.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_odeiv2.h>

static unsigned long evaluations;

static int lorenz(double t, const double u[], double dudt[], void *params) {
    (void) t;
    (void) params;
    evaluations++;
    dudt[0] = 10.0 * (u[1] - u[0]);
    dudt[1] = u[0] * (28.0 - u[2]) - u[1];
    dudt[2] = u[0] * u[1] - 8.0 / 3.0 * u[2];
    return GSL_SUCCESS;
}

static double now(void) {
    struct timespec ts;
    clock_gettime(CLOCK_MONOTONIC, &ts);
    return ts.tv_sec + 1e-9 * ts.tv_nsec;
}

static int compare(const void *a, const void *b) {
    double x = *(const double *) a, y = *(const double *) b;
    return (x > y) - (x < y);
}

int main(int argc, char **argv) {
    double end = argc > 1 ? atof(argv[1]) : 1000;
    double rtol = argc > 2 ? atof(argv[2]) : 1e-10;
    double atol = argc > 3 ? atof(argv[3]) : 1e-10;
    int repeats = argc > 4 ? atoi(argv[4]) : 20;
    gsl_odeiv2_system sys = {lorenz, NULL, 3, NULL};
    double *seconds = malloc(sizeof(double) * repeats);
    unsigned long steps = 0, failed = 0, evals = 0;
    double x = 0;
    for (int k = 0; k < repeats; k++) {
        gsl_odeiv2_step *s = gsl_odeiv2_step_alloc(gsl_odeiv2_step_rk8pd, 3);
        gsl_odeiv2_control *c = gsl_odeiv2_control_standard_new(atol, rtol, 1.0, 0.0);
        gsl_odeiv2_evolve *e = gsl_odeiv2_evolve_alloc(3);
        double t = 0, h = 1e-6, u[3] = {1, 1, 1};
        evaluations = 0;
        double start = now();
        while (t < end) {
            if (gsl_odeiv2_evolve_apply(e, c, s, &sys, &t, end, &h, u) != GSL_SUCCESS) {
                fprintf(stderr, "integration failed at t = %g\n", t);
                return 1;
            }
        }
        seconds[k] = now() - start;
        steps = e->count;
        failed = e->failed_steps;
        evals = evaluations;
        x = u[0];
        gsl_odeiv2_evolve_free(e);
        gsl_odeiv2_control_free(c);
        gsl_odeiv2_step_free(s);
    }
    qsort(seconds, repeats, sizeof(double), compare);
    printf("GSL rk8pd (C)                    evaluations %lu  steps %lu (%lu failed)  best %.4f s  median %.4f s"
           "  x(%g) = %.10f\n", evals, steps - failed, failed, seconds[0], seconds[repeats / 2], end, x);
    free(seconds);
    return 0;
}
