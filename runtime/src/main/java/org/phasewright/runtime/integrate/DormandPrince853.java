package org.phasewright.runtime.integrate;

import org.phasewright.runtime.linalg.Vectors;

import org.phasewright.runtime.compile.VectorField;

/**
 * Explicit Runge–Kutta method of Dormand and Prince of order 8 with error estimators of orders 5 and 3 and a
 * 7th-order continuous extension: the method and the step-size control of Hairer's code DOP853 described in Hairer,
 * Nørsett &amp; Wanner, Solving Ordinary Differential Equations I (2nd ed., 1993), Section II.10. The coefficients
 * are those published with DOP853 (Prince &amp; Dormand 1981, J. Comput. Appl. Math. 7:67, as tabulated by Hairer).
 * <p>
 * Twelve evaluations per step (the last one is reused as the next step's first), plus three per accepted step only
 * when an observer wants dense output. Error weights are per component: atol_i + rtol_i·max(|u_old,i|, |u_new,i|).
 * Stiffness is detected as in DOP853: stages 12 and 13 are both evaluated at t+h, so |h|·‖k13−k12‖/‖y13−y12‖
 * estimates |hλ|; beyond the stability boundary 6.1 for 15 tested steps the outcome reports where.
 * <p>
 * An instance owns its work arrays, so the step loop allocates nothing; it is not thread-safe but can be reused.
 */
