/** A transfer-curve request that cannot be run as asked (unknown input, bad hold, bad point count). */
export class TransferError extends Error {
  override readonly name = 'TransferError';
}
