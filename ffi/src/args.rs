//! Argument checks and the only places that touch caller memory.
//!
//! Each wrapper is made by an `unsafe fn new` whose contract is what the
//! header promises the caller must give (a pointer valid for so many
//! elements or bytes); after that, every access is bounds-checked and safe
//! to call. Nothing here keeps a pointer past the call.

use core::mem::size_of;
use core::ptr;

use crate::status::EbullioStatus;

/// Null pointers are refused with a status, never dereferenced.
pub(crate) fn non_null<T>(p: *const T) -> Result<(), EbullioStatus> {
    if p.is_null() {
        Err(EbullioStatus::NullPointer)
    } else {
        Ok(())
    }
}

/// A length whose elements of `T` could not even be addressed is refused.
pub(crate) fn check_len<T>(n: usize) -> Result<(), EbullioStatus> {
    match n.checked_mul(size_of::<T>()) {
        Some(bytes) if bytes <= isize::MAX as usize => Ok(()),
        _ => Err(EbullioStatus::BadLength),
    }
}

/// A caller's array of `len` values to read. Read element by element, so
/// an output array may be the same memory as an input array (in place).
pub(crate) struct InArray<T: Copy> {
    ptr: *const T,
    len: usize,
}

impl<T: Copy> InArray<T> {
    /// # Safety
    /// If `len > 0` and `ptr` is not null, `ptr` must be valid for reading
    /// `len` properly aligned values of `T` for as long as the wrapper lives.
    pub(crate) unsafe fn new(ptr: *const T, len: usize) -> Result<InArray<T>, EbullioStatus> {
        check_len::<T>(len)?;
        if len > 0 {
            non_null(ptr)?;
        }
        Ok(InArray { ptr, len })
    }

    pub(crate) fn len(&self) -> usize {
        self.len
    }

    pub(crate) fn get(&self, i: usize) -> T {
        assert!(i < self.len, "index {i} past caller array of {}", self.len);
        // SAFETY: `i < len`, and `new`'s contract makes `ptr` valid for
        // `len` reads; a read (not a reference) tolerates aliasing writes.
        unsafe { self.ptr.add(i).read() }
    }
}

/// A caller's array of `len` values to write.
pub(crate) struct OutArray<T> {
    ptr: *mut T,
    len: usize,
}

impl<T> OutArray<T> {
    /// # Safety
    /// If `len > 0` and `ptr` is not null, `ptr` must be valid for writing
    /// `len` properly aligned values of `T` for as long as the wrapper lives.
    pub(crate) unsafe fn new(ptr: *mut T, len: usize) -> Result<OutArray<T>, EbullioStatus> {
        check_len::<T>(len)?;
        if len > 0 {
            non_null(ptr)?;
        }
        Ok(OutArray { ptr, len })
    }

    /// An optional array: null means the caller does not want it.
    ///
    /// # Safety
    /// As for [`OutArray::new`] when `ptr` is not null.
    pub(crate) unsafe fn optional(
        ptr: *mut T,
        len: usize,
    ) -> Result<Option<OutArray<T>>, EbullioStatus> {
        if ptr.is_null() {
            Ok(None)
        } else {
            // SAFETY: forwarded contract; `ptr` is not null.
            unsafe { OutArray::new(ptr, len) }.map(Some)
        }
    }

    pub(crate) fn set(&self, i: usize, value: T) {
        assert!(i < self.len, "index {i} past caller array of {}", self.len);
        // SAFETY: `i < len`, and `new`'s contract makes `ptr` valid for
        // `len` writes; `write` does not drop the old (plain-data) value.
        unsafe { self.ptr.add(i).write(value) }
    }
}

/// A `#[repr(C)]` struct whose first field is a `uint32_t size` the
/// caller sets to `sizeof` the struct as its header declares it.
///
/// # Safety
/// Implementors must be `#[repr(C)]`, start with a `u32` size field, and
/// have no padding bytes (checked by const asserts beside each struct), so
/// that copying their bytes copies only initialised memory.
pub(crate) unsafe trait SizePrefixed: Sized {
    /// The struct's size in the first published version of the ABI: the
    /// smallest `size` a caller can have, which covers every field of
    /// that version.
    const FIRST_SIZE: u32;
}

/// A caller's size-prefixed struct to fill: the library writes the fields
/// that fit in both the caller's declared size and its own, and never the
/// `size` field itself.
pub(crate) struct OutStruct<T: SizePrefixed> {
    ptr: *mut T,
    /// How many bytes, from the start, belong to fields both sides know.
    len: usize,
}