public final class DormandPrince853 implements Integrator {
    // Nodes c_i and coupling coefficients a_ij of stages 1..12 and the dense-output stages 14..16 (0-based here).
    private static final double C1 = 0.526001519587677318785587544488e-01;
    private static final double C2 = 0.789002279381515978178381316732e-01;
    private static final double C3 = 0.118350341907227396726757197510;
    private static final double C4 = 0.281649658092772603273242802490;
    private static final double C5 = 0.333333333333333333333333333333;
    private static final double C6 = 0.25;
    private static final double C7 = 0.307692307692307692307692307692;
    private static final double C8 = 0.651282051282051282051282051282;
    private static final double C9 = 0.6;
    private static final double C10 = 0.857142857142857142857142857142;
    private static final double C11 = 1.0;
    private static final double C12 = 1.0;
    private static final double C13 = 0.1;
    private static final double C14 = 0.2;
    private static final double C15 = 0.777777777777777777777777777778;
    private static final double A1_0 = 5.26001519587677318785587544488e-2;
    private static final double A2_0 = 1.97250569845378994544595329183e-2;
    private static final double A2_1 = 5.91751709536136983633785987549e-2;
    private static final double A3_0 = 2.95875854768068491816892993775e-2;
    private static final double A3_2 = 8.87627564304205475450678981324e-2;
    private static final double A4_0 = 2.41365134159266685502369798665e-1;
    private static final double A4_2 = -8.84549479328286085344864962717e-1;
    private static final double A4_3 = 9.24834003261792003115737966543e-1;
    private static final double A5_0 = 3.7037037037037037037037037037e-2;
    private static final double A5_3 = 1.70828608729473871279604482173e-1;
    private static final double A5_4 = 1.25467687566822425016691814123e-1;
    private static final double A6_0 = 3.7109375e-2;
    private static final double A6_3 = 1.70252211019544039314978060272e-1;
    private static final double A6_4 = 6.02165389804559606850219397283e-2;
    private static final double A6_5 = -1.7578125e-2;
    private static final double A7_0 = 3.70920001185047927108779319836e-2;
    private static final double A7_3 = 1.70383925712239993810214054705e-1;
    private static final double A7_4 = 1.07262030446373284651809199168e-1;
    private static final double A7_5 = -1.53194377486244017527936158236e-2;
    private static final double A7_6 = 8.27378916381402288758473766002e-3;
    private static final double A8_0 = 6.24110958716075717114429577812e-1;
    private static final double A8_3 = -3.36089262944694129406857109825;
    private static final double A8_4 = -8.68219346841726006818189891453e-1;
    private static final double A8_5 = 2.75920996994467083049415600797e1;
    private static final double A8_6 = 2.01540675504778934086186788979e1;
    private static final double A8_7 = -4.34898841810699588477366255144e1;
    private static final double A9_0 = 4.77662536438264365890433908527e-1;
    private static final double A9_3 = -2.48811461997166764192642586468;
    private static final double A9_4 = -5.90290826836842996371446475743e-1;
    private static final double A9_5 = 2.12300514481811942347288949897e1;
    private static final double A9_6 = 1.52792336328824235832596922938e1;
    private static final double A9_7 = -3.32882109689848629194453265587e1;
    private static final double A9_8 = -2.03312017085086261358222928593e-2;
    private static final double A10_0 = -9.3714243008598732571704021658e-1;
    private static final double A10_3 = 5.18637242884406370830023853209;
    private static final double A10_4 = 1.09143734899672957818500254654;
    private static final double A10_5 = -8.14978701074692612513997267357;
    private static final double A10_6 = -1.85200656599969598641566180701e1;
    private static final double A10_7 = 2.27394870993505042818970056734e1;
    private static final double A10_8 = 2.49360555267965238987089396762;
    private static final double A10_9 = -3.0467644718982195003823669022;
    private static final double A11_0 = 2.27331014751653820792359768449;
    private static final double A11_3 = -1.05344954667372501984066689879e1;
    private static final double A11_4 = -2.00087205822486249909675718444;
    private static final double A11_5 = -1.79589318631187989172765950534e1;
    private static final double A11_6 = 2.79488845294199600508499808837e1;
    private static final double A11_7 = -2.85899827713502369474065508674;
    private static final double A11_8 = -8.87285693353062954433549289258;
    private static final double A11_9 = 1.23605671757943030647266201528e1;
    private static final double A11_10 = 6.43392746015763530355970484046e-1;
    private static final double A12_0 = 5.42937341165687622380535766363e-2;
    private static final double A12_5 = 4.45031289275240888144113950566;
    private static final double A12_6 = 1.89151789931450038304281599044;
    private static final double A12_7 = -5.8012039600105847814672114227;
    private static final double A12_8 = 3.1116436695781989440891606237e-1;
    private static final double A12_9 = -1.52160949662516078556178806805e-1;
    private static final double A12_10 = 2.01365400804030348374776537501e-1;
    private static final double A12_11 = 4.47106157277725905176885569043e-2;
    private static final double A13_0 = 5.61675022830479523392909219681e-2;
    private static final double A13_6 = 2.53500210216624811088794765333e-1;
    private static final double A13_7 = -2.46239037470802489917441475441e-1;
    private static final double A13_8 = -1.24191423263816360469010140626e-1;
    private static final double A13_9 = 1.5329179827876569731206322685e-1;
    private static final double A13_10 = 8.20105229563468988491666602057e-3;
    private static final double A13_11 = 7.56789766054569976138603589584e-3;
    private static final double A13_12 = -8.298e-3;
    private static final double A14_0 = 3.18346481635021405060768473261e-2;
    private static final double A14_5 = 2.83009096723667755288322961402e-2;
    private static final double A14_6 = 5.35419883074385676223797384372e-2;
    private static final double A14_7 = -5.49237485713909884646569340306e-2;
    private static final double A14_10 = -1.08347328697249322858509316994e-4;
    private static final double A14_11 = 3.82571090835658412954920192323e-4;
    private static final double A14_12 = -3.40465008687404560802977114492e-4;
    private static final double A14_13 = 1.41312443674632500278074618366e-1;
    private static final double A15_0 = -4.28896301583791923408573538692e-1;
    private static final double A15_5 = -4.69762141536116384314449447206;
    private static final double A15_6 = 7.68342119606259904184240953878;
    private static final double A15_7 = 4.06898981839711007970213554331;
    private static final double A15_8 = 3.56727187455281109270669543021e-1;
    private static final double A15_12 = -1.39902416515901462129418009734e-3;
    private static final double A15_13 = 2.9475147891527723389556272149;
    private static final double A15_14 = -9.15095847217987001081870187138;
    // 8th-order weights b_i are the row A12_*; E5 and the 3rd-order weights BHH give the two error estimates.
    private static final double E5_0 = 0.1312004499419488073250102996e-1;
    private static final double E5_5 = -0.1225156446376204440720569753e+1;
    private static final double E5_6 = -0.4957589496572501915214079952;
    private static final double E5_7 = 0.1664377182454986536961530415e+1;
    private static final double E5_8 = -0.3503288487499736816886487290;
    private static final double E5_9 = 0.3341791187130174790297318841;
    private static final double E5_10 = 0.8192320648511571246570742613e-1;
    private static final double E5_11 = -0.2235530786388629525884427845e-1;
    private static final double BHH_0 = 0.244094488188976377952755905512;
    private static final double BHH_8 = 0.733846688281611857341361741547;
    private static final double BHH_11 = 0.220588235294117647058823529412e-1;
    // Dense output: rows 4..7 of the 7th-order continuous extension.
    private static final double D0_0 = -0.84289382761090128651353491142e+1;
    private static final double D0_5 = 0.56671495351937776962531783590;
    private static final double D0_6 = -0.30689499459498916912797304727e+1;
    private static final double D0_7 = 0.23846676565120698287728149680e+1;
    private static final double D0_8 = 0.21170345824450282767155149946e+1;
    private static final double D0_9 = -0.87139158377797299206789907490;
    private static final double D0_10 = 0.22404374302607882758541771650e+1;
    private static final double D0_11 = 0.63157877876946881815570249290;
    private static final double D0_12 = -0.88990336451333310820698117400e-1;
    private static final double D0_13 = 0.18148505520854727256656404962e+2;
    private static final double D0_14 = -0.91946323924783554000451984436e+1;
    private static final double D0_15 = -0.44360363875948939664310572000e+1;
    private static final double D1_0 = 0.10427508642579134603413151009e+2;
    private static final double D1_5 = 0.24228349177525818288430175319e+3;
    private static final double D1_6 = 0.16520045171727028198505394887e+3;
    private static final double D1_7 = -0.37454675472269020279518312152e+3;
    private static final double D1_8 = -0.22113666853125306036270938578e+2;
    private static final double D1_9 = 0.77334326684722638389603898808e+1;
    private static final double D1_10 = -0.30674084731089398182061213626e+2;
    private static final double D1_11 = -0.93321305264302278729567221706e+1;
    private static final double D1_12 = 0.15697238121770843886131091075e+2;
    private static final double D1_13 = -0.31139403219565177677282850411e+2;
    private static final double D1_14 = -0.93529243588444783865713862664e+1;
    private static final double D1_15 = 0.35816841486394083752465898540e+2;
    private static final double D2_0 = 0.19985053242002433820987653617e+2;
    private static final double D2_5 = -0.38703730874935176555105901742e+3;
    private static final double D2_6 = -0.18917813819516756882830838328e+3;
    private static final double D2_7 = 0.52780815920542364900561016686e+3;
    private static final double D2_8 = -0.11573902539959630126141871134e+2;
    private static final double D2_9 = 0.68812326946963000169666922661e+1;
    private static final double D2_10 = -0.10006050966910838403183860980e+1;
    private static final double D2_11 = 0.77771377980534432092869265740;
    private static final double D2_12 = -0.27782057523535084065932004339e+1;
    private static final double D2_13 = -0.60196695231264120758267380846e+2;
    private static final double D2_14 = 0.84320405506677161018159903784e+2;
    private static final double D2_15 = 0.11992291136182789328035130030e+2;
    private static final double D3_0 = -0.25693933462703749003312586129e+2;
    private static final double D3_5 = -0.15418974869023643374053993627e+3;
    private static final double D3_6 = -0.23152937917604549567536039109e+3;
    private static final double D3_7 = 0.35763911791061412378285349910e+3;
    private static final double D3_8 = 0.93405324183624310003907691704e+2;
    private static final double D3_9 = -0.37458323136451633156875139351e+2;
    private static final double D3_10 = 0.10409964950896230045147246184e+3;
    private static final double D3_11 = 0.29840293426660503123344363579e+2;
    private static final double D3_12 = -0.43533456590011143754432175058e+2;
    private static final double D3_13 = 0.96324553959188282948394950600e+2;
    private static final double D3_14 = -0.39177261675615439165231486172e+2;
    private static final double D3_15 = -0.14972683625798562581422125276e+3;

