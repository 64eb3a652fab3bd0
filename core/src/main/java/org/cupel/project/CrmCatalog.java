package org.cupel.project;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** The CRMs a project uses, looked up by code and analyte. */
public final class CrmCatalog {
    private final Map<String, Map<String, CrmCertificate>> byCode;

    public CrmCatalog(Collection<CrmCertificate> certificates) {
        Map<String, Map<String, CrmCertificate>> m = new LinkedHashMap<>();
        for (CrmCertificate c : certificates) {
            m.computeIfAbsent(c.code(), k -> new LinkedHashMap<>()).put(c.analyte(), c);
        }
        this.byCode = m;
    }

    public static CrmCatalog empty() {
        return new CrmCatalog(List.of());
    }

    public Optional<CrmCertificate> find(String code, String analyte) {
        Map<String, CrmCertificate> m = byCode.get(code);
        return m == null ? Optional.empty() : Optional.ofNullable(m.get(analyte));
    }

    public boolean contains(String code) {
        return byCode.containsKey(code);
    }

    public Set<String> codes() {
        return byCode.keySet();
    }

    /** Every certificate for the analyte, in catalog order. */
    public List<CrmCertificate> forAnalyte(String analyte) {
        List<CrmCertificate> out = new ArrayList<>();
        for (Map<String, CrmCertificate> m : byCode.values()) {
            CrmCertificate c = m.get(analyte);
            if (c != null) {
                out.add(c);
            }
        }
        return out;
    }

    public List<CrmCertificate> all() {
        List<CrmCertificate> out = new ArrayList<>();
        byCode.values().forEach(m -> out.addAll(m.values()));
        return out;
    }
}
