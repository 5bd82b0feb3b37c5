package org.variset.archive.gym;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.SequenceGenerator;
import jakarta.persistence.Table;
import java.time.LocalDate;
import java.util.Objects;

/**
 * One value of one gym setting (target grade shares, bands, thresholds, vocabulary, ...), with the date it
 * took effect, so an old audit can be reproduced with the settings of its day. The value is JSON text whose
 * shape belongs to the setting's key.
 */
@Entity
@Table(name = "gym_setting")
public class GymSetting {
    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "gym_setting_seq")
    @SequenceGenerator(name = "gym_setting_seq", sequenceName = "gym_setting_seq", allocationSize = 50)
    private Long id;

    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "gym_id", nullable = false)
    private Gym gym;

    @Column(name = "setting_key", nullable = false)
    private String key;

    /** The discipline word the value applies to, or empty for both. */
    @Column(nullable = false)
    private String scope;

    @Column(name = "effective_on", nullable = false)
    private LocalDate effectiveOn;

    @Column(name = "value_json", nullable = false, length = 100_000)
    private String valueJson;

    /** For Hibernate. */
    protected GymSetting() {}

    /** A setting value taking effect on a date. */
    public GymSetting(Gym gym, String key, String scope, LocalDate effectiveOn, String valueJson) {
        this.gym = Objects.requireNonNull(gym, "gym");
        this.key = Objects.requireNonNull(key, "key");
        this.scope = scope == null ? "" : scope;
        this.effectiveOn = Objects.requireNonNull(effectiveOn, "effectiveOn");
        this.valueJson = Objects.requireNonNull(valueJson, "valueJson");
    }

    /** The gym. */
    public Gym gym() {
        return gym;
    }

    /** The setting's key. */
    public String key() {
        return key;
    }

    /** The discipline word it applies to, or empty for both. */
    public String scope() {
        return scope;
    }

    /** The date the value took effect. */
    public LocalDate effectiveOn() {
        return effectiveOn;
    }

    /** The value as JSON. */
    public String valueJson() {
        return valueJson;
    }
}