    // Step-size control of DOP853: safety factor, bounds on the step ratio, exponent 1/8.
    private static final double SAFETY = 0.9, FAC_MIN = 1.0 / 3, FAC_MAX = 6.0, EXPO = 1.0 / 8;
    // Stiffness test of DOP853: boundary of the stability region along the negative axis.
    private static final double STIFF_BOUNDARY = 6.1;

    private final VectorField field;
    private final double[] p;
    private final int n;
    private double[] y, yNew, k0, k12;
    private final double[] k1, k2, k3, k4, k5, k6, k7, k8, k9, k10, k11, k13, k14, k15, yStage, increment;
    private final double[] r1, r2, r3, r4, r5, r6, r7, r8; // continuous extension of the last step
    private final Dense dense = new Dense();

    public DormandPrince853(VectorField field, double[] parameters) {
        this.field = field;
        this.p = parameters.clone();
        this.n = field.dimension();
        y = new double[n];
        yNew = new double[n];
        k0 = new double[n];
        k1 = new double[n];
        k2 = new double[n];
        k3 = new double[n];
        k4 = new double[n];
        k5 = new double[n];
        k6 = new double[n];
        k7 = new double[n];
        k8 = new double[n];
        k9 = new double[n];
        k10 = new double[n];
        k11 = new double[n];
        k12 = new double[n];
        k13 = new double[n];
        k14 = new double[n];
        k15 = new double[n];
        yStage = new double[n];
        increment = new double[n];
        r1 = new double[n];
        r2 = new double[n];
        r3 = new double[n];
        r4 = new double[n];
        r5 = new double[n];
        r6 = new double[n];
        r7 = new double[n];
        r8 = new double[n];
    }

