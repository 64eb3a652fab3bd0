package org.cupel.recovery;

import java.util.Map;
import org.cupel.assay.Numbers;
import org.cupel.config.SettingException;

/**
 * Settings of the recovery analysis, bound from the {@code recovery} section of {@code cupel.yaml}.
 *
 * @param definition recovery definition that condition means and comparisons use: {@code loss} (1 − losses /
 *     metal in charge), {@code direct} (collected / metal in charge) or {@code calculated} (collected / sum of
 *     products)
 * @param confidence level of every confidence interval
 * @param alpha significance level of the tests and of the power plan
 * @param equivalenceMargin ± margin of the TOST equivalence test, in percentage points of recovery
 * @param powerDifference difference in percentage points the replicate plan should detect
 * @param power target power of the replicate plan
 * @param balanceTolerance a smelt's balance closes when |accountability − 1| ≤ this
 * @param nearComplete mean recoveries (%) at or above this get their intervals on the log-loss scale
 * @param balanceResolutionGrams readability of the balance; its standard uncertainty is resolution / √12
 *     (rectangular, JCGM 100:2008 F.2.2.1)
 * @param assayRelativeSd relative SD of one assay per product name or role ({@code head}, {@code collected},
 *     {@code loss}, or a product name such as {@code slag}); used by the reconciliation and, for a head with
 *     a single assay, by the GUM budget
 * @param precisionSigma0 σ₀ of the duplicate-precision model σ_c = σ₀ + k·c in g/t; when set with
 *     {@link #precisionK} it replaces the relative SDs for every assay
 * @param precisionK k of the precision model
 * @param productRoles product name → {@code collected} or {@code loss}, overriding the role implied by the name
 */
