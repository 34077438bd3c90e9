import { describe, expect, it } from 'vitest';
import { ClassCodeSchema, ClassCreateSchema } from '../../../src/lib/auth/class-schemas';
import {
  DisplayNameSchema,
  EmailSchema,
  NewPasswordSchema,
  SignInSchema,
  SignUpSchema,
} from '../../../src/lib/auth/schemas';

describe('NewPasswordSchema', () => {
  // NIST SP 800-63B-4 §3.1.1.2: at least 15 characters for a password used alone, accept at least 64, no
  // composition rules, count each Unicode code point as one character.
  it('accepts 15 to 128 characters with no composition rules', () => {
    expect(NewPasswordSchema.safeParse('a'.repeat(15)).success).toBe(true);
    expect(NewPasswordSchema.safeParse('a'.repeat(64)).success).toBe(true);
    expect(NewPasswordSchema.safeParse('a'.repeat(128)).success).toBe(true);
    expect(NewPasswordSchema.safeParse('correct horse battery staple').success).toBe(true);
  });

  it('refuses 14 characters and more than 128', () => {
    expect(NewPasswordSchema.safeParse('a'.repeat(14)).success).toBe(false);
    expect(NewPasswordSchema.safeParse('a'.repeat(129)).success).toBe(false);
  });

  it('counts code points, so 15 emoji are 15 characters (30 UTF-16 units)', () => {
    const emoji = '🚀'.repeat(15);
    expect(emoji.length).toBe(30);
    expect(NewPasswordSchema.safeParse(emoji).success).toBe(true);
    expect(NewPasswordSchema.safeParse('🚀'.repeat(14)).success).toBe(false);
  });

  it('keeps leading and trailing spaces (passwords are never trimmed)', () => {
    expect(NewPasswordSchema.parse('  fifteen chars ')).toBe('  fifteen chars ');
  });
});

describe('EmailSchema', () => {
  it('trims and lower-cases an address', () => {
    expect(EmailSchema.parse('  Ada.Teacher@School.EXAMPLE ')).toBe('ada.teacher@school.example');
  });

  it('refuses text that is not an address', () => {
    for (const bad of ['', 'no-at-sign', "x' OR 1=1 --", '<b>@x.org'])
      expect(EmailSchema.safeParse(bad).success).toBe(false);
  });
});

describe('DisplayNameSchema', () => {
  it('accepts names of any script with everyday punctuation', () => {
    for (const name of ["Siobhán O'Neill-Ruiz", 'Nguyễn Thị Mai', 'Dr. A. Okafor', '山田 花子']) {
      expect(DisplayNameSchema.safeParse(name).success, name).toBe(true);
    }
  });

  it('refuses markup, statement separators and control characters', () => {
    for (const name of ['<b>Bold</b>', "x'); DROP TABLE users; --", 'a"b', 'tab\there']) {
      expect(DisplayNameSchema.safeParse(name).success, name).toBe(false);
    }
  });
});

describe('SignInSchema', () => {
  it('refuses unknown fields', () => {
    expect(SignInSchema.safeParse({ email: 'a@b.org', password: 'x', role: 'admin' }).success).toBe(false);
  });
});

describe('SignUpSchema', () => {
  const base = { email: 'a@b.org', displayName: 'Al B', password: 'fifteen chars!!' };
  it('needs a school id when the school is picked from the list', () => {
    const result = SignUpSchema.safeParse({ ...base, schoolChoice: 'existing', schoolId: '' });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(['schoolId']);
  });

  it('needs a name and a city when a new school is proposed', () => {
    const result = SignUpSchema.safeParse({ ...base, schoolChoice: 'proposed' });
    expect(result.error?.issues.map((i) => i.path[0]).sort()).toEqual(['proposedSchoolCity', 'proposedSchoolName']);
  });
});

describe('ClassCodeSchema', () => {
  it('normalizes typed codes and refuses anything but 8 letters and digits', () => {
    expect(ClassCodeSchema.parse('jfms-3k7q')).toBe('JFMS3K7Q');
    expect(ClassCodeSchema.safeParse('JFMS3K7').success).toBe(false);
    expect(ClassCodeSchema.safeParse("' OR 1=1").success).toBe(false);
  });
});

describe('ClassCreateSchema', () => {
  it('takes a name, grade band and whole student count only', () => {
    expect(ClassCreateSchema.safeParse({ name: 'P3', gradeBand: '6-8', studentCount: 26 }).success).toBe(true);
    expect(ClassCreateSchema.safeParse({ name: 'P3', gradeBand: '6-8', studentCount: 2.5 }).success).toBe(false);
    expect(ClassCreateSchema.safeParse({ name: 'P3', gradeBand: '6-8', studentCount: '26' }).success).toBe(false);
    expect(ClassCreateSchema.safeParse({ name: 'P3', gradeBand: '6-8', studentCount: 501 }).success).toBe(false);
    expect(
      ClassCreateSchema.safeParse({ name: 'P3', gradeBand: '6-8', studentCount: 2, students: ['Ann'] }).success,
    ).toBe(false);
  });
});