    @Override
    public IntegrationOutcome integrate(double t0, double[] u0, double tEnd, IntegratorSettings s,
            StepObserver observer) {
        AdaptiveStepDriver b = new AdaptiveStepDriver(s, observer, dense);
        IntegrationOutcome early = b.begin(t0, u0, tEnd, y, field, p, k0);
        if (early != null) {
            return early;
        }
        double[] rtol = s.relativeTolerances(n);
        double[] atol = s.absoluteTolerances(n);
        double h = b.firstExplicitStep(s, field, p, t0, y, k0, yStage, k1, rtol, atol, 8);
        StepSizeControl control = new StepSizeControl(EXPO, 0, SAFETY, FAC_MIN, FAC_MAX); // no PI term in DOP853
        return b.run(new Attempts(b, rtol, atol, observer != null), control, t0, h, tEnd);
    }

    /** The stages and error norm of one integration. */
    private final class Attempts extends AdaptiveStepDriver.PairAttempts {
        Attempts(AdaptiveStepDriver b, double[] rtol, double[] atol, boolean denseOutput) {
            super(b, rtol, atol, denseOutput);
        }

        @Override
        public double[] state() {
            return y;
        }

        @Override
        public double attempt(double t, double h, double tNew) {
            stages(t, h);
            field.rates(tNew, yNew, p, k12);
            b.evaluations += 12;

            double err5 = 0, err3 = 0;
            for (int i = 0; i < n; i++) {
                double sk = atol[i] + rtol[i] * Math.max(Math.abs(y[i]), Math.abs(yNew[i]));
                double e3 = (increment[i] - (BHH_0 * k0[i] + BHH_8 * k8[i] + BHH_11 * k11[i])) / sk;
                double e5 = (E5_0 * k0[i] + E5_5 * k5[i] + E5_6 * k6[i] + E5_7 * k7[i] + E5_8 * k8[i] + E5_9 * k9[i]
                        + E5_10 * k10[i] + E5_11 * k11[i]) / sk;
                err3 += e3 * e3;
                err5 += e5 * e5;
            }
            double deno = err5 + 0.01 * err3;
            double err = Math.abs(h) * err5 * Math.sqrt(1.0 / (n * (deno <= 0 ? 1.0 : deno)));
            return Vectors.allFinite(yNew) ? err : Double.NaN;
        }

