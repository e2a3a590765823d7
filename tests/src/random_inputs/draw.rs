//! Where the random choices come from: a seeded generator for the
//! harness in the test command, or the fuzzer's bytes for the cargo-fuzz
//! targets. Both drive the same generators, so a fuzz finding and a
//! harness finding read alike.

/// A source of 64-bit words, and the choices built on them.
pub trait Draw {
    /// The next word.
    fn word(&mut self) -> u64;

    /// Uniform in [0, 1).
    fn unit(&mut self) -> f64 {
        (self.word() >> 11) as f64 * (1.0 / (1u64 << 53) as f64)
    }

    /// Uniform in [lo, hi).
    fn range(&mut self, lo: f64, hi: f64) -> f64 {
        lo + (hi - lo) * self.unit()
    }

    /// 10^e with e uniform in [lo, hi): spread over decades.
    fn decades(&mut self, lo: f64, hi: f64) -> f64 {
        10f64.powf(self.range(lo, hi))
    }

    /// Uniform in 0..n (n > 0).
    fn below(&mut self, n: usize) -> usize {
        (self.word() % n as u64) as usize
    }

    /// True with probability `p`.
    fn chance(&mut self, p: f64) -> bool {
        self.unit() < p
    }

    /// One of `items` (not empty).
    fn pick<T: Copy>(&mut self, items: &[T]) -> T {
        items[self.below(items.len())]
    }

    /// Any bit pattern at all: NaNs with payloads, subnormals, infinities.
    fn any_bits(&mut self) -> f64 {
        f64::from_bits(self.word())
    }
}

/// SplitMix64 (Steele, Lea and Flood, 2014): small, fast, and the same
/// sequence on every platform.
#[derive(Clone, Debug)]
pub struct Seeded(u64);

impl Seeded {
    /// A generator for one target: the campaign seed mixed with the
    /// target's name, so targets draw independent streams and adding a
    /// target does not change the cases of the others.
    pub fn for_target(seed: u64, target: &str) -> Seeded {
        let name = target.bytes().fold(0xcbf2_9ce4_8422_2325u64, |h, b| {
            (h ^ u64::from(b)).wrapping_mul(0x0100_0000_01b3)
        });
        Seeded(seed ^ name)
    }
}

impl Draw for Seeded {
    fn word(&mut self) -> u64 {
        self.0 = self.0.wrapping_add(0x9e37_79b9_7f4a_7c15);
        let mut z = self.0;
        z = (z ^ (z >> 30)).wrapping_mul(0xbf58_476d_1ce4_e5b9);
        z = (z ^ (z >> 27)).wrapping_mul(0x94d0_49bb_1331_11eb);
        z ^ (z >> 31)
    }
}

/// The fuzzer's input read as words, eight bytes each; zeros once it is
/// used up, so every input is a complete case.
#[derive(Clone, Debug)]
pub struct Bytes<'a>(&'a [u8]);

impl<'a> Bytes<'a> {
    /// Reads `data` from the start.
    pub fn new(data: &'a [u8]) -> Bytes<'a> {
        Bytes(data)
    }
}

impl Draw for Bytes<'_> {
    fn word(&mut self) -> u64 {
        let n = self.0.len().min(8);
        let mut word = [0u8; 8];
        word[..n].copy_from_slice(&self.0[..n]);
        self.0 = &self.0[n..];
        u64::from_le_bytes(word)
    }
}

/// The campaign's seed: `EBULLIO_SEED` if set (as the property tests
/// read it), else 1997.
pub fn campaign_seed() -> u64 {
    std::env::var("EBULLIO_SEED")
        .ok()
        .and_then(|s| s.parse().ok())
        .unwrap_or(1997)
}
