//! The basic equations of IAPWS R7-97(2012) against the release's own
//! verification tables, to every printed digit. The printed values are
//! recalled from the release (the document is not in the repository).

use ebullio::free_energy::Properties;
use ebullio::{boundary_b23, region1, region2, region2_metastable, region3, region5};
use ebullio_conformance::assert_printed;

/// One column of a verification table: v, h, u, s, cp, w as printed.
struct Column {
    p: f64,
    t: f64,
    v: &'static str,
    h: &'static str,
    u: &'static str,
    s: &'static str,
    cp: &'static str,
    w: &'static str,
}

fn check(table: &str, c: &Column, props: &Properties) {
    let at = format!("{table} at {} MPa, {} K", c.p, c.t);
    assert_printed(&format!("{at}: v"), props.v, c.v);
    assert_printed(&format!("{at}: h"), props.h, c.h);
    assert_printed(&format!("{at}: u"), props.u, c.u);
    assert_printed(&format!("{at}: s"), props.s, c.s);
    assert_printed(&format!("{at}: cp"), props.cp, c.cp);
    assert_printed(&format!("{at}: w"), props.w, c.w);
}

#[test]
fn region1_table5() {
    // recalled from IAPWS R7-97(2012), Table 5
    let columns = [
        Column {
            p: 3.0,
            t: 300.0,
            v: "0.100215168e-2",
            h: "0.115331273e3",
            u: "0.112324818e3",
            s: "0.392294792",
            cp: "0.417301218e1",
            w: "0.150773921e4",
        },
        Column {
            p: 80.0,
            t: 300.0,
            v: "0.971180894e-3",
            h: "0.184142828e3",
            u: "0.106448356e3",
            s: "0.368563852",
            cp: "0.401008987e1",
            w: "0.163469054e4",
        },
        Column {
            p: 3.0,
            t: 500.0,
            v: "0.120241800e-2",
            h: "0.975542239e3",
            u: "0.971934985e3",
            s: "0.258041912e1",
            cp: "0.465580682e1",
            w: "0.124071337e4",
        },
    ];
    for c in &columns {
        check(
            "R7-97 Table 5",
            c,
            &region1::gibbs(c.p, c.t).properties(c.p, c.t),
        );
    }
}

#[test]
fn region2_table15() {
    // recalled from IAPWS R7-97(2012), Table 15
    let columns = [
        Column {
            p: 0.0035,
            t: 300.0,
            v: "0.394913866e2",
            h: "0.254991145e4",
            u: "0.241169160e4",
            s: "0.852238967e1",
            cp: "0.191300162e1",
            w: "0.427920172e3",
        },
        Column {
            p: 0.0035,
            t: 700.0,
            v: "0.923015898e2",
            h: "0.333568375e4",
            u: "0.301262819e4",
            s: "0.101749996e2",
            cp: "0.208141274e1",
            w: "0.644289068e3",
        },
        Column {
            p: 30.0,
            t: 700.0,
            v: "0.542946619e-2",
            h: "0.263149474e4",
            u: "0.246861076e4",
            s: "0.517540298e1",
            cp: "0.103505092e2",
            w: "0.480386523e3",
        },
    ];
    for c in &columns {
        check(
            "R7-97 Table 15",
            c,
            &region2::gibbs(c.p, c.t).properties(c.p, c.t),
        );
    }
}

#[test]
fn metastable_vapour_table18() {
    // recalled from IAPWS R7-97(2012), Table 18
    let columns = [
        Column {
            p: 1.0,
            t: 450.0,
            v: "0.192516540",
            h: "0.276881115e4",
            u: "0.257629461e4",
            s: "0.656660377e1",
            cp: "0.276349265e1",
            w: "0.498408101e3",
        },
        Column {
            p: 1.0,
            t: 440.0,
            v: "0.186212297",
            h: "0.274015123e4",
            u: "0.255393894e4",
            s: "0.650218759e1",
            cp: "0.298166443e1",
            w: "0.489363295e3",
        },
        Column {
            p: 1.5,
            t: 450.0,
            v: "0.121685206",
            h: "0.272134539e4",
            u: "0.253881758e4",
            s: "0.629170440e1",
            cp: "0.362795578e1",
            w: "0.481941819e3",
        },
    ];
    for c in &columns {
        check(
            "R7-97 Table 18",
            c,
            &region2_metastable::gibbs(c.p, c.t).properties(c.p, c.t),
        );
    }
}