        @Override
        public void accept(double t, double h, double tNew) {
            b.testStiffness(h, tNew, k12, k11, yNew, yStage, STIFF_BOUNDARY);
            if (denseOutput) {
                prepareDense(t, h);
                b.evaluations += 3;
            }
            double[] swap = y;
            y = yNew;
            yNew = swap;
            swap = k0; // the last stage f(t_new, y_new) is the next step's first
            k0 = k12;
            k12 = swap;
        }

        @Override
        public double largest() {
            return Double.NaN; // the driver measures it
        }
    }

    /** Stages 2..12 and the new point; leaves the 12th stage's argument in yStage for the stiffness test. */
    private void stages(double t, double h) {
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A1_0 * k0[i]);
        }
        field.rates(t + C1 * h, yStage, p, k1);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A2_0 * k0[i] + A2_1 * k1[i]);
        }
        field.rates(t + C2 * h, yStage, p, k2);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A3_0 * k0[i] + A3_2 * k2[i]);
        }
        field.rates(t + C3 * h, yStage, p, k3);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A4_0 * k0[i] + A4_2 * k2[i] + A4_3 * k3[i]);
        }
        field.rates(t + C4 * h, yStage, p, k4);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A5_0 * k0[i] + A5_3 * k3[i] + A5_4 * k4[i]);
        }
        field.rates(t + C5 * h, yStage, p, k5);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A6_0 * k0[i] + A6_3 * k3[i] + A6_4 * k4[i] + A6_5 * k5[i]);
        }
        field.rates(t + C6 * h, yStage, p, k6);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A7_0 * k0[i] + A7_3 * k3[i] + A7_4 * k4[i] + A7_5 * k5[i] + A7_6 * k6[i]);
        }
        field.rates(t + C7 * h, yStage, p, k7);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A8_0 * k0[i] + A8_3 * k3[i] + A8_4 * k4[i] + A8_5 * k5[i] + A8_6 * k6[i]
                    + A8_7 * k7[i]);
        }
        field.rates(t + C8 * h, yStage, p, k8);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A9_0 * k0[i] + A9_3 * k3[i] + A9_4 * k4[i] + A9_5 * k5[i] + A9_6 * k6[i]
                    + A9_7 * k7[i] + A9_8 * k8[i]);
        }
        field.rates(t + C9 * h, yStage, p, k9);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A10_0 * k0[i] + A10_3 * k3[i] + A10_4 * k4[i] + A10_5 * k5[i] + A10_6 * k6[i]
                    + A10_7 * k7[i] + A10_8 * k8[i] + A10_9 * k9[i]);
        }
        field.rates(t + C10 * h, yStage, p, k10);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A11_0 * k0[i] + A11_3 * k3[i] + A11_4 * k4[i] + A11_5 * k5[i] + A11_6 * k6[i]
                    + A11_7 * k7[i] + A11_8 * k8[i] + A11_9 * k9[i] + A11_10 * k10[i]);
        }
        field.rates(t + C11 * h, yStage, p, k11);
        for (int i = 0; i < n; i++) {
            double inc = A12_0 * k0[i] + A12_5 * k5[i] + A12_6 * k6[i] + A12_7 * k7[i] + A12_8 * k8[i] + A12_9 * k9[i]
                    + A12_10 * k10[i] + A12_11 * k11[i];
            increment[i] = inc;
            yNew[i] = y[i] + h * inc;
        }
    }

    /** The three extra stages and the coefficients of the 7th-order continuous extension (before the swap). */
    private void prepareDense(double t, double h) {
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A13_0 * k0[i] + A13_6 * k6[i] + A13_7 * k7[i] + A13_8 * k8[i] + A13_9 * k9[i]
                    + A13_10 * k10[i] + A13_11 * k11[i] + A13_12 * k12[i]);
        }
        field.rates(t + C13 * h, yStage, p, k13);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A14_0 * k0[i] + A14_5 * k5[i] + A14_6 * k6[i] + A14_7 * k7[i] + A14_10 * k10[i]
                    + A14_11 * k11[i] + A14_12 * k12[i] + A14_13 * k13[i]);
        }
        field.rates(t + C14 * h, yStage, p, k14);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + h * (A15_0 * k0[i] + A15_5 * k5[i] + A15_6 * k6[i] + A15_7 * k7[i] + A15_8 * k8[i]
                    + A15_12 * k12[i] + A15_13 * k13[i] + A15_14 * k14[i]);
        }
        field.rates(t + C15 * h, yStage, p, k15);
        for (int i = 0; i < n; i++) {
            double yDiff = yNew[i] - y[i];
            double bSpl = h * k0[i] - yDiff;
            r1[i] = y[i];
            r2[i] = yDiff;
            r3[i] = bSpl;
            r4[i] = yDiff - h * k12[i] - bSpl;
            r5[i] = h * (D0_0 * k0[i] + D0_5 * k5[i] + D0_6 * k6[i] + D0_7 * k7[i] + D0_8 * k8[i] + D0_9 * k9[i]
                    + D0_10 * k10[i] + D0_11 * k11[i] + D0_12 * k12[i] + D0_13 * k13[i] + D0_14 * k14[i]
                    + D0_15 * k15[i]);
            r6[i] = h * (D1_0 * k0[i] + D1_5 * k5[i] + D1_6 * k6[i] + D1_7 * k7[i] + D1_8 * k8[i] + D1_9 * k9[i]
                    + D1_10 * k10[i] + D1_11 * k11[i] + D1_12 * k12[i] + D1_13 * k13[i] + D1_14 * k14[i]
                    + D1_15 * k15[i]);
            r7[i] = h * (D2_0 * k0[i] + D2_5 * k5[i] + D2_6 * k6[i] + D2_7 * k7[i] + D2_8 * k8[i] + D2_9 * k9[i]
                    + D2_10 * k10[i] + D2_11 * k11[i] + D2_12 * k12[i] + D2_13 * k13[i] + D2_14 * k14[i]
                    + D2_15 * k15[i]);
            r8[i] = h * (D3_0 * k0[i] + D3_5 * k5[i] + D3_6 * k6[i] + D3_7 * k7[i] + D3_8 * k8[i] + D3_9 * k9[i]
                    + D3_10 * k10[i] + D3_11 * k11[i] + D3_12 * k12[i] + D3_13 * k13[i] + D3_14 * k14[i]
                    + D3_15 * k15[i]);
        }
    }

    /** The last accepted step with the 7th-order continuous extension of {@link #prepareDense}. */
    private final class Dense extends AdaptiveStepDriver.View {
        @Override
        public void stateAt(double t, double[] out) {
            double s = (t - tOld) / h;
            double s1 = 1 - s;
            for (int i = 0; i < n; i++) {
                double tail = r5[i] + s * (r6[i] + s1 * (r7[i] + s * r8[i]));
                out[i] = r1[i] + s * (r2[i] + s1 * (r3[i] + s * (r4[i] + s1 * tail)));
            }
        }
    }
}
