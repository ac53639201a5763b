import bcrypt from 'bcryptjs';

/** bcrypt cost 10 or more, per the OWASP password storage guidance. */
export const BCRYPT_COST = 11;

export const hashPassword = (password: string) => bcrypt.hash(password, BCRYPT_COST);
export const checkPassword = (password: string, hash: string) => bcrypt.compare(password, hash);

/** Compared against when the e-mail is unknown, so timing doesn't reveal which addresses exist. */
export const DUMMY_HASH = bcrypt.hashSync('probepath-no-such-user', BCRYPT_COST);