public record RecoverySettings(String definition, double confidence, double alpha, double equivalenceMargin,
                               double powerDifference, double power, double balanceTolerance, double nearComplete,
                               double balanceResolutionGrams, Map<String, Double> assayRelativeSd,
                               Double precisionSigma0, Double precisionK, Map<String, String> productRoles) {

    /** Defaults; the assay precisions are assumptions for the reconciliation, labelled as such in the output. */
    public static final RecoverySettings DEFAULTS = new RecoverySettings("loss", 0.95, 0.05, 0.5, 1.0, 0.80, 0.05,
            95.0, 0.01, Map.of("head", 0.02, "collected", 0.01, "loss", 0.05), null, null, Map.of());

    public RecoverySettings {
        assayRelativeSd = relativeSds(assayRelativeSd);
        productRoles = productRoles == null ? Map.of() : Map.copyOf(productRoles);
        if (!(confidence > 0 && confidence < 1) || !(alpha > 0 && alpha < 1)) {
            throw new IllegalArgumentException("confidence and alpha must lie between 0 and 1");
        }
        if (!(equivalenceMargin > 0) || !(powerDifference > 0)) {
            throw new IllegalArgumentException("the equivalence margin and the power difference must be positive");
        }
        RecoveryDefinition.parse(definition);
        require(power > 0 && power < 1, "power", power, "the target power lies between 0 and 1 (default 0.80)");
        require(balanceTolerance >= 0 && Double.isFinite(balanceTolerance), "balanceTolerance", balanceTolerance,
                "the balance tolerance is 0 or a positive fraction (default 0.05, ± 5 %)");
        require(nearComplete > 0 && nearComplete <= 100, "nearComplete", nearComplete,
                "the near-complete recovery is a percentage above 0 and at most 100 (default 95)");
        require(balanceResolutionGrams >= 0 && Double.isFinite(balanceResolutionGrams), "balanceResolutionGrams",
                balanceResolutionGrams, "the balance readability is 0 or more grams (default 0.01)");
        requireNonNegative(precisionSigma0, "precisionSigma0");
        requireNonNegative(precisionK, "precisionK");
    }

    private static Map<String, Double> relativeSds(Map<String, Double> rsds) {
        if (rsds == null) {
            return Map.of();
        }
        rsds.forEach((product, rsd) -> {
            if (rsd == null || !(rsd >= 0) || rsd.isInfinite()) {
                throw new SettingException((rsd == null ? "an empty value" : Numbers.compact(rsd)) + " is not a "
                        + "relative SD: write 0 or a positive fraction (0.02 for 2 %)", "assayRelativeSd", product);
            }
        });
        return Map.copyOf(rsds);
    }

    private static void require(boolean ok, String key, double value, String rule) {
        if (!ok) {
            throw new SettingException(Numbers.compact(value) + " is out of range: " + rule + "; correct the value",
                    key);
        }
    }

    private static void requireNonNegative(Double value, String key) {
        if (value != null) {
            require(value >= 0 && !value.isInfinite(), key, value, "the precision model's terms are 0 or more");
        }
    }

    public RecoveryDefinition recoveryDefinition() {
        return RecoveryDefinition.parse(definition);
    }

    /** Standard uncertainty of one weighing: resolution/√12. */
    public double massUncertaintyGrams() {
        return balanceResolutionGrams / Math.sqrt(12);
    }

    /**
     * Standard uncertainty of one assay at {@code gradeGpt} of a product: σ₀ + k·c when the precision model is
     * set, else the relative SD for the product name, else for its role ({@code head} for heads).
     */
    public double assayUncertainty(String productName, String roleKey, double gradeGpt) {
        if (precisionSigma0 != null && precisionK != null) {
            return precisionSigma0 + precisionK * gradeGpt;
        }
        Double rsd = assayRelativeSd.get(productName.toLowerCase(java.util.Locale.ROOT));
        if (rsd == null) {
            rsd = assayRelativeSd.getOrDefault(roleKey, 0.0);
        }
        return rsd * gradeGpt;
    }

    /** A builder holding {@link #DEFAULTS}: {@code RecoverySettings.withDefaults().someSetting(value).build()}. */
    public static Builder withDefaults() {
        return DEFAULTS.toBuilder();
    }

    /** A builder holding these settings, to change some of them. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    /**
     * Sets any of the settings, each named as its record component; {@link #build} checks them together, as the
     * config does, so the order of the calls does not matter.
     */
    public static final class Builder {
        private String definition;
        private double confidence;
        private double alpha;
        private double equivalenceMargin;
        private double powerDifference;
        private double power;
        private double balanceTolerance;
        private double nearComplete;
        private double balanceResolutionGrams;
        private Map<String, Double> assayRelativeSd;
        private Double precisionSigma0;
        private Double precisionK;
        private Map<String, String> productRoles;

        private Builder(RecoverySettings s) {
            definition = s.definition();
            confidence = s.confidence();
            alpha = s.alpha();
            equivalenceMargin = s.equivalenceMargin();
            powerDifference = s.powerDifference();
            power = s.power();
            balanceTolerance = s.balanceTolerance();
            nearComplete = s.nearComplete();
            balanceResolutionGrams = s.balanceResolutionGrams();
            assayRelativeSd = s.assayRelativeSd();
            precisionSigma0 = s.precisionSigma0();
            precisionK = s.precisionK();
            productRoles = s.productRoles();
        }

        public Builder definition(String value) {
            definition = value;
            return this;
        }

        public Builder confidence(double value) {
            confidence = value;
            return this;
        }

        public Builder alpha(double value) {
            alpha = value;
            return this;
        }

        public Builder equivalenceMargin(double value) {
            equivalenceMargin = value;
            return this;
        }

        public Builder powerDifference(double value) {
            powerDifference = value;
            return this;
        }

        public Builder power(double value) {
            power = value;
            return this;
        }

        public Builder balanceTolerance(double value) {
            balanceTolerance = value;
            return this;
        }

        public Builder nearComplete(double value) {
            nearComplete = value;
            return this;
        }

        public Builder balanceResolutionGrams(double value) {
            balanceResolutionGrams = value;
            return this;
        }

        public Builder assayRelativeSd(Map<String, Double> value) {
            assayRelativeSd = value;
            return this;
        }

        public Builder precisionSigma0(Double value) {
            precisionSigma0 = value;
            return this;
        }

        public Builder precisionK(Double value) {
            precisionK = value;
            return this;
        }

        public Builder productRoles(Map<String, String> value) {
            productRoles = value;
            return this;
        }

        /** @throws org.cupel.config.SettingException or IllegalArgumentException for a value out of range */
        public RecoverySettings build() {
            return new RecoverySettings(definition, confidence, alpha, equivalenceMargin, powerDifference, power,
                    balanceTolerance, nearComplete, balanceResolutionGrams, assayRelativeSd, precisionSigma0,
                    precisionK, productRoles);
        }
    }
}