#[test]
fn region5_table42() {
    // recalled from IAPWS R7-97(2012), Table 42 (region 5 as revised in 2007)
    let columns = [
        Column {
            p: 0.5,
            t: 1500.0,
            v: "0.138455090e1",
            h: "0.521976855e4",
            u: "0.452749310e4",
            s: "0.965408875e1",
            cp: "0.261609445e1",
            w: "0.917068690e3",
        },
        Column {
            p: 30.0,
            t: 1500.0,
            v: "0.230761299e-1",
            h: "0.516723514e4",
            u: "0.447495124e4",
            s: "0.772970133e1",
            cp: "0.272724317e1",
            w: "0.928548002e3",
        },
        Column {
            p: 30.0,
            t: 2000.0,
            v: "0.311385219e-1",
            h: "0.657122604e4",
            u: "0.563707038e4",
            s: "0.853640523e1",
            cp: "0.288569882e1",
            w: "0.106736948e4",
        },
    ];
    for c in &columns {
        check(
            "R7-97 Table 42",
            c,
            &region5::gibbs(c.p, c.t).properties(c.p, c.t),
        );
    }
}

#[test]
fn region3_table33() {
    // recalled from IAPWS R7-97(2012), Table 33: input (ρ, T), output p and the rest.
    struct Row {
        rho: f64,
        t: f64,
        p: &'static str,
        h: &'static str,
        u: &'static str,
        s: &'static str,
        cp: &'static str,
        w: &'static str,
    }
    let rows = [
        Row {
            rho: 500.0,
            t: 650.0,
            p: "0.255837018e2",
            h: "0.186343019e4",
            u: "0.181226279e4",
            s: "0.405427273e1",
            cp: "0.138935717e2",
            w: "0.502005554e3",
        },
        Row {
            rho: 200.0,
            t: 650.0,
            p: "0.222930643e2",
            h: "0.237512401e4",
            u: "0.226365868e4",
            s: "0.485438792e1",
            cp: "0.446579342e2",
            w: "0.383444594e3",
        },
        Row {
            rho: 500.0,
            t: 750.0,
            p: "0.783095639e2",
            h: "0.225868845e4",
            u: "0.210206932e4",
            s: "0.446971906e1",
            cp: "0.634165359e1",
            w: "0.760696041e3",
        },
    ];
    for r in &rows {
        let props = region3::helmholtz(r.rho, r.t).properties(r.rho, r.t);
        let at = format!("R7-97 Table 33 at {} kg/m³, {} K", r.rho, r.t);
        assert_printed(&format!("{at}: p"), props.p, r.p);
        assert_printed(&format!("{at}: h"), props.h, r.h);
        assert_printed(&format!("{at}: u"), props.u, r.u);
        assert_printed(&format!("{at}: s"), props.s, r.s);
        assert_printed(&format!("{at}: cp"), props.cp, r.cp);
        assert_printed(&format!("{at}: w"), props.w, r.w);
    }
}

#[test]
fn b23_boundary() {
    // recalled from IAPWS R7-97(2012), section 4, the check values after Eq. 6:
    // T = 0.623150000e3 K gives p = 0.165291643e2 MPa, and back.
    assert_printed(
        "B23 p(623.15 K)",
        boundary_b23::pressure(623.15),
        "0.165291643e2",
    );
    assert_printed(
        "B23 T(16.5291643 MPa)",
        boundary_b23::temperature(16.5291643),
        "0.623150000e3",
    );
}