impl<T: SizePrefixed> OutStruct<T> {
    /// # Safety
    /// If `ptr` is not null, its first four bytes must be readable, and
    /// it must be valid for writing as many bytes as that size field
    /// declares (or `size_of::<T>()`, whichever is less).
    pub(crate) unsafe fn new(ptr: *mut T) -> Result<OutStruct<T>, EbullioStatus> {
        non_null(ptr)?;
        // SAFETY: the contract makes the first four bytes readable; the
        // read is unaligned so no alignment is assumed.
        let declared = unsafe { ptr.cast::<u32>().read_unaligned() };
        if declared < T::FIRST_SIZE {
            return Err(EbullioStatus::BadStructSize);
        }
        Ok(OutStruct {
            ptr,
            len: (declared as usize).min(size_of::<T>()),
        })
    }

    /// An optional struct: null means the caller does not want it.
    ///
    /// # Safety
    /// As for [`OutStruct::new`] when `ptr` is not null.
    pub(crate) unsafe fn optional(ptr: *mut T) -> Result<Option<OutStruct<T>>, EbullioStatus> {
        if ptr.is_null() {
            Ok(None)
        } else {
            // SAFETY: forwarded contract; `ptr` is not null.
            unsafe { OutStruct::new(ptr) }.map(Some)
        }
    }

    /// Copies `value` over the caller's struct, after the size field.
    pub(crate) fn write(&self, value: &T) {
        const SIZE_FIELD: usize = size_of::<u32>();
        let src = (value as *const T).cast::<u8>();
        // SAFETY: `len` ≤ size_of::<T>() bounds the source, which is a
        // whole padding-free `T` (the `SizePrefixed` contract); `new`'s
        // contract makes the destination writable for `len` bytes;
        // `len` ≥ FIRST_SIZE > SIZE_FIELD, and a local value cannot
        // overlap caller memory. Bytes are copied, so alignment is moot.
        unsafe {
            ptr::copy_nonoverlapping(
                src.add(SIZE_FIELD),
                self.ptr.cast::<u8>().add(SIZE_FIELD),
                self.len - SIZE_FIELD,
            )
        }
    }
}

/// A size-prefixed struct the caller fills in and the library reads (a
/// plant description).
///
/// # Safety
/// Implementors are [`SizePrefixed`], and every bit pattern of every
/// field is a valid value (only integers and floats, no enums or `bool`),
/// so bytes copied from the caller always make a valid `T`.
pub(crate) unsafe trait PlainInput: SizePrefixed + Copy {}

/// Reads a caller's input struct: the fields both sides know come from the
/// caller, any later fields keep the values of `defaults`.
///
/// # Safety
/// If `ptr` is not null, its first four bytes must be readable, and it
/// must be valid for reading as many bytes as that size field declares
/// (or `size_of::<T>()`, whichever is less).
pub(crate) unsafe fn read_in_struct<T: PlainInput>(
    ptr: *const T,
    defaults: T,
) -> Result<T, EbullioStatus> {
    non_null(ptr)?;
    // SAFETY: the contract makes the first four bytes readable; the read
    // is unaligned so no alignment is assumed.
    let declared = unsafe { ptr.cast::<u32>().read_unaligned() };
    if declared < T::FIRST_SIZE {
        return Err(EbullioStatus::BadStructSize);
    }
    let len = (declared as usize).min(size_of::<T>());
    let mut value = defaults;
    // SAFETY: the contract makes `len` bytes of the source readable; the
    // destination is a whole local `T` of at least `len` bytes, which
    // cannot overlap caller memory; `PlainInput` makes any bytes a valid
    // `T`. Bytes are copied, so alignment is moot.
    unsafe { ptr::copy_nonoverlapping(ptr.cast::<u8>(), (&mut value as *mut T).cast::<u8>(), len) };
    Ok(value)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn lengths_too_large_to_address_are_refused() {
        assert_eq!(check_len::<f64>(0), Ok(()));
        assert_eq!(check_len::<f64>(1 << 40), Ok(()));
        assert_eq!(
            check_len::<f64>(usize::MAX / 8 + 1),
            Err(EbullioStatus::BadLength)
        );
        assert_eq!(check_len::<f64>(usize::MAX), Err(EbullioStatus::BadLength));
    }

    #[test]
    fn empty_arrays_may_be_null_and_others_may_not() {
        // SAFETY: a null pointer with length 0 is never read.
        assert!(unsafe { InArray::<f64>::new(ptr::null(), 0) }.is_ok());
        // SAFETY: a null pointer is refused before any read.
        let refused = unsafe { InArray::<f64>::new(ptr::null(), 3) };
        assert_eq!(refused.err(), Some(EbullioStatus::NullPointer));
        // SAFETY: as above.
        let optional = unsafe { OutArray::<f64>::optional(ptr::null_mut(), 3) };
        assert!(matches!(optional, Ok(None)));
    }
}
